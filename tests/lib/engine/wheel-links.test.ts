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
    expect(params.get('kind')).toBe('wheel');
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

  it('carries an advance angle as one mark, within the sheet’s 0–60° BTDC', () => {
    expect(query(advanceMarkHref(18.04) as string).get('advanceMarksDeg')).toBe('18');
    expect(advanceMarkHref(75)).toBeNull();
  });

  it('carries the TDC correction as a note the sheet accepts', () => {
    const result = tdcFromStops({ numbering: 'full', readingADeg: 340, readingBDeg: 30 });
    expect(tdcNoteText(result)).toBe('True TDC reads 5° on this wheel (stop 25° either side): move the pointer 5° toward the BTDC side');
    const note = query(tdcNoteHref(result)).get('note') as string;
    expect(note).toBe('True TDC reads 5° on this wheel (stop 25° either side): move the pointer 5° toward the BTDC side');
    expect(sheetRequestSchema.shape.note.safeParse(note).success).toBe(true);
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
