import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';
import { TABLES } from '../tables';

/** The invented demo shop of PRODUCT.md §7. Passwords are printed in README.md. */
export const DEMO_USERS = [
  { email: 'owner@harbourlane.test', name: 'Maren Ostby', role: 'owner', password: 'harbour-owner-26' },
  { email: 'tech@harbourlane.test', name: 'Teo Lindqvist', role: 'technician', password: 'harbour-tech-26' },
  { email: 'viewer@harbourlane.test', name: 'Ada Brennock', role: 'viewer', password: 'harbour-view-26' },
] as const;

export const DEMO_SHOP = { slug: 'harbour-lane', name: 'Harbour Lane Motor Works', kind: 'shop' } as const;

export async function seed(knex: Knex): Promise<void> {
  await knex(TABLES.memberships).del();
  await knex(TABLES.workspaces).del();
  await knex(TABLES.users).del();

  const [shop] = await knex(TABLES.workspaces).insert(DEMO_SHOP).returning('id');
  for (const user of DEMO_USERS) {
    const [row] = await knex(TABLES.users)
      .insert({
        email: user.email,
        name: user.name,
        password_hash: bcrypt.hashSync(user.password, 10),
        email_verified_at: new Date().toISOString(),
      })
      .returning('id');
    await knex(TABLES.memberships).insert({ user_id: row.id, workspace_id: shop.id, role: user.role });
  }
}
