/**
 * The one way dates are written for people: on screen, in e-mails and on sheets (DEVELOPERS.md, "Dates").
 * Intl in the reader's locale (the browser's Accept-Language on the server) and a stated time zone, UTC unless the
 * deployment names another, so the server render, the browser and the printed sheet all say the same.
 */

import { dateTimeFormat, supportedDateLocale } from './intl-formatters';

export type DateFormat = { locale: string; timeZone: string };

/** When the request names no language Intl knows. */
export const DEFAULT_LOCALE = 'en-GB';
export const DEFAULT_TIME_ZONE = 'UTC';
export const DEFAULT_DATE_FORMAT: DateFormat = { locale: DEFAULT_LOCALE, timeZone: DEFAULT_TIME_ZONE };

/** The language tags of an Accept-Language header, preferred first (RFC 9110 §12.5.4: q from 0 to 1, default 1). */
function acceptedTags(header: string): string[] {
  return header
    .split(',')
    .map((part, order) => {
      const [tag = '', ...params] = part.trim().split(';');
      const q = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
      return { tag: tag.trim(), q: q ? Number(q.slice(2)) : 1, order };
    })
    .filter((entry) => entry.tag !== '' && entry.tag !== '*' && entry.q > 0 && entry.q <= 1)
    .sort((a, b) => b.q - a.q || a.order - b.order)
    .map((entry) => entry.tag);
}

/** The first language of an Accept-Language header that Intl can write dates in, else DEFAULT_LOCALE. */
export function localeFromAcceptLanguage(header: string | null | undefined): string {
  for (const tag of acceptedTags(header ?? '')) {
    const locale = supportedDateLocale(tag);
    if (locale) return locale;
  }
  return DEFAULT_LOCALE;
}

/** A configured IANA time zone name if Intl knows it, else UTC. */
export function timeZoneOrUtc(name: string | null | undefined): string {
  if (!name) return DEFAULT_TIME_ZONE;
  try {
    return dateTimeFormat('en', { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return DEFAULT_TIME_ZONE;
  }
}

export function dateFormatFor(acceptLanguage: string | null | undefined, timeZone?: string | null): DateFormat {
  return { locale: localeFromAcceptLanguage(acceptLanguage), timeZone: timeZoneOrUtc(timeZone) };
}

// A calendar day as stored ("2026-12-01": opened on, finished on) is a date without a clock: written as it is, in no zone.
const CALENDAR_DAY = /^\d{4}-\d{2}-\d{2}$/;

// SQLite's CURRENT_TIMESTAMP (knex.fn.now()) is UTC written without a zone: "2026-12-01 12:00:00".
const SQLITE_UTC = /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}$/;

/** A stored time as a Date: ISO 8601 text, SQLite's UTC timestamp text, or a Date; null when it is no time at all. */
export function storedTime(value: string | Date): Date | null {
  const date = value instanceof Date ? value : new Date(SQLITE_UTC.test(value) ? `${value.replace(' ', 'T')}Z` : value);
  return Number.isFinite(date.getTime()) ? date : null;
}

const DATE_PARTS: Intl.DateTimeFormatOptions = { year: 'numeric', month: 'short', day: 'numeric' };
const TIME_PARTS: Intl.DateTimeFormatOptions = { hour: '2-digit', minute: '2-digit', timeZoneName: 'short' };

function written(value: string | Date, format: DateFormat, parts: Intl.DateTimeFormatOptions): string {
  const date = storedTime(value);
  return date ? dateTimeFormat(format.locale, { ...parts, timeZone: format.timeZone }).format(date) : '';
}

/** The calendar day, e.g. "1 Dec 2026" (en-GB) or "Dec 1, 2026" (en-US); '' for no time. A stored day keeps its date. */
export function formatDate(value: string | Date, format: DateFormat): string {
  const day = typeof value === 'string' && CALENDAR_DAY.test(value);
  return written(value, day ? { ...format, timeZone: 'UTC' } : format, DATE_PARTS);
}

/** The day and the time with its zone, e.g. "1 Dec 2026, 12:00 UTC" (en-GB); '' for no time. */
export function formatDateTime(value: string | Date, format: DateFormat): string {
  return written(value, format, { ...DATE_PARTS, ...TIME_PARTS });
}
