import { Op } from 'sequelize';
import type { SlideSourcesDto } from '@shared/schemas/channel.ts';
import { findLicence } from '@shared/media/licences.ts';
import { renditionUrl } from '../../media/keys.ts';
import { Media, MediaRendition, Page, SkyObject } from '../../models/index.ts';

const LIST_MAX = 300;

/**
 * What an editor can put on a slide: every published page (with the statements its live version
 * shows, in the signed-off wording) and the library images that may be shown in public.
 */
export async function loadSlideSources(): Promise<SlideSourcesDto> {
  const [pages, media] = await Promise.all([
    Page.findAll({
      where: { publishedSnapshot: { [Op.ne]: null } },
      attributes: ['id', 'title', 'skyObjectId', 'publishedSnapshot'],
      order: [['title', 'ASC']],
      limit: LIST_MAX,
    }),
    Media.findAll({
      where: {
        credit: { [Op.ne]: '' },
        licenceId: { [Op.ne]: null },
        sourceUrl: { [Op.ne]: '' },
        altText: { [Op.ne]: '' },
        renditionsStatus: 'ready',
      },
      include: [{ model: MediaRendition, as: 'renditions', where: { name: 'thumbnail' }, required: false }],
      order: [['updatedAt', 'DESC']],
      limit: LIST_MAX,
    }),
  ]);
  const objects = await SkyObject.findAll({
    where: { id: { [Op.in]: [...new Set(pages.map((p) => p.skyObjectId))] } },
    attributes: ['id', 'name'],
  });
  const objectName = new Map(objects.map((o) => [o.id, o.name]));
  return {
    pages: pages.map((p) => ({
      id: p.id,
      title: p.publishedSnapshot!.title,
      objectName: objectName.get(p.skyObjectId) ?? '',
      publishedAt: p.publishedSnapshot!.publishedAt ?? null,
      statements: Object.entries(p.publishedSnapshot!.statementTexts).map(([id, text]) => ({ id, text })),
    })),
    media: media.map((m) => {
      const thumb = m.renditions?.find((r) => r.format === 'jpeg') ?? m.renditions?.[0];
      return {
        id: m.id,
        thumbnailUrl: thumb ? renditionUrl(thumb.storageKey) : null,
        altText: m.altText,
        credit: m.credit,
        licence: findLicence(m.licenceId)?.label ?? '',
      };
    }),
  };
}
