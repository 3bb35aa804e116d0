'use server';
import 'server-only';
import { requestDateFormat } from '@/app/lib/date-format';
import { buildDrawing } from '@/lib/sheet/build-drawing';
import { renderSvg } from '@/lib/sheet/render-svg';
import { sheetRequestSchema, toFieldIssues, type FieldIssue } from '@/lib/sheet/sheet-request';

export type SheetPreviewResult =
  | { ok: true; svg: string; warnings: string[]; pageCount: number }
  | { ok: false; issues: FieldIssue[] };

/**
 * The generator form's live preview: the same schema as POST /api/v1/sheets, the
 * untiled drawing as SVG, the layout's warnings and how many pages the PDF will take.
 * Public on purpose, so no session or role check: the generator works without an
 * account (DEVELOPERS.md, "Public pages") and this touches no stored data.
 */
export async function previewSheet(input: unknown): Promise<SheetPreviewResult> {
  const parsed = sheetRequestSchema.safeParse(input);
  if (!parsed.success) return { ok: false, issues: toFieldIssues(parsed.error) };
  try {
    const drawing = buildDrawing(parsed.data, { dateFormat: await requestDateFormat() });
    return { ok: true, svg: renderSvg(drawing), warnings: drawing.warnings, pageCount: drawing.pages.length };
  } catch (error) {
    console.error('previewSheet failed:', error instanceof Error ? error.message : String(error));
    return { ok: false, issues: [{ path: '(body)', message: 'The preview could not be drawn with these values; try other values.' }] };
  }
}
