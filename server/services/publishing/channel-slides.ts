import { Op, type Transaction } from 'sequelize';
import type { SlideCreateInput, SlideUpdateInput } from '@shared/schemas/channel.ts';
import { ChannelLimits } from '@shared/validations.ts';
import { getSequelize } from '../../db.ts';
import { BadRequestError, ConflictError, NotFoundError, ValidationError } from '../../errors.ts';
import { ChannelSlide, Media, Page, type Channel, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { lockChannel, touchChannel } from './channel-save.ts';
import { missingForPublishing } from '../media/index.ts';

const REQUIREMENT_WORDS: Record<string, string> = {
  credit: 'a credit',
  licence: 'a licence',
  sourceUrl: 'a source address',
  altText: 'alt text',
  renditions: 'its screen sizes (still being made)',
};

async function checkPage(pageId: string, statementIds: string[], transaction: Transaction): Promise<Page> {
  const page = await Page.findByPk(pageId, { transaction });
  if (!page) throw ValidationError('There is no such page.', { pageId: 'There is no such page' });
  const live = page.publishedSnapshot;
  if (!live)
    throw BadRequestError(`“${page.title}” is not published. Only published pages go on kiosk screens.`, 'page_not_published', {
      pageId: 'This page is not published',
    });
  const missing = statementIds.filter((id) => !live.statementTexts[id]);
  if (missing.length)
    throw BadRequestError(
      'A chosen statement is not on the published page. Choose from the statements the page shows.',
      'statement_not_on_page',
      { statementIds: 'Not on the published page' },
    );
  return page;
}

async function checkMedia(mediaId: string, transaction: Transaction): Promise<Media> {
  const media = await Media.findByPk(mediaId, { transaction });
  if (!media) throw ValidationError('There is no such image in the library.', { mediaId: 'There is no such image' });
  const missing = missingForPublishing(media);
  if (missing.length) {
    const words = missing.map((m) => REQUIREMENT_WORDS[m] ?? m).join(', ');
    throw BadRequestError(`This image cannot go on a screen yet: it still needs ${words}.`, 'media_not_ready', {
      mediaId: `Still needs ${words}`,
    });
  }
  return media;
}

const dateOrNull = (v: string | null | undefined) => (v ? new Date(v) : null);

/**
 * Adds a slide at the end of a channel: a published page with statements chosen from it, a
 * publishable image with a caption, or the sky tonight.
 * @throws HttpError 400 page not published, statement not on it, image without credit or licence;
 *   409 the channel is full
 */
export async function addSlide(channel: Channel, input: SlideCreateInput, actor: User, ip?: string): Promise<ChannelSlide> {
  return getSequelize().transaction(async (transaction) => {
    await lockChannel(channel.id, transaction);
    const count = await ChannelSlide.count({ where: { channelId: channel.id }, transaction });
    if (count >= ChannelLimits.slidesMax)
      throw ConflictError(
        `A channel holds at most ${ChannelLimits.slidesMax} slides. Remove one first, or start another channel.`,
        'channel_full',
      );
    if (input.kind === 'page') await checkPage(input.pageId, input.statementIds, transaction);
    if ((input.kind === 'page' || input.kind === 'image') && input.mediaId) await checkMedia(input.mediaId, transaction);
    const slide = await ChannelSlide.create(
      {
        channelId: channel.id,
        position: count,
        kind: input.kind,
        pageId: input.kind === 'page' ? input.pageId : null,
        statementIds: input.kind === 'page' ? input.statementIds : [],
        mediaId: input.kind === 'sky_tonight' ? null : (input.mediaId ?? null),
        caption: input.kind === 'image' ? input.caption : '',
        durationS: input.durationS ?? ChannelLimits.durationDefault,
        startsAt: dateOrNull(input.startsAt),
        endsAt: dateOrNull(input.endsAt),
        schedule: input.schedule ?? null,
      },
      { transaction },
    );
    await touchChannel(channel.id, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.slide_added',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { slideId: slide.id, kind: input.kind },
        ip,
      },
      transaction,
    );
    return slide;
  });
}

/** A slide of this channel, locked; another channel's slide is "not found" here. */
async function lockSlide(channel: Channel, slideId: string, transaction: Transaction): Promise<ChannelSlide> {
  const slide = /^[0-9a-f-]{36}$/i.test(slideId)
    ? await ChannelSlide.findOne({ where: { id: slideId, channelId: channel.id }, transaction, lock: transaction.LOCK.UPDATE })
    : null;
  if (!slide) throw NotFoundError('There is no such slide in this channel.');
  return slide;
}

/**
 * Changes a slide's timing (window and schedule), caption, statements or image.
 * @throws HttpError 400 window ends before it starts, statement not on the page, image not ready; 404
 */
export async function updateSlide(
  channel: Channel,
  slideId: string,
  input: SlideUpdateInput,
  actor: User,
  ip?: string,
): Promise<ChannelSlide> {
  return getSequelize().transaction(async (transaction) => {
    await lockChannel(channel.id, transaction);
    const slide = await lockSlide(channel, slideId, transaction);
    const startsAt = input.startsAt === undefined ? slide.startsAt : dateOrNull(input.startsAt);
    const endsAt = input.endsAt === undefined ? slide.endsAt : dateOrNull(input.endsAt);
    if (startsAt && endsAt && endsAt <= startsAt)
      throw ValidationError('endsAt: The end must be after the start', {
        endsAt: 'The end must be after the start',
      });
    if (input.statementIds !== undefined) {
      if (slide.kind !== 'page')
        throw ValidationError('Only a page slide shows statements.', {
          statementIds: 'Only a page slide shows statements',
        });
      await checkPage(slide.pageId!, input.statementIds, transaction);
    }
    if (input.mediaId !== undefined) {
      if (slide.kind === 'sky_tonight' || (slide.kind === 'image' && input.mediaId === null))
        throw ValidationError('This slide cannot take that image.', { mediaId: 'Not for this slide' });
      if (input.mediaId) await checkMedia(input.mediaId, transaction);
    }
    if (input.caption !== undefined && slide.kind !== 'image')
      throw ValidationError('Only an image slide has a caption.', {
        caption: 'Only an image slide has a caption',
      });
    await slide.update(
      {
        startsAt,
        endsAt,
        ...(input.durationS !== undefined ? { durationS: input.durationS } : {}),
        ...(input.schedule !== undefined ? { schedule: input.schedule } : {}),
        ...(input.caption !== undefined ? { caption: input.caption } : {}),
        ...(input.statementIds !== undefined ? { statementIds: input.statementIds } : {}),
        ...(input.mediaId !== undefined ? { mediaId: input.mediaId } : {}),
      },
      { transaction },
    );
    await touchChannel(channel.id, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.slide_changed',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { slideId: slide.id, fields: Object.keys(input) },
        ip,
      },
      transaction,
    );
    return slide;
  });
}

/** Removes a slide and closes the gap in the order. */
export async function removeSlide(channel: Channel, slideId: string, actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await lockChannel(channel.id, transaction);
    const slide = await lockSlide(channel, slideId, transaction);
    await slide.destroy({ transaction });
    await ChannelSlide.decrement('position', {
      by: 1,
      where: { channelId: channel.id, position: { [Op.gt]: slide.position } },
      transaction,
    });
    await touchChannel(channel.id, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.slide_removed',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { slideId: slide.id, kind: slide.kind },
        ip,
      },
      transaction,
    );
  });
}

/**
 * Puts the channel's slides in the given order. The list must name every slide of the channel once:
 * a list made before someone else added or removed a slide is refused rather than half applied.
 * @throws HttpError 409 `slides_changed`
 */
export async function reorderSlides(channel: Channel, slideIds: string[], actor: User, ip?: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    await lockChannel(channel.id, transaction);
    const slides = await ChannelSlide.findAll({ where: { channelId: channel.id }, transaction });
    const known = new Set(slides.map((s) => s.id));
    if (
      slideIds.length !== slides.length ||
      new Set(slideIds).size !== slideIds.length ||
      !slideIds.every((id) => known.has(id))
    ) {
      throw ConflictError(
        'The slides changed since this list was loaded (someone added or removed one). Reload and try the move again.',
        'slides_changed',
      );
    }
    // The unique (channel, position) constraint is deferred, so swaps inside this transaction are fine.
    const order = new Map(slideIds.map((id, i) => [id, i]));
    for (const slide of slides)
      if (slide.position !== order.get(slide.id)) await slide.update({ position: order.get(slide.id)! }, { transaction });
    await touchChannel(channel.id, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'channel.slides_reordered',
        subjectType: 'channel',
        subjectId: channel.id,
        data: { slideIds },
        ip,
      },
      transaction,
    );
  });
}
