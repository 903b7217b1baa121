/**
 * `npm run bench:statements:compare -- [commit]`: the recompute after a cosmology change
 * (`bench:statements`, 100,000 statements, writes included) at an older commit and at this
 * checkout, one right after the other on the same machine, and the ratio of the two.
 *
 * The older commit is checked out with `git worktree add` into the system's temporary folder
 * (sharing this checkout's node_modules) and runs this checkout's copy of `statements.ts`, so both
 * sides time exactly the same steps; each side seeds its own PostgreSQL cluster in its own folder.
 * The temporary checkout is removed at the end.
 * Default commit: 6c90f6c (main before the recompute work of issue 19).
 * `BENCH_COMPARE_ROUNDS=N` alternates the two N times (default 1).
 */
import { execFileSync, spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const base = process.argv[2] ?? '6c90f6c';
const rounds = Number(process.env.BENCH_COMPARE_ROUNDS ?? 1);
const here = process.cwd();
const sha = execFileSync('git', ['rev-parse', '--short', base], { encoding: 'utf8' }).trim();
const baseDir = path.join(os.tmpdir(), `starproof-bench-${sha}`);

if (!fs.existsSync(path.join(baseDir, 'package.json'))) {
  execFileSync('git', ['worktree', 'add', '--detach', baseDir, sha], { stdio: 'inherit' });
}
if (!fs.existsSync(path.join(baseDir, 'node_modules')))
  fs.symlinkSync(path.join(here, 'node_modules'), path.join(baseDir, 'node_modules'));
// The same harness on both sides.
fs.copyFileSync(path.join(here, 'tests/bench/statements.ts'), path.join(baseDir, 'tests/bench/statements.ts'));

interface Result {
  changeMs: number;
  loopMaxMs: number;
  /** CPU seconds of the recompute: Node (every thread) and PostgreSQL. */
  nodeCpu: number;
  pgCpu: number;
}

/** Runs the harness in one checkout (only the first computation and the change) and reads its RESULT line. */
function runIn(dir: string, label: string, port: number): Promise<Result> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'tests/bench/statements.ts'], {
      cwd: dir,
      env: { ...process.env, BENCH_PG_PORT: String(port), BENCH_STATEMENTS_CHANGE_ONLY: '1' },
      stdio: ['ignore', 'pipe', 'inherit'],
    });
    let out = '';
    child.stdout.on('data', (chunk: Buffer) => {
      out += chunk;
      for (const line of chunk.toString().split('\n')) if (line) console.log(`[${label}] ${line}`);
    });
    child.on('error', reject);
    child.on('exit', (code) => {
      const m = /RESULT change_ms=(\d+) loop_max_ms=([\d.]+)/.exec(out);
      // The recompute's CPU line is the last one before the RESULT line.
      const cpu = [...out.slice(0, m?.index ?? 0).matchAll(/CPU: Node ([\d.]+) s .*?PostgreSQL ([\d.]+) s/g)].at(-1);
      if (code !== 0 || !m || !cpu) reject(new Error(`${label}: the benchmark ended with code ${code} and no RESULT line`));
      else resolve({ changeMs: Number(m[1]), loopMaxMs: Number(m[2]), nodeCpu: Number(cpu[1]), pgCpu: Number(cpu[2]) });
    });
  });
}

const port = Number(process.env.BENCH_PG_PORT ?? 54599);
const results: Array<{ base: Result; head: Result }> = [];
for (let round = 0; round < rounds; round++) {
  const old = await runIn(baseDir, sha, port);
  const head = await runIn(here, 'this checkout', port);
  results.push({ base: old, head });
}
const s = (ms: number) => `${(ms / 1000).toFixed(1)} s`;
console.log(
  `\nrecompute of 100,000 statements after a cosmology change, writes included (target: ratio ≤ 0.50, loop max < 50 ms)`,
);
// On a machine shared with other work the wall times move with everyone else's load; the CPU the
// recompute used (Node's threads and PostgreSQL) moves much less, so both ratios are printed.
const cpu = (r: Result) =>
  `CPU ${(r.nodeCpu + r.pgCpu).toFixed(1)} s (Node ${r.nodeCpu.toFixed(1)}, PostgreSQL ${r.pgCpu.toFixed(1)})`;
for (const [i, { base: b, head: h }] of results.entries()) {
  console.log(`  round ${i + 1}:`);
  console.log(`    ${sha.padEnd(13)} wall ${s(b.changeMs)}, ${cpu(b)}, event-loop delay max ${b.loopMaxMs.toFixed(0)} ms`);
  console.log(`    this checkout wall ${s(h.changeMs)}, ${cpu(h)}, event-loop delay max ${h.loopMaxMs.toFixed(0)} ms`);
  console.log(
    `    ratio this / ${sha}: wall ${(h.changeMs / b.changeMs).toFixed(2)}, CPU ${((h.nodeCpu + h.pgCpu) / (b.nodeCpu + b.pgCpu)).toFixed(2)}`,
  );
}
execFileSync('git', ['worktree', 'remove', '--force', baseDir], { stdio: 'inherit' });
