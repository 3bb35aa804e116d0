import os from 'node:os';
import path from 'node:path';
import { putObject } from '@/app/lib/storage';
import { insertTemplates } from '@/db/templates/insert-templates';
import { TABLES } from '@/db/tables';
import { EMPTY_TEMPLATE } from '@/lib/templates/template-schema';
import type { AccessWorld } from '@/tests/support/access-world';
import { guardedBy, type Actor } from '@/tests/support/policy-expectations';
import type { RouteCase } from '@/tests/support/route-matrix';

/** The template library's rows of the authorization matrix (tests/support/route-matrix.ts). */

const T = 'app/api/v1/workspaces/[workspace]/templates';


async function seedTemplate(world: AccessWorld): Promise<number> {
  const [id] = await insertTemplates(world.knex, [{ ...EMPTY_TEMPLATE, name: 'Matrix single', rimDiameterMm: 110 }], {
    workspaceId: world.shop.id,
    userId: world.users.owner.id,
    at: new Date().toISOString(),
    action: 'create',
  });
  return id!;
}

/** The outsider aims at the shop's template through its own workspace, and must get 404. */
const workspaceFor = (world: AccessWorld, actor: Actor) => (actor === 'outsider' ? world.otherShop.slug : world.shop.slug);

const withTemplate =
  (extra: Record<string, unknown> = {}) =>
  async (world: AccessWorld, actor: Actor) => ({
    params: { workspace: workspaceFor(world, actor), id: String(await seedTemplate(world)) },
    ...extra,
  });

async function withPhoto(world: AccessWorld, actor: Actor) {
  process.env.RIMSCALE_UPLOAD_DIR = path.join(os.tmpdir(), 'rimscale-matrix-uploads');
  const templateId = await seedTemplate(world);
  const key = `templates/${templateId}/matrix-${actor.toLowerCase()}`;
  await putObject(`${key}.png`, Buffer.from('stored bytes'));
  await putObject(`${key}-thumb.webp`, Buffer.from('thumb bytes'));
  const [row] = await world.knex(TABLES.templatePhotos)
    .insert({
      template_id: templateId,
      storage_key: `${key}.png`,
      thumb_key: `${key}-thumb.webp`,
      content_type: 'image/png',
      width_px: 1,
      height_px: 1,
      bytes: 12,
      created_at: new Date().toISOString(),
    })
    .returning('id');
  return { params: { workspace: workspaceFor(world, actor), id: String(templateId), photoId: String(row.id) } };
}

export const TEMPLATE_ROUTE_CASES: RouteCase[] = [
  { file: `${T}/route.ts`, method: 'GET', ...guardedBy('template.read', 200) },
  { file: `${T}/route.ts`, method: 'POST', call: () => ({ body: { name: 'Matrix new' } }), ...guardedBy('template.edit', 201) },
  { file: `${T}/[id]/route.ts`, method: 'GET', call: withTemplate(), ...guardedBy('template.read', 200) },
  { file: `${T}/[id]/route.ts`, method: 'PATCH', call: withTemplate({ body: { version: 1, notes: 'edited' } }), ...guardedBy('template.edit', 200) },
  { file: `${T}/[id]/route.ts`, method: 'DELETE', call: withTemplate(), ...guardedBy('template.delete', 204) },
  { file: `${T}/[id]/archive/route.ts`, method: 'POST', call: withTemplate({ body: { version: 1 } }), ...guardedBy('template.edit', 200) },
  { file: `${T}/[id]/revisions/route.ts`, method: 'GET', call: withTemplate(), ...guardedBy('template.read', 200) },
  {
    file: `${T}/[id]/revisions/[version]/restore/route.ts`,
    method: 'POST',
    call: async (world, actor) => {
      const call = await withTemplate({ body: { version: 1 } })(world, actor);
      return { ...call, params: { ...call.params, version: '1' } };
    },
    ...guardedBy('template.edit', 200),
  },
  { file: `${T}/[id]/photos/route.ts`, method: 'GET', call: withTemplate(), ...guardedBy('template.read', 200) },
  // A form upload without a photo passes the role check and is then refused (400).
  {
    file: `${T}/[id]/photos/route.ts`,
    method: 'POST',
    call: withTemplate({ raw: { type: 'multipart/form-data; boundary=matrix', body: '--matrix\r\nContent-Disposition: form-data; name="caption"\r\n\r\nx\r\n--matrix--\r\n' } }),
    ...guardedBy('template.edit', 400),
  },
  { file: `${T}/[id]/photos/[photoId]/route.ts`, method: 'GET', call: withPhoto, ...guardedBy('template.read', 200) },
  { file: `${T}/[id]/photos/[photoId]/route.ts`, method: 'DELETE', call: withPhoto, ...guardedBy('template.edit', 204) },
  { file: `${T}/[id]/sheet/route.ts`, method: 'GET', call: withTemplate({ search: '?kind=strip&format=svg' }), ...guardedBy('sheet.print', 200) },
  { file: `${T}/import/route.ts`, method: 'POST', call: () => ({ raw: { type: 'text/csv', body: 'name\nMatrix import\n' } }), ...guardedBy('template.import', 201) },
  { file: `${T}/export/route.ts`, method: 'GET', ...guardedBy('template.read', 200) },
];
