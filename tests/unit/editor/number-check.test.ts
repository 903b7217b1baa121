import { describe, expect, it } from 'vitest';
import { eyeSafetyReason } from '../../../shared/editor/caution.ts';
import { checkNumbers, findNumbersInText, normaliseFlagText } from '../../../shared/editor/number-check.ts';

const found = (text: string) => findNumbersInText(text).map((m) => m.text);

describe('the hand-typed number check', () => {
  it.each([
    ['Its light left 12 billion years ago.', ['12 billion years ago']],
    ['It is 4.2 light-years away.', ['4.2 light-years']],
    ['about 2.5 million light-years', ['2.5 million light-years']],
    ['Light moves at 300,000 km/s.', ['300,000 km/s']],
    ['as bright as a trillion Suns', ['a trillion']],
    ['Sirius shines at −1.46 mag.', ['−1.46 mag']],
    ['the faintest stars are about magnitude 6', ['magnitude 6']],
    ['It is 3 times brighter than Vega.', ['3 times brighter']],
    ['The universe is 13.8 Gyr old.', ['13.8 Gyr']],
    ['It lies 16.4 Mpc away, or 1 au from us.', ['16.4 Mpc', '1 au']],
    ['there are billions of stars', ['billions']],
    ['8 light-minutes from the Sun', ['8 light-minutes']],
  ])('flags %j', (text, expected) => {
    expect(found(text)).toEqual(expected);
  });

  it.each([
    ['Messier 87 and 3C 279 are catalogue names.'],
    ['The supernova was seen in 1054.'],
    ['Our volunteer was 40 years old.'],
    ['Two years ago we opened the dome.'],
    ['Point the telescope 20 degrees above the horizon.'],
  ])('leaves %j alone', (text) => {
    expect(found(text)).toEqual([]);
  });

  it('skips numbers inside statements and gives block and offsets', () => {
    const doc = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'Intro.' }] },
        {
          type: 'paragraph',
          content: [
            { type: 'text', text: 'It is ' },
            { type: 'statementRef', attrs: { statementId: 'x' } },
            { type: 'text', text: ' and 5 billion light-years off.' },
          ],
        },
      ],
    };
    expect(checkNumbers(doc)).toEqual([
      { text: '5 billion light-years', normalised: '5 billion light-years', block: 1, from: 12, to: 33 },
    ]);
  });

  it('normalises case, spaces and dashes so a resolution covers the same words', () => {
    expect(normaliseFlagText('3  Times\u00a0Brighter')).toBe('3 times brighter');
    expect(normaliseFlagText('4.2 light–years')).toBe('4.2 light-years');
  });
});

describe('the eye-safety rule', () => {
  it('asks for the notice on pages about the Sun or that mention eclipses or solar observing', () => {
    expect(eyeSafetyReason('sun', 'Our star.')).toBe('This page is about the Sun');
    expect(eyeSafetyReason('moon', 'Watch the total eclipse tonight.')).toBe('This page mentions “eclipse”');
    expect(eyeSafetyReason('planet', 'Bring your solar filter for the transit.')).toBe('This page mentions “solar filter”');
    expect(eyeSafetyReason('star', 'Never look at the Sun through binoculars.')).toBe('This page mentions “look at the Sun”');
    expect(eyeSafetyReason('galaxy', 'A spiral galaxy in Andromeda.')).toBeNull();
  });
});
