import { describe, expect, it } from 'vitest';
import boundaries from '../../../shared/catalogue/constellation-boundaries-roman-1987.json' with { type: 'json' };
import { CONSTELLATION_NAMES, constellationAt, precessJ2000ToB1875 } from '../../../shared/catalogue/constellations.ts';

describe('constellation from position (Roman 1987, CDS VI/42)', () => {
  it('ships the whole published table: 357 strips naming all 88 constellations', () => {
    // CDS VI/42 data.dat has 357 rows (published source: the catalogue's ReadMe).
    expect(boundaries.rows).toHaveLength(357);
    expect(new Set(boundaries.rows.map((r) => r[3])).size).toBe(88);
    expect(Object.keys(CONSTELLATION_NAMES).sort()).toEqual([...new Set(boundaries.rows.map((r) => r[3] as string))].sort());
    // The table runs from the north polar cap to Octans at −90° (published source: VI/42 data.dat, first and last rows).
    expect(boundaries.rows[0]).toEqual([0, 24, 88, 'UMi']);
    expect(boundaries.rows[356]).toEqual([0, 24, -90, 'Oct']);
  });

  // J2000 positions rounded to 0.001°, recalled from memory (SIMBAD-style values); constellations are common knowledge.
  const bright: Array<[string, number, number, string]> = [
    ['Sirius', 101.287, -16.716, 'CMa'],
    ['Betelgeuse', 88.793, 7.407, 'Ori'],
    ['Rigel', 78.634, -8.202, 'Ori'],
    ['Polaris', 37.955, 89.264, 'UMi'],
    ['Vega', 279.235, 38.784, 'Lyr'],
    ['Deneb', 310.358, 45.28, 'Cyg'],
    ['Altair', 297.696, 8.868, 'Aql'],
    ['Antares', 247.352, -26.432, 'Sco'],
    ['Regulus', 152.093, 11.967, 'Leo'],
    ['Arcturus', 213.915, 19.182, 'Boo'],
    ['Spica', 201.298, -11.161, 'Vir'],
    ['Canopus', 95.988, -52.696, 'Car'],
    ['Alpha Centauri', 219.902, -60.834, 'Cen'],
    ['Acrux', 186.65, -63.099, 'Cru'],
    ['Fomalhaut', 344.413, -29.622, 'PsA'],
    ['Andromeda Galaxy', 10.685, 41.269, 'And'],
    ['Large Magellanic Cloud', 80.894, -69.756, 'Dor'],
    ['Crab Nebula', 83.633, 22.015, 'Tau'],
    ['Sigma Octantis', 317.195, -88.956, 'Oct'],
    ['Aldebaran', 68.98, 16.509, 'Tau'],
    ['Capella', 79.172, 45.998, 'Aur'],
  ];
  it.each(bright)('%s is in %s', (_name, ra, dec, expected) => {
    expect(constellationAt(ra, dec)).toBe(expected);
  });

  it('precesses J2000 to B1875 by about 1.7° in right ascension near the equator at 6h', () => {
    // General precession is about 50.3″ a year (common practice); 125 years ≈ 1.75° along the ecliptic,
    // which near α = 6h, δ = 0 moves right ascension back by about that much.
    const p = precessJ2000ToB1875(90, 0);
    expect(90 - p.raDeg).toBeGreaterThan(1.6);
    expect(90 - p.raDeg).toBeLessThan(1.9);
  });

  it('refuses positions that are not on the sky', () => {
    expect(() => constellationAt(10, 91)).toThrow(RangeError);
    expect(() => constellationAt(Number.NaN, 0)).toThrow(RangeError);
  });
});
