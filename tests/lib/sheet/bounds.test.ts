// Source under test: lib/sheet/bounds.ts (shapeBox, shapeMayShowIn: which shapes a PDF tile paints).
import { describe, expect, it } from 'vitest';
import { shapeBox, shapeMayShowIn } from '@/lib/sheet/bounds';
import { line, text } from '@/lib/sheet/shapes';

const tile = { xMm: 100, yMm: 100, widthMm: 50, heightMm: 50 };

describe('shapeBox', () => {
  it('holds a line with half its stroke either side (a 0.2 mm stroke reaches 0.1 mm past each end)', () => {
    expect(shapeBox(line(0, 0, 10, 0, 0.2))).toEqual({ minX: -0.1, minY: -0.1, maxX: 10.1, maxY: 0.1 });
  });
});

describe('shapeMayShowIn', () => {
  it('keeps a line that crosses the tile and one that only touches its edge', () => {
    expect(shapeMayShowIn(line(90, 120, 110, 120, 0.2), tile)).toBe(true);
    expect(shapeMayShowIn(line(90, 120, 99.95, 120, 0.2), tile)).toBe(true);
  });

  it('skips a line wholly outside the tile', () => {
    expect(shapeMayShowIn(line(10, 10, 20, 20, 0.2), tile)).toBe(false);
  });

  it('keeps a text of wide glyphs whose true extent reaches the tile though its estimated box stops short', () => {
    // 10 × "W" at 5 mm: estimated 10 × 0.62 × 5 = 31 mm wide; a W is about 1 em (DejaVu Sans W advance 1.0 em,
    // from memory), so the ink runs 50 mm from x = 55 and reaches x = 105, inside the tile.
    const wide = text(55, 120, 'WWWWWWWWWW', 5, { anchor: 'start' });
    expect(shapeBox(wide).maxX).toBeLessThan(100);
    expect(shapeMayShowIn(wide, tile)).toBe(true);
  });

  it('skips a text far from the tile', () => {
    expect(shapeMayShowIn(text(0, 0, '10', 3.2), tile)).toBe(false);
  });
});
