/** Staff roles, from the widest rights to the narrowest. */
export const ROLES = ['admin', 'editor', 'reviewer', 'writer'] as const;
export type Role = (typeof ROLES)[number];

/** Plain-English labels for the interface. */
export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  editor: 'Editor',
  reviewer: 'Reviewer',
  writer: 'Writer',
};

/** What each role is for, shown when an admin chooses one. */
export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  admin: 'Users and roles, venues, kiosk screens, organisation defaults',
  editor: 'Approves and publishes pages, builds kiosk channels',
  reviewer: 'Keeps measurements and sources, checks working, signs pages off',
  writer: 'Drafts object pages with checked statements and imagery',
};
