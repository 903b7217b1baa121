import { EventEmitter } from 'node:events';

/** What each catalogue event carries. */
export interface CatalogueEventMap {
  /** The preferred measurement for (object, quantity, band) was chosen, changed, unset or its values changed. */
  preferredChanged: [{ objectId: string; quantity: string; band: string | null }];
  /** A measurement was created, edited, reviewed or retired. */
  measurementChanged: [{ measurementId: string; objectId: string }];
  /** An object's name, kind or sentence names changed: its statements' wording or validity may move. */
  objectChanged: [{ objectId: string }];
  /** A source's citation or identifiers changed. */
  sourceChanged: [{ sourceId: string }];
}

/**
 * Domain events of the catalogue, emitted only after the transaction that caused them has
 * committed (listeners never see data that was rolled back). One process only: listeners that
 * must survive a restart should enqueue a job.
 */
export const catalogueEvents = new EventEmitter<CatalogueEventMap>();
// Several features listen (statements, pages, kiosk feeds); the default limit of 10 is a leak warning, not a rule.
catalogueEvents.setMaxListeners(50);
