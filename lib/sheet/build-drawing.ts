import { DEFAULT_DATE_FORMAT, formatDate, type DateFormat } from '../format/date-format';
import { assertFiniteDrawing } from './assert-finite';
import { checkBlockShapes } from './check-block';
import { nestBlock, toBlock, type Block } from './block';
import type { Drawing, GraduationLevel, Shape } from './drawing';
import { infoPanel, type InfoContent } from './info-panel';
import { BLOCK_GAP_MM, fitsPage, printableMm, stackedPageCount, stackOnPages, tileOversized, type PageSpec, type PagedDrawing } from './page-layout';
import { addPageBands, bandWidthMm, pageBandHeightMm } from './page-band';
import { DEFAULT_MARGIN_MM, MIN_MARGIN_MM, pageSizeMm } from './paper';
import { correctionFactors } from './printer-correction';
import { sheetRequestSchema, type SheetRequest } from './sheet-request';
import { sheetTitle, titleBlockLines } from './sheet-notes';
import { ringLayout, wheelLayout } from './wheel-layout';
import { scribeLayout } from './scribe-chart';
import { stripLayout } from './strip-layout';
import { formatDeg } from './scale-marks';
import { howToSteps } from './how-to';

/** `date` is printed in the title block in `dateFormat` (the reader's locale and time zone; DEVELOPERS.md, "Dates"), and the title block's lengths in its locale ("Numbers"). */
export type BuildOptions = { date?: Date; dateFormat?: DateFormat; marginMm?: number };

/** One scale piece (wheel, ring, strip rows, table chunks) plus what the title block should say about it. */
export type ScaleLayout = { blocks: Block[]; keptLevels?: GraduationLevel[]; stripLengthMm?: number; warnings: string[]; infoFirst: boolean; howToOnPiece?: boolean; strobeSummary?: string };

/** Pre-scales by the printer correction (before any placing or tiling) and frames the result. */
function correctedBlock(shapes: readonly Shape[], req: SheetRequest, padMm: number, centreMm?: [number, number]): Block {
  const { x, y } = correctionFactors(req);
  return toBlock(shapes, padMm, centreMm, { scaleX: x, scaleY: y, dxMm: 0, dyMm: 0 });
}

function scaleLayout(req: SheetRequest, page: PageSpec, infoHeightMm: number): ScaleLayout {
  const printable = printableMm(page);
  switch (req.kind) {
    case 'wheel':
    case 'ring': {
      const polar = req.kind === 'wheel' ? wheelLayout(req) : ringLayout(req);
      return {
        blocks: [correctedBlock(polar.shapes, req, 0.5, polar.centreMm)],
        keptLevels: polar.keptLevels,
        warnings: polar.warnings,
        infoFirst: false,
        howToOnPiece: polar.howToOnPiece,
        ...(polar.strobeSummary ? { strobeSummary: polar.strobeSummary } : {}),
      };
    }
    case 'strip': {
      const strip = stripLayout(req, printable);
      return {
        blocks: strip.rows.map((row) => correctedBlock(row, req, 0.5)),
        keptLevels: strip.keptLevels,
        stripLengthMm: strip.stripLengthMm,
        warnings: strip.warnings,
        infoFirst: true,
        ...(strip.strobeSummary ? { strobeSummary: strip.strobeSummary } : {}),
      };
    }
    case 'scribe': {
      // Heights in true mm: the chunks are pre-scaled by 1/printerScaleY afterwards.
      const sy = req.printerScaleY;
      const chunks = scribeLayout(req, (printable.heightMm - infoHeightMm - BLOCK_GAP_MM) * sy - 1, printable.heightMm * sy - 1);
      return { blocks: chunks.map((chunk) => correctedBlock(chunk, req, 0.5)), warnings: [], infoFirst: true };
    }
    case 'check':
      return { blocks: [], warnings: [], infoFirst: true };
  }
}

function infoBlock(content: InfoContent, req: SheetRequest, correctedWidthMm: number): Block {
  // Pre-scaling moves text but keeps its size, so when x shrinks (scale > 1) text can reach as far
  // as its true width: lay out at min(1, scale) × the room, less half a millimetre for edge strokes.
  const panel = infoPanel(content, (correctedWidthMm - 0.5) * Math.min(1, req.printerScaleX));
  return correctedBlock(panel, req, 0);
}

/** How the pieces go on pages, decided from their sizes; `place` then copies the shapes (the costly part). */
type Arrangement = { multiPage: boolean; place: () => PagedDrawing };

function stacked(blocks: Block[], page: PageSpec): Arrangement {
  return { multiPage: stackedPageCount(blocks, page) > 1, place: () => stackOnPages(blocks, page) };
}

/**
 * The info panel laid out at a width, each width once (a banded page arranges the same panels again),
 * and the narrowest any panel can be: every panel holds the scale check unmoved across
 * (info-panel.ts), so none is narrower than the check block alone, pre-scaled the same way.
 */
type InfoAt = ((correctedWidthMm: number) => Block) & { narrowestMm: () => number };

function infoByWidth(content: InfoContent, req: SheetRequest): InfoAt {
  const made = new Map<number, Block>();
  let narrowestMm: number | undefined;
  const infoAt = (widthMm: number) => {
    let block = made.get(widthMm);
    if (!block) made.set(widthMm, (block = infoBlock(content, req, widthMm)));
    return block;
  };
  return Object.assign(infoAt, { narrowestMm: () => (narrowestMm ??= correctedBlock(checkBlockShapes().shapes, req, 0).widthMm) });
}

function arrange(page: PageSpec, layout: ScaleLayout, infoAt: InfoAt): Arrangement {
  const printable = printableMm(page);
  const fullInfo = infoAt(printable.widthMm);
  if (layout.infoFirst) return stacked([fullInfo, ...layout.blocks], page);
  const scale = layout.blocks[0]!;
  const besideWidth = printable.widthMm - scale.widthMm - BLOCK_GAP_MM;
  // A panel that cannot fit beside (narrower than the scale check) is not laid out to find that out.
  if (besideWidth > 0 && scale.heightMm <= printable.heightMm && infoAt.narrowestMm() <= besideWidth + 1e-6) {
    const side = infoAt(besideWidth);
    if (side.widthMm <= besideWidth + 1e-6 && side.heightMm <= printable.heightMm) {
      const gap = (printable.widthMm - scale.widthMm - side.widthMm) / 2;
      const combined: Block = {
        widthMm: printable.widthMm,
        heightMm: Math.max(scale.heightMm, side.heightMm),
        parts: [...nestBlock(scale, 0, 0), ...nestBlock(side, scale.widthMm + gap, 0)],
        ...(scale.centreMm ? { centreMm: scale.centreMm } : {}),
      };
      return stacked([combined], page);
    }
  }
  if (fitsPage({ widthMm: Math.max(scale.widthMm, fullInfo.widthMm), heightMm: scale.heightMm + BLOCK_GAP_MM + fullInfo.heightMm }, page))
    return stacked([scale, fullInfo], page);
  // The wheel is what the user came for: it takes page 1, the info page follows.
  if (fitsPage(scale, page)) return stacked([scale, fullInfo], page);
  return { multiPage: true, place: () => tileOversized(fullInfo, scale, page) };
}

/**
 * Marks drawn without a label, named: a mark is labelled when a label with its advance angle
 * (advance) or crank angle (port) exists. Strips repeat marks in overlaps, so names are counted once.
 */
export function labelWarnings(shapes: readonly Shape[]): string[] {
  const labelled = new Set<string>();
  const marks = new Map<string, string>();
  for (const shape of shapes) {
    const data = shape.data;
    if (!data?.role) continue;
    const key = data.role.startsWith('advance') ? `a${data.advanceDeg}` : `p${data.crankDeg}`;
    if (data.role === 'advance-label' || data.role === 'port-label') labelled.add(key);
    else if (data.role === 'advance' && data.advanceDeg !== undefined) marks.set(key, data.advanceDeg === 0 ? 'TDC' : `${formatDeg(data.advanceDeg)}° BTDC`);
    else if (data.role === 'port' && data.crankDeg !== undefined) marks.set(key, `port event at crank ${formatDeg(data.crankDeg)}°`);
  }
  const bare = [...marks].filter(([key]) => !labelled.has(key)).map(([, name]) => name);
  return bare.length ? [`${bare.length} of ${marks.size} advance/port marks are drawn without a label (too close to their neighbours for the label text): ${bare.join(', ')}`] : [];
}

/**
 * The whole sheet for a request: geometry, pages and warnings. Pure; same input, same drawing.
 * The request is checked against the shared schema once more (callers normally have already),
 * so a bad one fails with the schema's field messages rather than drawing nonsense.
 */
export function buildDrawing(input: SheetRequest, options: BuildOptions = {}): Drawing {
  const asked = sheetRequestSchema.parse(input);
  let chosen = planSheet(asked, options);
  let orientationNote: string[] = [];
  if (chosen.plain.multiPage) {
    // A sheet that fits one page the other way round is laid out that way, and says so.
    const turned: SheetRequest = { ...asked, orientation: asked.orientation === 'portrait' ? 'landscape' : 'portrait' };
    const other = planSheet(turned, options);
    if (!other.plain.multiPage) {
      chosen = other;
      orientationNote = [`Laid out on ${asked.paper} ${turned.orientation}: it fits one page that way, not ${asked.orientation}`];
    }
  }
  const { request, page, title, infoAt, infoHeightMm, plain } = chosen;
  let { layout } = chosen;
  let paged: PagedDrawing;
  if (!plain.multiPage) paged = plain.place();
  else {
    // Several pages: each gets a band (title, page N of M, print line, check bar), so arrange in what it leaves.
    const banded: PageSpec = { ...page, bandMm: pageBandHeightMm(bandWidthMm(page, request), title) };
    if (request.kind === 'scribe') layout = scaleLayout(request, banded, infoHeightMm);
    paged = addPageBands(arrange(banded, layout, infoAt).place(), banded, title, request);
  }
  const warnings = [...orientationNote, ...layout.warnings, ...labelWarnings(paged.shapes), ...paged.warnings];
  const drawing: Drawing = { sizeMm: paged.sizeMm, shapes: paged.shapes, pages: paged.pages, warnings, title };
  if (paged.centreMm) drawing.centreMm = paged.centreMm;
  return assertFiniteDrawing(drawing);
}

/** The graduation levels left out are said in the title block's own line; the notes keep the rest. */
function sheetNotes(layout: ScaleLayout): string[] {
  const shapes = layout.blocks.flatMap((block) => block.parts.flatMap((part) => part.shapes));
  return [...layout.warnings.filter((w) => !/graduations left out/.test(w)), ...labelWarnings(shapes)];
}

/** Pieces, info panel and their arrangement on one orientation, before anything is placed. */
function planSheet(request: SheetRequest, options: BuildOptions) {
  const page: PageSpec = { sizeMm: pageSizeMm(request.paper, request.orientation), marginMm: Math.max(options.marginMm ?? DEFAULT_MARGIN_MM, MIN_MARGIN_MM) };
  const dateFormat = options.dateFormat ?? DEFAULT_DATE_FORMAT;
  const title = sheetTitle(request, dateFormat.locale);
  const contentFor = (layout?: ScaleLayout): InfoContent => ({
    title,
    request,
    notes: layout ? sheetNotes(layout) : [],
    howTo: layout?.howToOnPiece ? [] : howToSteps(request),
    lines: titleBlockLines(request, {
      date: formatDate(options.date ?? new Date(), dateFormat),
      locale: dateFormat.locale,
      ...(layout?.keptLevels ? { keptLevels: layout.keptLevels } : {}),
      ...(layout?.stripLengthMm !== undefined ? { stripLengthMm: layout.stripLengthMm } : {}),
      ...(layout?.strobeSummary ? { strobeSummary: layout.strobeSummary } : {}),
    }),
  });
  // The scribe chart's first page holds what the info panel leaves; its lines do not depend on the table.
  const infoHeightMm = request.kind === 'scribe' ? infoBlock(contentFor(), request, printableMm(page).widthMm).heightMm : 0;
  const layout = scaleLayout(request, page, infoHeightMm);
  const infoAt = infoByWidth(contentFor(layout), request);
  return { request, page, title, layout, infoAt, infoHeightMm, plain: arrange(page, layout, infoAt) };
}
