import { IDENTITY_MAP, mapShapes, thenTranslate, type AxisMap } from './affine';
import { shapesBox } from './bounds';
import type { Shape } from './drawing';

/**
 * A laid-out piece of a sheet in its own mm coordinates, (0, 0) at its top-left corner. Its
 * shapes stay as drawn, each part with the map (printer correction, placement) still to apply,
 * so a sheet's shapes are copied once, when the page layout finally places them.
 */
export type BlockPart = { shapes: readonly Shape[]; map: AxisMap };
export type Block = { widthMm: number; heightMm: number; parts: BlockPart[]; centreMm?: [number, number] };

/** Maps shapes by `map`, then shifts them so their inked box starts at (padMm, padMm). */
export function toBlock(shapes: readonly Shape[], padMm = 0, centreMm?: [number, number], map: AxisMap = IDENTITY_MAP): Block {
  const box = shapesBox(shapes, map);
  const dx = padMm - box.minX;
  const dy = padMm - box.minY;
  const block: Block = { widthMm: box.maxX - box.minX + 2 * padMm, heightMm: box.maxY - box.minY + 2 * padMm, parts: [{ shapes, map: thenTranslate(map, dx, dy) }] };
  if (centreMm) block.centreMm = [map.scaleX * centreMm[0] + map.dxMm + dx, map.scaleY * centreMm[1] + map.dyMm + dy];
  return block;
}

/** The block's parts moved to (xMm, yMm), still unapplied: for nesting a block inside another. */
export function nestBlock(block: Block, xMm: number, yMm: number): BlockPart[] {
  return block.parts.map((part) => ({ shapes: part.shapes, map: thenTranslate(part.map, xMm, yMm) }));
}

/** The block's shapes, mapped and placed at (xMm, yMm). */
export function placeBlock(block: Block, xMm: number, yMm: number, into: Shape[] = []): Shape[] {
  for (const part of block.parts) mapShapes(part.shapes, thenTranslate(part.map, xMm, yMm), into);
  return into;
}
