import { describe, expect, it } from 'vitest';
import { btdcDegFromBtdcMm, btdcMmFromBtdcDeg } from '@/lib/engine/btdc-timing';

const small = { strokeMm: 54, rodMm: 105 };

describe('mm BTDC ↔ degrees BTDC', () => {
  it('gives the eq. 2.5 drop for an angle before TDC', () => {
    // Heywood eq. 2.5 at θ = 30° (drop is the same 30° before TDC): 4.488787746968555 mm, worked by hand
    // in slider-crank.test.ts (a = 27, s = 23.382685902179826 + √10842.75).
    expect(btdcMmFromBtdcDeg({ ...small, btdcDeg: 30 })).toBeCloseTo(4.488787746968555, 10);
  });

  it('turns the 27 mm half-stroke into acos(27/210) = 82.6130° BTDC', () => {
    // Law of cosines from eq. 2.5 with s = l: cos θ = a / 2l.
    expect(btdcDegFromBtdcMm({ ...small, btdcMm: 27 })).toBeCloseTo(82.6129515636983, 10);
  });

  it('round-trips typical ignition timings (16–20° BTDC, common practice) to 1e-9°', () => {
    for (const btdcDeg of [16, 17, 18, 19, 20]) {
      const btdcMm = btdcMmFromBtdcDeg({ ...small, btdcDeg });
      expect(btdcMm).toBeGreaterThan(1);
      expect(btdcMm).toBeLessThan(3);
      expect(btdcDegFromBtdcMm({ ...small, btdcMm })).toBeCloseTo(btdcDeg, 9);
    }
  });

  it('uses the up-stroke with a wrist-pin offset and round-trips to 1e-9°', () => {
    // Offset slider-crank (Norton, Design of Machinery; from memory): before TDC is the up-stroke, crank order 360 − x.
    for (const btdcDeg of [16, 18, 20]) {
      const btdcMm = btdcMmFromBtdcDeg({ ...small, pinOffsetMm: 1, btdcDeg });
      expect(btdcMm).not.toBeCloseTo(btdcMmFromBtdcDeg({ ...small, btdcDeg }), 3);
      expect(btdcDegFromBtdcMm({ ...small, pinOffsetMm: 1, btdcMm })).toBeCloseTo(btdcDeg, 9);
    }
  });
});
