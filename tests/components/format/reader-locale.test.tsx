import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { StopSketch } from '@/components/calculators/stop-sketch';
import { ReaderLocale } from '@/components/format/reader-locale';

// The decimal sign is CLDR's, through Node's Intl: '.' in en-GB, ',' in de-DE (from memory of the CLDR charts).
const sketch = <StopSketch stopACrankDeg={340.5} stopBCrankDeg={24.5} tdcCrankDeg={2.5} />;

describe('ReaderLocale', () => {
  it('hands the layout’s locale to the calculators’ figures', () => {
    const html = renderToStaticMarkup(<ReaderLocale locale="de-DE">{sketch}</ReaderLocale>);
    expect(html).toContain('stops at 340,5° and 24,5° in crank order, true TDC at 2,5°');
  });

  it('writes figures in the default locale (en-GB) when no layout set one', () => {
    expect(renderToStaticMarkup(sketch)).toContain('stops at 340.5° and 24.5° in crank order, true TDC at 2.5°');
  });
});
