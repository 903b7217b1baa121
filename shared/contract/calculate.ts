/**
 * The calculation contract for every quantity (`POST /api/calc`, `npm run --silent calc`): the
 * engine's quantities go to `calculate`, `sky_tonight` to the sky code. Kept apart from the engine
 * so that pages which only need the engine do not load the planetary series. Never throws.
 */
import { calculate } from '../engine/calculate.ts';
import { CalcError } from '../engine/errors.ts';
import { requestId } from '../engine/request.ts';
import { SKY_TONIGHT, type ContractResult } from '../schemas/calc.ts';
import { skyTonightResult } from '../sky/calc-request.ts';

/**
 * Answers one request of the contract.
 * @param request an untrusted request (as parsed from JSON)
 * @param now the clock, recorded as the sky's computedAt
 * @returns the result, or `{ error: { code, message } }`; never throws
 */
export function answer(request: unknown, now: number = Date.now()): ContractResult {
  if (typeof request !== 'object' || request === null || (request as { quantity?: unknown }).quantity !== SKY_TONIGHT) {
    return calculate(request);
  }
  const id = requestId(request);
  const base = id !== undefined ? { id } : {};
  try {
    return { ...base, ...skyTonightResult(request as Record<string, unknown>, now) };
  } catch (e) {
    if (e instanceof CalcError) return { ...base, error: { code: e.code, message: e.message } };
    return { ...base, error: { code: 'internal_error', message: 'the sky could not be computed for these inputs' } };
  }
}

/**
 * Parses one line of JSON and answers it, for the command-line tool.
 * @param line one JSON request
 * @returns the result; malformed JSON gives an `invalid_json` error result
 */
export function answerLine(line: string): ContractResult {
  let parsed: unknown;
  try {
    parsed = JSON.parse(line);
  } catch (e) {
    return {
      error: { code: 'invalid_json', message: `the line is not valid JSON: ${e instanceof Error ? e.message : String(e)}` },
    };
  }
  return answer(parsed);
}
