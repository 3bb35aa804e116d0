import { cosDeg, sinDeg } from '../angle';
import type { Fill, GraduationLevel, Shape } from './drawing';
import { levelOfHalfDegIndex } from './graduations';
import { annularSectorMm } from './polar-band';
import { polarPointMm } from './polar';
import { spreadOnTurn } from './label-fan';
import { formatDeg, labelLanes, type AlongInterval, type PlacedMark, type ScaleMarks } from './scale-marks';
import { tangentialText, textInAnnulus, type Annulus } from './annulus-text';
import { alongRotationDeg, wheelAngleFromAlongDeg, type Rotation, type Carrier } from './scale-direction';
import { arrow, line, path, text } from './shapes';
import { STROKE_MM, textWidthMm } from './sheet-style';
import { strobeHalfWidthMm, STROBE_PAD_MM, type PlacedStrobe, type StrobeFit } from './strobe';

/**
 * Bends a scale round a circle: the polar transform. Ticks start at the reading edge
 * (`edgeRadiusMm`) and run `towards` the centre (wheel) or away from it (ring).
 * Depths are at full size; `depthScale` shrinks everything for small discs or narrow rings.
 */

export const TICK_DEPTH_MM: Record<GraduationLevel, number> = { 10: 6, 5: 4.5, 1: 3, 0.5: 2 };
export const POLAR_DEPTH_MM = {
  numeralSize: 3.2,
  numeralGap: 0.8,
  bandFrom: 10.8,
  bandTo: 14.8,
  labelFrom: 15.6,
  labelSize: 2.2,
  /** Depth of the zone where fanned labels' leaders bend away from their marks. */
  fan: 3.5,
  sideLabel: 30,
  arrow: 21,
  /** Everything above fits in this depth. */
  total: 31,
} as const;

export type PolarDepths = { readonly [K in keyof typeof POLAR_DEPTH_MM]: number } & { strobeFrom: number; strobeTo: number };

/** The strobe figures' heavy ticks reach this deep, a millimetre past the 10° ticks; their white ground starts just beyond. */
const STROBE_TICK_MM = TICK_DEPTH_MM[10] + 1;

/**
 * The depths of a scale (at full size): the usual ones, or with a strobe zone `strobeZoneMm` deep
 * after the ticks, which pushes the band, labels, side labels and arrow that much deeper.
 */
const PLAIN_DEPTHS: PolarDepths = Object.freeze({ ...POLAR_DEPTH_MM, strobeFrom: 0, strobeTo: 0 });

export function polarDepths(strobeZoneMm = 0): PolarDepths {
  if (strobeZoneMm <= 0) return PLAIN_DEPTHS;
  const strobeFrom = STROBE_TICK_MM + 0.4;
  const strobeTo = strobeFrom + strobeZoneMm;
  const shift = Math.max(0, strobeTo + 0.8 - POLAR_DEPTH_MM.bandFrom);
  const d = POLAR_DEPTH_MM;
  return { ...d, bandFrom: d.bandFrom + shift, bandTo: d.bandTo + shift, labelFrom: d.labelFrom + shift, sideLabel: d.sideLabel + shift, arrow: d.arrow + shift, total: d.total + shift, strobeFrom, strobeTo };
}

/** The strobe figures on a wheel or ring: what to draw (strobe.ts) and how big, true mm. */
export type PolarStrobe = { fit: StrobeFit; placed: PlacedStrobe };

export type PolarScaleOptions = {
  centreMm: [number, number];
  edgeRadiusMm: number;
  towards: 'centre' | 'outside';
  depthScale: number;
  rotation: Rotation;
  carrier: Carrier;
  marks: ScaleMarks;
  bandFill: Fill;
  /** The advance band asked for, [from, to] ° BTDC, for its label. */
  bandDeg?: readonly [number, number];
  depths: PolarDepths;
  strobe?: PolarStrobe;
  /** How deep (mm from the edge) labels may go: a wheel stops short of its hub hole. */
  maxDepthMm: number;
};

export function polarScaleShapes(o: PolarScaleOptions): Shape[] {
  const f = o.depthScale;
  const sign = o.towards === 'centre' ? -1 : 1;
  const radius = (depthMm: number) => o.edgeRadiusMm + sign * depthMm * f;
  const angle = (alongDeg: number) => wheelAngleFromAlongDeg(alongDeg, o.rotation);
  const at = (alongDeg: number, depthMm: number) => polarPointMm(o.centreMm, radius(depthMm), angle(alongDeg));
  const shapes: Shape[] = [];

  for (const band of o.marks.bands) {
    const a = angle(band.fromAlongDeg);
    const sweep = band.toAlongDeg - band.fromAlongDeg;
    const [fromCw, toCw] = o.rotation === 'cw' ? [a, a + sweep] : [a - sweep, a];
    const radii = [radius(o.depths.bandFrom), radius(o.depths.bandTo)].sort((p, q) => p - q) as [number, number];
    for (const piece of annularSectorMm(o.centreMm, radii[0], radii[1], fromCw, toCw))
      shapes.push(path(piece.pointsMm, piece.closed, o.bandFill, STROKE_MM.fine, { role: 'advance-band' }));
  }

  tickShapes(o, radius, shapes);

  const numeralSize = o.depths.numeralSize * f;
  const numeralBaseline =
    sign < 0
      ? TICK_DEPTH_MM[10] + o.depths.numeralGap + 0.8 * o.depths.numeralSize
      : TICK_DEPTH_MM[10] + o.depths.numeralGap + 0.25 * o.depths.numeralSize;
  for (const number of o.marks.numbers) {
    const [x, y] = at(number.alongDeg, numeralBaseline);
    shapes.push(text(x, y, number.label, numeralSize, { anchor: 'middle', rotateDeg: angle(number.alongDeg), font: 'figures', data: { role: 'numeral', crankDeg: number.crankDeg } }));
  }

  const labelSize = o.depths.labelSize * f;
  const labelled = [...o.marks.advance, ...o.marks.ports];
  const longestMm = Math.max(0, ...labelled.map((m) => textWidthMm(m.label, labelSize)));
  const roomMm = o.maxDepthMm - o.depths.labelFrom * f;
  // Radial labels need their length in depth; a narrow ring gets labels along the circle instead.
  const tangential = longestMm > roomMm && roomMm >= labelSize * 1.1;
  const piece = pieceAnnulus(o);
  // A narrow ring has no depth past the band for side labels and the arrow: they move into the band's
  // zone and the label zone, the arrow taking a stretch round BDC that mark labels then keep off.
  // So is a ring whose arrow words, straight across BDC, would reach past its outer edge.
  const wideArrow = rotationArrow(o, radius(o.depths.arrow));
  const narrow = o.maxDepthMm / Math.max(f, 1e-6) < o.depths.arrow + 5 || wideArrow.some((shape) => shape.type === 'text' && !textInAnnulus(shape, piece));
  const arrow = narrow ? narrowRotationArrow(o, radius, piece) : { shapes: wideArrow, blocked: [] };
  const plan: LabelPlan = { o, marks: labelled, longestMm, roomMm, radius, angle, at };
  const radial = tangential ? undefined : radialLabeller(plan);
  const radialLabel = radial ?? tangentialLabeller(plan, piece, arrow.blocked);
  const busyAlongDeg = [...labelled.map((m) => m.alongDeg), ...(radial?.labelAlongDeg ?? [])];

  for (const mark of o.marks.advance) {
    const [x1, y1] = at(mark.alongDeg, 0);
    // The target runs on past the band and carries a filled wedge at the reading edge.
    const [x2, y2] = at(mark.alongDeg, mark.target ? o.depths.bandTo + 0.7 : o.depths.bandTo);
    shapes.push(line(x1, y1, x2, y2, STROKE_MM.heavy, { role: 'advance', advanceDeg: mark.advanceDeg, crankDeg: mark.crankDeg }));
    if (mark.target) shapes.push(targetWedge(o, mark.alongDeg, at));
    shapes.push(...radialLabel(mark.alongDeg, mark.label, { role: 'advance-label', advanceDeg: mark.advanceDeg }));
  }
  for (const mark of o.marks.ports) {
    const [x1, y1] = at(mark.alongDeg, 0);
    const [x2, y2] = at(mark.alongDeg, o.depths.bandTo);
    shapes.push(line(x1, y1, x2, y2, STROKE_MM.heavy, { role: 'port', crankDeg: mark.crankDeg }, 0.8 * f));
    shapes.push(...radialLabel(mark.alongDeg, mark.label, { role: 'port-label', crankDeg: mark.crankDeg }));
  }

  shapes.push(...strobeShapes(o, radius, angle, at));
  shapes.push(...tdcPointer(o, at));
  for (const band of o.marks.bands.slice(0, 1)) shapes.push(...bandLabel(o, band, radius, angle, piece));
  shapes.push(...sideLabels(o, at, angle, busyAlongDeg, piece, narrow ? radius((o.depths.bandFrom + o.depths.bandTo) / 2) : undefined));
  shapes.push(...arrow.shapes);
  return shapes;
}

type At = (alongDeg: number, depthMm: number) => [number, number];

/**
 * The strobe figures: a heavy long tick on each, a white ground over their stretch (drawn over the
 * mark lines, which resume past it), and the figures on it, along the circle (tops outward) or
 * across it (along the radius, never upside down).
 */
function strobeShapes(o: PolarScaleOptions, radius: (depthMm: number) => number, angle: (alongDeg: number) => number, at: At): Shape[] {
  const strobe = o.strobe;
  if (!strobe) return [];
  const f = Math.max(o.depthScale, 1e-6);
  const { fit, placed } = strobe;
  const size = fit.sizeMm;
  const sizeAtFull = size / f;
  const shapes: Shape[] = [];
  for (const n of placed.numerals) {
    const [x1, y1] = at(n.alongDeg, 0);
    const [x2, y2] = at(n.alongDeg, STROBE_TICK_MM);
    shapes.push(line(x1, y1, x2, y2, STROKE_MM.heavy, { role: 'strobe-tick', crankDeg: n.crankDeg, level: levelOfHalfDegIndex(Math.round(n.crankDeg * 2) % 720) }));
  }
  const radii = [radius(o.depths.strobeFrom), radius(o.depths.strobeTo)].sort((p, q) => p - q) as [number, number];
  // The straight figures reach farthest along the circle where it is smallest.
  const marginDeg = (Math.atan2(strobeHalfWidthMm(fit.numerals, fit.orientation, size), radii[0]) * 180) / Math.PI;
  for (const interval of placed.intervals) {
    const a = angle(interval.fromAlongDeg - marginDeg);
    const sweep = interval.toAlongDeg - interval.fromAlongDeg + 2 * marginDeg;
    const [fromCw, toCw] = o.rotation === 'cw' ? [a, a + sweep] : [a - sweep, a];
    for (const piece of annularSectorMm(o.centreMm, radii[0], radii[1], fromCw, toCw)) shapes.push(path(piece.pointsMm, piece.closed, 'white', STROKE_MM.fine, { role: 'strobe-band' }));
  }
  const sign = o.towards === 'centre' ? -1 : 1;
  for (const n of placed.numerals) {
    const theta = angle(n.alongDeg);
    const data = { role: 'strobe-numeral', crankDeg: n.crankDeg };
    if (fit.orientation === 'along') {
      // The box runs 0.75 × size above the baseline and 0.2 below, tops outward: on a wheel the baseline is the deeper side.
      const baseline = o.depths.strobeFrom + STROBE_PAD_MM + (sign < 0 ? 0.75 : 0.2) * sizeAtFull;
      const [x, y] = at(n.alongDeg, baseline);
      shapes.push(text(x, y, n.label, size, { anchor: 'middle', rotateDeg: theta, weight: 'bold', font: 'figures', data }));
      continue;
    }
    const [rx, ry] = at(n.alongDeg, (o.depths.strobeFrom + o.depths.strobeTo) / 2);
    const outward = (((theta % 360) + 360) % 360) - 90;
    const rotateDeg = outward < 90 ? outward : outward + 180;
    // The box's middle is 0.275 × size above the baseline: set the baseline that far off the ray.
    const a = (rotateDeg * Math.PI) / 180;
    shapes.push(text(rx - 0.275 * size * Math.sin(a), ry + 0.275 * size * Math.cos(a), n.label, size, { anchor: 'middle', rotateDeg, weight: 'bold', font: 'figures', data }));
  }
  return shapes;
}

/**
 * The graduations: the hot loop of every wheel (up to 720 ticks), kept small so it compiles on its own.
 * Each tick's sine and cosine from the half-degree table, once for both ends, and each level's inner
 * radius once per scale (polarPointMm's arithmetic, so the same numbers).
 */
function tickShapes(o: PolarScaleOptions, radius: (depthMm: number) => number, into: Shape[]): void {
  const [cx, cy] = o.centreMm;
  const edge = radius(0);
  const inner10 = radius(TICK_DEPTH_MM[10]);
  const inner5 = radius(TICK_DEPTH_MM[5]);
  const inner1 = radius(TICK_DEPTH_MM[1]);
  const inner05 = radius(TICK_DEPTH_MM[0.5]);
  const trig = halfDegreeTrig();
  // The wheel angle in half degrees, as wheelAngleFromAlongDeg gives it for alongIndex / 2, in whole numbers.
  const sense = o.rotation === 'cw' ? 1 : -1;
  for (const tick of o.marks.ticks) {
    const index = ((((sense * tick.alongIndex) | 0) % 720) + 720) % 720;
    const sin = trig[2 * index]!;
    const cos = trig[2 * index + 1]!;
    const level = tick.level;
    const inner = level === 10 ? inner10 : level === 5 ? inner5 : level === 1 ? inner1 : inner05;
    into.push(line(cx + edge * sin, cy - edge * cos, cx + inner * sin, cy - inner * cos, level >= 5 ? STROKE_MM.outline : STROKE_MM.tick, { crankDeg: tick.crankDeg, level }));
  }
}

// Ticks sit on half degrees: the sine and cosine of each, [sin, cos] pairs, made on the first wheel and shared
// (the very numbers sinDeg and cosDeg give, so the drawing does not change).
let halfDegreeTable: Float64Array | undefined;

function halfDegreeTrig(): Float64Array {
  if (!halfDegreeTable) {
    halfDegreeTable = new Float64Array(2 * 720);
    for (let i = 0; i < 720; i += 1) {
      halfDegreeTable[2 * i] = sinDeg(i * 0.5);
      halfDegreeTable[2 * i + 1] = cosDeg(i * 0.5);
    }
  }
  return halfDegreeTable;
}

type Labeller = (alongDeg: number, label: string, data: Shape['data']) => Shape[];

/** What either labeller needs: the labelled marks, the longest label, the depth it may use and the polar mapping. */
type LabelPlan = {
  o: PolarScaleOptions;
  marks: readonly PlacedMark[];
  longestMm: number;
  roomMm: number;
  radius: (depthMm: number) => number;
  angle: (alongDeg: number) => number;
  at: At;
};

const MAX_FAN_MM = 15;

/**
 * Labels along the radius, away from the reading edge, their ink centred on the ray. Marks closer
 * than a label is thick fan their labels out (label-fan.ts) past a fan zone deep enough for
 * leaders no flatter than 2 across : 1 down, each leader joining a label to its own mark.
 */
function radialLabeller({ o, marks, longestMm, roomMm, radius, angle, at }: LabelPlan): Labeller & { labelAlongDeg: number[] } {
  const f = o.depthScale;
  const sign = o.towards === 'centre' ? -1 : 1;
  const labelSize = o.depths.labelSize * f;
  const startRadius = Math.max(radius(o.depths.labelFrom), labelSize);
  const fanRoomMm = Math.max(0, roomMm - longestMm);
  const alongs = marks.map((m) => m.alongDeg);
  // The pitch holds where labels are closest: at their far end on a wheel, their start on a ring.
  const pitchFor = (fanMm: number) => (labelSize * 1.3 * 180) / (Math.PI * Math.max(sign < 0 ? startRadius - fanMm - longestMm : startRadius, labelSize));
  const widestShiftMm = (spread: ReadonlyMap<number, number>) => {
    let widest = 0;
    for (const [along, placed] of spread) widest = Math.max(widest, Math.abs(placed - along));
    return ((widest * Math.PI) / 180) * startRadius;
  };
  // Deepen the fan until its leaders need be no flatter than 2 : 1 (a deeper fan spreads a little more).
  let fanMm = Math.min(o.depths.fan * f, fanRoomMm);
  for (let pass = 0; pass < 4; pass += 1) fanMm = Math.min(Math.max(o.depths.fan * f, widestShiftMm(spreadOnTurn(alongs, pitchFor(fanMm))) / 2), fanRoomMm, MAX_FAN_MM * f);
  const pitchDeg = pitchFor(fanMm);
  // Labels that would still go farther than 2.2 × the fan depth are left off (thinned evenly).
  const spread = spreadOnTurn(alongs, pitchDeg, ((2.2 * Math.max(fanMm, 1e-6)) / startRadius) * (180 / Math.PI));
  const labelAlongDeg = [...spread.values()];
  // A label is fanned when it moved, or when a neighbour is within the pitch (the middle of a cluster).
  const fannedAlong = new Set([...spread].filter(([along, placed]) => Math.abs(placed - along) > 1e-6 || [...spread.keys()].some((other) => other !== along && turnDistanceDeg(other, along) < pitchDeg)).map(([along]) => along));
  const labeller = (alongDeg: number, label: string, data: Shape['data']): Shape[] => {
    const labelAlong = spread.get(alongDeg);
    spread.delete(alongDeg);
    if (labelAlong === undefined) return [];
    const fanned = fannedAlong.has(alongDeg);
    const theta = angle(labelAlong);
    const startDepth = o.depths.labelFrom + (fanned ? fanMm / Math.max(f, 1e-6) : 0);
    const [rx, ry] = at(labelAlong, startDepth);
    // Text runs along the radius, away from the reading edge, and is never upside down.
    const outward = ((theta % 360) + 360) % 360 - 90;
    const rightHalf = outward < 90;
    const rotateDeg = rightHalf ? outward : outward + 180;
    // Ink spans 0.75 of the size above the baseline and 0.2 below: a baseline 0.275 × size below the ray centres it.
    const a = (rotateDeg * Math.PI) / 180;
    const [x, y] = [rx - 0.275 * labelSize * Math.sin(a), ry + 0.275 * labelSize * Math.cos(a)];
    const leader: Shape[] = [];
    if (fanned) {
      const [lx1, ly1] = at(alongDeg, o.depths.bandTo);
      const [lx2, ly2] = at(labelAlong, startDepth - 0.4);
      leader.push(line(lx1, ly1, lx2, ly2, STROKE_MM.fine, { role: 'label-leader' }));
    }
    return [...leader, text(x, y, label, labelSize, { anchor: (sign < 0) === rightHalf ? 'end' : 'start', rotateDeg, weight: 'bold', data })];
  };
  return Object.assign(labeller, { labelAlongDeg });
}

/** Labels along the circle, centred on their mark, in as many rings of text as the depth holds. */
function tangentialLabeller({ o, marks, longestMm, roomMm, radius, angle }: LabelPlan, piece: Annulus, blocked: readonly AlongInterval[]): Labeller {
  const f = o.depthScale;
  const sign = o.towards === 'centre' ? -1 : 1;
  const labelSize = o.depths.labelSize * f;
  const laneMm = labelSize * 1.1;
  const firstRadius = radius(o.depths.labelFrom);
  const gapDeg = ((longestMm + 1) * 360) / (2 * Math.PI * Math.max(firstRadius, 1e-6));
  const lanes = labelLanes(marks, gapDeg, Math.max(1, Math.floor(roomMm / laneMm)), blocked);
  return (alongDeg, label, data) => {
    const lane = lanes.get(alongDeg);
    lanes.delete(alongDeg);
    if (lane === undefined) return [];
    const theta = angle(alongDeg);
    // Glyph tops face outward: the baseline is the lane's edge nearer the centre.
    const baseline = firstRadius + sign * lane * laneMm + (sign > 0 ? 0.2 * labelSize : -0.8 * labelSize);
    const [x, y] = polarPointMm(o.centreMm, baseline, theta);
    const shape = text(x, y, label, labelSize, { anchor: 'middle', rotateDeg: theta, weight: 'bold', ...(data ? { data } : {}) });
    if (textInAnnulus(shape, piece)) return [shape];
    // A small ring bends away from the straight text's ends: shrink it onto the lane's middle instead.
    const fitted = tangentialText(label, labelSize, theta, baseline + (sign > 0 ? 0.3 : -0.3) * labelSize, piece, { weight: 'bold', ...(data ? { data } : {}) });
    return fitted ? [fitted] : [];
  };
}

function tdcPointer(o: PolarScaleOptions, at: At): Shape[] {
  const f = o.depthScale;
  const apex = at(0, o.depths.bandFrom);
  const base = at(0, o.depths.bandTo);
  const dx = base[0] - apex[0];
  const dy = base[1] - apex[1];
  const length = Math.hypot(dx, dy) || 1;
  const half = 1.4 * f;
  return [
    path(
      [apex, [base[0] - (dy / length) * half, base[1] + (dx / length) * half], [base[0] + (dy / length) * half, base[1] - (dx / length) * half]],
      true,
      'black',
      STROKE_MM.fine,
      { role: 'tdc-pointer', crankDeg: 0 },
    ),
  ];
}

/** Along-rotation distance between two positions on a turn, 0–180°. */
function turnDistanceDeg(a: number, b: number): number {
  const d = Math.abs(a - b) % 360;
  return d > 180 ? 360 - d : d;
}

/**
 * Where on its half a side label goes: the crank angle nearest the half's middle (90 or 270)
 * that keeps `clearDeg` from every labelled mark, TDC, BDC and the rotation arrow by BDC;
 * when none does, the one farthest from them all.
 */
export function sideLabelCrankDeg(middleCrankDeg: 90 | 270, busyAlongDeg: readonly number[], carrier: Carrier, clearDeg: number): number {
  const busy = [...busyAlongDeg, ...[0, 166, 180, 194].map((crank) => alongRotationDeg(crank, carrier))];
  const clearance = (crankDeg: number) => Math.min(...busy.map((b) => turnDistanceDeg(alongRotationDeg(crankDeg, carrier), b)));
  let best = middleCrankDeg as number;
  let bestClearance = clearance(best);
  if (bestClearance >= clearDeg) return best;
  // Outward from the middle in 2° steps, so the nearest clear angle wins.
  for (let step = 1; step <= 30; step += 1) {
    for (const crankDeg of [middleCrankDeg - 2 * step, middleCrankDeg + 2 * step]) {
      const c = clearance(crankDeg);
      if (c >= clearDeg) return crankDeg;
      if (c > bestClearance) [best, bestClearance] = [crankDeg, c];
    }
  }
  return best;
}

function sideLabels(o: PolarScaleOptions, at: At, angle: (alongDeg: number) => number, markAlongDeg: readonly number[], piece: Annulus, narrowRadiusMm?: number): Shape[] {
  const f = o.depthScale;
  const size = 2.6 * f;
  // Inside a narrow ring when it fits beyond the band, else at the usual depth (past its edge).
  const deepest = o.maxDepthMm / Math.max(f, 1e-6) - 2.9;
  const sideDepth = deepest >= o.depths.bandTo + 0.5 ? Math.min(o.depths.sideLabel, deepest) : o.depths.sideLabel;
  const sideRadiusMm = Math.max(o.edgeRadiusMm + (o.towards === 'centre' ? -1 : 1) * sideDepth * f, 1e-6);
  // Half the side label's length plus a mark label's thickness and a gap, as an angle at its radius.
  const clearDeg = (((textWidthMm('BTDC side', size) / 2 + o.depths.labelSize * f + 0.8) / sideRadiusMm) * 180) / Math.PI;
  const place = (crankDeg: number, label: string, role: string): Shape[] => {
    const along = alongRotationDeg(crankDeg, o.carrier);
    if (narrowRadiusMm !== undefined) {
      const fitted = tangentialText(label, size, angle(along), narrowRadiusMm, piece, { weight: 'bold', data: { role, crankDeg } });
      return fitted ? [fitted] : [];
    }
    const [x, y] = at(along, crankDeg === 180 ? o.depths.labelFrom + 1 : sideDepth);
    const theta = angle(along);
    const upright = theta > 90 && theta < 270 ? theta + 180 : theta;
    const shape = text(x, y, label, size, { anchor: 'middle', rotateDeg: upright, weight: 'bold', data: { role, crankDeg } });
    if (textInAnnulus(shape, piece)) return [shape];
    const fitted = tangentialText(label, size, theta, Math.hypot(x - o.centreMm[0], y - o.centreMm[1]), piece, { weight: 'bold', data: { role, crankDeg } });
    return fitted ? [fitted] : [];
  };
  return [
    ...place(sideLabelCrankDeg(270, markAlongDeg, o.carrier, clearDeg), 'BTDC side', 'btdc-side'),
    ...place(sideLabelCrankDeg(90, markAlongDeg, o.carrier, clearDeg), 'ATDC side', 'atdc-side'),
    ...place(180, 'BDC', 'bdc-label'),
  ];
}

/** A curved arrow over BDC ± 14° (TDC side is busy with advance marks), pointing the way the flywheel turns as seen. */
function rotationArrow(o: PolarScaleOptions, radiusMm: number): Shape[] {
  const f = o.depthScale;
  const spanDeg = 14;
  const from = o.rotation === 'cw' ? 180 - spanDeg : 180 + spanDeg;
  const to = o.rotation === 'cw' ? 180 + spanDeg : 180 - spanDeg;
  const steps = 28;
  const points: Array<[number, number]> = [];
  for (let i = 0; i <= steps; i += 1) points.push(polarPointMm(o.centreMm, radiusMm, from + ((to - from) * i) / steps));
  const tail = points[steps - 1]!;
  const tip = polarPointMm(o.centreMm, radiusMm, to + (o.rotation === 'cw' ? 3 : -3));
  const [, head] = arrow(tail[0], tail[1], tip[0], tip[1], 2.2 * f, { role: 'rotation-arrow' });
  const label = o.rotation === 'cw' ? 'turns clockwise' : 'turns counter-clockwise';
  const labelAt = polarPointMm(o.centreMm, radiusMm + (o.towards === 'centre' ? -3.2 : 4.5) * f, 180);
  return [
    path(points, false, 'none', STROKE_MM.outline, { role: 'rotation-arrow' }),
    head,
    text(labelAt[0], labelAt[1], label, 2 * f, { anchor: 'middle', data: { role: 'rotation-label' } }),
  ];
}

/** The piece the scale is printed on: the disc less its hub (wheel) or the ring, as labels may use it. */
function pieceAnnulus(o: PolarScaleOptions): Annulus {
  const far = o.towards === 'centre' ? o.edgeRadiusMm - o.maxDepthMm : o.edgeRadiusMm + o.maxDepthMm;
  return { centreMm: o.centreMm, innerMm: Math.max(0, Math.min(o.edgeRadiusMm, far)), outerMm: Math.max(o.edgeRadiusMm, far) };
}

/**
 * The rotation arrow on a narrow ring: in the label zone beyond the band, its words centred on BDC
 * and the arrow running on from their end the way the flywheel turns, both inside the ring.
 */
function narrowRotationArrow(o: PolarScaleOptions, radius: (depthMm: number) => number, piece: Annulus): { shapes: Shape[]; blocked: AlongInterval[] } {
  const f = o.depthScale;
  const zoneFrom = o.depths.labelFrom;
  const zoneTo = o.maxDepthMm / Math.max(f, 1e-6);
  const mid = radius((zoneFrom + Math.max(zoneFrom, zoneTo)) / 2);
  const label = o.rotation === 'cw' ? 'turns clockwise' : 'turns counter-clockwise';
  const words = tangentialText(label, 2 * f, 180, mid, piece, { data: { role: 'rotation-label' } });
  const halfWordsDeg = words ? ((textWidthMm(label, words.sizeMm) / 2 + 0.8) / Math.max(mid, 1e-6)) * (180 / Math.PI) : 2;
  const spanDeg = Math.min(20, Math.max(8, (12 / Math.max(mid, 1e-6)) * (180 / Math.PI)));
  const dir = o.rotation === 'cw' ? 1 : -1;
  const from = 180 + dir * halfWordsDeg;
  const to = from + dir * spanDeg;
  const steps = 16;
  const points: Array<[number, number]> = [];
  for (let i = 0; i <= steps; i += 1) points.push(polarPointMm(o.centreMm, mid, from + ((to - from) * i) / steps));
  const tail = points[steps - 2]!;
  const tip = points[steps]!;
  const [, head] = arrow(tail[0], tail[1], tip[0], tip[1], Math.min(2.2 * f, Math.hypot(tip[0] - tail[0], tip[1] - tail[1])), { role: 'rotation-arrow' });
  const reachDeg = halfWordsDeg + spanDeg;
  return {
    shapes: [path(points.slice(0, steps - 1), false, 'none', STROKE_MM.outline, { role: 'rotation-arrow' }), head, ...(words ? [words] : [])],
    blocked: [{ fromAlongDeg: 180 - reachDeg, toAlongDeg: 180 + reachDeg }],
  };
}

/** A filled wedge on the target mark, its point on the reading edge: the figure the engine is set to. */
function targetWedge(o: PolarScaleOptions, alongDeg: number, at: At): Shape {
  const f = o.depthScale;
  const depth = o.strobe ? 6 : 3.5;
  const halfDeg = (((o.strobe ? 2.2 : 1.1) * f) / Math.max(o.edgeRadiusMm, 1e-6)) * (180 / Math.PI);
  return path([at(alongDeg, 0), at(alongDeg - halfDeg, depth), at(alongDeg + halfDeg, depth)], true, 'black', STROKE_MM.fine, { role: 'target-wedge' });
}

/** The advance band's range in words ("16–20° BTDC"), along the circle just past the band's far end, in the band's zone. */
function bandLabel(o: PolarScaleOptions, band: AlongInterval, radius: (depthMm: number) => number, angle: (alongDeg: number) => number, piece: Annulus): Shape[] {
  const [lo, hi] = o.bandDeg ?? [0, 0];
  if (!(hi > lo)) return [];
  const words = `${formatDeg(lo)}–${formatDeg(hi)}° BTDC`;
  const size = 2 * o.depthScale;
  const r = radius((o.depths.bandFrom + o.depths.bandTo) / 2);
  const halfDeg = ((textWidthMm(words, size) / 2 + 1) / Math.max(r, 1e-6)) * (180 / Math.PI);
  // Past whichever end lies farther from TDC, so the label stays clear of the TDC pointer.
  const farEnd = Math.abs(((band.toAlongDeg + 180) % 360) - 180) >= Math.abs(((band.fromAlongDeg + 180) % 360) - 180) ? band.toAlongDeg + halfDeg : band.fromAlongDeg - halfDeg;
  const shape = tangentialText(words, size, angle(farEnd), r, piece, { weight: 'bold', data: { role: 'band-label' } });
  return shape ? [shape] : [];
}
