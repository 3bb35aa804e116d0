import { describe, expect, it } from 'vitest';
import { toFieldIssues } from '@/lib/sheet/sheet-request';
import { diffTemplateFields, creationChanges } from '@/lib/templates/revision-diff';
import { sniffPhotoType } from '@/lib/templates/photo-type';
import { EMPTY_TEMPLATE, templatePatchSchema, templateSchema } from '@/lib/templates/template-schema';

describe('templateSchema', () => {
  it('fills defaults for a name-only template', () => {
    expect(templateSchema.parse({ name: '  Bench single ' })).toEqual({ ...EMPTY_TEMPLATE, name: 'Bench single' });
  });

  it('names each bad field and its allowed range', () => {
    const result = templateSchema.safeParse({ name: 'x', strokeMm: 5, staticAdvanceDeg: 75, advanceMarksDeg: [18, -1], portTargets: [{ name: 'a;b', opensCrankDeg: 90, closesCrankDeg: 400 }] });
    expect(result.success).toBe(false);
    const issues = toFieldIssues(result.error!);
    expect(issues).toEqual(
      expect.arrayContaining([
        { path: 'strokeMm', message: 'Stroke must be at least 10 mm (allowed 10–150 mm)' },
        { path: 'staticAdvanceDeg', message: 'Static advance must be at most 60° BTDC (allowed 0–60° BTDC)' },
        { path: 'advanceMarksDeg.1', message: expect.stringMatching(/at least 0° BTDC/) },
        { path: 'portTargets.0.closesCrankDeg', message: expect.stringMatching(/at most 360°/) },
      ]),
    );
  });

  it('refuses NaN and text where a number belongs, never storing NaN', () => {
    expect(templateSchema.safeParse({ name: 'x', boreMm: Number.NaN }).success).toBe(false);
    expect(templateSchema.safeParse({ name: 'x', boreMm: '40' }).success).toBe(false);
  });

  it('needs a flange larger than the rim plus clearance', () => {
    const result = templateSchema.safeParse({ name: 'x', rimDiameterMm: 120, flangeDiameterMm: 120.5 });
    expect(toFieldIssues(result.error!)).toEqual([{ path: 'flangeDiameterMm', message: expect.stringMatching(/over 121 mm/) }]);
  });

  it('patch needs a whole version and takes null to clear a measurement', () => {
    expect(templatePatchSchema.safeParse({ version: 1.5 }).success).toBe(false);
    expect(templatePatchSchema.parse({ version: 3, boreMm: null })).toEqual({ version: 3, boreMm: null });
  });
});

describe('diffTemplateFields', () => {
  it('lists changed fields only, old → new, comparing lists by value', () => {
    const before = { ...EMPTY_TEMPLATE, name: 'A', advanceMarksDeg: [16, 18] };
    expect(diffTemplateFields(before, { ...before, advanceMarksDeg: [16, 18] })).toEqual([]);
    expect(diffTemplateFields(before, { ...before, name: 'B', boreMm: 40 })).toEqual([
      { field: 'name', from: 'A', to: 'B' },
      { field: 'boreMm', from: null, to: 40 },
    ]);
  });

  it('records a creation as the fields that were set', () => {
    expect(creationChanges({ ...EMPTY_TEMPLATE, name: 'A', boreMm: 40 })).toEqual([
      { field: 'name', from: null, to: 'A' },
      { field: 'boreMm', from: null, to: 40 },
      { field: 'rotation', from: null, to: 'cw' },
    ]);
  });
});

describe('sniffPhotoType', () => {
  it('tells JPEG, PNG and WebP by their signatures and nothing else', () => {
    expect(sniffPhotoType(new Uint8Array([0xff, 0xd8, 0xff, 0xe0]))).toBe('image/jpeg');
    expect(sniffPhotoType(new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0]))).toBe('image/png');
    expect(sniffPhotoType(Buffer.from('RIFF\x10\x00\x00\x00WEBPVP8 ', 'latin1'))).toBe('image/webp');
    expect(sniffPhotoType(Buffer.from('RIFF\x10\x00\x00\x00WAVEfmt ', 'latin1'))).toBeNull();
    expect(sniffPhotoType(Buffer.from('GIF89a'))).toBeNull();
    expect(sniffPhotoType(new Uint8Array([]))).toBeNull();
  });
});
