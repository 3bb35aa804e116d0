import type { Knex } from 'knex';
import { fieldsToColumns } from '../builds/build-row';
import { TABLES } from '../tables';
import type { BuildFields } from '../../lib/builds/build-fields';
import { buildResults, DEFAULT_TOLERANCE_DEG } from '../../lib/builds/build-results';
import { buildSchema, emptyBuild } from '../../lib/builds/build-schema';
import { creationChanges } from '../../lib/builds/revision-diff';

/**
 * A handful of INVENTED build records in the demo shop, in each status, with invented customers
 * (no real people). Port heights are where the crown uncovers the edge near the template's
 * targets (slider-crank, deck 0.3 mm); one port in one record is deliberately 1.5° late.
 */

type DemoBuild = Partial<BuildFields> & {
  template: string;
  customerName: string;
  by: 'owner@harbourlane.test' | 'tech@harbourlane.test';
  finishedOn?: string;
  handedOverOn?: string;
  sentAt?: string;
};

export const DEMO_BUILDS: DemoBuild[] = [
  {
    template: 'Slipway 50 moped',
    customerName: 'Jonah Pellwright',
    customerEmail: 'jonah.pellwright@customer.test',
    engineNumber: 'SW50-11873',
    openedOn: '2026-11-28',
    by: 'tech@harbourlane.test',
    stops: { numbering: 'full', readingADeg: 338, readingBDeg: 26 },
    notes: 'Came in with a weak spark; points cleaned.',
  },
  {
    template: 'Coastline 125 scooter',
    customerName: 'Ilse Varrow',
    customerEmail: 'ilse.varrow@customer.test',
    engineNumber: 'CL125-40211',
    openedOn: '2026-11-30',
    by: 'tech@harbourlane.test',
    stops: { numbering: 'split', readingADeg: 21, readingASide: 'BTDC', readingBDeg: 23, readingBSide: 'ATDC' },
    timingSetDegBTDC: 17,
    timingCheck: 'static-light',
    deckMm: 0.3,
  },
  {
    template: 'Harbour 50 moped, sport cylinder',
    customerName: 'Casimir Dunleith',
    customerEmail: 'casimir.dunleith@customer.test',
    engineNumber: 'HB50-77120',
    frameNumber: 'F-2231',
    openedOn: '2026-11-20',
    finishedOn: '2026-11-22',
    status: 'done',
    by: 'owner@harbourlane.test',
    stops: { numbering: 'full', readingADeg: 341, readingBDeg: 21 },
    timingSetMmBTDC: 1.4,
    timingCheck: 'static-feeler',
    deckMm: 0.3,
    ports: [
      { name: 'exhaust', heightMm: 23.38 },
      { name: 'transfer', heightMm: 30.88 },
    ],
    squishMm: 0.9,
    notes: 'Exhaust roof 0.5 mm high after the customer’s own porting: left as it is, customer told.',
  },
  {
    template: 'Coastline 200 scooter',
    customerName: 'Odile Marchbank',
    customerEmail: 'odile.marchbank@customer.test',
    engineNumber: 'CL200-09345',
    openedOn: '2026-11-12',
    finishedOn: '2026-11-14',
    handedOverOn: '2026-11-15',
    sentAt: '2026-11-15T10:12:00.000Z',
    status: 'handed-over',
    by: 'tech@harbourlane.test',
    stops: { numbering: 'full', readingADeg: 336, readingBDeg: 28 },
    timingSetDegBTDC: 18,
    timingCheck: 'strobe',
    timingCheckRpm: 3000,
    deckMm: 0.3,
    ports: [
      { name: 'exhaust', heightMm: 33.19 },
      { name: 'transfer', heightMm: 46.32 },
    ],
    squishMm: 1.2,
    otherMeasurements: [{ name: 'Compression', value: '9.5', unit: 'bar' }],
  },
  {
    template: 'Pier 100 reed-valve kart',
    customerName: 'Fennick Rowe',
    customerEmail: 'fennick.rowe@customer.test',
    engineNumber: 'PR100-5521',
    openedOn: '2026-11-25',
    finishedOn: '2026-11-26',
    status: 'done',
    by: 'owner@harbourlane.test',
    stops: { numbering: 'full', readingADeg: 339, readingBDeg: 23 },
    timingSetDegBTDC: 18,
    timingCheck: 'strobe',
    timingCheckRpm: 4000,
    deckMm: 0.3,
    ports: [
      { name: 'exhaust', heightMm: 27.9 },
      { name: 'transfer', heightMm: 39.26 },
    ],
  },
];

export async function seed(knex: Knex): Promise<void> {
  const shop = await knex(TABLES.workspaces).where({ slug: 'harbour-lane' }).first();
  if (!shop) throw new Error('Run 01_demo_shop first: the harbour-lane workspace is missing');
  const users = await knex(TABLES.users).whereIn('email', ['owner@harbourlane.test', 'tech@harbourlane.test']);
  const userId = (email: string) => users.find((u: { email: string }) => u.email === email)?.id ?? null;
  await knex(TABLES.builds).where({ workspace_id: shop.id }).del();

  for (const { template: templateName, by, finishedOn, handedOverOn, sentAt, ...demo } of DEMO_BUILDS) {
    const template = await knex(TABLES.templates).where({ workspace_id: shop.id, name: templateName }).first();
    if (!template) throw new Error(`Run 02_demo_templates first: ${templateName} is missing`);
    const fields = buildSchema.parse({
      ...emptyBuild(demo.openedOn ?? '2026-11-01'),
      templateId: template.id,
      templateVersion: template.version,
      engineDescription: template.description,
      strokeMm: template.stroke_mm,
      rodMm: template.rod_mm,
      rotation: template.rotation,
      advanceDeg: template.static_advance_deg,
      portTargets: JSON.parse(template.port_targets_json),
      technicianId: userId(by),
      ...demo,
    });
    const at = `${fields.openedOn}T09:00:00.000Z`;
    const [row] = await knex(TABLES.builds)
      .insert({
        ...fieldsToColumns(fields),
        workspace_id: shop.id,
        finished_on: finishedOn ?? null,
        handed_over_on: handedOverOn ?? null,
        results_json: JSON.stringify(buildResults(fields, DEFAULT_TOLERANCE_DEG)),
        version: 1,
        created_by: userId(by),
        updated_by: userId(by),
        created_at: at,
        updated_at: at,
      })
      .returning('id');
    await knex(TABLES.buildRevisions).insert({
      build_id: row.id,
      version: 1,
      action: 'create',
      user_id: userId(by),
      created_at: at,
      changes_json: JSON.stringify(creationChanges(fields)),
      snapshot_json: JSON.stringify(fields),
    });
    if (sentAt) await knex(TABLES.buildSends).insert({ build_id: row.id, to_email: fields.customerEmail, sent_by: userId(by), sent_at: sentAt });
  }
}
