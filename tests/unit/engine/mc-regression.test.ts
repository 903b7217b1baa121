import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculate } from '../../../shared/engine/calculate.ts';
import { orderStatistics, quantileFromStatistics, quantilePair, quantileRanks } from '../../../shared/engine/order-statistics.ts';
import { mulberry32, quantile } from '../../../shared/engine/uncertainty.ts';
import { evaluateStatement } from '../../../shared/statements/index.ts';
import { calcCases, frozen, statementCases } from './mc-regression.cases.ts';

// Values frozen from the engine before its Monte Carlo was made faster (recalled from our own
// earlier output, not an outside source): the speed-up must not move any result or interval.
const fixture = JSON.parse(readFileSync(new URL('./mc-regression.json', import.meta.url), 'utf8')) as {
  calc: Array<Record<string, unknown>>;
  statements: Array<Record<string, unknown>>;
};
const REL = 1e-9;
const NUMBER = /-?\d+(?:\.\d+)?(?:e[+-]?\d+)?/gi;

/** Differences between two values: numbers to a relative 1e-9, strings exactly (numbers inside notes to 1e-9). */
function differences(actual: unknown, expected: unknown, path: string, out: string[]): void {
  if (typeof expected === 'number' && typeof actual === 'number') {
    if (Math.abs(actual - expected) > REL * Math.max(Math.abs(actual), Math.abs(expected)))
      out.push(`${path}: ${actual} ≠ ${expected}`);
    return;
  }
  if (typeof expected === 'string' && typeof actual === 'string' && path.endsWith('.note')) {
    const a = actual.match(NUMBER) ?? [];
    const e = expected.match(NUMBER) ?? [];
    if (actual.replace(NUMBER, '#') !== expected.replace(NUMBER, '#') || a.length !== e.length)
      out.push(`${path}: ${JSON.stringify(actual)} ≠ ${JSON.stringify(expected)}`);
    else {
      e.forEach((x, i) => {
        differences(Number(a[i]), Number(x), `${path}[number ${i}]`, out);
      });
    }
    return;
  }
  if (Array.isArray(expected) || (typeof expected === 'object' && expected !== null)) {
    if (typeof actual !== 'object' || actual === null || Array.isArray(actual) !== Array.isArray(expected)) {
      out.push(`${path}: ${JSON.stringify(actual)} ≠ ${JSON.stringify(expected)}`);
      return;
    }
    const keys = new Set([...Object.keys(expected), ...Object.keys(actual)]);
    for (const k of keys)
      differences((actual as Record<string, unknown>)[k], (expected as Record<string, unknown>)[k], `${path}.${k}`, out);
    return;
  }
  if (actual !== expected) out.push(`${path}: ${JSON.stringify(actual)} ≠ ${JSON.stringify(expected)}`);
}

describe('Monte Carlo results stay as frozen', () => {
  it('covers the same cases as the fixture', () => {
    expect(calcCases()).toHaveLength(fixture.calc.length);
    expect(statementCases()).toHaveLength(fixture.statements.length);
  });

  it('every calculation gives the frozen value, interval, working and errors', () => {
    const out: string[] = [];
    calcCases().forEach((request, i) => {
      differences(frozen(calculate(request) as never), fixture.calc[i], `calc[${i}]`, out);
    });
    expect(out).toEqual([]);
  }, 60_000);

  it('every statement gives the frozen texts, value, interval and working', () => {
    const out: string[] = [];
    statementCases().forEach(({ templateId, ctx }, i) => {
      const now = frozen(evaluateStatement(templateId, ctx) as never);
      // Public wording must match to the character.
      expect(now.texts, `${templateId} for ${ctx.object.name}`).toEqual(fixture.statements[i].texts);
      expect(now.footnotes, `${templateId} for ${ctx.object.name}`).toEqual(fixture.statements[i].footnotes);
      differences(now, fixture.statements[i], `statements[${i}] ${templateId} ${ctx.object.name}`, out);
    });
    expect(out).toEqual([]);
  }, 60_000);

  it('percentiles by selection equal percentiles of the sorted draws, with and without a monotonic last step', () => {
    const rand = mulberry32(7);
    for (const n of [1, 2, 3, 17, 1000, 3999]) {
      // Coarse values, so that many draws tie.
      const draws = Float64Array.from({ length: n }, () => Math.round(rand() * 50) / 7 - 3);
      for (const last of [
        undefined,
        { map: (x: number) => 10 ** (-0.4 * x), decreasing: true },
        { map: (x: number) => Math.exp(x), decreasing: false },
      ]) {
        const mapped = Float64Array.from(draws, last ? last.map : (x) => x).sort();
        const got = quantilePair(draws.slice(), 0.16, 0.84, last);
        expect(got).toEqual({ low: quantile(mapped, 0.16), high: quantile(mapped, 0.84) });
        // From the four order statistics a reused run keeps: the same numbers for either direction.
        const stats = orderStatistics(draws.slice(), quantileRanks(n, [0.16, 0.84]));
        const at = (rank: number) => stats.get(rank)!;
        expect({ low: quantileFromStatistics(n, 0.16, last, at), high: quantileFromStatistics(n, 0.84, last, at) }).toEqual(got);
      }
    }
  });

  it('notices a moved interval (the comparison can fail)', () => {
    const out: string[] = [];
    differences({ interval: { low: 1, high: 2 + 1e-8 } }, { interval: { low: 1, high: 2 } }, 'probe', out);
    expect(out).toHaveLength(1);
  });
});
