import type { Knex } from 'knex';
import { insertTemplates } from '../templates/insert-templates';
import { TABLES } from '../tables';
import { diffTemplateFields } from '../../lib/templates/revision-diff';
import { EMPTY_TEMPLATE, templateSchema, type TemplateFields } from '../../lib/templates/template-schema';

/**
 * About a dozen INVENTED engine templates for the invented shop (DEVELOPERS.md, "Demo data")
 * (no real brand or model). Figures are plausible for small two-strokes: bore ×
 * stroke gives the named capacity (π/4 · bore² · stroke), static advance 16–20°
 * BTDC and exhaust opening near 90° ATDC, transfers near 120° ATDC (common practice).
 */

type Demo = Partial<TemplateFields> & { name: string };

const port = (name: string, opensCrankDeg: number, closesCrankDeg: number) => ({ name, opensCrankDeg, closesCrankDeg });
/** A piston-controlled port closes as far after BDC as it opens before it: closes = 360 − opens. */
const symmetric = (name: string, opensCrankDeg: number) => port(name, opensCrankDeg, 360 - opensCrankDeg);

export const DEMO_TEMPLATES: Demo[] = [
  {
    name: 'Slipway 50 moped',
    description: '50 cc piston-port, fan-cooled, pedal start',
    boreMm: 38, strokeMm: 44, rodMm: 80, rotation: 'ccw',
    rimDiameterMm: 96, faceDiameterMm: 90, flangeDiameterMm: 118, hubHoleMm: 20,
    staticAdvanceDeg: 16, advanceMarksDeg: [15, 16, 17],
    portTargets: [symmetric('exhaust', 95), symmetric('transfer', 122), port('inlet', 295, 65)],
    notes: 'Pointer: the cast notch at the top of the fan cowl opening.',
  },
  {
    name: 'Harbour 50 moped, sport cylinder',
    description: '50 cc piston-port with the shop’s sport cylinder',
    boreMm: 40, strokeMm: 39.2, rodMm: 85, rotation: 'ccw',
    rimDiameterMm: 112, faceDiameterMm: 104, flangeDiameterMm: 130, hubHoleMm: 22,
    staticAdvanceDeg: 17, advanceMarksDeg: [16, 17, 18],
    portTargets: [symmetric('exhaust', 92), symmetric('transfer', 118), port('inlet', 288, 72)],
  },
  {
    name: 'Coastline 125 scooter',
    description: '125 cc piston-port scooter, fan-cooled',
    boreMm: 54, strokeMm: 54.5, rodMm: 104, rotation: 'ccw',
    rimDiameterMm: 150, faceDiameterMm: 140, flangeDiameterMm: 170, hubHoleMm: 28,
    staticAdvanceDeg: 18, advanceMarksDeg: [16, 18, 20],
    portTargets: [symmetric('exhaust', 94), symmetric('transfer', 121), port('inlet', 285, 75)],
    notes: 'Read through the cowl window with a strip; seam at BDC.',
  },
  {
    name: 'Coastline 200 scooter',
    description: '200 cc piston-port scooter, big-bore',
    boreMm: 66, strokeMm: 58, rodMm: 110, rotation: 'ccw',
    rimDiameterMm: 168, faceDiameterMm: 158, flangeDiameterMm: 190, hubHoleMm: 30,
    staticAdvanceDeg: 18, advanceMarksDeg: [17, 18, 19],
    portTargets: [symmetric('exhaust', 90), symmetric('transfer', 119), port('inlet', 290, 70)],
  },
  {
    name: 'Quayside 150 scooter, disc valve',
    description: '150 cc rotary-disc inlet scooter',
    boreMm: 57.5, strokeMm: 57.8, rodMm: 105, rotation: 'ccw',
    rimDiameterMm: 156, faceDiameterMm: 146, flangeDiameterMm: 176, hubHoleMm: 28,
    staticAdvanceDeg: 18, advanceMarksDeg: [17, 18, 19],
    portTargets: [symmetric('exhaust', 92), symmetric('transfer', 120), port('inlet disc', 220, 60)],
    notes: 'The inlet disc timing is set by the disc cut-out, not the piston.',
  },
  {
    name: 'Pier 100 reed-valve kart',
    description: '100 cc reed-valve kart engine, water-cooled',
    boreMm: 50, strokeMm: 50.6, rodMm: 102, rotation: 'cw',
    rimDiameterMm: 118, faceDiameterMm: 110, hubHoleMm: 18,
    staticAdvanceDeg: 18, advanceMarksDeg: [17, 18, 19, 20],
    portTargets: [symmetric('exhaust', 88), symmetric('transfer', 116)],
    notes: 'Reed inlet: no inlet port timing to check.',
  },
  {
    name: 'Bollard 65 youth kart',
    description: '65 cc reed-valve kart engine',
    boreMm: 43.5, strokeMm: 43, rodMm: 86, rotation: 'cw',
    rimDiameterMm: 100, faceDiameterMm: 92, hubHoleMm: 16,
    staticAdvanceDeg: 17, advanceMarksDeg: [16, 17, 18],
    portTargets: [symmetric('exhaust', 84), symmetric('transfer', 115)],
  },
  {
    name: 'Tidemark 80 trail',
    description: '80 cc piston-port trail bike',
    boreMm: 47, strokeMm: 45.6, rodMm: 90, rotation: 'ccw',
    rimDiameterMm: 124, faceDiameterMm: 116, flangeDiameterMm: 140, hubHoleMm: 22,
    staticAdvanceDeg: 18, advanceMarksDeg: [],
    portTargets: [symmetric('exhaust', 93), symmetric('transfer', 121), port('inlet', 290, 70)],
  },
  {
    name: 'Breakwater 125 enduro',
    description: '125 cc reed-valve enduro, water-cooled',
    boreMm: 54, strokeMm: 54.5, rodMm: 110, rotation: 'ccw',
    rimDiameterMm: 134, faceDiameterMm: 126, flangeDiameterMm: 150, hubHoleMm: 24,
    staticAdvanceDeg: 17, advanceMarksDeg: [16, 17, 18],
    portTargets: [symmetric('exhaust', 85), symmetric('transfer', 114)],
  },
  {
    name: 'Lantern 175 road single',
    description: '175 cc piston-port road bike',
    boreMm: 61, strokeMm: 60, rodMm: 115, rotation: 'ccw',
    rimDiameterMm: 182, faceDiameterMm: 170, flangeDiameterMm: 200, hubHoleMm: 32,
    staticAdvanceDeg: 20, advanceMarksDeg: [18, 19, 20, 21],
    portTargets: [symmetric('exhaust', 89), symmetric('transfer', 117), port('inlet', 288, 72)],
  },
  {
    name: 'Mooring 100 pump engine',
    description: '100 cc stationary water-pump engine, heavy flywheel',
    boreMm: 50, strokeMm: 50, rodMm: 95, rotation: 'cw',
    rimDiameterMm: 200, faceDiameterMm: 190, hubHoleMm: 35,
    staticAdvanceDeg: 20, advanceMarksDeg: [20],
    portTargets: [symmetric('exhaust', 98), symmetric('transfer', 125)],
    notes: 'Run it outdoors or with ventilation.',
  },
  {
    name: 'Old ferry 50 moped',
    description: '50 cc piston-port, early points ignition',
    boreMm: 39, strokeMm: 41.8, rodMm: 82, rotation: 'ccw',
    rimDiameterMm: 90, faceDiameterMm: 86, hubHoleMm: 18,
    staticAdvanceDeg: 16, advanceMarksDeg: [15, 16, 17],
    portTargets: [symmetric('exhaust', 96), symmetric('transfer', 123)],
    archived: true,
    notes: 'No longer seen in the shop; kept for the record.',
  },
];

/** A few later edits, so the demo history shows changes old → new and who made them. */
const DEMO_EDITS: Array<{ name: string; by: 'owner@harbourlane.test' | 'tech@harbourlane.test'; changes: Partial<TemplateFields> }> = [
  { name: 'Coastline 125 scooter', by: 'owner@harbourlane.test', changes: { staticAdvanceDeg: 17, advanceMarksDeg: [16, 17, 18, 20] } },
  { name: 'Coastline 125 scooter', by: 'tech@harbourlane.test', changes: { notes: 'Read through the cowl window with a strip; seam at BDC. Rim measured again: 150.0 mm.' } },
  { name: 'Pier 100 reed-valve kart', by: 'tech@harbourlane.test', changes: { rimDiameterMm: 118.4 } },
];

export async function seed(knex: Knex): Promise<void> {
  const shop = await knex(TABLES.workspaces).where({ slug: 'harbour-lane' }).first();
  if (!shop) throw new Error('Run 01_demo_shop first: the harbour-lane workspace is missing');
  const users = await knex(TABLES.users).whereIn('email', ['owner@harbourlane.test', 'tech@harbourlane.test']);
  const userId = (email: string) => users.find((u: { email: string }) => u.email === email)?.id ?? null;
  await knex(TABLES.templates).where({ workspace_id: shop.id }).del();

  const templates = DEMO_TEMPLATES.map((demo) => templateSchema.parse({ ...EMPTY_TEMPLATE, ...demo }));
  const createdAt = '2026-11-02T09:00:00.000Z';
  const ids = await insertTemplates(knex, templates, { workspaceId: shop.id, userId: userId('tech@harbourlane.test'), at: createdAt, action: 'create' });
  const byName = new Map(templates.map((t, i) => [t.name, { id: ids[i]!, fields: t, version: 1 }]));

  let day = 10;
  for (const edit of DEMO_EDITS) {
    const entry = byName.get(edit.name)!;
    const after = { ...entry.fields, ...edit.changes };
    const at = `2026-11-${day++}T15:30:00.000Z`;
    const by = userId(edit.by);
    await knex(TABLES.templates)
      .where({ id: entry.id })
      .update({
        static_advance_deg: after.staticAdvanceDeg,
        advance_marks_json: JSON.stringify(after.advanceMarksDeg),
        rim_diameter_mm: after.rimDiameterMm,
        notes: after.notes,
        version: entry.version + 1,
        updated_by: by,
        updated_at: at,
      });
    await knex(TABLES.templateRevisions).insert({
      template_id: entry.id,
      version: entry.version + 1,
      action: 'update',
      user_id: by,
      created_at: at,
      changes_json: JSON.stringify(diffTemplateFields(entry.fields, after)),
      snapshot_json: JSON.stringify(after),
    });
    byName.set(edit.name, { id: entry.id, fields: after, version: entry.version + 1 });
  }
}
