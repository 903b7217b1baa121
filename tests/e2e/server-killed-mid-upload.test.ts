import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import sharp from 'sharp';
import { afterAll, describe, expect, inject, it } from 'vitest';
import { demoSession } from '../support/e2e-api.ts';
import { storedFiles } from '../support/media.ts';
import { startServerProcess, stopServerProcess, type ServerProcess } from '../support/server-process.ts';

/** A photo-sized JPEG of noise (several megabytes), so the upload is still arriving when the server dies. */
async function bigPhoto(): Promise<Buffer> {
  const width = 3000;
  const height = 2000;
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < raw.length; i += 1) raw[i] = Math.imul(i, 2654435761) >>> 24;
  return sharp(raw, { raw: { width, height, channels: 3 } })
    .jpeg({ quality: 95 })
    .toBuffer();
}

/**
 * Starts a multipart upload that declares its full length but sends only its first part: the
 * server is left receiving it. Errors are swallowed, since the server is about to be killed; any
 * answer is recorded (there must be none).
 */
function startSlowUpload(baseUrl: string, cookie: string, image: Buffer, fileName: string) {
  const boundary = `starproof-${Date.now()}`;
  const head = Buffer.from(
    `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${fileName}"\r\nContent-Type: image/jpeg\r\n\r\n`,
  );
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
  const req = http.request(`${baseUrl}/api/media`, {
    method: 'POST',
    headers: {
      Cookie: cookie,
      'Content-Type': `multipart/form-data; boundary=${boundary}`,
      'Content-Length': head.length + image.length + tail.length,
    },
  });
  const answered: number[] = [];
  req.on('error', () => undefined);
  req.on('response', (res) => answered.push(res.statusCode ?? 0));
  req.write(head);
  req.write(image.subarray(0, 512 * 1024));
  return { req, answered };
}

/** Temporary files under uploads/tmp, with their sizes. */
const tmpFiles = (root: string) =>
  storedFiles(root)
    .filter((f) => f.startsWith(`tmp${path.sep}`))
    .map((f) => ({ f, size: fs.statSync(path.join(root, f)).size }));

const db = new pg.Client({ connectionString: inject('e2eDatabaseUrl') });
const servers: ServerProcess[] = [];
const uploadsDir = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-killed-upload-'));
afterAll(async () => {
  for (const s of servers) await stopServerProcess(s);
  await db.end();
  fs.rmSync(uploadsDir, { recursive: true, force: true });
});

describe('a server killed in the middle of an upload', () => {
  it('leaves no file and no row once it has started again', async () => {
    await db.connect();
    const env = { DATABASE_URL: inject('e2eDatabaseUrl'), UPLOADS_DIR: uploadsDir };
    const first = await startServerProcess(env);
    servers.push(first);
    const session = await demoSession(first.baseUrl, 'writer');
    const image = await bigPhoto();
    expect(image.length).toBeGreaterThan(2 * 1024 * 1024);
    const fileName = `killed-upload-${Date.now()}.jpg`;

    const { req, answered } = startSlowUpload(first.baseUrl, session.cookie, image, fileName);
    // The server has begun writing the temporary file: that is the moment to pull the plug.
    await expect.poll(() => tmpFiles(uploadsDir).some((t) => t.size > 0), { timeout: 20_000 }).toBe(true);
    const killedPid = first.child.pid!;
    await stopServerProcess(first, 'SIGKILL');
    req.destroy();
    expect(answered, 'the server answered an upload it never fully received').toEqual([]);
    // What a crash leaves: a partial temporary file in the dead process's folder.
    const left = tmpFiles(uploadsDir);
    expect(left.length).toBe(1);
    expect(left[0].f).toContain(`_${killedPid}_`);
    expect(left[0].size).toBeLessThan(image.length);

    const second = await startServerProcess(env);
    servers.push(second);
    expect(storedFiles(uploadsDir), 'files under uploads (tmp, originals, renditions) after the start-up sweep').toEqual([]);
    expect(fs.readdirSync(path.join(uploadsDir, 'tmp'))).toEqual([]);
    const rows = await db.query('SELECT count(*)::int AS n FROM media WHERE file_name = $1', [fileName]);
    expect(rows.rows[0].n).toBe(0);
    const notes = await db.query('SELECT count(*)::int AS n FROM media_file_intents WHERE owner LIKE $1', [
      `%\\_${killedPid}\\_%`,
    ]);
    expect(notes.rows[0].n).toBe(0);

    // The restarted server works: the same session reads the library, and the image is not in it.
    const library = await fetch(`${second.baseUrl}/api/media?q=killed-upload`, { headers: { Cookie: session.cookie } });
    expect(library.status).toBe(200);
    expect(((await library.json()) as { data: Array<{ fileName: string }> }).data.map((m) => m.fileName)).not.toContain(fileName);
  });
});
