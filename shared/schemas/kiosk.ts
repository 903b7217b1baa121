import { z } from 'zod';
import type { SkyTonight } from '../sky/types.ts';
import { KioskLimits } from '../validations.ts';
import { LocaleTagSchema } from './page-version.ts';

const screenName = z
  .string({ message: 'Enter a name for the screen' })
  .trim()
  .min(1, 'Enter a name for the screen')
  .max(KioskLimits.screenNameMax, `Screen names are at most ${KioskLimits.screenNameMax} characters`);

export const ScreenCreateSchema = z.object({ name: screenName });
export type ScreenCreateInput = z.infer<typeof ScreenCreateSchema>;

/** How a screen hangs: `auto` lets the player's viewport decide (taller than wide is portrait). */
export const SCREEN_ORIENTATIONS = ['auto', 'landscape', 'portrait'] as const;
export type ScreenOrientation = (typeof SCREEN_ORIENTATIONS)[number];
/** What the player reports laying slides out in. */
export type ReportedOrientation = Exclude<ScreenOrientation, 'auto'>;

/**
 * An admin's change to a screen: how it hangs, and/or its own language (a registered locale, or null
 * to alternate between its channel's languages).
 */
export const ScreenUpdateSchema = z
  .object({
    orientation: z.enum(SCREEN_ORIENTATIONS, { message: 'The orientation is auto, landscape or portrait' }).optional(),
    language: LocaleTagSchema.nullable().optional(),
  })
  .refine((v) => v.orientation !== undefined || v.language !== undefined, 'Say what to change: orientation or language');
export type ScreenUpdateInput = z.infer<typeof ScreenUpdateSchema>;

/** The pairing code as typed on the player: letters and digits, dash and spaces optional. */
export const KioskPairSchema = z.object({
  code: z
    .string({ message: 'Enter the pairing code shown to the admin' })
    .transform((v) => v.toUpperCase().replace(/[\s-]/g, ''))
    .pipe(z.string().regex(/^[A-Z0-9]{6}$/, 'A pairing code is six letters and digits, like K7Q-4M2')),
});
export type KioskPairInput = z.infer<typeof KioskPairSchema>;

export const KioskHeartbeatSchema = z.object({
  playerVersion: z
    .string()
    .trim()
    .max(KioskLimits.playerVersionMax, `The player version is at most ${KioskLimits.playerVersionMax} characters`)
    .optional(),
  showing: z
    .record(z.string(), z.unknown())
    .refine(
      (v) => JSON.stringify(v).length <= KioskLimits.showingMaxBytes,
      `What is showing is at most ${KioskLimits.showingMaxBytes} characters of JSON`,
    )
    .optional(),
  /** When given, must be this token's own screen. */
  screenId: z.string().optional(),
  /** The slide on screen (null: the holding screen), and its title as shown. */
  slideId: z.uuid({ message: 'slideId must be a slide’s id, or null for the holding screen' }).nullable().optional(),
  slideTitle: z
    .string({ message: 'slideTitle is the title on screen, as text' })
    .trim()
    .max(KioskLimits.slideTitleMax, `slideTitle is at most ${KioskLimits.slideTitleMax} characters`)
    .optional(),
  /** How the player lays slides out now. */
  orientation: z.enum(['landscape', 'portrait'], { message: 'orientation is landscape or portrait' }).optional(),
});
export type KioskHeartbeatInput = z.infer<typeof KioskHeartbeatSchema>;

/** How a screen is doing, as the admin list shows it. */
export const SCREEN_HEALTH = ['online', 'offline', 'awaiting-pairing', 'never-seen', 'revoked'] as const;
export type ScreenHealth = (typeof SCREEN_HEALTH)[number];

/** A screen's health in a few words for people (the codes above never reach the screen). */
export const SCREEN_HEALTH_LABELS: Record<ScreenHealth, string> = {
  online: 'online',
  offline: 'offline',
  'awaiting-pairing': 'waiting to be paired',
  'never-seen': 'paired, not yet seen',
  revoked: 'access revoked',
};

/** A kiosk screen as the admin screens show it (never its token or code). */
export interface KioskScreenDto {
  id: string;
  venueId: string;
  name: string;
  health: ScreenHealth;
  paired: boolean;
  pairingExpiresAt: string | null;
  tokenIssuedAt: string | null;
  revokedAt: string | null;
  lastSeenAt: string | null;
  playerVersion: string | null;
  showing: Record<string, unknown> | null;
  /** The one language the screen plays, or null: it follows its channel's languages. */
  language: string | null;
  /** The slide on screen at the last heartbeat (null id: the holding screen). */
  showingSlide: { id: string | null; title: string } | null;
  orientation: ScreenOrientation;
  reportedOrientation: ReportedOrientation | null;
  /** When admins were e-mailed that the screen went silent (this outage), or null. */
  silenceAlertedAt: string | null;
  createdAt: string;
}

/** Returned once, when a pairing code is made. */
export interface PairingCodeDto {
  screen: KioskScreenDto;
  /** Written like K7Q-4M2. Shown once; only its hash is stored. */
  pairingCode: string;
  expiresAt: string;
  /** Where the screen's browser goes to show the player (absolute, from PUBLIC_URL). */
  playerUrl: string;
  /** A QR code of `playerUrl`, as SVG path data on a `size` × `size` grid (quiet zone included). */
  playerQr: { size: number; path: string };
}

/** What the player receives when it pairs. */
export interface KioskPairedDto {
  token: string;
  screen: { id: string; name: string; venueId: string; venueName: string };
}

/** A stored sky snapshot. */
export interface SkySnapshotDto {
  venueId: string;
  localDate: string;
  computedAt: string;
  /** False when computed for a chosen time and not kept. */
  stored: boolean;
  sky: SkyTonight;
}
