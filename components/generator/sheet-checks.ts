import { issueInUnit, sheetRequestSchema, toFieldIssues, type CodedIssue, type FieldIssue, type SheetRequestInput } from '@/lib/sheet/sheet-request';
import type { GeneratorFormValues } from './form-values';

/**
 * The preview's use of the shared sheet schema. The preview loads this module (and zod with it) on first need,
 * not with the page, so a first visit to the sheet maker stays light.
 */

/** A field issue; `code` is the zod issue code when the browser found it (the server's answer has none). */
export type PreviewIssue = FieldIssue & { code?: string };

/** What the schema finds wrong with a preview request, each issue with zod's code; null when it is valid. */
export function previewIssues(input: SheetRequestInput): PreviewIssue[] | null {
  const checked = sheetRequestSchema.safeParse({ ...input, format: 'svg' });
  if (checked.success) return null;
  const codes = checked.error.issues.map((issue) => issue.code);
  return toFieldIssues(checked.error).map((issue, i) => ({ ...issue, code: codes[i] }));
}

/** An issue as the form shows it: lengths in the unit the form shows them in. */
export function issueInFormUnit(issue: CodedIssue, values: GeneratorFormValues): string {
  return issueInUnit(issue, values, values.lengthUnit);
}
