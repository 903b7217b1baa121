import { EventEmitter } from 'node:events';

/** What other features (object pages, kiosk feeds) react to. Emitted after commit. */
export interface StatementEventMap {
  /** Public wording moved away from the accepted text: pages using these need a new sign-off. */
  textChanged: [{ statementIds: string[] }];
  /** These statements can no longer be computed. */
  broken: [{ statementIds: string[] }];
  /** A recompute brought these back to their accepted wording (e.g. a cosmology switched A → B → A). */
  recovered: [{ statementIds: string[] }];
  /** A reviewer accepted new wording; these statements are current again. */
  accepted: [{ statementIds: string[] }];
}

export const statementEvents = new EventEmitter<StatementEventMap>();
