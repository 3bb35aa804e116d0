import { countOf, countWithVerb, formatCount } from '@/lib/format/number-format';

/** The words of a CSV import's answers, plural-correct, the counts written in the reader's locale. */

export type ImportCountsText = { created: number; updated: number; unchanged: number; skipped: number };

export function importDoneMessage(counts: ImportCountsText, locale: string): string {
  const { created, updated, unchanged, skipped } = counts;
  if (updated === 0 && unchanged === 0 && skipped === 0) return `Imported ${countOf(created, 'template', locale)}.`;
  const parts = [`${countOf(created, 'new template', locale)}`];
  if (updated > 0) parts.push(`${countOf(updated, 'template', locale)} updated`);
  if (unchanged > 0) parts.push(`${countOf(unchanged, 'template', locale)} already the same`);
  if (skipped > 0) parts.push(`${countOf(skipped, 'row', locale)} skipped (same name as an existing template)`);
  return `Imported ${parts.join(', ')}.`;
}

export function importPreviewMessage(rows: number, newRows: number, matching: number, locale: string): string {
  const checked = `${countOf(rows, 'row', locale)} checked: ${formatCount(newRows, locale)} new`;
  if (matching === 0) return `${checked}. Nothing in the file has the name of an existing template.`;
  return `${checked}, ${countWithVerb(matching, ['row', 'rows'], ['matches', 'match'], locale)} an existing template by name. Skip those rows or update the templates from them.`;
}

export function importChoiceNeededMessage(matching: number, locale: string): string {
  return `${countWithVerb(matching, ['row', 'rows'], ['has', 'have'], locale)} the name of an existing template: choose to skip or to update (onMatch=skip or onMatch=update). Nothing was imported.`;
}

export function importProblemsMessage(problems: number, locale: string): string {
  return `The CSV has ${countOf(problems, 'problem', locale)}; nothing was imported`;
}
