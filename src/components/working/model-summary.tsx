import type { ResolvedModel } from '@shared/schemas/calc.ts';
import { formatFull, formatSig } from './format-number.ts';
import { SymbolText } from './symbol-text.tsx';

type ParamKey = 'H0' | 'Om0' | 'Ode0' | 'Ok0' | 'Ogamma0' | 'Onu0' | 'Ob0' | 'Tcmb0' | 'Neff' | 'm_nu';

/** How each model parameter is shown: symbol, words and unit, in the order a reviewer reads them. */
const PARAMS: ReadonlyArray<{ key: ParamKey; symbol: string; name: string; unit: string }> = [
  { key: 'H0', symbol: 'H₀', name: 'Hubble constant', unit: 'km/s/Mpc' },
  { key: 'Om0', symbol: 'Ω_m', name: 'matter density today (cold dark matter + baryons)', unit: '' },
  { key: 'Ode0', symbol: 'Ω_Λ', name: 'dark energy density today', unit: '' },
  { key: 'Ok0', symbol: 'Ω_k', name: 'curvature density today', unit: '' },
  { key: 'Ogamma0', symbol: 'Ω_γ', name: 'photon density today', unit: '' },
  { key: 'Onu0', symbol: 'Ω_ν', name: 'neutrino density today', unit: '' },
  { key: 'Ob0', symbol: 'Ω_b', name: 'baryon density today', unit: '' },
  { key: 'Tcmb0', symbol: 'T_CMB', name: 'temperature of the cosmic microwave background today', unit: 'K' },
  { key: 'Neff', symbol: 'N_eff', name: 'effective number of neutrino species', unit: '' },
  { key: 'm_nu', symbol: 'm_ν', name: 'neutrino masses', unit: 'eV' },
];

function shownValue(value: number | number[]): string {
  return Array.isArray(value) ? value.map((v) => formatSig(v)).join(', ') : formatSig(value);
}

function fullValue(value: number | number[]): string {
  return Array.isArray(value) ? value.map(formatFull).join(', ') : formatFull(value);
}

/** Says where a parameter came from in words: "request" means the person typed it. */
export function describeSource(source: string | undefined): string {
  if (source === undefined || source === '') return 'not stated';
  if (source === 'request') return 'entered for this calculation';
  return source;
}

/**
 * The cosmology model a result was computed with: its label in the summary line,
 * and every parameter with its value and source when opened.
 * @param props.model the resolved model from a result
 * @param props.defaultOpen whether the parameters start visible
 */
export function ModelSummary({ model, defaultOpen = false }: { model: ResolvedModel; defaultOpen?: boolean }) {
  const rows = PARAMS.filter((p) => model[p.key] !== undefined);
  return (
    <details open={defaultOpen} className="group rounded-lg border border-rule bg-panel">
      <summary className="flex cursor-pointer list-none flex-wrap items-baseline gap-x-2 gap-y-1 px-4 py-3 text-sm [&::-webkit-details-marker]:hidden">
        <span aria-hidden="true" className="inline-block w-3 text-muted transition-transform group-open:rotate-90">
          ›
        </span>
        <span className="font-medium text-ink">Model</span>
        <span className="text-muted">{model.label}</span>
        <span className="ml-auto text-xs text-accent group-open:hidden">Show parameters</span>
        <span className="ml-auto hidden text-xs text-accent group-open:inline">Hide parameters</span>
      </summary>
      {/* In a narrow side panel the unit joins the value and the source goes under the parameter. */}
      <div className="@container overflow-x-auto border-t border-rule px-4 pb-3 pt-2">
        <table className="w-full text-left text-sm">
          <caption className="sr-only">Parameters of {model.label}, with their sources</caption>
          <thead className="text-xs text-muted">
            <tr>
              <th scope="col" className="py-1.5 pr-3 font-medium">
                Symbol
              </th>
              <th scope="col" className="py-1.5 pr-3 font-medium">
                Parameter
              </th>
              <th scope="col" className="py-1.5 pr-3 text-right font-medium">
                Value
              </th>
              <th scope="col" className="hidden py-1.5 pr-3 font-medium @lg:table-cell">
                Unit
              </th>
              <th scope="col" className="hidden py-1.5 font-medium @lg:table-cell">
                Source
              </th>
            </tr>
          </thead>
          <tbody className="align-baseline">
            {rows.map((p) => {
              const value = model[p.key] as number | number[];
              return (
                <tr key={p.key} className="border-t border-rule/70">
                  <td className="py-1.5 pr-3 font-mono text-[13px] whitespace-nowrap">
                    <SymbolText text={p.symbol} />
                  </td>
                  <td className="py-1.5 pr-3">
                    {p.name}
                    <span className="mt-0.5 block text-xs leading-5 text-muted [overflow-wrap:anywhere] @lg:hidden">
                      {describeSource(model.sources[p.key])}
                    </span>
                  </td>
                  <td className="py-1.5 pr-3 text-right whitespace-nowrap tabular-nums" title={fullValue(value)}>
                    {shownValue(value)}
                    {p.unit && <span className="text-muted @lg:hidden"> {p.unit}</span>}
                  </td>
                  <td className="hidden py-1.5 pr-3 text-muted @lg:table-cell">{p.unit}</td>
                  <td className="hidden py-1.5 text-xs leading-5 text-muted [overflow-wrap:anywhere] @lg:table-cell">
                    {describeSource(model.sources[p.key])}
                  </td>
                </tr>
              );
            })}
            {model.H0_range && (
              <tr className="border-t border-rule/70">
                <td className="py-1.5 pr-3 font-mono text-[13px]">H₀ range</td>
                <td className="py-1.5 pr-3">
                  68 % range of the Hubble constant, propagated with the densities held fixed
                  <span className="mt-0.5 block text-xs text-muted @lg:hidden">entered for this calculation</span>
                </td>
                <td className="py-1.5 pr-3 text-right whitespace-nowrap tabular-nums">
                  {formatSig(model.H0_range.low)} – {formatSig(model.H0_range.high)}
                  <span className="text-muted @lg:hidden"> km/s/Mpc</span>
                </td>
                <td className="hidden py-1.5 pr-3 text-muted @lg:table-cell">km/s/Mpc</td>
                <td className="hidden py-1.5 text-xs text-muted @lg:table-cell">entered for this calculation</td>
              </tr>
            )}
          </tbody>
        </table>
        {model.kind === 'flrw' && model.flat !== undefined && (
          <p className="mt-2 text-xs text-muted">
            {model.flat ? 'Flat: Ω_Λ closes the sum, so Ω_k = 0.' : 'Not flat: Ω_k = 1 − Ω_m − Ω_Λ − Ω_γ − Ω_ν.'}
          </p>
        )}
      </div>
    </details>
  );
}
