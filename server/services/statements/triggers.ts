import { logger } from '../../logger.ts';
import { catalogueEvents } from '../catalogue-events.ts';
import { skyEvents } from '../sky-events.ts';
import { enqueueRecompute, type RecomputeScope } from './recompute.ts';

let registered = false;

function queue(scope: RecomputeScope) {
  enqueueRecompute({ scope }).catch((err: unknown) => logger.error({ err, scope }, 'could not queue a statement recompute'));
}

/**
 * Keeps statements current: any change to a preferred measurement, a measurement a statement used,
 * a source, or an object's name, kind or sentence names queues a background recompute of the statements it can affect; a venue's sky for a
 * new night (or after the venue moved) recomputes the statements about that venue for that night.
 */
export function registerStatementTriggers(): void {
  if (registered) return;
  registered = true;
  catalogueEvents.on('preferredChanged', ({ objectId }) => queue({ objectId }));
  catalogueEvents.on('measurementChanged', ({ measurementId }) => queue({ measurementId }));
  catalogueEvents.on('sourceChanged', ({ sourceId }) => queue({ sourceId }));
  // A new kind can put a statement outside its template's kinds (→ needs review); a new name or
  // sentence name moves the wording.
  catalogueEvents.on('objectChanged', ({ objectId }) => queue({ objectId }));
  skyEvents.on('nightComputed', ({ venueId, localDate }) => queue({ venueId, localDate }));
}
