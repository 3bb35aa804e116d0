import PDFDocument from 'pdfkit';
import type { Drawing } from '@/lib/sheet/drawing';
import { mmToPt } from '@/lib/units';
import type { SheetFonts } from '@/pdf/fonts';
import { paintPage } from '@/pdf/paint-page';
import type { Painter } from '@/pdf/painter';

/**
 * The same pages drawn by react-pdf's engine (pdfkit) alone: the same painter
 * calls, the same embedded fonts, no React tree or layout pass. The baseline
 * for react-pdf's overhead.
 */
export function renderWithRawPdfkit(drawing: Drawing, fonts: SheetFonts): Promise<Buffer> {
  const doc = new PDFDocument({ autoFirstPage: false, compress: true, info: { Title: drawing.title } });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve) => {
    doc.on('data', (chunk) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
  });
  for (const page of drawing.pages) {
    doc.addPage({ size: [mmToPt(page.sizeMm.widthMm), mmToPt(page.sizeMm.heightMm)], margin: 0 });
    paintPage(doc as unknown as Painter, drawing, page, fonts);
  }
  doc.end();
  return done;
}
