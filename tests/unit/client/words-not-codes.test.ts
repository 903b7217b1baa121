import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { describeRendition, RENDITION_LABELS, RENDITION_NAMES } from '../../../shared/media/renditions.ts';
import { SCREEN_HEALTH, SCREEN_HEALTH_LABELS } from '../../../shared/schemas/kiosk.ts';
import { formatCalendarDate, formatDateTime, formatTimeIn } from '../../../src/lib/format-date.ts';

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return sourceFiles(full);
    return /\.(ts|tsx)$/.test(name) ? [full] : [];
  });
}
// The staff client (the kiosk player formats for its screen's language on its own).
const client = sourceFiles('src').filter((f) => !f.startsWith(path.join('src', 'kiosk')));

describe('renditions in words', () => {
  it('a 4K rendition made from a 2000 px original says it is smaller than 4K and that the screen will scale it', () => {
    // 2000 × 1125 original, cover-cropped to 16:9 and never enlarged (shared/media/renditions.ts).
    const small = describeRendition('kiosk-4k', 2000, 1125);
    expect(small.label).toBe('4K kiosk screen');
    expect(small.warning).toMatch(/^Smaller than 4K \(3840 × 2160\): .*never enlarged.*the screen will scale it up/);
    expect(describeRendition('kiosk-4k', 3840, 2160).warning).toBeNull();
    expect(describeRendition('kiosk-hd', 1920, 1080).warning).toBeNull();
    expect(describeRendition('kiosk-hd', 1600, 900).warning).toMatch(/^Smaller than HD/);
    // "inside" renditions are smaller than their box by design: no warning.
    expect(describeRendition('page', 1200, 675).warning).toBeNull();
  });

  it('every rendition and screen state has words; no code is its own label', () => {
    for (const n of RENDITION_NAMES) expect(RENDITION_LABELS[n]).not.toBe(n);
    for (const h of SCREEN_HEALTH) expect(SCREEN_HEALTH_LABELS[h]).not.toMatch(/[-_]/);
  });

  it('no screen renders a kind, status, health or action code straight into the page', () => {
    const raw = /(>|·)\s*\{[\w.?]+\.(status|kind|health|action|state|relation|renditionsStatus)\}/;
    const offenders = client.filter((f) => raw.test(readFileSync(f, 'utf8')));
    expect(offenders).toEqual([]);
  });
});

describe('one date format per locale', () => {
  it('a calendar date reads as the date part of a date and time', () => {
    // Noon UTC is the same calendar day in every time zone within ±11 h of UTC.
    expect(formatDateTime('2026-12-03T12:00:00Z').startsWith(formatCalendarDate('2026-12-03'))).toBe(true);
    expect(formatCalendarDate('2026-12-03')).toBe(
      new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' }).format(new Date('2026-12-03T12:00:00Z')),
    );
    expect(formatTimeIn('2026-12-03T17:20:00Z', 'Europe/London')).toBe(
      new Intl.DateTimeFormat(undefined, { timeStyle: 'short', timeZone: 'Europe/London' }).format(
        new Date('2026-12-03T17:20:00Z'),
      ),
    );
  });

  it('no screen formats a date itself: every one goes through src/lib/format-date.ts', () => {
    const own =
      /toLocale(Date|Time)?String\(\s*(undefined|'|")|toLocaleDateString|toLocaleTimeString|new Intl\.DateTimeFormat\((?!\)\.resolvedOptions)/;
    const offenders = client.filter((f) => !f.endsWith(path.join('lib', 'format-date.ts')) && own.test(readFileSync(f, 'utf8')));
    expect(offenders).toEqual([]);
    // ISO strings are for the API and storage, never for reading.
    const shown = client.filter((f) => /\{[^}]*toISOString\(\)[^}]*\}\s*</.test(readFileSync(f, 'utf8')));
    expect(shown).toEqual([]);
  });
});
