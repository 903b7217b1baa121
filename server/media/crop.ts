/** A rectangle in pixels. */
export interface Region {
  left: number;
  top: number;
  width: number;
  height: number;
}

/**
 * The largest region of the target's shape that fits in the image, placed so the focal point is
 * as central as the edges allow. Output never exceeds the target, and never the region (no upscaling).
 * @param width image width
 * @param height image height
 * @param target the box to fill (e.g. 1920 × 1080)
 * @param focal the subject, as fractions of width and height
 * @returns the region to cut out and the size to scale it to
 */
export function coverCrop(
  width: number,
  height: number,
  target: { width: number; height: number },
  focal: { x: number; y: number },
): { region: Region; output: { width: number; height: number } } {
  const targetRatio = target.width / target.height;
  let cropW: number;
  let cropH: number;
  if (width / height > targetRatio) {
    cropH = height;
    cropW = Math.min(width, Math.round(height * targetRatio));
  } else {
    cropW = width;
    cropH = Math.min(height, Math.round(width / targetRatio));
  }
  const place = (size: number, crop: number, f: number) => Math.min(size - crop, Math.max(0, Math.round(f * size - crop / 2)));
  const region = { left: place(width, cropW, focal.x), top: place(height, cropH, focal.y), width: cropW, height: cropH };
  const output = cropW > target.width ? { width: target.width, height: target.height } : { width: cropW, height: cropH };
  return { region, output };
}

/**
 * The size of an image fitted inside a box, never enlarged.
 * @returns width and height, at least 1 pixel each
 */
export function fitInside(
  width: number,
  height: number,
  box: { width: number; height: number },
): { width: number; height: number } {
  const scale = Math.min(1, box.width / width, box.height / height);
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}
