import type { GraduationLevel, Shape } from './drawing';
import { arcLengthMm } from '../engine/arc-chord';
import { chooseLevels } from './graduations';
import { polarDepths, polarScaleShapes, TICK_DEPTH_MM, type PolarDepths, type PolarStrobe } from './polar-scale';
import { numberStrideFor, scaleMarks } from './scale-marks';
import type { SheetRequest } from './sheet-request';
import { circle, line } from './shapes';
import { forEachTextCornerMm } from './bounds';
import { howToInCircle, howToSteps } from './how-to';
import { STROKE_MM, textWidthMm } from './sheet-style';
import {
  chooseStrobeFit,
  coarsenForStrobe,
  pitchLimitedSizeMm,
  placeStrobe,
  roomOf,
  strobeRangeBtdcDeg,
  strobeSummary,
  strobeZoneMm,
  STROBE_NUMERAL_MM,
  type StrobeFit,
  type StrobeNumeral,
  type StrobeOrientation,
} from './strobe';

/** Degree wheels (ticks inward from the cut edge) and flange rings (ticks outward from the inner edge). */

/** `howToOnPiece`: the "how to use" steps are drawn in the free middle (else the info panel carries them). */
export type PolarLayout = { shapes: Shape[]; centreMm: [number, number]; keptLevels: GraduationLevel[]; warnings: string[]; howToOnPiece: boolean; strobeSummary?: string };

const MIN_DEPTH_SCALE = 0.02;

/** Ticks, numerals, band and one lane of mark labels inside the annulus. */
function ringScaleDepthMm(depths: PolarDepths): number {
  return depths.labelFrom + depths.labelSize * 1.2 + 0.5;
}

function clampScale(value: number): number {
  return Math.min(1, Math.max(MIN_DEPTH_SCALE, value));
}

/** Where a polar scale is printed and how much depth it has: `depthScaleFor` shrinks a depth plan into the piece. */
type PolarPiece = {
  name: 'wheel' | 'ring';
  edgeRadiusMm: number;
  towards: 'centre' | 'outside';
  where: string;
  maxDepthMm: number;
  depthScaleFor: (depths: PolarDepths) => number;
  /** The piece's depth (disc less hub, or ring width), mm, for the notes. */
  depthMm: number;
};

type PolarPlan = { depths: PolarDepths; depthScale: number; fit?: StrobeFit; warnings: string[] };

/**
 * The depth plan of a polar scale: the usual one, or with the strobe figures' zone after the ticks,
 * its figures chosen by what the piece's depth and circumference allow (strobe.ts).
 */
function polarPlan(req: SheetRequest, piece: PolarPiece): PolarPlan {
  const plain = polarDepths();
  if (!req.strobeReadable) return { depths: plain, depthScale: piece.depthScaleFor(plain), warnings: [] };
  const sign = piece.towards === 'centre' ? -1 : 1;
  // Where the figures come nearest the centre, their pitch is smallest.
  const innerRadius = (depths: PolarDepths, f: number) => piece.edgeRadiusMm + sign * (sign < 0 ? depths.strobeTo : depths.strobeFrom) * f;
  const fullZone = (orientation: StrobeOrientation, numerals: readonly StrobeNumeral[]) => polarDepths(strobeZoneMm(numerals, orientation, STROBE_NUMERAL_MM));
  const choice = chooseStrobeFit(strobeRangeBtdcDeg(req), req.numbering, (stepDeg, orientation, numerals) => {
    const depths = fullZone(orientation, numerals);
    const f = piece.depthScaleFor(depths);
    const pitchMm = arcLengthMm(2 * Math.max(0, innerRadius(depths, f)), stepDeg);
    const neededMm = piece.name === 'ring' ? ringScaleDepthMm(depths) : depths.total;
    return roomOf(
      STROBE_NUMERAL_MM * f,
      `the ${piece.name} is only ${piece.depthMm.toFixed(1)} mm ${piece.name === 'ring' ? 'wide' : 'from edge to hub'}, and full-size figures need ${neededMm.toFixed(1)} mm`,
      pitchLimitedSizeMm(numerals, orientation, pitchMm),
      `${stepDeg}° is only ${pitchMm.toFixed(1)} mm round the scale ${piece.where}`,
    );
  });
  if (!choice.fit) return { depths: plain, depthScale: piece.depthScaleFor(plain), warnings: choice.warnings };
  const { fit } = choice;
  // The zone for the size chosen (at full size): a smaller figure needs less depth, which only helps.
  const firstScale = piece.depthScaleFor(fullZone(fit.orientation, fit.numerals));
  const depths = polarDepths(strobeZoneMm(fit.numerals, fit.orientation, fit.sizeMm / firstScale));
  return { depths, depthScale: piece.depthScaleFor(depths), fit, warnings: choice.warnings };
}

function polarScale(req: SheetRequest, piece: PolarPiece) {
  const { edgeRadiusMm, towards, where, maxDepthMm } = piece;
  const plan = polarPlan(req, piece);
  const depthScale = plan.depthScale;
  const choice = chooseLevels(arcLengthMm(2 * edgeRadiusMm, 1), req.minPitchMm, where);
  const numeralRadius = edgeRadiusMm + (towards === 'centre' ? -1 : 1) * (TICK_DEPTH_MM[10] + 2.4) * depthScale;
  const numeralWidthMm = textWidthMm('180', plan.depths.numeralSize * depthScale);
  const stride = numberStrideFor(arcLengthMm(2 * numeralRadius, 10), numeralWidthMm);
  const numberClearDeg = Math.max(1.5, (numeralWidthMm / 2 + 0.4) / Math.max(arcLengthMm(2 * numeralRadius, 1), 1e-6));
  const warnings = [...choice.warnings, ...plan.warnings];
  let marks = scaleMarks({
    range: 'turn',
    carrier: req.carrier,
    numbering: req.numbering,
    finestLevel: choice.finestLevel,
    numberStride: stride,
    advanceMarksDeg: req.advanceMarksDeg,
    ...(req.targetAdvanceDeg !== undefined ? { targetAdvanceDeg: req.targetAdvanceDeg } : {}),
    ...(req.advanceBandDeg ? { advanceBandDeg: req.advanceBandDeg } : {}),
    portEvents: req.portEvents,
    numberClearDeg,
  });
  let strobe: PolarStrobe | undefined;
  if (plan.fit) {
    const placed = placeStrobe(plan.fit, 'turn', req.carrier);
    marks = coarsenForStrobe(marks, placed, numberClearDeg, true);
    strobe = { fit: plan.fit, placed };
  }
  const shapes = polarScaleShapes({
    centreMm: [0, 0],
    edgeRadiusMm,
    towards,
    depthScale,
    rotation: req.rotation,
    carrier: req.carrier,
    marks,
    bandFill: 'hatch',
    ...(req.advanceBandDeg ? { bandDeg: [Math.min(...req.advanceBandDeg), Math.max(...req.advanceBandDeg)] as const } : {}),
    depths: plan.depths,
    ...(strobe ? { strobe } : {}),
    maxDepthMm,
  });
  return { shapes, keptLevels: choice.keptLevels, warnings, ...(plan.fit ? { strobeSummary: strobeSummary(plan.fit) } : {}) };
}

/** A wheel centred on (0, 0): cut circle, optional hub hole, centre cross with a 1 mm ring, the scale. */
export function wheelLayout(req: SheetRequest): PolarLayout {
  const radiusMm = (req.diameterMm ?? 0) / 2;
  const hubRadiusMm = Math.min(req.hubHoleMm / 2, radiusMm);
  const scale = polarScale(req, {
    name: 'wheel',
    edgeRadiusMm: radiusMm,
    towards: 'centre',
    where: 'at this diameter',
    maxDepthMm: radiusMm - hubRadiusMm - 1,
    depthScaleFor: (depths) => clampScale((radiusMm - hubRadiusMm) / depths.total),
    depthMm: radiusMm - hubRadiusMm,
  });
  const crossMm = Math.min(5, radiusMm * 0.3);
  const shapes: Shape[] = [
    circle(0, 0, radiusMm, STROKE_MM.outline, { role: 'cut-line' }),
    line(-crossMm, 0, crossMm, 0, STROKE_MM.fine, { role: 'centre-cross' }),
    line(0, -crossMm, 0, crossMm, STROKE_MM.fine, { role: 'centre-cross' }),
    circle(0, 0, 0.5, STROKE_MM.fine, { role: 'centre-ring' }),
  ];
  if (hubRadiusMm > 0) shapes.push(circle(0, 0, hubRadiusMm, STROKE_MM.outline, { role: 'hub-hole' }));
  shapes.push(...scale.shapes);
  // The steps go in the blank middle of the scale, below the centre cross or hub hole, when they fit.
  const howTo = howToInCircle(howToSteps(req), [0, 0], nearestInkMm(scale.shapes) - 1.5, Math.max(crossMm, hubRadiusMm) + 1.5);
  if (howTo) shapes.push(...howTo);
  return { shapes, centreMm: [0, 0], keptLevels: scale.keptLevels, warnings: scale.warnings, howToOnPiece: howTo !== undefined, ...summaryOf(scale) };
}

const summaryOf = (scale: { strobeSummary?: string }) => (scale.strobeSummary ? { strobeSummary: scale.strobeSummary } : {});

/** A flange ring centred on (0, 0): two cut circles, ticks outward from the inner edge where the flywheel mark reads. */
export function ringLayout(req: SheetRequest): PolarLayout {
  const innerRadiusMm = (req.innerDiameterMm ?? 0) / 2;
  const outerRadiusMm = Math.max((req.outerDiameterMm ?? 0) / 2, innerRadiusMm);
  const scale = polarScale(req, {
    name: 'ring',
    edgeRadiusMm: innerRadiusMm,
    towards: 'outside',
    where: 'at the inner diameter',
    maxDepthMm: outerRadiusMm - innerRadiusMm - 0.15,
    depthScaleFor: (depths) => clampScale((outerRadiusMm - innerRadiusMm) / ringScaleDepthMm(depths)),
    depthMm: outerRadiusMm - innerRadiusMm,
  });
  const shapes: Shape[] = [
    circle(0, 0, outerRadiusMm, STROKE_MM.outline, { role: 'cut-line' }),
    circle(0, 0, innerRadiusMm, STROKE_MM.outline, { role: 'cut-line-inner' }),
    ...scale.shapes,
  ];
  // The hole is cut away, so the steps may fill it: read before cutting.
  const howTo = howToInCircle(howToSteps(req), [0, 0], innerRadiusMm - 2, 0);
  if (howTo) shapes.push(...howTo);
  return { shapes, centreMm: [0, 0], keptLevels: scale.keptLevels, warnings: scale.warnings, howToOnPiece: howTo !== undefined, ...summaryOf(scale) };
}

/** How near to the centre (0, 0) any of the scale's ink comes. */
function nearestInkMm(shapes: readonly Shape[]): number {
  let nearestSq = Infinity;
  const consider = (x: number, y: number) => {
    nearestSq = Math.min(nearestSq, x * x + y * y);
  };
  for (const shape of shapes) {
    if (shape.type === 'line') {
      consider(shape.x1Mm, shape.y1Mm);
      consider(shape.x2Mm, shape.y2Mm);
    } else if (shape.type === 'text') forEachTextCornerMm(shape, consider);
    else if (shape.type === 'path') for (const [x, y] of shape.pointsMm) consider(x, y);
  }
  return Math.sqrt(nearestSq);
}
