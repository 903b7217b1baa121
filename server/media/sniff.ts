import fsp from 'node:fs/promises';

/** Raster formats we accept, named by their content. */
export type SniffedFormat = 'jpeg' | 'png' | 'gif' | 'webp' | 'tiff' | 'avif';

/** What the first bytes of a file say it is. */
export type SniffResult = { format: SniffedFormat } | { refused: 'svg' | 'heic' | 'unknown' };

const ascii = (buf: Buffer, start: number, end: number) => buf.subarray(start, end).toString('latin1');

/**
 * Identifies a file by its first bytes (its "magic number"), never by its name or the browser's
 * MIME type. SVG and other XML is recognised so it can be refused before any parser sees it.
 * @param head at least the first 64 bytes of the file
 */
export function sniffImage(head: Buffer): SniffResult {
  if (head.length >= 3 && head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return { format: 'jpeg' };
  if (head.length >= 8 && head.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])))
    return { format: 'png' };
  if (/^GIF8[79]a/.test(ascii(head, 0, 6))) return { format: 'gif' };
  if (ascii(head, 0, 4) === 'RIFF' && ascii(head, 8, 12) === 'WEBP') return { format: 'webp' };
  if (['II*\0', 'MM\0*'].includes(ascii(head, 0, 4))) return { format: 'tiff' };
  if (ascii(head, 4, 8) === 'ftyp') {
    const brand = ascii(head, 8, 12);
    if (brand === 'avif' || brand === 'avis') return { format: 'avif' };
    if (['heic', 'heix', 'hevc', 'hevx', 'mif1', 'msf1'].includes(brand)) return { refused: 'heic' };
  }
  // Skip a byte-order mark and white space, then look for XML or an <svg> element.
  const text = head
    .toString('utf8')
    .replace(/^\uFEFF/, '')
    .trimStart()
    .slice(0, 512)
    .toLowerCase();
  if (text.startsWith('<?xml') || text.startsWith('<svg') || text.startsWith('<!doctype svg') || text.includes('<svg'))
    return { refused: 'svg' };
  return { refused: 'unknown' };
}

/** Reads the first bytes of a file and sniffs them. */
export async function sniffFile(filePath: string): Promise<SniffResult> {
  const handle = await fsp.open(filePath, 'r');
  try {
    const head = Buffer.alloc(512);
    const { bytesRead } = await handle.read(head, 0, head.length, 0);
    return sniffImage(head.subarray(0, bytesRead));
  } finally {
    await handle.close();
  }
}
