import { lazy, Suspense } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { useSettings } from '@/api/settings.ts';
import { useAcceptStatement, useRecomputeStatement, useStatement } from '@/api/statements.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { nightDate, venueClock } from '@/components/statements/venue-night.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { formatSig } from '@/components/working/format-number.ts';
import { WorkingSteps } from '@/components/working/working-steps.tsx';
import { paths } from '@/config/paths.ts';
import { StatementInputs } from '@/features/statements/components/statement-inputs.tsx';
import { StatementTexts } from '@/features/statements/components/statement-texts.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

const DistanceRedshiftChart = lazy(() =>
  import('@/features/charts/distance-redshift-chart.tsx').then((m) => ({ default: m.DistanceRedshiftChart })),
);

/** The other models a reviewer compares against: the simple Hubble law and the other preset. */
function alternativesTo(model: CalcModel, H0: number): CalcModel[] {
  const hubble: CalcModel = { law: 'hubble', H0 };
  if ('preset' in model) return [hubble, { preset: model.preset === 'planck18' ? 'wmap9' : 'planck18' }];
  if ('law' in model) return [{ preset: 'planck18' }];
  return [hubble, { preset: 'planck18' }];
}

/** One statement: its wording in each locale, what it used, and every step of its working. */
export function Component() {
  const { id = '' } = useParams();
  const statement = useStatement(id);
  const settings = useSettings();
  const accept = useAcceptStatement();
  const recompute = useRecomputeStatement();
  if (statement.isPending) return <p className="text-sm text-muted">Loading statement…</p>;
  if (statement.error) return <Notice tone="error">{statement.error.message}</Notice>;
  const s = statement.data;
  const z = s.inputs.find((i) => i.quantity === 'redshift');
  const zInterval =
    z && z.sigma != null
      ? { low: z.value - z.sigma, high: z.value + z.sigma }
      : z && z.minus != null && z.plus != null
        ? { low: z.value - z.minus, high: z.value + z.plus }
        : undefined;
  const model = settings.data?.cosmologyModel;

  return (
    <>
      <PageHeader
        title={s.template.title}
        description={
          <>
            About{' '}
            <Link to={paths.catalogueObject.href(s.object.id)} className="text-accent hover:underline">
              {s.object.name}
            </Link>
            {s.venue && <> · for {s.venue.name}</>} · computed {formatDateTime(s.computedAt)}
          </>
        }
        actions={
          <>
            {s.can.recompute && (
              <Button variant="secondary" busy={recompute.isPending} onClick={() => recompute.mutate(s.id)}>
                Recompute now
              </Button>
            )}
            {s.can.acknowledge && s.status === 'changed' && (
              <Button busy={accept.isPending} onClick={() => accept.mutate(s.id)}>
                Accept new wording
              </Button>
            )}
          </>
        }
      />
      <div className="space-y-8">
        <div className="flex flex-wrap items-center gap-3">
          <StatementStatusBadge status={s.status} />
          {s.interval && s.value != null && (
            <span className="text-sm text-muted tabular-nums">
              Value {formatSig(s.value)} {s.unit} · 68 % interval {formatSig(s.interval.low, 4)} to{' '}
              {formatSig(s.interval.high, 4)} · worded to {s.significantFigures} significant figure
              {s.significantFigures === 1 ? '' : 's'}
            </span>
          )}
        </div>
        {s.venue && s.night && (
          <Notice title={`The night of ${nightDate(s.night.localDate)} at ${s.venue.name}`}>
            Distances for {venueClock(s.night.observationUtc, s.venue.timeZone)} local time ({s.venue.timeZone}). This statement
            is worked out again each night from the venue’s sky: a new night’s number follows without a new sign-off, while a
            change of method (the venue moved, other constants, another sentence) comes back here for review.
          </Notice>
        )}
        {s.status === 'changed' && (
          <Notice tone="warning" title="The wording has changed">
            {s.statusReason}
          </Notice>
        )}
        {s.status === 'broken' && (
          <Notice tone="error" title="This statement cannot be worked out">
            {s.statusReason} Pages keep their last approved text until this is fixed in the catalogue.
          </Notice>
        )}
        {(accept.error || recompute.error) && <Notice tone="error">{(accept.error ?? recompute.error)?.message}</Notice>}
        <StatementTexts statement={s} />
        <StatementInputs statement={s} />
        {z && model && (
          <section aria-labelledby="chart-heading" className="space-y-3">
            <h2 id="chart-heading" className="text-lg font-semibold tracking-tight">
              Distance and redshift
            </h2>
            <Suspense fallback={<p className="text-sm text-muted">Loading chart…</p>}>
              <DistanceRedshiftChart
                z={z.value}
                zInterval={zInterval}
                model={model}
                alternatives={alternativesTo(model, s.model?.H0 ?? 70)}
                objectName={s.object.name}
              />
            </Suspense>
          </section>
        )}
        <WorkingSteps working={s.working ?? []} warnings={s.warnings} model={s.model} />
      </div>
    </>
  );
}
