import { normalizeDeg } from '../angle';

/**
 * The one place that decides where a crank angle sits on a scale (DEVELOPERS.md, "Rotation and carrier").
 * crankDeg: 0 = TDC, increasing the way the engine turns; x° BTDC = 360 − x.
 * A rotating carrier (disc or strip on the flywheel, fixed pointer) has its BTDC
 * marks from TDC in the direction of rotation; a stationary one (ring on the
 * flange, strip on the casing, read against the flywheel's mark) against it.
 * Wheels and strips share this; they differ only by the final transform.
 */

export type Rotation = 'cw' | 'ccw';
export type Carrier = 'rotating' | 'stationary';
export type ScaleSense = { rotation: Rotation; carrier: Carrier };

/** Degrees from TDC measured in the direction the flywheel turns (unwrapped). */
export function alongRotationDeg(crankDeg: number, carrier: Carrier): number {
  return carrier === 'rotating' ? -crankDeg : crankDeg;
}

/** Inverse of alongRotationDeg, wrapped into [0, 360). */
export function crankFromAlongDeg(alongDeg: number, carrier: Carrier): number {
  return normalizeDeg(carrier === 'rotating' ? -alongDeg : alongDeg);
}

/** Polar transform: angle clockwise as seen (y down) from TDC at the top of a wheel or ring, [0, 360). */
export function wheelAngleDeg(crankDeg: number, sense: ScaleSense): number {
  return wheelAngleFromAlongDeg(alongRotationDeg(crankDeg, sense.carrier), sense.rotation);
}

/** The polar transform applied to an along-rotation angle (cw as seen from TDC at the top). */
export function wheelAngleFromAlongDeg(alongDeg: number, rotation: Rotation): number {
  return normalizeDeg(rotation === 'cw' ? alongDeg : -alongDeg);
}

/**
 * Linear transform: a strip's printed arrow points the way the flywheel turns, so
 * +x along the strip is +along; no cw/ccw mirror is needed (the arrow carries it).
 */
export function stripXMm(alongDeg: number, startAlongDeg: number, mmPerDeg: number): number {
  return (alongDeg - startAlongDeg) * mmPerDeg;
}

export function btdcToCrankDeg(btdcDeg: number): number {
  return normalizeDeg(360 - btdcDeg);
}

/** Integer crank index in half degrees [0, 720) for an along index in half degrees. */
export function crankIndexFromAlongIndex(alongIndex: number, carrier: Carrier): number {
  // Whole-number arithmetic throughout (no −0, no floating remainder): the hot loops of every scale call this.
  const raw = (carrier === 'rotating' ? -alongIndex : alongIndex) | 0;
  return ((raw % 720) + 720) % 720;
}
