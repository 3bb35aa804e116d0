import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { TemplateFieldName, TemplateFields } from '@/lib/templates/template-schema';
import { insertTemplates } from './insert-templates';
import { updateTemplateIn } from './update-template';

/** A CSV row whose name is already the name of a template of the workspace (case and outer spaces ignored). */
export type ImportMatch = { row: number; name: string; id: number; version: number };
export type ImportPlan = { rows: number; newRows: number; matches: ImportMatch[] };
export type OnMatch = 'skip' | 'update';
export type ImportCounts = { created: number; updated: number; unchanged: number; skipped: number };
export type ImportConflict = { row: number; name: string; id: number; expectedVersion: number; currentVersion: number };

export type ImportOutcome =
  | { ok: true; counts: ImportCounts }
  | { ok: false; reason: 'conflict'; conflicts: ImportConflict[] }
  | { ok: false; reason: 'invalid'; problems: Array<{ row: number; column: string; message: string }> };

type ImportOptions = {
  onMatch: OnMatch;
  /** The fields the file has columns for: an update changes only those. */
  fields: TemplateFieldName[];
  /** Template id → the version the preview showed; a template changed since then is a conflict. */
  expectedVersions?: Record<string, number>;
  /** Runs inside the import's transaction after the writes (the idempotency receipt). */
  afterWrite?: (trx: Knex.Transaction, counts: ImportCounts) => Promise<void>;
};

const nameKey = (name: string) => name.trim().toLocaleLowerCase('en');

/** Which rows are new and which match an existing template by name (the preview). Spreadsheet rows: header is row 1. */
export async function planImport(workspaceId: number, templates: TemplateFields[], knex: Knex | Knex.Transaction = db()): Promise<ImportPlan> {
  const existing: Array<{ id: number; name: string; version: number }> = await knex(TABLES.templates)
    .where({ workspace_id: workspaceId })
    .orderBy('id')
    .select('id', 'name', 'version');
  const byName = new Map<string, { id: number; version: number }>();
  // Several templates may share a name; the oldest is the one a row matches.
  for (const t of existing) if (!byName.has(nameKey(t.name))) byName.set(nameKey(t.name), t);
  const matches: ImportMatch[] = [];
  templates.forEach((t, index) => {
    const found = byName.get(nameKey(t.name));
    if (found) matches.push({ row: index + 2, name: t.name, id: found.id, version: found.version });
  });
  return { rows: templates.length, newRows: templates.length - matches.length, matches };
}

class ImportRollback extends Error {
  constructor(public outcome: Exclude<ImportOutcome, { ok: true }>) {
    super('import rolled back');
  }
}

/**
 * Writes validated CSV rows in one transaction, or nothing: rows with a new name become
 * templates; rows matching a template by name are skipped or update it through the same
 * version check and history as an edit (revision action "import").
 */
export async function importTemplates(workspaceId: number, userId: number, templates: TemplateFields[], options: ImportOptions): Promise<ImportOutcome> {
  try {
    return await db().transaction(async (trx): Promise<ImportOutcome> => {
      const plan = await planImport(workspaceId, templates, trx);
      const conflicts = staleMatches(plan.matches, options.expectedVersions);
      if (conflicts.length > 0) throw new ImportRollback({ ok: false, reason: 'conflict', conflicts });
      const matchedRows = new Set(plan.matches.map((m) => m.row));
      const fresh = templates.filter((_, index) => !matchedRows.has(index + 2));
      const at = new Date().toISOString();
      const created = (await insertTemplates(trx, fresh, { workspaceId, userId, at, action: 'import' })).length;
      const counts: ImportCounts = { created, updated: 0, unchanged: 0, skipped: 0 };
      if (options.onMatch === 'skip') counts.skipped = plan.matches.length;
      else for (const match of plan.matches) await updateMatch(trx, workspaceId, userId, match, templates[match.row - 2]!, options, counts);
      await options.afterWrite?.(trx, counts);
      return { ok: true, counts };
    });
  } catch (err) {
    if (err instanceof ImportRollback) return err.outcome;
    throw err;
  }
}

function staleMatches(matches: ImportMatch[], expected: Record<string, number> | undefined): ImportConflict[] {
  if (!expected) return [];
  return matches
    .filter((m) => expected[String(m.id)] !== undefined && expected[String(m.id)] !== m.version)
    .map((m) => ({ row: m.row, name: m.name, id: m.id, expectedVersion: expected[String(m.id)]!, currentVersion: m.version }));
}

async function updateMatch(
  trx: Knex.Transaction,
  workspaceId: number,
  userId: number,
  match: ImportMatch,
  row: TemplateFields,
  options: ImportOptions,
  counts: ImportCounts,
): Promise<void> {
  const changes = Object.fromEntries(options.fields.filter((f) => f !== 'name').map((f) => [f, row[f]])) as Partial<TemplateFields>;
  const outcome = await updateTemplateIn(trx, workspaceId, match.id, userId, match.version, changes, { action: 'import' });
  if (outcome.ok) {
    counts[outcome.changed ? 'updated' : 'unchanged'] += 1;
    return;
  }
  if (outcome.reason === 'invalid')
    throw new ImportRollback({ ok: false, reason: 'invalid', problems: outcome.issues.map((i) => ({ row: match.row, column: i.path, message: i.message })) });
  // The version was read in this same transaction, so only a vanished template gets here.
  throw new ImportRollback({ ok: false, reason: 'conflict', conflicts: [{ row: match.row, name: match.name, id: match.id, expectedVersion: match.version, currentVersion: 0 }] });
}
