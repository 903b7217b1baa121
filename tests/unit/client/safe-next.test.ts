import { describe, expect, it } from 'vitest';
import { safeNext } from '../../../src/lib/safe-next.ts';

// Issue 15, point 14: the page after sign-in is always on this site, and no `next` value throws.
describe('safeNext', () => {
  it('keeps paths on this site, with their query and fragment', () => {
    expect(safeNext('/pages/42?tab=review#c3')).toBe('/pages/42?tab=review#c3');
    expect(safeNext('/catalogue')).toBe('/catalogue');
  });

  it('sends everything that leaves the site, or cannot be read, to the dashboard', () => {
    for (const hostile of [
      '/\\evil.example',
      '/\\/evil.example',
      '//evil.example',
      '/%5Cevil.example'.replace('%5C', '\\'),
      'https://evil.example/',
      'javascript:alert(1)',
      '/\t/evil.example',
      '',
      null,
    ])
      expect(safeNext(hostile), String(hostile)).toBe('/');
  });
});
