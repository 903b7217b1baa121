import type { CalcSuccess } from '@shared/schemas/calc.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { formatFull, formatInWords, formatSig } from '@/components/working/format-number.ts';
import { QUANTITY_LABELS } from '@shared/contract/words.ts';
import { UNIT_WORDS } from '../labels.ts';

function conversionText(c: { value: number; unit: string }): string | undefined {
  if (c.unit === 'Gly') return undefined; // the light-year line already says "billion light-years"
  if (c.unit === 'ly' || c.unit === 'yr') return `${formatInWords(c.value)} ${UNIT_WORDS[c.unit]}`;
  return `${formatSig(c.value)} ${UNIT_WORDS[c.unit] ?? c.unit}`;
}

/**
 * A result as a reader first needs it: the value with its unit, the 68 % interval,
 * the same value in familiar units, the model, and any warning, before the working.
 * @param props.result a successful calculation
 */
export function CalcResult({ result }: { result: CalcSuccess }) {
  const unit = result.unit;
  const unitWords = UNIT_WORDS[unit];
  const iv = result.interval;
  const conversions = result.conversions.map(conversionText).filter((t): t is string => t !== undefined);
  return (
    <section aria-labelledby="result-heading" className="space-y-4 rounded-lg border border-rule bg-panel p-5">
      <div>
        <h2 id="result-heading" className="text-sm font-medium text-muted">
          {QUANTITY_LABELS[result.quantity]}
        </h2>
        <p className="mt-1 flex flex-wrap items-baseline gap-x-2" data-testid="calc-value">
          <span className="text-4xl font-semibold tracking-tight text-ink tabular-nums" title={formatFull(result.value)}>
            {formatSig(result.value)}
          </span>
          {unit && (
            <span className="text-lg text-muted">
              {unit}
              {unitWords && <span className="sr-only"> ({unitWords})</span>}
            </span>
          )}
        </p>
        {iv && (
          <p className="mt-1 text-sm text-ink tabular-nums">
            <span className="text-muted">68 % interval </span>
            {formatSig(iv.low)} to {formatSig(iv.high)} {unit}
            <span className="text-muted">
              {' '}
              (−{formatSig(result.value - iv.low, 3)}, +{formatSig(iv.high - result.value, 3)})
            </span>
          </p>
        )}
      </div>
      {conversions.length > 0 && (
        <ul
          className="flex flex-wrap gap-x-6 gap-y-1 border-t border-rule pt-3 text-sm text-ink tabular-nums"
          aria-label="The same value in other units"
        >
          {conversions.map((t) => (
            <li key={t}>
              <span className="text-muted">= </span>
              {t}
            </li>
          ))}
        </ul>
      )}
      <p className="text-xs text-muted">
        {result.model ? <>Computed with {result.model.label}.</> : 'No cosmology model enters this quantity.'}
      </p>
      {result.warnings.map((w) => (
        <Notice key={w} tone="warning" title="Check before using this number">
          {w}
        </Notice>
      ))}
    </section>
  );
}
