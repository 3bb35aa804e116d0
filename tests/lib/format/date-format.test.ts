// Source under test: lib/format/date-format.ts. Expected strings are the Unicode CLDR patterns for each locale
// (en-GB "d MMM y, HH:mm z", en-US "MMM d, y, h:mm a z", de "d. MMM y, HH:mm z"; from memory) as Intl (ECMA-402)
// writes them; Accept-Language weights follow RFC 9110 §12.5.4.
import { describe, expect, it } from 'vitest';
import { dateFormatFor, formatDate, formatDateTime, localeFromAcceptLanguage, storedTime, timeZoneOrUtc } from '@/lib/format/date-format';

const utc = (locale: string) => ({ locale, timeZone: 'UTC' });

describe('localeFromAcceptLanguage', () => {
  it('takes the most preferred language by q weight, ties in header order', () => {
    expect(localeFromAcceptLanguage('fr-CH, fr;q=0.9, en;q=0.8, de;q=0.7, *;q=0.5')).toBe('fr-CH');
    expect(localeFromAcceptLanguage('en;q=0.2, de-AT')).toBe('de-AT');
    expect(localeFromAcceptLanguage('da;q=0.5, nl;q=0.5')).toBe('da');
  });

  it('skips malformed tags, the wildcard and q=0, and falls back to en-GB', () => {
    expect(localeFromAcceptLanguage('not a tag!!, de;q=0.5')).toBe('de');
    expect(localeFromAcceptLanguage('de;q=0, *')).toBe('en-GB');
    expect(localeFromAcceptLanguage('')).toBe('en-GB');
    expect(localeFromAcceptLanguage(null)).toBe('en-GB');
  });
});

describe('timeZoneOrUtc', () => {
  it('keeps a zone of the IANA database and answers UTC for none or an unknown one', () => {
    expect(timeZoneOrUtc('Europe/Berlin')).toBe('Europe/Berlin');
    expect(timeZoneOrUtc(undefined)).toBe('UTC');
    expect(timeZoneOrUtc('Mars/Olympus')).toBe('UTC');
  });

  it('builds a format from the header and the configured zone', () => {
    expect(dateFormatFor('de-DE,de;q=0.9', 'Europe/Berlin')).toEqual({ locale: 'de-DE', timeZone: 'Europe/Berlin' });
    expect(dateFormatFor(undefined, undefined)).toEqual({ locale: 'en-GB', timeZone: 'UTC' });
  });
});

describe('storedTime', () => {
  it('reads ISO 8601 and SQLite CURRENT_TIMESTAMP text (UTC without a zone) as the same instant', () => {
    expect(storedTime('2026-12-01 12:00:00')?.toISOString()).toBe('2026-12-01T12:00:00.000Z');
    expect(storedTime('2026-12-01T12:00:00.000Z')?.toISOString()).toBe('2026-12-01T12:00:00.000Z');
  });

  it('answers null for text that is no time, and the formatters then write nothing', () => {
    expect(storedTime('yesterday')).toBeNull();
    expect(formatDate('yesterday', utc('en-GB'))).toBe('');
    expect(formatDateTime(new Date(Number.NaN), utc('en-GB'))).toBe('');
  });
});

describe('formatDate and formatDateTime', () => {
  const noon = '2026-12-01T12:00:00Z';

  it('write the day in the reader\'s locale', () => {
    expect(formatDate(noon, utc('en-GB'))).toBe('1 Dec 2026');
    expect(formatDate(noon, utc('en-US'))).toBe('Dec 1, 2026');
    expect(formatDate(noon, utc('de-DE'))).toBe('1. Dez. 2026');
  });

  it('write the time with its zone, so a reader knows which clock it is', () => {
    expect(formatDateTime(noon, utc('en-GB'))).toBe('1 Dec 2026, 12:00 UTC');
    expect(formatDateTime(noon, utc('de-DE'))).toBe('1. Dez. 2026, 12:00 UTC');
    // en-US puts a narrow no-break space (U+202F) before AM/PM in CLDR 42 and later.
    expect(formatDateTime(noon, utc('en-US')).replace(/\s/g, ' ')).toBe('Dec 1, 2026, 12:00 PM UTC');
  });

  it('keeps a stored calendar day (opened on 2026-12-01) on its date in any zone: it has no clock to shift', () => {
    // New York is UTC−5 in December (IANA tz database): midnight UTC would read as 30 November there.
    expect(formatDate('2026-12-01', { locale: 'en-GB', timeZone: 'America/New_York' })).toBe('1 Dec 2026');
    expect(formatDate('2026-12-01T00:00:00Z', { locale: 'en-GB', timeZone: 'America/New_York' })).toBe('30 Nov 2026');
  });

  it('turns the day over in the stated zone: 23:30 UTC on 1 December is 00:30 on the 2nd in Berlin (UTC+1 in winter)', () => {
    const late = '2026-12-01 23:30:00';
    expect(formatDate(late, utc('en-GB'))).toBe('1 Dec 2026');
    expect(formatDateTime(late, { locale: 'en-GB', timeZone: 'Europe/Berlin' })).toBe('2 Dec 2026, 00:30 CET');
  });
});
