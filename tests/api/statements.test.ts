import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { calculate } from '../../shared/engine/calculate.ts';
import { Measurement, Statement } from '../../server/models/index.ts';
import { setPreferred } from '../../server/services/catalogue/preferred-write.ts';
import { retireMeasurement } from '../../server/services/catalogue/measurement-write.ts';
import {
  currentSettingsSnapshot,
  mergeScopes,
  recomputeStatements,
  SettingsMovedError,
} from '../../server/services/statements/recompute.ts';
import { type buildUser, getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildObjectWithMeasurements } from '../support/sky-fixtures.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const quasar = (creator: Awaited<ReturnType<typeof buildUser>>) =>
  buildObjectWithMeasurements(
    'Test quasar',
    'quasar',
    [
      { quantity: 'redshift', value: 0.241, sigma: 0.0005, unit: '' },
      { quantity: 'apparent_magnitude', value: 14.6, sigma: 0.1, band: 'V', unit: 'mag' },
      // At z = 0.241 with ±0.1 mag the K-correction matters (z_K ≈ 0.20): a measured spectral index.
      { quantity: 'spectral_index', value: -0.5, sigma: 0.2, unit: '' },
    ],
    creator,
  );

/** Waits for a background recompute (queued by a catalogue event) to land. */
async function waitForStatus(id: string, status: string) {
  await expect.poll(async () => (await Statement.findByPk(id))?.status, { timeout: 10_000 }).toBe(status);
}

describe('creating statements', () => {
  it('computes a statement whose number matches the reference-tested engine', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await quasar(user);
    const res = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'luminosity-sun' });
    expect(res.status).toBe(201);
    const engine = calculate({
      quantity: 'luminosity_ratio_sun',
      inputs: {
        m: { value: 14.6, sigma: 0.1 },
        z: { value: 0.241, sigma: 0.0005 },
        band: 'V',
        alpha: { value: -0.5, sigma: 0.2 },
      },
      model: { preset: 'planck18' },
    });
    if ('error' in engine) throw new Error(engine.error.message);
    expect(res.body.data.value).toBeCloseTo(engine.value, 6);
    // ±0.1 mag is about ±10 %: two significant figures (our precision rule).
    const shown = Number(engine.value.toPrecision(2)) / 1e12;
    expect(res.body.data.texts['en-GB']).toBe(
      `${object.name} gives out about ${shown} trillion times as much visible light as the Sun.`,
    );
    expect(res.body.data.texts['fr-FR']).toMatch(/billions? de fois plus de lumière visible/);
    expect(res.body.data.status).toBe('current');
    expect(res.body.data.working.at(-1).title).toMatch(/Public wording/);
    expect(res.body.data.footnotes['en-GB']).toMatch(/Planck 2018/);
    const again = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'luminosity-sun' });
    expect(again.status).toBe(200);
    expect(again.body.data.id).toBe(res.body.data.id);
  });

  it('refuses a template whose inputs are missing, says which, and stores nothing', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await buildObjectWithMeasurements(
      'Bare quasar',
      'quasar',
      [{ quantity: 'redshift', value: 0.05, unit: '' }],
      user,
    );
    const res = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'naked-eye' });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('statement_not_computable');
    expect(res.body.error.message).toMatch(/apparent magnitude in the V band/);
    expect(await Statement.count({ where: { skyObjectId: object.id } })).toBe(0);
  });

  it('says in the working when an input has no uncertainty', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await buildObjectWithMeasurements(
      'Plain star',
      'star',
      [{ quantity: 'parallax', value: 130.23, unit: 'mas' }],
      user,
    );
    const res = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'distance-today' });
    expect(res.status).toBe(201);
    const wording = res.body.data.working.at(-1);
    expect(wording.note).toMatch(/no stated uncertainty, so the precision is unknown/);
    // 1000 / 130.23 mas = 7.679 pc = 25.04 ly; two significant figures for unknown precision.
    expect(res.body.data.texts['en-GB']).toBe(`${object.name} is about 25 light-years away.`);
  });

  it('refuses unknown templates and objects, and anonymous visitors', async () => {
    const { agent, user } = await signedInAgent('writer');
    const { object } = await quasar(user);
    expect((await agent.post('/api/statements').send({ objectId: object.id, templateId: 'horoscope' })).status).toBe(404);
    expect(
      (await agent.post('/api/statements').send({ objectId: '00000000-0000-4000-8000-000000000000', templateId: 'naked-eye' }))
        .status,
    ).toBe(404);
    const bad = await agent.post('/api/statements').send({ objectId: 'nope', templateId: 'naked-eye' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.objectId).toBe('Choose an object');
    expect((await supertest(await getTestApp()).get('/api/statements')).status).toBe(401);
  });
});

describe('staying correct when data changes', () => {
  it('a new preferred measurement marks the statement changed, and a reviewer accepts the new wording', async () => {
    const { agent: reviewer, user: reviewerUser } = await signedInAgent('reviewer');
    const { agent: writer } = await signedInAgent('writer');
    const { object, source, measurements } = await quasar(reviewerUser);
    const created = await writer.post('/api/statements').send({ objectId: object.id, templateId: 'distance-today' });
    const id = created.body.data.id as string;
    const untouched = (await writer.post('/api/statements').send({ objectId: object.id, templateId: 'naked-eye' })).body.data
      .id as string;
    const oldText = created.body.data.texts['en-GB'];

    const better = await Measurement.create({
      skyObjectId: object.id,
      quantity: 'redshift',
      band: null,
      value: 0.3,
      uncertainty: 0.001,
      uncertaintyMinus: null,
      uncertaintyPlus: null,
      enteredValue: 0.3,
      enteredUnit: '',
      sourceId: source.id,
      status: 'accepted',
      createdById: reviewerUser.id,
    });
    await setPreferred(better.id, { preferred: true, replaces: measurements[0].id }, reviewerUser);
    await waitForStatus(id, 'changed');

    const changed = (await reviewer.get(`/api/statements/${id}`)).body.data;
    expect(changed.acknowledgedTexts['en-GB']).toBe(oldText);
    expect(changed.texts['en-GB']).not.toBe(oldText);
    expect(changed.statusReason).toMatch(/different redshift measurement is preferred: 0.241 → 0.3/);
    // The naked-eye statement does not use the redshift: its wording did not move.
    expect((await Statement.findByPk(untouched))!.status).toBe('current');

    expect((await writer.post(`/api/statements/${id}/accept`)).status).toBe(403);
    const accepted = await reviewer.post(`/api/statements/${id}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body.data.status).toBe('current');
    expect(accepted.body.data.acknowledgedTexts['en-GB']).toBe(changed.texts['en-GB']);
  });

  it('a measurement retired while in use breaks the statement and says why', async () => {
    const { agent, user } = await signedInAgent('reviewer');
    const { object, measurements } = await quasar(user);
    const created = await agent.post('/api/statements').send({ objectId: object.id, templateId: 'naked-eye' });
    await retireMeasurement(measurements[1].id, 'Superseded by a better photometric study', user);
    await waitForStatus(created.body.data.id, 'broken');
    const broken = (await agent.get(`/api/statements/${created.body.data.id}`)).body.data;
    expect(broken.statusReason).toMatch(/apparent magnitude in the V band/);
    expect((await agent.post(`/api/statements/${created.body.data.id}/accept`)).status).toBe(409);
  });
});

describe('changing the adopted cosmology', () => {
  it('previews old and new text without changing anything, then switches on confirmation', async () => {
    const { agent: admin, user } = await signedInAgent('admin');
    const { object } = await quasar(user);
    const created = await admin.post('/api/statements').send({ objectId: object.id, templateId: 'light-travel' });
    const before = created.body.data.texts['en-GB'];
    const settings = (await admin.get('/api/settings')).body.data;
    expect(settings.cosmologyLabel).toMatch(/Planck 2018/);

    const hubble = { law: 'hubble', H0: 70 };
    const preview = await admin.post('/api/settings/cosmology/preview').send({ model: hubble });
    expect(preview.status).toBe(200);
    const row = preview.body.data.rows.find((r: { statementId: string }) => r.statementId === created.body.data.id);
    expect(row.oldText).toBe(before);
    expect(row.newText).not.toBe(before);
    expect((await Statement.findByPk(created.body.data.id))!.texts!['en-GB']).toBe(before);

    const stale = await admin
      .put('/api/settings/cosmology')
      .send({ model: hubble, expectedVersion: settings.version - 1 || 999 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('settings_moved');

    const switched = await admin.put('/api/settings/cosmology').send({ model: hubble, expectedVersion: settings.version });
    expect(switched.status).toBe(200);
    expect(switched.body.data.cosmologyLabel).toMatch(/Hubble law/);
    const after = await Statement.findByPk(created.body.data.id);
    expect(after!.status).toBe('changed');
    expect(after!.texts!['en-GB']).toBe(row.newText);
    expect(after!.footnotes!['en-GB']).toMatch(/simple Hubble law/);
    // Back to Planck 2018 for the other tests.
    await admin
      .put('/api/settings/cosmology')
      .send({ model: { preset: 'planck18' }, expectedVersion: switched.body.data.version });
  });

  it('the organisation’s H0 range is a setting with its source; changing it recomputes the statements', async () => {
    const { agent: admin, user } = await signedInAgent('admin');
    const { object } = await quasar(user);
    const created = await admin.post('/api/statements').send({ objectId: object.id, templateId: 'light-travel' });
    const before = (await admin.get('/api/settings')).body.data;
    // Default: Planck 2018 VI (67.4) to SH0ES 2022 (73.04), stored as null.
    expect(before.h0Range).toBeNull();
    expect(before.h0RangeInUse).toMatchObject({ low: 67.4, high: 73.04 });
    const bad = await admin
      .patch('/api/settings')
      .send({ h0Range: { low: 74, high: 70, source: 'Corrie Vale demo choice (demo)' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['h0Range.high']).toBe('High end of the H0 range: it must be above the low end');
    const notNumber = await admin
      .patch('/api/settings')
      .send({ h0Range: { low: 'sixty', high: 70, source: 'Corrie Vale demo (demo)' } });
    expect(notNumber.body.error.fields['h0Range.low']).toMatch(/^Low end of the H0 range: write a number/);
    const narrow = { low: 67.2, high: 68.2, source: 'Corrie Vale demo choice: CMB only (demo)' };
    const changed = await admin.patch('/api/settings').send({ h0Range: narrow });
    expect(changed.status).toBe(200);
    expect(changed.body.data).toMatchObject({ h0Range: narrow, h0RangeInUse: narrow, version: before.version + 1 });
    const after = await Statement.findByPk(created.body.data.id);
    // Recomputed under the new settings version.
    expect(after!.settingsVersion).toBe(before.version + 1);
    // Back to the default for the other tests.
    await admin.patch('/api/settings').send({ h0Range: null });
  });

  it('a recompute that started before a model change writes nothing', async () => {
    const { agent: admin, user } = await signedInAgent('admin');
    const { object } = await quasar(user);
    const created = await admin.post('/api/statements').send({ objectId: object.id, templateId: 'scale-model' });
    const stale = await currentSettingsSnapshot();
    const settings = (await admin.get('/api/settings')).body.data;
    await admin.put('/api/settings/cosmology').send({ model: { preset: 'wmap9' }, expectedVersion: settings.version });
    const computedAt = (await Statement.findByPk(created.body.data.id))!.computedAt;
    await expect(
      recomputeStatements({ statementIds: [created.body.data.id] }, { settings: { ...stale, model: { preset: 'planck18' } } }),
    ).rejects.toBeInstanceOf(SettingsMovedError);
    expect((await Statement.findByPk(created.body.data.id))!.computedAt).toEqual(computedAt);
    const now = (await admin.get('/api/settings')).body.data;
    await admin.put('/api/settings/cosmology').send({ model: { preset: 'planck18' }, expectedVersion: now.version });
  });

  it('refuses a model with no big bang, and non-admins', async () => {
    const { agent: admin } = await signedInAgent('admin');
    const res = await admin.post('/api/settings/cosmology/preview').send({ model: { H0: 70, Om0: 0.3, Ode0: 3 } });
    expect(res.status).toBe(400);
    // The field at fault, in words a staff member reads (not "E(z)² ≤ 0").
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.fields['model.Ode0']).toMatch(/^With this much dark energy \(ΩΛ = 3\).*it had no big bang/);
    expect(res.body.error.fields['model.Ode0']).not.toMatch(/E\(z\)/);
    const flat = await admin.post('/api/settings/cosmology/preview').send({ model: { H0: 70, Om0: 1.4 } });
    expect(flat.body.error.fields['model.Om0']).toMatch(/In a flat model the shares add up to 1/);
    const change = await admin.put('/api/settings/cosmology').send({ model: { H0: 900, Om0: 0.3 }, expectedVersion: 1 });
    expect(change.status).toBe(400);
    expect(change.body.error.fields['model.H0']).toMatch(/^H0 is the expansion rate today/);
    const { agent: editor } = await signedInAgent('editor');
    expect((await editor.post('/api/settings/cosmology/preview').send({ model: { preset: 'wmap9' } })).status).toBe(403);
    expect((await editor.put('/api/settings/cosmology').send({ model: { preset: 'wmap9' }, expectedVersion: 1 })).status).toBe(
      403,
    );
  });
});

describe('a burst of queued recomputes', () => {
  it('merges into one recompute of the statements they cover; "all" covers everything; a venue’s night keeps its own', async () => {
    const { agent, user } = await signedInAgent('reviewer');
    const { object, measurements } = await quasar(user);
    const other = await quasar(user);
    const a = (await agent.post('/api/statements').send({ objectId: object.id, templateId: 'distance-today' })).body.data
      .id as string;
    const b = (await agent.post('/api/statements').send({ objectId: other.object.id, templateId: 'naked-eye' })).body.data
      .id as string;
    const night = { venueId: '00000000-0000-4000-8000-00000000abcd', localDate: '2026-12-24' };
    const merged = await mergeScopes([
      { measurementId: measurements[0].id },
      { skyObjectId: other.object.id },
      night,
      { statementIds: [a] },
    ]);
    expect(merged).toHaveLength(2);
    expect(merged[0]).toEqual(night);
    expect(new Set((merged[1] as { statementIds: string[] }).statementIds)).toEqual(new Set([a, b]));
    expect(await mergeScopes([{ skyObjectId: object.id }, { all: true }, night])).toEqual([{ all: true }]);
    expect(await mergeScopes([{ skyObjectId: object.id }])).toEqual([{ skyObjectId: object.id }]);
  });
});
