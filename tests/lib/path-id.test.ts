import { describe, expect, it } from 'vitest';
import { parsePathId } from '@/lib/path-id';

describe('parsePathId', () => {
  it('reads a positive whole number', () => {
    expect(parsePathId('7')).toBe(7);
    expect(parsePathId('1234567890')).toBe(1234567890);
  });

  it('refuses zero, signs, leading zeros, exponents, fractions and text', () => {
    for (const text of ['0', '-1', '+1', '007', '1e3', '1.5', 'abc', '', ' 7', '12345678901234567']) {
      expect(parsePathId(text), text).toBeNull();
    }
  });
});
