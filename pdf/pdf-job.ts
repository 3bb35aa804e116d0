import { buildDrawing } from '@/lib/sheet/build-drawing';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { renderSheetPdf } from './render-sheet-pdf';

/**
 * A PDF to render, as plain data a worker thread can be sent: the document kind
 * and its props. The sheet's `day` (YYYY-MM-DD, UTC) is the date in its title
 * block and its PDF creation date, so equal jobs give equal bytes.
 * Another document joins by adding a kind here and a line to RENDERERS.
 */
export type PdfJob = { kind: 'sheet'; props: { request: SheetRequest; day: string } };

type Renderers = { [K in PdfJob['kind']]: (props: Extract<PdfJob, { kind: K }>['props']) => Promise<Uint8Array> };

export function dayStart(day: string): Date {
  return new Date(`${day}T00:00:00Z`);
}

const RENDERERS: Renderers = {
  sheet: ({ request, day }) => renderSheetPdf(buildDrawing(request, { date: dayStart(day) }), { createdAt: dayStart(day) }),
};

/** Renders a job in this thread: what a pool worker runs, and the reference its output is checked against. */
export function renderPdfJob(job: PdfJob): Promise<Uint8Array> {
  return RENDERERS[job.kind](job.props as never);
}
