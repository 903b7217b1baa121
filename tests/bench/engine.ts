/**
 * `npm run bench:engine`: luminosity distances for 1,000,000 redshifts uniform in
 * [0.01, 10], with the Planck 2018 preset and with a flat model without radiation.
 * Prints model set-up time, time per million evaluations, the largest relative
 * difference from a slow high-precision integration, and — when Debian's
 * python3-astropy (with python3-scipy) is installed — astropy's time and values
 * on the same redshifts in the same run.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { luminosityDistanceMpc, prepareCosmology, type Cosmology } from '../../shared/engine/cosmology/distances.ts';
import { createModel, type CosmologyParams } from '../../shared/engine/cosmology/model.ts';
import { PLANCK18 } from '../../shared/engine/cosmology/presets.ts';
import { integrate } from '../../shared/engine/cosmology/quadrature.ts';
import { mulberry32 } from '../../shared/engine/uncertainty.ts';

const N = 1_000_000;
const SLOW_SUBSAMPLE = 20_000;
const rand = mulberry32(12345);
const zs = new Float64Array(N);
for (let i = 0; i < N; i++) zs[i] = 0.01 + rand() * 9.99;

const MODELS: { label: string; params: CosmologyParams; astropy: string }[] = [
  { label: 'Planck 2018 preset', params: PLANCK18.params, astropy: 'Planck18' },
  {
    label: 'flat, no radiation (H0 = 70, Ωm = 0.3)',
    params: { name: 'flat', H0: 70, Om0: 0.3 },
    astropy: 'FlatLambdaCDM(H0=70, Om0=0.3, Tcmb0=0)',
  },
];

/** D_L by direct adaptive quadrature at tight tolerance, independent of the table. */
function slowLuminosityDistance(c: Cosmology, z: number): number {
  const m = c.model;
  const dc = integrate((u) => Math.exp(u) / Math.sqrt(m.e2(Math.expm1(u))), 0, Math.log1p(z), 1e-15);
  return (1 + z) * dc * m.hubbleDistance; // both models are flat
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function astropyRun(dir: string): Record<string, number> | null {
  const script = `
import json, sys, time
import numpy as np
from astropy.cosmology import Planck18, FlatLambdaCDM
import astropy
z = np.fromfile(sys.argv[1], dtype='<f8')
out = {'version': astropy.__version__}
for i, c in enumerate([Planck18, FlatLambdaCDM(H0=70, Om0=0.3, Tcmb0=0)]):
    t = time.perf_counter()
    d = c.luminosity_distance(z).value
    out['t%d' % i] = time.perf_counter() - t
    d.astype('<f8').tofile(sys.argv[2] + str(i))
print(json.dumps(out))
`;
  writeFileSync(join(dir, 'z.bin'), Buffer.from(zs.buffer));
  for (const py of ['/usr/bin/python3', 'python3']) {
    try {
      const text = execFileSync(py, ['-c', script, join(dir, 'z.bin'), join(dir, 'd')], {
        encoding: 'utf8',
        stdio: ['ignore', 'pipe', 'ignore'],
        timeout: 300_000,
      });
      return JSON.parse(text.trim().split('\n').pop() as string) as Record<string, number>;
    } catch {
      // try the next interpreter; astropy (and scipy) may be missing from this one
    }
  }
  return null;
}

console.log(`Starproof engine benchmark: luminosity distance for ${N.toLocaleString('en')} redshifts uniform in [0.01, 10]\n`);
const dir = mkdtempSync(join(tmpdir(), 'starproof-bench-'));
const ours: Float64Array[] = [];
const ourTimes: number[] = [];
try {
  for (const { label, params } of MODELS) {
    const setups: number[] = [];
    let cosmo: Cosmology | null = null;
    for (let k = 0; k < 7; k++) {
      const t0 = performance.now();
      cosmo = prepareCosmology(createModel({ ...params, H0: params.H0 + k * 1e-9 }));
      setups.push(performance.now() - t0);
    }
    cosmo = prepareCosmology(createModel(params));
    const out = new Float64Array(N);
    for (let i = 0; i < 100_000; i++) out[i] = luminosityDistanceMpc(cosmo, zs[i]); // warm-up
    const t1 = performance.now();
    for (let i = 0; i < N; i++) out[i] = luminosityDistanceMpc(cosmo, zs[i]);
    const evalMs = performance.now() - t1;
    ours.push(out);
    ourTimes.push(evalMs);
    let worst = 0;
    const t2 = performance.now();
    for (let i = 0; i < SLOW_SUBSAMPLE; i++) {
      const j = Math.floor((i * N) / SLOW_SUBSAMPLE);
      const ref = slowLuminosityDistance(cosmo, zs[j]);
      worst = Math.max(worst, Math.abs(out[j] - ref) / ref);
    }
    const slowMs = performance.now() - t2;
    console.log(`${label}`);
    console.log(`  set-up (model + table): first ${setups[0].toFixed(2)} ms, median of 7 ${median(setups).toFixed(2)} ms`);
    console.log(`  time per million:       ${(evalMs / 1000).toFixed(3)} s (${((evalMs * 1e6) / N).toFixed(1)} ns per redshift)`);
    console.log(
      `  largest relative difference vs slow adaptive quadrature (tolerance 1e-15) on every ${N / SLOW_SUBSAMPLE}th point (${SLOW_SUBSAMPLE.toLocaleString('en')} points, ${(slowMs / 1000).toFixed(1)} s): ${worst.toExponential(2)}\n`,
    );
  }
  const py = astropyRun(dir);
  if (py === null) {
    console.log('astropy: not available (needs Debian python3-astropy and python3-scipy); skipped.');
  } else {
    console.log(`astropy ${py.version}, same ${N.toLocaleString('en')} redshifts, vectorised luminosity_distance:`);
    MODELS.forEach((m, i) => {
      const theirs = new Float64Array(readFileSync(join(dir, `d${i}`)).buffer.slice(0));
      let worst = 0;
      for (let k = 0; k < N; k++) worst = Math.max(worst, Math.abs(ours[i][k] - theirs[k]) / theirs[k]);
      const t = py[`t${i}`];
      console.log(
        `  ${m.astropy}: ${t.toFixed(3)} s per million; Starproof is ${(t / (ourTimes[i] / 1000)).toFixed(0)}× faster; largest relative difference from astropy ${worst.toExponential(2)}`,
      );
    });
  }
} finally {
  rmSync(dir, { recursive: true, force: true });
}
