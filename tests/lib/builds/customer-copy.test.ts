import { describe, expect, it } from 'vitest';
import { customerCopy, degText, mmText, signedDegText } from '@/lib/builds/customer-copy';
import { sampleBuild } from '@/tests/support/sample-build';

// Decimal signs are CLDR's through Node's Intl: '.' for en-GB, ',' for de-DE (from memory of the CLDR charts).

describe('build record figures', () => {
  it('write angles to 0.1° and lengths to 0.01 mm in the reader’s locale (common practice for the resolution)', () => {
    expect(degText(17.96, 'en-GB', '° BTDC')).toBe('18.0° BTDC');
    expect(degText(17.96, 'de-DE', '° BTDC')).toBe('18,0° BTDC');
    expect(mmText(1.5, 'de-DE')).toBe('1,50 mm');
    expect(mmText(null, 'de-DE')).toBe('—');
  });

  it('always sign a correction, with a true minus sign, and no "−0.0"', () => {
    expect(signedDegText(1.25, 'en-GB')).toBe('+1.3°');
    expect(signedDegText(-0.5, 'de-DE')).toBe('−0,5°');
    expect(signedDegText(-0.04, 'en-GB')).toBe('±0.0°');
  });

  it('the customer’s copy follows the locale of whoever prints or sends it', () => {
    const build = sampleBuild();
    const german = customerCopy(build, 'Harbour Lane Motors', { locale: 'de-DE', timeZone: 'UTC' });
    expect(german.timing[0]!.value).toMatch(/^18,0° BTDC {2}= {2}\d+,\d\d mm BTDC$/);
    expect(german.other.find((row) => row.label.startsWith('Deck'))?.value).toBe('0,50 mm');
    const english = customerCopy(build, 'Harbour Lane Motors', { locale: 'en-GB', timeZone: 'UTC' });
    expect(english.timing[0]!.value).toMatch(/^18\.0° BTDC {2}= {2}\d+\.\d\d mm BTDC$/);
  });
});
