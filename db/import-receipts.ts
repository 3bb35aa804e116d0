import 'server-only';
import type { Knex } from 'knex';
import { db } from '@/db/knex';
import { TABLES } from '@/db/tables';

export type ImportReceipt = { bodySha256: string; status: number; body: unknown };

/** The stored answer to an import sent with this Idempotency-Key in this workspace, if any. */
export async function findImportReceipt(workspaceId: number, key: string): Promise<ImportReceipt | null> {
  const row = await db()(TABLES.importReceipts).where({ workspace_id: workspaceId, idempotency_key: key }).first();
  return row ? { bodySha256: row.body_sha256, status: row.status, body: JSON.parse(row.response_json) } : null;
}

/**
 * Stores the answer inside the import's transaction. Two imports racing with one key: the
 * second insert breaks the unique index, its transaction rolls back, and it answers from
 * the first one's receipt instead.
 */
export async function saveImportReceipt(
  trx: Knex.Transaction,
  receipt: ImportReceipt & { workspaceId: number; key: string; userId: number },
): Promise<void> {
  await trx(TABLES.importReceipts).insert({
    workspace_id: receipt.workspaceId,
    idempotency_key: receipt.key,
    user_id: receipt.userId,
    body_sha256: receipt.bodySha256,
    status: receipt.status,
    response_json: JSON.stringify(receipt.body),
    created_at: new Date().toISOString(),
  });
}
