/**
 * The organisation's settings: adopted cosmology, default band, locale and notices, and Earth's
 * timeline that "when the light set out" statements compare with.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { settingsEvents } from './events.ts';
export { getSettings } from './organisation-settings.ts';
export { changeCosmology, updateSettings } from './settings-update.ts';
export {
  createTimelineEntry,
  deleteTimelineEntry,
  listTimelineEntries,
  timelineForStatements,
  updateTimelineEntry,
} from './timeline.ts';
