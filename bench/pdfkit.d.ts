// The bench drives react-pdf's own engine (node_modules/pdfkit) directly; it ships no types.
declare module 'pdfkit' {
  type PdfKitOptions = { autoFirstPage?: boolean; compress?: boolean; info?: Record<string, string> };
  export default class PDFDocument {
    constructor(options?: PdfKitOptions);
    addPage(options: { size: [number, number]; margin: number }): this;
    on(event: 'data', listener: (chunk: Buffer) => void): this;
    on(event: 'end', listener: () => void): this;
    end(): void;
  }
}
