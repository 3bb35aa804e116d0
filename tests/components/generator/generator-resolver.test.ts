import { describe, expect, it } from 'vitest';
import { DEFAULT_FORM_VALUES, toSheetRequestInput, type GeneratorFormValues } from '@/components/generator/form-values';
import { generatorResolver } from '@/components/generator/generator-resolver';

// 1 in = 25.4 mm exactly (international inch, 1959; NIST SP 811 appendix B). The form holds mm; inch values are written out by hand.

const inches = (patch: Partial<GeneratorFormValues>): GeneratorFormValues => ({ ...DEFAULT_FORM_VALUES, lengthUnit: 'in', ...patch });

async function messages(values: GeneratorFormValues): Promise<Record<string, string | undefined>> {
  const result = await generatorResolver(values, undefined, { fields: {}, shouldUseNativeValidation: false } as never);
  return Object.fromEntries(Object.entries(result.errors).map(([key, error]) => [key, (error as { message?: string }).message]));
}

describe('generatorResolver', () => {
  it('gives a length shown in inches its message in inches while the request stays in mm', async () => {
    // 762 mm = 30 in; 600 mm = 23.622047… in and 20 mm = 0.787401… in, rounded inwards to thousandths.
    const values = inches({ diameterMm: 762 });
    expect(await messages(values)).toEqual({ diameterMm: 'Diameter must be at most 23.622 in (allowed 0.788–23.622 in)' });
    expect(toSheetRequestInput(values).diameterMm).toBe(762);
  });

  it('states the rules across fields with the other length in inches', async () => {
    // 152.4 mm = 6 in, 139.7 mm = 5.5 in, 101.6 mm = 4 in, 107.95 mm = 4.25 in.
    expect(await messages(inches({ kind: 'ring', innerDiameterMm: 152.4, outerDiameterMm: 139.7 }))).toEqual({
      innerDiameterMm: 'Inner diameter must be smaller than the outer diameter (5.5 in)',
    });
    expect(await messages(inches({ diameterMm: 101.6, hubHoleMm: 107.95 }))).toEqual({
      hubHoleMm: 'Hub hole must be smaller than the disc diameter (0 to under 4 in)',
    });
  });

  it('names a blank length with its range in inches, never NaN', async () => {
    expect(await messages(inches({ diameterMm: Number.NaN }))).toEqual({ diameterMm: 'Diameter must be a number, 0.788–23.622 in' });
  });

  it('keeps the schema (API) message in mm, and for fields that are always in mm', async () => {
    expect(await messages({ ...DEFAULT_FORM_VALUES, diameterMm: 700 })).toEqual({ diameterMm: 'Diameter must be at most 600 mm (allowed 20–600 mm)' });
    // Paper thickness is always entered in mm, so its message stays in mm with the toggle on inches.
    expect(await messages(inches({ kind: 'strip', diameterMm: 101.6, stripWidthMm: 12.7, paperThicknessMm: 0.9 }))).toEqual({
      paperThicknessMm: 'Paper thickness must be at most 0.5 mm (allowed 0–0.5 mm)',
    });
  });

  it('accepts both ends of the range shown in inches (0.788 in = 20.0152 mm, 23.622 in = 599.9988 mm)', async () => {
    expect(await messages(inches({ diameterMm: 0.788 * 25.4 }))).toEqual({});
    expect(await messages(inches({ diameterMm: 23.622 * 25.4 }))).toEqual({});
  });
});
