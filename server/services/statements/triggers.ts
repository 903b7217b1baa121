import { logger } from '../../logger.ts';
import { catalogueEvents } from '../catalogue/index.ts';
import { skyEvents } from '../sky/index.ts';
import { enqueueRecompute, type RecomputeScope } from './recompute.ts';

let registered = false;

function queue(scope: RecomputeScope) {
  enqueueRecompute({ scope }).catch((err: unknown) => logger.error({ err, scope }, 'could not queue a statement recompute'));
}

/**
 * Keeps statements current: any change to a preferred measurement, a measurement a statement used,
 * or a source queues a background recompute of the statements it can affect; a venue's sky for a
 * new night (or after the venue moved) recomputes the statements about that venue for that night.
 */
export function registerStatementTriggers(): void {
  if (registered) return;
  registered = true;
  catalogueEvents.on('preferredChanged', ({ objectId }) => queue({ objectId }));
  catalogueEvents.on('measurementChanged', ({ measurementId }) => queue({ measurementId }));
  catalogueEvents.on('sourceChanged', ({ sourceId }) => queue({ sourceId }));
  skyEvents.on('nightComputed', ({ venueId, localDate }) => queue({ venueId, localDate }));
}
