/**
 * The "light from a planet tonight" statement: wording per locale, refusals, and the working.
 * Check values: the planet distance the sky engine gives (reference-tested against astropy in
 * tests/reference/sky) times the IAU 2012 au over the defined c, and hand-worked cases from those
 * constants.
 */
import { describe, expect, it } from 'vitest';
import { ASTRONOMICAL_UNIT, SPEED_OF_LIGHT } from '../../../shared/engine/constants.ts';
import { PLANET_IDS, type PlanetId } from '../../../shared/sky/bodies.ts';
import { Ephemeris } from '../../../shared/sky/ephemeris.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';
import {
  roundToSignificant,
  evaluateStatement,
  nightFromSky,
  type StatementNight,
  type TemplateContext,
  type TemplateSuccess,
} from '../../../shared/statements/index.ts';
import {
  DISTANCE_RELATIVE_UNCERTAINTY,
  LARGEST_MEASURED_DIFFERENCE,
  NIGHT_DRIFT_BOUND,
  WINDOW_DRIFT,
} from '../../../shared/statements/tonight.ts';
import fixture from '../../reference/sky/astropy-fixture.json';

const venue = {
  id: 'venue-1',
  name: 'Corrie Vale Planetarium (demo)',
  latitude: 54.6,
  longitude: -2.9,
  elevationM: 120,
  timeZone: 'Europe/London',
};
const sky = computeSkyTonight({ ...venue, localDate: '2026-12-03', now: Date.UTC(2026, 11, 3, 9) });
const SECONDS_PER_AU = ASTRONOMICAL_UNIT.value / 1000 / SPEED_OF_LIGHT.value;

const ctx = (object: TemplateContext['object'], extra: Partial<TemplateContext> = {}): TemplateContext => ({
  object,
  measurements: [],
  model: { preset: 'planck18' },
  band: 'V',
  venue,
  night: nightFromSky(sky),
  ...extra,
});
const planet = (name: string, designations: string[] = []) => ({ id: 'o', name, kind: 'planet', designations });

/** A night whose planets all sit at the given distance (for hand-worked values). */
const nightAt = (distanceAu: number): StatementNight => ({
  ...nightFromSky(sky),
  planets: PLANET_IDS.map((id) => ({ id, distanceAu })),
});

function ok(c: TemplateContext): TemplateSuccess {
  const r = evaluateStatement('planet-light-tonight', c);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

describe('planet-light-tonight', () => {
  it('is the sky engine’s distance times au / c, worded in each locale with the night in the small print', () => {
    const jupiter = sky.planets.find((p) => p.id === 'jupiter')!;
    const r = ok(ctx(planet('Jupiter')));
    expect(r.value).toBeCloseTo((jupiter.distanceAu * SECONDS_PER_AU) / 60, 9);
    // The sky engine's own light time agrees (it uses the same constants).
    expect(r.value * 60).toBeCloseTo(jupiter.lightTimeSeconds, 6);
    // Three figures by the ephemeris uncertainty, fewer when three would change during the evening.
    const shown = r.value.toPrecision(r.significantFigures);
    expect(r.significantFigures).toBeGreaterThanOrEqual(2);
    expect(r.texts['en-GB']).toBe(`Light from Jupiter takes about ${shown} minutes to reach us tonight.`);
    expect(r.texts['en-US']).toBe(r.texts['en-GB']);
    expect(r.texts['fr-FR']).toBe(
      `La lumière de Jupiter met environ ${shown.replace('.', ',')} minutes à nous parvenir ce soir.`,
    );
    expect(r.footnotes?.['en-GB']).toMatch(
      /^For Corrie Vale Planetarium \(demo\) on the night of 3 December 2026 at \d\d:\d\d local time \(the end of nautical twilight\)\.$/,
    );
    expect(r.footnotes?.['en-US']).toMatch(/December 3, 2026/);
    expect(r.footnotes?.['fr-FR']).toMatch(/la nuit du 3 décembre 2026 à \d\d h \d\d, heure locale/);
    expect(r.model).toBeNull();
    expect(r.inputs).toEqual([]);
  });

  it('hand-worked: 5 au is 41.58 minutes, from the IAU au and the defined c (1 au of light ≈ 499.005 s, recalled from memory)', () => {
    expect(SECONDS_PER_AU).toBeCloseTo(499.00478384, 6);
    const r = ok(ctx(planet('Jupiter'), { night: nightAt(5) }));
    expect(r.value).toBeCloseTo((5 * 499.00478384) / 60, 6);
    // Over ±6 h Jupiter's distance moves by up to 0.097 %: 41.54–41.62 min, "41.5" to "41.6" at three
    // figures, so two figures, which hold all evening.
    expect(r.texts['en-GB']).toBe('Light from Jupiter takes about 42 minutes to reach us tonight.');
    expect(r.working.at(-1)!.note).toMatch(/3 figures would change during the evening, 2 significant figures hold/);
    // 4.497 au = 37.401 min, 37.365–37.437 over the evening: "37.4" throughout, three figures hold.
    const held = ok(ctx(planet('Jupiter'), { night: nightAt(4.497) }));
    expect(held.texts['en-GB']).toBe('Light from Jupiter takes about 37.4 minutes to reach us tonight.');
    expect(held.working.at(-1)!.note).toMatch(/the wording holds for the whole evening/);
  });

  it('gives Uranus and Neptune in hours and minutes, the others in minutes', () => {
    // 19 au × 499.00478 s = 9481.09 s = 158.0 min → 2 h 38 min; 30 au = 249.5 min → 250 → 4 h 10 min.
    const uranus = ok(ctx(planet('Uranus'), { night: nightAt(19) }));
    expect(uranus.texts['en-GB']).toBe('Light from Uranus takes about 2 hours and 38 minutes to reach us tonight.');
    expect(uranus.texts['fr-FR']).toBe('La lumière d’Uranus met environ 2 heures 38 minutes à nous parvenir ce soir.');
    const neptune = ok(ctx(planet('Neptune'), { night: nightAt(30) }));
    expect(neptune.texts['en-US']).toBe('Light from Neptune takes about 4 hours and 10 minutes to reach us tonight.');
    const saturn = ok(ctx(planet('Saturn'), { night: nightAt(10) }));
    // 10 au = 83.17 min: Saturn stays in minutes even above an hour (83.13–83.22 over the evening: two figures hold).
    expect(saturn.texts['en-GB']).toBe('Light from Saturn takes about 83 minutes to reach us tonight.');
    expect(saturn.texts['fr-FR']).toBe('La lumière de Saturne met environ 83 minutes à nous parvenir ce soir.');
  });

  it('recognises a planet by a designation, and uses the French name in French', () => {
    const r = ok(ctx(planet('The fourth planet', ['mars'])));
    expect(r.texts['en-GB']).toMatch(/^Light from The fourth planet takes about/);
    expect(r.texts['fr-FR']).toMatch(/^La lumière de Mars met environ/);
    expect(ok(ctx(planet('Venus'))).texts['fr-FR']).toMatch(/^La lumière de Vénus/);
  });

  it('refuses an object that is not a planet the sky engine knows, and says why', () => {
    // A star is refused by the template's kinds before anything else (statement rules release 2).
    const star = evaluateStatement('planet-light-tonight', ctx({ id: 'o', name: 'Vega', kind: 'star' }));
    expect(star).toMatchObject({ ok: false, code: 'not_applicable' });
    if (!star.ok) expect(star.reason).toMatch(/not for an object of kind “star”/);
    const pluto = evaluateStatement('planet-light-tonight', ctx(planet('Pluto')));
    if (pluto.ok) throw new Error('Pluto is not in the sky engine');
    expect(pluto.reason).toMatch(/Mercury, Venus, Mars, Jupiter, Saturn, Uranus, Neptune\); “Pluto” is not one of them/);
    // A star that happens to be named like a planet is still not a planet.
    expect(evaluateStatement('planet-light-tonight', ctx({ id: 'o', name: 'Mars', kind: 'star' })).ok).toBe(false);
  });

  it('refuses without a venue, or without the night’s sky', () => {
    const noVenue = evaluateStatement('planet-light-tonight', ctx(planet('Jupiter'), { venue: null, night: null }));
    expect(noVenue).toMatchObject({ ok: false, code: 'missing_input', missing: ['venue'] });
    if (!noVenue.ok) expect(noVenue.reason).toMatch(/Needs a venue/);
    const noSky = evaluateStatement('planet-light-tonight', ctx(planet('Jupiter'), { night: null }));
    expect(noSky).toMatchObject({ ok: false, missing: ['sky'] });
    const badDistance = evaluateStatement('planet-light-tonight', ctx(planet('Jupiter'), { night: nightAt(Number.NaN) }));
    expect(badDistance.ok).toBe(false);
  });

  it('shows its working: distance at the observation time, its uncertainty, t = d × au / c, minutes, wording', () => {
    const r = ok(ctx(planet('Jupiter')));
    expect(r.working.map((s) => s.title)).toEqual([
      'Jupiter’s distance from the Earth at the observation time',
      'Uncertainty of the distance',
      'Light-travel time',
      'In minutes',
      'How far the light time moves during the evening (±6 h)',
      'Public wording: round to what the data supports',
    ]);
    const [distance, sigma, time] = r.working;
    expect(distance.inputs[0]).toMatchObject({ symbol: 't', value: sky.observation.utc!.replace(/\.\d+Z$/, 'Z') });
    expect(distance.inputs[0].source).toMatch(/Corrie Vale Planetarium \(demo\).*night of 2026-12-03/);
    expect(distance.note).toMatch(/VSOP87/);
    expect(sigma.inputs[1]).toMatchObject({ symbol: 'k', value: DISTANCE_RELATIVE_UNCERTAINTY.jupiter });
    expect(sigma.note).toMatch(/far more precise than the wording/);
    expect(time.formula).toBe('t = d × au / c');
    expect(time.constants.map((c) => c.source)).toEqual([
      'IAU 2012 Resolution B2; exact',
      'SI definition of the metre (CGPM 1983); exact',
    ]);
    expect(r.working.at(-1)!.note).toMatch(/below 3 %\): 3 significant figures/);
    expect(r.interval!.high / r.value - 1).toBeCloseTo(DISTANCE_RELATIVE_UNCERTAINTY.jupiter, 12);
  });

  it('records the night and, apart from it, the method a reviewer signs off', () => {
    const r = ok(ctx(planet('Jupiter')));
    expect(r.night).toMatchObject({ venueId: 'venue-1', localDate: '2026-12-03', observationUtc: sky.observation.utc });
    expect(r.night!.method).toMatchObject({
      planet: 'jupiter',
      venue: { latitude: 54.6, longitude: -2.9, elevationM: 120, timeZone: 'Europe/London' },
      constants: { auM: 149_597_870_700, cKmS: 299_792.458 },
    });
    expect(r.night!.method.wording['en-GB']).toBe('Light from Jupiter takes about … to reach us tonight.');
    // Another night: same method, another number.
    const later = computeSkyTonight({ ...venue, localDate: '2027-02-10', now: 0 });
    const r2 = ok(ctx(planet('Jupiter'), { night: nightFromSky(later) }));
    expect(r2.night!.method).toEqual(r.night!.method);
    expect(r2.value).not.toBeCloseTo(r.value, 1);
  });

  it('gives each planet’s distance an uncertainty no smaller than its measured difference from astropy', () => {
    const ephemeris = new Ephemeris();
    for (const c of fixture.cases.filter((x) => x.body !== 'sun')) {
      const ours = ephemeris.planet(c.body as PlanetId, c.jde).distanceAu;
      const rel = Math.abs(ours - c.distance_au) / c.distance_au;
      expect(rel, `${c.body} on ${c.date}`).toBeLessThanOrEqual(DISTANCE_RELATIVE_UNCERTAINTY[c.body as PlanetId]);
      expect(rel).toBeLessThanOrEqual(LARGEST_MEASURED_DIFFERENCE);
    }
  });

  it('Mercury’s distance, the fastest to change, moves by under 1 % within six hours (sampled 2020–2039)', () => {
    const ephemeris = new Ephemeris();
    let largest = 0;
    for (let jd = 2_458_849.5; jd < 2_466_154.5; jd += 11) {
      const d = ephemeris.planet('mercury', jd).distanceAu;
      for (const offset of [-0.25, 0.25])
        largest = Math.max(largest, Math.abs(ephemeris.planet('mercury', jd + offset).distanceAu - d) / d);
    }
    expect(largest).toBeGreaterThan(NIGHT_DRIFT_BOUND / 4);
    expect(largest).toBeLessThan(NIGHT_DRIFT_BOUND);
  }, 60_000);

  it('each planet’s drift bound holds: its distance changes by less within ±6 h (sampled every 17 days, 2020–2039)', () => {
    const ephemeris = new Ephemeris();
    for (const id of PLANET_IDS) {
      let largest = 0;
      for (let jd = 2_458_850.1; jd < 2_466_154.5; jd += 17) {
        const d = ephemeris.planet(id, jd).distanceAu;
        for (const offset of [-0.25, 0.25])
          largest = Math.max(largest, Math.abs(ephemeris.planet(id, jd + offset).distanceAu - d) / d);
      }
      expect(largest, id).toBeLessThan(WINDOW_DRIFT[id]);
      // A bound no looser than 1.5 times the largest change found, so it does not throw figures away.
      expect(largest * 1.5, id).toBeGreaterThan(WINDOW_DRIFT[id]);
    }
  }, 60_000);

  it('the wording holds over ±6 h on every night of a year (Mercury, Venus, Jupiter, Saturn)', () => {
    const ephemeris = new Ephemeris();
    const text = (id: PlanetId, name: string, jd: number, figures?: number) => {
      const night = { ...nightFromSky(sky), planets: [{ id, distanceAu: ephemeris.planet(id, jd).distanceAu }] };
      const r = ok(ctx(planet(name), { night }));
      if (figures !== undefined) expect(r.significantFigures).toBe(figures);
      return r;
    };
    const names: Record<string, string> = { mercury: 'Mercury', venus: 'Venus', jupiter: 'Jupiter', saturn: 'Saturn' };
    const threeFigures: Record<string, number> = {};
    let boundaryNights = 0;
    // Every night of 2027 at 18:00 UTC, the wording compared every 3 hours from −6 h to +6 h.
    for (const id of ['mercury', 'venus', 'jupiter', 'saturn'] as const) {
      threeFigures[id] = 0;
      for (let jd = 2_461_406.25; jd < 2_461_406.25 + 365; jd += 1) {
        const r = text(id, names[id], jd);
        if (r.significantFigures === 3) threeFigures[id]++;
        const note = r.working.at(-1)!.note ?? '';
        const holdsFor = /hold for at least (\d+) minutes either side/.exec(note);
        const holds = holdsFor === null;
        if (!holds) boundaryNights++;
        const shown = roundToSignificant(r.value, r.significantFigures);
        const step = 10 ** (Math.floor(Math.log10(r.value)) - r.significantFigures + 1);
        for (const hours of [-6, -3, 3, 6]) {
          // The light time later in the evening, worded to the figures chosen for the night.
          const later = roundToSignificant(text(id, names[id], jd + hours / 24).value, r.significantFigures);
          if (holds || Math.abs(hours) * 60 <= Number(holdsFor![1])) expect(later, `${id} at JD ${jd} ${hours} h`).toBe(shown);
          // On a night that says so, the words move by at most one in the last figure after the time stated.
          else expect(Math.abs(later - shown)).toBeLessThanOrEqual(step * 1.000001);
        }
      }
    }
    // The precision is not thrown away: most nights keep more than one figure, and some keep three.
    expect(threeFigures.jupiter + threeFigures.saturn).toBeGreaterThan(100);
    // Nights on a rounding boundary even at one figure fewer, whose working states a shorter time,
    // are a minority (373 of 1460 when written, mostly Mercury and Venus, which move fastest).
    expect(boundaryNights).toBeLessThan(4 * 365 * 0.3);
  }, 120_000);
});
