/** 10,000 invented templates and 10,000 invented build records in the demo shop, so the list APIs page through a busy workspace. */
import knex, { type Knex } from 'knex';
import { sqliteConfig } from '@/db/config';
import { DEMO_SHOP, DEMO_USERS } from '@/db/seeds/01_demo_shop';
import { TABLES } from '@/db/tables';
import { insertTemplates } from '@/db/templates/insert-templates';
import { fieldsToColumns as buildColumns } from '@/db/builds/build-row';
import { buildResults, DEFAULT_TOLERANCE_DEG } from '@/lib/builds/build-results';
import { buildSchema, emptyBuild } from '@/lib/builds/build-schema';
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

const STATUSES = ['open', 'done', 'handed-over'] as const;
const BUILD_BATCH = 200; // ~40 columns a row: well inside SQLite's bound-parameter limit

/** Build records with invented customers, spread over a year, in every status. */
async function insertBuilds(db: Knex, workspaceId: number, userId: number): Promise<void> {
  const template = await db(TABLES.templates).where('workspace_id', workspaceId).orderBy('id').first();
  for (let start = 0; start < LIST_ROWS; start += BUILD_BATCH) {
    const rows = Array.from({ length: Math.min(BUILD_BATCH, LIST_ROWS - start) }, (_, k) => {
      const i = start + k;
      const openedOn = new Date(Date.UTC(2026, 0, 1) + (i % 365) * 86_400_000).toISOString().slice(0, 10);
      const fields = buildSchema.parse({
        ...emptyBuild(openedOn),
        customerName: `${WORDS[i % WORDS.length]} customer ${i}`,
        engineNumber: `BE${String(i).padStart(6, '0')}`,
        engineDescription: `invented ${WORDS[(i * 7) % WORDS.length]} two-stroke`,
        templateId: template.id,
        templateVersion: template.version,
        technicianId: userId,
        status: STATUSES[i % STATUSES.length],
        strokeMm: 40 + (i % 20),
        rodMm: 85,
        advanceDeg: 17,
      });
      const at = `${openedOn}T${String(i % 24).padStart(2, '0')}:00:00.000Z`;
      return {
        ...buildColumns(fields),
        workspace_id: workspaceId,
        results_json: JSON.stringify(buildResults(fields, DEFAULT_TOLERANCE_DEG)),
        version: 1,
        created_by: userId,
        updated_by: userId,
        created_at: at,
        updated_at: at,
      };
    });
    await db(TABLES.builds).insert(rows);
  }
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
    await db.transaction((trx) => insertBuilds(trx, shop.id, owner.id));
  } finally {
    await db.destroy();
  }
}
