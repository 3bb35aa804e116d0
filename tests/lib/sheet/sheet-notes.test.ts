// Source under test: lib/sheet/sheet-notes.ts and lib/sheet/info-panel.ts (title block, print line,
// cautions of DEVELOPERS.md, "Cautions", the "which way" note and diagram), read back from the SVG with @xmldom/xmldom.
import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { FIXED_DATE, parseSvg, req } from './svg-measure';

function sheetText(input: Parameters<typeof req>[0]) {
  const svg = parseSvg(renderSvg(buildDrawing(req(input), { date: FIXED_DATE })));
  return { svg, words: svg.all('text').map((t) => t.textContent).join(' ') };
}

describe('the sheet date', () => {
  it('is written in the reader\'s locale and the stated time zone', () => {
    // 2026-12-01T23:30Z is already 2 December in Berlin (UTC+1 in winter, IANA tz database); CLDR de "d. MMM y".
    const late = new Date('2026-12-01T23:30:00Z');
    const at = (locale: string, timeZone: string) =>
      parseSvg(renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 118 }), { date: late, dateFormat: { locale, timeZone } })))
        .all('text')
        .map((t) => t.textContent)
        .join(' ');
    expect(at('en-US', 'UTC')).toContain('Date Dec 1, 2026'); // CLDR en-US "MMM d, y"
    expect(at('de-DE', 'Europe/Berlin')).toContain('Date 2. Dez. 2026');
  });
});

describe('the title block figures', () => {
  it('write lengths in the sheet\'s locale and keep degrees, like the scale\'s numerals, with a decimal point', () => {
    // de-DE writes a decimal comma (CLDR, through Node's Intl); DEVELOPERS.md, "Numbers", says which figures follow it.
    const words = (locale: string) =>
      parseSvg(renderSvg(buildDrawing(req({ kind: 'wheel', diameterMm: 118.5, hubHoleMm: 12.25, advanceMarksDeg: [17.5] }), { date: FIXED_DATE, dateFormat: { locale, timeZone: 'UTC' } })))
        .all('text')
        .map((t) => t.textContent)
        .join(' ');
    const german = words('de-DE');
    expect(german).toContain('Degree wheel 118,5 mm');
    expect(german).toContain('Disc diameter 118,5 mm · hub hole 12,25 mm');
    expect(german).toContain('Advance marks: 17.5° BTDC');
    const english = words('en-GB');
    expect(english).toContain('Disc diameter 118.5 mm · hub hole 12.25 mm');
  });
});

describe('every sheet says what it is and how to print it', () => {
  it.each(['wheel', 'ring', 'strip', 'scribe', 'check'] as const)('%s: title block, print line, cautions and which-way note', (kind) => {
    const { words } = sheetText({
      kind,
      diameterMm: 118,
      innerDiameterMm: 118,
      outerDiameterMm: 150,
      title: 'Harbour Lane 125 scooter',
      printerProfileName: 'Office laser',
      printerScaleX: 0.99,
      paper: 'Letter',
      note: 'checked twice',
    });
    expect(words).toContain('Harbour Lane 125 scooter');
    if (kind !== 'check') expect(words).toContain('118 mm'); // the check sheet has no scale
    // The scale-check sheet shows only what concerns it (no carrier, rotation, numbering or which way).
    for (const line of ['Carrier: rotating', 'Rotation: clockwise', 'Numbering: split', 'Which way:']) {
      if (kind === 'check') expect(words).not.toContain(line);
      else expect(words).toContain(line);
    }
    // The default date format, en-GB in UTC: day, abbreviated month, year (Unicode CLDR en-GB "d MMM y").
    expect(words).toContain('Date 1 Dec 2026');
    expect(words).toContain('paper Letter portrait');
    expect(words).toContain('Printer profile: Office laser');
    expect(words).toContain('printer scale x 0.990');
    expect(words).toContain('Note: checked twice');
    expect(words).toContain('Print at 100 % / actual size — turn off fit-to-page');
    // DEVELOPERS.md, "Cautions", in short.
    for (const caution of ['plug lead off', 'positive stop by hand only', 'clear of the flywheel and fan', 'ventilation', 'detonation', 'maker’s manual'])
      expect(words).toContain(caution);
  });

  it.each([
    ['cw', 'rotating', 'clockwise', 'with'],
    ['cw', 'stationary', 'counter-clockwise', 'against'],
    ['ccw', 'rotating', 'counter-clockwise', 'with'],
    ['ccw', 'stationary', 'clockwise', 'against'],
  ] as const)('wheel %s %s: BTDC marks lie %s from TDC (%s the rotation), in words and in the diagram', (rotation, carrier, side, relation) => {
    const { svg, words } = sheetText({ kind: 'wheel', diameterMm: 100, rotation, carrier });
    expect(words).toContain(`the BTDC marks lie ${side} from TDC (${relation} the rotation)`);
    // In the small diagram the BTDC label sits right of TDC (clockwise from the top) or left.
    const label = (role: string) => svg.all('text').find((t) => t.getAttribute('data-role') === role)!;
    const tdcX = Number(svg.all('line').find((l) => l.getAttribute('data-role') === 'which-way')!.getAttribute('x1'));
    const btdcX = Number(label('which-way-btdc').getAttribute('x'));
    expect(btdcX > tdcX).toBe(side === 'clockwise');
  });

  it('a strip says its arrow carries the direction (no mirror for cw/ccw)', () => {
    const rotating = sheetText({ kind: 'strip', diameterMm: 50 }).words;
    expect(rotating).toContain('the BTDC marks lie ahead of TDC along the arrow');
    expect(rotating).toContain('same strip serves clockwise and counter-clockwise engines');
    expect(sheetText({ kind: 'strip', diameterMm: 50, carrier: 'stationary' }).words).toContain('the BTDC marks lie behind TDC (against the arrow)');
  });
});

describe('how to use this sheet', () => {
  it.each([
    ['wheel', { kind: 'wheel', diameterMm: 150 }, ['Cut on the outer line', 'positive stop', 'pointer reads 0', 'Read the advance']],
    ['ring', { kind: 'ring', innerDiameterMm: 130, outerDiameterMm: 160 }, ['outer and the inner circle', 'positive stop', '0 sits at the flywheel', 'Read the advance']],
    ['strip', { kind: 'strip', diameterMm: 90 }, ['arrow pointing the way the rim moves', 'seam at BDC', 'glue tail under the start', 'positive stop']],
    ['window strip', { kind: 'strip', diameterMm: 150, windowCrankDeg: [320, 10] }, ['arrow pointing the way the rim moves', 'positive stop']],
    ['scribe chart', { kind: 'scribe', diameterMm: 120 }, ['dividers', 'positive stop', 'scribe the advance mark']],
  ] as const)('%s: numbered steps under the heading, in the trade’s words', (_, input, phrases) => {
    const { svg } = sheetText(input as unknown as Parameters<typeof sheetText>[0]);
    expect(svg.all('text').some((t) => t.getAttribute('data-role') === 'how-to-heading' && t.textContent === 'How to use this sheet')).toBe(true);
    const steps = svg.all('text').filter((t) => t.getAttribute('data-role') === 'how-to').map((t) => t.textContent).join(' ');
    expect(steps).toMatch(/^1\. Print at 100 %/);
    expect(steps).toContain(' 2. ');
    for (const phrase of phrases) expect(steps).toContain(phrase);
  });

  it('the scale-check sheet has none', () => {
    expect(sheetText({ kind: 'check' }).svg.all('text').some((t) => t.getAttribute('data-role') === 'how-to-heading')).toBe(false);
  });
});
