import { beforeEach, describe, expect, it, vi } from 'vitest';
import * as defaultRoute from '@/app/api/v1/workspaces/[workspace]/printer-profiles/default/route';
import * as buildSheet from '@/app/api/v1/workspaces/[workspace]/builds/[id]/sheet/route';
import * as templateSheet from '@/app/api/v1/workspaces/[workspace]/templates/[id]/sheet/route';
import { addProfile } from '@/db/printer-profiles';
import { readPdfGeometry, segmentLengthMm, type Segment } from '@/tests/pdf/read-pdf-geometry';
import { readPdfText } from '@/tests/pdf/read-pdf-text';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';
import { BUILD_SAMPLE, buildApi } from './builds-support';
import { api, SAMPLE } from './templates-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest();
let ws: string;
beforeEach(() => {
  ws = world.shop.slug;
});

const putDefault = (profileId: number | null, workspace = ws) =>
  callRoute(defaultRoute.PUT, { method: 'PUT', body: { profileId }, params: { workspace } });

async function sheetPdf(route: typeof templateSheet | typeof buildSheet, kind: string, id: number, query = '') {
  const response = await route.GET(new Request(`http://test.local/sheet?kind=${kind}&format=pdf${query}`), { params: Promise.resolve({ workspace: ws, id: String(id) }) });
  expect(response.status).toBe(200);
  return new Uint8Array(await response.arrayBuffer());
}

const horizontal = (s: Segment) => Math.abs(s.y1Mm - s.y2Mm) < 1e-3;
const vertical = (s: Segment) => Math.abs(s.x1Mm - s.x2Mm) < 1e-3;
/** Lengths (mm, 0.01) of the PDF's straight segments along one axis, from its drawing operators read by pdfjs-dist. */
async function lengths(pdf: Uint8Array, along: (s: Segment) => boolean): Promise<number[]> {
  const pages = await readPdfGeometry(pdf);
  return pages.flatMap((p) => p.segments.filter(along).map((s) => Number(segmentLengthMm(s).toFixed(2))));
}

describe('the workspace default printer profile', () => {
  it('is chosen by an owner only, among the workspace’s own profiles', async () => {
    actAs(world.users.owner.id);
    const profile = await addProfile(world.shop.id, world.users.owner.id, { name: 'Back office laser', printerScaleX: 0.98, printerScaleY: 1.02 });
    const foreign = await addProfile(world.otherShop.id, world.users.outsider.id, { name: 'Elsewhere', printerScaleX: 1, printerScaleY: 1 });
    expect((await putDefault(Number(foreign.id))).status).toBe(404);
    const set = await putDefault(Number(profile.id));
    expect(set.status).toBe(200);
    expect(set.json.profile).toMatchObject({ name: 'Back office laser', printerScaleX: 0.98 });
    actAs(world.users.technician.id);
    expect((await putDefault(null)).status).toBe(403);
    expect((await callRoute(defaultRoute.GET, { method: 'GET', params: { workspace: ws } })).json.profile).toMatchObject({ name: 'Back office laser' });
  });

  it('scales a template sheet’s bars by the default profile, read back from the PDF’s drawing operators, and the title block names it', async () => {
    actAs(world.users.technician.id);
    const templateId = (await (await api.create(ws, SAMPLE)).json()).template.id;
    const plain = await sheetPdf(templateSheet, 'strip', templateId);
    // No default yet: the 100 mm check bars are drawn 100 mm long (ISO 32000 user space, 1/72 in per unit).
    expect(await lengths(plain, horizontal)).toContain(100);
    expect((await readPdfText(plain)).text).toContain('Printer profile: none');

    const profile = await addProfile(world.shop.id, world.users.owner.id, { name: 'Back office laser', printerScaleX: 0.98, printerScaleY: 1.02 });
    actAs(world.users.owner.id);
    await putDefault(Number(profile.id));
    actAs(world.users.viewer.id);
    const corrected = await sheetPdf(templateSheet, 'strip', templateId);
    // A printer that prints 0.98 of every mm across gets 100 / 0.98 = 102.04 mm to print 100 mm; 100 / 1.02 = 98.04 mm down.
    expect(await lengths(corrected, horizontal)).toContain(102.04);
    expect(await lengths(corrected, horizontal)).not.toContain(100);
    expect(await lengths(corrected, vertical)).toContain(98.04);
    expect((await readPdfText(corrected)).text).toContain('Printer profile: Back office laser');

    // "No correction" on request.
    const none = await sheetPdf(templateSheet, 'strip', templateId, '&profile=none');
    expect(await lengths(none, horizontal)).toContain(100);
  });

  it('corrects a build’s sheets too, titled with the customer and noting the measured TDC correction', async () => {
    actAs(world.users.technician.id);
    const templateId = (await (await api.create(ws, SAMPLE)).json()).template.id;
    const build = (await (await buildApi.create(ws, { ...BUILD_SAMPLE, templateId })).json()).build;
    const profile = await addProfile(world.shop.id, world.users.owner.id, { name: 'Counter inkjet', printerScaleX: 1.01, printerScaleY: 1 });
    actAs(world.users.owner.id);
    await putDefault(Number(profile.id));
    const pdf = await sheetPdf(buildSheet, 'strip', build.id);
    expect(await lengths(pdf, horizontal)).toContain(99.01); // 100 / 1.01
    const text = (await readPdfText(pdf)).text.replace(/\s+/g, ' ');
    expect(text).toContain('Printer profile: Counter inkjet');
    expect(text).toContain(BUILD_SAMPLE.customerName);
    expect(text).toContain('pointer corrected by −2.0°');
  });
});
