import { afterAll, describe, expect, it } from 'vitest';
import { resolveModel } from '../../../shared/engine/model-resolve.ts';
import type { TemplateContext } from '../../../shared/statements/index.ts';
import { evaluateBatch, type BatchJob, type BatchStatement } from '../../../server/services/statements/evaluate-batch.ts';
import { runBatch, stopEvaluationPool } from '../../../server/services/statements/evaluation-pool.ts';

const TEMPLATES = ['luminosity-sun', 'brightness-at-10pc', 'light-travel', 'distance-today', 'naked-eye', 'scale-model'];
const model = { preset: 'wmap9' } as const;

/** A batch of invented objects (demo-style values), some missing what a template needs. */
function job(objects: number): BatchJob {
  const statements: BatchStatement[] = [];
  const contexts: Record<string, TemplateContext> = {};
  for (let i = 0; i < objects; i++) {
    const id = `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`;
    const z = 0.02 + (5.98 * ((i * 104729) % 10007)) / 10007;
    const source = { id: '10000000-0000-4000-8000-000000000001', citation: 'Invented survey for tests' };
    contexts[id] = {
      object: { id, name: `Test object ${i}`, kind: 'quasar' },
      band: 'V',
      model,
      measurements: [
        ...(i % 7 === 3
          ? []
          : [
              {
                id: `20000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
                quantity: 'apparent_magnitude',
                value: 12 + (i % 10),
                unit: 'mag',
                band: 'V',
                sigma: 0.05,
                source,
              },
            ]),
        {
          id: `30000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
          quantity: 'redshift',
          value: z,
          unit: '',
          band: null,
          sigma: (1 + z) * 0.004,
          source,
        },
      ],
    };
    for (const templateId of TEMPLATES) {
      statements.push({
        id: `4${String(i).padStart(7, '0')}-0000-4000-8000-${templateId.length.toString().padStart(12, '0')}`,
        skyObjectId: id,
        templateId,
        venueId: null,
        status: 'current',
        model: null,
        acknowledgedTexts: null,
        inputs: [],
        night: null,
      });
    }
  }
  return {
    statements: JSON.stringify(statements),
    contexts,
    model: { id: 'a'.repeat(64), json: JSON.stringify(resolveModel(model).description) },
    settingsVersion: 3,
    computedAt: '2026-12-02T10:00:00.000Z',
  };
}

afterAll(stopEvaluationPool);

describe('computing statement batches on worker threads', () => {
  it('gives exactly what computing inline gives, including broken statements', { timeout: 30_000 }, async () => {
    const batch = job(60);
    const inline = evaluateBatch(batch);
    const [first, second] = await Promise.all([runBatch(batch), runBatch(job(60))]);
    expect(first).toEqual(inline);
    expect(second).toEqual(inline);
    expect(inline.broken.length).toBeGreaterThan(0);
    expect(inline.computedRows.reduce((n, rows) => n + JSON.parse(rows).length, 0) + JSON.parse(inline.brokenRows).length).toBe(
      JSON.parse(batch.statements).length,
    );
  });

  it('passes a failure back as an error instead of hanging', { timeout: 30_000 }, async () => {
    const batch = job(2);
    // A batch whose outcomes name another cosmology than the one given: a settings mix-up.
    await expect(runBatch({ ...batch, model: { id: 'b'.repeat(64), json: '{}' } })).rejects.toThrow(/other than the adopted one/);
  });
});
