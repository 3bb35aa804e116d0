import { describe, expect, it } from 'vitest';
import { sheetFileName, titleSlug } from '@/lib/sheet/sheet-file-name';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';

describe('titleSlug', () => {
  it('keeps ASCII letters and digits, folds accents, turns the rest into single dashes', () => {
    expect(titleSlug('Roue Ø 102,5 — côté volant')).toBe('roue-102-5-cote-volant');
    expect(titleSlug('"; rm -rf / <script>')).toBe('rm-rf-script');
  });

  it('is empty for a title with no letters or digits, and at most 40 characters otherwise', () => {
    expect(titleSlug('°°° ---')).toBe('');
    expect(titleSlug('a'.repeat(80))).toHaveLength(40);
    expect(titleSlug('abc '.repeat(20))).not.toMatch(/-$/);
  });
});

describe('sheetFileName', () => {
  const name = (input: Record<string, unknown>) => sheetFileName(sheetRequestSchema.parse(input));

  it('names kind, diameter and title, with the format as extension', () => {
    expect(name({ kind: 'wheel', diameterMm: 82.5, title: 'Kart 1' })).toBe('rimscale-wheel-82.5mm-kart-1.pdf');
    expect(name({ kind: 'strip', diameterMm: 300, format: 'svg' })).toBe('rimscale-strip-300mm.svg');
  });

  it('uses the outer diameter for a ring and none for a check sheet', () => {
    expect(name({ kind: 'ring', innerDiameterMm: 120, outerDiameterMm: 160 })).toBe('rimscale-ring-160mm.pdf');
    expect(name({ kind: 'check', title: 'Office laser' })).toBe('rimscale-check-office-laser.pdf');
  });
});
