/**
 * The last few Monte Carlo runs whose every draw was kept, summarised by what a later run with the
 * same draws needs: two statements about one object (light output and brightness) draw the same
 * absolute magnitudes, and the second then selects and draws nothing. Keyed by `drawsKey`
 * (see interval.ts), which names everything the draws depend on.
 */
import { orderStatistics, quantileRanks, rangeOf } from './order-statistics.ts';

/**
 * What a later run with the same draws needs of an earlier one: the order statistics its
 * percentiles read (the same four for an increasing or a decreasing last step, since the levels are
 * symmetric), and the smallest and largest draw (whether a last step is finite over all of them).
 */
export interface DrawSummary {
  stats: Map<number, number>;
  min: number;
  max: number;
}

/** The percentile levels every interval reports. */
export const LEVELS = [0.16, 0.84] as const;
/** The last few runs that had no failures, by drawsKey (oldest first). */
const recentRuns = new Map<string, DrawSummary>();
const RECENT_RUNS = 4;

/** Summarises a run's draws (reordering them) and keeps the summary under its key. */
export function rememberRun(key: string, draws: Float64Array): DrawSummary {
  const { min, max } = rangeOf(draws);
  const summary = { stats: orderStatistics(draws, quantileRanks(draws.length, [...LEVELS]), { min, max }), min, max };
  if (recentRuns.size >= RECENT_RUNS) recentRuns.delete(recentRuns.keys().next().value as string);
  recentRuns.set(key, summary);
  return summary;
}

/** The summary of an earlier run with these draws, if it is still kept. */
export function recalledRun(key: string): DrawSummary | undefined {
  return recentRuns.get(key);
}
