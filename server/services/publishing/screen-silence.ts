import { Op, QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import { sendMail, type MailMessage } from '../../mail/mailer.ts';
import { screenBackMail, screenSilentMail } from '../../mail/screen-templates.ts';
import { type KioskScreen, User, Venue } from '../../models/index.ts';

/** The job kind of the check for screens that went silent (scheduled every minute). */
export const SCREEN_SILENCE_JOB = 'screens.silence-check';

async function mailAdmins(make: (to: string, name: string) => MailMessage): Promise<void> {
  const admins = await User.findAll({ where: { role: { [Op.eq]: 'admin' }, active: true } });
  await Promise.all(
    admins.map((a) => {
      const m = make(a.email, a.name);
      return sendMail(m).catch((err: unknown) => logger.error({ err, to: m.to, subject: m.subject }, 'screen mail not sent'));
    }),
  );
}

interface SilentRow {
  screen_name: string;
  venue_id: string;
  venue_name: string;
  channel_name: string;
  minutes: number;
  last_seen_at: Date | null;
  showing_slide_title: string | null;
  player_version: string | null;
}

/**
 * Finds paired screens whose channel asks to be told of silence and that have sent no heartbeat
 * (since pairing, if never) for longer than the channel's minutes, marks each as reported and
 * e-mails every active admin once per screen. Marking and choosing are one UPDATE … RETURNING, so
 * two server instances running the check at once never both send: one outage, one e-mail. The
 * next heartbeat clears the mark (and sends the short "back" note).
 * @param now the clock, epoch ms (tests pass their own)
 * @returns how many screens were reported
 */
export async function reportSilentScreens(now = Date.now()): Promise<number> {
  const rows = await getSequelize().query<SilentRow>(
    `UPDATE kiosk_screens s
        SET silence_alerted_at = :now
       FROM channel_screens cs
       JOIN channels c ON c.id = cs.channel_id
       JOIN venues v ON v.id = c.venue_id
      WHERE cs.screen_id = s.id
        AND c.silence_alert_minutes IS NOT NULL
        AND s.token_hash IS NOT NULL
        AND s.silence_alerted_at IS NULL
        AND COALESCE(s.last_seen_at, s.token_issued_at) < :now::timestamptz - make_interval(mins => c.silence_alert_minutes)
  RETURNING s.name AS screen_name, v.id AS venue_id, v.name AS venue_name, c.name AS channel_name,
            c.silence_alert_minutes AS minutes, s.last_seen_at, s.showing_slide_title, s.player_version`,
    { replacements: { now: new Date(now).toISOString() }, type: QueryTypes.SELECT },
  );
  for (const r of rows) {
    const screen = {
      screenName: r.screen_name,
      venueId: r.venue_id,
      venueName: r.venue_name,
      channelName: r.channel_name,
      lastSeenAt: r.last_seen_at ? new Date(r.last_seen_at) : null,
      slideTitle: r.showing_slide_title,
      playerVersion: r.player_version,
    };
    await mailAdmins((to, name) => screenSilentMail(to, name, screen, r.minutes));
  }
  return rows.length;
}

/** The silence check job. */
export async function runScreenSilenceJob(): Promise<void> {
  const reported = await reportSilentScreens();
  if (reported) logger.warn({ reported }, 'silent kiosk screens reported to admins');
}

/** A reported screen was heard from again: a short note to admins (after the heartbeat is saved). */
export async function reportScreenBack(screen: KioskScreen): Promise<void> {
  const venue = await Venue.findByPk(screen.venueId);
  await mailAdmins((to, name) =>
    screenBackMail(to, name, { screenName: screen.name, venueId: screen.venueId, venueName: venue?.name ?? '' }),
  );
}
