import sharp from 'sharp';
import supertest from 'supertest';
import { beforeAll, beforeEach, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.UPLOADS_DIR ??= '.data/test-uploads';
});

import { AuditEvent, Media } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { animated, clearUploads, declaredHugePng, solidImage, storedFiles, upload } from '../support/media.ts';

let agent: Awaited<ReturnType<typeof signedInAgent>>['agent'];

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  ({ agent } = await signedInAgent('writer'));
});

beforeEach(async () => {
  await Media.destroy({ where: {} });
  await AuditEvent.destroy({ where: { action: 'media.uploaded' } });
  clearUploads();
});

/** Nothing stored: no row, no audit event, no file (not even in tmp/). */
async function expectNothingStored() {
  expect(await Media.count()).toBe(0);
  expect(await AuditEvent.count({ where: { action: 'media.uploaded' } })).toBe(0);
  expect(storedFiles()).toEqual([]);
}

async function expectRefused(res: supertest.Response, status: number, code: string, message: RegExp) {
  expect(res.status).toBe(status);
  expect(res.body.error.code).toBe(code);
  expect(res.body.error.message).toMatch(message);
  await expectNothingStored();
}

/** Sends a hand-built multipart body, for part headers a form library would not write. */
function multipartWithHeader(disposition: string, data: Buffer) {
  const boundary = 'starproof-test-boundary';
  const body = Buffer.concat([
    Buffer.from(`--${boundary}\r\nContent-Disposition: ${disposition}\r\nContent-Type: image/jpeg\r\n\r\n`, 'utf8'),
    data,
    Buffer.from(`\r\n--${boundary}--\r\n`),
  ]);
  return agent.post('/api/media').set('Content-Type', `multipart/form-data; boundary=${boundary}`).send(body);
}

describe('refusing bad uploads with a clear message and nothing stored', () => {
  it('a text file named .jpg', async () => {
    const res = await upload(
      agent,
      Buffer.from('Observing log, 14 March: clear skies, seeing 3/5.\n'.repeat(20)),
      'observing-log.jpg',
    );
    await expectRefused(res, 400, 'not_an_image', /not an image .* whatever its name says/);
  });

  it('a truncated JPEG (the header is intact, the picture is cut off)', async () => {
    const noisy = await sharp({
      create: {
        width: 1600,
        height: 1200,
        channels: 3,
        background: '#000000',
        noise: { type: 'gaussian', mean: 120, sigma: 50 },
      },
    })
      .jpeg()
      .toBuffer();
    const res = await upload(agent, noisy.subarray(0, Math.floor(noisy.length / 2)), 'cut-off.jpg');
    await expectRefused(res, 400, 'damaged_image', /damaged or incomplete/);
  });

  it('an SVG, even with an innocent name (scripts never reach a parser)', async () => {
    const svg =
      '<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="100" height="100"><script>alert(document.cookie)</script><circle cx="50" cy="50" r="40"/></svg>';
    const res = await upload(agent, Buffer.from(svg), 'orion.png');
    await expectRefused(res, 400, 'svg_refused', /SVG drawings are not accepted.*Export the drawing as PNG/);
    const bare = await upload(agent, Buffer.from('\uFEFF  <svg xmlns="http://www.w3.org/2000/svg"/>'), 'bare.svg');
    await expectRefused(bare, 400, 'svg_refused', /SVG/);
  });

  it('an image declaring 30,000 × 30,000 pixels in a small file', async () => {
    const bomb = declaredHugePng(30_000, 30_000);
    expect(bomb.length).toBeLessThan(2_000);
    const res = await upload(agent, bomb, 'bomb.png');
    await expectRefused(res, 400, 'too_many_pixels', /30,000 × 30,000 pixels \(900 megapixels\); the limit is 100 megapixels/);
  });

  it('a zero-byte file', async () => {
    const res = await upload(agent, Buffer.alloc(0), 'empty.jpg');
    await expectRefused(res, 400, 'empty_file', /empty/);
  });

  it('a 200 MB file over the 100 MB limit', async () => {
    const big = Buffer.alloc(200 * 1024 * 1024, 0xff);
    big.set([0xff, 0xd8, 0xff, 0xe0]);
    const res = await upload(agent, big, 'huge.jpg');
    await expectRefused(res, 413, 'file_too_large', /larger than the 100 MB limit/);
  });

  it('a 200 MB file without a Content-Length is stopped at the limit while streaming', async () => {
    // Chunked transfer: the server cannot refuse up front, so multer stops at 100 MB and removes its partial file.
    const app = await getTestApp();
    const { user } = await signedInAgent('writer');
    const boundary = 'starproof-test-boundary';
    const head = Buffer.from(
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="stream.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`,
    );
    const tail = Buffer.from(`\r\n--${boundary}--\r\n`);
    const server = app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    try {
      const { port } = server.address() as { port: number };
      const signIn = await fetch(`http://127.0.0.1:${port}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: user.email, password: 'glass-telescope-42' }),
      });
      const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
      const chunk = Buffer.alloc(4 * 1024 * 1024, 0xab);
      let sent = 0;
      const body = new ReadableStream({
        start(controller) {
          controller.enqueue(head);
        },
        pull(controller) {
          if (sent >= 200 * 1024 * 1024) {
            controller.enqueue(tail);
            controller.close();
            return;
          }
          sent += chunk.length;
          controller.enqueue(chunk);
        },
      });
      const res = await fetch(`http://127.0.0.1:${port}/api/media`, {
        method: 'POST',
        headers: { Cookie: cookie, 'Content-Type': `multipart/form-data; boundary=${boundary}` },
        body,
        duplex: 'half',
      } as RequestInit);
      expect(res.status).toBe(413);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe('file_too_large');
    } finally {
      server.close();
    }
    await expectNothingStored();
  });

  it.each([['../../etc/passwd.jpg'], ['..\\..\\windows\\win.ini.jpg'], ['/var/lib/starproof/x.jpg']])(
    'a file name with path separators: %j',
    async (name) => {
      const res = await upload(agent, await solidImage(200, 100, '#102030'), name);
      await expectRefused(res, 400, 'unsafe_file_name', /path separators or control characters/);
    },
  );

  it.each([['night%07sky.jpg'], ['night%00sky.jpg'], ['moon%1B%5B31m.jpg'], ['tab%09bed.jpg'], ['c1%C2%85.jpg']])(
    'a file name with control characters, percent-encoded as RFC 5987 allows: %s',
    async (encoded) => {
      const img = await solidImage(200, 100, '#102030');
      const res = await multipartWithHeader(`form-data; name="file"; filename*=UTF-8''${encoded}`, img);
      await expectRefused(res, 400, 'unsafe_file_name', /path separators or control characters/);
    },
  );

  it.each([['night\u0007sky.jpg'], ['moon\u001b[31m.jpg'], ['line\rbreak.jpg']])(
    'a raw control character in the part header: %j',
    async (name) => {
      const res = await multipartWithHeader(`form-data; name="file"; filename="${name}"`, await solidImage(200, 100, '#102030'));
      expect(res.status).toBe(400);
      expect(['malformed_upload', 'unsafe_file_name']).toContain(res.body.error.code);
      expect(res.body.error.message).toMatch(/control characters/);
      await expectNothingStored();
    },
  );

  it.each(['gif', 'webp'] as const)('an animated %s (refused: kiosk slides must not flash)', async (format) => {
    const res = await upload(agent, await animated(format), `blink.${format}`);
    await expectRefused(res, 400, 'animated_refused', /Animated images are not accepted.*WCAG 2\.3\.1/);
  });

  it('a still GIF is fine', async () => {
    const still = await sharp({ create: { width: 120, height: 80, channels: 3, background: '#203040' } })
      .gif()
      .toBuffer();
    const res = await upload(agent, still, 'still.gif');
    expect(res.status).toBe(201);
    await Media.destroy({ where: {} });
  });

  it('a form without a file, or with two', async () => {
    await expectRefused(await agent.post('/api/media').field('altText', 'x'), 400, 'no_file', /Choose an image file/);
    const img = await solidImage(10, 10, '#000000');
    const two = await agent.post('/api/media').attach('file', img, 'a.jpg').attach('file', img, 'b.jpg');
    await expectRefused(two, 400, 'one_file', /one image per upload/);
  });

  it('a bad licence or source address in the upload fields', async () => {
    const img = await solidImage(300, 200, '#445566');
    await expectRefused(
      await upload(agent, img, 'a.jpg', { licenceId: 'cc-by-99' }),
      400,
      'invalid_input',
      /Choose a licence from the list/,
    );
    await expectRefused(
      await upload(agent, img, 'a.jpg', { sourceUrl: 'javascript:alert(1)' }),
      400,
      'invalid_input',
      /https:\/\//,
    );
  });

  it('anonymous visitors get 401 and upload nothing', async () => {
    const res = await upload(supertest.agent(await getTestApp()), await solidImage(10, 10, '#000000'), 'a.jpg');
    await expectRefused(res, 401, 'not_signed_in', /Sign in/);
  });
});
