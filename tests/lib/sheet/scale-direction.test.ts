// Source under test: lib/sheet/scale-direction.ts, the one rule placing crank angles (DEVELOPERS.md, "Rotation and carrier":
// crankDeg 0 = TDC, x° BTDC = 360 − x; rotating scales carry BTDC with the rotation, stationary against it).
import { describe, expect, it } from 'vitest';
import { alongRotationDeg, btdcToCrankDeg, crankFromAlongDeg, crankIndexFromAlongIndex, wheelAngleDeg } from '@/lib/sheet/scale-direction';

describe('scale direction', () => {
  it('x° BTDC is crank 360 − x', () => {
    expect(btdcToCrankDeg(18)).toBe(342);
    expect(btdcToCrankDeg(0)).toBe(0);
  });

  it('rotating: BTDC lies with the rotation; stationary: against it', () => {
    expect(((alongRotationDeg(342, 'rotating') % 360) + 360) % 360).toBe(18);
    expect(alongRotationDeg(342, 'stationary')).toBe(342);
  });

  it.each([
    ['cw', 'rotating', 18],
    ['cw', 'stationary', 342],
    ['ccw', 'rotating', 342],
    ['ccw', 'stationary', 18],
  ] as const)('%s %s: 18° BTDC sits %s° clockwise from TDC as seen', (rotation, carrier, deg) => {
    expect(wheelAngleDeg(342, { rotation, carrier })).toBeCloseTo(deg, 12);
    expect(wheelAngleDeg(0, { rotation, carrier })).toBe(0);
  });

  it('crankFromAlongDeg undoes alongRotationDeg, wrapped to [0, 360)', () => {
    for (const carrier of ['rotating', 'stationary'] as const)
      for (const crank of [0, 0.5, 90, 179.5, 342, 359.5]) expect(crankFromAlongDeg(alongRotationDeg(crank, carrier) + 720, carrier)).toBeCloseTo(crank, 9);
  });

  it('maps half-degree along indices to crank indices exactly, across turns and negative indices', () => {
    expect(crankIndexFromAlongIndex(36, 'rotating')).toBe(684); // 18° along = 342° crank
    expect(crankIndexFromAlongIndex(-36, 'stationary')).toBe(684);
    expect(crankIndexFromAlongIndex(720 + 5, 'stationary')).toBe(5);
    expect(Object.is(crankIndexFromAlongIndex(720, 'rotating'), 0)).toBe(true);
  });
});
