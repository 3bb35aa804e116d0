import { atan2Deg, normalizeDeg, sinDeg } from '../angle';

/**
 * Slider-crank kinematics of a piston engine without wrist-pin offset.
 * Heywood, Internal Combustion Engine Fundamentals, eq. 2.5: the distance from
 * the crank axis to the wrist pin is s = a·cos θ + √(l² − a²·sin² θ), with
 * a = stroke / 2 (crank throw), l = con-rod length centre to centre, θ the
 * crank angle from TDC. Piston drop below TDC is (a + l) − s.
 */

export type CrankGeometry = { strokeMm: number; rodMm: number };

export function crankThrowMm(strokeMm: number): number {
  return strokeMm / 2;
}

/** Why the geometry cannot turn, or null when it can. Messages name the field and its range. */
export function crankGeometryProblem({ strokeMm, rodMm }: CrankGeometry): { field: 'strokeMm' | 'rodMm'; message: string } | null {
  if (!(strokeMm > 0) || !Number.isFinite(strokeMm))
    return { field: 'strokeMm', message: 'Stroke must be a positive length in mm' };
  const throwMm = crankThrowMm(strokeMm);
  if (!(rodMm > throwMm) || !Number.isFinite(rodMm))
    return {
      field: 'rodMm',
      message: `Con-rod length must be longer than the crank throw, half the stroke (more than ${throwMm} mm)`,
    };
  return null;
}

function assertGeometry(geometry: CrankGeometry): void {
  const problem = crankGeometryProblem(geometry);
  if (problem) throw new RangeError(problem.message);
}

/**
 * Piston drop below TDC in mm at `crankDeg` (any angle; 0 = TDC, 180 = BDC).
 * (a + l) − s from eq. 2.5, rearranged as 2a·sin²(θ/2) + a²sin²θ / (l + √(l² − a²sin²θ))
 * so that nothing cancels near TDC: the same value, without losing digits.
 */
export function pistonDropMm({ strokeMm, rodMm, crankDeg }: CrankGeometry & { crankDeg: number }): number {
  assertGeometry({ strokeMm, rodMm });
  if (!Number.isFinite(crankDeg)) throw new RangeError('Crank angle must be a number of degrees');
  const throwMm = crankThrowMm(strokeMm);
  const halfAngleSin = sinDeg(normalizeDeg(crankDeg) / 2);
  const sideways = throwMm * sinDeg(crankDeg);
  const crankPart = 2 * throwMm * halfAngleSin * halfAngleSin;
  const rodPart = (sideways * sideways) / (rodMm + Math.sqrt(rodMm * rodMm - sideways * sideways));
  return crankPart + rodPart;
}

/**
 * Exact inverse: the crank angle from TDC, 0–180°, at which the piston has dropped
 * `dropMm` (the same angle before and after TDC). With s = a + l − drop, eq. 2.5 gives
 * the crank–rod triangle (sides a, l, s; θ at the crank axis, opposite l), so
 * cos θ = (s² + a² − l²) / 2as. It is evaluated in the half-angle form
 * tan(θ/2) = √((p − a)(p − s) / (p(p − l))), p = (a + l + s)/2, whose factors are
 * drop/2 and (stroke − drop)/2: exact at TDC and BDC, where acos loses digits.
 */
export function crankDegFromDropMm({ strokeMm, rodMm, dropMm }: CrankGeometry & { dropMm: number }): number {
  assertGeometry({ strokeMm, rodMm });
  if (!(dropMm >= 0 && dropMm <= strokeMm))
    throw new RangeError(`Piston drop must be within the stroke (allowed 0–${strokeMm} mm)`);
  const throwMm = crankThrowMm(strokeMm);
  const pMinusS = dropMm / 2;
  const pMinusL = (strokeMm - dropMm) / 2;
  const pMinusA = rodMm - dropMm / 2;
  const p = throwMm + rodMm - dropMm / 2;
  return 2 * atan2Deg(Math.sqrt(pMinusA * pMinusS), Math.sqrt(p * pMinusL));
}
