import { Op } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { KioskScreen, type User, type Venue } from '../../models/index.ts';
import type { ScreenOrientation } from '@shared/schemas/kiosk.ts';
import { logger } from '../../logger.ts';
import { recordAudit } from '../audit.ts';
import { publishingEvents } from './events.ts';
import { reportScreenBack } from './screen-silence.ts';

/** A venue's screens, by name. */
export async function listScreens(venue: Venue): Promise<KioskScreen[]> {
  return KioskScreen.findAll({ where: { venueId: venue.id }, order: [['name', 'ASC']] });
}

/**
 * Adds a screen to a venue (not yet paired), with its audit event in the same transaction.
 * @throws HttpError 409 `screen_name_taken` when the venue has a screen of that name (ignoring case)
 */
export async function addScreen(venue: Venue, name: string, actor: User, ip?: string): Promise<KioskScreen> {
  const sequelize = getSequelize();
  const clash = await KioskScreen.findOne({
    where: sequelize.and(
      { venueId: venue.id },
      sequelize.where(sequelize.fn('lower', sequelize.col('name')), name.toLowerCase()),
    ),
  });
  if (clash) throw ConflictError(`This venue already has a screen called "${clash.name}".`, 'screen_name_taken');
  return sequelize.transaction(async (transaction) => {
    const created = await KioskScreen.create({ venueId: venue.id, name }, { transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'kiosk.screen_added',
        subjectType: 'kiosk_screen',
        subjectId: created.id,
        data: { venueId: venue.id, name },
        ip,
      },
      transaction,
    );
    return created;
  });
}

/** Removes a screen (its token stops working with it), with its audit event in the same transaction. */
export async function removeScreen(screen: KioskScreen, actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await recordAudit(
      {
        actorId: actor.id,
        action: 'kiosk.screen_removed',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { venueId: screen.venueId, name: screen.name },
        ip,
      },
      transaction,
    );
    await screen.destroy({ transaction });
  });
}

/** What a screen's player reports on each heartbeat; omitted fields keep their last value. */
export interface Heartbeat {
  playerVersion?: string;
  showing?: KioskScreen['showing'];
  slideId?: string | null;
  slideTitle?: string;
  orientation?: 'landscape' | 'portrait';
}

/**
 * Records that a screen is alive (and what it plays and shows), by the server's clock. A screen
 * that had been reported silent is marked heard from, and admins get a short note.
 */
export async function recordHeartbeat(screen: KioskScreen, beat: Heartbeat): Promise<void> {
  screen.set({ lastSeenAt: new Date() });
  if (beat.playerVersion !== undefined) screen.set({ playerVersion: beat.playerVersion });
  if (beat.showing !== undefined) screen.set({ showing: beat.showing });
  if (beat.slideId !== undefined) screen.set({ showingSlideId: beat.slideId });
  if (beat.slideTitle !== undefined) screen.set({ showingSlideTitle: beat.slideTitle });
  if (beat.orientation !== undefined) screen.set({ reportedOrientation: beat.orientation });
  await screen.save();
  // Cleared in one statement with its own check, so a silence check running meanwhile cannot leave it set unnoticed.
  const [, cleared] = await KioskScreen.update(
    { silenceAlertedAt: null },
    { where: { id: screen.id, silenceAlertedAt: { [Op.ne]: null } }, returning: true },
  );
  screen.set({ silenceAlertedAt: null });
  if (cleared.length) reportScreenBack(screen).catch((err: unknown) => logger.error({ err }, 'screen back note not sent'));
}

/** Sets how a screen hangs (its player follows at its next heartbeat), with its audit event. */
export async function setScreenOrientation(
  screen: KioskScreen,
  orientation: ScreenOrientation,
  actor: User,
  ip?: string,
): Promise<KioskScreen> {
  await getSequelize().transaction(async (transaction) => {
    await screen.update({ orientation }, { transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'kiosk.screen_orientation_set',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { orientation },
        ip,
      },
      transaction,
    );
  });
  return screen;
}

/** How many screens each venue has, by venue id (a venue with none is absent). */
export async function countScreensByVenue(): Promise<Map<string, number>> {
  const rows = await KioskScreen.count({ group: ['venueId'] });
  return new Map(rows.map((r) => [String(r.venueId), Number(r.count)]));
}

/** How many screens a venue has. */
export function countScreens(venue: Venue): Promise<number> {
  return KioskScreen.count({ where: { venueId: venue.id } });
}

/**
 * Sets the one language a screen plays, or null to alternate between its channel's languages. The
 * screen's remembered sign-in is dropped after commit (`screenChanged`), so its next poll reads the
 * feed for the new language.
 */
export async function setScreenLanguage(
  screen: KioskScreen,
  language: string | null,
  actor: User,
  ip?: string,
): Promise<KioskScreen> {
  if ((screen.language ?? null) === language) return screen;
  const from = screen.language ?? null;
  await getSequelize().transaction(async (transaction) => {
    await screen.update({ language }, { transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'kiosk.screen_language_set',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { from, to: language },
        ip,
      },
      transaction,
    );
    transaction.afterCommit(() => void publishingEvents.emit('screenChanged', { screenId: screen.id }));
  });
  return screen;
}
