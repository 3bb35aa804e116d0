// Source under test: lib/templates/search-words.ts.
import { describe, expect, it } from 'vitest';
import { searchWords } from '@/lib/templates/search-words';

describe('searchWords', () => {
  it('splits at spaces and hyphens or dashes, dropping blanks', () => {
    expect(searchWords('piston port')).toEqual(['piston', 'port']);
    expect(searchWords(' piston-port ')).toEqual(['piston', 'port']);
    expect(searchWords('reed – valve')).toEqual(['reed', 'valve']);
    expect(searchWords('   ')).toEqual([]);
  });

  it('keeps % and _ inside a word (the query escapes them, they are not separators)', () => {
    expect(searchWords('100% t_1')).toEqual(['100%', 't_1']);
  });
});
