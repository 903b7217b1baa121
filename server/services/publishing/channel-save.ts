import type { Transaction } from 'sequelize';
import type { ChannelCreateInput, ChannelUpdateInput } from '@shared/schemas/channel.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError, ValidationError } from '../../errors.ts';
import { Channel, Venue, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { publishingEvents } from './events.ts';

/**
 * Marks a channel changed inside the caller's transaction: its version goes up (other instances'
 * feed caches compare it) and, after commit, this instance's caches hear the event.
 */
export async function touchChannel(channelId: string, transaction: Transaction): Promise<void> {
  await getSequelize().query('UPDATE channels SET version = version + 1, updated_at = now() WHERE id = :channelId', {
    replacements: { channelId },
    transaction,
  });
  transaction.afterCommit(() => void publishingEvents.emit('channelChanged', { channelId }));
}

/** Locks a channel row for an edit, so two editors' changes to its slides are applied one after the other. */
export async function lockChannel(channelId: string, transaction: Transaction): Promise<Channel> {
  return (await Channel.findByPk(channelId, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true }))!;
}

async function assertNameFree(venueId: string, name: string, exceptId: string | null, transaction: Transaction): Promise<void> {
  const sequelize = getSequelize();
  const clash = await Channel.findOne({
    where: sequelize.and({ venueId }, sequelize.where(sequelize.fn('lower', sequelize.col('name')), name.toLowerCase())),
    transaction,
  });
  if (clash && clash.id !== exceptId)
    throw ConflictError(`This venue already has a channel called "${clash.name}".`, 'channel_name_taken');
}

/**
 * Creates an empty channel at a venue.
 * @throws HttpError 400 unknown venue, 409 name taken at that venue
 */
export async function createChannel(input: ChannelCreateInput, actor: User, ip?: string): Promise<Channel> {
  return getSequelize().transaction(async (transaction) => {
    const venue = await Venue.findByPk(input.venueId, { transaction });
    if (!venue) throw ValidationError('There is no such venue.', { venueId: 'There is no such venue' });
    await assertNameFree(venue.id, input.name, null, transaction);
    const channel = await Channel.create({ venueId: venue.id, name: input.name, createdById: actor.id }, { transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.created',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { venueId: venue.id, name: input.name },
        ip,
      },
      transaction,
    );
    return channel;
  });
}

/**
 * Renames a channel, sets the languages it plays, shows or hides QR codes on its object slides, or
 * sets after how long a silent screen is reported to admins.
 * @throws HttpError 409 name taken at the venue
 */
export async function updateChannel(channel: Channel, input: ChannelUpdateInput, actor: User, ip?: string): Promise<Channel> {
  await getSequelize().transaction(async (transaction) => {
    const row = await lockChannel(channel.id, transaction);
    // The languages form sends the name unchanged: that is not a rename.
    if (input.name !== undefined && input.name !== row.name) {
      await assertNameFree(row.venueId, input.name, row.id, transaction);
      await row.update({ name: input.name }, { transaction });
      await recordAudit(
        {
          actorId: actor.id,
          action: 'channel.renamed',
          subjectType: 'channel',
          subjectId: row.id,
          data: { from: channel.name, to: input.name },
          ip,
        },
        transaction,
      );
    }
    if (input.languages !== undefined && input.languages.join(',') !== row.languages.join(',')) {
      const from = row.languages;
      await row.update({ languages: input.languages }, { transaction });
      await recordAudit(
        {
          actorId: actor.id,
          action: 'channel.languages_set',
          subjectType: 'channel',
          subjectId: row.id,
          data: { from, to: input.languages },
          ip,
        },
        transaction,
      );
    }
    const settings = {
      ...(input.showQr !== undefined ? { showQr: input.showQr } : {}),
      ...(input.silenceAlertMinutes !== undefined ? { silenceAlertMinutes: input.silenceAlertMinutes } : {}),
    };
    if (Object.keys(settings).length) {
      await row.update(settings, { transaction });
      await recordAudit(
        { actorId: actor.id, action: 'channel.settings_changed', subjectType: 'channel', subjectId: row.id, data: settings, ip },
        transaction,
      );
    }
    await touchChannel(row.id, transaction);
  });
  return channel.reload();
}

/** Removes a channel with its slides; its screens show the holding screen until given another. */
export async function deleteChannel(channel: Channel, actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.deleted',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { venueId: channel.venueId, name: channel.name },
        ip,
      },
      transaction,
    );
    await channel.destroy({ transaction });
    transaction.afterCommit(() => void publishingEvents.emit('channelChanged', { channelId: channel.id }));
  });
}
