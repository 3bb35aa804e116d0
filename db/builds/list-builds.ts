import 'server-only';
import { db } from '@/db/knex';
import { caseInsensitiveOrder, likeOperator } from '@/db/dialect';
import { TABLES } from '@/db/tables';
import type { Build, BuildPage } from '@/lib/builds/build';
import { BUILD_FIELD_LIST, buildFields } from '@/lib/builds/build-fields';
import type { BuildListQuery } from '@/lib/builds/list-query';
import { BUILD_COLUMNS, rowToBuild, type BuildRow } from './build-row';
import { selectBuilds } from './select-builds';
import { sendsOf } from './sends';

const SEARCH_COLUMNS = BUILD_FIELD_LIST.filter((f) => f.list.search).map((f) => f.column!);

/** LIKE pattern for a search term, with the wildcards in the term escaped. */
function likePattern(term: string): string {
  return `%${term.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/** One page of a workspace's records: searched, filtered and sorted in SQL (limit/offset). */
export async function listBuilds(workspaceId: number, query: BuildListQuery): Promise<BuildPage> {
  const knex = db();
  const filtered = () => {
    const q = knex(`${TABLES.builds} as b`).where('b.workspace_id', workspaceId);
    if (query.status !== 'all') q.andWhere('b.status', query.status);
    if (query.technician) q.andWhere('b.technician_id', query.technician);
    if (query.template) q.andWhere('b.template_id', query.template);
    if (query.q) {
      const pattern = likePattern(query.q);
      const like = likeOperator(knex);
      q.andWhere((w) => {
        for (const column of SEARCH_COLUMNS) w.orWhereRaw(`b.${column} ${like} ? ESCAPE '\\'`, [pattern]);
      });
    }
    return q;
  };
  const [counted] = (await filtered().count({ total: '*' })) as Array<{ total: number }>;
  const column = `b.${BUILD_COLUMNS[query.sort]}`;
  const text = query.sort in buildFields && buildFields[query.sort as keyof typeof buildFields].kind === 'text';
  const idRows: Array<{ id: number }> = await filtered()
    .select('b.id')
    .orderByRaw(`${text ? caseInsensitiveOrder(knex, column) : column} ${query.dir}`)
    .orderBy('b.id', query.dir)
    .limit(query.pageSize)
    .offset((query.page - 1) * query.pageSize);
  const ids = idRows.map((r) => r.id);
  const rows: BuildRow[] = await selectBuilds(knex, workspaceId).whereIn('b.id', ids);
  const sends = await sendsOf(knex, ids);
  const byId = new Map(rows.map((r) => [r.id, r]));
  const items = ids.flatMap((id) => {
    const row = byId.get(id);
    return row ? [rowToBuild(row, sends.get(id) ?? [])] : [];
  });
  return { items, total: Number(counted?.total ?? 0), page: query.page, pageSize: query.pageSize };
}


/** Every record of a workspace with its results (for CSV export), oldest first. */
export async function allBuilds(workspaceId: number): Promise<Build[]> {
  const knex = db();
  const rows: BuildRow[] = await selectBuilds(knex, workspaceId).orderBy('b.id');
  const sends = await sendsOf(knex, rows.map((r) => r.id));
  return rows.map((row) => rowToBuild(row, sends.get(row.id) ?? []));
}
