import { describe, expect, it } from 'vitest';
import { DIAMETER_RANGE_MM, STRIP_WIDTH_RANGE_MM, sheetRequestSchema, toFieldIssues } from '@/lib/sheet/sheet-request';
import { DEFAULT_FORM_VALUES, toSheetRequestInput, type GeneratorFormValues } from '@/components/generator/form-values';
import { generatorResolver } from '@/components/generator/generator-resolver';
import { inchRange, messageInTypedUnit } from '@/components/generator/inch-messages';

// 1 in = 25.4 mm exactly (international inch, 1959; NIST SP 811 appendix B). Ranges are the shared schema's constants.

const inches = (patch: Partial<GeneratorFormValues>): GeneratorFormValues => ({ ...DEFAULT_FORM_VALUES, lengthUnit: 'in', ...patch });

/** The schema's issues for the form values, each restated in the unit typed in. */
function messages(values: GeneratorFormValues): Record<string, string> {
  const result = sheetRequestSchema.safeParse(toSheetRequestInput(values));
  if (result.success) return {};
  const codes = result.error.issues.map((issue) => issue.code);
  return Object.fromEntries(toFieldIssues(result.error).map((issue, i) => [issue.path, messageInTypedUnit({ ...issue, code: codes[i]! }, values)]));
}

describe('inchRange', () => {
  it('rounds the schema range inwards to thousandths of an inch', () => {
    // 20 mm = 0.787401… in → 0.788; 600 mm = 23.622047… in → 23.622; 6 mm = 0.23622… in → 0.237; 40 mm = 1.574803… in → 1.574.
    expect(inchRange(DIAMETER_RANGE_MM)).toEqual({ min: 0.788, max: 23.622 });
    expect(inchRange(STRIP_WIDTH_RANGE_MM)).toEqual({ min: 0.237, max: 1.574 });
    expect(inchRange({ min: 0, max: 25.4 })).toEqual({ min: 0, max: 1 });
  });

  it('shows only ends the schema accepts once converted back to mm', () => {
    for (const range of [DIAMETER_RANGE_MM, STRIP_WIDTH_RANGE_MM]) {
      const { min, max } = inchRange(range);
      for (const typed of [min, max]) {
        expect(Object.keys(messages(inches({ kind: 'strip', diameterMm: 4, stripWidthMm: 0.5, ...(range === DIAMETER_RANGE_MM ? { diameterMm: typed } : { stripWidthMm: typed }) })))).toEqual([]);
      }
    }
  });
});

describe('messageInTypedUnit', () => {
  it('restates the range of a converted length in inches', () => {
    expect(messages(inches({ diameterMm: 30 }))).toEqual({ diameterMm: 'Diameter must be at most 23.622 in (allowed 0.788–23.622 in)' });
    expect(messages(inches({ diameterMm: 0.5 }))).toEqual({ diameterMm: 'Diameter must be at least 0.788 in (allowed 0.788–23.622 in)' });
    expect(messages(inches({ diameterMm: Number.NaN }))).toEqual({ diameterMm: 'Diameter must be a number, 0.788–23.622 in' });
    expect(messages(inches({ kind: 'strip', diameterMm: 4, stripWidthMm: 2 }))).toEqual({
      stripWidthMm: 'Strip width must be at most 1.574 in (allowed 0.237–1.574 in)',
    });
  });

  it('states the cross-field checks with the other length in inches', () => {
    expect(messages(inches({ kind: 'ring', innerDiameterMm: 6, outerDiameterMm: 5.5 }))).toEqual({
      innerDiameterMm: 'Inner diameter must be smaller than the outer diameter (5.5 in)',
    });
    expect(messages(inches({ diameterMm: 4, hubHoleMm: 4.25 }))).toEqual({
      hubHoleMm: 'Hub hole must be smaller than the disc diameter (0 to under 4 in)',
    });
  });

  it('keeps the schema (API) message in mm mode and for fields the toggle does not convert', () => {
    const mm = messages({ ...DEFAULT_FORM_VALUES, diameterMm: 700 });
    expect(mm).toEqual({ diameterMm: 'Diameter must be at most 600 mm (allowed 20–600 mm)' });
    // Paper thickness is always entered in mm, so its message stays in mm with the toggle on inches.
    expect(messages(inches({ kind: 'strip', diameterMm: 4, stripWidthMm: 0.5, paperThicknessMm: 0.9 }))).toEqual({
      paperThicknessMm: 'Paper thickness must be at most 0.5 mm (allowed 0–0.5 mm)',
    });
  });
});

describe('generatorResolver', () => {
  it('gives the form field its message in inches while the request stays in mm', async () => {
    const values = inches({ diameterMm: 30 });
    const result = await generatorResolver(values, undefined, { fields: {}, shouldUseNativeValidation: false } as never);
    expect(result.errors.diameterMm?.message).toBe('Diameter must be at most 23.622 in (allowed 0.788–23.622 in)');
    // The API, fed the same request, still answers in mm: 30 in = 762 mm.
    expect(toSheetRequestInput(values).diameterMm).toBeCloseTo(762, 9);
  });
});
