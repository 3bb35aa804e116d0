import { describe, expect, it } from 'vitest';
import { arcChordRows } from '@/lib/engine/arc-chord-rows';

describe('arcChordRows', () => {
  it('gives arc π·D·θ/360 and chord D·sin(θ/2) for each angle (circle geometry)', () => {
    const rows = arcChordRows({ diameterMm: 120, anglesDeg: [0, 18, 60, 180] });
    expect(rows.map((row) => row.angleDeg)).toEqual([0, 18, 60, 180]);
    // θ = 18°: arc = π × 120 × 18 / 360 = 6π = 18.84955592153876 mm; chord = 120 × sin 9° = 120 × 0.1564344650 = 18.7721358048 mm.
    expect(rows[1]?.arcMm).toBeCloseTo(6 * Math.PI, 12);
    expect(rows[1]?.chordMm).toBeCloseTo(18.7721358048, 9);
    // θ = 60°: the chord is the radius (equilateral triangle) = 60 mm; arc = 20π mm.
    expect(rows[2]?.chordMm).toBeCloseTo(60, 12);
    expect(rows[2]?.arcMm).toBeCloseTo(20 * Math.PI, 12);
    // θ = 180°: the chord is the diameter; the arc is half the circumference.
    expect(rows[3]?.chordMm).toBeCloseTo(120, 12);
    expect(rows[3]?.arcMm).toBeCloseTo(60 * Math.PI, 12);
    expect(rows[0]).toEqual({ angleDeg: 0, arcMm: 0, chordMm: 0 });
  });
});
