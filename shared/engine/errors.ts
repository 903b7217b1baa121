/**
 * The engine's one error type. Engine functions throw it for bad input or a
 * model where a quantity is undefined; `calculate` catches it and turns it into
 * an `{ error: { code, message } }` result, so callers of `calculate` never see a throw.
 */

/** Stable snake_case error codes of the calculation contract. */
export type CalcErrorCode =
  | 'invalid_json'
  | 'invalid_request'
  | 'unknown_quantity'
  | 'invalid_input'
  | 'missing_input'
  | 'unused_input'
  | 'conflicting_inputs'
  | 'out_of_range'
  | 'invalid_model'
  | 'negative_density'
  | 'no_big_bang'
  | 'unknown_band'
  | 'no_solution'
  | 'several_solutions'
  | 'ill_conditioned'
  | 'poor_parallax'
  | 'not_in_hubble_law'
  | 'interval_outside_domain'
  | 'non_finite_result'
  | 'internal_error';

/** An error with a contract code and a message that names the offending input. */
export class CalcError extends Error {
  readonly code: CalcErrorCode;

  /**
   * @param code snake_case error code
   * @param message human-readable message naming the input
   */
  constructor(code: CalcErrorCode, message: string) {
    super(message);
    this.code = code;
    this.name = 'CalcError';
  }
}

/**
 * Formats a number for an error message so the offending value is shown as given.
 * @param x any value
 * @returns a short string for the message
 */
export function shown(x: unknown): string {
  if (typeof x === 'number') return Number.isFinite(x) ? String(x) : String(x);
  try {
    const text = JSON.stringify(x);
    return text === undefined ? String(x) : text.length > 60 ? `${text.slice(0, 57)}...` : text;
  } catch {
    return String(x);
  }
}
