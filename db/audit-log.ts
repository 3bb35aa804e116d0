import 'server-only';
import type { Knex } from 'knex';
import { db } from './knex';
import { TABLES } from './tables';

export type AuditAction =
  | 'sign-in'
  | 'sign-in-refused'
  | 'sign-up'
  | 'email-verified'
  | 'password-reset'
  | 'signed-out'
  | 'workspace-created'
  | 'invitation-sent'
  | 'invitation-accepted'
  | 'role-changed'
  | 'member-removed'
  | 'member-left'
  | 'build-sent';

export type AuditEntry = {
  action: AuditAction;
  actorUserId: number | null;
  workspaceId?: number | null;
  /** Never a password or a token: ids, roles and addresses only. */
  detail?: Record<string, string | number | null>;
};

export async function recordAudit(entry: AuditEntry, knex: Knex = db()): Promise<void> {
  await knex(TABLES.auditLog).insert({
    action: entry.action,
    actor_user_id: entry.actorUserId,
    workspace_id: entry.workspaceId ?? null,
    detail: JSON.stringify(entry.detail ?? {}),
  });
}

export async function auditOf(workspaceId: number, limit = 50, knex: Knex = db()) {
  return knex(TABLES.auditLog)
    .leftJoin(TABLES.users, `${TABLES.users}.id`, `${TABLES.auditLog}.actor_user_id`)
    .where(`${TABLES.auditLog}.workspace_id`, workspaceId)
    .select(
      `${TABLES.auditLog}.id`,
      `${TABLES.auditLog}.action`,
      `${TABLES.auditLog}.detail`,
      `${TABLES.auditLog}.created_at as createdAt`,
      `${TABLES.users}.name as actorName`,
    )
    .orderBy(`${TABLES.auditLog}.id`, 'desc')
    .limit(limit);
}
