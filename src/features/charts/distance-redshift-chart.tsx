/**
 * The distance–redshift chart: why the simple Hubble law fails at high redshift.
 * This is the only module that imports recharts; load it lazily (see
 * lazy-distance-redshift-chart.tsx) so the charting library stays out of the first bundle.
 */
import { useId, useMemo, useState } from 'react';
import {
  CartesianGrid,
  ComposedChart,
  Line,
  ReferenceArea,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { Notice } from '@/components/ui/notice.tsx';
import {
  ChartDataTable,
  ChartTooltip,
  HUBBLE_COLOUR,
  HUBBLE_DASH,
  MEASURE_COLOURS,
  MODEL_DASHES,
  Toggle,
  formatGly,
  formatMpc,
  formatZ,
  seriesStyles,
} from './chart-parts.tsx';
import {
  HUBBLE_KEY,
  MEASURE_LABELS,
  MEASURES,
  chartModel,
  chartZMin,
  chartRows,
  redshiftGrid,
  seriesKey,
  type ChartRow,
  type Measure,
} from './distance-curves.ts';
import { failureSentence, pointModel } from './failure-sentence.ts';

/** Props of the chart, as statement pages pass them. */
export interface DistanceRedshiftChartProps {
  /** The object's redshift. */
  z: number;
  /** Its 68 % interval, drawn as a shaded band and an error bar. */
  zInterval?: { low: number; high: number };
  /** The model the statement or calculation uses. */
  model: CalcModel;
  /** Models to compare against (drawn dashed). */
  alternatives?: CalcModel[];
  /** The object's name, for the caption. */
  objectName?: string;
}

const X_TICKS = [0.0001, 0.001, 0.003, 0.01, 0.03, 0.1, 0.3, 1, 3, 10, 30, 100, 300, 1000];
const TABLE_Z = [0.001, 0.01, 0.03, 0.1, 0.3, 1, 3, 10];

const yTick = (mpc: number): string => new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 3 }).format(mpc);

/**
 * Distances against redshift for the chosen model, alternatives and the simple
 * Hubble law, with the object's point on the chosen model's curves.
 */
export function DistanceRedshiftChart({ z, zInterval, model, alternatives = [], objectName }: DistanceRedshiftChartProps) {
  const captionId = useId();
  const zMin = chartZMin(z);
  const zMax = Math.max(10, 2 * z);
  const modelsKey = JSON.stringify([model, ...alternatives]);
  // Keyed on the models' contents, and read back from that key: callers often rebuild the model
  // objects on every render, and models that serialise alike are the same model.
  const models = useMemo(() => {
    const seen = new Set<string>();
    const distinct: CalcModel[] = [];
    for (const m of JSON.parse(modelsKey) as CalcModel[]) {
      const key = JSON.stringify(m);
      if (seen.has(key)) continue;
      seen.add(key);
      distinct.push(m);
    }
    return distinct.map(chartModel);
  }, [modelsKey]);
  const chosen = models[0];
  const hubbleH0 = chosen.H0;
  const rows = useMemo(() => chartRows(models, hubbleH0, redshiftGrid(zMin, zMax)), [models, hubbleH0, zMin, zMax]);
  const [object] = useMemo(() => chartRows(models, hubbleH0, [z]), [models, hubbleH0, z]);
  const tableRows = useMemo(
    () =>
      chartRows(
        models,
        hubbleH0,
        [...new Set([...TABLE_Z.filter((t) => t >= zMin && t <= zMax), z])].sort((a, b) => a - b),
      ),
    [models, hubbleH0, zMin, zMax, z],
  );

  const [hiddenMeasures, setHiddenMeasures] = useState<Set<string>>(new Set());
  const [hiddenModels, setHiddenModels] = useState<Set<string>>(new Set());
  const [logY, setLogY] = useState(true);
  const flip = (set: Set<string>, key: string) => {
    const next = new Set(set);
    if (!next.delete(key)) next.add(key);
    return next;
  };

  const styles = seriesStyles(models);
  const visible = styles.filter((s) => {
    if (s.key === HUBBLE_KEY) return !hiddenMeasures.has(HUBBLE_KEY);
    const [m, measure] = s.key.split(':');
    return !hiddenModels.has(m) && !hiddenMeasures.has(measure);
  });
  const values = rows.flatMap((r) => visible.map((s) => r[s.key])).filter((d): d is number => typeof d === 'number' && d > 0);
  const yMin = values.length ? 10 ** Math.floor(Math.log10(Math.min(...values))) : 1;
  const yMax = values.length ? Math.max(...values) * 1.05 : 10;
  const yTicks = logY
    ? Array.from({ length: Math.round(Math.log10(yMax / yMin)) + 1 }, (_, i) => yMin * 10 ** i).filter((t) => t <= yMax)
    : undefined;

  const objectLabel = objectName ?? 'the object';
  const zText = zInterval ? `z = ${formatZ(z)} (${formatZ(zInterval.low)} to ${formatZ(zInterval.high)})` : `z = ${formatZ(z)}`;
  const others = models.slice(1).map((m) => m.label);
  const lawText = `the simple Hubble law d = cz/H₀ (H₀ = ${hubbleH0} km/s/Mpc)`;
  const measuresText = 'luminosity distance, proper (comoving) distance and light-travel distance';
  const compared = chosen.cosmo
    ? `${measuresText} under ${chosen.label}${others.length ? `, with ${others.join(' and ')} dashed for comparison` : ''}, and ${lawText}`
    : `${lawText}, the model chosen, against ${measuresText} under ${others.join(' and ') || 'no other model'} (dashed)`;
  const caption =
    `Distance against redshift for ${objectLabel} at ${zText}: ${compared}. ` +
    `The redshift axis is logarithmic from ${formatZ(zMin)} to ${formatZ(zMax)}. ` +
    'Below about z = 0.1 every curve follows the Hubble law; above it they part, and no single distance grows as cz/H₀.';
  const dotted = pointModel(chosen, models.slice(1));
  const pointsOn = dotted ? MEASURES.filter((m) => !hiddenMeasures.has(m) && !hiddenModels.has(dotted.key)) : [];
  const problems = models.filter((m) => m.problem);

  return (
    <figure aria-labelledby={captionId} className="space-y-3 rounded-lg border border-rule bg-panel p-5">
      <div>
        <h2 className="text-lg font-semibold tracking-tight text-ink">Distance and redshift</h2>
        <figcaption id={captionId} className="mt-1 text-sm leading-6 text-muted">
          {caption}
        </figcaption>
      </div>
      <p className="rounded-md bg-wash px-3 py-2 text-sm leading-6 text-ink" data-testid="chart-summary">
        {failureSentence(z, object, chosen, models.slice(1), hubbleH0)}
      </p>
      {problems.map((m) => (
        <Notice key={m.key} tone="warning" title={`${m.label} cannot be drawn`}>
          {m.problem}
        </Notice>
      ))}

      <div className="flex flex-wrap items-start gap-x-6 gap-y-2">
        <fieldset className="flex flex-wrap items-center gap-1.5">
          <legend className="mb-1 text-xs font-semibold tracking-wider text-muted uppercase">Curves</legend>
          {MEASURES.map((m: Measure) => (
            <Toggle
              key={m}
              label={MEASURE_LABELS[m]}
              colour={MEASURE_COLOURS[m]}
              checked={!hiddenMeasures.has(m)}
              onChange={() => setHiddenMeasures((s) => flip(s, m))}
            />
          ))}
          <Toggle
            label="Simple Hubble law"
            colour={HUBBLE_COLOUR}
            dash={HUBBLE_DASH}
            checked={!hiddenMeasures.has(HUBBLE_KEY)}
            onChange={() => setHiddenMeasures((s) => flip(s, HUBBLE_KEY))}
          />
        </fieldset>
        <fieldset className="flex flex-wrap items-center gap-1.5">
          <legend className="mb-1 text-xs font-semibold tracking-wider text-muted uppercase">Models</legend>
          {models.map((m, i) =>
            m.cosmo ? (
              <Toggle
                key={m.key}
                label={i === 0 ? `${m.label} (chosen)` : m.label}
                colour="var(--sp-muted)"
                dash={MODEL_DASHES[i % MODEL_DASHES.length]}
                checked={!hiddenModels.has(m.key)}
                onChange={() => setHiddenModels((s) => flip(s, m.key))}
              />
            ) : null,
          )}
        </fieldset>
        <label className="flex items-center gap-2 self-end py-1 text-[13px] text-ink">
          <input type="checkbox" checked={logY} onChange={() => setLogY((v) => !v)} className="accent-accent" />
          Logarithmic distance axis
        </label>
      </div>

      <div className="h-[420px] w-full" data-testid="distance-redshift-plot">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={{ top: 8, right: 16, bottom: 24, left: 16 }}>
            <CartesianGrid stroke="var(--sp-rule)" strokeDasharray="2 3" />
            <XAxis
              dataKey="z"
              type="number"
              scale="log"
              domain={[zMin, zMax]}
              ticks={X_TICKS.filter((t) => t >= zMin && t <= zMax)}
              allowDataOverflow
              tickFormatter={formatZ}
              stroke="var(--sp-muted)"
              tick={{ fill: 'var(--sp-muted)', fontSize: 12 }}
              label={{
                value: 'Redshift z (logarithmic)',
                position: 'insideBottom',
                offset: -14,
                fill: 'var(--sp-muted)',
                fontSize: 12,
              }}
            />
            <YAxis
              type="number"
              scale={logY ? 'log' : 'linear'}
              domain={logY ? [yMin, yMax] : [0, yMax]}
              ticks={yTicks}
              allowDataOverflow
              tickFormatter={yTick}
              width={64}
              stroke="var(--sp-muted)"
              tick={{ fill: 'var(--sp-muted)', fontSize: 12 }}
              label={{
                value: 'Distance (Mpc)',
                angle: -90,
                position: 'insideLeft',
                offset: -4,
                fill: 'var(--sp-muted)',
                fontSize: 12,
                style: { textAnchor: 'middle' },
              }}
            />
            {zInterval && (
              <ReferenceArea
                x1={Math.max(zInterval.low, zMin)}
                x2={Math.min(zInterval.high, zMax)}
                fill="var(--sp-accent)"
                fillOpacity={0.1}
                ifOverflow="hidden"
              />
            )}
            <ReferenceLine
              x={0.1}
              stroke="var(--sp-muted)"
              strokeDasharray="3 3"
              label={{ value: 'z = 0.1', position: 'insideTopLeft', fill: 'var(--sp-muted)', fontSize: 11 }}
            />
            <ReferenceLine x={z} stroke="var(--sp-accent)" strokeOpacity={0.5} ifOverflow="hidden" />
            {visible.map((s) => (
              <Line
                key={s.key}
                dataKey={s.key}
                name={s.label}
                type="monotone"
                dot={false}
                activeDot={false}
                stroke={s.colour}
                strokeDasharray={s.dash}
                strokeWidth={s.width}
                strokeOpacity={s.opacity}
                isAnimationActive={false}
                connectNulls={false}
              />
            ))}
            {zInterval &&
              pointsOn.map((m) => {
                const d = object[seriesKey(dotted!.key, m)];
                return typeof d === 'number' ? (
                  <ReferenceLine
                    key={`bar-${m}`}
                    segment={[
                      { x: Math.max(zInterval.low, zMin), y: d },
                      { x: zInterval.high, y: d },
                    ]}
                    stroke={MEASURE_COLOURS[m]}
                    strokeWidth={2}
                    ifOverflow="hidden"
                  />
                ) : null;
              })}
            {pointsOn.map((m) => {
              const d = object[seriesKey(dotted!.key, m)];
              return typeof d === 'number' ? (
                <ReferenceDot
                  key={m}
                  x={z}
                  y={d}
                  r={5}
                  fill={MEASURE_COLOURS[m]}
                  stroke="var(--sp-panel)"
                  strokeWidth={2}
                  ifOverflow="hidden"
                />
              ) : null;
            })}
            {!hiddenMeasures.has(HUBBLE_KEY) && (
              <ReferenceDot
                x={z}
                y={object[HUBBLE_KEY] as number}
                r={5}
                fill="var(--sp-panel)"
                stroke={HUBBLE_COLOUR}
                strokeWidth={2}
                ifOverflow="hidden"
              />
            )}
            <Tooltip
              cursor={{ stroke: 'var(--sp-muted)', strokeDasharray: '2 2' }}
              isAnimationActive={false}
              content={({ active, payload }) => (
                <ChartTooltip active={active} row={payload?.[0]?.payload as ChartRow | undefined} styles={visible} />
              )}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <p className="text-xs text-muted">
        {dotted && (
          <>
            Filled dots: {objectLabel} on {dotted.label}’s curves{zInterval ? ', with its redshift interval shaded' : ''}.{' '}
          </>
        )}
        Open dot: where the simple Hubble law puts it, {formatMpc(object[HUBBLE_KEY] as number)} (
        {formatGly(object[HUBBLE_KEY] as number)}). Point at a curve to read its distances.
      </p>
      <ChartDataTable
        rows={tableRows}
        styles={styles}
        caption={`Distances in megaparsecs at selected redshifts, including ${objectLabel}’s z = ${formatZ(z)}`}
      />
    </figure>
  );
}
