import QRCode from 'qrcode';
import type { FeedQr } from '@shared/schemas/kiosk-feed.ts';

const cache = new Map<string, FeedQr>();

/**
 * A QR code for an address, made here (no outside service), as an SVG path in module units: the
 * player draws it with its own SVG element, so the feed carries no markup. Error correction M (15 %
 * of the code may be lost: glare on a screen), common practice for printed and displayed codes.
 * @param url the absolute address the code opens
 */
export function qrFor(url: string): FeedQr {
  const known = cache.get(url);
  if (known) return known;
  const { size, data } = QRCode.create(url, { errorCorrectionLevel: 'M' }).modules;
  const runs: string[] = [];
  for (let y = 0; y < size; y += 1) {
    let x = 0;
    while (x < size) {
      if (!data[y * size + x]) {
        x += 1;
        continue;
      }
      const start = x;
      while (x < size && data[y * size + x]) x += 1;
      runs.push(`M${start} ${y}h${x - start}v1h-${x - start}z`);
    }
  }
  const qr: FeedQr = { url, size, path: runs.join('') };
  if (cache.size > 2000) cache.clear();
  cache.set(url, qr);
  return qr;
}
