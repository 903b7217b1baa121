/**
 * The organisation's settings: adopted cosmology, default band, locale and notices.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { settingsEvents } from './events.ts';
export { getSettings } from './organisation-settings.ts';
export { changeCosmology, updateSettings } from './settings-update.ts';
