import type { Role } from '@shared/roles.ts';

/** Demo staff of the invented venue; printed by `npm start` and listed in the README. */
export const DEMO_ACCOUNTS: ReadonlyArray<{ role: Role; name: string; email: string; password: string }> = [
  { role: 'admin', name: 'Nessa Calloway (demo)', email: 'admin@demo.starproof.test', password: 'orbit-admin-demo' },
  { role: 'editor', name: 'Joss Ravensworth (demo)', email: 'editor@demo.starproof.test', password: 'orbit-editor-demo' },
  { role: 'reviewer', name: 'Ilse Marrowby (demo)', email: 'reviewer@demo.starproof.test', password: 'orbit-reviewer-demo' },
  { role: 'writer', name: 'Tobin Quayle (demo)', email: 'writer@demo.starproof.test', password: 'orbit-writer-demo' },
];

/** The invented venue the demo is set in. */
export const DEMO_VENUE = {
  name: 'Corrie Vale Planetarium (demo)',
  latitude: 54.62,
  longitude: -2.95,
  elevationM: 160,
  timeZone: 'Europe/London',
};
