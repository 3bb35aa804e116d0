import { DOMParser } from '@xmldom/xmldom';
import { PDFParse } from 'pdf-parse';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import * as sheet from '@/app/api/v1/workspaces/[workspace]/templates/[id]/sheet/route';
import { actAs } from '@/tests/support/session';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { api, SAMPLE } from './templates-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest({ actingAs: 'technician' });
let ws: string;
let templateId: number;
beforeEach(async () => {
  ws = world.shop.slug;
  templateId = (await (await api.create(ws, SAMPLE)).json()).template.id;
  actAs(world.users.viewer.id);
});

function getSheet(query: string, id: number = templateId, workspace = ws) {
  return sheet.GET(new Request(`http://test.local/api/v1/workspaces/${workspace}/templates/${id}/sheet${query}`), {
    params: Promise.resolve({ workspace, id: String(id) }),
  });
}

/** Circles by data-role, read with @xmldom/xmldom as an independent SVG parser. */
async function circles(response: Response): Promise<Record<string, number>> {
  const doc = new DOMParser().parseFromString(await response.text(), 'image/svg+xml');
  const svg = doc.documentElement!;
  // True scale: width and height in mm and a viewBox in the same mm (SVG 2 §8.2, CSS Values 4 absolute units).
  expect(svg.getAttribute('width')).toMatch(/mm$/);
  const found: Record<string, number> = {};
  const list = doc.getElementsByTagName('circle');
  for (let i = 0; i < list.length; i++) {
    const role = list[i]!.getAttribute('data-role');
    if (role) found[role] = Number(list[i]!.getAttribute('r'));
  }
  return found;
}

describe('GET …/templates/[id]/sheet', () => {
  it('lets a viewer print a degree wheel cut at the template’s face diameter', async () => {
    const response = await getSheet('?kind=wheel&format=svg');
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^image\/svg\+xml/);
    expect(response.headers.get('content-disposition')).toMatch(/rimscale-wheel-104mm-test-single-50\.svg/);
    expect((await circles(response))['cut-line']).toBeCloseTo(SAMPLE.faceDiameterMm / 2, 6);
  });

  it('draws a flange ring from the rim diameter plus clearance out to the flange diameter', async () => {
    const found = await circles(await getSheet('?kind=ring&format=svg'));
    expect(found['cut-line']).toBeCloseTo(SAMPLE.flangeDiameterMm / 2, 6);
    // Inner diameter = rim 112 mm + 1 mm clearance (the ring must clear the flywheel: common practice, 1–2 mm) = 113 mm.
    expect(found['cut-line-inner']).toBeCloseTo(113 / 2, 6);
  });

  it('answers a strip as a PDF titled with the template name', async () => {
    const response = await getSheet('?kind=strip&format=pdf');
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    const bytes = new Uint8Array(await response.arrayBuffer());
    const text = await new PDFParse({ data: bytes }).getText();
    expect(text.text).toContain(SAMPLE.name);
  });

  it('says which diameters a kind needs when the template lacks them', async () => {
    actAs(world.users.technician.id);
    const bare = (await (await api.create(ws, { name: 'Rim only', rimDiameterMm: 100 })).json()).template.id;
    actAs(world.users.viewer.id);
    const response = await getSheet('?kind=wheel', bare);
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.error).toBe('A wheel sheet needs the flywheel face diameter in the template');
    expect(body.issues[0]).toEqual({ path: 'kind', message: 'This template can print: strip' });
    expect((await getSheet('?kind=scribe')).status).toBe(400);
  });

  it('answers 404 to another workspace', async () => {
    actAs(world.users.outsider.id);
    expect((await getSheet('?kind=wheel')).status).toBe(404);
    expect((await getSheet('?kind=wheel', templateId, world.otherShop.slug)).status).toBe(404);
  });
});
