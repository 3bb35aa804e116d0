import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crankDegFromDropMm, crankGeometryProblem, pistonDropMm } from '@/lib/engine/slider-crank';

// Heywood, Internal Combustion Engine Fundamentals, eq. 2.5:
//   s = a·cos θ + √(l² − a²·sin² θ), a = stroke / 2, l = con-rod length; drop = (a + l) − s.
// The worked values below were computed by hand (and checked with `bc -l`).
const small = { strokeMm: 54, rodMm: 105 }; // a = 27, a + l = 132

describe('pistonDropMm against Heywood eq. 2.5', () => {
  it('is 0 at TDC and equals the stroke at BDC', () => {
    expect(pistonDropMm({ ...small, crankDeg: 0 })).toBe(0);
    // θ = 180°: s = −a + l = 78, drop = 132 − 78 = 54 = the stroke (Heywood eq. 2.5).
    expect(pistonDropMm({ ...small, crankDeg: 180 })).toBeCloseTo(54, 12);
    expect(pistonDropMm({ strokeMm: 40, rodMm: 80, crankDeg: 180 })).toBeCloseTo(40, 12);
  });

  it('gives 30.5308 mm at 90° for stroke 54, rod 105', () => {
    // Heywood eq. 2.5, θ = 90°: s = 0 + √(105² − 27²) = √10296 = 101.469207151726577,
    // drop = 132 − 101.469207151726577 = 30.530792848273423 mm.
    expect(pistonDropMm({ ...small, crankDeg: 90 })).toBeCloseTo(30.530792848273423, 10);
  });

  it('gives 16.1367 mm at 60° and 4.4888 mm at 30°', () => {
    // Heywood eq. 2.5, θ = 60°: a·cos θ = 13.5; a²·sin²θ = 729 × 0.75 = 546.75;
    // s = 13.5 + √(11025 − 546.75) = 13.5 + 102.363323509936897; drop = 16.136676490063103 mm.
    expect(pistonDropMm({ ...small, crankDeg: 60 })).toBeCloseTo(16.136676490063103, 10);
    // θ = 30°: a·cos θ = 27 × 0.866025… = 23.382685902179826; a²·sin²θ = 729 × 0.25 = 182.25;
    // s = 23.382685902179826 + √10842.75 (= 104.128526350851619); drop = 4.488787746968555 mm.
    expect(pistonDropMm({ ...small, crankDeg: 30 })).toBeCloseTo(4.488787746968555, 10);
  });

  it('gives 31.8975 mm at 120° for stroke 40, rod 80', () => {
    // Heywood eq. 2.5, a = 20, l = 80, θ = 120°: a·cos θ = −10; a²·sin²θ = 400 × 0.75 = 300;
    // s = −10 + √6100 = −10 + 78.102496759066543 = 68.102496759066543; drop = 100 − s = 31.897503240933457 mm.
    expect(pistonDropMm({ strokeMm: 40, rodMm: 80, crankDeg: 120 })).toBeCloseTo(31.897503240933457, 10);
  });

  it('is the same either side of TDC and repeats every turn (eq. 2.5 is even and 360°-periodic in θ)', () => {
    for (const crankDeg of [5, 18, 47.5, 90, 133, 179]) {
      const after = pistonDropMm({ ...small, crankDeg });
      expect(pistonDropMm({ ...small, crankDeg: 360 - crankDeg })).toBeCloseTo(after, 12);
      expect(pistonDropMm({ ...small, crankDeg: -crankDeg })).toBeCloseTo(after, 12);
      expect(pistonDropMm({ ...small, crankDeg: crankDeg + 720 })).toBeCloseTo(after, 12);
    }
  });

  it('matches eq. 2.5 written out literally over a full turn', () => {
    const a = 27;
    const l = 105;
    for (let i = 0; i <= 720; i += 1) {
      const theta = ((i / 2) * Math.PI) / 180;
      const s = a * Math.cos(theta) + Math.sqrt(l * l - a * a * Math.sin(theta) ** 2);
      expect(pistonDropMm({ ...small, crankDeg: i / 2 })).toBeCloseTo(a + l - s, 11);
    }
  });

  it('drops further the further the crank turns from TDC toward BDC', () => {
    let previous = -1;
    for (let i = 0; i <= 180; i += 1) {
      const drop = pistonDropMm({ ...small, crankDeg: i });
      expect(drop).toBeGreaterThan(previous);
      previous = drop;
    }
  });
});

describe('crankDegFromDropMm (exact inverse)', () => {
  it('gives 90° for the drop at 90° and 0° / 180° at the ends of the stroke', () => {
    // Law of cosines in the crank–rod triangle (from eq. 2.5): cos θ = (s² + a² − l²) / 2as;
    // at s = √10296, s² + a² − l² = 10296 + 729 − 11025 = 0, so θ = 90°.
    expect(crankDegFromDropMm({ ...small, dropMm: 132 - Math.sqrt(10296) })).toBeCloseTo(90, 10);
    expect(crankDegFromDropMm({ ...small, dropMm: 0 })).toBe(0);
    expect(crankDegFromDropMm({ ...small, dropMm: 54 })).toBe(180);
  });

  it('gives acos(a / 2l) = 82.6130° at half the stroke', () => {
    // drop = a ⇒ s = l ⇒ cos θ = (l² + a² − l²) / 2al = a / 2l = 27 / 210 = 0.128571…, θ = 82.61295156369830°.
    expect(crankDegFromDropMm({ ...small, dropMm: 27 })).toBeCloseTo(82.6129515636983, 10);
  });

  it('round-trips drop → angle → drop to 1e-9 mm over the whole stroke', () => {
    for (const geometry of [small, { strokeMm: 40, rodMm: 80 }, { strokeMm: 100, rodMm: 51 }, { strokeMm: 1, rodMm: 1000 }]) {
      for (let i = 0; i <= 2000; i += 1) {
        const dropMm = (geometry.strokeMm * i) / 2000;
        const crankDeg = crankDegFromDropMm({ ...geometry, dropMm });
        expect(Math.abs(pistonDropMm({ ...geometry, crankDeg }) - dropMm)).toBeLessThan(1e-9);
      }
    }
  });

  it('round-trips angle → drop → angle to 1e-9° over 0–180°', () => {
    for (let i = 0; i <= 1800; i += 1) {
      const crankDeg = i / 10;
      const dropMm = pistonDropMm({ ...small, crankDeg });
      expect(Math.abs(crankDegFromDropMm({ ...small, dropMm }) - crankDeg)).toBeLessThan(1e-9);
    }
  });

  it('round-trips for any geometry the schema accepts (property test)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 300, noNaN: true }),
        fc.double({ min: 1.01, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (strokeMm, rodRatio, fraction) => {
          const geometry = { strokeMm, rodMm: (strokeMm / 2) * rodRatio };
          const dropMm = strokeMm * fraction;
          const crankDeg = crankDegFromDropMm({ ...geometry, dropMm });
          expect(crankDeg).toBeGreaterThanOrEqual(0);
          expect(crankDeg).toBeLessThanOrEqual(180);
          expect(Math.abs(pistonDropMm({ ...geometry, crankDeg }) - dropMm)).toBeLessThan(1e-9);
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('impossible geometry is refused with a message naming the field', () => {
  it('refuses a rod not longer than the crank throw', () => {
    expect(crankGeometryProblem({ strokeMm: 54, rodMm: 27 })?.field).toBe('rodMm');
    expect(() => pistonDropMm({ strokeMm: 54, rodMm: 20, crankDeg: 90 })).toThrow(/Con-rod length.*more than 27 mm/);
    expect(() => crankDegFromDropMm({ strokeMm: 54, rodMm: 27, dropMm: 10 })).toThrow(/Con-rod length/);
  });

  it('refuses a negative or zero stroke', () => {
    expect(crankGeometryProblem({ strokeMm: -54, rodMm: 105 })?.field).toBe('strokeMm');
    expect(() => pistonDropMm({ strokeMm: 0, rodMm: 105, crankDeg: 10 })).toThrow(/Stroke/);
  });

  it('refuses a drop outside 0..stroke instead of answering NaN', () => {
    expect(() => crankDegFromDropMm({ ...small, dropMm: 54.01 })).toThrow(/Piston drop.*0–54 mm/);
    expect(() => crankDegFromDropMm({ ...small, dropMm: -0.1 })).toThrow(/Piston drop/);
    expect(() => crankDegFromDropMm({ ...small, dropMm: Number.NaN })).toThrow(/Piston drop/);
  });

  it('refuses a crank angle that is not a number', () => {
    expect(() => pistonDropMm({ ...small, crankDeg: Number.NaN })).toThrow(/Crank angle/);
  });
});
