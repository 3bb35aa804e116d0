import 'server-only';
import type { Drawing } from '@/lib/sheet/drawing';
import { loadSheetFonts } from './fonts';
import { renderDocumentToBuffer } from './render-document';
import { SheetDocument } from './sheet-document';

/**
 * The PDF bytes of a drawing, fonts embedded (subset), one page per layout page.
 * With `createdAt` (the sheet's date) the bytes are a function of the drawing alone;
 * without it the document's creation date is the moment of rendering.
 */
export async function renderSheetPdf(drawing: Drawing, options: { createdAt?: Date } = {}): Promise<Buffer> {
  const fonts = await loadSheetFonts();
  // Called as a function: renderToBuffer wants the <Document> element itself.
  return renderDocumentToBuffer(SheetDocument({ drawing, fonts, ...options }));
}
