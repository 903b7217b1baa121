import { findLicence } from '@shared/media/licences.ts';
import { RENDITION_FORMATS, RENDITION_NAMES } from '@shared/media/renditions.ts';
import type { MediaDto, RenditionDto } from '@shared/media/schemas.ts';
import { renditionUrl } from '../media/keys.ts';
import type { Media, MediaRendition, User } from '../models/index.ts';
import { can } from '../policies/index.ts';
import type { LinkedObject } from '../services/media/index.ts';
import { missingForPublishing } from '../services/media/index.ts';

/** A rendition with its public URL; the original never gets one. */
export function presentRendition(rendition: MediaRendition): RenditionDto {
  return {
    name: rendition.name,
    format: rendition.format,
    width: rendition.width,
    height: rendition.height,
    bytes: rendition.bytes,
    url: renditionUrl(rendition.storageKey),
  };
}

// Renditions in a stable order: by size, then best format first.
const order = (r: MediaRendition) => RENDITION_NAMES.indexOf(r.name) * 10 + RENDITION_FORMATS.indexOf(r.format);

/**
 * The API contract for an image (load it with `renditions` and `uploadedBy`).
 * @param objects the catalogue objects it shows
 */
export function presentMedia(media: Media, viewer: User, objects: LinkedObject[]): MediaDto {
  const renditions = [...(media.renditions ?? [])].sort((a, b) => order(a) - order(b));
  const licence = findLicence(media.licenceId);
  const thumbnail =
    renditions.find((r) => r.name === 'thumbnail' && r.format === 'webp') ?? renditions.find((r) => r.name === 'thumbnail');
  return {
    id: media.id,
    fileName: media.fileName,
    format: media.format,
    width: media.width,
    height: media.height,
    bytes: media.bytes,
    altText: media.altText,
    credit: media.credit,
    licence: licence ? { id: licence.id, label: licence.label, url: licence.url } : null,
    sourceUrl: media.sourceUrl,
    focalPoint: { x: media.focalX, y: media.focalY },
    objects,
    renditionsStatus: media.renditionsStatus,
    renditionsError: media.renditionsError,
    renditions: renditions.map(presentRendition),
    thumbnailUrl: thumbnail ? renditionUrl(thumbnail.storageKey) : null,
    missing: missingForPublishing(media),
    uploadedBy: media.uploadedBy ? { id: media.uploadedBy.id, name: media.uploadedBy.name } : null,
    createdAt: media.createdAt.toISOString(),
    updatedAt: media.updatedAt.toISOString(),
    can: { update: can(viewer, 'media', 'update', media), delete: can(viewer, 'media', 'delete', media) },
  };
}
