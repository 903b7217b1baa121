import sharp, { type Sharp } from 'sharp';
import {
  RENDITION_FORMATS,
  RENDITION_SPECS,
  type RenditionFormat,
  type RenditionName,
  type RenditionSpec,
} from '@shared/media/renditions.ts';
import { coverCrop, fitInside } from './crop.ts';

// libvips' operation cache only helps when the same image is processed again; for uploads it just
// holds memory. Keep a small one.
sharp.cache({ memory: 32, files: 0, items: 50 });

/** One finished rendition, in memory, ready to be stored. */
export interface RenderedFile {
  name: RenditionName;
  format: RenditionFormat;
  width: number;
  height: number;
  data: Buffer;
}

/**
 * Encoder settings for photographs of the sky at screen sizes. Low `effort` values: measured on
 * 4K sky images, higher efforts cost 2–4× the time for files within a few per cent of the size.
 */
const ENCODE: Record<RenditionFormat, (img: Sharp, flattenOn: string) => Sharp> = {
  avif: (img) => img.avif({ quality: 55, effort: 1, chromaSubsampling: '4:2:0' }),
  webp: (img) => img.webp({ quality: 80, effort: 1 }),
  // JPEG has no transparency: flatten onto the background the rendition is shown on.
  jpeg: (img, flattenOn) => img.flatten({ background: flattenOn }).jpeg({ quality: 82, progressive: true, mozjpeg: false }),
};

interface RawImage {
  data: Buffer;
  width: number;
  height: number;
  channels: 3 | 4;
}

/** How far the shared intermediate may be shrunk: just enough for the largest rendition. */
function intermediateScale(width: number, height: number): number {
  let scale = 0;
  for (const spec of RENDITION_SPECS) {
    const s =
      spec.fit === 'cover'
        ? Math.max(spec.width / width, spec.height / height)
        : Math.min(spec.width / width, spec.height / height);
    scale = Math.max(scale, s);
  }
  return Math.min(1, scale);
}

/**
 * Decodes once: upright (EXIF orientation applied), sRGB, 8 bits per channel (CMYK and 16-bit
 * input converted), shrunk only as far as the largest rendition allows. Raw pixels carry no metadata.
 */
async function decodeIntermediate(input: string | Buffer, maxPixels: number): Promise<RawImage> {
  const source = sharp(input, { limitInputPixels: maxPixels, failOn: 'truncated', autoOrient: true });
  const meta = await source.metadata();
  const width = meta.autoOrient?.width ?? meta.width;
  const height = meta.autoOrient?.height ?? meta.height;
  const size = fitInside(width, height, {
    width: width * intermediateScale(width, height),
    height: height * intermediateScale(width, height),
  });
  const { data, info } = await source
    .resize(size.width, size.height, { fit: 'fill', kernel: 'lanczos3' })
    .toColourspace('srgb')
    .raw({ depth: 'uchar' })
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height, channels: info.channels as 3 | 4 };
}

async function renderSpec(base: RawImage, spec: RenditionSpec, focal: { x: number; y: number }): Promise<RenderedFile[]> {
  let img = sharp(base.data, { raw: { width: base.width, height: base.height, channels: base.channels } });
  let size: { width: number; height: number };
  if (spec.fit === 'cover') {
    const { region, output } = coverCrop(base.width, base.height, spec, focal);
    img = img.extract(region).resize(output.width, output.height, { fit: 'fill', kernel: 'lanczos3' });
    size = output;
  } else {
    size = fitInside(base.width, base.height, spec);
    img = img.resize(size.width, size.height, { fit: 'fill', kernel: 'lanczos3' });
  }
  // Resize once per rendition, then encode the three formats from the same pixels one after
  // another: each encoder is multi-threaded already, and running them together only adds memory.
  const { data, info } = await img.raw().toBuffer({ resolveWithObject: true });
  const pixels = () => sharp(data, { raw: { width: info.width, height: info.height, channels: info.channels } });
  const flattenOn = spec.fit === 'cover' ? '#000000' : '#ffffff';
  const files: RenderedFile[] = [];
  for (const format of RENDITION_FORMATS)
    files.push({ name: spec.name, format, ...size, data: await ENCODE[format](pixels(), flattenOn).toBuffer() });
  return files;
}

// One image at a time per process: two uploads at once queue here instead of doubling peak memory
// (the job queue runs one job per worker anyway; this also covers scripts and inline runs).
let gate: Promise<unknown> = Promise.resolve();

/**
 * Makes every rendition of an image: thumbnail and page fitted inside their box, kiosk full HD
 * and 4K cropped to 16:9 around the focal point; each in AVIF, WebP and JPEG; none enlarged; no
 * metadata in any of them (sharp writes none unless asked).
 * @param input the original file (path or bytes)
 * @param focal the subject, as fractions of the upright width and height
 * @param maxPixels the decompression-bomb limit
 */
export function renderAll(input: string | Buffer, focal: { x: number; y: number }, maxPixels: number): Promise<RenderedFile[]> {
  const run = gate.then(async () => {
    const base = await decodeIntermediate(input, maxPixels);
    const out: RenderedFile[] = [];
    for (const spec of RENDITION_SPECS) out.push(...(await renderSpec(base, spec, focal)));
    return out;
  });
  gate = run.catch(() => undefined);
  return run;
}
