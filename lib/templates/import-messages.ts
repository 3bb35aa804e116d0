import { countOf, countWithVerb } from '@/lib/text/plural';

/** The words of a CSV import's answers, plural-correct, shared by the route and the import form. */

export type ImportCountsText = { created: number; updated: number; unchanged: number; skipped: number };

export function importDoneMessage(counts: ImportCountsText): string {
  const { created, updated, unchanged, skipped } = counts;
  if (updated === 0 && unchanged === 0 && skipped === 0) return `Imported ${countOf(created, 'template')}.`;
  const parts = [`${countOf(created, 'new template')}`];
  if (updated > 0) parts.push(`${countOf(updated, 'template')} updated`);
  if (unchanged > 0) parts.push(`${countOf(unchanged, 'template')} already the same`);
  if (skipped > 0) parts.push(`${countOf(skipped, 'row')} skipped (same name as an existing template)`);
  return `Imported ${parts.join(', ')}.`;
}

export function importPreviewMessage(rows: number, newRows: number, matching: number): string {
  const checked = `${countOf(rows, 'row')} checked: ${newRows.toLocaleString('en')} new`;
  if (matching === 0) return `${checked}. Nothing in the file has the name of an existing template.`;
  return `${checked}, ${countWithVerb(matching, ['row', 'rows'], ['matches', 'match'])} an existing template by name. Skip those rows or update the templates from them.`;
}

export function importChoiceNeededMessage(matching: number): string {
  return `${countWithVerb(matching, ['row', 'rows'], ['has', 'have'])} the name of an existing template: choose to skip or to update (onMatch=skip or onMatch=update). Nothing was imported.`;
}

export function importProblemsMessage(problems: number): string {
  return `The CSV has ${countOf(problems, 'problem')}; nothing was imported`;
}
