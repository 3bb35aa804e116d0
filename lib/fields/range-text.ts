/**
 * How a value, a range and a range message read on screen: "10 mm", "60° BTDC",
 * "10–150 mm", "-5 to 5 mm" (a dash after a minus sign would read as a second minus),
 * "1 or more" (a range with no upper limit, such as a page number).
 * Every range message of every field is written here, so they all read alike.
 */

export function withUnit(value: number | string, unit: string): string {
  if (!unit) return String(value);
  return unit.startsWith('°') ? `${value}${unit}` : `${value} ${unit}`;
}

export function rangeText(min: number, max: number, unit: string): string {
  if (max === Number.POSITIVE_INFINITY) return `${withUnit(min, unit)} or more`;
  return min < 0 ? `${min} to ${withUnit(max, unit)}` : `${min}–${withUnit(max, unit)}`;
}

/** The ways a number can miss its range, named as zod names its issue codes (`not_whole`: a fraction where a count is asked). */
export type RangeProblem = 'invalid_type' | 'not_whole' | 'too_small' | 'too_big';

/** `max` may be Infinity (no upper limit); `whole` asks for a whole number (a count, a page, an id). */
export type RangeWording = { label: string; min: number; max: number; unit: string; hint?: string | undefined; whole?: boolean };

/** "Stroke must be at least 10 mm (allowed 10–150 mm)", with the field's hint after a colon when it has one. */
export function rangeMessage(problem: RangeProblem, { label, min, max, unit, hint, whole }: RangeWording): string {
  const range = rangeText(min, max, unit);
  const tail = hint ? `: ${hint}` : '';
  if (problem === 'too_small') return `${label} must be at least ${withUnit(min, unit)} (allowed ${range})${tail}`;
  if (problem === 'too_big') return `${label} must be at most ${withUnit(max, unit)} (allowed ${range})${tail}`;
  if (problem === 'not_whole') return `${label} must be a whole number (allowed ${range})${tail}`;
  return `${label} must be ${whole ? 'a whole number' : 'a number'}, ${range}`;
}
