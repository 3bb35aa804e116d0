// Source under test: lib/sheet/join-pieces.ts (whether the sheet says "join the pieces").
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { needsJoining } from '@/lib/sheet/join-pieces';
import { req } from './svg-measure';

describe('needsJoining', () => {
  it('is false for a wheel that fits one sheet, even when its info panel takes a second page', () => {
    expect(needsJoining(buildDrawing(req({ kind: 'wheel', diameterMm: 120 })))).toBe(false);
    // 190 mm leaves no room for the panel on A4 (210 × 297 mm, ISO 216): two pages, one whole wheel.
    const big = buildDrawing(req({ kind: 'wheel', diameterMm: 190 }));
    expect(big.pages.length).toBeGreaterThan(1);
    expect(needsJoining(big)).toBe(false);
  });

  it('is true for a wheel wider than the paper, which is tiled with registration crosses', () => {
    // 400 mm is wider than A4 and A4 landscape (ISO 216), so the wheel must be cut into tiles.
    expect(needsJoining(buildDrawing(req({ kind: 'wheel', diameterMm: 400 })))).toBe(true);
  });

  it('is true for a rim strip longer than the page, cut into lettered segments with join marks', () => {
    // π × 200 mm ≈ 628 mm of strip cannot lie on one 297 mm A4 page (ISO 216).
    expect(needsJoining(buildDrawing(req({ kind: 'strip', diameterMm: 200 })))).toBe(true);
  });
});
