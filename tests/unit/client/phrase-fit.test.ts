import { describe, expect, it } from 'vitest';
import { fitPhrase } from '../../../src/features/pages/components/phrase-fit.ts';

const read = (f: ReturnType<typeof fitPhrase>) => `${f.preview.before}[${f.preview.statement}]${f.preview.after}`;

describe('fitting a statement in place of a hand-typed number', () => {
  it('a distance phrase keeps the sentence whole', () => {
    const f = fitPhrase(
      { before: 'Seen from here it lies ', text: '2.4 billion light years', after: ' away, and …' },
      'about 2.4 billion light-years',
    );
    expect(read(f)).toBe('Seen from here it lies [about 2.4 billion light-years] away, and …');
    expect(f).toMatchObject({ absorbBefore: 0, keepAfter: 0 });
  });

  it('the writer’s own "about" gives way to the phrase’s', () => {
    const f = fitPhrase(
      { before: 'it is about ', text: '5 billion light-years', after: ' away.' },
      'about 5.9 billion light-years',
    );
    expect(read(f)).toBe('it is [about 5.9 billion light-years] away.');
    expect(f.absorbBefore).toBe('about '.length);
    const fr = fitPhrase(
      { before: 'elle se trouve à environ ', text: '2 millions d’années-lumière', after: '.' },
      'environ 2,5 millions d’années-lumière',
    );
    expect(read(fr)).toBe('elle se trouve à [environ 2,5 millions d’années-lumière].');
  });

  it('"ago" typed with the number stays when the time phrase ends without it', () => {
    const f = fitPhrase(
      { before: 'Its light set out ', text: '2.5 million years ago', after: ', long before …' },
      'about 2.5 million years',
    );
    expect(read(f)).toBe('Its light set out [about 2.5 million years] ago, long before …');
    expect(f.keepAfter).toBe(' ago'.length);
  });

  it('a whole sentence is shown as it would land, so the writer sees it does not fit', () => {
    const f = fitPhrase(
      { before: 'it lies ', text: '2.4 billion light years', after: ' away.' },
      'The Andromeda Galaxy is about 2.5 million light-years away.',
    );
    expect(read(f)).toBe('it lies [The Andromeda Galaxy is about 2.5 million light-years away.] away.');
  });
});
