import { crankAnglesFromDropMm, offsetPistonDropMm, type OffsetCrankGeometry } from './offset-slider-crank';

/**
 * Ignition timing quoted either way: millimetres of piston travel before TDC or
 * crank degrees before TDC. x° BTDC is crank angle 360 − x, and without a
 * wrist-pin offset the piston stands at the same height x° either side of TDC; with one,
 * the up-stroke (before TDC) is the one that counts for ignition timing.
 */

export function btdcMmFromBtdcDeg({ btdcDeg, ...geometry }: OffsetCrankGeometry & { btdcDeg: number }): number {
  return offsetPistonDropMm({ ...geometry, crankDeg: 360 - btdcDeg });
}

export function btdcDegFromBtdcMm({ btdcMm, ...geometry }: OffsetCrankGeometry & { btdcMm: number }): number {
  return crankAnglesFromDropMm({ ...geometry, dropMm: btdcMm }).crankDegBTDC;
}
