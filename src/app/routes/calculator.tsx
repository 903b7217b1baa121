import { useState } from 'react';
import type { CalcModel, CalcRequest, CalcSuccess, MeasuredInput } from '@shared/schemas/calc.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { WorkingSteps } from '@/components/working/working-steps.tsx';
import { CalcForm } from '@/features/calc/components/calc-form.tsx';
import { CalcResult } from '@/features/calc/components/calc-result.tsx';
import { LazyDistanceRedshiftChart } from '@/features/charts/lazy-distance-redshift-chart.tsx';

/** The redshift of a request and its 68 % interval, when the request has one the chart can place. */
function redshiftOf(request: CalcRequest): { z: number; zInterval?: { low: number; high: number } } | undefined {
  const input: MeasuredInput | undefined = request.inputs?.z;
  if (input === undefined) return undefined;
  const z = typeof input === 'number' ? input : input.value;
  if (!(z > 0)) return undefined;
  if (typeof input === 'number') return { z };
  const minus = 'minus' in input ? input.minus : (input.sigma ?? 0);
  const plus = 'plus' in input ? input.plus : (input.sigma ?? 0);
  return minus > 0 || plus > 0 ? { z, zInterval: { low: Math.max(z - minus, 0), high: z + plus } } : { z };
}

/** What the chosen model is compared with: the other preset, or Planck 2018 for anything else. */
function alternativesTo(model: CalcModel): CalcModel[] {
  if ('preset' in model) return [{ preset: model.preset === 'planck18' ? 'wmap9' : 'planck18' }];
  return [{ preset: 'planck18' }];
}

/** The calculator: any quantity the engine computes, with its result, its working and, for a redshift, the chart. */
export function Component() {
  const [outcome, setOutcome] = useState<{ result: CalcSuccess; request: CalcRequest }>();
  const redshift = outcome ? redshiftOf(outcome.request) : undefined;
  const model: CalcModel = outcome?.request.model ?? { preset: 'planck18' };
  return (
    <>
      <PageHeader
        title="Calculator"
        description="Work out a distance, a time or a brightness from sourced inputs, with every step shown. Nothing here is saved; statements on pages are computed the same way."
      />
      <CalcForm onResult={(result, request) => setOutcome({ result, request })} onRefused={() => setOutcome(undefined)} />
      {outcome && (
        <div className="mt-6 space-y-6">
          <CalcResult result={outcome.result} />
          {redshift && outcome.result.model && (
            <LazyDistanceRedshiftChart
              z={redshift.z}
              zInterval={redshift.zInterval}
              model={model}
              alternatives={alternativesTo(model)}
            />
          )}
          <WorkingSteps working={outcome.result.working} model={outcome.result.model} />
        </div>
      )}
    </>
  );
}
