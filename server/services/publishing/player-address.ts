import QRCode from 'qrcode';
import { appBaseUrl } from '../../config.ts';

/** A QR code as SVG path data: dark modules on a square grid `size` modules wide, quiet zone included. */
export interface QrPath {
  size: number;
  path: string;
}

/** Four modules of light margin around the code, as the QR standard asks, so phone cameras find its edges. */
const QUIET_ZONE = 4;

/**
 * The kiosk player's address (absolute, from PUBLIC_URL) and a QR code of it, made here, offline.
 * The code goes to the client as path data, drawn as an SVG path: no markup crosses, no service is asked.
 */
export function playerAddress(): { url: string; qr: QrPath } {
  const url = `${appBaseUrl().replace(/\/+$/, '')}/kiosk`;
  const { modules } = QRCode.create(url, { errorCorrectionLevel: 'M' });
  const parts: string[] = [];
  for (let y = 0; y < modules.size; y += 1)
    for (let x = 0; x < modules.size; x += 1) if (modules.get(x, y)) parts.push(`M${x + QUIET_ZONE} ${y + QUIET_ZONE}h1v1h-1z`);
  return { url, qr: { size: modules.size + 2 * QUIET_ZONE, path: parts.join('') } };
}
