import os from 'node:os';
import path from 'node:path';
import { putObject } from '@/app/lib/storage';
import type { AccessWorld } from '@/tests/support/access-world';
import { guardedBy, type Actor } from '@/tests/support/policy-expectations';
import type { RouteCase } from '@/tests/support/route-matrix';
import { TABLES } from '@/db/tables';
import { insertTemplates } from '@/db/templates/insert-templates';
import { EMPTY_TEMPLATE } from '@/lib/templates/template-schema';

/** The build records' rows of the authorization matrix (tests/support/route-matrix.ts). */

const B = 'app/api/v1/workspaces/[workspace]/builds';

export async function seedBuild(world: AccessWorld, fields: Record<string, unknown> = {}): Promise<number> {
  const at = new Date().toISOString();
  const [row] = await world.knex(TABLES.builds)
    .insert({
      workspace_id: world.shop.id,
      customer_name: 'Matrix customer',
      customer_email: 'matrix@customer.test',
      opened_on: at.slice(0, 10),
      results_json: JSON.stringify({ tdc: null, timingSetDegBTDC: null, timingSetMmBTDC: null, timingEnteredAs: null, timingNote: '', ports: [], blowdownDeg: null, blowdownNote: '', toleranceDeg: 2 }),
      created_by: world.users.owner.id,
      updated_by: world.users.owner.id,
      created_at: at,
      updated_at: at,
      ...fields,
    })
    .returning('id');
  return row.id;
}

/** The outsider aims at the shop's record through its own workspace, and must get 404. */
const workspaceFor = (world: AccessWorld, actor: Actor) => (actor === 'outsider' ? world.otherShop.slug : world.shop.slug);

export const withBuild =
  (extra: Record<string, unknown> = {}, fields: Record<string, unknown> = {}) =>
  async (world: AccessWorld, actor: Actor) => ({
    params: { workspace: workspaceFor(world, actor), id: String(await seedBuild(world, fields)) },
    ...extra,
  });

/** A record built from a template with a rim diameter, so its strip can be printed. */
async function withBuildFromTemplate(world: AccessWorld, actor: Actor) {
  const [templateId] = await insertTemplates(world.knex, [{ ...EMPTY_TEMPLATE, name: 'Matrix single', rimDiameterMm: 110 }], {
    workspaceId: world.shop.id,
    userId: world.users.owner.id,
    at: new Date().toISOString(),
    action: 'create',
  });
  return { params: { workspace: workspaceFor(world, actor), id: String(await seedBuild(world, { template_id: templateId, template_version: 1 })) }, search: '?kind=strip&format=svg' };
}

async function withBuildPhoto(world: AccessWorld, actor: Actor) {
  process.env.RIMSCALE_UPLOAD_DIR = path.join(os.tmpdir(), 'rimscale-matrix-uploads');
  const buildId = await seedBuild(world);
  const key = `builds/${buildId}/matrix-${actor.toLowerCase()}`;
  await putObject(`${key}.png`, Buffer.from('stored bytes'));
  await putObject(`${key}-thumb.webp`, Buffer.from('thumb bytes'));
  const [row] = await world.knex(TABLES.buildPhotos)
    .insert({ build_id: buildId, storage_key: `${key}.png`, thumb_key: `${key}-thumb.webp`, content_type: 'image/png', width_px: 1, height_px: 1, bytes: 12, created_at: new Date().toISOString() })
    .returning('id');
  return { params: { workspace: workspaceFor(world, actor), id: String(buildId), photoId: String(row.id) } };
}

export const BUILD_ROUTE_CASES: RouteCase[] = [
  { file: `${B}/route.ts`, method: 'GET', ...guardedBy('build.read', 200) },
  { file: `${B}/route.ts`, method: 'POST', call: () => ({ body: { customerName: 'Matrix new' } }), ...guardedBy('build.edit', 201) },
  { file: `${B}/export/route.ts`, method: 'GET', ...guardedBy('build.read', 200) },
  { file: `${B}/[id]/route.ts`, method: 'GET', call: withBuild(), ...guardedBy('build.read', 200) },
  { file: `${B}/[id]/route.ts`, method: 'PATCH', call: withBuild({ body: { version: 1, notes: 'edited' } }), ...guardedBy('build.edit', 200) },
  { file: `${B}/[id]/route.ts`, method: 'DELETE', call: withBuild(), ...guardedBy('build.delete', 204) },
  { file: `${B}/[id]/revisions/route.ts`, method: 'GET', call: withBuild(), ...guardedBy('build.read', 200) },
  { file: `${B}/[id]/record/route.ts`, method: 'GET', call: withBuild({ search: '?format=pdf' }), ...guardedBy('build.read', 200) },
  { file: `${B}/[id]/sheet/route.ts`, method: 'GET', call: withBuildFromTemplate, ...guardedBy('sheet.print', 200) },
  { file: `${B}/[id]/photos/route.ts`, method: 'GET', call: withBuild(), ...guardedBy('build.read', 200) },
  // A form upload without a photo passes the role check and is then refused (400).
  {
    file: `${B}/[id]/photos/route.ts`,
    method: 'POST',
    call: withBuild({ raw: { type: 'multipart/form-data; boundary=matrix', body: '--matrix\r\nContent-Disposition: form-data; name="caption"\r\n\r\nx\r\n--matrix--\r\n' } }),
    ...guardedBy('build.edit', 400),
  },
  { file: `${B}/[id]/photos/[photoId]/route.ts`, method: 'GET', call: withBuildPhoto, ...guardedBy('build.read', 200) },
  { file: `${B}/[id]/photos/[photoId]/route.ts`, method: 'DELETE', call: withBuildPhoto, ...guardedBy('build.edit', 204) },
  // Without a customer e-mail the send stops past the role check with 400, so the matrix mails nobody.
  { file: `${B}/[id]/send/route.ts`, method: 'POST', call: withBuild({}, { customer_email: '' }), ...guardedBy('build.send', 400) },
];
