import { describe, expect, it } from 'vitest';
import { checkRange, describeUnits, findUnit, QUANTITIES } from '../../../shared/catalogue/quantities.ts';
import { MeasurementInputSchema } from '../../../shared/schemas/measurement.ts';

const factor = (q: keyof typeof QUANTITIES, unit: string) => findUnit(QUANTITIES[q], unit)!.toCanonical;

describe('quantities and their units', () => {
  it('converts to canonical units with the published constants', () => {
    // 1 ly = 0.306601 pc (IAU: c × Julian year; parsec from IAU 2015 B2), recalled to 6 figures.
    expect(factor('distance', 'ly')).toBeCloseTo(0.306601, 6);
    // 1 au = 1/206264.806 pc (IAU 2015 B2: pc = 648000/π au).
    expect(1 / factor('distance', 'au')).toBeCloseTo(206264.806, 3);
    // Nominal R☉ = 695 700 km (IAU 2015 Resolution B3).
    expect(factor('radius', 'R_sun')).toBe(695_700);
    // M☉ = GM☉ / G = 1.98841e30 kg with CODATA 2018 G (published: IAU 2015 B3 note, recalled from memory).
    expect(factor('mass', 'M_sun') / 1.98841e30).toBeCloseTo(1, 4);
    // M⊕ = GM⊕ / G = 5.9722e24 kg (recalled from memory).
    expect(factor('mass', 'M_earth') / 5.9722e24).toBeCloseTo(1, 3);
    expect(factor('parallax', 'µas')).toBe(0.001);
    expect(factor('parallax', 'uas')).toBe(0.001);
    expect(factor('angular_size', 'deg')).toBe(3600);
  });

  it('names the accepted units in refusals', () => {
    expect(describeUnits(QUANTITIES.distance)).toBe('pc, kpc, Mpc, ly, au or km');
    expect(describeUnits(QUANTITIES.redshift)).toBe('no unit');
    expect(findUnit(QUANTITIES.distance, 'mpc')).toBeUndefined();
  });

  it('keeps values in their physical range', () => {
    expect(checkRange(QUANTITIES.redshift, -1)).toMatch(/Redshift must be greater than −1: 1 \+ z is a ratio of wavelengths/);
    expect(checkRange(QUANTITIES.redshift, -0.001)).toBeUndefined();
    expect(checkRange(QUANTITIES.extinction, -0.1)).toMatch(/cannot be less than 0/);
    expect(checkRange(QUANTITIES.parallax, -0.3)).toBeUndefined();
  });

  it('the shared schema converts value and uncertainty together and keeps what was typed', () => {
    const parsed = MeasurementInputSchema.parse({
      quantity: 'distance',
      value: '2.5',
      unit: 'Mpc',
      uncertaintyMinus: '0.1',
      uncertaintyPlus: '0.2',
    });
    expect(parsed).toMatchObject({
      value: 2_500_000,
      uncertaintyMinus: 100_000,
      uncertaintyPlus: 200_000,
      enteredValue: 2.5,
      enteredUnit: 'Mpc',
      band: null,
    });
    const issues = MeasurementInputSchema.safeParse({
      quantity: 'apparent_magnitude',
      value: '1,5',
      unit: 'mag',
      band: 'V',
      uncertaintyMinus: '0.1',
    });
    expect(issues.success).toBe(false);
    expect(issues.error!.issues.map((i) => i.path[0])).toEqual(['value', 'uncertaintyPlus']);
  });
});
