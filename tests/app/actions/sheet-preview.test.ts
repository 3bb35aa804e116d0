import { DOMParser } from '@xmldom/xmldom';
import { describe, expect, it } from 'vitest';
import { previewSheet } from '@/app/actions/sheet-preview';

/** The generator's live-preview server action, called as the form calls it. */

describe('previewSheet', () => {
  it('answers the untiled SVG, the warnings and the page count for a valid request', async () => {
    const result = await previewSheet({ kind: 'wheel', diameterMm: 100, advanceMarksDeg: [18] });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    // Parsed by @xmldom/xmldom: a well-formed SVG whose root is sized in millimetres (CSS absolute unit).
    const root = new DOMParser().parseFromString(result.svg, 'image/svg+xml').documentElement!;
    expect(root.tagName).toBe('svg');
    expect(root.getAttribute('width')).toMatch(/^[\d.]+mm$/);
    expect(result.svg).not.toContain('NaN');
    expect(result.pageCount).toBe(1);
    expect(result.joinPieces).toBe(false);
    expect(result.warnings.some((w) => /0\.5° graduations left out/.test(w))).toBe(true); // 0.44 mm < 0.6 mm at 100 mm
  });

  it('counts the pages of a tiled sheet and says its pieces are to be joined', async () => {
    const result = await previewSheet({ kind: 'wheel', diameterMm: 400, paper: 'A4' });
    expect(result.ok && result.pageCount).toBeGreaterThan(1);
    expect(result.ok && result.joinPieces).toBe(true);
  });

  it('does not ask to join a whole wheel whose info panel takes a page of its own', async () => {
    const result = await previewSheet({ kind: 'wheel', diameterMm: 190, paper: 'A4' });
    expect(result.ok && result.pageCount).toBe(2);
    expect(result.ok && result.joinPieces).toBe(false);
  });

  it('refuses bad input with the field named and its range, not a throw', async () => {
    const result = await previewSheet({ kind: 'wheel', diameterMm: 700, advanceMarksDeg: [61] });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.issues).toEqual(
      expect.arrayContaining([
        { path: 'diameterMm', message: expect.stringMatching(/20–600 mm/) },
        { path: 'advanceMarksDeg.0', message: expect.stringMatching(/0–60° BTDC/) },
      ]),
    );
  });

  it.each([null, 'wheel', 42, [], { kind: 'wheel', diameterMm: Number.NaN }])('refuses %j without throwing', async (input) => {
    const result = await previewSheet(input);
    expect(result.ok).toBe(false);
  });
});
