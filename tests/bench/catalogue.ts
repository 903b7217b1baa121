/**
 * `npm run bench:catalogue`: the catalogue at size, on the project's own test PostgreSQL cluster
 * (STARPROOF_TEST_PGPORT / STARPROOF_TEST_PGDATA choose which), in a database of its own.
 *
 * 1. CSV import of 50,000 measurement rows (with 50 bad rows): dry run and commit, each timed.
 *    Peers in the same run: csv-parse alone on the same file, and a plain INSERT of 50,000
 *    measurement rows (same table shape and indexes, no history, no checks).
 * 2. The catalogue table: a filtered, sorted page of 50 rows out of 1,000,000 objects (`--objects N`), timed at the
 *    database with EXPLAIN ANALYZE (median of 15): the page's rows, its capped count, and (when the count
 *    reaches its cap) the planner's estimate; a deep page by OFFSET and by keyset. Peer: one
 *    sequential read of the whole table, the cost a page would have without its indexes.
 */
import { parse } from 'csv-parse/sync';
import { QueryTypes } from 'sequelize';
import type { SkyObjectListQuery } from '../../shared/schemas/sky-object.ts';
import { freshTestDatabase } from '../setup/test-postgres.ts';

// `--objects N` sets the catalogue's size (default 1,000,000); `--only table` skips the CSV import part.
const argument = (name: string) => {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? process.argv[at + 1] : undefined;
};
const OBJECTS = Number(argument('objects') ?? 1_000_000);
if (!Number.isInteger(OBJECTS) || OBJECTS < 10_000) throw new Error('--objects must be a whole number of at least 10,000');
const ONLY_TABLE = argument('only') === 'table';
const ROWS = 50_000;
const BAD_ROWS = 50;

const { url, startedCluster } = await freshTestDatabase('starproof_bench_catalogue');
process.env.DATABASE_URL = url;
const { getSequelize, closeSequelize } = await import('../../server/db.ts');
const { migrate } = await import('../../server/migrations/runner.ts');
const { initModels, Source, User } = await import('../../server/models/index.ts');
const { checkCatalogueImport } = await import('../../server/services/catalogue/catalogue-import-check.ts');
const { commitCatalogueImport } = await import('../../server/services/catalogue/catalogue-import-commit.ts');
const { skyObjectPageQueries, EXACT_COUNT_CAP } = await import('../../server/services/catalogue/sky-object-list.ts');
const { stopTestCluster } = await import('../setup/test-postgres.ts');

const sql = getSequelize();
if (process.env.BENCH_SLOW_SQL) {
  Object.assign((sql as unknown as { options: object }).options, {
    benchmark: true,
    logging: (text: string, took: number) =>
      took > 200 && console.log(`  [slow SQL ${took} ms] ${text.slice(0, 120).replace(/\s+/g, ' ')}`),
  });
}
await migrate(sql);
initModels(sql);

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const ms = (n: number) => `${n.toFixed(n < 10 ? 2 : 0)} ms`;
const time = async <T>(fn: () => Promise<T> | T): Promise<[T, number]> => {
  const start = performance.now();
  const result = await fn();
  return [result, performance.now() - start];
};

console.log(`Seeding ${OBJECTS.toLocaleString('en-GB')} objects…`);
const seedStart = performance.now();
const user = await User.create({ email: 'bench@example.test', name: 'Bench Reviewer', role: 'reviewer' });
const source = await Source.create({
  citation: 'Benchmark Survey (2026)',
  bibcode: null,
  doi: null,
  url: null,
  catalogueName: null,
  retrievedOn: null,
  createdById: user.id,
});
// In chunks of 2,000 so each statement stays within the app's query time limits on a busy machine.
for (let from = 1; from <= OBJECTS; from += 2_000) {
  const to = Math.min(OBJECTS, from + 1_999);
  await sql.query(
    `INSERT INTO sky_objects (id, name, designations, kind, ra_deg, dec_deg, constellation, notes, created_at, updated_at)
     SELECT gen_random_uuid(), 'Bench Object ' || lpad(i::text, 7, '0'), ARRAY['BO ' || i],
       (ARRAY['star','galaxy','quasar','nebula','cluster'])[1 + i % 5], (i * 0.0036) % 360, ((i::bigint * 7919) % 180000) / 1000.0 - 90, 'Ori', '', now(), now()
     FROM generate_series(${from}, ${to}) AS i`,
  );
  // Half the objects have a preferred redshift, so "missing redshift" has work to do.
  if (from <= OBJECTS / 2) {
    await sql.query(
      `INSERT INTO measurements (id, object_id, quantity, value, entered_value, entered_unit, source_id, preferred, status, created_at, updated_at)
       SELECT gen_random_uuid(), o.id, 'redshift', 0.1, 0.1, '', $1, true, 'accepted', now(), now()
       FROM sky_objects o WHERE o.name BETWEEN 'Bench Object ' || lpad($2::text, 7, '0') AND 'Bench Object ' || lpad($3::text, 7, '0')`,
      { bind: [source.id, from, to] },
    );
  }
}
// What autovacuum does after a bulk load: visibility map for index-only scans, statistics, GIN lists merged.
await sql.query('VACUUM ANALYZE sky_objects');
await sql.query('VACUUM ANALYZE measurements');
console.log(
  `  seeded in ${((performance.now() - seedStart) / 1000).toFixed(1)} s (objects, half with a preferred redshift, VACUUM ANALYZE)`,
);

// 1. Import
if (!ONLY_TABLE) await benchImport();
async function benchImport() {
  const lines = ['object,quantity,value,unit,band,uncertainty,source'];
  const QUANTITY_ROWS = [
    (i: number) => `apparent_magnitude,${(12 + (i % 700) / 100).toFixed(2)},mag,V,0.02`,
    (i: number) => `distance,${(1 + (i % 900) / 10).toFixed(1)},kpc,,0.1`,
    (i: number) => `parallax,${(0.5 + (i % 400) / 100).toFixed(2)},mas,,0.01`,
  ];
  for (let i = 0; i < ROWS; i += 1) {
    const object = `Bench Object ${String(1 + ((i * 37) % OBJECTS)).padStart(7, '0')}`;
    const bad = i % (ROWS / BAD_ROWS) === 7;
    lines.push(
      bad ? `${object},distance,far,kpc,,,${source.citation}` : `${object},${QUANTITY_ROWS[i % 3](i)},${source.citation}`,
    );
  }
  const buffer = Buffer.from(lines.join('\n'), 'utf8');
  console.log(`CSV file: ${ROWS.toLocaleString('en-GB')} rows, ${(buffer.length / 1024 / 1024).toFixed(1)} MB`);

  const [, parseOnly] = await time(() => parse(buffer.toString('utf8'), { delimiter: ',' }));
  const [checked, dryRun] = await time(() => checkCatalogueImport({ buffer, originalname: 'bench.csv' }, undefined, user));
  const [committed, commit] = await time(() => commitCatalogueImport(checked.id, user, { confirm: true }));
  // A logged table like measurements with its indexes (LIKE copies no foreign keys); dropped at the end.
  await sql.query(
    'CREATE TABLE peer_measurements (LIKE measurements INCLUDING DEFAULTS INCLUDING INDEXES INCLUDING CONSTRAINTS)',
  );
  const [, plainInsert] = await time(() =>
    sql.query(
      `INSERT INTO peer_measurements (id, object_id, quantity, band, value, entered_value, entered_unit, source_id, created_at, updated_at)
     SELECT gen_random_uuid(), o.id, 'distance', NULL, 1000 + i, 1 + i, 'kpc', $1, now(), now()
     FROM generate_series(1, ${ROWS}) AS i JOIN LATERAL (SELECT id FROM sky_objects LIMIT 1) o ON true`,
      { bind: [source.id] },
    ),
  );

  console.log('\nCSV import (50,000 rows; limit: each well under 30 s)');
  console.log(
    `  dry run   ${ms(dryRun)}  (${checked.report.acceptedCount} accepted, ${checked.report.rejectedCount} rejected)   peer: csv-parse alone ${ms(parseOnly)}  ratio ${(dryRun / parseOnly).toFixed(1)}×`,
  );
  console.log(
    `  commit    ${ms(commit)}  (${committed.inserted} inserted with history)   peer: plain INSERT of ${ROWS} rows ${ms(plainInsert)}  ratio ${(commit / plainInsert).toFixed(1)}×`,
  );
}

// 2. The catalogue table
await sql.query('ANALYZE');
const CASES: Array<[string, SkyObjectListQuery]> = [
  ['kind = galaxy, by name, page 1', { kind: 'galaxy', sort: 'name', dir: 'asc', page: 1, pageSize: 50 }],
  ['kind = quasar, by name desc, page 40', { kind: 'quasar', sort: 'name', dir: 'desc', page: 40, pageSize: 50 }],
  [
    'missing redshift, kind = star, by name',
    { kind: 'star', missing: 'redshift', sort: 'name', dir: 'asc', page: 3, pageSize: 50 },
  ],
  ['search "004217", by name', { q: '004217', sort: 'name', dir: 'asc', page: 1, pageSize: 50 }],
];

async function executionMs(statement: string, replacements: Record<string, unknown>): Promise<number> {
  const [row] = await sql.query<{ 'QUERY PLAN': Array<{ 'Execution Time': number; 'Planning Time': number }> }>(
    `EXPLAIN (ANALYZE, FORMAT JSON) ${statement}`,
    { type: QueryTypes.SELECT, replacements },
  );
  const plan = row['QUERY PLAN'][0];
  return plan['Execution Time'] + plan['Planning Time'];
}

async function measure(query: SkyObjectListQuery): Promise<{ page: number; count: number; estimate: number }> {
  const { pageSql, countSql, estimateSql, replacements } = skyObjectPageQueries(query);
  const pages: number[] = [];
  const counts: number[] = [];
  const estimates: number[] = [];
  const [{ total }] = await sql.query<{ total: string }>(countSql, { type: QueryTypes.SELECT, replacements });
  for (let i = 0; i < 15; i += 1) {
    pages.push(await executionMs(pageSql, replacements));
    counts.push(await executionMs(countSql, replacements));
    // Only asked when the capped count reaches its cap; timed round trip (it is itself an EXPLAIN).
    if (Number(total) > EXACT_COUNT_CAP) estimates.push((await time(() => sql.query(estimateSql, { replacements })))[1]);
  }
  return { page: median(pages), count: median(counts), estimate: estimates.length ? median(estimates) : 0 };
}

/** The `after` cursor that leads to a deep page, as the previous page hands it to the table's Next button. */
async function cursorFor(query: SkyObjectListQuery, page: number): Promise<string> {
  const { listSkyObjects } = await import('../../server/services/catalogue/sky-object-list.ts');
  const before = await listSkyObjects({ ...query, page: page - 1 });
  if (!before.nextAfter) throw new Error('no keyset cursor for this sort');
  return before.nextAfter;
}

console.log(
  `\nCatalogue table: page of 50 out of ${OBJECTS.toLocaleString('en-GB')} objects, at the database (planning + execution, median of 15; limit 50 ms)`,
);
await sql.query('SET enable_indexonlyscan = off; SET enable_indexscan = off; SET enable_bitmapscan = off');
const fullReads: number[] = [];
for (let i = 0; i < 15; i += 1) fullReads.push(await executionMs('SELECT count(*) FROM sky_objects', {}));
await sql.query('RESET enable_indexonlyscan; RESET enable_indexscan; RESET enable_bitmapscan');
const fullRead = median(fullReads);
console.log(`  peer: one sequential read of all ${OBJECTS.toLocaleString('en-GB')} objects (count(*), no index) ${ms(fullRead)}`);
const deep = { kind: 'star' as const, sort: 'name' as const, dir: 'asc' as const, page: 1500, pageSize: 50 };
CASES.push(['kind = star, by name, page 1,500 (OFFSET)', deep]);
CASES.push(['kind = star, by name, page 1,500 (keyset)', { ...deep, after: await cursorFor(deep, 1500) }]);
for (const [label, query] of CASES) {
  const t = await measure(query);
  const total = t.page + t.count + t.estimate;
  const estimate = t.estimate ? ` + estimate ${ms(t.estimate).padStart(8)}` : ''.padEnd(20);
  console.log(
    `  ${label.padEnd(44)} rows ${ms(t.page).padStart(9)} + total ${ms(t.count).padStart(9)}${estimate} = ${ms(total).padStart(9)}   ratio to peer ${(total / fullRead).toFixed(2)}×`,
  );
}

await sql.query('DROP TABLE IF EXISTS peer_measurements');
await closeSequelize();
if (startedCluster) stopTestCluster();
