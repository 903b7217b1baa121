import type { JSONContent } from '@tiptap/core';
import supertest from 'supertest';
import type { Agent } from 'supertest';
import { Media, MediaRendition, type User } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from './app.ts';
import { doc, pageWithBody, paragraph, quasarWithStatements, statement, text } from './pages.ts';

type Signed = Awaited<ReturnType<typeof signedInAgent>>;

let n = 0;
const hex = (seed: string) => seed.repeat(64).slice(0, 64);

/** A library image ready for publishing, with thumbnail, page and both kiosk renditions (rows only). */
export async function buildKioskMedia(
  uploader: User,
  overrides: Partial<{ credit: string; licenceId: string | null; altText: string }> = {},
) {
  n += 1;
  const id = `${Date.now().toString(16)}${n.toString(16)}`;
  const media = await Media.create({
    sha256: hex(id),
    originalKey: `originals/${hex(id)}.jpg`,
    fileName: 'kiosk-test-nebula.jpg',
    format: 'jpeg',
    bytes: 5000,
    width: 4000,
    height: 2500,
    altText: overrides.altText ?? 'A reddish cloud of glowing gas with dark lanes of dust (test image)',
    credit: overrides.credit ?? 'Corrie Vale Observatory (demo)',
    licenceId: (overrides.licenceId === undefined ? 'cc-by-4.0' : overrides.licenceId) as never,
    sourceUrl: 'https://example.org/kiosk-test-image',
    focalX: 0.4,
    focalY: 0.6,
    renditionsStatus: 'ready',
    uploadedById: uploader.id,
  });
  const sizes = [
    ['thumbnail', 400, 250],
    ['page', 1600, 1000],
    ['kiosk-hd', 1920, 1080],
    ['kiosk-4k', 3840, 2160],
  ] as const;
  for (const [i, [name, width, height]] of sizes.entries()) {
    await MediaRendition.create({
      mediaId: media.id,
      name,
      format: 'jpeg',
      width,
      height,
      bytes: 1000,
      storageKey: `renditions/${hex(`${id}${i}`)}.jpg`,
    });
  }
  return media;
}

/** Desk staff for publishing tests: an editor and an admin (plus the writer and reviewer a page needs). */
export async function publishingCrew() {
  const [writer, reviewer, editor, admin] = await Promise.all([
    signedInAgent('writer'),
    signedInAgent('reviewer'),
    signedInAgent('editor'),
    signedInAgent('admin'),
  ]);
  return { writer, reviewer, editor, admin };
}

/**
 * A page written, signed off and published through the API, with two statements (and an image
 * when given).
 */
export async function publishedPage(
  crew: { writer: Signed; reviewer: Signed; editor: Signed },
  title: string,
  mediaId?: string,
  opening = 'A bright quasar you can find with a small telescope.',
  extra: { caption?: string; blocks?: JSONContent[]; phrase?: boolean } = {},
) {
  const q = await quasarWithStatements(crew.writer.agent, crew.writer.user);
  // With `phrase`, a phrase form of the distance inside a sentence of the writer's.
  const phrase = extra.phrase
    ? await crew.writer.agent.post('/api/statements').send({ objectId: q.object.id, templateId: 'distance-today-phrase' })
    : null;
  if (phrase && phrase.status >= 300) throw new Error(`phrase statement: ${JSON.stringify(phrase.body)}`);
  const phraseId = (phrase?.body.data.id as string | undefined) ?? null;
  const blocks = [
    ...(mediaId ? [{ type: 'mediaImage', attrs: { mediaId, caption: extra.caption ?? null } }] : []),
    ...(extra.blocks ?? []),
    paragraph(text(opening)),
    paragraph(statement(q.distanceId)),
    paragraph(statement(q.nakedEyeId)),
    ...(phraseId ? [paragraph(text('It lies '), statement(phraseId), text(' from us.'))] : []),
  ];
  const page = await pageWithBody(crew.writer.agent, q.object.id, doc(...blocks), title);
  const ok = (res: supertest.Response, what: string) => {
    if (res.status >= 300) throw new Error(`${what}: ${res.status} ${JSON.stringify(res.body)}`);
    return res;
  };
  ok(await crew.writer.agent.post(`/api/pages/${page.id}/submit`).send({ version: page.version }), 'submit');
  for (const id of [q.distanceId, q.nakedEyeId, ...(phraseId ? [phraseId] : [])])
    ok(
      await crew.reviewer.agent.post(`/api/pages/${page.id}/signoffs/statements`).send({ statementId: id }),
      'sign off statement',
    );
  ok(await crew.reviewer.agent.post(`/api/pages/${page.id}/signoffs/page`), 'sign off page');
  ok(await crew.editor.agent.post(`/api/pages/${page.id}/publish`), 'publish');
  return {
    pageId: page.id,
    statementIds: [q.distanceId, q.nakedEyeId],
    phraseId,
    distanceText: q.distanceText,
    objectName: q.object.name,
  };
}

/** A venue made by an admin through the API. */
export async function makeVenue(admin: Agent, name: string) {
  const res = await admin
    .post('/api/venues')
    .send({ name, latitude: 54.62, longitude: -2.95, elevationM: 160, timeZone: 'Europe/London' });
  if (res.status !== 201) throw new Error(`venue: ${JSON.stringify(res.body)}`);
  return res.body.data as { id: string; name: string };
}

/** A screen added by an admin and paired with its code: returns its id and Bearer token. */
export async function pairedScreen(admin: Agent, venueId: string, name: string) {
  const added = await admin.post(`/api/venues/${venueId}/screens`).send({ name });
  if (added.status !== 201) throw new Error(`screen: ${JSON.stringify(added.body)}`);
  const paired = await supertest(await getTestApp())
    .post('/api/kiosk/pair')
    .send({ code: added.body.data.pairingCode });
  if (paired.status !== 201) throw new Error(`pair: ${JSON.stringify(paired.body)}`);
  return { screenId: added.body.data.screen.id as string, token: paired.body.data.token as string };
}

/** A channel made by the editor at a venue, with one newly paired screen assigned to it. */
export async function channelWithScreen(
  crew: { editor: Signed; admin: Signed },
  venueId: string,
  name: string,
  screenName: string,
) {
  const channel = await crew.editor.agent.post('/api/channels').send({ venueId, name });
  if (channel.status !== 201) throw new Error(`channel: ${JSON.stringify(channel.body)}`);
  const screen = await pairedScreen(crew.admin.agent, venueId, screenName);
  const assigned = await crew.editor.agent
    .put(`/api/channels/${channel.body.data.id}/screens`)
    .send({ screenIds: [screen.screenId] });
  if (assigned.status !== 200) throw new Error(`assign: ${JSON.stringify(assigned.body)}`);
  return { channelId: channel.body.data.id as string, ...screen };
}

/**
 * What the feed and screen tests start from: an empty database, the four roles signed in, a venue,
 * and a way to make a channel there with one paired screen.
 * @param venueName the venue's name
 */
export async function freshPublishingDesk(venueName: string) {
  await getTestApp();
  await resetDatabase();
  const crew = await publishingCrew();
  const venue = await makeVenue(crew.admin.agent, venueName);
  return {
    crew,
    venue,
    channelWithScreen: (name: string, screenName: string) => channelWithScreen(crew, venue.id, name, screenName),
  };
}
export type PublishingDesk = Awaited<ReturnType<typeof freshPublishingDesk>>;

/** GET /api/kiosk/feed with a screen's token (and an If-None-Match when given). */
export async function getFeed(token: string, etag?: string) {
  let req = supertest(await getTestApp())
    .get('/api/kiosk/feed')
    .set('Authorization', `Bearer ${token}`);
  if (etag) req = req.set('If-None-Match', etag);
  return req;
}
