import type { Knex } from 'knex';
import bcrypt from 'bcryptjs';
import { TABLES } from '../tables';

/** The invented demo shop (DEVELOPERS.md, "Demo data"). Passwords are printed in README.md. */
export const DEMO_USERS = [
  { email: 'owner@harbourlane.test', name: 'Maren Ostby', role: 'owner', password: 'harbour-owner-26', personalSlug: 'maren-ostby' },
  { email: 'tech@harbourlane.test', name: 'Teo Lindqvist', role: 'technician', password: 'harbour-tech-26', personalSlug: 'teo-lindqvist' },
  { email: 'viewer@harbourlane.test', name: 'Ada Brennock', role: 'viewer', password: 'harbour-view-26', personalSlug: 'ada-brennock' },
] as const;

export const DEMO_SHOP = { slug: 'harbour-lane', name: 'Harbour Lane Motor Works', kind: 'shop' } as const;

export async function seed(knex: Knex): Promise<void> {
  // Children first; rows of later tables that hang off workspaces or users cascade.
  await knex(TABLES.auditLog).del();
  await knex(TABLES.oneTimeTokens).del();
  await knex(TABLES.invitations).del();
  await knex(TABLES.printerProfiles).del();
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
    // Every account has its own personal workspace, as sign-up gives one.
    const [personal] = await knex(TABLES.workspaces)
      .insert({ slug: user.personalSlug, name: `${user.name}’s workspace`, kind: 'personal' })
      .returning('id');
    await knex(TABLES.memberships).insert({ user_id: row.id, workspace_id: personal.id, role: 'owner' });
  }
  await knex(TABLES.printerProfiles).insert({
    workspace_id: shop.id,
    name: 'Front desk laser',
    scale_x: 0.996,
    scale_y: 1.003,
    profile_json: JSON.stringify({ name: 'Front desk laser', printerScaleX: 0.996, printerScaleY: 1.003 }),
  });
}
