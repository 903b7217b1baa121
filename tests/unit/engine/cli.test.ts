/** `npm run calc`: one JSON result per input line, in order; bad lines give error results. */
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

describe('calc command line', () => {
  it('answers each line in order, including malformed ones', { timeout: 60_000 }, () => {
    const input = [
      '{"id":1,"quantity":"age_now"}',
      'this is not json',
      '',
      '{"id":3,"quantity":"parallax_distance","inputs":{"parallax_mas":0}}',
      '{"id":4,"quantity":"luminosity_distance","inputs":{"z":0.05},"model":{"law":"hubble","H0":70}}',
      '{"id":5,"quantity":"sky_tonight","inputs":{"latitude":54.62,"longitude":-2.95,"time_zone":"Europe/London","night":"2026-11-20"}}',
      '{"id":6,"quantity":"sky_tonight","inputs":{"latitude":91,"longitude":0,"time_zone":"UTC","night":"2026-11-20"}}',
    ].join('\n');
    const out = execFileSync('npx', ['tsx', 'server/cli/calc.ts'], { input, encoding: 'utf8' });
    const lines = out
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(lines).toHaveLength(6);
    expect(lines[0]).toMatchObject({ id: 1, unit: 'Gyr' });
    expect(lines[1].error.code).toBe('invalid_json');
    expect(lines[2]).toMatchObject({ id: 3, error: { code: 'out_of_range' } });
    expect(lines[3].value).toBeCloseTo((299792.458 * 0.05) / 70, 9);
    expect(lines[4]).toMatchObject({
      id: 5,
      quantity: 'sky_tonight',
      sky: { localDate: '2026-11-20', timeZone: 'Europe/London' },
    });
    expect(lines[5]).toMatchObject({ id: 6, error: { code: 'out_of_range' } });
  });
});
