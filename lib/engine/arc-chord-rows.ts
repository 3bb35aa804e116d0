import { arcLengthMm, chordLengthMm } from './arc-chord';

export type ArcChordRow = { angleDeg: number; arcMm: number; chordMm: number };

/** One row per angle: the distance from TDC along the rim (arc) and straight across (chord, for dividers). */
export function arcChordRows({ diameterMm, anglesDeg }: { diameterMm: number; anglesDeg: number[] }): ArcChordRow[] {
  return anglesDeg.map((angleDeg) => ({
    angleDeg,
    arcMm: arcLengthMm(diameterMm, angleDeg),
    chordMm: chordLengthMm(diameterMm, angleDeg),
  }));
}
