import { normalizeDeg } from '../angle';
import type { GraduationLevel, Shape, ShapeData, Size } from './drawing';
import { chooseLevels, levelOfHalfDegIndex } from './graduations';
import { freeLabelSpot, MIN_STRIP_LABEL_MM, stripMarkLabels, type InkBox, type StripMark, type Zone } from './strip-labels';
import { formatDeg, numberStrideFor, portAngleWords, scaleMarks, type AlongInterval, type ScaleMarks } from './scale-marks';
import {
  chooseStrobeFit,
  coarsenForStrobe,
  pitchLimitedSizeMm,
  placeStrobe,
  roomOf,
  strobeHalfWidthMm,
  strobeNumeralWidthMm,
  strobeRangeBtdcDeg,
  strobeSummary,
  strobeZoneMm,
  STROBE_NUMERAL_MM,
  STROBE_PAD_MM,
  type PlacedStrobe,
  type StrobeChoice,
  type StrobeFit,
} from './strobe';
import { alongRotationDeg, crankFromAlongDeg, stripXMm } from './scale-direction';
import type { SheetRequest } from './sheet-request';
import { arrow, line, path, rect, text } from './shapes';
import { STROKE_MM, TEXT_MM, textWidthMm } from './sheet-style';

/**
 * Rim strips: the scale laid flat (the linear transform). Length π·(D + t) so the marks sit
 * on the paper's mid-plane; +x runs along the printed arrow, the way the rim moves. A strip
 * longer than the page is cut into lettered segments, each a separate placed copy of its part
 * of the one strip: its marked length plus an overlap whose ticks repeat the next segment's
 * first ticks (same crank angles, so they coincide when laid over each other).
 */

export const STRIP_OVERLAP_MM = 10;
export const GLUE_TAIL_MM = 15;
export const STRIP_LABEL_BAND_MM = 5;

export type StripSegment = {
  letter: string;
  startAlongDeg: number;
  markedMm: number;
  /** Overlap (ticks repeated from the next segment) or the glue tail on the last one. */
  extensionMm: number;
  extension: 'overlap' | 'tail' | 'none';
};

export type StripPlan = {
  stripLengthMm: number;
  mmPerDeg: number;
  window: boolean;
  startAlongDeg: number;
  markedMm: number;
  segments: StripSegment[];
};

export type StripLayout = { rows: Shape[][]; keptLevels: GraduationLevel[]; stripLengthMm: number; warnings: string[]; plan: StripPlan; strobeSummary?: string };

const LETTERS = 'ABCDEFGHIJKLMNOPQRSTUVWXYZ';

/** The crank span of a window [from, to], crank order from → to through 0; equal (or all but equal) ends mean a whole turn. */
export function windowSpanDeg([fromDeg, toDeg]: readonly [number, number]): number {
  const span = normalizeDeg(toDeg - fromDeg);
  return span < 1e-6 || span > 360 - 1e-6 ? 360 : span;
}

/** Where the strip starts along the rotation, and how many degrees it covers. */
export function stripRange(req: Pick<SheetRequest, 'carrier' | 'seamCrankDeg' | 'windowCrankDeg'>): { startAlongDeg: number; spanDeg: number } {
  if (!req.windowCrankDeg) return { startAlongDeg: normalizeDeg(alongRotationDeg(req.seamCrankDeg, req.carrier)), spanDeg: 360 };
  const spanDeg = windowSpanDeg(req.windowCrankDeg);
  // The strip starts at whichever window end comes first along the arrow.
  const fromAlong = normalizeDeg(alongRotationDeg(req.windowCrankDeg[0], req.carrier));
  const toAlong = normalizeDeg(alongRotationDeg(req.windowCrankDeg[1], req.carrier));
  const forwards = spanDeg === 360 || Math.abs(normalizeDeg(toAlong - fromAlong) - spanDeg) < 1e-6;
  return { startAlongDeg: forwards ? fromAlong : toAlong, spanDeg };
}

/** Splits the strip into the fewest equal segments that fit `rowLengthMm` with their overlap or tail. */
export function planStrip(req: SheetRequest, rowLengthMm: number): StripPlan {
  const stripLengthMm = Math.PI * ((req.diameterMm ?? 0) + req.paperThicknessMm);
  const mmPerDeg = stripLengthMm / 360;
  const { startAlongDeg, spanDeg } = stripRange(req);
  const window = req.windowCrankDeg !== undefined;
  const markedMm = spanDeg * mmPerDeg;
  const endMm = window ? 0 : GLUE_TAIL_MM;
  const single = markedMm + endMm <= rowLengthMm;
  const count = single ? 1 : Math.min(26, Math.ceil(markedMm / Math.max(1, rowLengthMm - Math.max(endMm, STRIP_OVERLAP_MM))));
  const segmentMm = markedMm / count;
  const segments: StripSegment[] = Array.from({ length: count }, (_, i) => {
    const last = i === count - 1;
    return {
      letter: LETTERS[i]!,
      startAlongDeg: startAlongDeg + (i * segmentMm) / mmPerDeg,
      markedMm: segmentMm,
      extensionMm: last ? endMm : STRIP_OVERLAP_MM,
      extension: last ? (window ? 'none' : 'tail') : 'overlap',
    };
  });
  return { stripLengthMm, mmPerDeg, window, startAlongDeg, markedMm, segments };
}

type StripDepths = { tick: Record<GraduationLevel, number>; numeralSize: number; numeralBaseline: number; bandTop: number };

export function stripDepths(widthMm: number): StripDepths {
  // A narrow strip gives its ticks and numerals less, so the label zone below them stays usable.
  const long = widthMm < 10 ? 0.3 * widthMm : Math.min(0.35 * widthMm, 6);
  const numeralSize = widthMm < 10 ? 0.2 * widthMm : Math.min(3, 0.22 * widthMm);
  const numeralBaseline = long + 0.5 + numeralSize * 0.8;
  return { tick: { 10: long, 5: long * 0.75, 1: long * 0.5, 0.5: long * 0.33 }, numeralSize, numeralBaseline, bandTop: numeralBaseline + numeralSize * 0.25 + 0.3 };
}

function segmentRange(plan: StripPlan, segment: StripSegment): AlongInterval {
  const overlapMm = segment.extension === 'overlap' ? segment.extensionMm : 0;
  return { fromAlongDeg: segment.startAlongDeg, toAlongDeg: segment.startAlongDeg + (segment.markedMm + overlapMm) / plan.mmPerDeg };
}

function numberClearDegFor(req: SheetRequest, plan: StripPlan): number {
  return Math.max(1.5, (textWidthMm('180', stripDepths(req.stripWidthMm).numeralSize) / 2 + 0.4) / plan.mmPerDeg);
}

function segmentMarks(req: SheetRequest, plan: StripPlan, segment: StripSegment, finestLevel: GraduationLevel, stride: number): ScaleMarks {
  return scaleMarks({
    range: segmentRange(plan, segment),
    carrier: req.carrier,
    numbering: req.numbering,
    finestLevel,
    numberStride: stride,
    advanceMarksDeg: req.advanceMarksDeg,
    ...(req.targetAdvanceDeg !== undefined ? { targetAdvanceDeg: req.targetAdvanceDeg } : {}),
    ...(req.advanceBandDeg ? { advanceBandDeg: req.advanceBandDeg } : {}),
    portEvents: req.portEvents,
    numberClearDeg: numberClearDegFor(req, plan),
  });
}

/** Room left under the strobe figures for the mark labels, mm. */
const STRIP_LABEL_ROOM_MM = 3;

/** The strobe figures' zone: from just below the long ticks, `zoneMm` deep. */
function strobeZoneTopMm(depths: StripDepths): number {
  return depths.tick[10] + 0.3;
}

/** The strobe figures a strip can hold: full size where its width and the rim's pitch allow, else the largest, said (strobe.ts). */
function stripStrobeChoice(req: SheetRequest, plan: StripPlan): StrobeChoice {
  if (!req.strobeReadable) return { warnings: [] };
  const w = req.stripWidthMm;
  const zoneTop = strobeZoneTopMm(stripDepths(w));
  const roomMm = w - zoneTop - 0.3 - STRIP_LABEL_ROOM_MM;
  return chooseStrobeFit(strobeRangeBtdcDeg(req), req.numbering, (stepDeg, orientation, numerals) => {
    const perSizeZone = strobeZoneMm(numerals, orientation, 1) - strobeZoneMm(numerals, orientation, 0);
    const neededMm = zoneTop + strobeZoneMm(numerals, orientation, STROBE_NUMERAL_MM) + 0.3 + STRIP_LABEL_ROOM_MM;
    const pitchMm = plan.mmPerDeg * stepDeg;
    return roomOf(
      (roomMm - strobeZoneMm(numerals, orientation, 0)) / perSizeZone,
      `the strip is only ${formatDeg(w)} mm wide, and full-size figures need ${neededMm.toFixed(1)} mm`,
      pitchLimitedSizeMm(numerals, orientation, pitchMm),
      `${stepDeg}° is only ${pitchMm.toFixed(1)} mm along this strip`,
    );
  });
}

/** A window that holds none of the figures gets none, keeps its fine graduations, and says so. */
function strobeOnStrip(choice: StrobeChoice, req: SheetRequest, plan: StripPlan): StrobeChoice {
  const { fit } = choice;
  if (!fit || plan.segments.some((segment) => placeStrobe(fit, segmentRange(plan, segment), req.carrier).numerals.length > 0)) return choice;
  const [first, last] = [fit.numerals[0]!.advanceDeg, fit.numerals[fit.numerals.length - 1]!.advanceDeg];
  return { warnings: [...choice.warnings, `Strobe-readable figures not drawn: ${formatDeg(first)}–${formatDeg(last)}° BTDC lies outside the window`] };
}

/**
 * The strobe figures on one strip segment: a heavy long tick on each, a white ground over their
 * stretch, and the figures on it, upright or (across) reading upwards, all inside the segment.
 */
function stripStrobeShapes(fit: StrobeFit, placed: PlacedStrobe, x: (a: number) => number, top: number, depths: StripDepths, limitMm: number, tag: (d: ShapeData) => ShapeData): Shape[] {
  const size = fit.sizeMm;
  const zoneTop = top + strobeZoneTopMm(depths);
  const zoneMm = strobeZoneMm(fit.numerals, fit.orientation, size);
  const half = strobeHalfWidthMm(fit.numerals, fit.orientation, size);
  const shapes: Shape[] = [];
  for (const n of placed.numerals) {
    if (x(n.alongDeg) > limitMm + 1e-6) continue;
    shapes.push(line(x(n.alongDeg), top, x(n.alongDeg), top + depths.tick[10], STROKE_MM.heavy, tag({ role: 'strobe-tick', crankDeg: n.crankDeg, level: levelOfHalfDegIndex(Math.round(n.crankDeg * 2) % 720) })));
  }
  for (const interval of placed.intervals) {
    const x0 = Math.max(0.2, x(interval.fromAlongDeg) - half);
    const x1 = Math.min(limitMm - 0.2, x(interval.toAlongDeg) + half);
    if (x1 > x0) shapes.push(rect(x0, zoneTop, x1 - x0, zoneMm, STROKE_MM.fine, 'white', tag({ role: 'strobe-band' })));
  }
  for (const n of placed.numerals) {
    const xMm = x(n.alongDeg);
    if (xMm > limitMm + 1e-6) continue;
    const data = tag({ role: 'strobe-numeral', crankDeg: n.crankDeg });
    if (fit.orientation === 'along') {
      const inside = keepInside(xMm, strobeNumeralWidthMm(n.label, size), limitMm);
      if (!inside) continue;
      const [nx, anchor] = inside;
      shapes.push(text(nx, zoneTop + STROBE_PAD_MM + 0.75 * size, n.label, size, { anchor, weight: 'bold', font: 'figures', data }));
    } else {
      // Reading upwards (rotated −90°): the box runs 0.75 × size left of the baseline and 0.2 right of it.
      const centre = Math.min(Math.max(xMm, 0.3 + 0.475 * size), limitMm - 0.3 - 0.475 * size);
      shapes.push(text(centre + 0.275 * size, zoneTop + zoneMm / 2, n.label, size, { anchor: 'middle', rotateDeg: -90, weight: 'bold', font: 'figures', data }));
    }
  }
  return shapes;
}

function stripRow(req: SheetRequest, plan: StripPlan, segment: StripSegment, index: number, finestLevel: GraduationLevel, stride: number, strobeFit?: StrobeFit): Shape[] {
  const w = req.stripWidthMm;
  const top = STRIP_LABEL_BAND_MM;
  const plainDepths = stripDepths(w);
  // The strobe figures' zone pushes the band and the labels below it.
  const depths = strobeFit ? { ...plainDepths, bandTop: Math.max(plainDepths.bandTop, strobeZoneTopMm(plainDepths) + strobeZoneMm(strobeFit.numerals, strobeFit.orientation, strobeFit.sizeMm) + 0.3) } : plainDepths;
  const many = plan.segments.length > 1;
  const tag = (data: ShapeData): ShapeData => (many ? { ...data, segment: segment.letter } : data);
  const x = (alongDeg: number) => stripXMm(alongDeg, segment.startAlongDeg, plan.mmPerDeg);
  const placed = strobeFit ? placeStrobe(strobeFit, segmentRange(plan, segment), req.carrier) : undefined;
  const plainMarks = segmentMarks(req, plan, segment, finestLevel, stride);
  const marks = placed ? coarsenForStrobe(plainMarks, placed, numberClearDegFor(req, plan), false) : plainMarks;
  const rowLength = segment.markedMm + segment.extensionMm;
  const shapes: Shape[] = [];
  const last = index === plan.segments.length - 1;

  for (const band of marks.bands)
    shapes.push(rect(x(band.fromAlongDeg), top + depths.bandTop, (band.toAlongDeg - band.fromAlongDeg) * plan.mmPerDeg, w - depths.bandTop, STROKE_MM.fine, 'hatch', tag({ role: 'advance-band' })));
  shapes.push(rect(0, top, rowLength, w, STROKE_MM.outline, 'none', tag({ role: 'cut-line' })));

  const startRole = index > 0 ? 'segment-start' : plan.window ? 'window-end' : 'seam';
  const startData: ShapeData = { role: startRole };
  if (index === 0) startData.crankDeg = crankFromAlongDeg(segment.startAlongDeg, req.carrier);
  shapes.push(line(0, top, 0, top + w, STROKE_MM.heavy, tag(startData)));
  if (!last) {
    // The join line breaks round the numeral row, so it never runs through a numeral at the join.
    const rowTop = top + depths.numeralBaseline - 0.8 * depths.numeralSize - 0.3;
    const rowBottom = top + depths.numeralBaseline + 0.25 * depths.numeralSize + 0.3;
    shapes.push(line(segment.markedMm, top - 1.5, segment.markedMm, rowTop, STROKE_MM.outline, tag({ role: 'join' }), 0.8));
    // …and round the strobe figures' ground when it reaches the join.
    const strobeAtJoin = strobeFit && placed && placed.intervals.some((i) => x(i.fromAlongDeg) - strobeHalfWidthMm(strobeFit.numerals, strobeFit.orientation, strobeFit.sizeMm) <= segment.markedMm && x(i.toAlongDeg) + strobeHalfWidthMm(strobeFit.numerals, strobeFit.orientation, strobeFit.sizeMm) >= segment.markedMm);
    shapes.push(line(segment.markedMm, strobeAtJoin ? top + depths.bandTop : rowBottom, segment.markedMm, top + w + 1.5, STROKE_MM.outline, tag({ role: 'join' }), 0.8));
  }
  else {
    const endAlong = segment.startAlongDeg + segment.markedMm / plan.mmPerDeg;
    shapes.push(line(segment.markedMm, top, segment.markedMm, top + w, STROKE_MM.heavy, tag({ role: plan.window ? 'window-end' : 'seam', crankDeg: crankFromAlongDeg(endAlong, req.carrier) })));
  }

  for (const tick of marks.ticks)
    shapes.push(line(x(tick.alongDeg), top, x(tick.alongDeg), top + depths.tick[tick.level], tick.level >= 5 ? STROKE_MM.outline : STROKE_MM.tick, tag({ crankDeg: tick.crankDeg, level: tick.level })));
  for (const number of marks.numbers) {
    // The glue tail is unmarked (its own words sit there); an overlap repeats the next segment's numerals.
    const inside = keepInside(x(number.alongDeg), textWidthMm(number.label, depths.numeralSize), segment.extension === 'tail' ? segment.markedMm : rowLength);
    if (!inside) continue;
    const [nx, anchor] = inside;
    shapes.push(text(nx, top + depths.numeralBaseline, number.label, depths.numeralSize, { anchor, font: 'figures', data: tag({ role: 'numeral', crankDeg: number.crankDeg }) }));
  }

  // Marks and their labels: inside the strip, in the zone below the numerals (strip-labels.ts).
  const zone: Zone = { topMm: top + depths.bandTop + 0.2, bottomMm: top + w - 0.3, fromMm: 0, toMm: segment.extension === 'tail' ? segment.markedMm : rowLength };
  const tdc = tdcPointers(marks, x, top, depths, w, tag);
  const stripMarks: StripMark[] = [
    ...marks.advance.map((mark) => ({ xMm: x(mark.alongDeg), label: mark.label, line: { role: 'advance', advanceDeg: mark.advanceDeg, crankDeg: mark.crankDeg }, labelData: { role: 'advance-label', advanceDeg: mark.advanceDeg } })),
    ...marks.ports.map((mark) => ({ xMm: x(mark.alongDeg), label: mark.label, line: { role: 'port', crankDeg: mark.crankDeg }, labelData: { role: 'port-label', crankDeg: mark.crankDeg }, dashMm: 0.8 })),
  ];
  const labels = stripMarkLabels(stripMarks, top, zone, tag);
  shapes.push(...labels.shapes);
  if (strobeFit && placed) shapes.push(...stripStrobeShapes(strobeFit, placed, x, top, depths, segment.extension === 'tail' ? segment.markedMm : rowLength, tag));
  const occupied = [...labels.occupied, ...tdc.map(pathBox)];
  shapes.push(...tdc);
  for (const mark of marks.advance.filter((m) => m.target)) {
    const half = req.strobeReadable ? 1.4 : 0.8;
    const depth = Math.min(req.strobeReadable ? 4 : 2.5, depths.tick[10]);
    shapes.push(path([[x(mark.alongDeg), top], [x(mark.alongDeg) - half, top + depth], [x(mark.alongDeg) + half, top + depth]], true, 'black', STROKE_MM.fine, tag({ role: 'target-wedge' })));
  }
  shapes.push(...bandLabels(req, marks, x, zone, occupied, tag));
  shapes.push(...sideLabels(req, segment, plan, x, zone, occupied, tag));
  // The in-strip arrow goes where nothing else is.
  const busy: Array<[number, number]> = occupied.map((box) => [box.x0, box.x1]);
  for (const mark of stripMarks) busy.push([mark.xMm - 0.5, mark.xMm + 0.5]);
  shapes.push(...rowLabels(req, plan, segment, index, top, w, tag, busy));
  return shapes;
}

function pathBox(shape: Shape): InkBox {
  const points = shape.type === 'path' ? shape.pointsMm : [];
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  return { x0: Math.min(...xs) - 0.2, x1: Math.max(...xs) + 0.2, y0: Math.min(...ys), y1: Math.max(...ys) };
}

/**
 * A centred label that would stick out of the strip's end is anchored at that end instead;
 * undefined when the row is shorter than the label (a window of a hair's breadth, said in the notes).
 */
function keepInside(xMm: number, widthMm: number, rowLengthMm: number): [number, 'start' | 'middle' | 'end'] | undefined {
  if (widthMm + 0.8 > rowLengthMm) return undefined;
  if (xMm - widthMm / 2 < 0.3) return [Math.max(xMm, 0) + 0.4, 'start'];
  if (xMm + widthMm / 2 > rowLengthMm - 0.3) return [Math.min(xMm, rowLengthMm) - 0.4, 'end'];
  return [xMm, 'middle'];
}

/** The first start (3, 13, 23 … mm) where `lengthMm` clears every busy interval. */
function freeSpot(busy: ReadonlyArray<[number, number]>, lengthMm: number, limitMm: number): number | undefined {
  for (let i = 0; i < 200; i += 1) {
    const start = 3 + i * 10;
    if (start + lengthMm > limitMm) return undefined;
    if (busy.every(([a, b]) => b < start || a > start + lengthMm)) return start;
  }
  return undefined;
}

function tdcPointers(marks: ScaleMarks, x: (a: number) => number, top: number, depths: StripDepths, w: number, tag: (d: ShapeData) => ShapeData): Shape[] {
  const lower = w - depths.bandTop;
  if (lower < 0.8) return [];
  // Small, at the top of the label zone: the labels stand on the zone's bottom edge.
  const size = Math.min(1.6, lower * 0.4);
  return marks.ticks
    .filter((tick) => tick.crankIndex === 0)
    .map((tick) =>
      path(
        [
          [x(tick.alongDeg), top + depths.bandTop],
          [x(tick.alongDeg) - size * 0.5, top + depths.bandTop + size],
          [x(tick.alongDeg) + size * 0.5, top + depths.bandTop + size],
        ],
        true,
        'black',
        STROKE_MM.fine,
        tag({ role: 'tdc-pointer', crankDeg: 0 }),
      ),
    );
}

/**
 * BTDC side / ATDC side inside the strip, on every stretch of the segment that lies on that side
 * of TDC (at 45° from TDC when the stretch holds it, else in the stretch's middle, so a window
 * strip says which side it shows), and BDC where the segment holds it; each at the first free spot.
 */
function sideLabels(req: SheetRequest, segment: StripSegment, plan: StripPlan, x: (a: number) => number, zone: Zone, occupied: InkBox[], tag: (d: ShapeData) => ShapeData): Shape[] {
  const size = Math.min(2.4, (zone.bottomMm - zone.topMm) / 1.1);
  if (size < MIN_STRIP_LABEL_MM) return [];
  const from = segment.startAlongDeg;
  const to = from + segment.markedMm / plan.mmPerDeg;
  const shapes: Shape[] = [];
  const put = (along: number, label: string, role: string, sizeMm = size) => {
    const spot = freeLabelSpot(label, sizeMm, x(along), zone, occupied);
    if (!spot) return;
    occupied.push(spot.box);
    shapes.push(text(spot.xMm, spot.baselineMm, label, sizeMm, { anchor: 'middle', weight: 'bold', data: tag({ role, crankDeg: crankFromAlongDeg(along, req.carrier) }) }));
  };
  for (const [preferredCrank, label, role, onSide] of [
    [315, 'BTDC side', 'btdc-side', (c: number) => c > 182 && c < 358],
    [45, 'ATDC side', 'atdc-side', (c: number) => c > 2 && c < 178],
  ] as const) {
    for (const [runFrom, runTo] of sideRuns(from, to, (along) => onSide(crankFromAlongDeg(along, req.carrier)))) {
      // A short stretch (a window's) gets the label smaller, down to the legible minimum.
      const runSize = Math.min(size, ((runTo - runFrom) * plan.mmPerDeg - 1) / textWidthMm(label, 1));
      if (runSize < MIN_STRIP_LABEL_MM) continue;
      const preferred = normalizeDeg(alongRotationDeg(preferredCrank, req.carrier));
      const inRun = [0, -360, 360, 720].map((t) => preferred + t).find((a) => a >= runFrom && a <= runTo);
      put(inRun ?? (runFrom + runTo) / 2, label, role, runSize);
    }
  }
  const bdc = normalizeDeg(alongRotationDeg(180, req.carrier));
  for (let along = bdc + 360 * Math.ceil((from - bdc) / 360); along <= to + 1e-9; along += 360) put(along, 'BDC', 'bdc-label');
  return shapes;
}

/** The stretches of [from, to] (along degrees, 1° resolution) where `inside` holds. */
function sideRuns(from: number, to: number, inside: (along: number) => boolean): Array<[number, number]> {
  const runs: Array<[number, number]> = [];
  let start: number | undefined;
  for (let along = from; along <= to + 1e-9; along += 1) {
    const here = Math.min(along, to);
    if (inside(here)) start ??= here;
    else if (start !== undefined) {
      runs.push([start, here - 1]);
      start = undefined;
    }
  }
  if (start !== undefined) runs.push([start, to]);
  return runs;
}

function rowLabels(req: SheetRequest, plan: StripPlan, segment: StripSegment, index: number, top: number, w: number, tag: (d: ShapeData) => ShapeData, busy: Array<[number, number]>): Shape[] {
  const shapes: Shape[] = [];
  const count = plan.segments.length;
  const baseline = top - 1.4;
  let cursor = 0;
  if (count > 1) {
    shapes.push(text(0, baseline, segment.letter, TEXT_MM.heading, { weight: 'bold', data: tag({ role: 'segment-letter' }) }));
    cursor += textWidthMm(segment.letter, TEXT_MM.heading) + 1.5;
    if (index > 0) {
      const prev = plan.segments[index - 1]!.letter;
      const caption = `join ${prev}→${segment.letter}: lay this end on ${prev}’s join line`;
      shapes.push(text(cursor, baseline, caption, TEXT_MM.small, { data: tag({ role: 'join-label' }) }));
      cursor += textWidthMm(caption, TEXT_MM.small) + 2;
    }
  }
  // The rotation arrow: on the strip itself, near its start, and in words above it.
  const [shaft, head] = arrow(cursor, baseline - 0.7, cursor + 9, baseline - 0.7, 1.6, tag({ role: 'rotation-arrow' }));
  shapes.push(shaft, head, text(cursor + 10, baseline, 'rim moves this way', TEXT_MM.small, { data: tag({ role: 'rotation-caption' }) }));
  const inStripY = top + w - Math.min(1, w * 0.1);
  const arrowLength = Math.min(8, segment.markedMm * 0.3);
  const arrowStart = freeSpot(busy, arrowLength + 1, segment.markedMm) ?? Math.min(4, segment.markedMm * 0.2);
  shapes.push(...arrow(arrowStart, inStripY, arrowStart + arrowLength, inStripY, Math.min(1.4, w * 0.18), tag({ role: 'rotation-arrow' })));
  if (segment.extension === 'overlap') {
    const next = plan.segments[index + 1]!.letter;
    shapes.push(text(segment.markedMm - 0.6, baseline, `join ${segment.letter}→${next}`, TEXT_MM.small, { anchor: 'end', data: tag({ role: 'join-label' }) }));
  }
  if (segment.extension === 'tail') {
    const size = Math.min(2, w * 0.3);
    const mid = segment.markedMm + segment.extensionMm / 2;
    shapes.push(text(mid, top + w / 2 - size * 0.2, 'glue under', size, { anchor: 'middle', data: tag({ role: 'glue-tail' }) }));
    shapes.push(text(mid, top + w / 2 + size * 1.05, 'start', size, { anchor: 'middle', data: tag({ role: 'glue-tail' }) }));
  }
  if (plan.window && index === count - 1) {
    const [from, to] = req.windowCrankDeg!;
    const describe = (crankDeg: number) => (crankDeg === 0 || crankDeg === 360 ? 'TDC' : crankDeg > 180 ? `${formatDeg(360 - crankDeg)}° BTDC` : `${formatDeg(crankDeg)}° ATDC`);
    const caption = `window ${describe(from)} to ${describe(to)}`;
    shapes.push(text(0, baseline - TEXT_MM.small * 1.5, caption, TEXT_MM.small, { data: tag({ role: 'window-label' }) }));
  }
  return shapes;
}

export function stripLayout(req: SheetRequest, printable: Size): StripLayout {
  // Rows are drawn true size, then pre-scaled by 1/printerScaleX: leave room for that and the strokes.
  const rowLengthMm = printable.widthMm * req.printerScaleX - 1;
  const plan = planStrip(req, rowLengthMm);
  const choice = chooseLevels(plan.mmPerDeg, req.minPitchMm, 'on this strip');
  const stride = numberStrideFor(plan.mmPerDeg * 10, textWidthMm('180', stripDepths(req.stripWidthMm).numeralSize));
  const strobe = strobeOnStrip(stripStrobeChoice(req, plan), req, plan);
  const warnings = [...choice.warnings, ...strobe.warnings];
  warnings.push(...outsideWindowWarnings(req));
  const numeralMm = textWidthMm('0', stripDepths(req.stripWidthMm).numeralSize) + 0.8;
  if (plan.markedMm < numeralMm) warnings.push(`Numerals left off: the window is only ${plan.markedMm.toFixed(2)} mm long, shorter than one numeral (${numeralMm.toFixed(1)} mm)`);
  if (plan.segments.length > 1)
    warnings.push(
      `The strip (${(plan.markedMm).toFixed(2)} mm marked) is cut into ${plan.segments.length} segments, ${plan.segments[0]!.letter}–${plan.segments[plan.segments.length - 1]!.letter}, that join end to end`,
    );
  const rows = plan.segments.map((segment, i) => stripRow(req, plan, segment, i, choice.finestLevel, stride, strobe.fit));
  return { rows, keptLevels: choice.keptLevels, stripLengthMm: plan.stripLengthMm, warnings, plan, ...(strobe.fit ? { strobeSummary: strobeSummary(strobe.fit) } : {}) };
}

/** What a window strip cannot show: each requested advance mark, band or port event outside the window, by name. */
function outsideWindowWarnings(req: SheetRequest): string[] {
  if (!req.windowCrankDeg) return [];
  const [from] = req.windowCrankDeg;
  const span = windowSpanDeg(req.windowCrankDeg);
  const inWindow = (crankDeg: number) => normalizeDeg(crankDeg - from) <= span + 1e-7;
  const left: string[] = [];
  for (const advanceDeg of new Set(req.advanceMarksDeg)) if (!inWindow(360 - advanceDeg)) left.push(`advance mark ${formatDeg(advanceDeg)}° BTDC`);
  for (const port of req.portEvents)
    for (const [crank, verb] of [
      [port.opensCrankDeg, 'opens'],
      [port.closesCrankDeg, 'closes'],
    ] as const)
      if (!inWindow(crank)) left.push(`${port.name} ${verb} ${portAngleWords(crank, req.numbering)}`);
  if (req.advanceBandDeg && !inWindow(360 - req.advanceBandDeg[0]) && !inWindow(360 - req.advanceBandDeg[1])) left.push(`advance band ${formatDeg(Math.min(...req.advanceBandDeg))}–${formatDeg(Math.max(...req.advanceBandDeg))}° BTDC`);
  return left.length ? [`Not drawn, outside the window: ${left.join(', ')}`] : [];
}

/** The advance band's range in words inside the strip, next to the band, at the first free spot. */
function bandLabels(req: SheetRequest, marks: ScaleMarks, x: (a: number) => number, zone: Zone, occupied: InkBox[], tag: (d: ShapeData) => ShapeData): Shape[] {
  if (!req.advanceBandDeg) return [];
  const [lo, hi] = [Math.min(...req.advanceBandDeg), Math.max(...req.advanceBandDeg)];
  const words = `${formatDeg(lo)}–${formatDeg(hi)}° BTDC`;
  const size = Math.min(2, (zone.bottomMm - zone.topMm) / 1.1);
  if (size < MIN_STRIP_LABEL_MM) return [];
  const shapes: Shape[] = [];
  for (const band of marks.bands) {
    const spot = freeLabelSpot(words, size, (x(band.fromAlongDeg) + x(band.toAlongDeg)) / 2, zone, occupied);
    if (!spot) continue;
    occupied.push(spot.box);
    shapes.push(text(spot.xMm, spot.baselineMm, words, size, { anchor: 'middle', weight: 'bold', data: tag({ role: 'band-label' }) }));
  }
  return shapes;
}
