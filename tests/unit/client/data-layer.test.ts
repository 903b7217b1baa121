import { describe, expect, it } from 'vitest';
import { catalogueKeys } from '../../../src/api/catalogue-objects.ts';
import { mediaKeys, mediaQueryOptions } from '../../../src/api/media.ts';
import { pageConflictOf, pageKeys } from '../../../src/api/pages.ts';
import { venueKeys } from '../../../src/api/venues.ts';
import { ApiRequestError, errorFromAnswer } from '../../../src/lib/api-client.ts';
import { formatDateTime, formatTime } from '../../../src/lib/format-date.ts';
import { queryString } from '../../../src/lib/query-string.ts';
import { pickRendition } from '../../../src/lib/renditions.ts';

const serverVersion = {
  version: 7,
  title: 'Vega (demo)',
  doc: { type: 'doc', content: [] },
  revisionNumber: 4,
  savedBy: 'Demo Writer',
  savedAt: '2026-12-03T10:00:00.000Z',
};

describe('query strings', () => {
  it('leaves out empty filters and encodes the rest', () => {
    expect(queryString({ q: 'M 31 & co', page: 2, kind: undefined, status: '', missing: null })).toBe('?q=M+31+%26+co&page=2');
    expect(queryString({ q: '', page: undefined })).toBe('');
    expect(queryString({ preferred: false })).toBe('?preferred=false');
  });
});

describe('one rendition rule for an <img>', () => {
  const r = (name: string, format: string) => ({ name, format, url: `/${name}.${format}` });
  it('takes WebP, then JPEG, then AVIF, of the size asked for', () => {
    expect(pickRendition([r('page', 'avif'), r('page', 'jpeg'), r('page', 'webp')], 'page')?.url).toBe('/page.webp');
    expect(pickRendition([r('page', 'avif'), r('page', 'jpeg'), r('thumbnail', 'webp')], 'page')?.url).toBe('/page.jpeg');
    expect(pickRendition([r('page', 'avif')], 'page')?.url).toBe('/page.avif');
  });
  it('answers null when that size is not made yet', () => {
    expect(pickRendition([r('thumbnail', 'webp')], 'page')).toBeNull();
    expect(pickRendition(undefined, 'page')).toBeNull();
  });
});

describe('one date format', () => {
  it('writes an API time and a Date the same way, to the minute', () => {
    const iso = '2026-12-03T10:15:42.000Z';
    const expected = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' }).format(new Date(iso));
    expect(formatDateTime(iso)).toBe(expected);
    expect(formatDateTime(new Date(iso))).toBe(expected);
    expect(formatTime(iso)).toBe(new Intl.DateTimeFormat(undefined, { timeStyle: 'short' }).format(new Date(iso)));
  });
});

describe('the 409 of a save', () => {
  it('carries the server version inside the error, read back typed', () => {
    const error = errorFromAnswer(409, { error: { code: 'page_changed', message: 'Saved meanwhile.', current: serverVersion } });
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.current).toEqual(serverVersion);
    expect(pageConflictOf(error)).toEqual(serverVersion);
  });
  it('is not a page conflict when the code, the status or the version is something else', () => {
    const answer = (status: number, code: string, current?: unknown) =>
      errorFromAnswer(status, { error: { code, message: 'No.', current } });
    expect(pageConflictOf(answer(409, 'page_state', serverVersion))).toBeNull();
    expect(pageConflictOf(answer(400, 'page_changed', serverVersion))).toBeNull();
    expect(pageConflictOf(answer(409, 'page_changed'))).toBeNull();
    expect(pageConflictOf(answer(409, 'page_changed', { version: 'seven' }))).toBeNull();
    expect(pageConflictOf(new Error('offline'))).toBeNull();
  });
  it('keeps the standard fallbacks for an answer without the error shape', () => {
    const error = errorFromAnswer(502, undefined);
    expect([error.code, error.message, error.current]).toEqual(['http_error', 'The server answered 502.', undefined]);
  });
});

/** True when a query with key `key` is refreshed by invalidating `prefix` (TanStack matches by prefix). */
const under = (key: readonly unknown[], prefix: readonly unknown[]) => prefix.every((part, i) => key[i] === part);

describe('query keys', () => {
  it('cache one image under one key, whichever screen asks', () => {
    expect(mediaQueryOptions('m1').queryKey).toEqual(mediaKeys.detail('m1'));
    expect(under(mediaKeys.detail('m1'), mediaKeys.lists())).toBe(false);
    expect(under(mediaKeys.list({ q: 'vega' }), mediaKeys.lists())).toBe(true);
  });
  it('hang a venue’s screens and sky under the venue, and not under another', () => {
    expect(under(venueKeys.screens('v1'), venueKeys.detail('v1'))).toBe(true);
    expect(under(venueKeys.sky('v1', '2026-12-03'), venueKeys.detail('v1'))).toBe(true);
    expect(under(venueKeys.screens('v2'), venueKeys.detail('v1'))).toBe(false);
    expect(under(venueKeys.choices(), venueKeys.all)).toBe(true);
  });
  it('hang an object’s measurements and history under the object, and every list under the catalogue', () => {
    expect(under(catalogueKeys.measurements('o1'), catalogueKeys.object('o1'))).toBe(true);
    expect(under(catalogueKeys.history('o1'), catalogueKeys.object('o1'))).toBe(true);
    expect(under(catalogueKeys.objectList({ q: 'vega', pageSize: 20 }), catalogueKeys.objectLists())).toBe(true);
    expect(under(catalogueKeys.sources(), catalogueKeys.all)).toBe(true);
  });
  it('keep every page query under pages', () => {
    for (const key of [pageKeys.detail('p1'), pageKeys.list({}), pageKeys.comments('p1'), pageKeys.diff('p1', 1, 2)])
      expect(under(key, pageKeys.all)).toBe(true);
  });
});
