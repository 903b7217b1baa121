import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.UPLOADS_DIR ??= '.data/test-uploads';
});

import fs from 'node:fs';
import path from 'node:path';
import { config } from '../../server/config.ts';
import { getSequelize } from '../../server/db.ts';
import { AuditEvent, Media } from '../../server/models/index.ts';
import { noteFiles } from '../../server/services/media/media-file-journal.ts';
import { sweepOrphanMedia } from '../../server/services/media/media-sweep.ts';
import {
  isMediaReadyForPublishing,
  registerMediaUsageProvider,
  unregisterMediaUsageProvider,
} from '../../server/services/media/media-usage.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { clearUploads, solidImage, storedFiles, upload } from '../support/media.ts';

const objects = { andromeda: randomUUID(), orion: randomUUID() };
let writer: Awaited<ReturnType<typeof signedInAgent>>;
let ids: { galaxy: string; nebula: string; moon: string };

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  clearUploads();
  const q = getSequelize();
  await q.query(
    `INSERT INTO sky_objects (id, name, designations, kind, created_at, updated_at) VALUES
      (:a, 'Andromeda Galaxy', ARRAY['M31','NGC 224'], 'galaxy', now(), now()),
      (:o, 'Orion Nebula', ARRAY['M42'], 'nebula', now(), now())`,
    { replacements: { a: objects.andromeda, o: objects.orion } },
  );
  writer = await signedInAgent('writer');
  const up = async (colour: string, name: string, fields: Record<string, string>) =>
    (await upload(writer.agent, await solidImage(640, 360, colour), name, fields)).body.data.id as string;
  ids = {
    galaxy: await up('#101830', 'm31-wide.jpg', {
      credit: 'Corrie Vale Astro Society (demo)',
      licenceId: 'cc-by-4.0',
      altText: 'A faint oval glow',
    }),
    nebula: await up('#301018', 'orion.jpg', { credit: 'Demo Observatory 50% archive', licenceId: 'cc0-1.0' }),
    moon: await up('#303030', 'moon.jpg', {}),
  };
  await writer.agent.patch(`/api/media/${ids.galaxy}`).send({ objectIds: [objects.andromeda] });
  await writer.agent.patch(`/api/media/${ids.nebula}`).send({ objectIds: [objects.orion] });
});

afterAll(() => unregisterMediaUsageProvider('test-pages'));

const found = async (query: string) =>
  ((await writer.agent.get(`/api/media?${query}`)).body.data as Array<{ id: string }>).map((m) => m.id).sort();

describe('the library', () => {
  it('lists newest first with paging and the upload limits', async () => {
    const res = await writer.agent.get('/api/media');
    expect(res.status).toBe(200);
    expect(res.body.data.map((m: { id: string }) => m.id)).toEqual([ids.moon, ids.nebula, ids.galaxy]);
    expect(res.body.meta).toMatchObject({ total: 3, page: 1, uploadMaxBytes: 100 * 1024 * 1024, maxMegapixels: 100 });
    expect(res.body.data[2]).toMatchObject({
      credit: 'Corrie Vale Astro Society (demo)',
      licence: { id: 'cc-by-4.0', label: 'CC BY 4.0' },
      objects: [{ name: 'Andromeda Galaxy' }],
    });
  });

  it('searches by object name or designation, credit and licence', async () => {
    expect(await found('object=andromeda')).toEqual([ids.galaxy]);
    expect(await found('object=M42')).toEqual([ids.nebula]);
    expect(await found('q=ngc%20224')).toEqual([ids.galaxy]);
    expect(await found('credit=astro%20society')).toEqual([ids.galaxy]);
    // "%" is searched for as a character, not as a wildcard.
    expect(await found('credit=50%25')).toEqual([ids.nebula]);
    expect(await found('licence=cc0-1.0')).toEqual([ids.nebula]);
    expect(await found('licence=none')).toEqual([ids.moon]);
    expect(await found('q=oval')).toEqual([ids.galaxy]);
    const bad = await writer.agent.get('/api/media?licence=cc-by-99');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.licence).toBe('Choose a licence from the list');
  });

  it('suggests objects for the picker', async () => {
    const res = await writer.agent.get('/api/media/object-suggestions?q=m3');
    expect(res.body.data).toEqual([{ id: objects.andromeda, name: 'Andromeda Galaxy' }]);
  });
});

describe('details and readiness for publishing', () => {
  it('says what is missing until credit, licence, source, alt text and renditions are all there', async () => {
    expect(await isMediaReadyForPublishing(ids.moon)).toEqual({
      ready: false,
      missing: ['credit', 'licence', 'sourceUrl', 'altText'],
    });
    const res = await writer.agent.patch(`/api/media/${ids.moon}`).send({
      credit: 'Corrie Vale Planetarium (demo)',
      licenceId: 'all-rights-reserved-permission',
      sourceUrl: 'https://example.org/moon',
      altText: 'The first-quarter Moon',
    });
    expect(res.status).toBe(200);
    expect(res.body.data.missing).toEqual([]);
    expect(await isMediaReadyForPublishing(ids.moon)).toEqual({ ready: true, missing: [] });
    expect(await isMediaReadyForPublishing(randomUUID())).toMatchObject({ ready: false });
    expect(await AuditEvent.count({ where: { action: 'media.updated', subjectId: ids.moon } })).toBe(1);
  });

  it.each([
    [{ sourceUrl: 'javascript:alert(1)' }, 'sourceUrl', /https:\/\//],
    [{ licenceId: 'cc-by-3.0' }, 'licenceId', /Choose a licence/],
    [{ focalPoint: { x: 1.5, y: 0.5 } }, 'focalPoint.x', /from 0 to 1/],
    [{ altText: 'x'.repeat(1001) }, 'altText', /at most 1000/],
    [{ objectIds: ['not-an-id'] }, 'objectIds.0', /valid id/],
    [{ fileName: 'renamed.jpg' }, '_', /Unrecognized key/i],
    [{}, '_', /Nothing to change/],
  ])('refuses %j and changes nothing', async (body, field, message) => {
    const before = (await Media.findByPk(ids.galaxy))!.toJSON();
    const res = await writer.agent.patch(`/api/media/${ids.galaxy}`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.fields[field]).toMatch(message);
    expect((await Media.findByPk(ids.galaxy))!.toJSON()).toEqual(before);
  });

  it('refuses an object that is not in the catalogue, keeping the old links', async () => {
    const res = await writer.agent.patch(`/api/media/${ids.galaxy}`).send({ objectIds: [randomUUID()], credit: 'changed' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.objectIds).toMatch(/not in the catalogue/);
    const after = await writer.agent.get(`/api/media/${ids.galaxy}`);
    expect(after.body.data).toMatchObject({ credit: 'Corrie Vale Astro Society (demo)', objects: [{ id: objects.andromeda }] });
  });

  it('reports the renditions status and can make them again', async () => {
    const status = await writer.agent.get(`/api/media/${ids.galaxy}/renditions`);
    expect(status.body.data).toMatchObject({ status: 'ready', error: null });
    expect(status.body.data.renditions).toHaveLength(12);
    const again = await writer.agent.post(`/api/media/${ids.galaxy}/renditions`);
    expect(again.status).toBe(202);
    expect(again.body.data.status).toBe('ready');
  });
});

describe('where used, and deleting', () => {
  it('shows where an image is used and refuses to delete it then', async () => {
    registerMediaUsageProvider('test-pages', async (mediaId) =>
      mediaId === ids.nebula ? [{ kind: 'page', id: 'p1', title: 'The Orion Nebula' }] : [],
    );
    const { agent: editor } = await signedInAgent('editor');
    expect((await editor.get(`/api/media/${ids.nebula}`)).body.data.usage).toEqual([
      { kind: 'page', id: 'p1', title: 'The Orion Nebula' },
    ]);
    const res = await editor.delete(`/api/media/${ids.nebula}`);
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'in_use', message: expect.stringContaining('page “The Orion Nebula”') });
    expect(await Media.count({ where: { id: ids.nebula } })).toBe(1);
  });

  it('a writer may delete their own unused upload, not someone else’s', async () => {
    const other = await signedInAgent('writer');
    const res = await other.agent.delete(`/api/media/${ids.moon}`);
    expect(res.status).toBe(403);
    expect((await other.agent.get(`/api/media/${ids.moon}`)).body.data.can).toEqual({ update: true, delete: false });
    const urls = ((await writer.agent.get(`/api/media/${ids.moon}`)).body.data.renditions as Array<{ url: string }>).map(
      (r) => r.url,
    );
    const original = (await Media.findByPk(ids.moon))!.originalKey;
    expect(storedFiles()).toContain(original);
    expect((await writer.agent.delete(`/api/media/${ids.moon}`)).status).toBe(204);
    // The original and every rendition file are gone.
    expect(storedFiles()).not.toContain(original);
    for (const url of urls) expect((await supertest(await getTestApp()).get(url)).status).toBe(404);
    expect(await AuditEvent.count({ where: { action: 'media.deleted', subjectId: ids.moon } })).toBe(1);
  });

  it('an editor may delete anyone’s unused image; a reviewer may upload and describe but not delete others’', async () => {
    const { agent: reviewer } = await signedInAgent('reviewer');
    expect((await reviewer.patch(`/api/media/${ids.galaxy}`).send({ altText: 'The Andromeda Galaxy' })).status).toBe(200);
    expect((await reviewer.delete(`/api/media/${ids.galaxy}`)).status).toBe(403);
    const { agent: editor } = await signedInAgent('editor');
    expect((await editor.delete(`/api/media/${ids.galaxy}`)).status).toBe(204);
    expect((await editor.get(`/api/media/${ids.galaxy}`)).status).toBe(404);
  });

  it('anonymous visitors get 401 from every media endpoint', async () => {
    const anon = supertest(await getTestApp());
    for (const res of [
      await anon.get('/api/media'),
      await anon.get(`/api/media/${ids.nebula}`),
      await anon.patch(`/api/media/${ids.nebula}`).send({ credit: 'x' }),
      await anon.delete(`/api/media/${ids.nebula}`),
    ]) {
      expect(res.status).toBe(401);
    }
  });
});

describe('the start-up sweep', () => {
  it('removes what an interrupted upload left behind, and nothing in use or too young', async () => {
    const tmp = path.join(config.uploadsDir, 'tmp');
    fs.mkdirSync(tmp, { recursive: true });
    const oldTemp = path.join(tmp, 'upload-left-over');
    fs.writeFileSync(oldTemp, 'partial');
    const past = new Date(Date.now() - 60 * 60_000);
    fs.utimesSync(oldTemp, past, past);
    const youngTemp = path.join(tmp, 'upload-in-progress');
    fs.writeFileSync(youngTemp, 'partial');

    // An original stored by an upload that crashed before its row was written.
    const orphanKey = `originals/${'ab'.repeat(32)}.jpg`;
    fs.mkdirSync(path.join(config.uploadsDir, 'originals'), { recursive: true });
    fs.writeFileSync(path.join(config.uploadsDir, orphanKey), 'orphan');
    await noteFiles([orphanKey]);
    // A file in use that is (wrongly) still noted must survive.
    const inUse = (await Media.findByPk(ids.nebula))!.originalKey;
    await noteFiles([inUse]);
    await getSequelize().query("UPDATE media_file_intents SET created_at = now() - interval '1 hour'");

    const report = await sweepOrphanMedia();
    expect(report).toEqual({ temporary: 1, settled: 2 });
    expect(fs.existsSync(oldTemp)).toBe(false);
    expect(fs.existsSync(youngTemp)).toBe(true);
    expect(fs.existsSync(path.join(config.uploadsDir, orphanKey))).toBe(false);
    expect(fs.existsSync(path.join(config.uploadsDir, inUse))).toBe(true);
    // A file this database never noted (another installation's) is never touched.
    const foreign = path.join(config.uploadsDir, 'originals', `${'cd'.repeat(32)}.jpg`);
    fs.writeFileSync(foreign, 'someone else’s');
    fs.utimesSync(foreign, past, past);
    await sweepOrphanMedia({ graceMs: 0 });
    expect(fs.existsSync(foreign)).toBe(true);
    expect(fs.existsSync(youngTemp)).toBe(false);
  });
});
