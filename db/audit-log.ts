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
  | 'template-deleted'
  | 'templates-imported'
  | 'photo-added'
  | 'photo-deleted';

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
