import fs from 'node:fs';

/**
 * The Node options `npm start` runs the server with (its `NODE_OPTIONS=…` in package.json), so a
 * benchmark's servers run as production does: one place sets them, the benchmarks read it.
 * @returns the options as command-line arguments (empty when `npm start` sets none)
 */
export function productionNodeOptions(): string[] {
  // BENCH_NODE_OPTIONS (even empty) replaces them, to measure what they change.
  const override = process.env.BENCH_NODE_OPTIONS;
  if (override !== undefined) return override.split(/\s+/).filter(Boolean);
  const start = (JSON.parse(fs.readFileSync('package.json', 'utf8')) as { scripts: { start: string } }).scripts.start;
  const match = /NODE_OPTIONS=(?:'([^']*)'|"([^"]*)"|(\S+))/.exec(start);
  const value = match ? (match[1] ?? match[2] ?? match[3]) : '';
  return value.split(/\s+/).filter(Boolean);
}
