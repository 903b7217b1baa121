import crypto from 'node:crypto';
import { KioskLimits } from '@shared/validations.ts';
import { getSequelize } from '../../db.ts';
import { BadRequestError } from '../../errors.ts';
import { KioskScreen, Venue, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { hashToken } from '../users/index.ts';
import { publishingEvents } from './events.ts';

/** Letters and digits that cannot be mistaken for one another on a screen (no 0/O, 1/I/L). */
const CODE_ALPHABET = 'ABCDEFGHJKMNPQRSTUVWXYZ23456789';

/** A fresh six-character code, written "K7Q-4M2" for people; stored and compared without the dash. */
export function newPairingCode(): { display: string; normalised: string } {
  let normalised = '';
  for (let i = 0; i < 6; i += 1) normalised += CODE_ALPHABET[crypto.randomInt(CODE_ALPHABET.length)];
  return { display: `${normalised.slice(0, 3)}-${normalised.slice(3)}`, normalised };
}

/**
 * Gives a screen a new pairing code, replacing any waiting one. The screen's current token keeps
 * working until the code is used (or the screen is revoked).
 * @returns the code to show once, and when it expires
 */
export async function issuePairingCode(
  screen: KioskScreen,
  actor: User,
  ip?: string,
): Promise<{ code: string; expiresAt: Date }> {
  return getSequelize().transaction(async (transaction) => {
    let code = newPairingCode();
    // A clash with another screen's code (1 in ~900 million) just draws again.
    while (await KioskScreen.findOne({ where: { pairingCodeHash: hashToken(code.normalised) }, transaction }))
      code = newPairingCode();
    const expiresAt = new Date(Date.now() + KioskLimits.pairingCodeMinutes * 60_000);
    screen.set({ pairingCodeHash: hashToken(code.normalised), pairingExpiresAt: expiresAt });
    await screen.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'kiosk.pairing_code_issued',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { venueId: screen.venueId },
        ip,
      },
      transaction,
    );
    return { code: code.display, expiresAt };
  });
}

/**
 * Trades a pairing code for the screen's long token. The code works once; the row is locked so
 * two players typing the same code cannot both pair.
 * @param code six letters and digits, already normalised by the schema
 * @throws HttpError 400 `pairing_code_unknown` | `pairing_code_used` | `pairing_code_expired`
 */
export async function pairScreen(code: string, ip?: string): Promise<{ token: string; screen: KioskScreen; venue: Venue }> {
  return getSequelize().transaction(async (transaction) => {
    const screen = await KioskScreen.findOne({
      where: { pairingCodeHash: hashToken(code) },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!screen)
      throw BadRequestError(
        'No screen is waiting for this pairing code. Check the code, or ask an admin for a new one.',
        'pairing_code_unknown',
      );
    if (!screen.pairingExpiresAt)
      throw BadRequestError(
        'This pairing code has already been used. Ask an admin to re-pair the screen for a new code.',
        'pairing_code_used',
      );
    if (screen.pairingExpiresAt.getTime() < Date.now()) {
      throw BadRequestError(
        `This pairing code has expired (codes last ${KioskLimits.pairingCodeMinutes} minutes). Ask an admin for a new one.`,
        'pairing_code_expired',
      );
    }
    const token = `spk_${crypto.randomBytes(32).toString('base64url')}`;
    screen.set({
      tokenHash: hashToken(token),
      tokenIssuedAt: new Date(),
      pairingExpiresAt: null,
      revokedAt: null,
      lastSeenAt: new Date(),
    });
    await screen.save({ transaction });
    await recordAudit(
      {
        actorId: null,
        action: 'kiosk.paired',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { venueId: screen.venueId },
        ip,
      },
      transaction,
    );
    const venue = (await Venue.findByPk(screen.venueId, { transaction }))!;
    return { token, screen, venue };
  });
}

/** Stops a screen's token and any waiting code at once; the screen must be paired again to play. */
export async function revokeScreen(screen: KioskScreen, actor: User, ip?: string): Promise<KioskScreen> {
  await getSequelize().transaction(async (transaction) => {
    screen.set({ tokenHash: null, revokedAt: new Date(), pairingCodeHash: null, pairingExpiresAt: null });
    await screen.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'kiosk.revoked',
        subjectType: 'kiosk_screen',
        subjectId: screen.id,
        data: { venueId: screen.venueId },
        ip,
      },
      transaction,
    );
    transaction.afterCommit(() => void publishingEvents.emit('screenRevoked', { screenId: screen.id }));
  });
  return screen;
}
