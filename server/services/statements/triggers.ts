import { logger } from '../../logger.ts';
import { enqueueRecompute, type RecomputeScope } from './recompute.ts';

/**
 * Queues a background recompute of the statements a change can affect, from an event listener
 * (which cannot wait): a failure to queue is logged, not thrown. The wiring (`server/wiring.ts`)
 * calls this for catalogue and sky events.
 * @param scope what changed: a measurement, an object, a source, or a venue's night
 */
export function queueRecompute(scope: RecomputeScope): void {
  enqueueRecompute({ scope }).catch((err: unknown) => logger.error({ err, scope }, 'could not queue a statement recompute'));
}
