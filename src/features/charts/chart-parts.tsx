/**
 * The parts of the distance–redshift chart around the plot itself: series
 * styles, number wording, the toggles that double as the legend, the tooltip
 * and the visually hidden data table.
 */
import { mpcToLy } from '@shared/engine/units.ts';
import {
  HUBBLE_KEY,
  MEASURE_LABELS,
  MEASURES,
  seriesKey,
  type ChartModel,
  type ChartRow,
  type Measure,
} from './distance-curves.ts';

/** How one line is drawn; dash patterns carry meaning as well as colour, so no line is told apart by colour alone. */
export interface SeriesStyle {
  key: string;
  label: string;
  /** A short name for the tooltip. */
  short: string;
  colour: string;
  dash?: string;
  width: number;
  opacity: number;
}

/** Colour per measure, from the theme so the chart follows paper, night and red-only looks. */
export const MEASURE_COLOURS: Record<Measure, string> = {
  luminosity: 'var(--sp-accent)',
  proper: 'var(--sp-ink)',
  lightTravel: 'var(--sp-changed)',
};
export const HUBBLE_COLOUR = 'var(--sp-broken)';
export const HUBBLE_DASH = '12 4 2 4';
/** The chosen model is solid; alternatives get their own dashes. */
export const MODEL_DASHES = [undefined, '7 5', '2 4', '10 3 3 3'];

const SHORT_MEASURE: Record<Measure, string> = { luminosity: 'Luminosity', proper: 'Proper', lightTravel: 'Light-travel' };

const mpcFormat = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 4 });
const glyFormat = new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 3 });

/** A distance in Mpc as "6,640 Mpc". */
export const formatMpc = (mpc: number): string => `${mpcFormat.format(mpc)} Mpc`;
/** A distance in Mpc as "21.7 billion light-years". */
export const formatGly = (mpc: number): string => `${glyFormat.format(mpcToLy(mpc) / 1e9)} billion light-years`;
/** A redshift as typed in public text. */
export const formatZ = (z: number): string => new Intl.NumberFormat('en-GB', { maximumSignificantDigits: 3 }).format(z);

/**
 * Every series of the chart with its style, the chosen model first.
 * @param models prepared models
 * @returns styles keyed as in chart rows
 */
export function seriesStyles(models: ChartModel[]): SeriesStyle[] {
  const styles: SeriesStyle[] = [
    {
      key: HUBBLE_KEY,
      label: `Simple Hubble law d = cz/H₀`,
      short: 'Hubble law cz/H₀',
      colour: HUBBLE_COLOUR,
      dash: HUBBLE_DASH,
      width: 2,
      opacity: 1,
    },
  ];
  models.forEach((m, i) => {
    if (!m.cosmo) return;
    for (const measure of MEASURES) {
      styles.push({
        key: seriesKey(m.key, measure),
        label: `${MEASURE_LABELS[measure]}, ${m.label}`,
        short: `${SHORT_MEASURE[measure]} · ${m.label}`,
        colour: MEASURE_COLOURS[measure],
        dash: MODEL_DASHES[i % MODEL_DASHES.length],
        width: i === 0 ? 2.25 : 1.5,
        opacity: i === 0 ? 1 : 0.75,
      });
    }
  });
  return styles;
}

/** A short sample of a line, for toggles and the tooltip. */
export function Swatch({ colour, dash, width = 2 }: { colour: string; dash?: string; width?: number }) {
  return (
    <svg width="28" height="10" aria-hidden="true" className="shrink-0">
      <line x1="1" y1="5" x2="27" y2="5" stroke={colour} strokeWidth={width} strokeDasharray={dash} strokeLinecap="butt" />
    </svg>
  );
}

/** A checkbox with a swatch: the legend and the switch are the same control. */
export function Toggle({
  label,
  checked,
  onChange,
  colour,
  dash,
}: {
  label: string;
  checked: boolean;
  onChange: () => void;
  colour: string;
  dash?: string;
}) {
  return (
    <label
      className={`flex cursor-pointer items-center gap-2 rounded-md border px-2.5 py-1 text-[13px] ${checked ? 'border-rule bg-panel text-ink' : 'border-dashed border-rule text-muted'}`}
    >
      <input type="checkbox" checked={checked} onChange={onChange} className="accent-accent" />
      <Swatch colour={colour} dash={dash} />
      {label}
    </label>
  );
}

/** The tooltip: the redshift, then each visible line's distance in Mpc and in billions of light-years, largest first. */
export function ChartTooltip({ active, row, styles }: { active?: boolean; row?: ChartRow; styles: SeriesStyle[] }) {
  if (!active || !row) return null;
  const lines = styles
    .map((s) => ({ s, d: row[s.key] }))
    .filter((x): x is { s: SeriesStyle; d: number } => typeof x.d === 'number')
    .sort((a, b) => b.d - a.d);
  return (
    <div className="rounded-md border border-rule bg-panel/95 px-3 py-2 text-xs text-ink shadow-sm">
      <table className="tabular-nums whitespace-nowrap">
        <thead>
          <tr className="text-muted">
            <th scope="col" colSpan={2} className="pb-1 pr-3 text-left font-semibold text-ink">
              z = {formatZ(row.z)}
            </th>
            <th scope="col" className="pb-1 pr-3 text-right font-medium">
              Mpc
            </th>
            <th scope="col" className="pb-1 text-right font-medium">
              billion ly
            </th>
          </tr>
        </thead>
        <tbody>
          {lines.map(({ s, d }) => (
            <tr key={s.key}>
              <td className="py-px pr-1.5 align-middle">
                <Swatch colour={s.colour} dash={s.dash} width={s.width} />
              </td>
              <td className="py-px pr-3">{s.short}</td>
              <td className="py-px pr-3 text-right">{mpcFormat.format(d)}</td>
              <td className="py-px text-right text-muted">{glyFormat.format(mpcToLy(d) / 1e9)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** The chart's numbers as a table for screen readers, at a few round redshifts and the object's own. */
export function ChartDataTable({ rows, styles, caption }: { rows: ChartRow[]; styles: SeriesStyle[]; caption: string }) {
  // The wrapper, not the table, is visually hidden: a table ignores the 1 px width of `sr-only`
  // and its cells grew the calculator to thousands of pixels wide.
  return (
    <div className="sr-only">
      <table>
        <caption>{caption}</caption>
        <thead>
          <tr>
            <th scope="col">Redshift z</th>
            {styles.map((s) => (
              <th key={s.key} scope="col">
                {s.label} (Mpc)
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.z}>
              <th scope="row">{formatZ(r.z)}</th>
              {styles.map((s) => {
                const d = r[s.key];
                return <td key={s.key}>{typeof d === 'number' ? mpcFormat.format(d) : 'not defined'}</td>;
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
