import type { Build } from '@/lib/builds/build';
import type { DateFormat } from '@/lib/format/date-format';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { dayFormat, dayStart } from '@/lib/sheet/sheet-day';
import type { SheetRequest } from '@/lib/sheet/sheet-request';
import { renderBuildRecordPdf, type CopyPaper } from './render-build-record-pdf';
import { renderSheetPdf } from './render-sheet-pdf';

/**
 * A PDF to render, as plain data a worker thread can be sent: the document kind
 * and its props. A sheet's `day` (YYYY-MM-DD) is the date in its title block,
 * written in `locale`, and its PDF creation date, so equal jobs give equal bytes.
 * Another document joins by adding a kind here and a line to RENDERERS.
 */
export type PdfJob =
  | { kind: 'sheet'; props: { request: SheetRequest; day: string; locale: string } }
  | { kind: 'buildRecord'; props: { build: Build; shopName: string; paper: CopyPaper; dateFormat: DateFormat } };

/** The bytes, and what the layout could not draw as asked (a sheet's warnings; none for other documents). */
export type RenderedPdf = { bytes: Uint8Array; notes: string[] };

type Renderers = { [K in PdfJob['kind']]: (props: Extract<PdfJob, { kind: K }>['props']) => Promise<RenderedPdf> };

const RENDERERS: Renderers = {
  async sheet({ request, day, locale }) {
    const drawing = buildDrawing(request, { date: dayStart(day), dateFormat: dayFormat(locale) });
    return { bytes: await renderSheetPdf(drawing, { createdAt: dayStart(day) }), notes: drawing.warnings };
  },
  async buildRecord({ build, shopName, paper, dateFormat }) {
    return { bytes: await renderBuildRecordPdf(build, shopName, paper, dateFormat), notes: [] };
  },
};

/** Renders a job in this thread: what a pool worker runs, and the reference its output is checked against. */
export function renderPdfJob(job: PdfJob): Promise<RenderedPdf> {
  return RENDERERS[job.kind](job.props as never);
}
