// Source under test: lib/sheet-link.ts (what the sheet maker shows for a link, a reload or the bare page).
import { describe, expect, it } from 'vitest';
import { advanceMarkHref, portEventsWheelHref, tdcNoteHref } from '@/lib/engine/wheel-links';
import { tdcFromStops } from '@/lib/engine/tdc-from-stops';
import { prefillFromSearchParams } from '@/lib/generator-prefill';
import { resolveSheetLink } from '@/lib/sheet-link';

const typed = new URLSearchParams('kind=wheel&diameterMm=128.4&carrier=rotating&numbering=full&title=Bench+engine&paper=Letter');
const linkOf = (href: string) => new URLSearchParams(href.slice(href.indexOf('?') + 1));

describe('resolveSheetLink', () => {
  it('shows a plain link or a reload exactly as it is, whatever the last sheet was', () => {
    const { params, notices } = resolveSheetLink(new URLSearchParams('kind=ring&outerDiameterMm=150'), typed);
    expect(params.toString()).toBe('kind=ring&outerDiameterMm=150');
    expect(notices).toEqual([]);
  });

  it('brings the last sheet back on the bare page, and nothing when there is none', () => {
    expect(resolveSheetLink(new URLSearchParams(), typed).params.toString()).toBe(typed.toString());
    expect(resolveSheetLink(new URLSearchParams(), typed).notices).toHaveLength(1);
    expect(resolveSheetLink(new URLSearchParams(), null).params.toString()).toBe('');
  });

  it('adds a calculator’s advance mark to the typed sheet: 128.4 mm, full numbering and the title stay', () => {
    const { params } = resolveSheetLink(linkOf(advanceMarkHref(18)!), typed);
    const { values, ignored } = prefillFromSearchParams(params);
    expect(ignored).toEqual([]);
    expect(values).toMatchObject({ kind: 'wheel', diameterMm: 128.4, numbering: 'full', title: 'Bench engine', paper: 'Letter', advanceMarksDeg: [18] });
    expect(params.has('keep')).toBe(false);
    expect(params.has('addAdvanceMarkDeg')).toBe(false);
  });

  it('joins an added mark to the marks there are, once', () => {
    const withMarks = new URLSearchParams('diameterMm=100&advanceMarksDeg=16,17');
    expect(resolveSheetLink(linkOf(advanceMarkHref(18.5)!), withMarks).params.get('advanceMarksDeg')).toBe('16,17,18.5');
    expect(resolveSheetLink(linkOf(advanceMarkHref(17)!), withMarks).params.get('advanceMarksDeg')).toBe('16,17');
  });

  it('without a last sheet, a calculator link still opens a sheet with its value', () => {
    const { params } = resolveSheetLink(linkOf(advanceMarkHref(18)!), null);
    expect(params.toString()).toBe('advanceMarksDeg=18');
  });

  it('writes the TDC note for the numbering the sheet will use and says so', () => {
    // Stops at 334.8 and 24.8 on a full wheel: TDC midway at 359.8 (common practice: halve the sweep).
    const link = linkOf(tdcNoteHref(tdcFromStops({ numbering: 'full', readingADeg: 334.8, readingBDeg: 24.8 })));
    const split = resolveSheetLink(link, new URLSearchParams('diameterMm=128.4&numbering=split'));
    expect(split.params.get('note')).toMatch(/^True TDC reads 0\.2° BTDC on this wheel/);
    expect(split.params.get('note')).not.toContain('359.8');
    expect(split.notices.join(' ')).toContain('split (0–180 BTDC/ATDC) numbering');
    const full = resolveSheetLink(link, typed);
    expect(full.params.get('note')).toMatch(/^True TDC reads 359\.8° on this wheel/);
    expect(full.params.get('diameterMm')).toBe('128.4');
  });

  it('keeps a note the user wrote before the TDC note, and replaces an earlier TDC note', () => {
    const link = linkOf(tdcNoteHref(tdcFromStops({ numbering: 'split', readingADeg: 20, readingASide: 'BTDC', readingBDeg: 30, readingBSide: 'ATDC' })));
    const mine = resolveSheetLink(link, new URLSearchParams('note=Left+side')).params.get('note')!;
    expect(mine).toMatch(/^Left side; True TDC reads 5° ATDC/);
    const again = resolveSheetLink(link, new URLSearchParams({ note: mine.split('; ')[1]! })).params.get('note')!;
    expect(again.startsWith('True TDC')).toBe(true);
    expect(prefillFromSearchParams(new URLSearchParams({ note: mine })).ignored).toEqual([]);
  });

  it('puts port events on a wheel when the last sheet was a scribe chart, keeping its diameter', () => {
    const ports = [{ name: 'Exhaust', opensDegATDC: 95, closesDegATDC: 265 }] as Parameters<typeof portEventsWheelHref>[0];
    const { params } = resolveSheetLink(linkOf(portEventsWheelHref(ports)!), new URLSearchParams('kind=scribe&diameterMm=140'));
    expect(params.get('kind')).toBe('wheel');
    expect(params.get('numbering')).toBe('full');
    expect(params.get('diameterMm')).toBe('140');
  });
});
