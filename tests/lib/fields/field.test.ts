import { describe, expect, expectTypeOf, it } from 'vitest';
import { z } from 'zod';
import { choiceField, flagField, lengthField, listField, numberField, textField } from '@/lib/fields/builders';
import { defineFields, fieldsOf, shapeOf } from '@/lib/fields/field';

const table = defineFields({
  name: textField({ label: 'Name', minLength: 1, maxLength: 80, csvColumn: 'name', list: { column: true, sort: true, search: true } }),
  strokeMm: lengthField({ label: 'Stroke', min: 10, max: 150, csvColumn: 'stroke_mm' }).nullable().default(null),
  advanceDeg: numberField({ label: 'Static advance', min: 0, max: 60, unit: '° BTDC' }).optional(),
  rotation: choiceField({ label: 'Rotation', choices: ['cw', 'ccw'] }).default('cw'),
  archived: flagField({ label: 'Archived' }).default(false),
  marksDeg: listField({ label: 'Advance marks', unit: '° BTDC' }, z.array(z.number()).max(3)).default([]),
});
const schema = z.object(shapeOf(table));

const issues = (value: unknown) =>
  schema.safeParse(value).error?.issues.map((issue) => ({ path: issue.path.join('.'), message: issue.message }));

describe('defineFields', () => {
  it('stamps each field with its key and keeps declaration order', () => {
    expect(fieldsOf(table).map((field) => field.key)).toEqual(['name', 'strokeMm', 'advanceDeg', 'rotation', 'archived', 'marksDeg']);
  });

  it('keeps the declared facts', () => {
    expect(table.strokeMm).toMatchObject({ kind: 'length', unit: 'mm', min: 10, max: 150, required: false, csvColumn: 'stroke_mm' });
    expect(table.name).toMatchObject({ kind: 'text', required: true, maxLength: 80, list: { column: true, sort: true, search: true } });
    expect(table.rotation.choices).toEqual(['cw', 'ccw']);
  });
});

describe('shapeOf', () => {
  it('derives a schema that fills the defaults', () => {
    expect(schema.parse({ name: ' Shop engine ' })).toEqual({
      name: 'Shop engine',
      strokeMm: null,
      rotation: 'cw',
      archived: false,
      marksDeg: [],
    });
  });

  it('keeps the precise types: nullable, optional, enum values, defaults optional on input', () => {
    expectTypeOf<z.output<typeof schema>>().toEqualTypeOf<{
      name: string;
      strokeMm: number | null;
      advanceDeg?: number | undefined;
      rotation: 'cw' | 'ccw';
      archived: boolean;
      marksDeg: number[];
    }>();
    expectTypeOf<z.input<typeof schema>['rotation']>().toEqualTypeOf<'cw' | 'ccw' | undefined>();
  });

  it('names a field by its label, without its key, with the range in its unit', () => {
    expect(issues({ name: 'x', strokeMm: 9 })).toEqual([
      { path: 'strokeMm', message: 'Stroke must be at least 10 mm (allowed 10–150 mm)' },
    ]);
  });

  it('words text, choice and flag problems by label', () => {
    expect(issues({ name: '  ', rotation: 'up', archived: 'yes' })).toEqual([
      { path: 'name', message: 'Name must not be empty (1–80 characters)' },
      { path: 'rotation', message: 'Rotation must be one of: cw, ccw' },
      { path: 'archived', message: 'Archived must be true or false' },
    ]);
  });
});
