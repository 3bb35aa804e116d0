import { describe, expect, it } from 'vitest';
import { buildResults } from '@/lib/builds/build-results';
import { buildCrossFieldIssues, buildSchema, emptyBuild, mergeBuildPatch } from '@/lib/builds/build-schema';
import type { BuildFields } from '@/lib/builds/build-fields';

/**
 * Worked values from Heywood, Internal Combustion Engine Fundamentals, eq. 2.5 (centred pin):
 *   s = a·cos θ + √(l² − a²·sin² θ), drop = l + a − s, a = stroke / 2.
 * Stroke 40 mm, rod 80 mm: a = 20, l = 80.
 * - 18° BTDC: s = 20·cos 18° + √(6400 − (20·sin 18°)²) = 19.02113 + 79.76091 = 98.78204 → drop 1.21796 mm.
 * - Inverse (the crank–rod triangle of eq. 2.5): cos θ = (s² + a² − l²) / 2as with s = 100 − drop.
 *   Exhaust edge 17.5 mm, deck 0.5 mm → drop 17 mm, s = 83: cos θ = 889 / 3320 → θ = 74.4683°,
 *   duration 360 − 2θ = 211.0634° (common practice for a symmetric port).
 *   Transfer edge 29.5 mm → drop 29 mm, s = 71: cos θ = −959 / 2840 → θ = 109.7353°, duration 140.5293°.
 *   Blowdown 109.7353 − 74.4683 = 35.2670°.
 * TDC from stops (midpoint of the two readings, common practice): 340° and 24° on a full wheel are 44°
 * apart across 0, midpoint 2°, so the pointer must move 2° toward the lower numbers: correction −2°.
 */
const RECORD: BuildFields = {
  ...emptyBuild('2026-12-03'),
  customerName: 'Invented Customer',
  strokeMm: 40,
  rodMm: 80,
  deckMm: 0.5,
  stops: { numbering: 'full', readingADeg: 340, readingBDeg: 24 },
  timingSetDegBTDC: 18,
  ports: [
    { name: 'Exhaust', heightMm: 17.5 },
    { name: 'Transfer', heightMm: 29.5 },
    { name: 'Boost', heightMm: 150 },
  ],
  portTargets: [
    { name: 'exhaust', opensCrankDeg: 75, closesCrankDeg: 285 },
    { name: 'Transfer', opensCrankDeg: 114, closesCrankDeg: 246 },
  ],
};

describe('build record results', () => {
  it('finds TDC from the stop readings (midpoint, common practice)', () => {
    const { tdc } = buildResults(RECORD);
    expect(tdc?.tdcReadingDeg).toBeCloseTo(2, 9);
    expect(tdc?.correctionDeg).toBeCloseTo(-2, 9);
    expect(tdc?.sweepDeg).toBeCloseTo(44, 9);
  });

  it('converts the timing set in degrees to piston travel through eq. 2.5, and back', () => {
    const fromDeg = buildResults(RECORD);
    expect(fromDeg.timingSetMmBTDC).toBeCloseTo(1.21796, 5); // Heywood eq. 2.5, worked above
    expect(fromDeg.timingEnteredAs).toBe('deg');
    const fromMm = buildResults({ ...RECORD, timingSetDegBTDC: null, timingSetMmBTDC: 1.217955694 });
    expect(fromMm.timingSetDegBTDC).toBeCloseTo(18, 6);
    expect(fromMm.timingEnteredAs).toBe('mm');
  });

  it('gives port angles, durations, blowdown and the deviation from the template target', () => {
    const { ports, blowdownDeg } = buildResults(RECORD);
    const [exhaust, transfer, boost] = ports;
    expect(exhaust?.opensDegATDC).toBeCloseTo(74.4683, 4); // eq. 2.5 inverse, worked above
    expect(exhaust?.durationDeg).toBeCloseTo(211.0634, 4);
    // Target 75°–285° = 210°: +1.06°, within the ±2° default (common practice).
    expect(exhaust?.targetDurationDeg).toBe(210);
    expect(exhaust?.deviationDeg).toBeCloseTo(1.0634, 4);
    expect(exhaust?.withinTolerance).toBe(true);
    expect(transfer?.durationDeg).toBeCloseTo(140.5293, 4);
    // Target 114°–246° = 132°: +8.53°, outside ±2°.
    expect(transfer?.deviationDeg).toBeCloseTo(8.5293, 4);
    expect(transfer?.withinTolerance).toBe(false);
    expect(blowdownDeg).toBeCloseTo(35.2670, 4);
    // A port below the stroke is not an error: it says so, as the port calculator does.
    expect(boost?.status).toBe('never-opens');
    expect(boost?.note).toMatch(/Never opens/);
    expect(boost?.targetDurationDeg).toBeUndefined();
  });

  it('reads a target that wraps past TDC as the crank turns (285° to 75° is 150°)', () => {
    const wrapped = buildResults({ ...RECORD, portTargets: [{ name: 'Exhaust', opensCrankDeg: 285, closesCrankDeg: 75 }] });
    expect(wrapped.ports[0]?.targetDurationDeg).toBe(150);
  });

  it('judges the deviation with the workspace tolerance', () => {
    const { ports } = buildResults(RECORD, 0.5);
    expect(ports[0]?.withinTolerance).toBe(false);
    expect(buildResults(RECORD, 0.5).toleranceDeg).toBe(0.5);
  });

  it('says what is missing instead of computing with nothing (no NaN)', () => {
    const results = buildResults({ ...RECORD, rodMm: null });
    expect(results.timingSetMmBTDC).toBeNull();
    expect(results.timingNote).toMatch(/stroke and the con-rod/);
    expect(results.ports.every((p) => p.durationDeg === null && p.status === 'not-computed')).toBe(true);
    expect(JSON.stringify(results)).not.toMatch(/NaN/);
  });
});

describe('build record schema', () => {
  const issuesOf = (value: unknown) => {
    const parsed = buildSchema.safeParse(value);
    return parsed.success ? [] : parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
  };

  it('names the field by its label and the allowed range', () => {
    expect(issuesOf({ ...RECORD, strokeMm: 400 })).toEqual(['strokeMm: Stroke must be at most 150 mm (allowed 10–150 mm)']);
    expect(issuesOf({ ...RECORD, timingSetDegBTDC: -3 })).toEqual([
      'timingSetDegBTDC: Timing set (degrees) must be at least 0° BTDC (allowed 0–60° BTDC)',
    ]);
    expect(issuesOf({ ...RECORD, customerEmail: 'not an address' })[0]).toMatch(/Customer e-mail must be an address/);
  });

  it('refuses equal stop readings, which no positive stop can give', () => {
    expect(issuesOf({ ...RECORD, stops: { numbering: 'full', readingADeg: 12, readingBDeg: 12 } })[0]).toMatch(
      /^stops.readingBDeg: Reading B must differ from reading A/,
    );
  });

  it('checks rules across fields: rod longer than the throw, one timing figure, strobe speed', () => {
    expect(buildCrossFieldIssues({ ...RECORD, rodMm: 20 })[0]?.message).toMatch(/more than 20 mm/);
    expect(buildCrossFieldIssues({ ...RECORD, timingSetMmBTDC: 1 })[0]?.path).toBe('timingSetMmBTDC');
    expect(buildCrossFieldIssues({ ...RECORD, timingCheck: 'strobe' })[0]?.message).toMatch(/allowed 100–30000 rpm/);
    expect(buildCrossFieldIssues({ ...RECORD, timingCheck: 'strobe', timingCheckRpm: 3000 })).toEqual([]);
  });

  it('keeps one timing figure when a patch sets the other', () => {
    expect(mergeBuildPatch(RECORD, { timingSetMmBTDC: 1.5 })).toMatchObject({ timingSetMmBTDC: 1.5, timingSetDegBTDC: null });
  });
});
