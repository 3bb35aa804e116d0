import { describe, expect, it } from 'vitest';
import { parsePathId } from '@/lib/path-id';

describe('parsePathId', () => {
  it('reads a positive whole number', () => {
    expect(parsePathId('7')).toBe(7);
    expect(parsePathId('1234567890')).toBe(1234567890);
    // Number.MAX_SAFE_INTEGER is 2^53 − 1 = 9007199254740991 (ECMA-262, Number.MAX_SAFE_INTEGER).
    expect(parsePathId('9007199254740991')).toBe(9007199254740991);
  });

  it('refuses an id a number cannot hold exactly (2^53 = 9007199254740992 and beyond)', () => {
    expect(parsePathId('9007199254740992')).toBeNull();
    expect(parsePathId('9999999999999999')).toBeNull();
  });

  it('refuses zero, signs, leading zeros, exponents, fractions and text', () => {
    for (const text of ['0', '-1', '+1', '007', '1e3', '1.5', 'abc', '', ' 7', '12345678901234567']) {
      expect(parsePathId(text), text).toBeNull();
    }
  });
});
