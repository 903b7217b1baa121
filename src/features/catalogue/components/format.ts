import { formatSig } from '@/components/working/format-number.ts';
import { formatDeclination, formatRightAscension } from '@shared/catalogue/coordinates.ts';
import { CONSTELLATION_NAMES } from '@shared/catalogue/constellations.ts';
import { findQuantity, findUnit } from '@shared/catalogue/quantities.ts';
import type { MeasurementDto } from '@shared/schemas/measurement.ts';

/**
 * A number as people read it: up to 6 significant figures, a typographic minus, and a power of ten
 * ("7 × 10⁻⁶") instead of a programmer's "7e-6" for very small or large values.
 */
export function formatNumber(value: number): string {
  return formatSig(value, 6);
}

const unitLabel = (quantity: string, unit: string) => {
  const q = findQuantity(quantity);
  const u = q ? findUnit(q, unit) : undefined;
  return u && u.id !== '' ? u.label : '';
};

/**
 * A measurement in the unit it was entered in, with its uncertainty: "2.5 +0.3 −0.1 kpc", "0.158 ± 0.002".
 */
export function formatMeasurement(
  m: Pick<
    MeasurementDto,
    'quantity' | 'value' | 'enteredValue' | 'enteredUnit' | 'uncertainty' | 'uncertaintyMinus' | 'uncertaintyPlus'
  >,
): string {
  const q = findQuantity(m.quantity);
  const factor = q ? (findUnit(q, m.enteredUnit)?.toCanonical ?? 1) : 1;
  const unit = unitLabel(m.quantity, m.enteredUnit);
  let text = formatNumber(m.enteredValue);
  if (m.uncertainty !== null) text += ` ± ${formatNumber(m.uncertainty / factor)}`;
  else if (m.uncertaintyMinus !== null && m.uncertaintyPlus !== null)
    text += ` +${formatNumber(m.uncertaintyPlus / factor)} −${formatNumber(m.uncertaintyMinus / factor)}`;
  return unit ? `${text} ${unit}` : text;
}

/** "Apparent magnitude (V)" or "Redshift". */
export function quantityTitle(quantity: string, band: string | null): string {
  const label = findQuantity(quantity)?.label ?? quantity;
  return band ? `${label} (${band})` : label;
}

/** Right ascension and declination in sexagesimal, or a note for bodies without a fixed position. */
export function formatPosition(raDeg: number | null, decDeg: number | null): string {
  if (raDeg === null || decDeg === null) return 'No fixed position';
  return `${formatRightAscension(raDeg)}  ${formatDeclination(decDeg)}`;
}

/** "Orion (Ori)". */
export const constellationName = (abbreviation: string | null) =>
  abbreviation ? `${CONSTELLATION_NAMES[abbreviation] ?? abbreviation} (${abbreviation})` : '—';

/** A link for a source: the one rule, shared with the public pages. */
export { sourceHref } from '@shared/catalogue/source-link.ts';
