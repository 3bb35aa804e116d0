import { describe, expect, it } from 'vitest';
import {
  MEASURED_BAR_RANGE_MM,
  describeScale,
  printerMeasurementSchema,
  printerProfileSchema,
  profileFromMeasurement,
  scaleFromMeasuredMm,
} from '@/lib/printer-profile';

// Source for every expected factor: the scale-check sheet's own definition (DEVELOPERS.md, "Sheets"
// and issue 3): the bars are 100 mm long, the profile holds measured ÷ true length per axis,
// and a bar under 90 or over 110 mm means the printer scaled the page to fit.

describe('scaleFromMeasuredMm', () => {
  it('turns a 98.0 mm bar into a factor of 0.98 (98 ÷ 100)', () => {
    expect(scaleFromMeasuredMm(98)).toBeCloseTo(0.98, 12);
  });

  it('gives 1 for a bar printed exactly 100 mm', () => {
    expect(scaleFromMeasuredMm(100)).toBe(1);
  });

  it('keeps half-millimetre readings: 101.5 mm → 1.015', () => {
    expect(scaleFromMeasuredMm(101.5)).toBeCloseTo(1.015, 12);
  });
});

describe('profileFromMeasurement', () => {
  it('makes X 0.98 and Y 1.00 from bars of 98.0 and 100.0 mm', () => {
    const result = profileFromMeasurement({ name: 'Office laser', measuredXMm: 98, measuredYMm: 100 });
    expect(result).toEqual({ ok: true, profile: { name: 'Office laser', printerScaleX: 0.98, printerScaleY: 1 } });
  });

  it('accepts the range limits 90 and 110 mm themselves (factors 0.9 and 1.1)', () => {
    const result = profileFromMeasurement({ name: 'Edge', measuredXMm: 90, measuredYMm: 110 });
    expect(result.ok && [result.profile.printerScaleX, result.profile.printerScaleY]).toEqual([0.9, 1.1]);
  });

  it('refuses 89.9 mm with the fit-to-page message, naming the field and range', () => {
    const result = profileFromMeasurement({ name: 'Shrinker', measuredXMm: 89.9, measuredYMm: 100 });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues).toHaveLength(1);
    expect(result.issues[0]?.path).toBe('measuredXMm');
    expect(result.issues[0]?.message).toMatch(/^Horizontal bar must be at least 90 mm/);
    expect(result.issues[0]?.message).toMatch(/90–110 mm/);
    expect(result.issues[0]?.message).toMatch(/probably scaling to fit the page/);
  });

  it('refuses a vertical bar over 110 mm with the same hint', () => {
    const result = profileFromMeasurement({ name: 'Stretcher', measuredXMm: 100, measuredYMm: 110.1 });
    expect(!result.ok && result.issues.map((i) => i.path)).toEqual(['measuredYMm']);
    expect(!result.ok && result.issues[0]?.message).toMatch(/^Vertical bar must be at most 110 mm.*probably scaling to fit the page/);
  });

  it('refuses NaN, text and a blank name with messages instead of throwing', () => {
    const result = profileFromMeasurement({ name: '   ', measuredXMm: Number.NaN, measuredYMm: '100' });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    const paths = result.issues.map((i) => i.path).sort();
    expect(paths).toEqual(['measuredXMm', 'measuredYMm', 'name']);
    expect(result.issues.find((i) => i.path === 'measuredXMm')?.message).toMatch(/must be a number, 90–110 mm/);
  });

  it('refuses a body that is not an object', () => {
    expect(profileFromMeasurement(null).ok).toBe(false);
    expect(profileFromMeasurement('98').ok).toBe(false);
  });
});

describe('schemas', () => {
  it('the measurement range is 90–110 mm', () => {
    expect(MEASURED_BAR_RANGE_MM).toEqual({ min: 90, max: 110 });
    expect(printerMeasurementSchema.safeParse({ name: 'a', measuredXMm: 110, measuredYMm: 90 }).success).toBe(true);
  });

  it('a stored profile with a factor outside 0.9–1.1 is refused', () => {
    const base = { id: 'p1', name: 'Laser', printerScaleX: 0.98, printerScaleY: 1, createdAt: '2026-12-01T00:00:00Z' };
    expect(printerProfileSchema.safeParse(base).success).toBe(true);
    expect(printerProfileSchema.safeParse({ ...base, printerScaleX: 0.5 }).success).toBe(false);
  });

  it('describes a profile with three decimals per axis', () => {
    expect(describeScale({ printerScaleX: 0.98, printerScaleY: 1 })).toBe('X 0.980 · Y 1.000');
  });
});
