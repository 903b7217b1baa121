import { beforeAll, describe, expect, it } from 'vitest';
import { Measurement } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildSkyObject, buildSource } from '../support/catalogue.ts';
import { buildObjectWithMeasurements } from '../support/sky-fixtures.ts';

// Catalogues publish negative parallaxes and we keep them; the person entering one is told what it
// means, and values that look like a sign error need a yes. Warnings, not errors: `confirm: true` goes on.

let sourceId: string;

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  sourceId = (await buildSource({ citation: 'Parallax test catalogue (invented)' })).id;
});

const url = (objectId: string) => `/api/catalogue/objects/${objectId}/measurements`;

describe('negative parallax: warnings to confirm', () => {
  it('a small negative parallax is kept as published once confirmed, after saying it gives no distance', async () => {
    const { agent } = await signedInAgent('reviewer');
    const star = await buildSkyObject({ kind: 'star' });
    const body = { quantity: 'parallax', value: '-0.21', unit: 'mas', uncertainty: '0.35', sourceId };
    const first = await agent.post(url(star.id)).send(body);
    expect(first.status).toBe(409);
    expect(first.body.error.code).toBe('confirmation_needed');
    expect(first.body.error.current.warnings.map((w: { code: string }) => w.code)).toEqual(['negative_parallax']);
    expect(first.body.error.current.warnings[0].message).toMatch(/−0\.21 mas gives no distance/);
    expect(await Measurement.count({ where: { skyObjectId: star.id } })).toBe(0);
    const confirmed = await agent.post(url(star.id)).send({ ...body, confirm: true });
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.data.value).toBe(-0.21);
  });

  it('the sign-flipped value of a star’s published parallax is called a likely sign error', async () => {
    const { agent } = await signedInAgent('reviewer');
    const star = await buildSkyObject({ kind: 'star' });
    // A bright nearby star's parallax of about 130 mas (recalled from memory; the check only needs its size).
    expect(
      (await agent.post(url(star.id)).send({ quantity: 'parallax', value: '130.2', unit: 'mas', uncertainty: '0.4', sourceId }))
        .status,
    ).toBe(201);
    const flipped = await agent
      .post(url(star.id))
      .send({ quantity: 'parallax', value: '-130', unit: 'mas', uncertainty: '0.5', sourceId });
    expect(flipped.status).toBe(409);
    const codes = flipped.body.error.current.warnings.map((w: { code: string }) => w.code);
    expect(codes).toEqual(['negative_parallax', 'likely_sign_error']);
    expect(flipped.body.error.current.warnings[1].message).toMatch(
      /published parallax is \+130\.2 ± 0\.4 mas; −130 mas .* most likely a sign error/,
    );
  });

  it('a value far below zero for its uncertainty, or far from the published one, is questioned too', async () => {
    const { agent } = await signedInAgent('writer');
    const star = await buildSkyObject({ kind: 'star' });
    const deep = await agent
      .post(url(star.id))
      .send({ quantity: 'parallax', value: '-40', unit: 'mas', uncertainty: '0.5', sourceId });
    expect(deep.status).toBe(409);
    expect(deep.body.error.current.warnings.map((w: { code: string }) => w.code)).toContain('impossible_negative_parallax');
    const { agent: reviewer } = await signedInAgent('reviewer');
    await reviewer.post(url(star.id)).send({ quantity: 'parallax', value: '8.1', unit: 'mas', uncertainty: '0.2', sourceId });
    const far = await reviewer
      .post(url(star.id))
      .send({ quantity: 'parallax', value: '81', unit: 'mas', uncertainty: '0.2', sourceId });
    expect(far.status).toBe(409);
    expect(far.body.error.current.warnings.map((w: { code: string }) => w.code)).toEqual(['far_from_published']);
    // A value close to the published one needs nothing.
    expect(
      (await reviewer.post(url(star.id)).send({ quantity: 'parallax', value: '8.3', unit: 'mas', uncertainty: '0.3', sourceId }))
        .status,
    ).toBe(201);
  });

  it('making a negative parallax preferred lists the statements it breaks and needs a yes', async () => {
    const { agent, user } = await signedInAgent('reviewer');
    const built = await buildObjectWithMeasurements(
      'Parallax Test Star',
      'star',
      [
        { quantity: 'parallax', value: 130.2, sigma: 0.4, unit: 'mas' },
        { quantity: 'apparent_magnitude', value: 0.03, sigma: 0.01, band: 'V', unit: 'mag' },
      ],
      user,
    );
    const statement = await agent.post('/api/statements').send({ objectId: built.object.id, templateId: 'distance-today' });
    expect(statement.status).toBe(201);
    const negative = await agent
      .post(url(built.object.id))
      .send({ quantity: 'parallax', value: '-130.2', unit: 'mas', uncertainty: '0.4', sourceId, confirm: true });
    expect(negative.status).toBe(201);
    const prefer = `/api/catalogue/measurements/${negative.body.data.id}/preferred`;
    const asked = await agent.put(prefer).send({ preferred: true });
    expect(asked.status).toBe(409);
    expect(asked.body.error.code).toBe('confirmation_needed');
    expect(asked.body.error.current.warnings[0].message).toMatch(/leaves 1 statement of this object without a distance/);
    expect(asked.body.error.current.statements).toEqual([
      { id: statement.body.data.id, text: statement.body.data.texts['en-GB'] },
    ]);
    expect((await Measurement.findByPk(negative.body.data.id))!.preferred).toBe(false);
    const done = await agent.put(prefer).send({ preferred: true, confirm: true });
    expect(done.status).toBe(200);
    expect(done.body.data.preferred).toBe(true);
  });

  it('the CSV import lists rows to confirm, and commits them only with a yes', async () => {
    const { agent } = await signedInAgent('reviewer');
    await buildSkyObject({ name: 'CSV Parallax Star', kind: 'star' });
    const csv =
      'object,quantity,value,unit,uncertainty,source\nCSV Parallax Star,parallax,-0.3,mas,0.4,Parallax test catalogue (invented)\n';
    const checked = await agent.post('/api/catalogue/imports').attach('file', Buffer.from(csv), 'negative.csv');
    expect(checked.body.data.report).toMatchObject({ acceptedCount: 1, confirmationCount: 1 });
    expect(checked.body.data.report.confirmations[0]).toMatchObject({
      row: 2,
      message: expect.stringMatching(/gives no distance/),
    });
    const commit = `/api/catalogue/imports/${checked.body.data.id}/commit`;
    const refused = await agent.post(commit).send({});
    expect(refused.status).toBe(409);
    expect(refused.body.error).toMatchObject({ code: 'confirmation_needed' });
    expect(refused.body.error.message).toMatch(/Nothing was imported/);
    const done = await agent.post(commit).send({ confirm: true });
    expect(done.body.data).toMatchObject({ status: 'committed', insertedCount: 1 });
  });
});
