import type { Knex } from 'knex';
import { TABLES } from '@/db/tables';
import type { BuildSend } from '@/lib/builds/build';

type SendRow = { id: number; build_id: number; to_email: string; sent_by: number | null; sent_by_name: string | null; sent_at: string };

/** The sends of the given records, oldest first, by record id. */
export async function sendsOf(knex: Knex | Knex.Transaction, buildIds: number[]): Promise<Map<number, BuildSend[]>> {
  const rows: SendRow[] = await knex(`${TABLES.buildSends} as s`)
    .leftJoin(`${TABLES.users} as u`, 'u.id', 's.sent_by')
    .whereIn('s.build_id', buildIds)
    .orderBy('s.id')
    .select('s.*', 'u.name as sent_by_name');
  const byBuild = new Map<number, BuildSend[]>();
  for (const row of rows) {
    const list = byBuild.get(row.build_id) ?? [];
    list.push({ id: row.id, to: row.to_email, sentAt: row.sent_at, sentBy: row.sent_by === null ? null : { id: row.sent_by, name: row.sent_by_name ?? '' } });
    byBuild.set(row.build_id, list);
  }
  return byBuild;
}


export async function insertSend(knex: Knex | Knex.Transaction, send: { buildId: number; to: string; sentBy: number; sentAt: string }): Promise<void> {
  await knex(TABLES.buildSends).insert({ build_id: send.buildId, to_email: send.to, sent_by: send.sentBy, sent_at: send.sentAt });
}
