import { describe, expect, it } from 'vitest';
import { crankOrderDeg, signedTurnDeg, tdcFromStops } from '@/lib/engine/tdc-from-stops';

// TDC lies midway between two positive-stop readings because the piston touches the
// stop at equal angles either side of TDC (common practice; DEVELOPERS.md, "Angles").

describe('tdcFromStops, full numbering', () => {
  it('finds TDC at 0 from readings 25° either side, across the 0/360 seam', () => {
    const result = tdcFromStops({ numbering: 'full', readingADeg: 335, readingBDeg: 25 });
    expect(result.tdcReadingDeg).toBeCloseTo(0, 12);
    expect(result.correctionDeg).toBe(0);
    expect(result.sweepDeg).toBeCloseTo(50, 12);
    expect(result.stopAngleDeg).toBeCloseTo(25, 12);
  });

  it('gives the same answer whichever reading is A', () => {
    const result = tdcFromStops({ numbering: 'full', readingADeg: 25, readingBDeg: 335 });
    expect(result.tdcReadingDeg).toBeCloseTo(0, 12);
    expect(result.stopAngleDeg).toBeCloseTo(25, 12);
  });

  it('finds an off-centre TDC across the seam and the correction back to 0', () => {
    // Stops at 340 and 30: the short arc runs 340 → 360/0 → 30 (50°), midpoint 340 + 25 = 365 ≡ 5°.
    const result = tdcFromStops({ numbering: 'full', readingADeg: 340, readingBDeg: 30 });
    expect(result.tdcReadingDeg).toBeCloseTo(5, 12);
    expect(result.correctionDeg).toBeCloseTo(-5, 12);
    expect(result.stopAngleDeg).toBeCloseTo(25, 12);
  });

  it('answers a TDC reading on the BTDC side with a positive correction', () => {
    // Stops at 320 and 10: sweep 50°, midpoint 345 = 15° before TDC; move the pointer +15° to read 0.
    const result = tdcFromStops({ numbering: 'full', readingADeg: 320, readingBDeg: 10 });
    expect(result.tdcReadingDeg).toBeCloseTo(345, 12);
    expect(result.correctionDeg).toBeCloseTo(15, 12);
  });

  it('treats 360 as the same mark as 0', () => {
    const result = tdcFromStops({ numbering: 'full', readingADeg: 360, readingBDeg: 40 });
    expect(result.tdcReadingDeg).toBeCloseTo(20, 12);
  });

  it('follows the sweep-halving habit: zero the wheel at one stop, read the other, halve it (common practice)', () => {
    // Wheel set to 0 at stop A; turning to stop B reads 47°: TDC is 23.5° from either stop.
    const result = tdcFromStops({ numbering: 'full', readingADeg: 0, readingBDeg: 47 });
    expect(result.sweepDeg).toBeCloseTo(47, 12);
    expect(result.stopAngleDeg).toBeCloseTo(47 / 2, 12);
    expect(result.tdcReadingDeg).toBeCloseTo(23.5, 12);
    expect(result.correctionDeg).toBeCloseTo(-23.5, 12);
  });

  it('refuses readings 180° apart (TDC and BDC cannot be told apart)', () => {
    expect(() => tdcFromStops({ numbering: 'full', readingADeg: 10, readingBDeg: 190 })).toThrow(/180°/);
  });
});

describe('tdcFromStops, split numbering', () => {
  it('finds TDC from 25° BTDC and 25° ATDC', () => {
    const result = tdcFromStops({ numbering: 'split', readingADeg: 25, readingASide: 'BTDC', readingBDeg: 25, readingBSide: 'ATDC' });
    expect(result.tdcReadingDeg).toBeCloseTo(0, 12);
    expect(result.tdcReadingSide).toBe('TDC');
    expect(result.correctionDeg).toBe(0);
    expect(result.stopAngleDeg).toBeCloseTo(25, 12);
  });

  it('reports an off-centre TDC with its side', () => {
    // 20° BTDC (crank order 340) and 30° ATDC (30): sweep 50°, midpoint 5° ATDC; move the pointer 5° toward BTDC.
    const result = tdcFromStops({ numbering: 'split', readingADeg: 20, readingASide: 'BTDC', readingBDeg: 30, readingBSide: 'ATDC' });
    expect(result.tdcReadingDeg).toBeCloseTo(5, 12);
    expect(result.tdcReadingSide).toBe('ATDC');
    expect(result.tdcCrankOrderDeg).toBeCloseTo(5, 12);
    expect(result.correctionDeg).toBeCloseTo(-5, 12);
    expect(result.stopAngleDeg).toBeCloseTo(25, 12);
  });

  it('handles both readings on one side when the wheel sits well off', () => {
    // 40° BTDC and 10° BTDC: crank order 320 and 350, midpoint 335 = 25° BTDC.
    const result = tdcFromStops({ numbering: 'split', readingADeg: 40, readingASide: 'BTDC', readingBDeg: 10, readingBSide: 'BTDC' });
    expect(result.tdcReadingDeg).toBeCloseTo(25, 12);
    expect(result.tdcReadingSide).toBe('BTDC');
    expect(result.correctionDeg).toBeCloseTo(25, 12);
    expect(result.stopAngleDeg).toBeCloseTo(15, 12);
  });
});

describe('angle helpers', () => {
  it('maps split readings to crank order (x° BTDC = 360 − x, DEVELOPERS.md, "Angles")', () => {
    expect(crankOrderDeg(18, 'split', 'BTDC')).toBe(342);
    expect(crankOrderDeg(18, 'split', 'ATDC')).toBe(18);
    expect(crankOrderDeg(365, 'full')).toBe(5);
  });

  it('takes the shorter way round', () => {
    expect(signedTurnDeg(350, 10)).toBe(20);
    expect(signedTurnDeg(10, 350)).toBe(-20);
    expect(signedTurnDeg(90, 100)).toBe(10);
  });
});
