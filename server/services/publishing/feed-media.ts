import { Op } from 'sequelize';
import type { FeedImage } from '@shared/schemas/kiosk-feed.ts';
import { findLicence } from '@shared/media/licences.ts';
import { renditionUrl } from '../../media/keys.ts';
import { Media, MediaRendition } from '../../models/index.ts';
import { missingForPublishing } from '../media/index.ts';
import { absoluteUrl } from './public-urls.ts';

/** A library image as a kiosk slide or the public API shows it: always with its credit and licence. */
export interface PublishedImage {
  id: string;
  image: FeedImage;
  /** The page-size rendition, for the public API. Every address here is absolute (public-urls.ts). */
  pageUrl: string | null;
  credit: string;
  licence: string;
  licenceUrl: string | null;
  sourceUrl: string;
  updatedAt: Date;
}

const jpegOf = (renditions: MediaRendition[], name: string) =>
  renditions.find((r) => r.name === name && r.format === 'jpeg') ?? renditions.find((r) => r.name === name);

/**
 * Loads images that may be shown in public: credit, licence, source, alt text and renditions all
 * present (the same rule the page workflow uses). An image that falls short is left out, so no
 * screen ever shows a picture without its credit.
 * @param mediaIds library image ids (unknown ids are ignored)
 * @returns the publishable ones, by id
 */
export async function loadPublishedImages(mediaIds: string[]): Promise<Map<string, PublishedImage>> {
  const ids = [...new Set(mediaIds)].filter((id) => /^[0-9a-f-]{36}$/i.test(id));
  if (!ids.length) return new Map();
  const rows = await Media.findAll({ where: { id: { [Op.in]: ids } }, include: [{ model: MediaRendition, as: 'renditions' }] });
  const found = new Map<string, PublishedImage>();
  for (const m of rows) {
    const licence = findLicence(m.licenceId);
    if (missingForPublishing(m).length || !licence) continue;
    const renditions = m.renditions ?? [];
    // A kiosk crop is 16:9; an old image without one falls back to the page size (letterboxed by the player).
    const hd = jpegOf(renditions, 'kiosk-hd') ?? jpegOf(renditions, 'page');
    if (!hd) continue;
    const uhd = jpegOf(renditions, 'kiosk-4k') ?? hd;
    const page = jpegOf(renditions, 'page');
    found.set(m.id, {
      id: m.id,
      image: {
        hd: absoluteUrl(renditionUrl(hd.storageKey)),
        uhd: absoluteUrl(renditionUrl(uhd.storageKey)),
        focal: { x: m.focalX, y: m.focalY },
        alt: m.altText,
      },
      pageUrl: page ? absoluteUrl(renditionUrl(page.storageKey)) : null,
      credit: m.credit,
      licence: licence.label,
      licenceUrl: licence.url,
      sourceUrl: m.sourceUrl,
      updatedAt: m.updatedAt,
    });
  }
  return found;
}
