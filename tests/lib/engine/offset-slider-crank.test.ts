import { describe, expect, it } from 'vitest';
import {
  crankAnglesFromDropMm,
  deadCentres,
  offsetCrankGeometryProblem,
  offsetPistonDropMm,
} from '@/lib/engine/offset-slider-crank';
import { crankDegFromDropMm, pistonDropMm } from '@/lib/engine/slider-crank';

// Offset (eccentric) slider-crank, R. L. Norton, Design of Machinery, offset slider-crank position
// analysis (equation numbers from memory, not quoted): y(φ) = a·cos φ + √(l² − (a·sin φ − e)²).
// Worked by hand with `bc -l` for stroke 54, rod 105, e = 1 (a = 27, l + a = 132, l − a = 78):
//   y_TDC = √(132² − 1) = √17423 = 131.99621206686197932532
//   y_BDC = √(78² − 1)  = √6083  = 77.99358948016176540769
//   true stroke = y_TDC − y_BDC = 54.00262258670021391763 mm  (> 2a = 54)
//   φ_TDC = asin(1/132) = 0.43406308773824883349°
//   φ_BDC = 180° + asin(1/78) = 180.73458140005848965644°
//   down-stroke = φ_BDC − φ_TDC = 180.30051831232024082295°, up-stroke = 179.69948168767975917705°
const small = { strokeMm: 54, rodMm: 105 };
const offset = { ...small, pinOffsetMm: 1 };

/** Independent geometry, written out here: crank pin at (a sin φ, a cos φ), circle of radius l around it
 * met by the bore line x = e, upper intersection. Returns the wrist pin height above the crank axis. */
function pinHeightByIntersection(aMm: number, lMm: number, eMm: number, phiRad: number): number {
  const px = aMm * Math.sin(phiRad);
  const py = aMm * Math.cos(phiRad);
  const dx = eMm - px;
  return py + Math.sqrt(lMm * lMm - dx * dx);
}

describe('offset slider-crank with e = 0 is the centred one (Heywood eq. 2.5)', () => {
  it('gives exactly the centred-pin drops and angles', () => {
    for (let i = 0; i <= 720; i += 1) {
      const crankDeg = i / 2;
      expect(offsetPistonDropMm({ ...small, crankDeg, pinOffsetMm: 0 })).toBe(pistonDropMm({ ...small, crankDeg }));
      expect(offsetPistonDropMm({ ...small, crankDeg })).toBe(pistonDropMm({ ...small, crankDeg }));
    }
    for (let i = 0; i <= 540; i += 1) {
      const dropMm = i / 10;
      const centred = crankDegFromDropMm({ ...small, dropMm });
      expect(crankAnglesFromDropMm({ ...small, dropMm, pinOffsetMm: 0 })).toEqual({
        crankDeg: centred,
        crankDegATDC: centred,
        crankDegBTDC: centred,
      });
    }
    // Heywood eq. 2.5 at θ = 90°: drop = 132 − √10296 = 30.530792848273423 mm (by hand, slider-crank.test.ts).
    expect(offsetPistonDropMm({ ...small, crankDeg: 90, pinOffsetMm: 0 })).toBeCloseTo(30.530792848273423, 12);
    expect(deadCentres(small)).toMatchObject({ tdcPhiDeg: 0, bdcCrankDeg: 180, trueStrokeMm: 54 });
  });
});

describe('dead centres with a pin offset (Norton, offset slider-crank; numbers by hand above)', () => {
  it('puts TDC at asin(e/(l + a)) and BDC at 180° + asin(e/(l − a))', () => {
    const centres = deadCentres(offset);
    expect(centres.tdcHeightMm).toBeCloseTo(131.99621206686197932532, 12);
    expect(centres.bdcHeightMm).toBeCloseTo(77.99358948016176540769, 12);
    expect(centres.tdcPhiDeg).toBeCloseTo(0.43406308773824883349, 12);
    expect(centres.bdcPhiDeg).toBeCloseTo(180.73458140005848965644, 12);
    expect(centres.bdcCrankDeg).toBeCloseTo(180.30051831232024082295, 12);
  });

  it('has a true stroke √((l+a)² − e²) − √((l−a)² − e²) longer than 2a', () => {
    const { trueStrokeMm } = deadCentres(offset);
    expect(trueStrokeMm).toBeCloseTo(54.00262258670021391763, 12);
    expect(trueStrokeMm).toBeGreaterThan(54);
    // A negative offset mirrors the mechanism: same stroke, TDC as far the other way.
    expect(deadCentres({ ...small, pinOffsetMm: -1 }).trueStrokeMm).toBeCloseTo(trueStrokeMm, 12);
    expect(deadCentres({ ...small, pinOffsetMm: -1 }).tdcPhiDeg).toBeCloseTo(-0.43406308773824883349, 12);
  });

  it('drops 0 at crankDeg 0 and the true stroke at the BDC crank angle', () => {
    const { bdcCrankDeg, trueStrokeMm } = deadCentres(offset);
    expect(offsetPistonDropMm({ ...offset, crankDeg: 0 })).toBe(0);
    expect(offsetPistonDropMm({ ...offset, crankDeg: bdcCrankDeg })).toBeCloseTo(trueStrokeMm, 12);
    // 180° after TDC is not yet BDC: the piston is still a little above its lowest point.
    expect(offsetPistonDropMm({ ...offset, crankDeg: 180 })).toBeLessThan(trueStrokeMm);
  });
});

describe('offsetPistonDropMm against the circle-and-line intersection (independent geometry)', () => {
  it('agrees to 1e-9 mm at every half degree for several offsets', () => {
    for (const pinOffsetMm of [1, -1, 0.5, 2.5, -4.99]) {
      const { tdcPhiDeg } = deadCentres({ ...small, pinOffsetMm });
      const phiTdcRad = Math.asin(pinOffsetMm / 132); // asin(e/(l + a)), Norton offset slider-crank TDC
      expect((tdcPhiDeg * Math.PI) / 180).toBeCloseTo(phiTdcRad, 14);
      const tdcHeight = pinHeightByIntersection(27, 105, pinOffsetMm, phiTdcRad);
      for (let i = 0; i <= 720; i += 1) {
        const crankDeg = i / 2;
        const expected = tdcHeight - pinHeightByIntersection(27, 105, pinOffsetMm, phiTdcRad + (crankDeg * Math.PI) / 180);
        expect(Math.abs(offsetPistonDropMm({ ...small, pinOffsetMm, crankDeg }) - expected)).toBeLessThan(1e-9);
      }
    }
  });

  it('never drops below zero or beyond the true stroke over a turn', () => {
    const { trueStrokeMm } = deadCentres(offset);
    for (let i = 0; i <= 3600; i += 1) {
      const dropMm = offsetPistonDropMm({ ...offset, crankDeg: i / 10 });
      expect(dropMm).toBeGreaterThanOrEqual(0);
      expect(dropMm).toBeLessThanOrEqual(trueStrokeMm + 1e-12);
    }
  });
});

describe('crankAnglesFromDropMm with an offset (closed form)', () => {
  it('round-trips drop → angle → drop to 1e-9 on both strokes over the whole stroke', () => {
    for (const pinOffsetMm of [1, -1, 3, -5]) {
      const geometry = { strokeMm: 54, rodMm: 105, pinOffsetMm };
      const { trueStrokeMm } = deadCentres(geometry);
      for (let i = 0; i <= 1000; i += 1) {
        const dropMm = (trueStrokeMm * i) / 1000;
        const { crankDegATDC, crankDegBTDC } = crankAnglesFromDropMm({ ...geometry, dropMm });
        expect(Math.abs(offsetPistonDropMm({ ...geometry, crankDeg: crankDegATDC }) - dropMm)).toBeLessThan(1e-9);
        expect(Math.abs(offsetPistonDropMm({ ...geometry, crankDeg: 360 - crankDegBTDC }) - dropMm)).toBeLessThan(1e-9);
      }
    }
  });

  it('round-trips angle → drop → angle to 1e-9 on the down-stroke and the up-stroke', () => {
    const { bdcCrankDeg } = deadCentres(offset);
    for (let i = 1; i < 360; i += 1) {
      const crankDeg = i;
      const dropMm = offsetPistonDropMm({ ...offset, crankDeg });
      const angles = crankAnglesFromDropMm({ ...offset, dropMm });
      if (crankDeg < bdcCrankDeg) expect(Math.abs(angles.crankDegATDC - crankDeg)).toBeLessThan(1e-9);
      else expect(Math.abs(360 - angles.crankDegBTDC - crankDeg)).toBeLessThan(1e-9);
    }
  });

  it('gives different angles going down and coming up, and the ends exactly', () => {
    const half = crankAnglesFromDropMm({ ...offset, dropMm: 27 });
    // Positive offset lengthens the down-stroke (180.3005° by hand above), so a mid-stroke drop is reached later going down.
    expect(half.crankDegATDC).toBeGreaterThan(half.crankDegBTDC);
    expect(half.crankDeg).toBe(half.crankDegATDC);
    const { trueStrokeMm, bdcCrankDeg } = deadCentres(offset);
    expect(crankAnglesFromDropMm({ ...offset, dropMm: 0 })).toMatchObject({ crankDegATDC: 0, crankDegBTDC: 0 });
    const bottom = crankAnglesFromDropMm({ ...offset, dropMm: trueStrokeMm });
    expect(bottom.crankDegATDC).toBeCloseTo(bdcCrankDeg, 9);
    expect(bottom.crankDegBTDC).toBeCloseTo(360 - bdcCrankDeg, 9);
  });

  it('refuses a drop beyond the true stroke with the allowed range', () => {
    expect(() => crankAnglesFromDropMm({ ...offset, dropMm: 54.01 })).toThrow(/Piston drop.*allowed 0–54\.003 mm/);
  });
});

describe('offsetCrankGeometryProblem', () => {
  it('accepts practical offsets and names the field and range for the rest', () => {
    expect(offsetCrankGeometryProblem(offset)).toBeNull();
    expect(offsetCrankGeometryProblem({ ...small, pinOffsetMm: 6 })).toMatchObject({
      field: 'pinOffsetMm',
      message: expect.stringMatching(/allowed -5 to 5 mm/),
    });
    expect(offsetCrankGeometryProblem({ ...small, pinOffsetMm: Number.NaN })?.field).toBe('pinOffsetMm');
    // |e| ≥ l − a locks the mechanism: stroke 54, rod 30 leaves l − a = 3 mm (Norton: the rod cannot reach the bore line at BDC).
    expect(offsetCrankGeometryProblem({ strokeMm: 54, rodMm: 30, pinOffsetMm: 3 })).toMatchObject({
      field: 'pinOffsetMm',
      message: expect.stringMatching(/less than con-rod length minus crank throw \(3 mm\)/),
    });
    expect(offsetCrankGeometryProblem({ strokeMm: 54, rodMm: 30, pinOffsetMm: -2.9 })).toBeNull();
    expect(() => offsetPistonDropMm({ strokeMm: 54, rodMm: 30, pinOffsetMm: -3, crankDeg: 10 })).toThrow(/Wrist-pin offset/);
  });
});
