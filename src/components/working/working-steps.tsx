import type { Step, WorkingValue } from '@shared/engine/working.ts';
import type { ResolvedModel } from '@shared/schemas/calc.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { formatFull, formatSig } from './format-number.ts';
import { ModelSummary, describeSource } from './model-summary.tsx';
import { SymbolText } from './symbol-text.tsx';

/** Finds the earlier step whose result a "previous step" input refers to, so the source can say which. */
function producingStep(steps: Step[], before: number, symbol: string): number | undefined {
  for (let i = before - 1; i >= 0; i--) if (steps[i].result.symbol === symbol) return i + 1;
  return undefined;
}

function sourceText(steps: Step[], index: number, v: WorkingValue): string {
  if (v.source === 'previous step') {
    const n = producingStep(steps, index, v.symbol);
    return n === undefined ? 'an earlier step' : `step ${n}`;
  }
  return describeSource(v.source);
}

// Exact constants (the parsec, the speed of light) are shown in full: rounding them would hide that they are exact.
const EXACT_DIGITS = 16;

function ValueCell({ value, exact }: { value: number | string; exact: boolean }) {
  if (typeof value === 'string') return <>{value}</>;
  return <span title={formatFull(value)}>{formatSig(value, exact ? EXACT_DIGITS : undefined)}</span>;
}

function ValueRows({ steps, index, values }: { steps: Step[]; index: number; values: WorkingValue[] }) {
  return values.map((v, i) => (
    // biome-ignore lint/suspicious/noArrayIndexKey: a step's values are a fixed list from the engine, never reordered; a symbol can repeat
    <tr key={`${v.symbol}-${i}`} className="border-t border-rule/70">
      <th scope="row" className="py-1.5 pr-3 text-left font-mono text-[13px] font-normal whitespace-nowrap">
        <SymbolText text={v.symbol} />
      </th>
      <td className="py-1.5 pr-3">
        {v.name}
        <span className="block text-xs leading-5 text-muted wrap-anywhere @lg:hidden">{sourceText(steps, index, v)}</span>
      </td>
      <td className="py-1.5 pr-3 text-right tabular-nums">
        <span className="whitespace-nowrap">
          <ValueCell value={v.value} exact={/\bexact\b/.test(v.source)} />
        </span>
        {v.unit && <span className="block text-muted @lg:hidden">{v.unit}</span>}
      </td>
      <td className="hidden py-1.5 pr-3 whitespace-nowrap text-muted @lg:table-cell">{v.unit}</td>
      <td className="hidden py-1.5 text-xs leading-5 text-muted @lg:table-cell">{sourceText(steps, index, v)}</td>
    </tr>
  ));
}

function GroupRow({ label }: { label: string }) {
  return (
    <tr>
      <th
        scope="rowgroup"
        colSpan={5}
        className="pt-3 pb-1 text-left text-[11px] font-semibold tracking-wider text-muted uppercase"
      >
        {label}
      </th>
    </tr>
  );
}

function StepItem({ steps, index }: { steps: Step[]; index: number }) {
  const step = steps[index];
  const hasValues = step.inputs.length > 0 || step.constants.length > 0;
  const unit = step.result.unit ? ` ${step.result.unit}` : '';
  return (
    <li className="@container rounded-lg border border-rule bg-panel">
      <div className="flex items-start gap-3 px-4 pt-3.5">
        <span
          aria-hidden="true"
          className="mt-px flex size-6 shrink-0 items-center justify-center rounded-full bg-wash text-xs font-semibold text-ink tabular-nums"
        >
          {index + 1}
        </span>
        <h3 className="text-[15px] font-medium leading-6 text-ink">
          <span className="sr-only">Step {index + 1}: </span>
          {step.title}
        </h3>
      </div>
      <div className="space-y-3 px-4 pt-2.5 pb-4 @md:pl-13">
        <p className="overflow-x-auto rounded-md bg-wash px-3 py-2 font-mono text-[14px] leading-6 whitespace-pre-wrap text-ink">
          <span className="sr-only">Formula: </span>
          <SymbolText text={step.formula} />
        </p>
        {hasValues && (
          // In a narrow side panel the unit joins the value and the source goes under the quantity.
          <div className="@container overflow-x-auto">
            <table className="w-full text-sm">
              <caption className="sr-only">Inputs and constants of step {index + 1}</caption>
              <thead className="text-xs text-muted">
                <tr>
                  <th scope="col" className="pb-1 pr-3 text-left font-medium @lg:w-20">
                    Symbol
                  </th>
                  <th scope="col" className="pb-1 pr-3 text-left font-medium">
                    Quantity
                  </th>
                  <th scope="col" className="pb-1 pr-3 text-right font-medium">
                    Value
                  </th>
                  <th scope="col" className="hidden w-20 pb-1 pr-3 text-left font-medium @lg:table-cell">
                    Unit
                  </th>
                  <th scope="col" className="hidden w-[38%] pb-1 text-left font-medium @lg:table-cell">
                    Source
                  </th>
                </tr>
              </thead>
              <tbody className="align-baseline">
                {step.inputs.length > 0 && step.constants.length > 0 && <GroupRow label="Inputs" />}
                <ValueRows steps={steps} index={index} values={step.inputs} />
                {step.constants.length > 0 && <GroupRow label="Constants" />}
                <ValueRows steps={steps} index={index} values={step.constants} />
              </tbody>
            </table>
          </div>
        )}
        <p className="flex flex-wrap items-baseline gap-x-2 border-t border-rule pt-2.5 text-sm">
          <span className="text-muted">Result</span>
          <span className="font-mono text-[13px] text-ink">
            <SymbolText text={step.result.symbol} /> =
          </span>
          <span className="font-semibold text-ink tabular-nums" title={formatFull(step.result.value)}>
            {formatSig(step.result.value)}
            {unit}
          </span>
          <span className="text-muted">({step.result.name})</span>
        </p>
        {step.note && <p className="text-xs leading-5 text-muted">{step.note}</p>}
      </div>
    </li>
  );
}

/**
 * A result's working laid out for a reviewer with a calculator: warnings first,
 * then the model (collapsible), then numbered steps, each with its formula, a
 * table of inputs and constants with their sources, the result and the note.
 * Values show six significant digits; hovering shows the full value.
 * @param props.working the steps, in order
 * @param props.warnings warnings from the result (shown prominently)
 * @param props.model the resolved model, or null when no cosmology entered
 * @param props.heading the section's heading
 */
export function WorkingSteps({
  working,
  warnings = [],
  model = null,
  heading = 'Working',
}: {
  working: Step[];
  warnings?: string[];
  model?: ResolvedModel | null;
  heading?: string;
}) {
  return (
    <section aria-labelledby="working-heading" className="space-y-3">
      <h2 id="working-heading" className="text-lg font-semibold tracking-tight text-ink">
        {heading}
      </h2>
      {warnings.map((w) => (
        <Notice key={w} tone="warning" title="Check before using this number">
          {w}
        </Notice>
      ))}
      {model && <ModelSummary model={model} />}
      <ol className="space-y-3" aria-label={`${working.length} ${working.length === 1 ? 'step' : 'steps'}`}>
        {working.map((_, i) => (
          // biome-ignore lint/suspicious/noArrayIndexKey: steps refer to each other by position and are never reordered
          <StepItem key={i} steps={working} index={i} />
        ))}
      </ol>
    </section>
  );
}
