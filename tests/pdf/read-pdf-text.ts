import { PDFParse } from 'pdf-parse';
import { withWorkerGlobal } from './pdfjs-worker-global';

/** Text, metadata and page sizes (points) of a PDF as pdf-parse 2.x reads them. */
export function readPdfText(data: Uint8Array) {
  // pdf-parse loads its bundled worker itself when no global one is set.
  return withWorkerGlobal(undefined, () => parse(data));
}

async function parse(data: Uint8Array) {
  const parser = new PDFParse({ data: new Uint8Array(data) });
  try {
    const { text } = await parser.getText();
    const info = await parser.getInfo({ parsePageInfo: true });
    const pages = (info.pages ?? []).map((page) => ({ widthPt: page.width, heightPt: page.height }));
    return { text, info: info.info as Record<string, unknown>, pageCount: info.total, pages };
  } finally {
    await parser.destroy();
  }
}
