/**
 * Statements an astronomer would sign, through the API: templates refused for kinds they are not
 * valid for, stored statements that break a rule sent to review by the recompute path, default
 * spectral indices in the settings, sentence names in the catalogue, small print in public outputs.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { STATEMENT_RULES_VERSION } from '../../shared/statements/index.ts';
import { Measurement, OrganisationSettings, SkyObject, Statement, Venue } from '../../server/models/index.ts';
import { withStatementNotes } from '../../server/services/pages/page-render.ts';
import { recomputeAfterRulesRelease } from '../../server/services/statements/rules-release.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildObjectWithMeasurements, buildSource } from '../support/sky-fixtures.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

async function waitForStatus(id: string, status: string) {
  await expect.poll(async () => (await Statement.findByPk(id))?.status, { timeout: 15_000 }).toBe(status);
}

describe('templates are valid for some kinds of object only', () => {
  it('lists each template’s kinds for the picker', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await agent.get('/api/statement-templates');
    expect(res.status).toBe(200);
    const planet = res.body.data.find((t: { id: string }) => t.id === 'planet-light-tonight');
    expect(planet.kinds).toEqual(['planet']);
    expect(planet.kindsReason).toMatch(/planet/);
    expect(res.body.data.find((t: { id: string }) => t.id === 'brightness-at-10pc').kinds).not.toContain('galaxy');
  });

  it('refuses brightness from 10 pc and the naked-eye limit for a galaxy with a clear 400, storing nothing', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await buildObjectWithMeasurements(
      'Test spiral',
      'galaxy',
      [
        { quantity: 'apparent_magnitude', value: 3.44, sigma: 0.05, band: 'V', unit: 'mag' },
        { quantity: 'distance', value: 765000, sigma: 30000, unit: 'pc' },
      ],
      user,
    );
    for (const templateId of ['brightness-at-10pc', 'naked-eye']) {
      const res = await agent.post('/api/statements').send({ objectId: object.id, templateId });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('template_not_for_kind');
      expect(res.body.error.message).toMatch(/is not for an object of kind “galaxy”: /);
    }
    expect(await Statement.count({ where: { skyObjectId: object.id } })).toBe(0);
    // The kinds it is valid for still work.
    expect((await agent.post('/api/statements').send({ objectId: object.id, templateId: 'distance-today' })).status).toBe(201);
  });

  it('refuses the planet-light template for a quasar, venue or not', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await buildObjectWithMeasurements(
      'Test quasar',
      'quasar',
      [{ quantity: 'redshift', value: 0.5, unit: '' }],
      user,
    );
    const venue = await Venue.create({
      name: 'Kind Dome',
      latitude: 52,
      longitude: -1,
      elevationM: 100,
      timeZone: 'Europe/London',
    });
    const res = await agent
      .post('/api/statements')
      .send({ objectId: object.id, templateId: 'planet-light-tonight', venueId: venue.id });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('template_not_for_kind');
    expect(res.body.error.message).toMatch(/not for an object of kind “quasar”/);
  });

  it('a stored statement whose object’s kind no longer fits goes to review on recompute, with the reason', async () => {
    const { agent, user } = await signedInAgent('reviewer');
    const { object } = await buildObjectWithMeasurements(
      'Test point',
      'star',
      [
        { quantity: 'apparent_magnitude', value: 3.2, sigma: 0.01, band: 'V', unit: 'mag' },
        { quantity: 'parallax', value: 130.23, sigma: 0.36, unit: 'mas' },
      ],
      user,
    );
    const created = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'brightness-at-10pc' });
    expect(created.status).toBe(201);
    // Recatalogued as a galaxy: the catalogue edit queues the object's recompute.
    const patched = await agent
      .patch(`/api/catalogue/objects/${object.id}`)
      .send({ name: object.name, designations: [], kind: 'galaxy', ra: 10, dec: 41, notes: '' });
    expect(patched.status).toBe(200);
    await waitForStatus(created.body.data.id, 'broken');
    const stored = await Statement.findByPk(created.body.data.id);
    expect(stored!.statusReason).toMatch(
      /^Needs review: “Brightness from 10 parsecs compared with the Sun in our sky” is not for an object of kind “galaxy”/,
    );
    // It keeps its last text for the reviewer to see.
    expect(stored!.texts?.['en-GB']).toMatch(/Seen from 10 parsecs/);
  });
});

describe('a statement-rules release recomputes every stored statement once', () => {
  it('sends old wording to review as changed, and queues nothing the second time', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await buildObjectWithMeasurements(
      'Old-wording star',
      'star',
      [
        { quantity: 'apparent_magnitude', value: 3.2, sigma: 0.01, band: 'V', unit: 'mag' },
        { quantity: 'parallax', value: 130.23, sigma: 0.36, unit: 'mas' },
      ],
      user,
    );
    const created = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'luminosity-sun' });
    expect(created.status).toBe(201);
    // As a release before band light was worded would have stored it.
    const old = Object.fromEntries(
      Object.entries(created.body.data.texts as Record<string, string>).map(([l, t]) => [
        l,
        t.replace(' visible light', ' light').replace(' lumière visible', ' lumière'),
      ]),
    );
    await Statement.update({ texts: old as never, acknowledgedTexts: old as never }, { where: { id: created.body.data.id } });
    await OrganisationSettings.update({ statementRulesVersion: STATEMENT_RULES_VERSION - 1 }, { where: { id: 1 } });
    expect(await recomputeAfterRulesRelease()).toBe(true);
    expect((await OrganisationSettings.findByPk(1))!.statementRulesVersion).toBe(STATEMENT_RULES_VERSION);
    await waitForStatus(created.body.data.id, 'changed');
    const stored = await Statement.findByPk(created.body.data.id);
    expect(stored!.texts?.['en-GB']).toMatch(/as much visible light as the Sun/);
    expect(stored!.acknowledgedTexts?.['en-GB']).toMatch(/times as much light as the Sun/);
    expect(stored!.statusReason).toMatch(/public wording changed/);
    expect(await recomputeAfterRulesRelease()).toBe(false);
  });
});

describe('default spectral indices in the organisation settings', () => {
  it('asks for a spectral index at high redshift, then uses the organisation’s default as a stated assumption', async () => {
    const { agent: writer, user } = await signedInAgent('writer');
    const { agent: admin } = await signedInAgent('admin');
    const { object } = await buildObjectWithMeasurements(
      'Far quasar',
      'quasar',
      [
        { quantity: 'redshift', value: 2.22, sigma: 0.001, unit: '' },
        { quantity: 'apparent_magnitude', value: 15.9, sigma: 0.05, band: 'V', unit: 'mag' },
      ],
      user,
    );
    const refused = await writer.post('/api/statements').send({ objectId: object.id, templateId: 'luminosity-sun' });
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toMatch(/Needs input: a preferred spectral index \(α\)/);

    const bad = await admin.patch('/api/settings').send({ spectralIndexDefaults: { quasar: { value: -0.44, source: '' } } });
    expect(bad.status).toBe(400);
    const source = 'Vanden Berk et al. (2001), AJ 122, 549 (recalled from memory)';
    const saved = await admin
      .patch('/api/settings')
      .send({ spectralIndexDefaults: { quasar: { value: -0.44, sigma: null, source } } });
    expect(saved.status).toBe(200);
    expect(saved.body.data.spectralIndexDefaults).toEqual({ quasar: { value: -0.44, sigma: null, source } });

    const res = await writer.post('/api/statements').send({ objectId: object.id, templateId: 'luminosity-sun' });
    expect(res.status).toBe(201);
    expect(res.body.data.texts['en-GB']).toMatch(/as much visible light as the Sun\.$/);
    expect(res.body.data.warnings.join(' ')).toMatch(/Assumed spectral index α = -0\.44 for quasars \(organisation setting/);
    const k = res.body.data.working.find((s: { title: string }) => /K-correction for a power-law/.test(s.title));
    expect(k.inputs.find((i: { symbol: string }) => i.symbol === 'α').source).toMatch(/^ASSUMPTION/);
    await admin.patch('/api/settings').send({ spectralIndexDefaults: {} });
  });
});

describe('names as sentences use them', () => {
  it('are edited in the catalogue and used by the statements', async () => {
    const { agent } = await signedInAgent('reviewer');
    const created = await agent.post('/api/catalogue/objects').send({
      name: 'Test Sisters',
      designations: [],
      kind: 'cluster',
      ra: 56.75,
      dec: 24.1167,
      notes: '',
      sentenceNames: { en: { text: 'the Test Sisters', plural: true }, fr: { text: 'les Sœurs d’essai', plural: true } },
    });
    expect(created.status).toBe(201);
    expect(created.body.data.sentenceNames.en).toEqual({ text: 'the Test Sisters', plural: true });
    const object = await SkyObject.findByPk(created.body.data.id);
    const source = await buildSource();
    await Measurement.create({
      skyObjectId: object!.id,
      quantity: 'distance',
      band: null,
      value: 136,
      uncertainty: 1,
      uncertaintyMinus: null,
      uncertaintyPlus: null,
      enteredValue: 136,
      enteredUnit: 'pc',
      sourceId: source.id,
      preferred: true,
      status: 'accepted',
      createdById: null,
    });
    const res = await agent.post('/api/statements').send({ objectId: object!.id, templateId: 'distance-today' });
    expect(res.status).toBe(201);
    expect(res.body.data.texts['en-GB']).toBe('The Test Sisters are about 444 light-years away.');
    expect(res.body.data.texts['fr-FR']).toBe('Les Sœurs d’essai se trouvent à environ 444 années-lumière.');
  });
});

describe('small print reaches the page HTML', () => {
  it('numbers each distinct note once and lists them after the text', () => {
    const a = '11111111-1111-4111-8111-111111111111';
    const b = '22222222-2222-4222-8222-222222222222';
    const html = `<p><span class="statement" data-statement-id="${a}">A.</span> <span class="statement" data-statement-id="${b}">B.</span></p>`;
    const out = withStatementNotes(
      html,
      new Map([
        [a, 'Compared in the Johnson V band.'],
        [b, 'Compared in the Johnson V band.'],
      ]),
    );
    expect(out).toBe(
      `<p><span class="statement" data-statement-id="${a}">A.</span><sup class="statement-note-ref">1</sup> <span class="statement" data-statement-id="${b}">B.</span><sup class="statement-note-ref">1</sup></p><ol class="statement-notes" aria-label="Notes"><li value="1">Compared in the Johnson V band.</li></ol>`,
    );
    expect(withStatementNotes(html, new Map())).toBe(html);
    expect(withStatementNotes(html, new Map([[a, '<b>x</b>']]))).toContain('&lt;b&gt;x&lt;/b&gt;');
  });
});
