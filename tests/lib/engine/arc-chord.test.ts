// Source under test: lib/engine/arc-chord.ts. Circle geometry: an arc of θ° on a circle of diameter D is π·D·θ/360,
// its chord D·sin(θ/2); values worked by hand.
import { describe, expect, it } from 'vitest';
import { arcLengthMm, chordLengthMm } from '@/lib/engine/arc-chord';

describe('arcLengthMm', () => {
  it('gives the pitch of 1° on a 100 mm wheel: π × 100 / 360 = 0.872665 mm', () => {
    expect(arcLengthMm(100, 1)).toBeCloseTo(0.872665, 6);
  });

  it('gives half the circumference for 180°: 60π = 188.495559 mm on a 120 mm circle', () => {
    expect(arcLengthMm(120, 180)).toBeCloseTo(188.495559, 6);
  });
});

describe('chordLengthMm', () => {
  it('gives the radius for 60° (an equilateral triangle) and the diameter for 180°', () => {
    expect(chordLengthMm(120, 60)).toBeCloseTo(60, 12);
    expect(chordLengthMm(120, 180)).toBeCloseTo(120, 12);
  });

  it('gives 120 × sin 9° = 18.772136 mm for 18°', () => {
    expect(chordLengthMm(120, 18)).toBeCloseTo(18.772136, 6);
  });
});
