/**
 * Monte Carlo draws a column at a time, for the two shapes almost every statement's run takes:
 * a distance or time over z and H0 (the part in z interpolated, divided by H0's scale), and an
 * absolute magnitude over m, z and H0 (the modulus interpolated, shifted by −5 log10 of H0's scale).
 *
 * Why: the ordinary loop (monte-carlo.ts) calls a calculation per draw through a closure that
 * differs from run to run, so the engine cannot inline it, and each draw paid about 65 ns in calls;
 * a column loop calls nothing. Each column holds exactly the value the ordinary loop puts in that
 * slot for that draw, and every result is computed with the same operations in the same order, so
 * the draws, hence the intervals, are the same to the bit. When a draw is not finite the fill
 * gives up and the run draws the ordinary way, which counts and names the failures.
 *
 * H0's draws are the same in every run with the same H0 range (the deviates are fixed), so its
 * scale, and the modulus shift that costs a logarithm per draw, are computed once and kept.
 */
import { absoluteMagnitude } from './magnitudes.ts';
import type { ZInterpolant } from './quantities/local-modulus.ts';
import { boundMass, SAMPLES, seededDeviates, truncatedDeviate, type Measurement } from './uncertainty.ts';

/**
 * Fills out[i] with input j's value in draw i of a run that varies n inputs: the value the
 * ordinary loop writes into the input's slot (draw i reads deviate i × n + j).
 * @param out SAMPLES values
 * @param n how many inputs the run varies
 * @param j this input's position among them
 * @param m the input, with its bound if it has one
 */
export function drawColumn(out: Float64Array, n: number, j: number, m: Measurement): void {
  const dev = seededDeviates(SAMPLES * n);
  const mass = boundMass(m);
  const { value, minus, plus } = m;
  for (let i = 0; i < SAMPLES; i++) {
    const d = mass > 0 ? truncatedDeviate(dev[i * n + j], mass) : dev[i * n + j];
    out[i] = value + d * (d < 0 ? minus : plus);
  }
}

/** H0's draws as a run uses them: each draw's H0 over the nominal one, and −5 log10 of that added to μ. */
interface H0Columns {
  /** H0 drawn / H0 nominal, per draw. */
  scale: Float64Array;
  /** 5 log10(scale), per draw (made on first use: only magnitudes need it). */
  shift: Float64Array | null;
  /** False when some draw's scale is not above zero (the ordinary loop fails that draw). */
  positive: boolean;
}

const kept = new Map<string, H0Columns>();
// A few ranges at once at most (one organisation's, a preview's); each column is 32 kB.
const KEPT_RANGES = 4;

function h0Columns(n: number, j: number, h0: Measurement, nominal: number): H0Columns {
  const key = `${n}|${j}|${h0.value}|${h0.minus}|${h0.plus}|${h0.lower}|${nominal}`;
  let columns = kept.get(key);
  if (columns === undefined) {
    const scale = new Float64Array(SAMPLES);
    drawColumn(scale, n, j, h0);
    let positive = true;
    for (let i = 0; i < SAMPLES; i++) {
      // As the ordinary loop: scale = x[H0] / nominal H0.
      scale[i] = scale[i] / nominal;
      if (!(scale[i] > 0)) positive = false;
    }
    columns = { scale, shift: null, positive };
    if (kept.size >= KEPT_RANGES) kept.delete(kept.keys().next().value as string);
    kept.set(key, columns);
  }
  return columns;
}

function shiftOf(columns: H0Columns): Float64Array {
  if (columns.shift === null) {
    const shift = new Float64Array(SAMPLES);
    // As sampleDistanceModulus: 5 * Math.log10(env.h0Scale).
    for (let i = 0; i < SAMPLES; i++) shift[i] = 5 * Math.log10(columns.scale[i]);
    columns.shift = shift;
  }
  return columns.shift;
}

// Reused from run to run (runs never nest inside a fill).
const zColumn = new Float64Array(SAMPLES);
const mColumn = new Float64Array(SAMPLES);

/** Where a run's inputs sit among its varied ones, and H0's nominal value. */
export interface ColumnRun {
  /** The varied inputs in the order they take deviates. */
  varied: Array<{ name: string; m: Measurement }>;
  /** The model's nominal H0 (a draw's scale is its H0 over this). */
  nominalH0: number;
}

function position(run: ColumnRun, name: string): number {
  return run.varied.findIndex((v) => v.name === name);
}

/**
 * A distance or time over z and H0: out[i] = inZ(z_i) / scale_i, as interval.ts's per-draw
 * calculation computes it.
 * @param run the run's varied inputs (exactly z and H0)
 * @param inZ the part in z at the nominal H0
 * @param out SAMPLES results
 * @returns false when a draw is not finite (draw the ordinary way instead)
 */
export function fillScaledInZ(run: ColumnRun, inZ: ZInterpolant, out: Float64Array): boolean {
  const n = run.varied.length;
  const z = position(run, 'z');
  const h = position(run, 'H0');
  const h0 = h0Columns(n, h, run.varied[h].m, run.nominalH0);
  if (!h0.positive) return false;
  drawColumn(zColumn, n, z, run.varied[z].m);
  inZ.evaluateInto(zColumn, out);
  const scale = h0.scale;
  for (let i = 0; i < SAMPLES; i++) {
    const r = out[i] / scale[i];
    // r − r is 0 only for finite r.
    if (r - r !== 0) return false;
    out[i] = r;
  }
  return true;
}

/**
 * An absolute magnitude over m, z and H0 with no extinction or spectral index given:
 * out[i] = m_i − (μ(z_i) − 5 log10 scale_i) − 0 − 0, as sampleAbsoluteMagnitude computes it.
 * @param run the run's varied inputs (exactly m, z and H0)
 * @param modulusAt μ(z) at the nominal H0
 * @param out SAMPLES results
 * @returns false when a draw is not finite (draw the ordinary way instead)
 */
export function fillAbsoluteMagnitude(run: ColumnRun, modulusAt: ZInterpolant, out: Float64Array): boolean {
  const n = run.varied.length;
  const z = position(run, 'z');
  const m = position(run, 'm');
  const h = position(run, 'H0');
  const h0 = h0Columns(n, h, run.varied[h].m, run.nominalH0);
  if (!h0.positive) return false;
  const shift = shiftOf(h0);
  drawColumn(zColumn, n, z, run.varied[z].m);
  drawColumn(mColumn, n, m, run.varied[m].m);
  modulusAt.evaluateInto(zColumn, out);
  for (let i = 0; i < SAMPLES; i++) {
    const r = absoluteMagnitude(mColumn[i], out[i] - shift[i], 0, 0);
    if (r - r !== 0) return false;
    out[i] = r;
  }
  return true;
}
