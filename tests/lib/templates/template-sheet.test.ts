import { describe, expect, it } from 'vitest';
import { prefillFromSearchParams } from '@/lib/generator-prefill';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';
import { generatorHref } from '@/lib/templates/generator-href';
import { availableSheetKinds, templateSheetRequest } from '@/lib/templates/template-sheet';
import { EMPTY_TEMPLATE } from '@/lib/templates/template-schema';

const base = {
  ...EMPTY_TEMPLATE,
  name: 'Invented 125 scooter',
  description: 'piston-port, fan-cooled',
  rotation: 'ccw' as const,
  rimDiameterMm: 128,
  faceDiameterMm: 120,
  flangeDiameterMm: 150,
  hubHoleMm: 24,
  staticAdvanceDeg: 17,
  portTargets: [{ name: 'exhaust', opensCrankDeg: 94, closesCrankDeg: 266 }],
};

describe('availableSheetKinds', () => {
  it('offers a wheel for a face diameter, a ring for rim + flange, a strip for a rim', () => {
    expect(availableSheetKinds(base)).toEqual(['wheel', 'ring', 'strip']);
    expect(availableSheetKinds({ ...base, faceDiameterMm: null })).toEqual(['ring', 'strip']);
    expect(availableSheetKinds({ ...base, flangeDiameterMm: null, faceDiameterMm: null })).toEqual(['strip']);
    expect(availableSheetKinds({ ...base, rimDiameterMm: null })).toEqual(['wheel']);
    expect(availableSheetKinds({ ...base, rimDiameterMm: null, faceDiameterMm: null })).toEqual([]);
  });
});

describe('templateSheetRequest', () => {
  it('builds a wheel on the face diameter with the hub hole, rotating carrier', () => {
    const request = templateSheetRequest(base, 'wheel')!;
    expect(request).toMatchObject({ kind: 'wheel', diameterMm: 120, hubHoleMm: 24, carrier: 'rotating', rotation: 'ccw', title: base.name });
    expect(sheetRequestSchema.safeParse(request).success).toBe(true);
  });

  it('builds a stationary ring from rim + clearance to the flange diameter', () => {
    const request = templateSheetRequest(base, 'ring')!;
    // Rim 128 mm + 1 mm clearance (common practice: the ring must clear the flywheel by about 1–2 mm) = 129 mm.
    expect(request).toMatchObject({ kind: 'ring', innerDiameterMm: 129, outerDiameterMm: 150, carrier: 'stationary' });
    expect(sheetRequestSchema.safeParse(request).success).toBe(true);
  });

  it('builds a strip on the rim diameter; uses the static advance as the only mark when none are listed', () => {
    const request = templateSheetRequest(base, 'strip')!;
    expect(request).toMatchObject({ kind: 'strip', diameterMm: 128, advanceMarksDeg: [17], carrier: 'rotating' });
    expect(templateSheetRequest({ ...base, advanceMarksDeg: [16, 18] }, 'strip')!.advanceMarksDeg).toEqual([16, 18]);
    expect(sheetRequestSchema.safeParse(request).success).toBe(true);
  });

  it('answers null for a kind the template lacks the diameters for', () => {
    expect(templateSheetRequest({ ...base, faceDiameterMm: null }, 'wheel')).toBeNull();
  });
});

describe('generatorHref', () => {
  it('links to the generator with the fields it prefills, read back by lib/generator-prefill', () => {
    const request = templateSheetRequest({ ...base, advanceMarksDeg: [16, 17.5] }, 'strip')!;
    const href = generatorHref(request);
    expect(href.startsWith('/?kind=strip&diameterMm=128&')).toBe(true);
    const params = new URL(href, 'http://x').searchParams;
    expect(params.get('advanceMarksDeg')).toBe('16,17.5');
    expect(JSON.parse(params.get('portEvents')!)).toEqual(base.portTargets);
    // The generator's own reader (helper "ui") takes every value without complaint.
    const prefill = prefillFromSearchParams(params);
    expect(prefill.ignored).toEqual([]);
    expect(prefill.values).toMatchObject({
      kind: 'strip',
      diameterMm: 128,
      rotation: 'ccw',
      carrier: 'rotating',
      advanceMarksDeg: [16, 17.5],
      portEvents: base.portTargets,
      title: base.name,
      note: base.description,
    });
  });

  it('leaves out empty lists and a zero hub hole', () => {
    const href = generatorHref({ kind: 'wheel', diameterMm: 100, hubHoleMm: 0, advanceMarksDeg: [], portEvents: [], title: '' });
    expect(href).toBe('/?kind=wheel&diameterMm=100');
  });
});
