import { beforeAll, describe, expect, it } from 'vitest';
import { getSequelize } from '../../server/db.ts';
import { Measurement } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildSkyObject, buildSource } from '../support/catalogue.ts';

// The hard physical limits of shared/catalogue/quantities.ts, one case per kind of limit, through the
// form's API, the CSV import and a raw SQL insert (the check constraints of 202612050201).

let objectId: string;
let sourceId: string;
let citation: string;

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  objectId = (await buildSkyObject({ name: 'Limit Test Galaxy', kind: 'galaxy' })).id;
  const source = await buildSource({ citation: 'Limits Survey (demo 2024)' });
  sourceId = source.id;
  citation = source.citation;
});

async function enter(body: Record<string, unknown>) {
  const { agent } = await signedInAgent('reviewer');
  return agent.post(`/api/catalogue/objects/${objectId}/measurements`).send({ sourceId, ...body });
}

describe('hard physical limits, through the API', () => {
  const cases: Array<[kind: string, body: Record<string, unknown>, field: string, message: RegExp]> = [
    [
      'uncertainty zero',
      { quantity: 'redshift', value: '0.1', uncertainty: '0' },
      'uncertainty',
      /Uncertainty \(±\) must be more than zero/,
    ],
    [
      'asymmetric uncertainty zero',
      { quantity: 'redshift', value: '0.1', uncertaintyMinus: '0', uncertaintyPlus: '0.01' },
      'uncertaintyMinus',
      /Uncertainty minus must be more than zero/,
    ],
    [
      'redshift at −1',
      { quantity: 'redshift', value: '−1' },
      'value',
      /Redshift must be greater than −1: 1 \+ z is a ratio of wavelengths/,
    ],
    [
      'extinction below zero',
      { quantity: 'extinction', band: 'V', value: '-0.2', unit: 'mag' },
      'value',
      /Extinction cannot be less than 0 mag: dust only dims/,
    ],
    ['distance zero', { quantity: 'distance', value: '0', unit: 'Mpc' }, 'value', /Distance must be greater than 0 pc/],
    [
      'distance beyond the observable universe',
      { quantity: 'distance', value: '200000', unit: 'Mpc' },
      'value',
      /observable universe/,
    ],
    [
      'magnitude too bright',
      { quantity: 'apparent_magnitude', band: 'V', value: '-31', unit: 'mag' },
      'value',
      /Apparent magnitude cannot be less than −30 mag/,
    ],
    [
      'magnitude too faint',
      { quantity: 'apparent_magnitude', band: 'V', value: '41', unit: 'mag' },
      'value',
      /Apparent magnitude cannot be more than 40 mag/,
    ],
    [
      'parallax beyond 1 arcsec',
      { quantity: 'parallax', value: '1.2', unit: 'arcsec' },
      'value',
      /Parallax cannot be more than 1,000 mas/,
    ],
    ['radius zero', { quantity: 'radius', value: '0', unit: 'km' }, 'value', /Radius must be greater than 0 km/],
    ['mass negative', { quantity: 'mass', value: '-1', unit: 'M_sun' }, 'value', /Mass must be greater than 0 kg/],
    [
      'angular size beyond 180°',
      { quantity: 'angular_size', value: '181', unit: 'deg' },
      'value',
      /Angular size cannot be more than 648,000 arcsec: .*at most 180°/,
    ],
    [
      'spectral index beyond ±10',
      { quantity: 'spectral_index', value: '-12' },
      'value',
      /Spectral index cannot be less than −10/,
    ],
  ];

  it.each(cases)('refuses %s, naming the field', async (_kind, body, field, message) => {
    const before = await Measurement.count();
    const res = await enter(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.fields[field]).toMatch(message);
    expect(await Measurement.count()).toBe(before);
  });

  it('keeps values inside the limits, including a negative parallax and a blueshift', async () => {
    for (const body of [
      { quantity: 'parallax', value: '-0.4', unit: 'mas', uncertainty: '0.3', confirm: true },
      { quantity: 'redshift', value: '-0.0002' },
      { quantity: 'extinction', band: 'V', value: '0', unit: 'mag' },
    ])
      expect((await enter(body)).status).toBe(201);
  });
});

describe('hard physical limits, through the CSV import', () => {
  it('rejects the rows outside the limits with the same messages', async () => {
    const { agent } = await signedInAgent('reviewer');
    const csv = [
      'object,quantity,value,unit,band,uncertainty,source',
      `Limit Test Galaxy,redshift,-1.5,,,,${citation}`,
      `Limit Test Galaxy,distance,12,Mpc,,0,${citation}`,
      `Limit Test Galaxy,redshift,0.01,,,0.001,${citation}`,
    ].join('\n');
    const res = await agent.post('/api/catalogue/imports').attach('file', Buffer.from(csv), 'limits.csv');
    expect(res.status).toBe(201);
    const { report } = res.body.data;
    expect(report).toMatchObject({ acceptedCount: 1, rejectedCount: 2 });
    expect(report.rejections[0]).toMatchObject({ row: 2, reason: 'out_of_range' });
    expect(report.rejections[0].message).toMatch(/Redshift must be greater than −1/);
    expect(report.rejections[1]).toMatchObject({ row: 3, reason: 'invalid_uncertainty' });
    expect(report.rejections[1].message).toMatch(/Uncertainty \(±\) must be more than zero/);
  });
});

describe('hard physical limits, in the database', () => {
  const insert = (quantity: string, value: number, uncertainty: number | null = null) =>
    getSequelize().query(
      `INSERT INTO measurements (id, object_id, quantity, value, uncertainty, entered_value, entered_unit, source_id, status, preferred, note, created_at, updated_at)
       VALUES (gen_random_uuid(), $1, $2, $3, $4, $3, '', $5, 'accepted', false, '', now(), now())`,
      { bind: [objectId, quantity, value, uncertainty, sourceId] },
    );

  it('a raw SQL insert outside a limit fails on the check constraint', async () => {
    await expect(insert('redshift', -2)).rejects.toThrow(/measurements_redshift_range/);
    await expect(insert('extinction', -0.1)).rejects.toThrow(/measurements_extinction_range/);
    await expect(insert('redshift', 0.2, 0)).rejects.toThrow(/measurements_uncertainty_positive/);
    await expect(insert('distance', Number.NaN)).rejects.toThrow(/measurements_value_finite|measurements_distance_range/);
    await expect(insert('redshift', 0.2, 0.01)).resolves.toBeDefined();
  });
});
