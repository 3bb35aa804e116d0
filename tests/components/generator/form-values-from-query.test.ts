import { describe, expect, it } from 'vitest';
import { DEFAULT_FORM_VALUES, sheetQuery } from '@/components/generator/form-values';
import { formValuesFromPrefill, formValuesFromQuery } from '@/components/generator/form-values-from-query';

// Field ranges from the shared sheet schema (diameters 20–600 mm).

describe('formValuesFromPrefill', () => {
  it('writes the advance list as text and defaults a ring to a stationary carrier', () => {
    const values = formValuesFromPrefill({ kind: 'ring', advanceMarksDeg: [16, 18.5] });
    expect(values.advanceMarksDeg).toBe('16, 18.5');
    expect(values.carrier).toBe('stationary');
    expect(formValuesFromPrefill({ kind: 'ring', carrier: 'rotating' }).carrier).toBe('rotating');
  });
});

describe('sheetQuery and formValuesFromQuery (the form in the URL)', () => {
  it('round-trips a whole typed form, lengths in mm with the unit on screen beside them', () => {
    const typed = {
      ...DEFAULT_FORM_VALUES,
      kind: 'strip' as const,
      lengthUnit: 'in' as const,
      diameterMm: 128.397, // shown as 5.055 in (× 25.4 mm per inch, the international inch)
      stripWidthMm: 12.7,
      numbering: 'full' as const,
      rotation: 'ccw' as const,
      advanceMarksDeg: '16, 18.5',
      advanceBandDeg: [16, 20] as [number, number],
      windowCrankDeg: [320, 10] as [number, number],
      portEvents: [{ name: 'Exhaust', opensCrankDeg: 95, closesCrankDeg: 265 }],
      paper: 'Letter' as const,
      orientation: 'landscape' as const,
      title: 'Bench engine',
      note: 'Left side',
      targetAdvanceDeg: 18,
      strobeReadable: true,
    };
    const query = sheetQuery(typed);
    const params = new URLSearchParams(query);
    expect(params.get('diameterMm')).toBe('128.397');
    expect(params.get('unit')).toBe('in');
    expect(params.get('targetAdvanceDeg')).toBe('18');
    expect(params.get('strobeReadable')).toBe('true');
    const back = formValuesFromQuery(params);
    expect(back.ignored).toEqual([]);
    expect(back.values).toEqual({ ...typed, advanceMarksDeg: '16, 18.5' });
    expect(sheetQuery(back.values)).toBe(query);
  });

  it('leaves defaults and blank fields out but always names the kind, its diameter and the carrier', () => {
    expect(sheetQuery(DEFAULT_FORM_VALUES)).toBe('kind=wheel&diameterMm=120&carrier=rotating');
    expect(sheetQuery({ ...DEFAULT_FORM_VALUES, kind: 'ring' })).toBe('kind=ring&innerDiameterMm=112&outerDiameterMm=150&carrier=rotating');
    expect(sheetQuery({ ...DEFAULT_FORM_VALUES, diameterMm: Number.NaN, title: '  ' })).toBe('kind=wheel&carrier=rotating');
    // A flange ring read against the flywheel’s mark defaults to stationary; a rotating one must survive a reload.
    const ring = formValuesFromQuery(new URLSearchParams(sheetQuery({ ...DEFAULT_FORM_VALUES, kind: 'ring', carrier: 'rotating' }))).values;
    expect(ring.carrier).toBe('rotating');
  });

  it('reports a bad value in a hand-edited URL and keeps the rest', () => {
    const { values, ignored } = formValuesFromQuery(new URLSearchParams('diameterMm=9999&title=Kart'));
    expect(values.title).toBe('Kart');
    expect(values.diameterMm).toBe(DEFAULT_FORM_VALUES.diameterMm);
    expect(ignored[0]?.message).toMatch(/Diameter.*20–600 mm/);
  });
});
