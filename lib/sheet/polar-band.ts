import { arc } from 'd3-shape';
import { degToRad } from '../angle';
import { SamplingContext, type SampledPath } from './arc-context';

/**
 * An annular sector between two radii, from `fromCwDeg` to `toCwDeg` (clockwise as seen from the
 * top), drawn by d3-shape's `arc()` into a sampling context: d3 measures angles from 12 o'clock,
 * clockwise on a y-down page, which is exactly our convention.
 */
export function annularSectorMm(
  centreMm: readonly [number, number],
  innerRadiusMm: number,
  outerRadiusMm: number,
  fromCwDeg: number,
  toCwDeg: number,
): SampledPath[] {
  const context = new SamplingContext(centreMm);
  const generator = arc<null>()
    .innerRadius(innerRadiusMm)
    .outerRadius(outerRadiusMm)
    .startAngle(degToRad(Math.min(fromCwDeg, toCwDeg)))
    .endAngle(degToRad(Math.max(fromCwDeg, toCwDeg)))
    .context(context as unknown as CanvasRenderingContext2D);
  generator(null);
  return context.paths.filter((p) => p.pointsMm.length >= 2);
}
