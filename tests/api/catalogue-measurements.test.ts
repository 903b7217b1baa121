import { beforeAll, describe, expect, it } from 'vitest';
import { getSequelize } from '../../server/db.ts';
import { Measurement, MeasurementHistory } from '../../server/models/index.ts';
import { catalogueEvents } from '../../server/services/catalogue/events.ts';
import { getPreferredMeasurements } from '../../server/services/catalogue/preferred-read.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildMeasurement, buildSkyObject, buildSource } from '../support/catalogue.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const url = (objectId: string) => `/api/catalogue/objects/${objectId}/measurements`;

describe('measurements', () => {
  it('stores canonical units, keeps what was typed, and converts uncertainties', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject({ kind: 'star' });
    const source = await buildSource();
    const res = await agent.post(url(object.id)).send({
      quantity: 'distance',
      value: '2.5',
      unit: 'kpc',
      uncertaintyMinus: '0.1',
      uncertaintyPlus: '0.3',
      sourceId: source.id,
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      value: 2500,
      unit: 'pc',
      uncertaintyMinus: 100,
      uncertaintyPlus: 300,
      enteredValue: 2.5,
      enteredUnit: 'kpc',
      status: 'accepted',
      preferred: false,
    });
    // 1 R☉ = 695 700 km (IAU 2015 Resolution B3, nominal solar radius).
    const radius = await agent
      .post(url(object.id))
      .send({ quantity: 'radius', value: 2, unit: 'R_sun', uncertainty: 0.1, sourceId: source.id });
    expect(radius.body.data).toMatchObject({ value: 1_391_400, unit: 'km', uncertainty: 69_570 });
    // 1 arcsec = 1000 mas by definition. A negative parallax is kept once its warning is confirmed.
    const parallax = await agent
      .post(url(object.id))
      .send({ quantity: 'parallax', value: '−0.0012', unit: 'arcsec', sourceId: source.id, confirm: true });
    expect(parallax.body.data.value).toBeCloseTo(-1.2, 12);
  });

  it('refuses a unit that does not fit, a missing band, a non-number and a double uncertainty, field by field', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const unit = await agent.post(url(object.id)).send({ quantity: 'distance', value: 3, unit: 'kg' });
    expect(unit.status).toBe(400);
    expect(unit.body.error.fields.unit).toBe('"kg" is not a unit of distance; use pc, kpc, Mpc, ly, au or km.');
    const band = await agent.post(url(object.id)).send({ quantity: 'apparent_magnitude', value: 3, unit: 'mag' });
    expect(band.body.error.fields.band).toMatch(/needs a band/);
    const value = await agent.post(url(object.id)).send({ quantity: 'redshift', value: 'about 0.1' });
    expect(value.body.error.fields.value).toMatch(/is not a number/);
    const both = await agent
      .post(url(object.id))
      .send({ quantity: 'redshift', value: 0.1, uncertainty: 0.01, uncertaintyMinus: 0.01, uncertaintyPlus: 0.02 });
    expect(both.body.error.fields.uncertainty).toMatch(/not both/);
    const negative = await agent.post(url(object.id)).send({ quantity: 'distance', value: -4, unit: 'pc' });
    expect(negative.body.error.fields.value).toMatch(/greater than 0/);
    const quantity = await agent.post(url(object.id)).send({ quantity: 'brightness', value: 1 });
    expect(quantity.body.error.fields.quantity).toMatch(/Unknown quantity "brightness"/);
    expect(await Measurement.count({ where: { skyObjectId: object.id } })).toBe(0);
  });

  it('writers propose; a reviewer accepts or declines with a reason; both are in the history', async () => {
    const { agent: writer } = await signedInAgent('writer');
    const { agent: reviewer } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const source = await buildSource();
    const proposed = await writer.post(url(object.id)).send({ quantity: 'redshift', value: 0.02, sourceId: source.id });
    expect(proposed.status).toBe(201);
    expect(proposed.body.data.status).toBe('proposed');
    expect(
      (await writer.put(`/api/catalogue/measurements/${proposed.body.data.id}/preferred`).send({ preferred: true })).status,
    ).toBe(403);
    const notYet = await reviewer.put(`/api/catalogue/measurements/${proposed.body.data.id}/preferred`).send({ preferred: true });
    expect(notYet.status).toBe(409);
    expect(notYet.body.error.message).toMatch(/review the proposal first/);
    const noReason = await reviewer
      .post(`/api/catalogue/measurements/${proposed.body.data.id}/review`)
      .send({ decision: 'decline' });
    expect(noReason.body.error.fields.reason).toMatch(/Say why/);
    const declined = await reviewer
      .post(`/api/catalogue/measurements/${proposed.body.data.id}/review`)
      .send({ decision: 'decline', reason: 'Copied from a press release.' });
    expect(declined.body.data).toMatchObject({ status: 'declined', reviewReason: 'Copied from a press release.' });
    expect(declined.body.data.reviewedBy).toBeTruthy();
    const twice = await reviewer.post(`/api/catalogue/measurements/${proposed.body.data.id}/review`).send({ decision: 'accept' });
    expect(twice.status).toBe(409);
    const history = await reviewer.get(`/api/catalogue/objects/${object.id}/history`);
    expect(history.body.data.map((h: { action: string }) => h.action)).toEqual(['declined', 'proposed', 'object_created']);
    expect(history.body.data[0]).toMatchObject({
      reason: 'Copied from a press release.',
      oldValues: { status: 'proposed' },
      newValues: { status: 'declined' },
    });
  });

  it('a measurement without a source cannot be preferred, in code and in the database', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const created = await agent.post(url(object.id)).send({ quantity: 'redshift', value: 0.3 });
    const res = await agent.put(`/api/catalogue/measurements/${created.body.data.id}/preferred`).send({ preferred: true });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/without a source cannot be preferred/);
    await expect(Measurement.update({ preferred: true }, { where: { id: created.body.data.id } })).rejects.toThrow(
      /measurements_preferred_needs_source/,
    );
  });

  it('choosing a preferred value replaces the previous one and records both changes', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const source = await buildSource();
    const a = await agent
      .post(url(object.id))
      .send({ quantity: 'apparent_magnitude', band: 'V', value: 3.4, unit: 'mag', sourceId: source.id });
    const b = await agent
      .post(url(object.id))
      .send({ quantity: 'apparent_magnitude', band: 'V', value: 3.5, unit: 'mag', sourceId: source.id });
    const other = await agent
      .post(url(object.id))
      .send({ quantity: 'apparent_magnitude', band: 'B', value: 4.2, unit: 'mag', sourceId: source.id });
    const events: unknown[] = [];
    const listener = (e: unknown) => events.push(e);
    catalogueEvents.on('preferredChanged', listener);
    expect(
      (await agent.put(`/api/catalogue/measurements/${a.body.data.id}/preferred`).send({ preferred: true, replaces: null }))
        .status,
    ).toBe(200);
    expect(
      (await agent.put(`/api/catalogue/measurements/${other.body.data.id}/preferred`).send({ preferred: true })).status,
    ).toBe(200);
    const swap = await agent
      .put(`/api/catalogue/measurements/${b.body.data.id}/preferred`)
      .send({ preferred: true, replaces: a.body.data.id });
    catalogueEvents.off('preferredChanged', listener);
    expect(swap.status).toBe(200);
    expect(await Measurement.count({ where: { skyObjectId: object.id, preferred: true } })).toBe(2);
    expect((await Measurement.findByPk(a.body.data.id))!.preferred).toBe(false);
    expect(events).toEqual([
      { skyObjectId: object.id, quantity: 'apparent_magnitude', band: 'V' },
      { skyObjectId: object.id, quantity: 'apparent_magnitude', band: 'B' },
      { skyObjectId: object.id, quantity: 'apparent_magnitude', band: 'V' },
    ]);
    const actions = await MeasurementHistory.findAll({ where: { measurementId: a.body.data.id }, order: [['id', 'ASC']] });
    expect(actions.map((h) => h.action)).toEqual(['created', 'preferred', 'unpreferred']);
    const preferred = await getPreferredMeasurements(object.id);
    expect(preferred.map((p) => [p.quantity, p.band, p.value, p.unit, p.source.citation])).toEqual([
      ['apparent_magnitude', 'B', 4.2, 'mag', source.citation],
      ['apparent_magnitude', 'V', 3.5, 'mag', source.citation],
    ]);
  });

  it('two reviewers choosing different preferred values at once: one wins, the other is told', async () => {
    const { agent: first } = await signedInAgent('reviewer');
    const { agent: second } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const source = await buildSource();
    const a = await buildMeasurement(object.id, { quantity: 'redshift', value: 0.1, sourceId: source.id });
    const b = await buildMeasurement(object.id, { quantity: 'redshift', value: 0.11, sourceId: source.id });
    const results = await Promise.all([
      first.put(`/api/catalogue/measurements/${a.id}/preferred`).send({ preferred: true, replaces: null }),
      second.put(`/api/catalogue/measurements/${b.id}/preferred`).send({ preferred: true, replaces: null }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409]);
    const loser = results.find((r) => r.status === 409)!;
    expect(loser.body.error).toMatchObject({
      code: 'preferred_changed',
      message: expect.stringMatching(/Another reviewer has just chosen the preferred redshift/),
    });
    expect(await Measurement.count({ where: { skyObjectId: object.id, preferred: true } })).toBe(1);
  });

  it('the database itself refuses a second preferred value, even without the app', async () => {
    const object = await buildSkyObject();
    const source = await buildSource();
    await buildMeasurement(object.id, { quantity: 'redshift', value: 0.2, sourceId: source.id, preferred: true });
    const second = await buildMeasurement(object.id, { quantity: 'redshift', value: 0.21, sourceId: source.id });
    const error = await getSequelize()
      .query(`UPDATE measurements SET preferred = true WHERE id = '${second.id}'`)
      .catch((e: { parent?: { constraint?: string } }) => e);
    expect((error as { parent?: { constraint?: string } }).parent?.constraint).toBe('measurements_one_preferred');
  });

  it('edits keep the old values in history; retiring keeps the row and drops the preferred mark', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const source = await buildSource();
    const created = await agent.post(url(object.id)).send({ quantity: 'redshift', value: 0.158, sourceId: source.id });
    const id = created.body.data.id as string;
    await agent.put(`/api/catalogue/measurements/${id}/preferred`).send({ preferred: true });
    const noSource = await agent
      .patch(`/api/catalogue/measurements/${id}`)
      .send({ quantity: 'redshift', value: 0.158, sourceId: null });
    expect(noSource.status).toBe(409);
    expect(noSource.body.error.message).toMatch(/preferred measurement needs a source/);
    const changed = await agent.patch(`/api/catalogue/measurements/${id}`).send({
      quantity: 'redshift',
      value: 0.1583,
      uncertainty: 0.0002,
      sourceId: source.id,
      reason: 'Corrected a typing error.',
    });
    expect(changed.status).toBe(200);
    const quantity = await agent
      .patch(`/api/catalogue/measurements/${id}`)
      .send({ quantity: 'parallax', value: 1, unit: 'mas', sourceId: source.id });
    expect(quantity.status).toBe(400);
    const noReason = await agent.delete(`/api/catalogue/measurements/${id}`);
    expect(noReason.status).toBe(400);
    const retired = await agent.delete(`/api/catalogue/measurements/${id}`).query({ reason: 'Superseded by a better spectrum.' });
    expect(retired.body.data).toMatchObject({
      retired: true,
      preferred: false,
      retireReason: 'Superseded by a better spectrum.',
    });
    expect(
      (await agent.patch(`/api/catalogue/measurements/${id}`).send({ quantity: 'redshift', value: 0.2, sourceId: source.id }))
        .status,
    ).toBe(409);
    const history = (await agent.get(`/api/catalogue/objects/${object.id}/history`)).body.data as Array<{
      action: string;
      oldValues: Record<string, unknown>;
      newValues: Record<string, unknown>;
      reason: string | null;
    }>;
    expect(history.map((h) => h.action)).toEqual(['retired', 'updated', 'preferred', 'created', 'object_created']);
    expect(history[1]).toMatchObject({
      reason: 'Corrected a typing error.',
      oldValues: { value: 0.158, uncertainty: null, enteredValue: 0.158 },
      newValues: { value: 0.1583, uncertainty: 0.0002, enteredValue: 0.1583 },
    });
    expect(history[0]).toMatchObject({
      oldValues: { preferred: true, retired: false },
      newValues: { preferred: false, retired: true },
    });
    expect(await Measurement.count({ where: { id } })).toBe(1);
    expect(await getPreferredMeasurements(object.id)).toEqual([]);
  });
});
