/** Limits shared by zod schemas, database columns and forms. */
export const UserLimits = {
  nameMax: 120,
  emailMax: 254,
  passwordMin: 10,
  passwordMax: 128,
} as const;

export const VenueLimits = {
  nameMax: 120,
} as const;

/** How long e-mailed links stay valid. */
export const TokenLifetimes = {
  invitationHours: 72,
  passwordResetMinutes: 60,
} as const;
