import 'server-only';
import type { Knex } from 'knex';
import { HOLDING_ROLE } from '@/lib/access-policy';
import type { Role } from '@/lib/roles';
import { db } from './knex';
import { TABLES } from './tables';

export type UserRow = {
  id: number;
  email: string;
  name: string;
  password_hash: string | null;
  email_verified_at: string | null;
  session_version: number;
};
export type WorkspaceKind = 'personal' | 'shop';
export type WorkspaceRow = { id: number; slug: string; name: string; kind: WorkspaceKind };
export type MemberRow = { membershipId: number; userId: number; email: string; name: string; role: Role };

const USER_FIELDS = ['id', 'email', 'name', 'password_hash', 'email_verified_at', 'session_version'] as const;
const WORKSPACE_FIELDS = ['id', 'slug', 'name', 'kind'] as const;

export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}

export async function findUserById(id: number, knex: Knex = db()): Promise<UserRow | undefined> {
  return knex(TABLES.users).select(USER_FIELDS).where({ id }).first();
}

export async function findUserByEmail(email: string, knex: Knex = db()): Promise<UserRow | undefined> {
  return knex(TABLES.users).select(USER_FIELDS).where({ email: normalizeEmail(email) }).first();
}

export async function findWorkspaceBySlug(slug: string, knex: Knex = db()): Promise<WorkspaceRow | undefined> {
  return knex(TABLES.workspaces).select(WORKSPACE_FIELDS).where({ slug }).first();
}

export async function findRole(userId: number, workspaceId: number, knex: Knex = db()): Promise<Role | undefined> {
  const row = await knex(TABLES.memberships).select('role').where({ user_id: userId, workspace_id: workspaceId }).first();
  return row?.role;
}

export async function workspacesOf(userId: number, knex: Knex = db()): Promise<(WorkspaceRow & { role: Role })[]> {
  return knex(TABLES.workspaces)
    .join(TABLES.memberships, `${TABLES.memberships}.workspace_id`, `${TABLES.workspaces}.id`)
    .where(`${TABLES.memberships}.user_id`, userId)
    .select(WORKSPACE_FIELDS.map((f) => `${TABLES.workspaces}.${f}`))
    .select(`${TABLES.memberships}.role`)
    .orderByRaw(`case ${TABLES.workspaces}.kind when 'personal' then 0 else 1 end`)
    .orderBy(`${TABLES.workspaces}.name`);
}

export async function membersOf(workspaceId: number, knex: Knex = db()): Promise<MemberRow[]> {
  return knex(TABLES.memberships)
    .join(TABLES.users, `${TABLES.users}.id`, `${TABLES.memberships}.user_id`)
    .where(`${TABLES.memberships}.workspace_id`, workspaceId)
    .select(
      `${TABLES.memberships}.id as membershipId`,
      `${TABLES.users}.id as userId`,
      `${TABLES.users}.email`,
      `${TABLES.users}.name`,
      `${TABLES.memberships}.role`,
    )
    .orderBy(`${TABLES.users}.name`);
}

export async function countHolders(workspaceId: number, knex: Knex = db()): Promise<number> {
  const row = await knex(TABLES.memberships).where({ workspace_id: workspaceId, role: HOLDING_ROLE }).count({ n: '*' }).first();
  return Number(row?.n ?? 0);
}

/** A URL-safe slug from a name, with a short random tail so two shops may share a name. */
export function slugFrom(name: string, tail: string): string {
  const base = name
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 40);
  return `${base || 'workspace'}-${tail}`;
}

export async function createWorkspace(
  input: { name: string; kind: WorkspaceKind; ownerId: number; slug: string },
  knex: Knex = db(),
): Promise<WorkspaceRow> {
  return knex.transaction(async (trx) => {
    const [row] = await trx(TABLES.workspaces)
      .insert({ slug: input.slug, name: input.name, kind: input.kind })
      .returning(WORKSPACE_FIELDS);
    await trx(TABLES.memberships).insert({ user_id: input.ownerId, workspace_id: row.id, role: HOLDING_ROLE });
    return row as WorkspaceRow;
  });
}
