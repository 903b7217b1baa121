import { beforeAll, describe, expect, it } from 'vitest';
import { seedCatalogueDemo, DEMO_SOURCE_CITATION } from '../../server/demo/catalogue.ts';
import { seedDemo } from '../../server/demo/seed.ts';
import { Measurement, SkyObject, Source } from '../../server/models/index.ts';
import { catalogueEvents } from '../../server/services/catalogue/events.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildMeasurement, buildSkyObject, buildSource } from '../support/catalogue.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

describe('sources', () => {
  it('a reviewer adds a source; identifiers are checked and normalised; duplicates are refused', async () => {
    const { agent } = await signedInAgent('reviewer');
    // An invented source (demo) with a well-formed bibcode, and a DOI under 10.5555, the prefix set aside for examples.
    const res = await agent.post('/api/catalogue/sources').send({
      citation: 'Corrie Vale Survey Team (2025), Vale Observatory Notes 12, 3 (demo)',
      bibcode: '2025CVON...12....3C',
      doi: 'https://doi.org/10.5555/corrie-vale.2025.12',
      retrievedOn: '2026-11-30',
    });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({
      doi: '10.5555/corrie-vale.2025.12',
      bibcode: '2025CVON...12....3C',
      retrievedOn: '2026-11-30',
      measurementCount: 0,
    });
    const bad = await agent
      .post('/api/catalogue/sources')
      .send({ citation: 'X', bibcode: 'not-a-bibcode', doi: '11.1/x', url: 'ftp://x', retrievedOn: '30/11/2026' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({
      citation: expect.stringMatching(/Enter the citation/),
      bibcode: expect.stringMatching(/19 characters/),
      doi: expect.stringMatching(/starts with 10\./),
      url: expect.stringMatching(/http/),
      retrievedOn: expect.stringMatching(/YYYY-MM-DD/),
    });
    const again = await agent
      .post('/api/catalogue/sources')
      .send({ citation: 'Another name for the same paper', doi: '10.5555/CORRIE-VALE.2025.12' });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/this DOI already exists/);
  });

  it('correcting a source tells listeners; writers may read but not edit', async () => {
    const { agent } = await signedInAgent('admin');
    const source = await buildSource();
    const heard: unknown[] = [];
    const listener = (e: unknown) => heard.push(e);
    catalogueEvents.on('sourceChanged', listener);
    const res = await agent.patch(`/api/catalogue/sources/${source.id}`).send({ citation: `${source.citation} (corrected)` });
    catalogueEvents.off('sourceChanged', listener);
    expect(res.status).toBe(200);
    expect(heard).toEqual([{ sourceId: source.id }]);
    const { agent: writer } = await signedInAgent('writer');
    expect((await writer.get('/api/catalogue/sources')).status).toBe(200);
    expect((await writer.patch(`/api/catalogue/sources/${source.id}`).send({ citation: 'Nope' })).status).toBe(403);
  });
});

describe('exports', () => {
  it('exports measurements as CSV that a spreadsheet cannot run, and that the import reads back', async () => {
    const { agent } = await signedInAgent('writer');
    const object = await buildSkyObject({ name: '=HYPERLINK("http://evil.example")' });
    const source = await buildSource({ citation: '@SUM(A1:A9) et al. (2020)' });
    await buildMeasurement(object.id, { quantity: 'apparent_magnitude', band: 'V', value: -1.46, sourceId: source.id });
    const res = await agent.get('/api/catalogue/exports/measurements.csv').query({ objectId: object.id });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?starproof-measurements-\d{4}-\d{2}-\d{2}\.csv/);
    const [header, row] = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\n');
    expect(header).toBe(
      'object,quantity,value,unit,band,uncertainty,uncertainty_minus,uncertainty_plus,source,bibcode,doi,preferred,status,note,entered_at',
    );
    expect(row.startsWith('"\'=HYPERLINK(""http://evil.example"")",apparent_magnitude,-1.46,mag,V')).toBe(true);
    expect(row).toContain("'@SUM(A1:A9) et al. (2020)");
    const objects = await agent.get('/api/catalogue/exports/objects.csv');
    expect(objects.text).toContain('name,designations,kind,ra_deg,dec_deg,ra_hms,dec_dms,constellation,notes');
  });
});

describe('demo data', () => {
  it('seeds a couple of dozen objects of several kinds, every value attached to the demo source, once', async () => {
    await seedDemo();
    await seedCatalogueDemo();
    const source = await Source.findOne({ where: { citation: DEMO_SOURCE_CITATION } });
    expect(source).not.toBeNull();
    const objects = (await SkyObject.findAll()).filter((o) => o.notes.includes('Demo object.'));
    expect(objects.length).toBeGreaterThanOrEqual(24);
    expect(new Set(objects.map((o) => o.kind)).size).toBeGreaterThanOrEqual(7);
    const demo = await Measurement.findAll({ where: { skyObjectId: objects.map((o) => o.id) } });
    expect(demo.length).toBeGreaterThan(40);
    expect(demo.every((m) => m.sourceId === source!.id)).toBe(true);
    // Seeding again adds nothing.
    await seedCatalogueDemo();
    expect(await Measurement.count({ where: { skyObjectId: objects.map((o) => o.id) } })).toBe(demo.length);
  });
});
