import { describe, expect, it } from 'vitest';
import { shownUnitResolver } from '@/components/calculators/shown-unit-resolver';
import { pistonDropFields, pistonDropSchema } from '@/lib/engine/piston-drop-schema';

// 1 in = 25.4 mm exactly (international inch, 1959; NIST SP 811 appendix B). Inch values written out by hand.
const resolve = shownUnitResolver(pistonDropSchema, pistonDropFields);
const options = { fields: {}, shouldUseNativeValidation: false } as never;

async function messages(values: Record<string, unknown>, unit: 'mm' | 'in') {
  const result = await resolve(values as never, { unit }, options);
  return Object.fromEntries(Object.entries(result.errors).map(([key, error]) => [key, (error as { message?: string }).message]));
}

describe('shownUnitResolver', () => {
  it('restates a length field’s range in inches from the field’s own range (stroke 1–300 mm is 0.04–11.811 in)', async () => {
    // 1 mm = 0.03937… in → 0.04 rounded up to thousandths; 300 mm = 11.81102… in → 11.811 rounded down.
    expect(await messages({ strokeMm: 400, rodMm: 105, crankDeg: 10 }, 'in')).toEqual({
      strokeMm: 'Stroke must be at most 11.811 in (allowed 0.04–11.811 in)',
    });
  });

  it('keeps the schema’s (API) message in mm, and angles as they are in inches', async () => {
    expect(await messages({ strokeMm: 400, rodMm: 105, crankDeg: 10 }, 'mm')).toEqual({ strokeMm: 'Stroke must be at most 300 mm (allowed 1–300 mm)' });
    expect(await messages({ strokeMm: 54, rodMm: 105, crankDeg: 400 }, 'in')).toEqual({ crankDeg: 'Crank angle must be at most 360° (allowed 0–360°)' });
  });

  it('passes valid values through in mm', async () => {
    const result = await resolve({ strokeMm: 54, rodMm: 105, crankDeg: 10 } as never, { unit: 'in' }, options);
    expect(result.errors).toEqual({});
    expect(result.values).toEqual({ strokeMm: 54, rodMm: 105, crankDeg: 10 });
  });
});
