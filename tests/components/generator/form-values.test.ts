import { describe, expect, it } from 'vitest';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';
import { DEFAULT_FORM_VALUES, toSheetRequestInput } from '@/components/generator/form-values';

// Field ranges from the shared sheet schema.

describe('toSheetRequestInput', () => {
  it('sends the lengths in mm whatever unit the form shows them in', () => {
    const request = toSheetRequestInput({ ...DEFAULT_FORM_VALUES, kind: 'strip', lengthUnit: 'in', diameterMm: 101.6, stripWidthMm: 12.7 });
    expect(request).toMatchObject({ diameterMm: 101.6, stripWidthMm: 12.7, paperThicknessMm: 0.1 });
  });

  it('sends only the fields of the chosen kind', () => {
    const ring = toSheetRequestInput({ ...DEFAULT_FORM_VALUES, kind: 'ring', diameterMm: 9999 });
    expect(ring).not.toHaveProperty('diameterMm');
    expect(ring).toMatchObject({ innerDiameterMm: 112, outerDiameterMm: 150 });
    expect(sheetRequestSchema.safeParse(ring).success).toBe(true);
    const check = toSheetRequestInput({ ...DEFAULT_FORM_VALUES, kind: 'check', diameterMm: Number.NaN });
    expect(Object.keys(check).sort()).toEqual(['kind', 'orientation', 'paper', 'title']);
  });

  it('parses the advance-mark list and leaves bad entries for the schema to name', () => {
    const request = toSheetRequestInput({ ...DEFAULT_FORM_VALUES, advanceMarksDeg: '16, 18,x' });
    expect(request.advanceMarksDeg?.slice(0, 2)).toEqual([16, 18]);
    const result = sheetRequestSchema.safeParse(request);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.message).toMatch(/Advance mark must be a number, 0–60° BTDC/);
  });

  it('treats a blank window or band as none, and a half-filled one as an error', () => {
    expect(toSheetRequestInput({ ...DEFAULT_FORM_VALUES, kind: 'strip' }).windowCrankDeg).toBeUndefined();
    const half = toSheetRequestInput({ ...DEFAULT_FORM_VALUES, advanceBandDeg: [16, Number.NaN] });
    expect(sheetRequestSchema.safeParse(half).error?.issues[0]?.path).toEqual(['advanceBandDeg', 1]);
  });

  it('an empty diameter (NaN from valueAsNumber) gets the schema message naming field and range', () => {
    const result = sheetRequestSchema.safeParse(toSheetRequestInput({ ...DEFAULT_FORM_VALUES, diameterMm: Number.NaN }));
    expect(result.error?.issues[0]?.message).toBe('Diameter must be a number, 20–600 mm');
  });
});

describe('target advance and the strobe-readable option', () => {
  it('sends a blank target as none, a typed one and the option as they are, for wheels, rings and strips only', () => {
    expect(toSheetRequestInput(DEFAULT_FORM_VALUES)).not.toHaveProperty('targetAdvanceDeg');
    for (const kind of ['wheel', 'ring', 'strip'] as const)
      expect(toSheetRequestInput({ ...DEFAULT_FORM_VALUES, kind, targetAdvanceDeg: 18, strobeReadable: true })).toMatchObject({ targetAdvanceDeg: 18, strobeReadable: true });
    expect(toSheetRequestInput({ ...DEFAULT_FORM_VALUES, kind: 'scribe', strobeReadable: true })).not.toHaveProperty('strobeReadable');
  });

  it('a target past 60° gets the schema message naming the field by its label and the range', () => {
    const result = sheetRequestSchema.safeParse(toSheetRequestInput({ ...DEFAULT_FORM_VALUES, targetAdvanceDeg: 75 }));
    expect(result.error?.issues.map((issue) => [issue.path.join('.'), issue.message])).toEqual([['targetAdvanceDeg', expect.stringMatching(/^Target advance .*0–60° BTDC/)]]);
  });
});
