import { describe, expect, it } from 'vitest';
import { evaluateStatement } from '../../../shared/statements/index.ts';
import { packWorking, skeletonIds, unpackWorking } from '../../../shared/statements/working-codec.ts';
import type { Step } from '../../../shared/engine/working.ts';
import { skeletonId } from '../../../server/services/statements/working-pack.ts';
import { statementCases } from '../engine/mc-regression.cases.ts';

/** Every working the frozen statement cases produce (open, closed and Hubble-law models, all templates). */
function workings(): Step[][] {
  return statementCases().flatMap(({ templateId, ctx }) => {
    const outcome = evaluateStatement(templateId, ctx);
    return outcome.ok ? [outcome.working] : [];
  });
}

describe('the stored form of a working', () => {
  it('reads back exactly what was packed, for every template and model', () => {
    const all = workings();
    expect(all.length).toBeGreaterThan(50);
    const store = new Map<string, string>();
    for (const working of all) {
      const { stored, skeletons } = packWorking(working, skeletonId);
      for (const [id, json] of skeletons) {
        // The same id always names the same skeleton.
        if (store.has(id)) expect(store.get(id)).toBe(json);
        store.set(id, json);
      }
      // Through JSON, as PostgreSQL keeps it.
      expect(unpackWorking(JSON.parse(JSON.stringify(stored)), (id) => store.get(id))).toEqual(working);
    }
  });

  it('shares skeletons between statements and keeps only the data per statement', () => {
    const all = workings();
    const ids = new Set<string>();
    let packedBytes = 0;
    let plainBytes = 0;
    for (const working of all) {
      const { stored } = packWorking(working, skeletonId);
      for (const id of skeletonIds(stored)) ids.add(id);
      packedBytes += JSON.stringify(stored).length;
      plainBytes += JSON.stringify(working).length;
    }
    const steps = all.reduce((n, w) => n + w.length, 0);
    expect(ids.size).toBeLessThan(steps / 2);
    expect(packedBytes).toBeLessThan(plainBytes / 3);
  });

  it('still reads workings stored in full before packing, and refuses a missing skeleton', () => {
    const [working] = workings();
    expect(unpackWorking(working, () => undefined)).toEqual(working);
    expect(unpackWorking(null, () => undefined)).toEqual([]);
    const { stored } = packWorking(working, skeletonId);
    expect(() => unpackWorking(stored, () => undefined)).toThrow(/not stored/);
  });

  it('never mixes up two steps whose texts differ only around a separator character', () => {
    const step = (name: string, unit: string): Step => ({
      title: 'Same title',
      formula: 'x',
      inputs: [{ symbol: 'a', name, value: 1, unit, source: 's' }],
      constants: [],
      result: { symbol: 'r', name: 'r', value: 2, unit: '' },
    });
    const one = [step('left\u0001middle', 'right')];
    const two = [step('left', 'middle\u0001right')];
    const store = new Map<string, string>();
    const packed = [one, two].map((w) => {
      const { stored, skeletons } = packWorking(w, skeletonId);
      for (const [id, json] of skeletons) store.set(id, json);
      return stored;
    });
    expect(unpackWorking(packed[0], (id) => store.get(id))).toEqual(one);
    expect(unpackWorking(packed[1], (id) => store.get(id))).toEqual(two);
  });

  it('refuses a text holding the character it uses to mark data', () => {
    const step: Step = {
      title: 't',
      formula: 'f',
      inputs: [],
      constants: [],
      result: { symbol: 'x', name: 'bad\u0000name', value: 1, unit: '' },
    };
    expect(() => packWorking([step], skeletonId)).toThrow(/NUL/);
  });
});
