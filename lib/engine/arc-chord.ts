import { sinDeg } from '../angle';

/** Arc length along a circle of `diameterMm` from TDC to `angleDeg`: π·D·θ/360. */
export function arcLengthMm(diameterMm: number, angleDeg: number): number {
  return (Math.PI * diameterMm * angleDeg) / 360;
}

/** Straight-line (divider) distance between the TDC mark and `angleDeg` on a circle of `diameterMm`: D·sin(θ/2). */
export function chordLengthMm(diameterMm: number, angleDeg: number): number {
  return diameterMm * sinDeg(angleDeg / 2);
}
