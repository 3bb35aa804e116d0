import type { GraduationLevel, Shape } from './drawing';
import { arcLengthMm } from '../engine/arc-chord';
import { chooseLevels } from './graduations';
import { polarScaleShapes, POLAR_DEPTH_MM, TICK_DEPTH_MM } from './polar-scale';
import { numberStrideFor, scaleMarks } from './scale-marks';
import type { SheetRequest } from './sheet-request';
import { circle, line } from './shapes';
import { textCornersMm } from './bounds';
import { howToInCircle, howToSteps } from './how-to';
import { STROKE_MM, textWidthMm } from './sheet-style';

/** Degree wheels (ticks inward from the cut edge) and flange rings (ticks outward from the inner edge). */

/** `howToOnPiece`: the "how to use" steps are drawn in the free middle (else the info panel carries them). */
export type PolarLayout = { shapes: Shape[]; centreMm: [number, number]; keptLevels: GraduationLevel[]; warnings: string[]; howToOnPiece: boolean };

const MIN_DEPTH_SCALE = 0.02;
// Ticks, numerals, band and one lane of mark labels inside the annulus.
const RING_SCALE_DEPTH_MM = POLAR_DEPTH_MM.labelFrom + POLAR_DEPTH_MM.labelSize * 1.2 + 0.5;

function clampScale(value: number): number {
  return Math.min(1, Math.max(MIN_DEPTH_SCALE, value));
}

function polarScale(req: SheetRequest, edgeRadiusMm: number, towards: 'centre' | 'outside', depthScale: number, where: string, maxDepthMm: number) {
  const choice = chooseLevels(arcLengthMm(2 * edgeRadiusMm, 1), req.minPitchMm, where);
  const numeralRadius = edgeRadiusMm + (towards === 'centre' ? -1 : 1) * (TICK_DEPTH_MM[10] + 2.4) * depthScale;
  const numeralWidthMm = textWidthMm('180', POLAR_DEPTH_MM.numeralSize * depthScale);
  const stride = numberStrideFor(arcLengthMm(2 * numeralRadius, 10), numeralWidthMm);
  const numberClearDeg = Math.max(1.5, (numeralWidthMm / 2 + 0.4) / Math.max(arcLengthMm(2 * numeralRadius, 1), 1e-6));
  const warnings = [...choice.warnings];
  const marks = scaleMarks({
    range: 'turn',
    carrier: req.carrier,
    numbering: req.numbering,
    finestLevel: choice.finestLevel,
    numberStride: stride,
    advanceMarksDeg: req.advanceMarksDeg,
    ...(req.advanceBandDeg ? { advanceBandDeg: req.advanceBandDeg } : {}),
    portEvents: req.portEvents,
    numberClearDeg,
  });
  const shapes = polarScaleShapes({
    centreMm: [0, 0],
    edgeRadiusMm,
    towards,
    depthScale,
    rotation: req.rotation,
    carrier: req.carrier,
    marks,
    bandFill: 'hatch',
    maxDepthMm,
  });
  return { shapes, keptLevels: choice.keptLevels, warnings };
}

/** A wheel centred on (0, 0): cut circle, optional hub hole, centre cross with a 1 mm ring, the scale. */
export function wheelLayout(req: SheetRequest): PolarLayout {
  const radiusMm = (req.diameterMm ?? 0) / 2;
  const hubRadiusMm = Math.min(req.hubHoleMm / 2, radiusMm);
  const depthScale = clampScale((radiusMm - hubRadiusMm) / POLAR_DEPTH_MM.total);
  const scale = polarScale(req, radiusMm, 'centre', depthScale, 'at this diameter', radiusMm - hubRadiusMm - 1);
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
  return { shapes, centreMm: [0, 0], keptLevels: scale.keptLevels, warnings: scale.warnings, howToOnPiece: howTo !== undefined };
}

/** A flange ring centred on (0, 0): two cut circles, ticks outward from the inner edge where the flywheel mark reads. */
export function ringLayout(req: SheetRequest): PolarLayout {
  const innerRadiusMm = (req.innerDiameterMm ?? 0) / 2;
  const outerRadiusMm = Math.max((req.outerDiameterMm ?? 0) / 2, innerRadiusMm);
  const depthScale = clampScale((outerRadiusMm - innerRadiusMm) / RING_SCALE_DEPTH_MM);
  const scale = polarScale(req, innerRadiusMm, 'outside', depthScale, 'at the inner diameter', outerRadiusMm - innerRadiusMm - 0.15);
  const shapes: Shape[] = [
    circle(0, 0, outerRadiusMm, STROKE_MM.outline, { role: 'cut-line' }),
    circle(0, 0, innerRadiusMm, STROKE_MM.outline, { role: 'cut-line-inner' }),
    ...scale.shapes,
  ];
  // The hole is cut away, so the steps may fill it: read before cutting.
  const howTo = howToInCircle(howToSteps(req), [0, 0], innerRadiusMm - 2, 0);
  if (howTo) shapes.push(...howTo);
  return { shapes, centreMm: [0, 0], keptLevels: scale.keptLevels, warnings: scale.warnings, howToOnPiece: howTo !== undefined };
}

/** How near to the centre (0, 0) any of the scale's ink comes. */
function nearestInkMm(shapes: readonly Shape[]): number {
  let nearest = Infinity;
  for (const shape of shapes) {
    const points: Array<readonly [number, number]> =
      shape.type === 'text' ? textCornersMm(shape) : shape.type === 'line' ? [[shape.x1Mm, shape.y1Mm], [shape.x2Mm, shape.y2Mm]] : shape.type === 'path' ? shape.pointsMm : [];
    for (const [x, y] of points) nearest = Math.min(nearest, Math.hypot(x, y));
  }
  return nearest;
}
