import { Canvas, Document, Page } from '@react-pdf/renderer';
import type { Drawing, PageLayout } from '@/lib/sheet/drawing';
import { mmToPt } from '@/lib/units';
import type { SheetFonts } from './fonts';
import { paintPage } from './paint-page';
import type { Painter } from './painter';

export const PDF_AUTHOR = 'Rimscale';
export const PDF_SUBJECT = 'True-scale sheet: print at 100 % / actual size, fit-to-page off';

type SheetDocumentProps = { drawing: Drawing; fonts: SheetFonts; createdAt?: Date };

/**
 * A react-pdf document of one Drawing: a page per `drawing.pages` entry, drawn in
 * one `<Canvas>` through react-pdf's pdfkit painter (react-pdf's `<Svg>` primitives
 * cost ~20× more per line). Same layout as the SVG; only the renderer differs.
 */
export function SheetDocument({ drawing, fonts, createdAt }: SheetDocumentProps) {
  return (
    <Document
      title={drawing.title || 'Rimscale sheet'}
      author={PDF_AUTHOR}
      subject={PDF_SUBJECT}
      keywords="degree wheel, timing, true scale"
      creator={PDF_AUTHOR}
      producer={PDF_AUTHOR}
      {...(createdAt ? { creationDate: createdAt, modificationDate: createdAt } : {})}
    >
      {drawing.pages.map((page, index) => (
        <SheetPage key={index} drawing={drawing} page={page} fonts={fonts} />
      ))}
    </Document>
  );
}

function SheetPage({ drawing, page, fonts }: { drawing: Drawing; page: PageLayout; fonts: SheetFonts }) {
  const widthPt = mmToPt(page.sizeMm.widthMm);
  const heightPt = mmToPt(page.sizeMm.heightMm);
  const paint = (painter: Painter) => {
    paintPage(painter, drawing, page, fonts);
    return null;
  };
  return (
    <Page size={[widthPt, heightPt]}>
      <Canvas fixed style={{ position: 'absolute', left: 0, top: 0, width: widthPt, height: heightPt }} paint={paint} />
    </Page>
  );
}
