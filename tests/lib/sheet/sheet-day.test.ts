import { describe, expect, it } from 'vitest';
import { dayFormat, dayStart } from '@/lib/sheet/sheet-day';

describe('a sheet day', () => {
  it('starts at midnight UTC of the calendar day (ECMA-262 §21.4.1.32, date-time string format with Z)', () => {
    expect(dayStart('2026-03-14').getTime()).toBe(Date.UTC(2026, 2, 14));
  });

  it('is written as that calendar day in any language, whatever zone it was taken in (Intl.DateTimeFormat, ECMA-402)', () => {
    const { locale, timeZone } = dayFormat('en-US');
    const written = new Intl.DateTimeFormat(locale, { timeZone, dateStyle: 'long' }).format(dayStart('2026-03-14'));
    expect(written).toBe('March 14, 2026');
    expect(dayFormat('de-DE')).toEqual({ locale: 'de-DE', timeZone: 'UTC' });
  });
});
