import { Op, QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { BadRequestError } from '../../errors.ts';
import { ChannelScreen, KioskScreen, type Channel, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { lockChannel, touchChannel } from './channel-save.ts';

/**
 * Makes exactly these screens show the channel: each moves here from any channel it showed
 * before (a screen shows one channel); screens left out stop showing it and get the holding
 * screen until given another.
 * @param screenIds screens of the channel's venue
 * @throws HttpError 400 `screen_other_venue` for a screen that is not at the venue (or does not exist)
 */
export async function assignScreens(channel: Channel, screenIds: string[], actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await lockChannel(channel.id, transaction);
    const screens = screenIds.length
      ? await KioskScreen.findAll({ where: { id: { [Op.in]: screenIds }, venueId: channel.venueId }, transaction })
      : [];
    if (screens.length !== screenIds.length) {
      throw BadRequestError(
        'A chosen screen is not at this channel’s venue. A channel plays only on its own venue’s screens.',
        'screen_other_venue',
        { screenIds: 'Not a screen at this venue' },
      );
    }
    const before = await ChannelScreen.findAll({ where: { screenId: { [Op.in]: screenIds } }, transaction });
    await ChannelScreen.destroy({
      where: { channelId: channel.id, ...(screenIds.length ? { screenId: { [Op.notIn]: screenIds } } : {}) },
      transaction,
    });
    if (screenIds.length) {
      await getSequelize().query(
        `INSERT INTO channel_screens (screen_id, channel_id, assigned_by_id, assigned_at)
         SELECT unnest(CAST(:screenIds AS uuid[])), :channelId, :actorId, now()
         ON CONFLICT (screen_id) DO UPDATE SET channel_id = EXCLUDED.channel_id, assigned_by_id = EXCLUDED.assigned_by_id, assigned_at = EXCLUDED.assigned_at
         WHERE channel_screens.channel_id <> EXCLUDED.channel_id`,
        {
          replacements: { screenIds: `{${screenIds.join(',')}}`, channelId: channel.id, actorId: actor.id },
          type: QueryTypes.INSERT,
          transaction,
        },
      );
    }
    for (const moved of new Set(before.map((b) => b.channelId).filter((id) => id !== channel.id)))
      await touchChannel(moved, transaction);
    await touchChannel(channel.id, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.screens_assigned',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { screenIds },
        ip,
      },
      transaction,
    );
  });
}
