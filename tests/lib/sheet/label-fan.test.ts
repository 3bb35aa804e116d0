// Source under test: lib/sheet/label-fan.ts. Expected values worked out by hand from the
// least-squares spacing problem (isotonic regression of w_i = y_i − i·pitch, pool adjacent violators).
import { describe, expect, it } from 'vitest';
import { spreadInRange, spreadOnTurn, spreadPositions } from '@/lib/sheet/label-fan';

describe('spreadPositions', () => {
  it('leaves positions already a pitch apart where they are', () => {
    expect(spreadPositions([0, 5, 12], 3)).toEqual([0, 5, 12]);
  });

  it('fans a cluster symmetrically about its marks: 0, 1, 2 at pitch 2 go to −1, 1, 3', () => {
    expect(spreadPositions([0, 1, 2], 2)).toEqual([-1, 1, 3]);
  });

  it('moves only the crowded pair and keeps a lone neighbour put', () => {
    const out = spreadPositions([0, 0.5, 20], 2);
    expect(out[0]).toBeCloseTo(-0.75, 12);
    expect(out[1]).toBeCloseTo(1.25, 12);
    expect(out[2]).toBe(20);
  });

  it('pushes labels in from a bound, keeping the pitch', () => {
    expect(spreadPositions([0, 0.5], 2, [0, 100])).toEqual([0, 2]);
    expect(spreadPositions([99.5, 100], 2, [0, 100])).toEqual([98, 100]);
  });

  it('keeps at least the pitch between neighbours for any input (seeded sample)', () => {
    let seed = 7;
    const random = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 50;
    for (let run = 0; run < 50; run += 1) {
      const wanted = Array.from({ length: 12 }, random).sort((a, b) => a - b);
      const out = spreadPositions(wanted, 2.5);
      for (let i = 1; i < out.length; i += 1) expect(out[i]! - out[i - 1]!).toBeGreaterThanOrEqual(2.5 - 1e-9);
      // Least squares with a pure shift allowed: the mean displacement is zero.
      expect(out.reduce((a, b) => a + b, 0) - wanted.reduce((a, b) => a + b, 0)).toBeCloseTo(0, 9);
    }
  });

  it('returns nothing for nothing', () => {
    expect(spreadPositions([], 2)).toEqual([]);
  });
});

describe('spreadOnTurn', () => {
  it('keeps a cluster across 0/360 together: 359 and 1 at pitch 4 go to 358 and 2', () => {
    const out = spreadOnTurn([1, 359], 4);
    expect(out.get(359)).toBeCloseTo(358, 12);
    expect(out.get(1)! - 360 * Math.round(out.get(1)! / 360)).toBeCloseTo(2, 12);
  });

  it('fans 16, 17, 18, 19, 20 at pitch 3 to 12, 15, 18, 21, 24', () => {
    const out = spreadOnTurn([16, 17, 18, 19, 20], 3);
    expect([16, 17, 18, 19, 20].map((d) => out.get(d))).toEqual([12, 15, 18, 21, 24]);
  });

  it('labels every other mark when all of them cannot be a pitch apart round the turn', () => {
    const marks = Array.from({ length: 100 }, (_, i) => i * 3.6);
    const out = spreadOnTurn(marks, 5);
    expect(out.size).toBe(50);
  });
});

describe('spreadInRange', () => {
  it('fans a crowded pair inside the range and keeps the pitch', () => {
    const out = spreadInRange([10, 10.5], 2, [0, 100]);
    expect(out.get(10)).toBeCloseTo(9.25, 12);
    expect(out.get(10.5)).toBeCloseTo(11.25, 12);
  });

  it('labels every other mark when all labels cannot fit the range, and keeps them inside it', () => {
    // 0–20 at pitch 2 holds 11 labels; 21 marks 1 apart → every 2nd mark keeps its label.
    const marks = Array.from({ length: 21 }, (_, i) => i);
    const out = spreadInRange(marks, 2, [0, 20]);
    expect([...out.keys()]).toEqual(marks.filter((m) => m % 2 === 0));
    for (const value of out.values()) {
      expect(value).toBeGreaterThanOrEqual(0);
      expect(value).toBeLessThanOrEqual(20);
    }
  });
});
