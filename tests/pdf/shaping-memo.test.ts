import PDFDocument from 'pdfkit';
import { describe, expect, it } from 'vitest';
import { loadSheetFonts } from '@/pdf/fonts';
import { MAX_MEMO_WORDS, withShapingMemo, type ShapingFont } from '@/pdf/shaping-memo';
import { readPdfText } from './read-pdf-text';

/**
 * The shaped-word memo (pdf/shaping-memo.ts) against fontkit's own shaping of the
 * shipped fonts, and pdfkit documents drawn with it against documents drawn with
 * the bare font, read back with pdf-parse.
 */

// Sheet numerals and labels, a ligature candidate, accents and a non-Latin word (DejaVu covers Greek and Cyrillic).
const WORDS = ['0', '10', '180', '18° BTDC', 'ATDC side', 'office', 'Väterchen', 'Ωμέγα', 'Ротор', '−12.5'];

type Run = ReturnType<ShapingFont['layout']> & { advanceWidth: number };

function glyphIds(run: Run): number[] {
  return run.glyphs.map((glyph) => (glyph as { id: number }).id);
}

async function bareAndMemo() {
  const memo = (await loadSheetFonts())['ui-normal'] as unknown as ShapingFont;
  // The memo reaches the font through its prototype (shaping-memo.ts).
  const bare = Object.getPrototypeOf(memo) as ShapingFont;
  return { bare, memo };
}

/** A counting stand-in for a fontkit font: each glyph advances by the text's length. */
function countingFont() {
  const calls: Array<{ text: string; features: unknown }> = [];
  const font: ShapingFont = {
    layout(text, features) {
      calls.push({ text, features });
      const glyphs = [...text].map((_, id) => ({ id }));
      const positions = glyphs.map(() => ({ xAdvance: text.length, yAdvance: 0, xOffset: 0, yOffset: 0 }));
      return { glyphs, positions };
    },
  };
  return { font, calls };
}

/** The pdfkit calls this test makes (pdfkit ships no types; bench/pdfkit.d.ts declares only what the bench uses). */
type TextDocument = PDFDocument & {
  font(font: unknown, family: string, sizePt: number): TextDocument;
  text(text: string, xPt: number, yPt: number, options: { lineBreak: boolean }): TextDocument;
};

function pdfOf(font: unknown): Promise<Buffer> {
  // A fixed creation date: pdfkit derives the file ID from it, so equal drawings give equal bytes.
  const options = { size: 'A4', info: { CreationDate: new Date('2026-03-01T00:00:00Z') } };
  const doc = new PDFDocument(options as unknown as ConstructorParameters<typeof PDFDocument>[0]) as TextDocument;
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  doc.font(font, 'memo-test', 11);
  WORDS.forEach((word, i) => doc.text(word, 72, 72 + 20 * i, { lineBreak: false }));
  doc.end();
  return done;
}

describe('withShapingMemo', () => {
  it('gives the glyphs and positions fontkit gives, on the first call and on a repeat', async () => {
    const { bare, memo } = await bareAndMemo();
    for (const word of WORDS) {
      const expected = bare.layout(word) as Run;
      for (const run of [memo.layout(word) as Run, memo.layout(word) as Run]) {
        expect({ word, ids: glyphIds(run) }).toEqual({ word, ids: glyphIds(expected) });
        expect(run.positions.map((p) => ({ ...p }))).toEqual(expected.positions.map(({ xAdvance, yAdvance, xOffset, yOffset }) => ({ xAdvance, yAdvance, xOffset, yOffset })));
        expect(run.advanceWidth).toBe(expected.advanceWidth);
      }
    }
  });

  it('hands out fresh positions: pdfkit scales a run in place, and that must not reach the next document', async () => {
    const { memo } = await bareAndMemo();
    const first = memo.layout('360') as Run;
    const unscaledWidth = first.advanceWidth;
    for (const position of first.positions) position.xAdvance *= 2; // what pdfkit's layoutRun does with 1000 / unitsPerEm
    expect(first.advanceWidth).toBeCloseTo(2 * unscaledWidth, 9); // the advance follows the positions, as fontkit's GlyphRun does
    expect((memo.layout('360') as Run).advanceWidth).toBe(unscaledWidth);
  });

  it('shapes a word once, but passes every call with features through to the font', () => {
    const { font, calls } = countingFont();
    const memo = withShapingMemo(font);
    memo.layout('BTDC');
    memo.layout('BTDC');
    memo.layout('BTDC', ['smcp']);
    memo.layout('BTDC', ['smcp']);
    expect(calls.map((call) => call.features)).toEqual([undefined, ['smcp'], ['smcp']]);
  });

  it(`keeps at most ${MAX_MEMO_WORDS} words, forgets the oldest first, and still answers each word right`, () => {
    const { font, calls } = countingFont();
    const memo = withShapingMemo(font);
    for (let i = 0; i <= MAX_MEMO_WORDS; i += 1) memo.layout(`w${i}`);
    expect(calls).toHaveLength(MAX_MEMO_WORDS + 1);
    const again = memo.layout('w0') as Run; // the oldest, forgotten when the memo was full
    expect(calls).toHaveLength(MAX_MEMO_WORDS + 2);
    expect(again.advanceWidth).toBe(2 * 2); // two glyphs, each advancing by the text's length
  });

  it('draws PDFs byte for byte as the bare font does, document after document (pdfkit, read back with pdf-parse)', async () => {
    const { bare } = await bareAndMemo();
    const expected = await pdfOf(bare);
    const memo = withShapingMemo(bare);
    // The first document fills the memo; the later ones are drawn from it, after pdfkit has scaled the runs it got.
    for (let document = 1; document <= 3; document += 1) expect({ document, same: (await pdfOf(memo)).equals(expected) }).toEqual({ document, same: true });
    const { text } = await readPdfText(await pdfOf(memo));
    for (const word of WORDS) expect(text).toContain(word);
  });
});
