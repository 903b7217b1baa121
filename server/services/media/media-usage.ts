import type { MediaRequirement, MediaUsage } from '@shared/media/schemas.ts';
import { Media, type User } from '../../models/index.ts';

/**
 * One place an image is used; `visibleTo` says whether a person may see that place (a private
 * draft is its writer's own), absent when everyone who sees the library may.
 */
export type MediaUsePlace = MediaUsage & { visibleTo?: (viewer: User) => boolean };

/** Finds where one image is used, in one feature (pages, kiosk channels …). */
export type MediaUsageProvider = (mediaId: string) => Promise<MediaUsePlace[]>;

const providers = new Map<string, MediaUsageProvider>();

/**
 * Lets another feature say where images are used; the library lists these places and refuses to
 * delete an image that has any. Called from the wiring (server/wiring.ts). Features that reference media rows should
 * also use a foreign key with ON DELETE RESTRICT, so a delete racing a new use fails safely.
 * @param name the feature, e.g. `pages`; registering a name again replaces its provider
 * @param fn returns the places that use the image
 */
export function registerMediaUsageProvider(name: string, fn: MediaUsageProvider): void {
  providers.set(name, fn);
}

/** Removes a provider (tests). */
export function unregisterMediaUsageProvider(name: string): void {
  providers.delete(name);
}

/**
 * Every place an image is used, across all registered features, as one person may see them: the
 * places they may not see (another writer's private draft) are only counted.
 * @param mediaId the image
 * @param viewer who is asking
 * @returns the visible places, and how many others there are
 */
export async function findMediaUsage(mediaId: string, viewer: User): Promise<{ usage: MediaUsage[]; hiddenCount: number }> {
  const found = (await Promise.all([...providers.values()].map((fn) => fn(mediaId)))).flat();
  const usage: MediaUsage[] = [];
  let hiddenCount = 0;
  for (const { visibleTo, ...place } of found) {
    if (!visibleTo || visibleTo(viewer)) usage.push(place);
    else hiddenCount += 1;
  }
  return { usage, hiddenCount };
}

/** "and 2 private drafts": the places a person may not see, counted. */
export function hiddenUsageText(hiddenCount: number): string {
  return hiddenCount === 1 ? 'a private draft' : `${hiddenCount} private drafts`;
}

/**
 * What an image still lacks before it may appear on an approved page (or a kiosk, or the public
 * API), by the rules every publishing feature shares.
 * @param media the image
 * @returns requirement names, empty when nothing is missing
 */
export function missingForPublishing(media: Media): MediaRequirement[] {
  const missing: MediaRequirement[] = [];
  if (!media.credit.trim()) missing.push('credit');
  if (!media.licenceId) missing.push('licence');
  if (!media.sourceUrl.trim()) missing.push('sourceUrl');
  if (!media.altText.trim()) missing.push('altText');
  if (media.renditionsStatus !== 'ready') missing.push('renditions');
  return missing;
}

/**
 * Whether an image may be used on an approved page: credit, licence, source URL, alt text and
 * finished renditions. Other features call this before approving or publishing.
 * @param mediaId the image
 * @returns ready, and the names of what is missing; an unknown id is reported as missing
 *   everything rather than throwing
 */
export async function isMediaReadyForPublishing(mediaId: string): Promise<{ ready: boolean; missing: string[] }> {
  const media = /^[0-9a-f-]{36}$/i.test(mediaId) ? await Media.findByPk(mediaId) : null;
  const missing: string[] = media ? missingForPublishing(media) : ['credit', 'licence', 'sourceUrl', 'altText', 'renditions'];
  return { ready: missing.length === 0, missing };
}
