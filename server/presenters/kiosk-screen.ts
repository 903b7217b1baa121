import type { KioskScreenDto, ScreenHealth, SkySnapshotDto } from '@shared/schemas/kiosk.ts';
import type { SkyTonight } from '@shared/sky/types.ts';
import { KioskLimits } from '@shared/validations.ts';
import type { KioskScreen, SkySnapshot } from '../models/index.ts';

/** Online when seen within two minutes; otherwise why not. */
export function screenHealth(screen: KioskScreen, now = Date.now()): ScreenHealth {
  if (screen.revokedAt && !screen.tokenHash) return 'revoked';
  if (!screen.tokenHash) return 'awaiting-pairing';
  if (!screen.lastSeenAt) return 'never-seen';
  return now - screen.lastSeenAt.getTime() <= KioskLimits.onlineWithinSeconds * 1000 ? 'online' : 'offline';
}

/** The API contract for a kiosk screen: never its token or pairing code. */
export function presentKioskScreen(screen: KioskScreen, now = Date.now()): KioskScreenDto {
  const waiting =
    screen.pairingExpiresAt && screen.pairingExpiresAt.getTime() > now ? screen.pairingExpiresAt.toISOString() : null;
  return {
    id: screen.id,
    venueId: screen.venueId,
    name: screen.name,
    health: screenHealth(screen, now),
    paired: !!screen.tokenHash,
    pairingExpiresAt: waiting,
    tokenIssuedAt: screen.tokenIssuedAt?.toISOString() ?? null,
    revokedAt: screen.revokedAt?.toISOString() ?? null,
    lastSeenAt: screen.lastSeenAt?.toISOString() ?? null,
    playerVersion: screen.playerVersion ?? null,
    showing: screen.showing ?? null,
    language: screen.language ?? null,
    showingSlide:
      screen.showingSlideId || screen.showingSlideTitle
        ? { id: screen.showingSlideId ?? null, title: screen.showingSlideTitle ?? '' }
        : null,
    orientation: screen.orientation ?? 'auto',
    reportedOrientation: screen.reportedOrientation ?? null,
    silenceAlertedAt: screen.silenceAlertedAt?.toISOString() ?? null,
    createdAt: screen.createdAt.toISOString(),
  };
}

/** A sky snapshot as sent to staff screens and kiosks. */
export function presentSkySnapshot(
  snapshot: SkySnapshot | { venueId: string; localDate: string; computedAt: Date; data: SkyTonight },
  stored = true,
): SkySnapshotDto {
  return {
    venueId: snapshot.venueId,
    localDate: snapshot.localDate,
    computedAt: snapshot.computedAt.toISOString(),
    stored,
    sky: snapshot.data,
  };
}
