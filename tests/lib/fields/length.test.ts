import { describe, expect, it } from 'vitest';
import { formatLength, lengthRangeMessage, lengthText, mmToUnit, rangeInUnit, unitToMm } from '@/lib/fields/length';

// Source: 1 in = 25.4 mm exactly, the international inch of the 1959 agreement (NIST, "Refinement of
// values for the yard and the pound", Federal Register 1959). Inch values below are written out by hand.

describe('mmToUnit / unitToMm', () => {
  it('converts 25.4 mm to exactly 1 in and back', () => {
    expect(mmToUnit(25.4, 'in')).toBe(1);
    expect(unitToMm(1, 'in')).toBe(25.4);
  });

  it('converts 4 in to 101.6 mm', () => {
    expect(unitToMm(4, 'in')).toBeCloseTo(101.6, 12);
  });

  it('leaves mm as mm', () => {
    expect(mmToUnit(120, 'mm')).toBe(120);
    expect(unitToMm(120, 'mm')).toBe(120);
  });
});

describe('rangeInUnit', () => {
  it('rounds 20–600 mm inwards to 0.788–23.622 in (20 mm = 0.787401… in, 600 mm = 23.622047… in)', () => {
    expect(rangeInUnit({ min: 20, max: 600 }, 'in')).toEqual({ min: 0.788, max: 23.622 });
  });

  it('keeps a limit that is a whole number of thousandths: 25.4–50.8 mm is 1–2 in', () => {
    expect(rangeInUnit({ min: 25.4, max: 50.8 }, 'in')).toEqual({ min: 1, max: 2 });
  });

  it('keeps a range from 0 at 0 (not -0) and 6–40 mm becomes 0.237–1.574 in (0.23622…, 1.57480…)', () => {
    expect(Object.is(rangeInUnit({ min: 0, max: 600 }, 'in').min, 0)).toBe(true);
    expect(rangeInUnit({ min: 6, max: 40 }, 'in')).toEqual({ min: 0.237, max: 1.574 });
  });

  it('rounds a negative range inwards too: ±5 mm is -0.196 to 0.196 in (5 mm = 0.19685… in)', () => {
    expect(rangeInUnit({ min: -5, max: 5 }, 'in')).toEqual({ min: -0.196, max: 0.196 });
  });

  it('every inch limit converts back inside the mm range', () => {
    const { min, max } = rangeInUnit({ min: 20, max: 600 }, 'in');
    expect(unitToMm(min, 'in')).toBeGreaterThanOrEqual(20);
    expect(unitToMm(max, 'in')).toBeLessThanOrEqual(600);
  });
});

describe('lengthRangeMessage', () => {
  const diameter = { label: 'Diameter', min: 20, max: 600 };

  it('writes the message in inches from the field range', () => {
    expect(lengthRangeMessage('too_small', diameter, 'in')).toBe('Diameter must be at least 0.788 in (allowed 0.788–23.622 in)');
    expect(lengthRangeMessage('too_big', diameter, 'in')).toBe('Diameter must be at most 23.622 in (allowed 0.788–23.622 in)');
    expect(lengthRangeMessage('invalid_type', diameter, 'in')).toBe('Diameter must be a number, 0.788–23.622 in');
  });

  it('writes the same message in mm when mm is shown', () => {
    expect(lengthRangeMessage('too_small', diameter, 'mm')).toBe('Diameter must be at least 20 mm (allowed 20–600 mm)');
  });
});

describe('lengthText / formatLength', () => {
  it('shows 101.6 mm as "4" in inches and "101.6" in mm, blank for no value', () => {
    expect(lengthText(101.6, 'in')).toBe('4');
    expect(lengthText(101.6, 'mm')).toBe('101.6');
    expect(lengthText(Number.NaN, 'mm')).toBe('');
  });

  it('formats for reading with 3 places in mm and 4 in inches, in the reader’s locale', () => {
    expect(formatLength(12.7, 'mm', 'en-GB')).toBe('12.700 mm');
    expect(formatLength(12.7, 'in', 'en-GB')).toBe('0.5000 in');
    // de-DE writes a decimal comma (CLDR, through Node's Intl); 25.4 mm per inch exactly (NIST).
    expect(formatLength(12.7, 'in', 'de-DE')).toBe('0,5000 in');
  });
});
