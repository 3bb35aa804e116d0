import 'server-only';
import { pdf } from '@react-pdf/renderer';

type DocumentElement = NonNullable<Parameters<typeof pdf>[0]>;
type PdfRoot = ReturnType<typeof pdf>;

/**
 * React roots, reused. react-pdf's renderToBuffer makes a new root for every document and
 * React keeps every root it ever scheduled, each holding its last tree and so the whole
 * drawing: ~0.2 MB a sheet, a server growing without end (measured with --expose-gc and a
 * heap snapshot: FiberRootNode → FiberNode → props.drawing). A root back in this list holds
 * at most one finished document; there are as many as renders ever ran at once (one in a
 * pool worker).
 */
const idleRoots: PdfRoot[] = [];

/** The PDF bytes of a react-pdf <Document>. */
export async function renderDocumentToBuffer(document: DocumentElement): Promise<Buffer> {
  const root = idleRoots.pop() ?? pdf();
  try {
    await new Promise<void>((committed) => root.updateContainer(document, committed));
    const stream = await root.toBuffer();
    const chunks: Buffer[] = [];
    for await (const chunk of stream) chunks.push(chunk as Buffer);
    return Buffer.concat(chunks);
  } finally {
    idleRoots.push(root);
    forgetReactMeasures();
  }
}

/**
 * react-pdf's bundled React reconciler writes a performance.measure() for every component it
 * commits (React's "Components" timing track), and Node keeps every measure in the thread's
 * performance timeline until it is cleared: ~0.9 MB a sheet, 137 of 173 MB live after 150 sheets
 * (a --heap-prof run). No one reads them here, so they go after each document. The thread
 * that draws PDFs is a pool worker, whose timeline holds nothing else.
 */
function forgetReactMeasures(): void {
  performance.clearMeasures();
}
