import { describe, expect, it } from 'vitest';
import { keepDesignationsTogether } from '../../../shared/text/designations.ts';

const NBSP = '\u00a0';

describe('keepDesignationsTogether', () => {
  it('binds the catalogue to its number', () => {
    expect(keepDesignationsTogether('3C 279 gives out light')).toBe(`3C${NBSP}279 gives out light`);
    expect(keepDesignationsTogether('The galaxy NGC 4486, also M 87.')).toBe(`The galaxy NGC${NBSP}4486, also M${NBSP}87.`);
    expect(keepDesignationsTogether('PKS 2155-304 and HD 209458')).toBe(`PKS${NBSP}2155-304 and HD${NBSP}209458`);
    expect(keepDesignationsTogether('(IC 1101)')).toBe(`(IC${NBSP}1101)`);
  });

  it('leaves ordinary words and numbers alone', () => {
    const plain = 'It lies about 600 billion light-years away, in Virgo since 2019.';
    expect(keepDesignationsTogether(plain)).toBe(plain);
    expect(keepDesignationsTogether('Andromeda Galaxy')).toBe('Andromeda Galaxy');
  });
});
