import { EventEmitter } from 'node:events';

/** What each catalogue event carries. */
export interface CatalogueEventMap {
  /**
   * A reviewer chose (or unset) the preferred measurement for (object, quantity, band). Editing or
   * retiring a measurement is one `measurementChanged` only, preferred or not.
   */
  preferredChanged: [{ skyObjectId: string; quantity: string; band: string | null }];
  /** A measurement was created, edited, reviewed or retired (its recompute covers its object's statements). */
  measurementChanged: [{ measurementId: string; skyObjectId: string }];
  /** An object's name, kind or sentence names changed: its statements' wording or validity may move. */
  objectChanged: [{ skyObjectId: string }];
  /** A source's citation or identifiers changed. */
  sourceChanged: [{ sourceId: string }];
}

/**
 * Domain events of the catalogue, emitted only after the transaction that caused them has
 * committed (listeners never see data that was rolled back). One process only: listeners that
 * must survive a restart should enqueue a job.
 */
export const catalogueEvents = new EventEmitter<CatalogueEventMap>();
// The default limit of 10 is a leak warning, not a rule; the listeners are in server/wiring.ts.
catalogueEvents.setMaxListeners(50);
