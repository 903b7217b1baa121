import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, ChannelSlide } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildKioskMedia, makeVenue, pairedScreen, publishedPage, publishingCrew } from '../support/publishing.ts';

type Crew = Awaited<ReturnType<typeof publishingCrew>>;
let crew: Crew;
let venue: { id: string };

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  crew = await publishingCrew();
  venue = await makeVenue(crew.admin.agent, 'Channel Test Dome');
});

const newChannel = async (name: string) => {
  const res = await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.data as { id: string; version: number };
};

describe('channels', () => {
  it('only editors and admins build channels; anonymous callers are asked to sign in', async () => {
    expect((await supertest(await getTestApp()).get('/api/channels')).status).toBe(401);
    for (const role of ['writer', 'reviewer'] as const) {
      const { agent } = await signedInAgent(role);
      expect((await agent.get('/api/channels')).status).toBe(403);
      expect((await agent.post('/api/channels').send({ venueId: venue.id, name: 'Nope' })).status).toBe(403);
    }
    const created = await crew.admin.agent.post('/api/channels').send({ venueId: venue.id, name: 'Admin channel' });
    expect(created.status).toBe(201);
    expect(created.body.data).toMatchObject({ name: 'Admin channel', slides: [], can: { update: true, delete: true } });
    expect((await crew.editor.agent.get('/api/channels')).body.data.map((c: { name: string }) => c.name)).toContain(
      'Admin channel',
    );
  });

  it('explains bad input: empty or duplicate names, unknown venues, unknown ids', async () => {
    const blank = await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name: '  ' });
    expect(blank.status).toBe(400);
    expect(blank.body.error.fields.name).toBe('Enter a name for the channel');
    await newChannel('Lobby');
    const dup = await crew.editor.agent.post('/api/channels').send({ venueId: venue.id, name: 'LOBBY' });
    expect(dup.status).toBe(409);
    expect(dup.body.error.code).toBe('channel_name_taken');
    const noVenue = await crew.editor.agent
      .post('/api/channels')
      .send({ venueId: '00000000-0000-4000-8000-000000000000', name: 'Ghost' });
    expect(noVenue.status).toBe(400);
    expect(noVenue.body.error.fields.venueId).toBe('There is no such venue');
    expect((await crew.editor.agent.get('/api/channels/not-an-id')).status).toBe(404);
  });

  it('adds slides with clamped durations; refuses unpublished pages, foreign statements, uncredited images and bad windows', async () => {
    const channel = await newChannel('Slides');
    const page = await publishedPage(crew, 'Checked page');
    const other = await publishedPage(crew, 'Another page');
    const add = (body: object) => crew.editor.agent.post(`/api/channels/${channel.id}/slides`).send(body);

    const short = await add({ kind: 'sky_tonight', durationS: 1 });
    expect(short.status).toBe(201);
    expect(short.body.data.slides[0].durationS).toBe(5);
    expect((await add({ kind: 'sky_tonight', durationS: 9999 })).body.data.slides[1].durationS).toBe(120);
    expect((await add({ kind: 'sky_tonight', durationS: 'long' })).status).toBe(400);
    expect((await add({ kind: 'video' })).body.error.message).toMatch(/page, image or sky_tonight/);

    const foreign = await add({ kind: 'page', pageId: page.pageId, statementIds: [other.statementIds[0]] });
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.code).toBe('statement_not_on_page');
    expect((await crew.editor.agent.post(`/api/pages/${other.pageId}/unpublish`)).status).toBe(200);
    const unpublished = await add({ kind: 'page', pageId: other.pageId });
    expect(unpublished.status).toBe(400);
    expect(unpublished.body.error.code).toBe('page_not_published');

    const bare = await buildKioskMedia(crew.editor.user, { credit: '', licenceId: null });
    const uncredited = await add({ kind: 'image', mediaId: bare.id });
    expect(uncredited.status).toBe(400);
    expect(uncredited.body.error.code).toBe('media_not_ready');
    expect(uncredited.body.error.message).toMatch(/a credit, a licence/);

    const backwards = await add({ kind: 'sky_tonight', startsAt: '2026-12-24T18:00:00Z', endsAt: '2026-12-24T17:00:00Z' });
    expect(backwards.status).toBe(400);
    expect(backwards.body.error.fields.endsAt).toBe('The end must be after the start');
    expect((await add({ kind: 'sky_tonight', startsAt: 'Christmas Eve' })).body.error.message).toMatch(/ISO 8601/);

    const ok = await add({ kind: 'page', pageId: page.pageId, statementIds: page.statementIds, durationS: 30 });
    expect(ok.status).toBe(201);
    const slide = ok.body.data.slides.at(-1);
    expect(slide).toMatchObject({
      kind: 'page',
      page: { id: page.pageId, title: 'Checked page' },
      statementIds: page.statementIds,
      state: 'showing',
    });
    const changed = await crew.editor.agent
      .patch(`/api/channels/${channel.id}/slides/${slide.id}`)
      .send({ startsAt: '2099-01-01T00:00:00Z', durationS: 45 });
    expect(changed.status).toBe(200);
    expect(changed.body.data.slides.at(-1)).toMatchObject({ durationS: 45, state: 'scheduled' });
    const tooEarly = await crew.editor.agent
      .patch(`/api/channels/${channel.id}/slides/${slide.id}`)
      .send({ endsAt: '2098-01-01T00:00:00Z' });
    expect(tooEarly.status).toBe(400);
    expect(await AuditEvent.count({ where: { action: 'channel.slide_added', subjectId: channel.id } })).toBe(3);
  });

  it('reorders slides as a whole list and refuses a stale one; removing closes the gap', async () => {
    const channel = await newChannel('Order');
    const ids: string[] = [];
    for (let i = 0; i < 3; i += 1)
      ids.push(
        (
          await crew.editor.agent.post(`/api/channels/${channel.id}/slides`).send({ kind: 'sky_tonight', durationS: 10 + i })
        ).body.data.slides.at(-1).id,
      );
    const reordered = await crew.editor.agent
      .put(`/api/channels/${channel.id}/slide-order`)
      .send({ slideIds: [ids[2], ids[0], ids[1]] });
    expect(reordered.status).toBe(200);
    expect(reordered.body.data.slides.map((s: { id: string }) => s.id)).toEqual([ids[2], ids[0], ids[1]]);
    const stale = await crew.editor.agent.put(`/api/channels/${channel.id}/slide-order`).send({ slideIds: [ids[0], ids[1]] });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('slides_changed');
    const twice = await crew.editor.agent
      .put(`/api/channels/${channel.id}/slide-order`)
      .send({ slideIds: [ids[0], ids[0], ids[1]] });
    expect(twice.status).toBe(409);
    const removed = await crew.editor.agent.delete(`/api/channels/${channel.id}/slides/${ids[2]}`);
    expect(removed.body.data.slides.map((s: { id: string; position: number }) => [s.id, s.position])).toEqual([
      [ids[0], 0],
      [ids[1], 1],
    ]);
    expect((await crew.editor.agent.delete(`/api/channels/${channel.id}/slides/${ids[2]}`)).status).toBe(404);
  });

  it('a screen shows one channel: assigning moves it; an image in a channel cannot be deleted', async () => {
    const a = await newChannel('Channel A');
    const b = await newChannel('Channel B');
    const screen = await pairedScreen(crew.admin.agent, venue.id, 'Moving screen');
    expect((await crew.editor.agent.put(`/api/channels/${a.id}/screens`).send({ screenIds: [screen.screenId] })).status).toBe(
      200,
    );
    const moved = await crew.editor.agent.put(`/api/channels/${b.id}/screens`).send({ screenIds: [screen.screenId] });
    expect(moved.body.data.screens.map((s: { id: string }) => s.id)).toEqual([screen.screenId]);
    expect((await crew.editor.agent.get(`/api/channels/${a.id}`)).body.data.screens).toEqual([]);
    expect(
      (await crew.editor.agent.put(`/api/channels/${b.id}/screens`).send({ screenIds: [screen.screenId, screen.screenId] }))
        .status,
    ).toBe(400);

    const image = await buildKioskMedia(crew.editor.user);
    await crew.editor.agent.post(`/api/channels/${b.id}/slides`).send({ kind: 'image', mediaId: image.id, caption: 'Kept' });
    const del = await crew.admin.agent.delete(`/api/media/${image.id}`);
    expect(del.status).toBe(409);
    const usage = await crew.editor.agent.get(`/api/media/${image.id}`);
    expect(JSON.stringify(usage.body.data.usage)).toContain('Kiosk channel: Channel B');

    expect((await crew.editor.agent.delete(`/api/channels/${b.id}`)).status).toBe(204);
    expect(await ChannelSlide.count({ where: { channelId: b.id } })).toBe(0);
    expect((await crew.editor.agent.get(`/api/channels/${b.id}`)).status).toBe(404);
  });

  it('gives staff the preview feed and the sources a slide can be made from', async () => {
    const channel = await newChannel('Preview');
    await crew.editor.agent.post(`/api/channels/${channel.id}/slides`).send({ kind: 'sky_tonight' });
    const preview = await crew.editor.agent.get(`/api/channels/${channel.id}/preview-feed`);
    expect(preview.status).toBe(200);
    expect(JSON.parse(preview.text).items).toHaveLength(1);
    const { agent: writer } = await signedInAgent('writer');
    expect((await writer.get(`/api/channels/${channel.id}/preview-feed`)).status).toBe(403);
    const sources = await crew.editor.agent.get('/api/channels/slide-sources');
    expect(sources.status).toBe(200);
    expect(sources.body.data.pages.map((p: { title: string }) => p.title)).toContain('Checked page');
    expect(sources.body.data.pages[0].statements[0]).toHaveProperty('text');
  });
});
