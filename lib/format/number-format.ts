/**
 * The one way numbers are written for people: counts, measurements and their plurals, on screen,
 * in e-mails and in a sheet's title block (DEVELOPERS.md, "Numbers"). Intl in the reader's locale,
 * the same locale dates are written in (`DateFormat.locale`, from the request's Accept-Language):
 * 2.5 reads "2.5" in en-GB and "2,5" in de-DE.
 *
 * - Measurements (mm, in, degrees) are written without thousands grouping, so "1885.2 mm" never
 *   becomes "1,885.2 mm", which a reader of a decimal-comma language would take for 1.8852.
 * - Counts are grouped ("12,000 rows", "12.000 rows").
 * - The words around a number are English, so the singular or plural is chosen by English plural
 *   rules (Intl.PluralRules('en')): French rules call 0 "one" and would write "0 template".
 */

import { numberFormat } from './intl-formatters';

/**
 * Degrees printed on a sheet (the scale's numerals, advance marks, a pointer correction in the note)
 * are written with '.' whatever the reader's locale: they name marks on the scale, and a decimal
 * comma beside the commas of a list of marks would be ambiguous. Lengths on a sheet follow the reader.
 */
export const SHEET_NUMERALS_LOCALE = 'en';

/** Places after the decimal sign: `places` exactly, or up to `maxPlaces` with trailing zeros dropped. */
export type Places = { places: number } | { maxPlaces: number };

/** A measurement in the reader's locale, without grouping: formatDecimal(2.5, 'de-DE', { places: 2 }) is "2,50". '' for no number. */
export function formatDecimal(value: number, locale: string, places: Places): string {
  if (!Number.isFinite(value)) return '';
  const digits = 'places' in places ? { minimumFractionDigits: places.places, maximumFractionDigits: places.places } : { maximumFractionDigits: places.maxPlaces };
  // Rounded to the shown places first, so -0.001 shown with 2 places is "0.00", not "-0.00".
  const step = 10 ** ('places' in places ? places.places : places.maxPlaces);
  const rounded = Math.round(value * step) / step || 0;
  return numberFormat(locale, { ...digits, useGrouping: false }).format(rounded);
}

/** "120.5 mm" / "120,5 mm": a length in millimetres, up to two places unless told otherwise. */
export function formatMm(valueMm: number, locale: string, places: Places = { maxPlaces: 2 }): string {
  return `${formatDecimal(valueMm, locale, places)} mm`;
}

/** "18.0°" / "18,0°": an angle in degrees, one place unless told otherwise. */
export function formatDeg(valueDeg: number, locale: string, places: Places = { places: 1 }): string {
  return `${formatDecimal(valueDeg, locale, places)}°`;
}

/** A whole count, grouped in the reader's locale: "12,000" (en-GB), "12.000" (de-DE). */
export function formatCount(count: number, locale: string): string {
  return numberFormat(locale, { maximumFractionDigits: 0 }).format(count);
}

const englishPlurals = new Intl.PluralRules('en');

function isOne(count: number): boolean {
  return englishPlurals.select(count) === 'one';
}

/** "1 template", "2 templates", "12.000 templates" (de-DE): the count with the noun's form that fits it. */
export function countOf(count: number, singular: string, locale: string, plural = `${singular}s`): string {
  return `${formatCount(count, locale)} ${isOne(count) ? singular : plural}`;
}

/** "1 row matches", "2 rows match": a count with its noun and a verb that agrees. */
export function countWithVerb(count: number, noun: [string, string], verb: [string, string], locale: string): string {
  const one = isOne(count);
  return `${formatCount(count, locale)} ${one ? noun[0] : noun[1]} ${one ? verb[0] : verb[1]}`;
}

/** The reader's decimal sign: "." (en-GB), "," (de-DE). */
function decimalSign(locale: string): string {
  return numberFormat(locale, { minimumFractionDigits: 1 }).formatToParts(1.5).find((part) => part.type === 'decimal')?.value ?? '.';
}

/**
 * Numbers in a row, each up to `maxPlaces`: "18, 22.5" (en-GB), but "18; 22,5" (de-DE), where a comma
 * between numbers that have decimal commas would make one number out of two.
 */
export function formatDecimalList(values: readonly number[], locale: string, maxPlaces = 3): string {
  return values.map((value) => formatDecimal(value, locale, { maxPlaces })).join(decimalSign(locale) === ',' ? '; ' : ', ');
}
