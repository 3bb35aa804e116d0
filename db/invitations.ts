import 'server-only';
import type { Knex } from 'knex';
import { expiresAt, isExpired, type TokenRefusal } from '@/lib/one-time-token';
import { hashToken, newToken } from './token-hash';
import type { Role } from '@/lib/roles';
import { normalizeEmail } from './accounts';
import { db } from './knex';
import { TABLES } from './tables';

export type InvitationView = {
  id: number;
  workspaceId: number;
  workspaceName: string;
  workspaceSlug: string;
  email: string;
  role: Role;
  expiresAt: string;
};

export async function createInvitation(
  input: { workspaceId: number; email: string; role: Role; invitedBy: number },
  knex: Knex = db(),
): Promise<{ id: number; token: string; expiresAt: string }> {
  const { token, tokenHash } = newToken();
  const expires = expiresAt('invitation');
  const [row] = await knex(TABLES.invitations)
    .insert({
      workspace_id: input.workspaceId,
      email: normalizeEmail(input.email),
      role: input.role,
      invited_by: input.invitedBy,
      token_hash: tokenHash,
      expires_at: expires,
    })
    .returning('id');
  return { id: row.id, token, expiresAt: expires };
}

export async function pendingInvitations(workspaceId: number, knex: Knex = db()) {
  const rows = await knex(TABLES.invitations)
    .where({ workspace_id: workspaceId })
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .select('id', 'email', 'role', 'expires_at as expiresAt')
    .orderBy('id', 'desc');
  return rows.filter((r) => !isExpired(r.expiresAt));
}

export async function revokeInvitation(workspaceId: number, id: number, knex: Knex = db()): Promise<boolean> {
  const n = await knex(TABLES.invitations)
    .where({ workspace_id: workspaceId, id })
    .whereNull('accepted_at')
    .whereNull('revoked_at')
    .update({ revoked_at: new Date().toISOString() });
  return n === 1;
}

type Looked = { ok: true; invitation: InvitationView } | { ok: false; reason: TokenRefusal };

/** The invitation a link stands for, without using it up. */
export async function lookUpInvitation(token: string, knex: Knex = db()): Promise<Looked> {
  const row = await knex(TABLES.invitations)
    .join(TABLES.workspaces, `${TABLES.workspaces}.id`, `${TABLES.invitations}.workspace_id`)
    .where(`${TABLES.invitations}.token_hash`, hashToken(token))
    .select(
      `${TABLES.invitations}.*`,
      `${TABLES.workspaces}.name as workspace_name`,
      `${TABLES.workspaces}.slug as workspace_slug`,
    )
    .first();
  if (!row || row.revoked_at) return { ok: false, reason: 'unknown' };
  if (row.accepted_at) return { ok: false, reason: 'used' };
  if (isExpired(row.expires_at)) return { ok: false, reason: 'expired' };
  return {
    ok: true,
    invitation: {
      id: row.id,
      workspaceId: row.workspace_id,
      workspaceName: row.workspace_name,
      workspaceSlug: row.workspace_slug,
      email: row.email,
      role: row.role,
      expiresAt: row.expires_at,
    },
  };
}

/** Marks the invitation used and adds the membership, in one transaction; false if it was used meanwhile. */
export async function acceptInvitation(invitation: InvitationView, userId: number, knex: Knex = db()): Promise<boolean> {
  return knex.transaction(async (trx) => {
    const n = await trx(TABLES.invitations)
      .where({ id: invitation.id })
      .whereNull('accepted_at')
      .whereNull('revoked_at')
      .update({ accepted_at: new Date().toISOString() });
    if (n !== 1) return false;
    await trx(TABLES.memberships)
      .insert({ user_id: userId, workspace_id: invitation.workspaceId, role: invitation.role })
      .onConflict(['user_id', 'workspace_id'])
      .ignore();
    return true;
  });
}
