import { describe, expect, it } from 'vitest';
import { diffFields } from '@/lib/fields/field-diff';

describe('diffFields', () => {
  const keys = ['name', 'strokeMm', 'marksDeg', 'notes'] as const;

  it('lists the fields the new state sets to another value, in the table’s order, old → new', () => {
    const before = { name: 'Trail 50', strokeMm: 40, marksDeg: [16, 18], notes: '' };
    const after = { notes: 'reed cage', marksDeg: [16, 18], strokeMm: 41 };
    expect(diffFields(keys, before, after)).toEqual([
      { field: 'strokeMm', from: 40, to: 41 },
      { field: 'notes', from: '', to: 'reed cage' },
    ]);
  });

  it('leaves out fields the new state does not mention, and counts missing and null as the same', () => {
    expect(diffFields(keys, { name: 'Trail 50' }, { strokeMm: null })).toEqual([]);
    expect(diffFields(keys, {}, { name: 'Trail 50' })).toEqual([{ field: 'name', from: null, to: 'Trail 50' }]);
  });
});
