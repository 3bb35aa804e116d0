import 'server-only';
import path from 'node:path';
import { Font } from '@react-pdf/renderer';
import type { TextShape } from '@/lib/sheet/drawing';
import { withShapingMemo, type GlyphPosition } from './shaping-memo';

/**
 * The shipped DejaVu TTFs (fonts/, see fonts/LICENSE-DejaVu.txt), registered with
 * react-pdf once per process. TTF, not WOFF2: react-pdf cannot read WOFF2.
 */

type Weight = TextShape['weight'];

/** What the painter needs from a loaded font (a fontkit font object). */
export type PdfFontData = {
  unitsPerEm: number;
  layout(text: string): { glyphs: unknown[]; positions: GlyphPosition[]; advanceWidth: number };
  hasGlyphForCodePoint(codePoint: number): boolean;
};

/**
 * react-pdf family names for the drawing's two text roles, as the SVG names them
 * (lib/sheet/render-svg.ts): 'ui' is DejaVu Sans; 'figures' is DejaVu Sans Mono,
 * whose one shipped weight is paired with DejaVu Sans Condensed Bold, the bold
 * face nearest its 0.6 em digit width. 'condensed' serves narrow table cells.
 */
export const PDF_FONT_FAMILY = {
  ui: 'Rimscale Sans',
  figures: 'Rimscale Figures',
  condensed: 'Rimscale Condensed',
} as const;

type FamilyKey = keyof typeof PDF_FONT_FAMILY;

const FONT_FILES: Record<FamilyKey, Record<Weight, string>> = {
  ui: { normal: 'DejaVuSans.ttf', bold: 'DejaVuSans-Bold.ttf' },
  figures: { normal: 'DejaVuSansMono.ttf', bold: 'DejaVuSansCondensed-Bold.ttf' },
  condensed: { normal: 'DejaVuSansCondensed.ttf', bold: 'DejaVuSansCondensed-Bold.ttf' },
};

const FONT_WEIGHT: Record<Weight, number> = { normal: 400, bold: 700 };

export function fontFilePath(file: string): string {
  return path.join(process.cwd(), 'fonts', file);
}

// A global flag survives module reloads in `next dev`, where react-pdf's store stays put.
const REGISTERED = Symbol.for('rimscale.pdf.fonts.registered');
type FlaggedGlobal = typeof globalThis & { [REGISTERED]?: boolean };

export function registerSheetFonts(): void {
  const global = globalThis as FlaggedGlobal;
  if (global[REGISTERED]) return;
  for (const key of Object.keys(FONT_FILES) as FamilyKey[]) {
    const fonts = Object.entries(FONT_FILES[key]).map(([weight, file]) => ({
      src: fontFilePath(file),
      fontWeight: FONT_WEIGHT[weight as Weight],
    }));
    Font.register({ family: PDF_FONT_FAMILY[key], fonts });
  }
  global[REGISTERED] = true;
}

export type SheetFonts = Record<`${FamilyKey}-${Weight}`, PdfFontData>;

async function loadFont(key: FamilyKey, weight: Weight): Promise<PdfFontData> {
  const descriptor = { fontFamily: PDF_FONT_FAMILY[key], fontWeight: FONT_WEIGHT[weight] };
  await Font.load(descriptor);
  return withShapingMemo(Font.getFont(descriptor).data as unknown as PdfFontData);
}

let loaded: Promise<SheetFonts> | undefined;

/** Registers (once) and parses (once) every face the sheets use, each with its shaped words remembered (shaping-memo.ts). */
export function loadSheetFonts(): Promise<SheetFonts> {
  registerSheetFonts();
  loaded ??= (async () => ({
    'ui-normal': await loadFont('ui', 'normal'),
    'ui-bold': await loadFont('ui', 'bold'),
    'figures-normal': await loadFont('figures', 'normal'),
    'figures-bold': await loadFont('figures', 'bold'),
    'condensed-normal': await loadFont('condensed', 'normal'),
    'condensed-bold': await loadFont('condensed', 'bold'),
  }))();
  loaded.catch(() => (loaded = undefined)); // let a later call retry after a failed read
  return loaded;
}

/** Characters of `text` that `font` has no glyph for (the painter would draw them as boxes). */
export function missingGlyphs(font: PdfFontData, text: string): string[] {
  return [...new Set(text)].filter((char) => !font.hasGlyphForCodePoint(char.codePointAt(0) ?? 0));
}
