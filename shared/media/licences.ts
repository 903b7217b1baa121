/**
 * The licences an image in the library may carry. Creative Commons URLs are the licences' own
 * canonical deeds (creativecommons.org); public domain and "used with permission" have none.
 */
export const LICENCES = [
  { id: 'cc0-1.0', label: 'CC0 1.0 (public domain dedication)', url: 'https://creativecommons.org/publicdomain/zero/1.0/' },
  { id: 'cc-by-4.0', label: 'CC BY 4.0', url: 'https://creativecommons.org/licenses/by/4.0/' },
  { id: 'cc-by-sa-4.0', label: 'CC BY-SA 4.0', url: 'https://creativecommons.org/licenses/by-sa/4.0/' },
  { id: 'cc-by-nc-4.0', label: 'CC BY-NC 4.0', url: 'https://creativecommons.org/licenses/by-nc/4.0/' },
  { id: 'cc-by-nc-sa-4.0', label: 'CC BY-NC-SA 4.0', url: 'https://creativecommons.org/licenses/by-nc-sa/4.0/' },
  { id: 'cc-by-nd-4.0', label: 'CC BY-ND 4.0', url: 'https://creativecommons.org/licenses/by-nd/4.0/' },
  { id: 'cc-by-nc-nd-4.0', label: 'CC BY-NC-ND 4.0', url: 'https://creativecommons.org/licenses/by-nc-nd/4.0/' },
  { id: 'public-domain', label: 'Public domain', url: null },
  { id: 'all-rights-reserved-permission', label: 'All rights reserved, used with permission', url: null },
] as const satisfies ReadonlyArray<{ id: string; label: string; url: string | null }>;

export type Licence = (typeof LICENCES)[number];
export type LicenceId = Licence['id'];

/** Licence ids, for zod enums and selects. */
export const LICENCE_IDS = LICENCES.map((l) => l.id) as [LicenceId, ...LicenceId[]];

/** The licence with this id, or undefined. */
export function findLicence(id: string | null | undefined): Licence | undefined {
  return LICENCES.find((l) => l.id === id);
}
