import { describe, expect, it } from 'vitest';
import { dateTimeFormat, numberFormat, supportedDateLocale } from '@/lib/format/intl-formatters';

describe('Intl formatters kept per locale and options', () => {
  it('hands back the same formatter for the same locale and options, a new one for others', () => {
    const first = numberFormat('de-DE', { maximumFractionDigits: 1 });
    expect(numberFormat('de-DE', { maximumFractionDigits: 1 })).toBe(first);
    expect(numberFormat('de-DE', { maximumFractionDigits: 2 })).not.toBe(first);
    // The kept formatter still formats in its own locale (de-DE writes a decimal comma; CLDR, from memory).
    expect(first.format(2.25)).toBe('2,3');
  });

  it('keeps a bounded number: after hundreds of caller-named locales the first is built again', () => {
    const first = dateTimeFormat('en-x-keep0', { year: 'numeric' });
    for (let i = 1; i <= 250; i += 1) dateTimeFormat(`en-x-keep${i}`, { year: 'numeric' });
    const again = dateTimeFormat('en-x-keep0', { year: 'numeric' });
    expect(again).not.toBe(first);
    expect(again.resolvedOptions().locale).toBe(first.resolvedOptions().locale);
  });

  it('throws for a time zone Intl does not know, and keeps nothing for it', () => {
    expect(() => dateTimeFormat('en', { timeZone: 'Nowhere/Atlantis' })).toThrow(RangeError);
    expect(() => dateTimeFormat('en', { timeZone: 'Nowhere/Atlantis' })).toThrow(RangeError);
  });

  it('answers null for a malformed language tag and the locale for a known one', () => {
    expect(supportedDateLocale('not a tag!')).toBeNull();
    expect(supportedDateLocale('de-DE')).toBe('de-DE');
  });
});
