import { normalizeDeg } from '../angle';
import { graduationNumber, type Numbering } from './graduations';
import { alongPositions, bandIntervals, formatDeg, type AlongInterval, type PlacedMark, type ScaleMarks, type ScaleMarksOptions } from './scale-marks';
import { btdcToCrankDeg, type Carrier } from './scale-direction';
import type { SheetRequest } from './sheet-request';

/**
 * The strobe-readable option: big heavy figures at every 2° or 5° through the advance range, for
 * reading a running engine under a timing light, on a white ground, with the fine graduations
 * left off elsewhere. This file holds the sizes and the choices; wheels, rings (polar-scale.ts)
 * and strips (strip-layout.ts) place them.
 */

/** How tall the figures must stand, mm: their flat tops (1, 4, 7) above the baseline. */
export const STROBE_INK_MIN_MM = 5;
// The bold figures face (DejaVu Sans Condensed Bold): flat digits stand 0.729 em, round ones reach 0.742
// and dip 0.014 below the baseline; every digit advances 0.626 em (the font's own glyph boxes).
export const DIGIT_INK_EM = 0.729;
const DIGIT_ADVANCE_EM = 0.63;
/** The font size of the figures: 7 × 0.729 = 5.1 mm of ink. */
export const STROBE_NUMERAL_MM = 7;
/** The box a figure is given across its baseline: 0.75 em above to 0.2 below, as every text box on a sheet. */
const BOX_EM = 0.95;
/** White ground beyond the figures' boxes, across the scale. */
export const STROBE_PAD_MM = 0.5;
/** Clear space between neighbouring figures. */
const GAP_MM = 1;
/** Smaller than this (font size, mm) the figures would be no better than the scale's own: not drawn. */
const SMALLEST_USEFUL_MM = 3;
/** The advance range is widened to at least this, so a reading a little off the band has a figure beside it. */
const MIN_SPAN_DEG = 10;
/** Where the advance usually lies on a small two-stroke when nothing else is given (common practice). */
const DEFAULT_RANGE_BTDC: readonly [number, number] = [10, 30];

export const STROBE_STEPS_DEG = [2, 5, 10] as const;
export type StrobeStep = (typeof STROBE_STEPS_DEG)[number];
/** `along`: figures stand along the scale like its numerals; `across`: they run across it (from the edge inwards). */
export type StrobeOrientation = 'along' | 'across';
export type StrobeNumeral = { advanceDeg: number; crankDeg: number; label: string };
export type StrobeFit = { stepDeg: StrobeStep; orientation: StrobeOrientation; sizeMm: number; numerals: StrobeNumeral[] };

/**
 * The advance range the figures cover, ° BTDC: the advance band; else the span of the target
 * and advance marks; else 10–30°. Widened round its middle to at least 10°, within 0–60°.
 */
export function strobeRangeBtdcDeg(req: Pick<SheetRequest, 'advanceBandDeg' | 'advanceMarksDeg' | 'targetAdvanceDeg'>): [number, number] {
  const marks = [...req.advanceMarksDeg, ...(req.targetAdvanceDeg === undefined ? [] : [req.targetAdvanceDeg])];
  const given = req.advanceBandDeg ?? (marks.length ? ([Math.min(...marks), Math.max(...marks)] as const) : DEFAULT_RANGE_BTDC);
  let lo = Math.min(...given);
  let hi = Math.max(...given);
  if (hi - lo < MIN_SPAN_DEG) {
    const mid = Math.min(60 - MIN_SPAN_DEG / 2, Math.max(MIN_SPAN_DEG / 2, (lo + hi) / 2));
    [lo, hi] = [mid - MIN_SPAN_DEG / 2, mid + MIN_SPAN_DEG / 2];
  }
  return [lo, hi];
}

/** The figures at every `stepDeg` from the range's start to its end, both rounded outwards to the step. */
export function strobeNumerals([lo, hi]: readonly [number, number], stepDeg: number, numbering: Numbering): StrobeNumeral[] {
  const numerals: StrobeNumeral[] = [];
  for (let advanceDeg = Math.floor(lo / stepDeg + 1e-9) * stepDeg; advanceDeg <= Math.ceil(hi / stepDeg - 1e-9) * stepDeg; advanceDeg += stepDeg) {
    const crankDeg = btdcToCrankDeg(advanceDeg);
    numerals.push({ advanceDeg, crankDeg, label: graduationNumber(crankDeg, numbering) });
  }
  return numerals;
}

const longest = (numerals: readonly StrobeNumeral[]) => Math.max(1, ...numerals.map((n) => n.label.length));

export function strobeNumeralWidthMm(label: string, sizeMm: number): number {
  return label.length * sizeMm * DIGIT_ADVANCE_EM;
}

/** How deep (across the scale) the white ground under the figures is at a font size. */
export function strobeZoneMm(numerals: readonly StrobeNumeral[], orientation: StrobeOrientation, sizeMm: number): number {
  return (orientation === 'along' ? BOX_EM * sizeMm : longest(numerals) * DIGIT_ADVANCE_EM * sizeMm) + 2 * STROBE_PAD_MM;
}

/** How far along the scale one figure reaches from its mark, either way, pad included. */
export function strobeHalfWidthMm(numerals: readonly StrobeNumeral[], orientation: StrobeOrientation, sizeMm: number): number {
  return (orientation === 'along' ? longest(numerals) * DIGIT_ADVANCE_EM * sizeMm : BOX_EM * sizeMm) / 2 + STROBE_PAD_MM;
}

/** The largest font size at which neighbours `pitchMm` apart keep a gap between them. */
export function pitchLimitedSizeMm(numerals: readonly StrobeNumeral[], orientation: StrobeOrientation, pitchMm: number): number {
  const perSize = orientation === 'along' ? longest(numerals) * DIGIT_ADVANCE_EM : BOX_EM;
  return Math.max(0, (pitchMm - GAP_MM) / perSize);
}

/**
 * The piece's own limits: for figures every `stepDeg` standing `orientation`, the largest font
 * size its depth and its pitch allow (a wheel's or ring's pitch depends on where the figures sit),
 * and, in words, what limits it.
 */
export type StrobeRoom = (stepDeg: StrobeStep, orientation: StrobeOrientation, numerals: readonly StrobeNumeral[]) => { sizeMm: number; limit: string };

/** The room words for a size: the depth's when the depth is the tighter limit, else the pitch's. */
export function roomOf(depthSizeMm: number, depthWords: string, pitchSizeMm: number, pitchWords: string): { sizeMm: number; limit: string } {
  return depthSizeMm <= pitchSizeMm ? { sizeMm: depthSizeMm, limit: depthWords } : { sizeMm: pitchSizeMm, limit: pitchWords };
}

export type StrobeChoice = { fit?: StrobeFit; warnings: string[] };

/**
 * 2° where the figures fit full size, else 5°, else 10°; at each step along the scale first,
 * then across it. When none fits full size, the largest that does, and the sheet says so and
 * why; smaller than is useful, none at all, said too. Never smaller in silence.
 */
export function chooseStrobeFit(range: readonly [number, number], numbering: Numbering, room: StrobeRoom): StrobeChoice {
  let best: (StrobeFit & { limit: string }) | undefined;
  const words = `${formatDeg(range[0])}–${formatDeg(range[1])}° BTDC`;
  let five: { sizeMm: number; limit: string } | undefined;
  for (const stepDeg of STROBE_STEPS_DEG) {
    const numerals = strobeNumerals(range, stepDeg, numbering);
    for (const orientation of ['along', 'across'] as const) {
      const { sizeMm: roomMm, limit } = room(stepDeg, orientation, numerals);
      const sizeMm = Math.min(STROBE_NUMERAL_MM, roomMm);
      const fit = { stepDeg, orientation, sizeMm, numerals };
      if (stepDeg === 5 && (!five || sizeMm > five.sizeMm)) five = { sizeMm, limit };
      // Every 10° is what the scale numbers anyway: say why the figures are no closer.
      if (sizeMm >= STROBE_NUMERAL_MM - 1e-9)
        return { fit, warnings: stepDeg === 10 ? [`Strobe-readable figures every 10° over ${words}, not every 5°: ${five?.limit ?? ''}, too close for ${STROBE_INK_MIN_MM} mm figures`] : [] };
      if (!best || sizeMm > best.sizeMm + 1e-9) best = { ...fit, limit };
    }
  }
  if (!best || best.sizeMm < SMALLEST_USEFUL_MM)
    return { warnings: [`Strobe-readable figures not drawn over ${words}: ${best?.limit ?? 'no room'}; the scale keeps its usual numerals there`] };
  const { limit, ...fit } = best;
  return {
    fit,
    warnings: [`Strobe-readable figures drawn ${(fit.sizeMm * DIGIT_INK_EM).toFixed(1)} mm high every ${fit.stepDeg}° over ${words}, below the ${STROBE_INK_MIN_MM} mm asked for: ${limit}`],
  };
}

/** The title block's line for the figures drawn: the step, the stretch and what happened to the fine graduations. */
export function strobeSummary(fit: StrobeFit): string {
  const first = fit.numerals[0]!.advanceDeg;
  const last = fit.numerals[fit.numerals.length - 1]!.advanceDeg;
  return `Strobe-readable: figures every ${fit.stepDeg}° from ${formatDeg(first)} to ${formatDeg(last)}° BTDC, ${(fit.sizeMm * DIGIT_INK_EM).toFixed(1)} mm tall; graduations finer than 5° only there`;
}

export type PlacedStrobe = { numerals: PlacedMark[]; intervals: AlongInterval[] };

/** The figures' places along the scale and the stretches they cover (first to last figure), for a turn or a strip segment. */
export function placeStrobe(fit: StrobeFit, range: ScaleMarksOptions['range'], carrier: Carrier): PlacedStrobe {
  const numerals = fit.numerals.flatMap((n) => alongPositions(n.crankDeg, range, carrier).map((alongDeg) => ({ alongDeg, crankDeg: n.crankDeg, label: n.label })));
  const first = fit.numerals[0]!.advanceDeg;
  const last = fit.numerals[fit.numerals.length - 1]!.advanceDeg;
  // A range reaching TDC covers it: widen a hair so the 0 figure's own tick counts as inside.
  const intervals = bandIntervals([first - 1e-6, last + 1e-6], range, carrier);
  return { numerals, intervals };
}

/** Whether an along position lies within `marginDeg` of any interval (a turn wraps at 360°). */
export function nearIntervals(alongDeg: number, intervals: readonly AlongInterval[], marginDeg: number, wraps: boolean): boolean {
  return intervals.some(({ fromAlongDeg, toAlongDeg }) =>
    (wraps ? [-360, 0, 360] : [0]).some((turn) => {
      const a = alongDeg + turn;
      return a >= fromAlongDeg - marginDeg - 1e-9 && a <= toAlongDeg + marginDeg + 1e-9;
    }),
  );
}

/**
 * The scale under the figures: graduations finer than 5° only inside the figures' stretch, the
 * scale's own numerals left off where a figure stands (within `clearDeg` of the stretch), and no
 * tick where a figure's heavy tick goes.
 */
export function coarsenForStrobe(marks: ScaleMarks, placed: PlacedStrobe, clearDeg: number, wraps: boolean): ScaleMarks {
  const strobeCranks = new Set(placed.numerals.map((n) => Math.round(normalizeDeg(n.crankDeg) * 2)));
  return {
    ...marks,
    ticks: marks.ticks.filter((tick) => !strobeCranks.has(tick.crankIndex) && (tick.level >= 5 || nearIntervals(tick.alongDeg, placed.intervals, 0, wraps))),
    numbers: marks.numbers.filter((n) => !nearIntervals(n.alongDeg, placed.intervals, clearDeg, wraps)),
  };
}
