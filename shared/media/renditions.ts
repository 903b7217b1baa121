/**
 * The renditions made from every image. `fit: 'inside'` keeps the whole picture within the box;
 * `fit: 'cover'` crops to the box's shape around the focal point (kiosk screens). None is ever
 * larger than the original.
 */
export const RENDITION_SPECS = [
  { name: 'thumbnail', width: 400, height: 400, fit: 'inside' },
  { name: 'page', width: 1600, height: 1600, fit: 'inside' },
  { name: 'kiosk-hd', width: 1920, height: 1080, fit: 'cover' },
  { name: 'kiosk-4k', width: 3840, height: 2160, fit: 'cover' },
] as const satisfies ReadonlyArray<{ name: string; width: number; height: number; fit: 'inside' | 'cover' }>;

export type RenditionSpec = (typeof RENDITION_SPECS)[number];
export type RenditionName = RenditionSpec['name'];
export const RENDITION_NAMES = RENDITION_SPECS.map((s) => s.name) as [RenditionName, ...RenditionName[]];

/** Output formats, best first: browsers pick with <picture>; JPEG is the fallback every device reads. */
export const RENDITION_FORMATS = ['avif', 'webp', 'jpeg'] as const;
export type RenditionFormat = (typeof RENDITION_FORMATS)[number];

/** File extension and MIME type per output format. */
export const FORMAT_FILES: Record<RenditionFormat, { ext: string; mime: string }> = {
  avif: { ext: 'avif', mime: 'image/avif' },
  webp: { ext: 'webp', mime: 'image/webp' },
  jpeg: { ext: 'jpg', mime: 'image/jpeg' },
};

/** Where an image's renditions are: waiting for the queue, being made, done, or given up after retries. */
export const RENDITION_STATUSES = ['pending', 'processing', 'ready', 'failed'] as const;
export type RenditionStatus = (typeof RENDITION_STATUSES)[number];

/** Each rendition's name in words for staff (the codes stay in URLs and the API). */
export const RENDITION_LABELS: Record<RenditionName, string> = {
  thumbnail: 'Thumbnail',
  page: 'Page image',
  'kiosk-hd': 'HD kiosk screen',
  'kiosk-4k': '4K kiosk screen',
};

/**
 * What a rendition is, for people: its label, the box it is made for, and a warning when it came
 * out smaller than that box because the original is smaller (renditions are never enlarged), so
 * the screen will scale it up.
 * @param name the rendition
 * @param width its width in pixels as made
 * @param height its height as made
 */
export function describeRendition(
  name: RenditionName,
  width: number,
  height: number,
): { label: string; target: string; warning: string | null } {
  const spec = RENDITION_SPECS.find((s) => s.name === name)!;
  const target = `${spec.width} × ${spec.height}`;
  const smaller = spec.fit === 'cover' && (width < spec.width || height < spec.height);
  return {
    label: RENDITION_LABELS[name],
    target,
    warning: smaller
      ? `Smaller than ${name === 'kiosk-4k' ? '4K' : 'HD'} (${target}): the original is not large enough and images are never enlarged, so the screen will scale it up and it may look soft.`
      : null,
  };
}
