import type { RenditionFormat, RenditionName } from '@shared/media/renditions.ts';

/**
 * The staff app's one rule for showing a rendition in a single `<img>`: WebP first (smaller than
 * JPEG and read by every browser the staff app supports), then JPEG, then AVIF last, because a lone
 * `<img>` has no fallback if the browser cannot read the format (a `<picture>` would, which is why
 * the list of formats made, `RENDITION_FORMATS`, puts AVIF first).
 */
export const IMG_FORMAT_PREFERENCE: readonly RenditionFormat[] = ['webp', 'jpeg', 'avif'];

/**
 * The rendition of the given size to show in an `<img>`, by `IMG_FORMAT_PREFERENCE`.
 * @param renditions an image's finished renditions
 * @param name which size: 'thumbnail', 'page', 'kiosk-hd', 'kiosk-4k'
 * @returns the rendition, or null when that size has not been made (yet)
 */
export function pickRendition<R extends { name: string; format: string }>(
  renditions: readonly R[] | undefined,
  name: RenditionName,
): R | null {
  for (const format of IMG_FORMAT_PREFERENCE) {
    const found = renditions?.find((r) => r.name === name && r.format === format);
    if (found) return found;
  }
  return renditions?.find((r) => r.name === name) ?? null;
}
