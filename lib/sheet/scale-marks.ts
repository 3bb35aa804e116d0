import { normalizeDeg } from '../angle';
import type { GraduationLevel } from './drawing';
import { alongIndexRange, graduationNumber, HALF_DEG_PER_TURN, type Numbering, type Tick, ticksInAlongRange } from './graduations';
import type { PortEvent } from './sheet-request';
import { alongRotationDeg, btdcToCrankDeg, type Carrier } from './scale-direction';

/**
 * What a scale carries, in along-rotation degrees (see scale-direction.ts), before it is
 * bent round a wheel (polar) or laid flat on a strip (linear). Wheels, rings and strips
 * all come from here.
 */

export type PlacedMark = { alongDeg: number; crankDeg: number; label: string };
/** `target`: the static advance the engine is set to, drawn heavier and named. */
export type AdvanceMark = PlacedMark & { advanceDeg: number; target: boolean };
export type AlongInterval = { fromAlongDeg: number; toAlongDeg: number };

export type ScaleMarks = {
  ticks: Tick[];
  numbers: PlacedMark[];
  advance: AdvanceMark[];
  ports: PlacedMark[];
  bands: AlongInterval[];
};

export type ScaleMarksOptions = {
  /** 'turn' = one whole revolution [0, 360); otherwise an inclusive along range (strips). */
  range: 'turn' | AlongInterval;
  carrier: Carrier;
  numbering: Numbering;
  finestLevel: GraduationLevel;
  /** Number every n-th 10° tick (n divides 36, so split numbering stays symmetric). */
  numberStride: number;
  advanceMarksDeg: readonly number[];
  targetAdvanceDeg?: number;
  advanceBandDeg?: readonly [number, number];
  portEvents: readonly PortEvent[];
  /** Numerals this close (degrees) to an advance or port mark are left off, so the heavy line never strikes one through. */
  numberClearDeg?: number;
};

export const NUMBER_STRIDES = [1, 2, 3, 6, 9, 18] as const;

/** The smallest stride that leaves `textWidthMm` plus a gap between numerals `pitch10Mm` apart. */
export function numberStrideFor(pitch10Mm: number, textWidthMm: number): number {
  return NUMBER_STRIDES.find((stride) => pitch10Mm * stride >= textWidthMm * 1.15) ?? 36;
}

export function formatDeg(deg: number): string {
  return String(Math.round(deg * 100) / 100);
}

/** A port event's angle as the scale reads it: crank degrees on full numbering, ° ATDC / ° BTDC on split. */
export function portAngleWords(crankDeg: number, numbering: Numbering): string {
  const crank = normalizeDeg(crankDeg);
  if (numbering === 'full') return `${formatDeg(crank)}°`;
  if (Math.abs(crank) < 0.005 || Math.abs(crank - 360) < 0.005) return 'at TDC';
  if (Math.abs(crank - 180) < 0.005) return 'at BDC';
  return crank < 180 ? `${formatDeg(crank)}° ATDC` : `${formatDeg(360 - crank)}° BTDC`;
}

/** Every along position (shifted by whole turns) of a crank angle inside the range. */
export function alongPositions(crankDeg: number, range: ScaleMarksOptions['range'], carrier: Carrier): number[] {
  const base = normalizeDeg(alongRotationDeg(crankDeg, carrier));
  if (range === 'turn') return [base];
  const positions: number[] = [];
  const first = Math.ceil((range.fromAlongDeg - base - 1e-9) / 360);
  for (let turn = first; base + turn * 360 <= range.toAlongDeg + 1e-9 && turn < first + 4; turn += 1) positions.push(base + turn * 360);
  return positions;
}

/** The along interval of an advance band [from, to] BTDC, clipped to the range (pieces per turn). */
export function bandIntervals(bandDeg: readonly [number, number], range: ScaleMarksOptions['range'], carrier: Carrier): AlongInterval[] {
  const lo = Math.min(bandDeg[0], bandDeg[1]);
  const hi = Math.max(bandDeg[0], bandDeg[1]);
  if (!(hi > lo)) return [];
  // Both ends placed by the one direction rule; the band is the short way between them.
  const widthDeg = hi - lo;
  const loAlong = normalizeDeg(alongRotationDeg(btdcToCrankDeg(lo), carrier));
  const hiAlong = normalizeDeg(alongRotationDeg(btdcToCrankDeg(hi), carrier));
  const from = Math.abs(normalizeDeg(hiAlong - loAlong) - widthDeg) < 1e-6 ? loAlong : hiAlong;
  const to = from + widthDeg;
  if (range === 'turn') return [{ fromAlongDeg: from, toAlongDeg: to }];
  const pieces: AlongInterval[] = [];
  const firstTurn = Math.floor((range.fromAlongDeg - to) / 360);
  for (let turn = firstTurn; turn <= firstTurn + 5; turn += 1) {
    const a = Math.max(from + turn * 360, range.fromAlongDeg);
    const b = Math.min(to + turn * 360, range.toAlongDeg);
    if (b > a) pieces.push({ fromAlongDeg: a, toAlongDeg: b });
  }
  return pieces;
}

function nearAny(alongDeg: number, marks: readonly PlacedMark[], withinDeg: number): boolean {
  return marks.some((mark) => Math.abs(mark.alongDeg - alongDeg) < withinDeg - 1e-9);
}

/**
 * Where a numeral goes: on its tick, or, when a heavy mark would strike it through, offset just
 * clear of that mark (the side its tick is on first); only a numeral boxed in by marks on both
 * sides is left off.
 */
function numeralAlongDeg(tickAlongDeg: number, marks: readonly PlacedMark[], clearDeg: number, numeralPitchDeg: number): number | undefined {
  if (!nearAny(tickAlongDeg, marks, clearDeg)) return tickAlongDeg;
  const nearest = marks.reduce((best, mark) => (Math.abs(mark.alongDeg - tickAlongDeg) < Math.abs(best.alongDeg - tickAlongDeg) ? mark : best));
  const side = tickAlongDeg >= nearest.alongDeg ? 1 : -1;
  for (const s of [side, -side]) {
    const candidate = nearest.alongDeg + s * clearDeg;
    // A numeral is about 2 × clearDeg wide: the offset one must still clear its neighbours' numerals.
    const shift = Math.abs(candidate - tickAlongDeg);
    if (shift <= 2 * clearDeg && numeralPitchDeg - shift >= 2.1 * clearDeg && !nearAny(candidate, marks, clearDeg)) return candidate;
  }
  return undefined;
}

export function scaleMarks(options: ScaleMarksOptions): ScaleMarks {
  const { range, carrier } = options;
  const [fromIndex, toIndex] = range === 'turn' ? [0, HALF_DEG_PER_TURN - 1] : alongIndexRange(range.fromAlongDeg, range.toAlongDeg);
  const ticks = ticksInAlongRange(fromIndex, toIndex, options.finestLevel, carrier);

  const target = options.targetAdvanceDeg;
  const advance: AdvanceMark[] = [...new Set([...options.advanceMarksDeg, ...(target === undefined ? [] : [target])])].flatMap((advanceDeg) => {
    const crankDeg = btdcToCrankDeg(advanceDeg);
    const isTarget = advanceDeg === target;
    const name = advanceDeg === 0 ? 'TDC' : `${formatDeg(advanceDeg)}° BTDC`;
    return alongPositions(crankDeg, range, carrier).map((alongDeg) => ({ alongDeg, crankDeg, advanceDeg, target: isTarget, label: isTarget ? `${name} target` : name }));
  });

  const ports: PlacedMark[] = options.portEvents.flatMap((port) =>
    (
      [
        [port.opensCrankDeg, 'opens'],
        [port.closesCrankDeg, 'closes'],
      ] as const
    ).flatMap(([crank, verb]) =>
      alongPositions(normalizeDeg(crank), range, carrier).map((alongDeg) => ({
        alongDeg,
        crankDeg: normalizeDeg(crank),
        label: `${port.name} ${verb} ${portAngleWords(crank, options.numbering)}`,
      })),
    ),
  );

  const stride20 = 20 * options.numberStride;
  const clearDeg = options.numberClearDeg ?? 1.5;
  const marked = [...advance, ...ports];
  const numbers: PlacedMark[] = [];
  // A plain loop: this runs over every tick of every sheet, and filter + flatMap cost more than the rest of it.
  for (const tick of ticks) {
    if (tick.level !== 10 || tick.crankIndex % stride20 !== 0) continue;
    const alongDeg = numeralAlongDeg(tick.alongDeg, marked, clearDeg, 10 * options.numberStride);
    if (alongDeg !== undefined) numbers.push({ alongDeg, crankDeg: tick.crankDeg, label: graduationNumber(tick.crankDeg, options.numbering) });
  }

  const bands = options.advanceBandDeg ? bandIntervals(options.advanceBandDeg, range, carrier) : [];
  return { ticks, numbers, advance, ports, bands };
}

/**
 * Label lanes: going along the scale, each label takes the first lane (0 = nearest the
 * ticks) whose last label is at least `gapDeg` behind it, so labels never print over each
 * other; with every lane taken the label is left off (the mark itself is always drawn).
 */
export function labelLanes(marks: readonly PlacedMark[], gapDeg: number, laneCount: number, blocked: readonly AlongInterval[] = []): Map<number, number> {
  const lanes = new Map<number, number>();
  const lastInLane = Array.from({ length: Math.max(1, laneCount) }, () => -Infinity);
  // A label reaches gapDeg / 2 either side of its mark; blocked stretches (the rotation arrow) take none.
  const clear = (along: number) => blocked.every((b) => {
    const mid = (b.fromAlongDeg + b.toAlongDeg) / 2;
    const d = Math.abs(((along - mid) % 360 + 540) % 360 - 180);
    return d >= (b.toAlongDeg - b.fromAlongDeg) / 2 + gapDeg / 2;
  });
  for (const along of [...new Set(marks.map((m) => m.alongDeg))].sort((a, b) => a - b)) {
    if (!clear(along)) continue;
    const lane = lastInLane.findIndex((last) => along - last >= gapDeg - 1e-9);
    if (lane < 0) continue;
    lanes.set(along, lane);
    lastInLane[lane] = along;
  }
  return lanes;
}
