import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/db/knex';
import { caseInsensitiveOrder, likeOperator } from '@/db/dialect';
import { TABLES } from '@/db/tables';
import { TEMPLATE_SEARCH_FIELDS, type TemplateListQuery } from '@/lib/templates/list-query';
import { searchWords } from '@/lib/templates/search-words';
import { TEMPLATE_FIELD_LIST } from '@/lib/templates/template-fields';
import type { TemplatePage } from '@/lib/templates/template';
import type { TemplateFields } from '@/lib/templates/template-schema';
import { selectTemplates } from './select-templates';
import { rowToFields, rowToTemplate, SORT_COLUMNS, type TemplateRow } from './template-row';

/** Sort keys that may hold NULL: fields whose schema takes null (unknown measurements); version and the times never do. */
const NULLABLE_SORT_KEYS: ReadonlySet<string> = new Set(TEMPLATE_FIELD_LIST.filter((field) => field.schema.safeParse(null).success).map((field) => field.key));

/** LIKE pattern for a search term, with the wildcards in the term escaped. */
function likePattern(term: string): string {
  return `%${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

async function countOf(query: Knex.QueryBuilder): Promise<number> {
  const [counted] = (await query.count({ total: '*' })) as Array<{ total: number }>;
  return Number(counted?.total ?? 0);
}

/** One page of a workspace's templates: filtered, searched and sorted in SQL (limit/offset). */
export async function listTemplates(workspaceId: number, query: TemplateListQuery): Promise<TemplatePage> {
  const knex = db();
  const filtered = () => {
    const q = knex(`${TABLES.templates} as t`).where('t.workspace_id', workspaceId);
    if (query.archived !== 'all') q.andWhere('t.archived', query.archived === 'true');
    const like = likeOperator(knex);
    for (const word of searchWords(query.q ?? '')) {
      const pattern = likePattern(word);
      q.andWhere((w) => {
        for (const field of TEMPLATE_SEARCH_FIELDS) w.orWhereRaw(`t.${field.column} ${like} ? ESCAPE '\\'`, [pattern]);
      });
    }
    return q;
  };
  const column = `t.${SORT_COLUMNS[query.sort]}`;
  const text = TEMPLATE_FIELD_LIST.some((field) => field.key === query.sort && field.kind === 'text');
  const ids = filtered().select('t.id');
  // A search scans every row of the workspace: count the matches in the same scan (a window over the filtered rows).
  if (query.q) ids.select(knex.raw('count(*) over () as total'));
  // Unknown measurements last in either direction; columns that are never NULL skip the term, so an index can give the order.
  if (NULLABLE_SORT_KEYS.has(query.sort)) ids.orderByRaw(`${column} IS NULL`);
  const idRows: Array<{ id: number; total?: number }> = await ids
    .orderByRaw(`${text ? caseInsensitiveOrder(knex, column) : column} ${query.dir}`)
    .orderBy('t.id', query.dir)
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const total = idRows[0]?.total ?? (await countOf(filtered()));
  const rows: TemplateRow[] = await selectTemplates(knex, workspaceId).whereIn(
    't.id',
    idRows.map((r) => r.id),
  );
  const byId = new Map(rows.map((r) => [r.id, r]));
  const ordered = idRows.flatMap((r) => byId.get(r.id) ?? []);
  return { items: ordered.map(rowToTemplate), total: Number(total), page: query.page, pageSize: query.pageSize };
}

/** Every template of a workspace (for CSV export), archived ones included, in name order. */
export async function allTemplateFields(workspaceId: number): Promise<TemplateFields[]> {
  const rows: TemplateRow[] = await db()(TABLES.templates).where('workspace_id', workspaceId).orderBy([{ column: 'name' }, { column: 'id' }]);
  return rows.map(rowToFields);
}
