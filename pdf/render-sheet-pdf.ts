import 'server-only';
import { renderToBuffer } from '@react-pdf/renderer';
import type { Drawing } from '@/lib/sheet/drawing';
import { loadSheetFonts } from './fonts';
import { SheetDocument } from './sheet-document';

/** The PDF bytes of a drawing, fonts embedded (subset), one page per layout page. */
export async function renderSheetPdf(drawing: Drawing): Promise<Buffer> {
  const fonts = await loadSheetFonts();
  // Called as a function: renderToBuffer wants the <Document> element itself.
  return renderToBuffer(SheetDocument({ drawing, fonts }));
}
