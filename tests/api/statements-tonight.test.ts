/**
 * Statements about a venue's night ("light from a planet tonight"): created for a venue, refused
 * without one, kept current night after night without a new sign-off, reviewed when the venue moves.
 */
import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { ASTRONOMICAL_UNIT, SPEED_OF_LIGHT } from '../../shared/engine/constants.ts';
import { localToMs, nextDate, nightDateAt } from '../../shared/sky/time-zone.ts';
import { Page, SkyObject, SkySnapshot, Statement, Venue, type User } from '../../server/models/index.ts';
import { refreshVenueSky } from '../../server/services/sky/sky-snapshots.ts';
import { statementEvents } from '../../server/services/statements/events.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { doc, pageWithBody, paragraph, statement, text } from '../support/pages.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const TEMPLATE = 'planet-light-tonight';
const ZONE = 'Europe/London';
let counter = 0;

async function makeVenue(latitude = 54.62, longitude = -2.95) {
  return Venue.create({ name: `Tonight Dome ${++counter}`, latitude, longitude, elevationM: 160, timeZone: ZONE });
}

/** A planet object; the name is unique in the catalogue, the designation tells the sky engine which planet. */
async function makePlanet(planet: string, creator: User) {
  return SkyObject.create({
    name: `${planet} (test ${++counter})`,
    designations: [planet],
    kind: 'planet',
    raDeg: null,
    decDeg: null,
    constellation: null,
    createdById: creator.id,
  });
}

/** Midday at the venue `days` after today: the instant a daily sky run would see that night. */
const middayIn = (days: number) => {
  let date = nightDateAt(Date.now(), ZONE);
  for (let i = 0; i < days; i += 1) date = nextDate(date);
  return { date, at: new Date(localToMs(date, 12 * 60, ZONE)) };
};

async function waitForNight(id: string, localDate: string) {
  await expect.poll(async () => (await Statement.findByPk(id))?.night?.localDate, { timeout: 15_000 }).toBe(localDate);
  return (await Statement.findByPk(id))!;
}

describe('creating a statement for a venue', () => {
  it('works out the light time from the venue’s sky tonight: stored distance × au / c', async () => {
    const { agent, user } = await signedInAgent('writer');
    const venue = await makeVenue();
    const jupiter = await makePlanet('Jupiter', user);
    const res = await agent.post('/api/statements').send({ objectId: jupiter.id, templateId: TEMPLATE, venueId: venue.id });
    expect(res.status).toBe(201);
    const tonight = nightDateAt(Date.now(), ZONE);
    const snapshot = await SkySnapshot.findOne({ where: { venueId: venue.id, localDate: tonight } });
    const distanceAu = snapshot!.data.planets.find((p) => p.id === 'jupiter')!.distanceAu;
    const minutes = (distanceAu * (ASTRONOMICAL_UNIT.value / 1000)) / SPEED_OF_LIGHT.value / 60;
    const data = res.body.data;
    expect(data.value).toBeCloseTo(minutes, 9);
    // Three figures, or two when three would change during the evening (the working says which).
    expect(data.texts['en-GB']).toBe(
      `Light from ${jupiter.name} takes about ${minutes.toPrecision(data.significantFigures)} minutes to reach us tonight.`,
    );
    expect([2, 3]).toContain(data.significantFigures);
    expect(data.texts['fr-FR']).toMatch(/^La lumière de Jupiter met environ/);
    expect(data.venue).toEqual({ id: venue.id, name: venue.name, timeZone: ZONE });
    expect(data.night.localDate).toBe(tonight);
    expect(data.footnotes['en-GB']).toMatch(new RegExp(`^For ${venue.name} on the night of`));
    expect(data.working[0].inputs[0].source).toMatch(new RegExp(`night of ${tonight}`));
    expect(data.status).toBe('current');

    const again = await agent.post('/api/statements').send({ objectId: jupiter.id, templateId: TEMPLATE, venueId: venue.id });
    expect(again.status).toBe(200);
    expect(again.body.data.id).toBe(data.id);
    const elsewhere = await agent
      .post('/api/statements')
      .send({ objectId: jupiter.id, templateId: TEMPLATE, venueId: (await makeVenue(-33.93, 18.42)).id });
    expect(elsewhere.status).toBe(201);
    expect(elsewhere.body.data.id).not.toBe(data.id);
    const list = await agent.get(`/api/statements?objectId=${jupiter.id}`);
    expect(list.body.data.map((s: { venue: { name: string } }) => s.venue.name).sort()).toEqual(
      [venue.name, elsewhere.body.data.venue.name].sort(),
    );
  });

  it('refuses without a venue, and a venue for a template that does not use one, saying why', async () => {
    const { agent, user } = await signedInAgent('writer');
    const saturn = await makePlanet('Saturn', user);
    const none = await agent.post('/api/statements').send({ objectId: saturn.id, templateId: TEMPLATE });
    expect(none.status).toBe(400);
    expect(none.body.error.code).toBe('venue_required');
    expect(none.body.error.message).toBe(
      '“How long a planet’s light takes to reach us tonight” is about one venue’s night: choose the venue it is for.',
    );
    expect(none.body.error.fields.venueId).toBeTruthy();
    const venue = await makeVenue();
    const extra = await agent.post('/api/statements').send({ objectId: saturn.id, templateId: 'naked-eye', venueId: venue.id });
    expect(extra.status).toBe(400);
    expect(extra.body.error.code).toBe('venue_not_used');
    expect(await Statement.count({ where: { skyObjectId: saturn.id } })).toBe(0);
  });

  it('an unknown venue is 404; a hostile venueId is 400 with the field named; nothing is stored', async () => {
    const { agent, user } = await signedInAgent('writer');
    const mars = await makePlanet('Mars', user);
    const unknown = await agent
      .post('/api/statements')
      .send({ objectId: mars.id, templateId: TEMPLATE, venueId: '00000000-0000-4000-8000-000000000000' });
    expect(unknown.status).toBe(404);
    expect(unknown.body.error.message).toBe('There is no such venue.');
    for (const venueId of ["'; DROP TABLE statements; --", { $ne: null }, 12345, '../venues']) {
      const res = await agent.post('/api/statements').send({ objectId: mars.id, templateId: TEMPLATE, venueId });
      expect(res.status, JSON.stringify(venueId)).toBe(400);
      expect(res.body.error.fields.venueId).toBe('Choose a venue from the list');
    }
    expect(await Statement.count({ where: { skyObjectId: mars.id } })).toBe(0);
  });

  it('an object that is not a planet the sky engine knows cannot be worked out (422, with the reason)', async () => {
    const { agent, user } = await signedInAgent('writer');
    const pluto = await SkyObject.create({
      name: `Pluto (test ${++counter})`,
      kind: 'planet',
      raDeg: null,
      decDeg: null,
      constellation: null,
      createdById: user.id,
    });
    const res = await agent
      .post('/api/statements')
      .send({ objectId: pluto.id, templateId: TEMPLATE, venueId: (await makeVenue()).id });
    expect(res.status).toBe(422);
    expect(res.body.error.message).toMatch(
      /Needs one of the planets the sky engine computes \(Mercury, .*Neptune\); “Pluto \(test \d+\)” is not one of them/,
    );
  });

  it('every member of staff may list venues to choose from (names only)', async () => {
    const venue = await makeVenue();
    const { agent } = await signedInAgent('writer');
    const res = await agent.get('/api/venues/choices');
    expect(res.status).toBe(200);
    expect(res.body.data).toContainEqual({ id: venue.id, name: venue.name, timeZone: ZONE });
    expect(Object.keys(res.body.data[0]).sort()).toEqual(['id', 'name', 'timeZone']);
  });
});

describe('one statement per object, template and venue', () => {
  it('the database refuses a second one, a missing venue counting as one value', async () => {
    const { agent, user } = await signedInAgent('writer');
    const venue = await makeVenue();
    const uranus = await makePlanet('Uranus', user);
    const first = await Statement.findByPk(
      (await agent.post('/api/statements').send({ objectId: uranus.id, templateId: TEMPLATE, venueId: venue.id })).body.data.id,
    );
    const copy = (venueId: string | null, templateId = TEMPLATE) => {
      const { id: _id, createdAt: _c, updatedAt: _u, ...row } = first!.get({ plain: true });
      return Statement.create({ ...row, templateId, venueId });
    };
    await expect(copy(venue.id)).rejects.toThrow(/unique|Validation error/i);
    // Without a venue (two rows would be "different" under plain NULL semantics): the first is allowed, a second refused.
    await copy(null, 'naked-eye');
    await expect(copy(null, 'naked-eye')).rejects.toThrow(/unique|Validation error/i);
    await copy((await makeVenue()).id);
    expect(await Statement.count({ where: { skyObjectId: uranus.id } })).toBe(3);
  });
});

describe('deleting a venue', () => {
  it('is refused in words while statements are about its sky; the database refuses too', async () => {
    const { agent: writer, user } = await signedInAgent('writer');
    const { agent: admin } = await signedInAgent('admin');
    const venue = await makeVenue();
    const neptune = await makePlanet('Neptune', user);
    expect(
      (await writer.post('/api/statements').send({ objectId: neptune.id, templateId: TEMPLATE, venueId: venue.id })).status,
    ).toBe(201);
    const res = await admin.delete(`/api/venues/${venue.id}`);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('venue_in_use');
    expect(res.body.error.message).toBe(
      `${venue.name} cannot be deleted: a checked statement is about its sky tonight (${neptune.name}), and pages may show it. Rename the venue or change its position instead.`,
    );
    expect(await Venue.findByPk(venue.id)).not.toBeNull();
    await expect(Venue.destroy({ where: { id: venue.id } })).rejects.toThrow(/foreign key/);
    const unused = await makeVenue();
    expect((await admin.delete(`/api/venues/${unused.id}`)).status).toBe(204);
  });
});

describe('staying current night after night', () => {
  it('the daily sky run for a new night recomputes it: still current, the accepted wording follows, the page stays published', async () => {
    const { agent: writer, user } = await signedInAgent('writer');
    const { agent: reviewer } = await signedInAgent('reviewer');
    const { agent: editor } = await signedInAgent('editor');
    const venue = await makeVenue();
    const jupiter = await makePlanet('Jupiter', user);
    const created = (await writer.post('/api/statements').send({ objectId: jupiter.id, templateId: TEMPLATE, venueId: venue.id }))
      .body.data;
    const page = await pageWithBody(
      writer,
      jupiter.id,
      doc(paragraph(text('The largest planet, bright in the evening sky.')), paragraph(statement(created.id))),
      'Jupiter tonight',
    );
    expect((await writer.post(`/api/pages/${page.id}/submit`).send({ version: page.version })).status).toBe(200);
    expect((await reviewer.post(`/api/pages/${page.id}/signoffs/statements`).send({ statementId: created.id })).status).toBe(200);
    expect((await reviewer.post(`/api/pages/${page.id}/signoffs/page`)).status).toBe(200);
    expect((await editor.post(`/api/pages/${page.id}/publish`)).status).toBe(200);

    const moved: string[] = [];
    const onChanged = ({ statementIds }: { statementIds: string[] }) => moved.push(...statementIds);
    statementEvents.on('textChanged', onChanged);
    try {
      // Six weeks on, Jupiter's distance has moved enough to change the words.
      const { date, at } = middayIn(42);
      await refreshVenueSky(venue, at);
      const after = await waitForNight(created.id, date);
      expect(after.status).toBe('current');
      expect(after.texts!['en-GB']).not.toBe(created.texts['en-GB']);
      expect(after.acknowledgedTexts).toEqual(after.texts);
      const shown = (await reviewer.get(`/api/statements/${created.id}`)).body.data;
      expect(shown.night.localDate).toBe(date);
      expect(shown.working[0].inputs[0].source).toMatch(new RegExp(`night of ${date}`));
      expect(moved).not.toContain(created.id);
      expect((await Page.findByPk(page.id))!.status).toBe('published');
      // The public sees tonight's number, in the page text and in its statements, never the approval night's.
      const publicPage = (await supertest(await getTestApp()).get(`/api/public/pages/${page.id}`)).body.data;
      expect(publicPage.statements).toEqual([expect.objectContaining({ id: created.id, text: after.texts!['en-GB'] })]);
      expect(publicPage.html).toContain(after.texts!['en-GB']);
      expect(publicPage.html).not.toContain(created.texts['en-GB']);
      const live = (await editor.get(`/api/pages/${page.id}/published`)).body.data;
      expect(live.statementTexts[created.id]).toBe(after.texts!['en-GB']);
    } finally {
      statementEvents.off('textChanged', onChanged);
    }
  });

  it('a statement signed off on a page under review stays signed off when the night moves on', async () => {
    const { agent: writer, user } = await signedInAgent('writer');
    const { agent: reviewer } = await signedInAgent('reviewer');
    const venue = await makeVenue();
    const saturn = await makePlanet('Saturn', user);
    const created = (await writer.post('/api/statements').send({ objectId: saturn.id, templateId: TEMPLATE, venueId: venue.id }))
      .body.data;
    const page = await pageWithBody(writer, saturn.id, doc(paragraph(statement(created.id))), 'Saturn tonight');
    expect((await writer.post(`/api/pages/${page.id}/submit`).send({ version: page.version })).status).toBe(200);
    expect((await reviewer.post(`/api/pages/${page.id}/signoffs/statements`).send({ statementId: created.id })).status).toBe(200);
    const { date, at } = middayIn(42);
    await refreshVenueSky(venue, at);
    const after = await waitForNight(created.id, date);
    expect(after.texts!['en-GB']).not.toBe(created.texts['en-GB']);
    const approved = await reviewer.post(`/api/pages/${page.id}/signoffs/page`);
    expect(approved.status).toBe(200);
    expect(approved.body.data.status).toBe('approved');
    expect((await Page.findByPk(page.id))!.approvedSnapshot!.statementTexts[created.id]).toBe(after.texts!['en-GB']);
  });

  it('a moved venue sends it to review when its wording moves; once accepted, later nights follow again', async () => {
    const { agent: writer, user } = await signedInAgent('writer');
    const { agent: admin } = await signedInAgent('admin');
    const { agent: reviewer } = await signedInAgent('reviewer');
    const venue = await makeVenue();
    const jupiter = await makePlanet('Jupiter', user);
    const created = (await writer.post('/api/statements').send({ objectId: jupiter.id, templateId: TEMPLATE, venueId: venue.id }))
      .body.data;
    expect((await admin.patch(`/api/venues/${venue.id}`).send({ latitude: 51.48, longitude: 0 })).status).toBe(200);
    // The move recomputes tonight's sky, and with it the statement (same night, same words: still current).
    await expect
      .poll(async () => (await Statement.findByPk(created.id))?.night?.method.venue.latitude, { timeout: 15_000 })
      .toBe(51.48);
    expect((await Statement.findByPk(created.id))!.status).toBe('current');

    const { date, at } = middayIn(42);
    await refreshVenueSky((await Venue.findByPk(venue.id))!, at);
    const changed = await waitForNight(created.id, date);
    expect(changed.status).toBe('changed');
    expect(changed.statusReason).toMatch(/the venue moved: 54\.62°, -2\.95°, 160 m → 51\.48°, 0°, 160 m/);
    expect(changed.acknowledgedTexts!['en-GB']).toBe(created.texts['en-GB']);

    expect((await reviewer.post(`/api/statements/${created.id}/accept`)).status).toBe(200);
    const later = middayIn(84);
    await refreshVenueSky((await Venue.findByPk(venue.id))!, later.at);
    const followed = await waitForNight(created.id, later.date);
    expect(followed.status).toBe('current');
    expect(followed.acknowledgedTexts).toEqual(followed.texts);
  });
});
