import { translateShapes } from './affine';
import { shapesBox } from './bounds';
import type { Shape } from './drawing';

/** A laid-out piece of a sheet in its own mm coordinates, (0, 0) at its top-left corner. */
export type Block = { widthMm: number; heightMm: number; shapes: Shape[]; centreMm?: [number, number] };

/** Moves shapes so their inked box starts at (padMm, padMm); the block is that box plus padding. */
export function toBlock(shapes: Shape[], padMm = 0, centreMm?: [number, number]): Block {
  const box = shapesBox(shapes);
  const dx = padMm - box.minX;
  const dy = padMm - box.minY;
  const block: Block = {
    widthMm: box.maxX - box.minX + 2 * padMm,
    heightMm: box.maxY - box.minY + 2 * padMm,
    shapes: translateShapes(shapes, dx, dy),
  };
  if (centreMm) block.centreMm = [centreMm[0] + dx, centreMm[1] + dy];
  return block;
}

export function placeBlock(block: Block, xMm: number, yMm: number): Shape[] {
  return translateShapes(block.shapes, xMm, yMm);
}
