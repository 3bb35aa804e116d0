/** The one place radians appear. Everything else speaks degrees. */
export const FULL_TURN_DEG = 360;

export function degToRad(deg: number): number {
  return (deg * Math.PI) / 180;
}

export function radToDeg(rad: number): number {
  return (rad * 180) / Math.PI;
}

/** Wraps any angle into [0, 360). */
export function normalizeDeg(deg: number): number {
  const wrapped = deg % FULL_TURN_DEG;
  return wrapped < 0 ? wrapped + FULL_TURN_DEG : wrapped === 0 ? 0 : wrapped;
}

export function sinDeg(deg: number): number {
  return Math.sin(degToRad(deg));
}

export function cosDeg(deg: number): number {
  return Math.cos(degToRad(deg));
}

/** The angle of the point (x, y) in degrees, (−180, 180]: Math.atan2 with the answer in degrees. */
export function atan2Deg(y: number, x: number): number {
  return radToDeg(Math.atan2(y, x));
}
