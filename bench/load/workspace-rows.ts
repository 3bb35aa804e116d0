/** 10,000 invented templates in the demo shop, so the list API pages through a busy workspace. */
import knex from 'knex';
import { sqliteConfig } from '@/db/config';
import { DEMO_SHOP, DEMO_USERS } from '@/db/seeds/01_demo_shop';
import { TABLES } from '@/db/tables';
import { insertTemplates } from '@/db/templates/insert-templates';
import { EMPTY_TEMPLATE, type TemplateFields } from '@/lib/templates/template-schema';

export const LIST_ROWS = 10_000;
export const LOAD_WORKSPACE = DEMO_SHOP.slug;
export const LOAD_USER = DEMO_USERS[0];

const WORDS = ['harbour', 'slipway', 'coastline', 'ridge', 'meadow', 'quarry', 'lantern', 'breaker', 'tidal', 'cobble'];

function benchTemplate(i: number): TemplateFields {
  const word = WORDS[i % WORDS.length]!;
  const boreMm = 38 + (i % 300) / 10;
  return {
    ...EMPTY_TEMPLATE,
    name: `${word} ${50 + (i % 200)} bench engine ${i}`,
    description: `invented ${word} two-stroke, row ${i}`,
    boreMm,
    strokeMm: 39 + (i % 170) / 10,
    rodMm: 80 + (i % 40),
    rotation: i % 3 === 0 ? 'ccw' : 'cw',
    rimDiameterMm: 90 + (i % 120),
    faceDiameterMm: 80 + (i % 110),
    staticAdvanceDeg: 14 + (i % 8),
    archived: i % 10 === 9,
  };
}

export async function addListRows(dbFile: string): Promise<void> {
  const db = knex(sqliteConfig(dbFile));
  try {
    const shop = await db(TABLES.workspaces).where('slug', LOAD_WORKSPACE).first('id');
    const owner = await db(TABLES.users).where('email', LOAD_USER.email).first('id');
    const at = new Date('2026-01-01T00:00:00Z').toISOString();
    await db.transaction((trx) =>
      insertTemplates(trx, Array.from({ length: LIST_ROWS }, (_, i) => benchTemplate(i)), { workspaceId: shop.id, userId: owner.id, at, action: 'import' }),
    );
  } finally {
    await db.destroy();
  }
}
