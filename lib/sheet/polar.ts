import { cosDeg, sinDeg } from '../angle';

/** A point at `radiusMm` from `centreMm`, `angleCwDeg` clockwise as seen (y down) from straight up. */
export function polarPointMm(centreMm: readonly [number, number], radiusMm: number, angleCwDeg: number): [number, number] {
  return [centreMm[0] + radiusMm * sinDeg(angleCwDeg), centreMm[1] - radiusMm * cosDeg(angleCwDeg)];
}
