import bcrypt from 'bcryptjs';
import type { Knex } from 'knex';
import { closeDb } from '@/db/knex';
import { TABLES } from '@/db/tables';
import type { Role } from '@/lib/roles';
import { createTempDb } from './temp-db';

export type WorldUser = { id: number; email: string; name: string; password: string };
export type WorldWorkspace = { id: number; slug: string; name: string };

export type AccessWorld = {
  knex: Knex;
  /** The shop every role below belongs to. */
  shop: WorldWorkspace;
  /** Another shop; `outsider` owns it and belongs to nothing else. */
  otherShop: WorldWorkspace;
  users: Record<'owner' | 'technician' | 'viewer' | 'outsider', WorldUser>;
  cleanup: () => Promise<void>;
};

export const WORLD_PASSWORD = 'correct-horse-battery';

/**
 * A migrated temporary database that the app's `db()` points at, holding one shop with an
 * owner, a technician and a viewer, and a second shop owned by an outsider. Reused by
 * authorization tests of every helper: insert your own rows through `world.knex`.
 */
export async function createAccessWorld(): Promise<AccessWorld> {
  await closeDb();
  const temp = await createTempDb();
  temp.useInApp();
  const { knex } = temp;
  // Cost 4 keeps the fixture fast; the app hashes with its own cost.
  const passwordHash = bcrypt.hashSync(WORLD_PASSWORD, 4);

  const addWorkspace = async (slug: string, name: string): Promise<WorldWorkspace> => {
    const [row] = await knex(TABLES.workspaces).insert({ slug, name, kind: 'shop' }).returning('id');
    return { id: row.id, slug, name };
  };
  const addUser = async (key: string, workspace: WorldWorkspace, role: Role): Promise<WorldUser> => {
    const email = `${key}@world.test`;
    const name = `World ${key}`;
    const [row] = await knex(TABLES.users)
      .insert({ email, name, password_hash: passwordHash, email_verified_at: new Date().toISOString() })
      .returning('id');
    await knex(TABLES.memberships).insert({ user_id: row.id, workspace_id: workspace.id, role });
    return { id: row.id, email, name, password: WORLD_PASSWORD };
  };

  const shop = await addWorkspace('world-shop', 'World Shop');
  const otherShop = await addWorkspace('other-shop', 'Other Shop');
  const users = {
    owner: await addUser('owner', shop, 'owner'),
    technician: await addUser('technician', shop, 'technician'),
    viewer: await addUser('viewer', shop, 'viewer'),
    outsider: await addUser('outsider', otherShop, 'owner'),
  };
  return {
    knex,
    shop,
    otherShop,
    users,
    cleanup: async () => {
      await closeDb();
      await temp.cleanup();
    },
  };
}
