import { crankDegFromDropMm, pistonDropMm, type CrankGeometry } from './slider-crank';

/**
 * Ignition timing quoted either way: millimetres of piston travel before TDC or
 * crank degrees before TDC. x° BTDC is crank angle 360 − x, and without a
 * wrist-pin offset the piston stands at the same height x° either side of TDC.
 */

export function btdcMmFromBtdcDeg(geometry: CrankGeometry & { btdcDeg: number }): number {
  return pistonDropMm({ ...geometry, crankDeg: 360 - geometry.btdcDeg });
}

export function btdcDegFromBtdcMm(geometry: CrankGeometry & { btdcMm: number }): number {
  return crankDegFromDropMm({ ...geometry, dropMm: geometry.btdcMm });
}
