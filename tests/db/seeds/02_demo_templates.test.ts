import { describe, expect, it } from 'vitest';
import { DEMO_TEMPLATES } from '@/db/seeds/02_demo_templates';
import { EMPTY_TEMPLATE, templateSchema } from '@/lib/templates/template-schema';
import { availableSheetKinds } from '@/lib/templates/template-sheet';

describe('demo templates (db/seeds/02_demo_templates.ts)', () => {
  it('are about a dozen valid templates with distinct names', () => {
    expect(DEMO_TEMPLATES.length).toBeGreaterThanOrEqual(10);
    expect(new Set(DEMO_TEMPLATES.map((t) => t.name)).size).toBe(DEMO_TEMPLATES.length);
    for (const t of DEMO_TEMPLATES) expect(templateSchema.safeParse({ ...EMPTY_TEMPLATE, ...t }).success, t.name).toBe(true);
  });

  it('have a swept volume matching the capacity in their name within 3 % (V = π/4 · bore² · stroke)', () => {
    for (const t of DEMO_TEMPLATES) {
      const namedCc = Number(/(\d+)/.exec(t.name)![1]);
      const cc = ((Math.PI / 4) * t.boreMm! ** 2 * t.strokeMm!) / 1000;
      expect(Math.abs(cc - namedCc) / namedCc, `${t.name}: ${cc.toFixed(1)} cc`).toBeLessThan(0.03);
    }
  });

  it('use plausible figures: rims 90–200 mm, static advance 16–20° BTDC, exhaust opening 80–100° ATDC (common practice)', () => {
    for (const t of DEMO_TEMPLATES) {
      expect(t.rimDiameterMm).toBeGreaterThanOrEqual(90);
      expect(t.rimDiameterMm).toBeLessThanOrEqual(200);
      expect(t.staticAdvanceDeg).toBeGreaterThanOrEqual(16);
      expect(t.staticAdvanceDeg).toBeLessThanOrEqual(20);
      const exhaust = t.portTargets!.find((p) => p.name === 'exhaust')!;
      expect(exhaust.opensCrankDeg).toBeGreaterThanOrEqual(80);
      expect(exhaust.opensCrankDeg).toBeLessThanOrEqual(100);
      expect(availableSheetKinds({ ...EMPTY_TEMPLATE, ...t })).toContain('strip');
    }
  });
});
