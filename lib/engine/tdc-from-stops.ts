import { normalizeDeg } from '../angle';

/**
 * TDC from two positive-stop readings. The piston touches the stop at equal crank
 * angles either side of TDC, so TDC lies midway between the two readings (common
 * practice), on the shorter arc between them: a stop always touches the piston
 * nearer TDC than BDC. Equivalently, the workshop habit: read the sweep from one
 * stop to the other and halve it (common practice).
 *
 * Readings are what the pointer shows on the printed wheel:
 * - `full` numbering: 0–360 in crank order (360 is the same mark as 0);
 * - `split` numbering: 0–180 with a side, BTDC or ATDC (x° ATDC is crank order x,
 *   x° BTDC is crank order 360 − x).
 */

export const WHEEL_NUMBERINGS = ['full', 'split'] as const;
export type WheelNumbering = (typeof WHEEL_NUMBERINGS)[number];
export const STOP_SIDES = ['BTDC', 'ATDC'] as const;
export type StopSide = (typeof STOP_SIDES)[number];

export type StopReadings = {
  numbering: WheelNumbering;
  readingADeg: number;
  readingBDeg: number;
  readingASide?: StopSide;
  readingBSide?: StopSide;
};

export type TdcResult = {
  /** The wheel's reading at true TDC, in the wheel's own numbering (split: 0–180 with `tdcReadingSide`). */
  tdcReadingDeg: number;
  tdcReadingSide: StopSide | 'TDC' | null;
  /** The same reading in crank order, 0–360. */
  tdcCrankOrderDeg: number;
  /**
   * How far to move the pointer along the scale, with the crank held at TDC, so that
   * it reads 0: positive = toward higher crank-order numbers (ATDC side), negative =
   * toward lower ones (BTDC side). Equivalently turn the wheel on its shaft the other way.
   */
  correctionDeg: number;
  /** The sweep across TDC from one stop to the other. */
  sweepDeg: number;
  /** Where each stop touches the piston, degrees from TDC: half the sweep. */
  stopAngleDeg: number;
};

export function crankOrderDeg(readingDeg: number, numbering: WheelNumbering, side?: StopSide): number {
  if (numbering === 'full') return normalizeDeg(readingDeg);
  return side === 'BTDC' ? normalizeDeg(360 - readingDeg) : normalizeDeg(readingDeg);
}

/** Signed shortest turn from `fromDeg` to `toDeg`, in [−180, 180). */
export function signedTurnDeg(fromDeg: number, toDeg: number): number {
  return normalizeDeg(toDeg - fromDeg + 180) - 180;
}

/** Crank order 0–360 expressed as a signed angle from TDC, (−180, 180]: negative before TDC. */
export function fromTdcDeg(crankDeg: number): number {
  const wrapped = normalizeDeg(crankDeg);
  return wrapped > 180 ? wrapped - 360 : wrapped;
}

export function tdcFromStops(readings: StopReadings): TdcResult {
  const a = crankOrderDeg(readings.readingADeg, readings.numbering, readings.readingASide);
  const b = crankOrderDeg(readings.readingBDeg, readings.numbering, readings.readingBSide);
  const turn = signedTurnDeg(a, b);
  const sweepDeg = Math.abs(turn);
  if (sweepDeg >= 180)
    throw new RangeError('Readings A and B are 180° apart: the midpoint could be TDC or BDC; take both readings with the stop fitted');
  const tdcCrankOrderDeg = normalizeDeg(a + turn / 2);
  const signedTdc = fromTdcDeg(tdcCrankOrderDeg);
  return {
    ...wheelReading(tdcCrankOrderDeg, readings.numbering),
    tdcCrankOrderDeg,
    correctionDeg: signedTdc === 0 ? 0 : -signedTdc,
    sweepDeg,
    stopAngleDeg: sweepDeg / 2,
  };
}

function wheelReading(crankDeg: number, numbering: WheelNumbering): Pick<TdcResult, 'tdcReadingDeg' | 'tdcReadingSide'> {
  if (numbering === 'full') return { tdcReadingDeg: crankDeg, tdcReadingSide: null };
  const signed = fromTdcDeg(crankDeg);
  if (signed === 0) return { tdcReadingDeg: 0, tdcReadingSide: 'TDC' };
  return { tdcReadingDeg: Math.abs(signed), tdcReadingSide: signed < 0 ? 'BTDC' : 'ATDC' };
}
