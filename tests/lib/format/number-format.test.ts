import { describe, expect, it } from 'vitest';
import { countOf, countWithVerb, formatCount, formatDecimal, formatDeg, formatMm } from '@/lib/format/number-format';

// Expected separators are CLDR's, as Node's Intl (full ICU) carries them: en-GB and en-US write a decimal point and
// group thousands with a comma, de-DE writes a decimal comma and groups with a full stop, fr-FR a decimal comma and a
// narrow no-break space (U+202F) between thousands (CLDR number symbols, from memory of the CLDR charts).

describe('formatDecimal', () => {
  it('writes the decimal sign of the reader’s locale', () => {
    expect(formatDecimal(2.5, 'en-GB', { places: 2 })).toBe('2.50');
    expect(formatDecimal(2.5, 'de-DE', { places: 2 })).toBe('2,50');
    expect(formatDecimal(2.5, 'fr-FR', { maxPlaces: 2 })).toBe('2,5');
  });

  it('never groups a measurement, so a length cannot be misread as a smaller one with decimals', () => {
    expect(formatDecimal(1885.25, 'en-GB', { maxPlaces: 2 })).toBe('1885.25');
    expect(formatDecimal(1885.25, 'de-DE', { maxPlaces: 2 })).toBe('1885,25');
  });

  it('drops trailing zeros up to maxPlaces, rounds half away from zero for positives, and shows no minus zero', () => {
    expect(formatDecimal(120, 'en-GB', { maxPlaces: 2 })).toBe('120');
    expect(formatDecimal(0.125, 'en-GB', { maxPlaces: 2 })).toBe('0.13');
    expect(formatDecimal(-0.001, 'en-GB', { places: 2 })).toBe('0.00');
  });

  it('writes nothing for a value that is not a number, never "NaN"', () => {
    expect(formatDecimal(Number.NaN, 'en-GB', { places: 1 })).toBe('');
  });
});

describe('formatMm and formatDeg', () => {
  it('add their unit: millimetres after a space, degrees without one', () => {
    expect(formatMm(120.5, 'de-DE')).toBe('120,5 mm');
    expect(formatMm(12.7, 'en-GB', { places: 3 })).toBe('12.700 mm');
    expect(formatDeg(18, 'en-GB')).toBe('18.0°');
    expect(formatDeg(-3.25, 'de-DE', { places: 2 })).toBe('-3,25°');
  });
});

describe('counts and plurals', () => {
  it('groups a count in the reader’s locale', () => {
    expect(formatCount(12000, 'en-GB')).toBe('12,000');
    expect(formatCount(12000, 'de-DE')).toBe('12.000');
    expect(formatCount(12000, 'fr-FR')).toBe('12\u202f000');
  });

  it('chooses the English singular for exactly one (CLDR plural rules for English: one is 1 only)', () => {
    expect(countOf(1, 'template', 'en-GB')).toBe('1 template');
    expect(countOf(0, 'template', 'en-GB')).toBe('0 templates');
    expect(countOf(12000, 'row', 'de-DE')).toBe('12.000 rows');
    expect(countOf(2, 'match', 'en-GB', 'matches')).toBe('2 matches');
    // French rules would call 0 "one"; the words are English, so English rules choose their form.
    expect(countOf(0, 'template', 'fr-FR')).toBe('0 templates');
  });

  it('makes the verb agree', () => {
    expect(countWithVerb(1, ['row', 'rows'], ['matches', 'match'], 'en-GB')).toBe('1 row matches');
    expect(countWithVerb(3, ['row', 'rows'], ['matches', 'match'], 'en-GB')).toBe('3 rows match');
  });
});
