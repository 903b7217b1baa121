import { lazy, Suspense } from 'react';
import type { DistanceRedshiftChartProps } from './distance-redshift-chart.tsx';

const Chart = lazy(() => import('./distance-redshift-chart.tsx').then((m) => ({ default: m.DistanceRedshiftChart })));

/**
 * The distance–redshift chart, loaded on first use so the charting library never
 * weighs on the first page load. Use this on pages; it takes the same props.
 * @param props see DistanceRedshiftChartProps
 */
export function LazyDistanceRedshiftChart(props: DistanceRedshiftChartProps) {
  return (
    <Suspense
      fallback={
        <div className="flex h-40 items-center justify-center rounded-lg border border-rule bg-panel text-sm text-muted">
          Drawing the chart…
        </div>
      }
    >
      <Chart {...props} />
    </Suspense>
  );
}
