import { EventEmitter } from 'node:events';

/** What each settings event carries: the settings version after the change, or the timeline entry changed. */
export interface SettingsEventMap {
  /** An admin adopted another cosmology: every statement's numbers may move. */
  cosmologyAdopted: [{ version: number }];
  /** The default band or the default spectral indices changed: magnitudes and luminosities may move. */
  statementDefaultsChanged: [{ version: number }];
  /** The eye-safety notice's wording changed: public pages that carry it show the new words. */
  eyeSafetyNoticeChanged: [{ version: number }];
  /** An admin added, changed or removed an entry of Earth's timeline: statements that read it may move. */
  timelineChanged: [{ entryId: string }];
}

/**
 * Domain events of the organisation's settings, emitted after the change has committed. The
 * settings service waits for its listeners (`emitAndWait`), so the request answers once the
 * recompute they start is queued.
 */
export const settingsEvents = new EventEmitter<SettingsEventMap>();
