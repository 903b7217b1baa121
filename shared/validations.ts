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

/** Kiosk screens: names, pairing codes and what a heartbeat may carry. */
export const KioskLimits = {
  screenNameMax: 80,
  /** A pairing code works for this long after it is shown. */
  pairingCodeMinutes: 15,
  playerVersionMax: 40,
  slideTitleMax: 200,
  /** The heartbeat's "what is showing" object, as JSON. */
  showingMaxBytes: 4000,
  /** A screen seen within this many seconds counts as online. */
  onlineWithinSeconds: 120,
} as const;

/** How long e-mailed links stay valid. */
export const TokenLifetimes = {
  invitationHours: 72,
  passwordResetMinutes: 60,
} as const;

/** The catalogue: objects, sources, measurements and CSV imports. */
export const CatalogueLimits = {
  objectNameMax: 120,
  designationMax: 60,
  designationsMax: 20,
  notesMax: 4000,
  citationMax: 500,
  urlMax: 2000,
  doiMax: 200,
  catalogueNameMax: 200,
  reasonMax: 1000,
  pageSizeMax: 200,
  /** A CSV upload larger than this is refused with 413 before it is read. */
  importMaxBytes: 10 * 1024 * 1024,
  importMaxRows: 100_000,
  /** Rejected rows listed in full in a dry-run report; the count is always exact. */
  importReportedRejectionsMax: 1000,
} as const;

/** Object pages: sizes, lengths and how often the editor saves. */
export const PageLimits = {
  titleMax: 200,
  /** A page document larger than this (as JSON) is refused: far beyond any real page. */
  docMaxBytes: 5 * 1024 * 1024,
  maxDepth: 40,
  captionMax: 500,
  commentMax: 4000,
  reasonMin: 10,
  reasonMax: 1000,
  /** The editor saves this long after the last change. */
  autosaveMs: 3000,
  pageSizeMax: 200,
} as const;

/** Kiosk channels: names, slides per channel, slide timing. */
export const ChannelLimits = {
  nameMax: 80,
  slidesMax: 100,
  /** Slide durations are clamped to this range (seconds): long enough to read, short enough to move on. */
  durationMin: 5,
  durationMax: 120,
  durationDefault: 12,
  captionMax: 300,
  statementsPerSlideMax: 4,
  /** A screen silent this long (minutes) may be reported to admins: from five minutes to a week. */
  silenceAlertMin: 5,
  silenceAlertMax: 10080,
} as const;
