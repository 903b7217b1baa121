/**
 * Right ascension and declination as people write them: decimal degrees, or sexagesimal with
 * spaces, colons or unit marks ("05h35m17.3s", "5 35 17.3", "−05°23′28″", "-5:23:28").
 */

/** The result of reading a coordinate: degrees, or a message for a person. */
export type CoordinateReading = { ok: true; deg: number } | { ok: false; message: string };

const SEPARATORS = /[hmsd°:'′"″\s]+/gi;

function normalise(text: string): string {
  // The typographic minus (U+2212) and dashes are read as the ASCII sign.
  return text
    .trim()
    .replace(/[\u2212\u2013\u2014]/g, '-')
    .replace(/,/g, '.');
}

function sexagesimalParts(text: string): number[] | undefined {
  const parts = text.replace(/^[+-]/, '').split(SEPARATORS).filter(Boolean);
  if (parts.length < 2 || parts.length > 3 || parts.some((p) => !/^\d+(\.\d+)?$/.test(p))) return undefined;
  return parts.map(Number);
}

/**
 * Reads a right ascension. A single number is degrees (0 ≤ α < 360) unless it ends in "h";
 * two or three numbers are hours, minutes and seconds.
 * @param input what the person typed
 */
export function parseRightAscension(input: string | number): CoordinateReading {
  if (typeof input === 'number') return checkRa(input);
  const text = normalise(input);
  if (!text) return { ok: false, message: 'Enter a right ascension.' };
  if (/^\d+(\.\d+)?\s*°?$/.test(text)) return checkRa(Number(text.replace('°', '')));
  if (/^\d+(\.\d+)?\s*h$/i.test(text)) return checkRa(Number.parseFloat(text) * 15);
  if (text.startsWith('-')) return { ok: false, message: 'Right ascension cannot be negative.' };
  const parts = sexagesimalParts(text);
  if (!parts)
    return { ok: false, message: 'Write right ascension as degrees (83.82) or hours, minutes and seconds (05h 35m 17.3s).' };
  const [h, m, s = 0] = parts;
  if (m >= 60 || s >= 60) return { ok: false, message: 'Minutes and seconds must be less than 60.' };
  return checkRa((h + m / 60 + s / 3600) * 15);
}

/**
 * Reads a declination: decimal degrees or degrees, arcminutes and arcseconds, with a sign.
 * @param input what the person typed
 */
export function parseDeclination(input: string | number): CoordinateReading {
  if (typeof input === 'number') return checkDec(input);
  const text = normalise(input);
  if (!text) return { ok: false, message: 'Enter a declination.' };
  if (/^[+-]?\d+(\.\d+)?\s*°?$/.test(text)) return checkDec(Number(text.replace('°', '')));
  const parts = sexagesimalParts(text);
  if (!parts)
    return { ok: false, message: 'Write declination as degrees (−5.39) or degrees, arcminutes and arcseconds (−05° 23′ 28″).' };
  const [d, m, s = 0] = parts;
  if (m >= 60 || s >= 60) return { ok: false, message: 'Arcminutes and arcseconds must be less than 60.' };
  const sign = text.startsWith('-') ? -1 : 1;
  return checkDec(sign * (d + m / 60 + s / 3600));
}

function checkRa(deg: number): CoordinateReading {
  if (!Number.isFinite(deg) || deg < 0 || deg >= 360)
    return { ok: false, message: 'Right ascension must be from 0 up to (not including) 360° or 24h.' };
  return { ok: true, deg };
}

function checkDec(deg: number): CoordinateReading {
  if (!Number.isFinite(deg) || deg < -90 || deg > 90) return { ok: false, message: 'Declination must be between −90° and +90°.' };
  return { ok: true, deg };
}

const pad = (n: number, width: number, decimals = 0) => n.toFixed(decimals).padStart(width + (decimals ? decimals + 1 : 0), '0');

/** @returns e.g. "05h 35m 17.3s" for a right ascension in degrees */
export function formatRightAscension(deg: number): string {
  let tenths = Math.round((deg / 15) * 36000);
  tenths %= 24 * 36000;
  const h = Math.floor(tenths / 36000);
  const m = Math.floor((tenths % 36000) / 600);
  const s = (tenths % 600) / 10;
  return `${pad(h, 2)}h ${pad(m, 2)}m ${pad(s, 2, 1)}s`;
}

/** @returns e.g. "−05° 23′ 28″" for a declination in degrees (typographic minus) */
export function formatDeclination(deg: number): string {
  const sign = deg < 0 ? '−' : '+';
  const total = Math.round(Math.abs(deg) * 3600);
  const d = Math.floor(total / 3600);
  const m = Math.floor((total % 3600) / 60);
  const s = total % 60;
  return `${sign}${pad(d, 2)}° ${pad(m, 2)}′ ${pad(s, 2)}″`;
}
