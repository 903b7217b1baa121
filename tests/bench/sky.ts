/**
 * Benchmark: the sky tonight for one venue and for 100 venues, and astropy (Debian python3-astropy,
 * built-in ephemeris) computing the same positions in the same run, as a ratio.
 *   npm run bench:sky
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { PLANET_IDS } from '../../shared/sky/bodies.ts';
import { Ephemeris } from '../../shared/sky/ephemeris.ts';
import { computeSkyTonight, type SkyRequest } from '../../shared/sky/tonight.ts';

const DATE = '2026-11-20';
const ZONES = [
  'Europe/London',
  'America/New_York',
  'Asia/Tokyo',
  'Australia/Sydney',
  'America/Santiago',
  'Africa/Nairobi',
  'Asia/Kolkata',
  'Pacific/Auckland',
  'America/Anchorage',
  'Europe/Oslo',
];

/** 100 venues spread over latitudes −70..70 and all longitudes (deterministic). */
const venues: SkyRequest[] = Array.from({ length: 100 }, (_, i) => ({
  latitude: -70 + ((i * 37) % 141),
  longitude: -180 + ((i * 73) % 360),
  elevationM: (i * 13) % 800,
  timeZone: ZONES[i % ZONES.length],
  localDate: DATE,
  now: Date.UTC(2026, 10, 20, 9),
}));
const demo: SkyRequest = {
  latitude: 54.62,
  longitude: -2.95,
  elevationM: 160,
  timeZone: 'Europe/London',
  localDate: DATE,
  now: Date.UTC(2026, 10, 20, 9),
};

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
function time(fn: () => void, runs: number): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const t = performance.now();
    fn();
    times.push(performance.now() - t);
  }
  return median(times);
}

// Warm-up: module load, JIT, VSOP87 series construction.
for (let i = 0; i < 3; i += 1) computeSkyTonight(demo);

const one = time(() => computeSkyTonight(demo), 15);
const hundredOwn = time(() => {
  for (const v of venues) computeSkyTonight(v);
}, 3);
const hundredShared = time(() => {
  const ephemeris = new Ephemeris();
  for (const v of venues) computeSkyTonight(v, { ephemeris });
}, 3);

// The positions one snapshot computes, for the peer.
const probe = new Ephemeris();
computeSkyTonight(demo, { ephemeris: probe });
const places = probe.placesComputed();
const planetPlaces = places.filter(
  (p) => (PLANET_IDS as readonly string[]).includes(p.body) || p.body === 'sun' || p.body === 'moon',
);
const oursPositions = time(() => {
  const e = new Ephemeris();
  for (const p of planetPlaces) {
    if (p.body === 'sun') e.sun(p.jde);
    else if (p.body === 'moon') e.moon(p.jde);
    else e.planet(p.body as (typeof PLANET_IDS)[number], p.jde);
  }
}, 15);

const ms = (x: number) => `${x.toFixed(1)} ms`;
console.log(`Sky tonight benchmark (Node ${process.version}, date ${DATE})`);
console.log(`  one venue, full snapshot (median of 15):            ${ms(one)}`);
console.log(`  100 venues, each with its own ephemeris (median of 3): ${ms(hundredOwn)}  (${ms(hundredOwn / 100)} per venue)`);
console.log(`  100 venues, one shared ephemeris (median of 3):     ${ms(hundredShared)}  (${ms(hundredShared / 100)} per venue)`);
console.log(`  the ${planetPlaces.length} apparent places in one snapshot, alone:       ${ms(oursPositions)}`);

const python = '/usr/bin/python3';
const check = existsSync(python) ? spawnSync(python, ['-c', 'import astropy'], { encoding: 'utf8' }) : null;
if (check?.status !== 0) {
  console.log('  astropy: not available (install Debian python3-astropy for the ratio)');
} else {
  const run = spawnSync(python, ['tests/bench/sky-astropy.py'], {
    input: JSON.stringify(planetPlaces.map((p) => ({ body: p.body, jde: p.jde }))),
    encoding: 'utf8',
  });
  if (run.status !== 0) {
    console.log(`  astropy: failed: ${run.stderr.split('\n').slice(-3).join(' ')}`);
  } else {
    const peer = JSON.parse(run.stdout) as {
      astropy_version: string;
      positions: number;
      one_by_one_s: number;
      vectorised_s: number;
    };
    const oneByOne = peer.one_by_one_s * 1000;
    const vectorised = peer.vectorised_s * 1000;
    console.log(
      `  astropy ${peer.astropy_version} get_body, same ${peer.positions} places, one call each: ${ms(oneByOne)}  (ratio astropy/ours ${(oneByOne / oursPositions).toFixed(1)}×)`,
    );
    console.log(
      `  astropy ${peer.astropy_version} get_body, same places, one vectorised call per body: ${ms(vectorised)}  (ratio astropy/ours ${(vectorised / oursPositions).toFixed(1)}×)`,
    );
  }
}
