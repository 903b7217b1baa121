import { beforeAll, describe, expect, it } from 'vitest';
import { Measurement, MeasurementHistory, SkyObject } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildSkyObject, buildSource } from '../support/catalogue.ts';

let citation: string;
let objectIds: string[];

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  citation = (await buildSource({ citation: 'Import Test Survey (2020)', bibcode: '2020ApJ...900....1X' })).citation;
  objectIds = [];
  for (const name of ['Alpha Import', 'Beta Import', 'Gamma, the Comma Galaxy'])
    objectIds.push((await buildSkyObject({ name, designations: [`D-${name.slice(0, 4)}`] })).id);
});

async function dryRun(body: Buffer | string, name = 'measurements.csv', mapping?: Record<string, string>) {
  const { agent } = await signedInAgent('reviewer');
  let req = agent.post('/api/catalogue/imports').attach('file', Buffer.isBuffer(body) ? body : Buffer.from(body, 'utf8'), name);
  if (mapping) req = req.field('mapping', JSON.stringify(mapping));
  return { res: await req, agent };
}

const countAll = () => Measurement.count();

describe('CSV import: the dry run', () => {
  it('reports every rejected row with its number and reason, and changes nothing', async () => {
    const before = await countAll();
    const csv = [
      'object,quantity,value,unit,band,uncertainty,source',
      `Alpha Import,redshift,0.12,,,0.01,${citation}`,
      `Nowhere Object,redshift,0.2,,,,${citation}`,
      `Beta Import,redshift,twelve,,,,${citation}`,
      `Beta Import,distance,5,kg,,,${citation}`,
      'Beta Import,redshift,0.3,,,,',
      `Alpha Import,redshift,0.12,,,0.01,${citation}`,
      `D-Beta,apparent_magnitude,14.2,mag,V,0.05,2020ApJ...900....1X`,
      `Beta Import,redshift,0.4,,,,Unknown et al. (1999)`,
    ].join('\n');
    const { res } = await dryRun(csv);
    expect(res.status).toBe(201);
    const report = res.body.data.report;
    expect(report).toMatchObject({ totalRows: 8, acceptedCount: 2, rejectedCount: 6, delimiter: ',', hadByteOrderMark: false });
    expect(report.rejections.map((r: { row: number; reason: string }) => [r.row, r.reason])).toEqual([
      [3, 'unknown_object'],
      [4, 'non_numeric_value'],
      [5, 'unit_mismatch'],
      [6, 'missing_source'],
      [7, 'duplicate'],
      [9, 'unknown_source'],
    ]);
    expect(report.rejections[0].message).toMatch(/No object is named "Nowhere Object"/);
    expect(report.rejections[4].message).toMatch(/as row 2/);
    expect(await countAll()).toBe(before);
  });

  it('reads a byte-order mark, semicolons with decimal commas, and quoted commas', async () => {
    const csv =
      '\uFEFFObject;Quantity;Value;Unit;Band;Source\n"Gamma, the Comma Galaxy";redshift;0,0452;;;"Import Test Survey (2020)"\n"Gamma, the Comma Galaxy";distance;"1,5";Mpc;;' +
      citation +
      '\n';
    const { res } = await dryRun(csv);
    expect(res.status).toBe(201);
    expect(res.body.data.report).toMatchObject({ hadByteOrderMark: true, delimiter: ';', acceptedCount: 2, rejectedCount: 0 });
    expect(res.body.data.report.warnings.join(' ')).toMatch(/decimal mark/);
    expect(res.body.data.report.mapping).toMatchObject({ object: 'Object', quantity: 'Quantity', value: 'Value' });
  });

  it('uses a column mapping when the headers are the file’s own', async () => {
    const csv = `Target name,What,Number,Ref\nAlpha Import,spectral_index,-0.7,${citation}\n`;
    const unmapped = await dryRun(csv);
    expect(unmapped.res.status).toBe(422);
    expect(unmapped.res.body.error.message).toMatch(/No column was found for object, quantity, value/);
    const { res } = await dryRun(csv, 'own-headers.csv', {
      object: 'Target name',
      quantity: 'What',
      value: 'Number',
      source: 'Ref',
    });
    expect(res.status).toBe(201);
    expect(res.body.data.report.acceptedCount).toBe(1);
    const wrong = await dryRun(csv, 'own-headers.csv', { object: 'Nope', quantity: 'What', value: 'Number' });
    expect(wrong.res.status).toBe(400);
    expect(wrong.res.body.error.message).toMatch(/"Nope" chosen for object is not in the file/);
  });

  it('refuses a file in the wrong encoding, saying how to fix it', async () => {
    // "Gamma Café" in Windows-1252: é is the single byte 0xE9, invalid as UTF-8.
    const latin = Buffer.concat([
      Buffer.from('object,quantity,value,source\nGamma Caf', 'latin1'),
      Buffer.from([0xe9]),
      Buffer.from(`,redshift,0.1,${citation}\n`, 'latin1'),
    ]);
    const { res } = await dryRun(latin);
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({
      code: 'not_utf8',
      message: expect.stringMatching(/not UTF-8 text \(the first unreadable character is on line 2\).*CSV UTF-8/),
    });
  });

  it('refuses an empty file, a header with no rows, and a binary file named .csv', async () => {
    const empty = await dryRun('');
    expect(empty.res.status).toBe(422);
    expect(empty.res.body.error.message).toMatch(/The file is empty/);
    const header = await dryRun('object,quantity,value\n\n');
    expect(header.res.body.error.message).toMatch(/header row but no measurements/);
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
    const binary = await dryRun(png, 'photo.csv');
    expect(binary.res.status).toBe(422);
    expect(binary.res.body.error.message).toMatch(/This file is a PNG image, not CSV text/);
    const workbook = await dryRun(Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04]), Buffer.alloc(200, 7)]), 'book.csv');
    expect(workbook.res.body.error.message).toMatch(/spreadsheet workbook/);
  });

  it('refuses a 20 MB file with 413 before reading it', async () => {
    const big = Buffer.alloc(20 * 1024 * 1024, 'a');
    const { res } = await dryRun(big, 'huge.csv');
    expect(res.status).toBe(413);
    expect(res.body.error.message).toMatch(/larger than 10 MB.*Split it/);
  });

  it('refuses writers and editors', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await agent.post('/api/catalogue/imports').attach('file', Buffer.from('object,quantity,value\n'), 'x.csv');
    expect(res.status).toBe(403);
  });
});

describe('CSV import: the commit', () => {
  it('commits all accepted rows with their history in one go, and only once', async () => {
    const before = await countAll();
    const csv = `object,quantity,value,unit,source\nBeta Import,parallax,1.5,mas,${citation}\nBeta Import,parallax,0.0016,arcsec,${citation}\nNobody,parallax,2,mas,${citation}\n`;
    const { res, agent } = await dryRun(csv);
    expect(res.body.data.report).toMatchObject({ acceptedCount: 2, rejectedCount: 1 });
    expect(await countAll()).toBe(before);
    const commit = await agent.post(`/api/catalogue/imports/${res.body.data.id}/commit`);
    expect(commit.status).toBe(200);
    expect(commit.body.data).toMatchObject({ status: 'committed', insertedCount: 2 });
    expect(await countAll()).toBe(before + 2);
    const imported = await Measurement.findAll({ where: { importId: res.body.data.id } });
    expect(imported.map((m) => m.value).sort()).toEqual([1.5, 1.6]);
    expect(await MeasurementHistory.count({ where: { action: 'imported', measurementId: imported.map((m) => m.id) } })).toBe(2);
    // A second commit of the same import adds nothing and answers the first one's result.
    const again = await agent.post(`/api/catalogue/imports/${res.body.data.id}/commit`);
    expect(again.status).toBe(200);
    expect(again.body.data).toMatchObject({ status: 'committed', insertedCount: 2, alreadyCommitted: true });
    expect(await countAll()).toBe(before + 2);
  });

  it('commits once when two commits of one import arrive together (a double click)', async () => {
    const before = await countAll();
    const csv = `object,quantity,value,unit,source\nGamma, the Comma Galaxy,parallax,0.31,mas,${citation}\n`.replace(
      'Gamma, the Comma Galaxy',
      '"Gamma, the Comma Galaxy"',
    );
    const { res, agent } = await dryRun(csv);
    expect(res.body.data.report.acceptedCount).toBe(1);
    const url = `/api/catalogue/imports/${res.body.data.id}/commit`;
    const answers = await Promise.all([agent.post(url), agent.post(url)]);
    expect(answers.map((a) => a.status)).toEqual([200, 200]);
    expect(answers.map((a) => a.body.data.insertedCount)).toEqual([1, 1]);
    expect(answers.map((a) => a.body.data.alreadyCommitted).sort()).toEqual([false, true]);
    expect(await countAll()).toBe(before + 1);
  });

  it('commits nothing when the catalogue changed since the dry run', async () => {
    const csv = `object,quantity,value,source\nAlpha Import,redshift,0.777,${citation}\nAlpha Import,redshift,0.778,${citation}\n`;
    const first = await dryRun(csv);
    const second = await dryRun(csv);
    expect((await first.agent.post(`/api/catalogue/imports/${first.res.body.data.id}/commit`)).status).toBe(200);
    const before = await countAll();
    const stale = await second.agent.post(`/api/catalogue/imports/${second.res.body.data.id}/commit`);
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toMatch(/2 of these rows have been added by someone else/);
    expect(await countAll()).toBe(before);
  });

  it('imports 50,000 rows', async () => {
    const object = await SkyObject.findByPk(objectIds[0]);
    const lines = ['object,quantity,value,unit,band,uncertainty,source'];
    for (let i = 0; i < 50_000; i += 1)
      lines.push(`${object!.name},apparent_magnitude,${(10 + i / 100000).toFixed(6)},mag,g_SDSS,0.01,${citation}`);
    const { res, agent } = await dryRun(lines.join('\n'), 'big.csv');
    expect(res.status).toBe(201);
    expect(res.body.data.report).toMatchObject({ totalRows: 50_000, acceptedCount: 50_000, rejectedCount: 0 });
    const commit = await agent.post(`/api/catalogue/imports/${res.body.data.id}/commit`);
    expect(commit.body.data.insertedCount).toBe(50_000);
    expect(await Measurement.count({ where: { importId: res.body.data.id } })).toBe(50_000);
  }, 120_000);
});
