import { describe, expect, it } from 'vitest';
import { portEvents } from '@/lib/engine/port-events';
import { tdcFromStops } from '@/lib/engine/tdc-from-stops';
import { advanceMarkHref, portEventsWheelHref, scribeChartHref, tdcNoteHref, tdcNoteText } from '@/lib/engine/wheel-links';
import { portEventSchema, sheetRequestSchema } from '@/lib/sheet/sheet-request';

function query(href: string): URLSearchParams {
  expect(href.startsWith('/?')).toBe(true);
  return new URLSearchParams(href.slice(2));
}

describe('links into the sheet maker use the sheet request fields', () => {
  it('carries port events onto a full wheel, leaving off ports that never open', () => {
    const { ports } = portEvents({
      strokeMm: 54,
      rodMm: 105,
      deckMm: 0,
      ports: [{ name: 'Exhaust', heightMm: 27 }, { name: 'Transfer', heightMm: 40 }, { name: 'Dead', heightMm: 80 }],
    });
    const params = query(portEventsWheelHref(ports) as string);
    expect(params.get('numbering')).toBe('full');
    const events = JSON.parse(params.get('portEvents') as string);
    // 82.6129515636983° rounds to 82.6; 360 − 82.6129… = 277.387… rounds to 277.4.
    expect(events).toEqual([
      { name: 'Exhaust', opensCrankDeg: 82.6, closesCrankDeg: 277.4 },
      { name: 'Transfer', opensCrankDeg: 111.6, closesCrankDeg: 248.4 },
    ]);
    for (const event of events) expect(portEventSchema.safeParse(event).success).toBe(true);
  });

  it('has no port link when no port opens', () => {
    const { ports } = portEvents({ strokeMm: 54, rodMm: 105, deckMm: 0, ports: [{ name: 'Dead', heightMm: 80 }] });
    expect(portEventsWheelHref(ports)).toBeNull();
  });

  it('carries an advance angle as one mark to add, within the sheet’s 0–60° BTDC, keeping the sheet there is', () => {
    const params = query(advanceMarkHref(18.04) as string);
    expect(params.get('addAdvanceMarkDeg')).toBe('18');
    expect(params.get('keep')).toBe('1');
    expect(advanceMarkHref(75)).toBeNull();
  });

  it('writes the TDC note for the numbering of the sheet it goes on', () => {
    // Stops read 340 and 30 on a full wheel: midway on the short arc is 5° (common practice: halve the sweep).
    const result = tdcFromStops({ numbering: 'full', readingADeg: 340, readingBDeg: 30 });
    expect(tdcNoteText(result, 'full')).toBe('True TDC reads 5° on this wheel (stop 25° either side): move the pointer 5° toward the BTDC side');
    expect(tdcNoteText(result, 'split')).toBe('True TDC reads 5° ATDC on this wheel (stop 25° either side): move the pointer 5° toward the BTDC side');
    // 359.8 in crank order is 0.2° before TDC: a split (0–180) wheel never shows "359.8°".
    const early = tdcFromStops({ numbering: 'full', readingADeg: 334.8, readingBDeg: 24.8 });
    expect(tdcNoteText(early, 'split')).toBe('True TDC reads 0.2° BTDC on this wheel (stop 25° either side): move the pointer 0.2° toward the ATDC side');
    expect(tdcNoteText(early, 'full')).toContain('reads 359.8° on this wheel');
    for (const numbering of ['full', 'split'] as const) expect(sheetRequestSchema.shape.note.safeParse(tdcNoteText(early, numbering)).success).toBe(true);
  });

  it('carries the TDC check as figures, not a finished note', () => {
    const params = query(tdcNoteHref(tdcFromStops({ numbering: 'full', readingADeg: 334.8, readingBDeg: 24.8 })));
    expect(params.get('tdcCrankDeg')).toBe('359.8');
    expect(params.get('tdcStopDeg')).toBe('25');
    expect(params.get('note')).toBeNull();
  });

  it('carries the diameter and angle span into a scribe chart', () => {
    const params = query(scribeChartHref(123.456, [16, 18, 20]));
    expect(params.get('kind')).toBe('scribe');
    expect(params.get('diameterMm')).toBe('123.46');
    expect(params.get('fromDeg')).toBe('16');
    expect(params.get('toDeg')).toBe('20');
    expect(query(scribeChartHref(100, [10, 270])).get('toDeg')).toBeNull();
  });
});
