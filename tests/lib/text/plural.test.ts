import { describe, expect, it } from 'vitest';
import { countOf, countWithVerb } from '@/lib/text/plural';

describe('countOf', () => {
  it('uses the singular for exactly one and the plural otherwise (English, CLDR plural rules)', () => {
    expect(countOf(1, 'template')).toBe('1 template');
    expect(countOf(0, 'template')).toBe('0 templates');
    expect(countOf(2, 'template')).toBe('2 templates');
    expect(countOf(12_000, 'row')).toBe('12,000 rows');
    expect(countOf(2, 'match', 'matches')).toBe('2 matches');
  });

  it('makes the verb agree', () => {
    expect(countWithVerb(1, ['row', 'rows'], ['matches', 'match'])).toBe('1 row matches');
    expect(countWithVerb(3, ['row', 'rows'], ['matches', 'match'])).toBe('3 rows match');
  });
});
