/**
 * Intl formatters, built once per locale and options. Building one costs tens of microseconds
 * (the locale data is looked up and resolved each time): under load, a sheet request that built
 * two spent about a tenth of the server's time there. The locale comes from the request's
 * Accept-Language, so a caller could name endless variants ("en-x-a1", "en-x-a2", …): the memo
 * keeps the MAX_KEPT most recently built and forgets the oldest.
 */

import { boundedMemo } from '../bounded-memo';

const MAX_KEPT = 200;

const numberFormats = boundedMemo<Intl.NumberFormat>(MAX_KEPT);
const dateTimeFormats = boundedMemo<Intl.DateTimeFormat>(MAX_KEPT);

export function numberFormat(locale: string, options: Intl.NumberFormatOptions): Intl.NumberFormat {
  return numberFormats(`${locale}|${JSON.stringify(options)}`, () => new Intl.NumberFormat(locale, options));
}

/** Throws, as Intl does, for a time zone or locale it does not know; nothing is kept then. */
export function dateTimeFormat(locale: string, options: Intl.DateTimeFormatOptions): Intl.DateTimeFormat {
  return dateTimeFormats(`${locale}|${JSON.stringify(options)}`, () => new Intl.DateTimeFormat(locale, options));
}

const supportedLocales = boundedMemo<string | null>(MAX_KEPT);

/** The locale Intl writes dates in for a language tag, or null when it has none or the tag is malformed. */
export function supportedDateLocale(tag: string): string | null {
  return supportedLocales(tag, () => {
    try {
      return Intl.DateTimeFormat.supportedLocalesOf([tag])[0] ?? null;
    } catch {
      return null; // not a well-formed language tag
    }
  });
}
