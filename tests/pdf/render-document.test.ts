import { describe, expect, it } from 'vitest';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { sheetRequestSchema } from '@/lib/sheet/sheet-request';

// Node's own console has timeStamp (an inspector method); vitest's stand-in does not, and without it React's
// reconciler switches its component timing off when it loads. Given one, the reconciler times as on a server.
const withTimeStamp = console as Console & { timeStamp?: (label?: string) => void };
withTimeStamp.timeStamp ??= () => {};
const { renderSheetPdf } = await import('@/pdf/render-sheet-pdf');

describe('renderDocumentToBuffer', () => {
  it('leaves no performance measures behind: the timeline would keep every component React timed, for every sheet', async () => {
    const drawing = buildDrawing(sheetRequestSchema.parse({ kind: 'wheel', diameterMm: 90 }), { date: new Date('2026-03-01T00:00:00Z') });
    for (let i = 0; i < 3; i += 1) await renderSheetPdf(drawing);
    // The W3C User Timing buffer (performance.getEntriesByType, https://www.w3.org/TR/user-timing/) as Node keeps it.
    expect(performance.getEntriesByType('measure')).toEqual([]);
  });
});
