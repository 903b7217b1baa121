import { randomUUID } from 'node:crypto';
import supertest from 'supertest';
import type { Role } from '../../shared/roles.ts';
import { getTestApp, signedInAgent } from './app.ts';
import { buildMeasurement, buildSource } from './catalogue.ts';
import { buildMedia, doc, pageWithBody, paragraph, quasarWithStatements, statement, text } from './pages.ts';
import { makeVenue, pairedScreen } from './publishing.ts';

type Signed = Awaited<ReturnType<typeof signedInAgent>>;

/** Who calls a route in the access matrix. */
export type Caller = Role | 'anonymous' | 'kiosk';
export const CALLERS: Caller[] = ['anonymous', 'kiosk', 'writer', 'reviewer', 'editor', 'admin'];

/**
 * Real rows for every id a route takes, so a refusal is the policy's and not a 404 for a missing
 * row: a draft page by a writer who is not among the callers, a venue with a paired screen and a
 * channel, a catalogue object with a source and a measurement, an image, a statement, a user.
 */
export async function buildAccessWorld() {
  const roles: Role[] = ['writer', 'reviewer', 'editor', 'admin'];
  const signed = Object.fromEntries(await Promise.all(roles.map(async (r) => [r, await signedInAgent(r)] as const))) as Record<
    Role,
    Signed
  >;
  const owner = await signedInAgent('writer');
  const target = await signedInAgent('writer');
  const quasar = await quasarWithStatements(owner.agent, owner.user);
  const object = quasar.object;
  const source = await buildSource({ citation: 'Access matrix test values (invented)' });
  const measurement = await buildMeasurement(object.id, { sourceId: source.id, quantity: 'parallax', value: 1.5 });
  const page = await pageWithBody(
    owner.agent,
    object.id,
    doc(paragraph(text('An unsubmitted draft of another writer.'))),
    'Another writer’s draft',
  );
  // A second page, submitted for review, for the routes that only act on a page in review.
  const inReview = await pageWithBody(
    owner.agent,
    object.id,
    doc(paragraph(text('A page in review. '), statement(quasar.distanceId))),
    'A page in review',
  );
  const submitted = await owner.agent.post(`/api/pages/${inReview.id}/submit`).send({ version: inReview.version });
  if (submitted.status !== 200) throw new Error(`submit: ${JSON.stringify(submitted.body)}`);
  const media = await buildMedia(owner.user);
  const venue = await makeVenue(signed.admin.agent, 'Access matrix dome (demo)');
  const otherVenue = await makeVenue(signed.admin.agent, 'Access matrix other dome (demo)');
  const screen = await pairedScreen(signed.admin.agent, venue.id, 'Foyer');
  const otherScreen = await pairedScreen(signed.admin.agent, otherVenue.id, 'Lobby');
  const channel = await signed.admin.agent.post('/api/channels').send({ venueId: venue.id, name: 'Access matrix channel' });
  if (channel.status !== 201) throw new Error(`channel: ${JSON.stringify(channel.body)}`);
  const slide = await signed.admin.agent.post(`/api/channels/${channel.body.data.id}/slides`).send({ kind: 'sky_tonight' });
  if (slide.status !== 201) throw new Error(`slide: ${JSON.stringify(slide.body)}`);
  // A checked CSV import whose one row is rejected, so the import routes meet a real row and committing it changes nothing.
  const checked = await signed.admin.agent
    .post('/api/catalogue/imports')
    .attach('file', Buffer.from('object,quantity,value\nNo Such Object (demo),redshift,0.2\n', 'utf8'), 'access-matrix.csv');
  if (checked.status !== 201) throw new Error(`import: ${JSON.stringify(checked.body)}`);
  // A source proposed by a writer who is not among the callers, for the review route.
  const proposal = await owner.agent
    .post('/api/catalogue/proposals/sources')
    .send({ citation: 'Access matrix proposed source (invented)', url: 'https://example.test/access-matrix' });
  if (proposal.status !== 201) throw new Error(`proposal: ${JSON.stringify(proposal.body)}`);
  const timelineEntry = await signed.admin.agent.post('/api/timeline').send(timelineSample('Access matrix entry'));
  if (timelineEntry.status !== 201) throw new Error(`timeline: ${JSON.stringify(timelineEntry.body)}`);
  const ids: Record<string, string> = {
    import: checked.body.data.id,
    proposal: proposal.body.data.id,
    timeline: timelineEntry.body.data.id,
    page: page.id,
    reviewPage: inReview.id,
    slide: slide.body.data.slides[0].id,
    statement: quasar.nakedEyeId,
    media: String(media.id),
    object: String(object.id),
    measurement: String(measurement.id),
    source: String(source.id),
    venue: venue.id,
    screen: screen.screenId,
    channel: channel.body.data.id,
    user: String(target.user.id),
  };
  return { signed, owner, target, ids, kioskToken: screen.token, otherVenue, otherScreen, page };
}

/** A valid timeline entry (invented values, for access checks only). */
function timelineSample(label: string) {
  const phrase = 'around the time of an invented event used only by the access tests';
  return {
    label,
    yearsAgo: 1e6,
    uncertaintyYears: 1e4,
    relation: 'around',
    phrases: { 'en-GB': phrase, 'en-US': phrase, 'fr-FR': 'à l’époque d’un événement inventé pour les tests' },
    sourceCitation: 'Invented for the access tests',
  };
}

/** Fills a path template with the world's ids (random UUIDs where no row is needed). */
export function fillPath(template: string, ids: Record<string, string>): string {
  const byPrefix: Array<[RegExp, string]> = [
    [/^\/api\/users\/:id/, ids.user],
    [/^\/api\/pages\/:id\/(send-back|signoffs\/\w+|flags|publish|unpublish)$/, ids.reviewPage],
    [/^\/api\/pages\/:id/, ids.page],
    [/^\/api\/statements\/:id/, ids.statement],
    [/^\/api\/media\/:id/, ids.media],
    [/^\/api\/catalogue\/objects\/:id/, ids.object],
    [/^\/api\/catalogue\/measurements\/:id/, ids.measurement],
    [/^\/api\/catalogue\/sources\/:id/, ids.source],
    [/^\/api\/venues\/:id/, ids.venue],
    [/^\/api\/channels\/:id/, ids.channel],
    [/^\/api\/catalogue\/imports\/:id/, ids.import],
    [/^\/api\/catalogue\/proposals\/:id/, ids.proposal],
    [/^\/api\/timeline\/:id/, ids.timeline],
  ];
  let path = template;
  for (const [re, id] of byPrefix) if (re.test(path)) path = path.replace(':id', id);
  return path
    .replace(':venueId', ids.venue)
    .replace(':screenId', ids.screen)
    .replace(':slideId', ids.slide)
    .replace(':number', '1')
    .replace(':name', `${'ab'.repeat(32)}.jpg`)
    .replace(/:[A-Za-z]+/g, () => randomUUID());
}

/** One request by a caller: a cookie session, a kiosk Bearer token, or nothing. */
export async function callAs(
  caller: Caller,
  world: Awaited<ReturnType<typeof buildAccessWorld>>,
  method: string,
  path: string,
  body: object | undefined,
  freshSession = false,
) {
  const m = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  let req: supertest.Test;
  if (caller === 'anonymous' || caller === 'kiosk') {
    req = supertest(await getTestApp())[m](path);
    if (caller === 'kiosk') req = req.set('Authorization', `Bearer ${world.kioskToken}`);
  } else {
    const agent = freshSession ? (await signedInAgent(caller)).agent : world.signed[caller].agent;
    req = agent[m](path);
  }
  return method === 'GET' || method === 'DELETE' || body === undefined ? req : req.send(body);
}

/**
 * A well-formed body (or query) per route, so a caller the policy refuses meets the policy and not
 * a validation error (routes validate before they authorize). Routes not listed get `{}`.
 */
export function sampleInput(key: string, ids: Record<string, string>, pageVersion: number): { body?: object; query?: string } {
  const samples: Record<string, { body?: object; query?: string }> = {
    'POST /api/users': { body: { email: `invited-${randomUUID()}@example.test`, name: 'Invited Person', role: 'writer' } },
    'PATCH /api/users/:id': { body: { name: 'Renamed by the access matrix' } },
    'POST /api/calc': { body: { z: { value: 0.158 } } },
    'POST /api/auth/invitation/check': { body: { token: 'an-invitation-token-nobody-was-sent' } },
    'POST /api/pages': { body: { title: 'Access matrix page', objectId: ids.object, locale: 'en-GB' } },
    'PUT /api/pages/digest': { body: { enabled: false } },
    'PUT /api/pages/:id': {
      body: { version: pageVersion, title: 'Another writer’s draft', doc: { type: 'doc', content: [{ type: 'paragraph' }] } },
    },
    'POST /api/pages/:id/send-back': { body: { comment: 'Please check the distance.' } },
    'POST /api/pages/:id/signoffs/statements': { body: { statementId: ids.statement } },
    'POST /api/pages/:id/flags': { body: { text: '42', reason: 'It is a catalogue number, not a measurement.' } },
    'PUT /api/pages/:id/schedule': { body: { at: null } },
    'POST /api/pages/:id/archive': { body: { reason: 'Duplicate of another page' } },
    'POST /api/pages/:id/restore': { body: { reason: 'Archived by mistake' } },
    'DELETE /api/pages/:id': { query: 'reason=Started+by+mistake' },
    'POST /api/pages/:id/comments': { body: { body: 'A comment from the access matrix.' } },
    'POST /api/pages/:id/versions': { body: { locale: 'fr-FR' } },
    'GET /api/pages/:id/revisions/diff': { query: 'from=1&to=1' },
    'POST /api/pages/:id/revisions/:number/restore': { body: { version: pageVersion } },
    'POST /api/statements': { body: { objectId: ids.object, templateId: 'naked-eye' } },
    'PATCH /api/settings': { body: { defaultBand: 'V' } },
    'POST /api/settings/cosmology/preview': { body: { model: { preset: 'planck18' } } },
    'PUT /api/settings/cosmology': { body: { model: { preset: 'planck18' }, expectedVersion: 999 } },
    'GET /api/media/object-suggestions': { query: 'q=gal' },
    'PATCH /api/media/:id': { body: { altText: 'A glowing cloud of gas (access matrix test image)' } },
    'POST /api/catalogue/objects': {
      body: { name: `Access matrix object ${randomUUID().slice(0, 8)}`, kind: 'galaxy', ra: '12 29 06.7', dec: '+02 03 09' },
    },
    'PATCH /api/catalogue/objects/:id': {
      body: { name: `Access matrix quasar ${randomUUID().slice(0, 8)}`, kind: 'quasar', ra: '12 29 06.7', dec: '+02 03 09' },
    },
    'POST /api/catalogue/objects/:id/measurements': { body: { quantity: 'redshift', value: '0.01', sourceId: ids.source } },
    'PATCH /api/catalogue/measurements/:id': { body: { quantity: 'redshift', value: '0.01', sourceId: ids.source } },
    'PUT /api/catalogue/measurements/:id/preferred': { body: { preferred: true } },
    'POST /api/catalogue/measurements/:id/review': { body: { decision: 'accept' } },
    'DELETE /api/catalogue/measurements/:id': { query: 'reason=Superseded+by+a+newer+value' },
    'POST /api/catalogue/sources': { body: { citation: `Access matrix source ${randomUUID().slice(0, 8)}` } },
    'PATCH /api/catalogue/sources/:id': { body: { citation: 'Access matrix test values (invented)' } },
    'POST /api/catalogue/proposals/objects': {
      body: {
        name: `Access matrix proposed object ${randomUUID().slice(0, 8)}`,
        kind: 'galaxy',
        ra: '12 29 06.7',
        dec: '+02 03 09',
        sourceId: ids.source,
      },
    },
    'POST /api/catalogue/proposals/sources': {
      body: { citation: `Access matrix proposed source ${randomUUID().slice(0, 8)}`, url: 'https://example.test/proposed' },
    },
    'POST /api/catalogue/proposals/:id/review': { body: { decision: 'decline', reason: 'Access matrix check.' } },
    'POST /api/venues': {
      body: {
        name: `Access matrix venue ${randomUUID().slice(0, 8)}`,
        latitude: 54.6,
        longitude: -2.9,
        elevationM: 100,
        timeZone: 'Europe/London',
      },
    },
    'PATCH /api/venues/:id': { body: { elevationM: 120 } },
    'POST /api/timeline': { body: timelineSample(`Access matrix entry ${randomUUID().slice(0, 8)}`) },
    'PATCH /api/timeline/:id': { body: { note: 'Checked by the access matrix.' } },
    'POST /api/venues/:venueId/screens': { body: { name: 'Access matrix screen' } },
    'PATCH /api/venues/:venueId/screens/:screenId': { body: { language: 'fr-FR' } },
    'POST /api/kiosk/heartbeat': { body: { screenId: ids.screen } },
    'POST /api/channels': { body: { venueId: ids.venue, name: `Access matrix channel ${randomUUID().slice(0, 8)}` } },
    'PATCH /api/channels/:id': { body: { name: 'Access matrix channel' } },
    'POST /api/channels/:id/slides': { body: { kind: 'sky_tonight' } },
    'PUT /api/channels/:id/slide-order': { body: { slideIds: [] } },
    'PUT /api/channels/:id/screens': { body: { screenIds: [ids.screen] } },
  };
  return samples[key] ?? { body: {} };
}
