import { atan2Deg, cosDeg, normalizeDeg, sinDeg } from '../angle';
import { crankDegFromDropMm, crankGeometryProblem, crankThrowMm, pistonDropMm, type CrankGeometry } from './slider-crank';

/**
 * Slider-crank with a wrist-pin (gudgeon-pin) offset: the offset, or eccentric, slider-crank
 * of mechanism kinematics (R. L. Norton, Design of Machinery, position analysis of the
 * offset slider-crank; equation numbers not quoted, from memory).
 *
 * Crank axis at the origin, y up the bore. φ is the crank angle from the cylinder axis in the
 * direction of rotation, so the crank pin sits at (a·sin φ, a·cos φ). The wrist pin runs on the
 * line x = e: POSITIVE e lies on the side the crank pin swings to just after TDC (the side it
 * passes on the down-stroke). Pin height above the crank axis:
 *   y(φ) = a·cos φ + √(l² − (a·sin φ − e)²)
 * TDC (y greatest, crank and rod in line): y_TDC = √((l + a)² − e²) at φ_TDC = asin(e / (l + a));
 * BDC (folded): y_BDC = √((l − a)² − e²) at φ_BDC = 180° + asin(e / (l − a)).
 * Rimscale keeps crankDeg = 0 at piston TDC (DEVELOPERS.md, "Angles"): crankDeg = φ − φ_TDC.
 * With e = 0 every function hands over to the centred-pin functions (Heywood eq. 2.5) unchanged.
 */

export const PIN_OFFSET_LIMIT_MM = 5;

export type OffsetCrankGeometry = CrankGeometry & { pinOffsetMm?: number };

type Problem = { field: 'strokeMm' | 'rodMm' | 'pinOffsetMm'; message: string };

/** Why the geometry cannot turn, or null when it can. Messages name the field and its range. */
export function offsetCrankGeometryProblem({ strokeMm, rodMm, pinOffsetMm = 0 }: OffsetCrankGeometry): Problem | null {
  const centred = crankGeometryProblem({ strokeMm, rodMm });
  if (centred) return centred;
  const range = `allowed -${PIN_OFFSET_LIMIT_MM} to ${PIN_OFFSET_LIMIT_MM} mm`;
  if (!Number.isFinite(pinOffsetMm) || Math.abs(pinOffsetMm) > PIN_OFFSET_LIMIT_MM)
    return { field: 'pinOffsetMm', message: `Wrist-pin offset must be a length in mm, ${range}` };
  const lockMm = rodMm - crankThrowMm(strokeMm);
  if (Math.abs(pinOffsetMm) >= lockMm)
    return {
      field: 'pinOffsetMm',
      message: `Wrist-pin offset must be less than con-rod length minus crank throw (${roundMm(lockMm)} mm) either way, or the crank cannot pass BDC: allowed more than -${roundMm(Math.min(lockMm, PIN_OFFSET_LIMIT_MM))} and less than ${roundMm(Math.min(lockMm, PIN_OFFSET_LIMIT_MM))} mm`,
    };
  return null;
}

function assertGeometry(geometry: OffsetCrankGeometry): void {
  const problem = offsetCrankGeometryProblem(geometry);
  if (problem) throw new RangeError(problem.message);
}

/** The extreme pin heights, their crank angles φ from the cylinder axis, and the crank degrees of the down-stroke. */
export function deadCentres({ strokeMm, rodMm, pinOffsetMm = 0 }: OffsetCrankGeometry) {
  assertGeometry({ strokeMm, rodMm, pinOffsetMm });
  const a = crankThrowMm(strokeMm);
  const e = pinOffsetMm;
  const tdcHeightMm = Math.sqrt((rodMm + a) ** 2 - e * e);
  const bdcHeightMm = Math.sqrt((rodMm - a) ** 2 - e * e);
  // asin(e / h) written as atan2(e, √(h² − e²)): the angles in degrees without leaving lib/angle.
  const tdcPhiDeg = atan2Deg(e, tdcHeightMm);
  const bdcPhiDeg = 180 + atan2Deg(e, bdcHeightMm);
  return {
    tdcHeightMm,
    bdcHeightMm,
    tdcPhiDeg,
    bdcPhiDeg,
    /** Piston travel TDC to BDC: y_TDC − y_BDC, longer than twice the throw when e ≠ 0. */
    trueStrokeMm: e === 0 ? strokeMm : tdcHeightMm - bdcHeightMm,
    /** Crank degrees after TDC at which the piston reaches BDC (180° without offset). */
    bdcCrankDeg: e === 0 ? 180 : bdcPhiDeg - tdcPhiDeg,
  };
}

/**
 * Piston drop below TDC in mm at `crankDeg` after TDC (0 = TDC; 0–360 in crank order, so
 * x° BTDC is 360 − x). y_TDC − y(φ) is rearranged so nothing cancels near TDC:
 *   a(cos φ_T − cos φ) = 2a·sin((φ + φ_T)/2)·sin(θ/2),
 *   s_T − s = a(sin φ − sin φ_T)(a·sin φ + a·sin φ_T − 2e) / (s_T + s),  θ = φ − φ_T,
 * with s = √(l² − (a·sin φ − e)²) and s_T = l·y_TDC / (l + a) its TDC value.
 */
export function offsetPistonDropMm({ strokeMm, rodMm, crankDeg, pinOffsetMm = 0 }: OffsetCrankGeometry & { crankDeg: number }): number {
  if (pinOffsetMm === 0) return pistonDropMm({ strokeMm, rodMm, crankDeg });
  const { tdcHeightMm, tdcPhiDeg } = deadCentres({ strokeMm, rodMm, pinOffsetMm });
  if (!Number.isFinite(crankDeg)) throw new RangeError('Crank angle must be a number of degrees');
  const a = crankThrowMm(strokeMm);
  const e = pinOffsetMm;
  const thetaDeg = normalizeDeg(crankDeg);
  const phiDeg = tdcPhiDeg + thetaDeg;
  const meanDeg = tdcPhiDeg + thetaDeg / 2;
  const halfSin = sinDeg(thetaDeg / 2);
  const crankPart = 2 * a * sinDeg(meanDeg) * halfSin;
  const sideways = a * sinDeg(phiDeg) - e;
  const rodHeight = Math.sqrt(rodMm * rodMm - sideways * sideways);
  const tdcRodHeight = (rodMm * tdcHeightMm) / (rodMm + a);
  const sinDifference = 2 * cosDeg(meanDeg) * halfSin;
  const rodPart = (a * sinDifference * (a * sinDeg(phiDeg) + a * sinDeg(tdcPhiDeg) - 2 * e)) / (tdcRodHeight + rodHeight);
  return crankPart + rodPart;
}

export type CrankAngles = {
  /** Degrees after TDC on the down-stroke; kept for callers of the centred-pin answer. */
  crankDeg: number;
  /** Degrees after TDC at which the piston passes the drop going down. */
  crankDegATDC: number;
  /** Degrees before TDC at which the piston passes the drop coming up (crank order 360 − this). */
  crankDegBTDC: number;
};

/**
 * Exact inverse, closed form. The crank pin P = (a sin φ, a cos φ) lies l from the wrist pin
 * W = (e, y): |P − W|² = l² gives e·sin φ + y·cos φ = (a² + e² + y² − l²) / 2a = K, i.e.
 * R·cos(φ − ψ) = K with R = √(e² + y²), ψ = atan2(e, y); so φ = ψ ± acos(K / R), + on the
 * down-stroke. acos(K/R) = 2·atan2(√(R − K), √(R + K)), with
 *   R − K = (l + a − R)(l − a + R) / 2a,  R + K = (R + a − l)(R + a + l) / 2a,
 *   l + a − R = drop·(y_TDC + y) / (l + a + R),  R − (l − a) = (trueStroke − drop)(y + y_BDC) / (R + l − a),
 * so both ends of the stroke come out exact instead of through acos of a number near ±1.
 */
export function crankAnglesFromDropMm({ strokeMm, rodMm, dropMm, pinOffsetMm = 0 }: OffsetCrankGeometry & { dropMm: number }): CrankAngles {
  if (pinOffsetMm === 0) {
    const crankDeg = crankDegFromDropMm({ strokeMm, rodMm, dropMm });
    return { crankDeg, crankDegATDC: crankDeg, crankDegBTDC: crankDeg };
  }
  const centres = deadCentres({ strokeMm, rodMm, pinOffsetMm });
  const { tdcHeightMm, bdcHeightMm, tdcPhiDeg, trueStrokeMm } = centres;
  if (!(dropMm >= 0 && dropMm <= trueStrokeMm))
    throw new RangeError(`Piston drop must be within the stroke with this pin offset (allowed 0–${roundMm(trueStrokeMm)} mm)`);
  const a = crankThrowMm(strokeMm);
  const l = rodMm;
  const e = pinOffsetMm;
  const y = tdcHeightMm - dropMm;
  const r = Math.hypot(e, y);
  const belowTop = (dropMm * (tdcHeightMm + y)) / (l + a + r);
  const aboveBottom = ((trueStrokeMm - dropMm) * (y + bdcHeightMm)) / (r + l - a);
  const halfDeg = atan2Deg(Math.sqrt(belowTop * (l - a + r)), Math.sqrt(aboveBottom * (r + a + l)));
  const swingDeg = atan2Deg(e, y) - tdcPhiDeg; // ψ − φ_TDC: how far the rod's lean moves the centre of the two solutions
  // The clamps only absorb a last-digit overshoot at the dead centres.
  const crankDegATDC = clamp(2 * halfDeg + swingDeg, 0, centres.bdcCrankDeg);
  const crankDegBTDC = clamp(2 * halfDeg - swingDeg, 0, 360 - centres.bdcCrankDeg);
  return { crankDeg: crankDegATDC, crankDegATDC, crankDegBTDC };
}

function clamp(value: number, min: number, max: number): number {
  return Math.min(Math.max(value, min), max);
}

function roundMm(mm: number): number {
  return Number(mm.toFixed(3));
}
