/**
 * How a value, a range and a range message read on screen: "10 mm", "60° BTDC",
 * "10–150 mm", "-5 to 5 mm" (a dash after a minus sign would read as a second minus).
 * Every range message of every field is written here, so they all read alike.
 */

export function withUnit(value: number | string, unit: string): string {
  if (!unit) return String(value);
  return unit.startsWith('°') ? `${value}${unit}` : `${value} ${unit}`;
}

export function rangeText(min: number, max: number, unit: string): string {
  return min < 0 ? `${min} to ${withUnit(max, unit)}` : `${min}–${withUnit(max, unit)}`;
}

/** The ways a number can miss its range, named as zod names its issue codes. */
export type RangeProblem = 'invalid_type' | 'too_small' | 'too_big';

export type RangeWording = { label: string; min: number; max: number; unit: string; hint?: string | undefined };

/** "Stroke must be at least 10 mm (allowed 10–150 mm)", with the field's hint after a colon when it has one. */
export function rangeMessage(problem: RangeProblem, { label, min, max, unit, hint }: RangeWording): string {
  const range = rangeText(min, max, unit);
  const tail = hint ? `: ${hint}` : '';
  if (problem === 'too_small') return `${label} must be at least ${withUnit(min, unit)} (allowed ${range})${tail}`;
  if (problem === 'too_big') return `${label} must be at most ${withUnit(max, unit)} (allowed ${range})${tail}`;
  return `${label} must be a number, ${range}`;
}
