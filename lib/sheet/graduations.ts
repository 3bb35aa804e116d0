import type { GraduationLevel } from './drawing';
import type { Carrier } from './scale-direction';
import { crankIndexFromAlongIndex } from './scale-direction';

/** Coarsest first. Each tick is i × 0.5°; its level is the coarsest level dividing it. */
export const GRADUATION_LEVELS: readonly GraduationLevel[] = [10, 5, 1, 0.5];
export const HALF_DEG_PER_TURN = 720;
// Floating-point slack for the pitch comparison, so a pitch exactly at the minimum is kept.
const PITCH_EPSILON_MM = 1e-9;

export function levelOfHalfDegIndex(crankIndex: number): GraduationLevel {
  if (crankIndex % 20 === 0) return 10;
  if (crankIndex % 10 === 0) return 5;
  if (crankIndex % 2 === 0) return 1;
  return 0.5;
}

export type LevelChoice = { finestLevel: GraduationLevel; keptLevels: GraduationLevel[]; warnings: string[] };

function formatMm(mm: number): string {
  return mm.toFixed(2).replace(/\.?0+$/, '') || '0';
}

/**
 * The finest level whose pitch (mm per degree × step) reaches `minPitchMm`. The 10° level
 * is always drawn (it carries the numbers); if even it is too close, that is a warning too.
 */
export function chooseLevels(mmPerDeg: number, minPitchMm: number, where = 'at this diameter'): LevelChoice {
  const warnings: string[] = [];
  const keptLevels: GraduationLevel[] = [];
  for (const level of GRADUATION_LEVELS) {
    const pitchMm = mmPerDeg * level;
    const legible = pitchMm >= minPitchMm - PITCH_EPSILON_MM;
    if (legible || level === 10) keptLevels.push(level);
    if (!legible)
      warnings.push(
        level === 10
          ? `10° graduations kept although only ${formatMm(pitchMm)} mm apart ${where}, below the ${formatMm(minPitchMm)} mm minimum`
          : `${level}° graduations left out: ${formatMm(pitchMm)} mm apart ${where}, below the ${formatMm(minPitchMm)} mm minimum`,
      );
  }
  return { finestLevel: keptLevels[keptLevels.length - 1] ?? 10, keptLevels, warnings };
}

export type Tick = { alongIndex: number; crankIndex: number; crankDeg: number; alongDeg: number; level: GraduationLevel };

/** Ticks for along indices [fromIndex, toIndex] (inclusive), keeping levels at least `finestLevel`. */
export function ticksInAlongRange(fromIndex: number, toIndex: number, finestLevel: GraduationLevel, carrier: Carrier): Tick[] {
  const ticks: Tick[] = [];
  const last = Math.min(toIndex, fromIndex + 4 * HALF_DEG_PER_TURN); // hard cap
  // Only every (2 × finestLevel)-th half degree can carry a kept tick: a crank index is ± the along
  // index modulo 720, which every step divides, so the two are multiples of the step together.
  // `| 0` keeps the indices small integers: as doubles, every % below would be a floating-point remainder.
  const step = (finestLevel * 2) | 0;
  for (let alongIndex = (Math.ceil(fromIndex / step) * step) | 0; alongIndex <= last; alongIndex += step) {
    const crankIndex = crankIndexFromAlongIndex(alongIndex, carrier);
    const level = levelOfHalfDegIndex(crankIndex);
    if (level < finestLevel) continue;
    ticks.push({ alongIndex, crankIndex, crankDeg: crankIndex * 0.5, alongDeg: alongIndex * 0.5, level });
  }
  return ticks;
}

/** Along indices covering [fromDeg, toDeg]: the first and last half-degree inside (with float slack). */
export function alongIndexRange(fromAlongDeg: number, toAlongDeg: number): [number, number] {
  return [Math.ceil(fromAlongDeg * 2 - 1e-7), Math.floor(toAlongDeg * 2 + 1e-7)];
}

export type Numbering = 'split' | 'full';

/** The numeral printed at a 10° tick: split counts 0→180 both ways from TDC; full is crank order. */
export function graduationNumber(crankDeg: number, numbering: Numbering): string {
  const whole = Math.round(crankDeg) % 360;
  return String(numbering === 'split' && whole > 180 ? 360 - whole : whole);
}
