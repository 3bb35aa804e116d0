import { describe, expect, it } from 'vitest';
import { rangedNumber, rangedNumberFromText } from '@/lib/fields/ranged-number';

const messageOf = (result: { success: boolean; error?: { issues: Array<{ message: string }> } }) => result.error?.issues[0]?.message;

describe('rangedNumber', () => {
  const stroke = rangedNumber({ label: 'Stroke', min: 10, max: 150, unit: 'mm' });

  it('accepts both limits and a value between', () => {
    expect([10, 54.5, 150].map((v) => stroke.safeParse(v).success)).toEqual([true, true, true]);
  });

  it('names the field by its label and gives the range in its unit when too small', () => {
    expect(messageOf(stroke.safeParse(9.99))).toBe('Stroke must be at least 10 mm (allowed 10–150 mm)');
  });

  it('says "at most" when too big', () => {
    expect(messageOf(stroke.safeParse(150.01))).toBe('Stroke must be at most 150 mm (allowed 10–150 mm)');
  });

  it('refuses NaN, text and a missing value as "must be a number", never a crash', () => {
    for (const value of [Number.NaN, '54', undefined])
      expect(messageOf(stroke.safeParse(value))).toBe('Stroke must be a number, 10–150 mm');
  });

  it('writes degree units without a space and a negative range with "to"', () => {
    const advance = rangedNumber({ label: 'Static advance', min: 0, max: 60, unit: '° BTDC' });
    expect(messageOf(advance.safeParse(61))).toBe('Static advance must be at most 60° BTDC (allowed 0–60° BTDC)');
    const offset = rangedNumber({ label: 'Wrist-pin offset', min: -5, max: 5, unit: 'mm' });
    expect(messageOf(offset.safeParse(-6))).toBe('Wrist-pin offset must be at least -5 mm (allowed -5 to 5 mm)');
  });

  it('appends the hint after the range', () => {
    const bar = rangedNumber({ label: 'Horizontal bar', min: 90, max: 110, unit: 'mm', hint: 'print at actual size' });
    expect(messageOf(bar.safeParse(80))).toBe('Horizontal bar must be at least 90 mm (allowed 90–110 mm): print at actual size');
  });

  it('writes a unitless range plainly', () => {
    const scale = rangedNumber({ label: 'Printer scale X', min: 0.9, max: 1.1, unit: '' });
    expect(messageOf(scale.safeParse(2))).toBe('Printer scale X must be at most 1.1 (allowed 0.9–1.1)');
  });

  it('asks for a whole number when the field counts, and reads text from a query string', () => {
    const pageSize = rangedNumberFromText({ label: 'Page size', min: 1, max: 100, unit: '', whole: true });
    expect(pageSize.safeParse('25')).toMatchObject({ success: true, data: 25 });
    expect(messageOf(pageSize.safeParse('2.5'))).toBe('Page size must be a whole number (allowed 1–100)');
    expect(messageOf(pageSize.safeParse('lots'))).toBe('Page size must be a whole number, 1–100');
    expect(messageOf(pageSize.safeParse('0'))).toBe('Page size must be at least 1 (allowed 1–100)');
  });

  it('writes a range with no upper limit as "or more" and checks no upper limit', () => {
    const page = rangedNumberFromText({ label: 'Page', min: 1, max: Number.POSITIVE_INFINITY, unit: '', whole: true });
    expect(page.safeParse('100000')).toMatchObject({ success: true, data: 100000 });
    expect(messageOf(page.safeParse('-3'))).toBe('Page must be at least 1 (allowed 1 or more)');
  });
});
