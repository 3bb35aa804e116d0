import { placeBlock, type Block } from './block';
import type { PageLayout, Shape, Size } from './drawing';
import { circle, line, text } from './shapes';
import { STROKE_MM, TEXT_MM } from './sheet-style';

/**
 * Puts blocks on pages. Two ways, both expressed through Drawing.pages:
 * - stackOnPages: blocks flow top to bottom into page-sized regions stacked down the drawing;
 *   page i's viewport is region i, placed at the page's top-left corner (origin [0, 0]).
 * - tileOversized: the oversized block (a big wheel or ring) is covered by a grid of overlapping
 *   viewports, one page each, with registration crosses drawn in the overlaps and a tile label
 *   in each page's top band; the info panel's region (drawn above the block) is the last page.
 * A page may reserve `bandMm` at the top of its printable area for the page band (page-band.ts).
 */

export type PageSpec = { sizeMm: Size; marginMm: number; bandMm?: number };
/** `tileNames[i]` names page i when it is a tile of an oversized block ('A1', 'B2', …). */
export type PagedDrawing = { sizeMm: Size; shapes: Shape[]; pages: PageLayout[]; centreMm?: [number, number]; warnings: string[]; tileNames?: Array<string | undefined> };

export const BLOCK_GAP_MM = 5;
export const TILE_LABEL_BAND_MM = 7;
export const TILE_OVERLAP_MM = 12;
const EPS = 1e-6;

/** The room for content: the page less its margins and less the page band, if it has one. */
export function printableMm(page: PageSpec): Size {
  return { widthMm: page.sizeMm.widthMm - 2 * page.marginMm, heightMm: page.sizeMm.heightMm - 2 * page.marginMm - (page.bandMm ?? 0) };
}

/** Where content starts below the page's top edge. */
export function contentTopMm(page: PageSpec): number {
  return page.marginMm + (page.bandMm ?? 0);
}

export function fitsPage(block: Pick<Block, 'widthMm' | 'heightMm'>, page: PageSpec): boolean {
  const printable = printableMm(page);
  return block.widthMm <= printable.widthMm + EPS && block.heightMm <= printable.heightMm + EPS;
}

function wholePage(page: PageSpec, regionTopMm: number): PageLayout {
  return {
    sizeMm: { ...page.sizeMm },
    viewportMm: { xMm: 0, yMm: regionTopMm, widthMm: page.sizeMm.widthMm, heightMm: page.sizeMm.heightMm },
    originMm: [0, 0],
    pageShapes: [],
  };
}

/** How many pages stackOnPages would fill, from the heights alone (nothing placed). */
export function stackedPageCount(blocks: readonly Pick<Block, 'heightMm'>[], page: PageSpec): number {
  const printable = printableMm(page);
  let pages = 1;
  let cursor = 0;
  for (const block of blocks) {
    if (cursor > 0 && cursor + block.heightMm > printable.heightMm + EPS) {
      pages += 1;
      cursor = 0;
    }
    cursor += block.heightMm + BLOCK_GAP_MM;
  }
  return pages;
}

/** Blocks in order, each centred across the printable width; a block that does not fit below the last starts a new page. */
export function stackOnPages(blocks: readonly Block[], page: PageSpec): PagedDrawing {
  const printable = printableMm(page);
  const shapes: Shape[] = [];
  let region = 0;
  let cursor = 0;
  let centreMm: [number, number] | undefined;
  for (const block of blocks) {
    if (cursor > 0 && cursor + block.heightMm > printable.heightMm + EPS) {
      region += 1;
      cursor = 0;
    }
    const x = page.marginMm + Math.max(0, (printable.widthMm - block.widthMm) / 2);
    const y = region * page.sizeMm.heightMm + contentTopMm(page) + cursor;
    placeBlock(block, x, y, shapes);
    if (block.centreMm && !centreMm) centreMm = [block.centreMm[0] + x, block.centreMm[1] + y];
    cursor += block.heightMm + BLOCK_GAP_MM;
  }
  const pages = Array.from({ length: region + 1 }, (_, i) => wholePage(page, i * page.sizeMm.heightMm));
  const drawing: PagedDrawing = { sizeMm: { widthMm: page.sizeMm.widthMm, heightMm: (region + 1) * page.sizeMm.heightMm }, shapes, pages, warnings: [] };
  if (centreMm) drawing.centreMm = centreMm;
  return drawing;
}

/** Evenly spread windows of `windowMm` over `totalMm`, each overlap at least `overlapMm`. */
export function tileStarts(totalMm: number, windowMm: number, overlapMm: number): number[] {
  if (totalMm <= windowMm + EPS) return [0];
  const count = Math.ceil((totalMm - overlapMm) / (windowMm - overlapMm) - EPS);
  const step = (totalMm - windowMm) / (count - 1);
  return Array.from({ length: count }, (_, i) => i * step);
}

export function registrationCross(xMm: number, yMm: number): Shape[] {
  const data = { role: 'registration' };
  return [line(xMm - 3, yMm, xMm + 3, yMm, STROKE_MM.fine, data), line(xMm, yMm - 3, xMm, yMm + 3, STROKE_MM.fine, data), circle(xMm, yMm, 1.5, STROKE_MM.fine, data)];
}

const ROW_LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ';

export function tileOversized(info: Block, big: Block, page: PageSpec): PagedDrawing {
  const printable = printableMm(page);
  const window = { widthMm: printable.widthMm, heightMm: printable.heightMm - TILE_LABEL_BAND_MM };
  const bx = page.marginMm;
  const by = page.sizeMm.heightMm + page.marginMm;
  const top = contentTopMm(page);
  const shapes: Shape[] = placeBlock(big, bx, by, placeBlock(info, page.marginMm, top));
  const xs = tileStarts(big.widthMm, window.widthMm, TILE_OVERLAP_MM);
  const ys = tileStarts(big.heightMm, window.heightMm, TILE_OVERLAP_MM);
  const viewWidth = Math.min(window.widthMm, big.widthMm);
  const viewHeight = Math.min(window.heightMm, big.heightMm);
  // Crosses in every overlap, once per neighbouring row or column: in its middle and near both of
  // the tile's corners, so neighbours line up along the whole seam, not only near the centre.
  const along = (start: number, length: number) => (length > 40 ? [start + 8, start + length / 2, start + length - 8] : [start + length / 2]);
  for (let i = 0; i + 1 < xs.length; i += 1) {
    const xc = bx + (xs[i + 1]! + xs[i]! + viewWidth) / 2;
    for (const y of ys) for (const yc of along(by + y, viewHeight)) shapes.push(...registrationCross(xc, yc));
  }
  for (let j = 0; j + 1 < ys.length; j += 1) {
    const yc = by + (ys[j + 1]! + ys[j]! + viewHeight) / 2;
    for (const x of xs) for (const xc of along(bx + x, viewWidth)) shapes.push(...registrationCross(xc, yc));
  }
  const pages: PageLayout[] = [];
  const tileNames: Array<string | undefined> = [];
  ys.forEach((y, row) =>
    xs.forEach((x, column) => {
      const name = `${ROW_LETTERS[row % 26]}${column + 1}`;
      tileNames.push(name);
      pages.push({
        sizeMm: { ...page.sizeMm },
        viewportMm: { xMm: bx + x, yMm: by + y, widthMm: viewWidth, heightMm: viewHeight },
        originMm: [page.marginMm, top + TILE_LABEL_BAND_MM],
        pageShapes: [
          text(page.marginMm, top + TEXT_MM.body + 0.5, `Tile ${name} (row ${ROW_LETTERS[row % 26]} of ${ys.length}, column ${column + 1} of ${xs.length}): overlap the neighbours so the registration crosses coincide, then tape. Print at 100 %.`, TEXT_MM.small, {
            data: { role: 'tile-label' },
          }),
        ],
      });
    }),
  );
  // The wheel is what the user came for: its tiles come first, the info page after them.
  pages.push(wholePage(page, 0));
  tileNames.push(undefined);
  const drawing: PagedDrawing = {
    sizeMm: { widthMm: Math.max(page.sizeMm.widthMm, big.widthMm + 2 * page.marginMm), heightMm: by + big.heightMm + page.marginMm },
    shapes,
    pages,
    tileNames,
    warnings: [`The sheet is larger than one ${'page'}: it is split into ${xs.length * ys.length} tiles (${ys.length} × ${xs.length}), followed by an info page`],
  };
  if (big.centreMm) drawing.centreMm = [big.centreMm[0] + bx, big.centreMm[1] + by];
  return drawing;
}
