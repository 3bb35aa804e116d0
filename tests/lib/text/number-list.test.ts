import { describe, expect, it } from 'vitest';
import { parseDecimal, parseNumberList } from '@/lib/text/number-list';

// A decimal number here is digits with at most one point and a sign, a narrower form than the StrDecimalLiteral
// that Number() accepts (ECMA-262, "StringToNumber": exponents, "Infinity"; hex by StrNumericLiteral).

describe('parseDecimal / parseNumberList', () => {
  it('reads plain decimals only', () => {
    expect(parseDecimal(' 101.5 ')).toBe(101.5);
    expect(parseDecimal('.5')).toBe(0.5);
    expect(parseDecimal('')).toBeNaN();
    expect(parseDecimal('1e3')).toBeNaN();
    expect(parseDecimal('0x10')).toBeNaN();
    expect(parseDecimal('12abc')).toBeNaN();
  });

  it('splits a comma list and skips blanks', () => {
    expect(parseNumberList('16, 17,18,, 19 ,20')).toEqual([16, 17, 18, 19, 20]);
    expect(parseNumberList('')).toEqual([]);
    expect(parseNumberList('16, x')[1]).toBeNaN();
  });
});
