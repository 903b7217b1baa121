/**
 * Warnings (not errors) about a measured value that is possible but suspicious: the person entering
 * it is told what it means and confirms. One module for the form, the API and the CSV import.
 *
 * Parallax: catalogues publish negative parallaxes (noise around a tiny true parallax), and we keep
 * them as published; but a negative parallax gives no distance, and one far below zero compared with
 * its uncertainty, or one equal to the object's other published parallax with the sign flipped, is
 * most likely a typing or sign error.
 */

/** Why a value needs a second look. */
export type MeasurementWarningCode =
  | 'negative_parallax'
  | 'impossible_negative_parallax'
  | 'likely_sign_error'
  | 'far_from_published';

export interface MeasurementWarning {
  code: MeasurementWarningCode;
  message: string;
}

/** Another accepted value of the same quantity of the same object, in the canonical unit. */
export interface PublishedValue {
  value: number;
  uncertainty: number | null;
}

/**
 * How many standard deviations below zero a parallax may lie before noise no longer explains it.
 * Five sigma is the usual threshold for "not a fluctuation" (common practice).
 */
const NOISE_SIGMAS = 5;

const plain = (v: number) => Math.abs(v).toLocaleString('en-GB', { maximumFractionDigits: 4 });
const signed = (v: number) => `${v < 0 ? '−' : v > 0 ? '+' : ''}${plain(v)}`;
const mas = (v: number) => `${signed(v)} mas`;
/** A published value with its uncertainty: "+130.2 ± 0.4 mas". */
const published = (p: PublishedValue) => `${signed(p.value)}${p.uncertainty === null ? '' : ` ± ${plain(p.uncertainty)}`} mas`;

/**
 * The warnings for a parallax (canonical: mas) about to be stored for an object.
 * @param value the parallax in mas
 * @param uncertainty its symmetric uncertainty in mas (or the larger of an asymmetric pair), if any
 * @param others the object's other accepted, current parallaxes
 */
export function parallaxWarnings(
  value: number,
  uncertainty: number | null,
  others: readonly PublishedValue[],
): MeasurementWarning[] {
  const warnings: MeasurementWarning[] = [];
  if (value <= 0)
    warnings.push({
      code: 'negative_parallax',
      message: `A parallax of ${mas(value)} gives no distance. Catalogues publish negative parallaxes for stars too far for the measurement to tell (noise takes the value below zero); Starproof keeps them as published, but no statement can work out a distance from one.`,
    });
  const flipped = others.find(
    (p) => p.value > 0 && value < 0 && Math.abs(value + p.value) <= Math.max(0.05 * p.value, NOISE_SIGMAS * (p.uncertainty ?? 0)),
  );
  if (flipped) {
    warnings.push({
      code: 'likely_sign_error',
      message: `This object's published parallax is ${published(flipped)}; ${mas(value)} is the same size with the opposite sign, which is most likely a sign error. Check the source.`,
    });
    return warnings;
  }
  if (value < 0 && uncertainty !== null && uncertainty > 0 && -value > NOISE_SIGMAS * uncertainty)
    warnings.push({
      code: 'impossible_negative_parallax',
      message: `${mas(value)} lies ${Math.round(-value / uncertainty).toLocaleString('en-GB')} times its uncertainty below zero. A true parallax is never negative, so noise cannot explain this: check the sign and the unit.`,
    });
  const far = others.find((p) => {
    const combined = Math.hypot(uncertainty ?? 0, p.uncertainty ?? 0);
    const apart = Math.abs(value - p.value);
    return apart > 0.2 * Math.max(Math.abs(p.value), 1) && (combined === 0 || apart > NOISE_SIGMAS * combined);
  });
  if (far)
    warnings.push({
      code: 'far_from_published',
      message: `${mas(value)} is far from this object's published parallax of ${published(far)}. Check the value and its unit before saving.`,
    });
  return warnings;
}
