import { beforeEach, describe, expect, it, vi } from 'vitest';
import * as portCalc from '@/app/api/v1/calc/port-events/route';
import * as pistonDropCalc from '@/app/api/v1/calc/piston-drop/route';
import * as buildSettings from '@/app/api/v1/workspaces/[workspace]/build-settings/route';
import * as tdcCalc from '@/app/api/v1/calc/tdc/route';
import { TABLES } from '@/db/tables';
import { insertTemplates } from '@/db/templates/insert-templates';
import { EMPTY_TEMPLATE } from '@/lib/templates/template-schema';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';
import { BUILD_SAMPLE, buildApi } from './builds-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest();
let ws: string;
beforeEach(() => {
  ws = world.shop.slug;
});

async function createAs(userId: number, body: unknown = BUILD_SAMPLE) {
  actAs(userId);
  const response = await buildApi.create(ws, body);
  expect(response.status).toBe(201);
  return (await response.json()).build;
}

async function seedTemplate(workspaceId: number, extra: Record<string, unknown> = {}) {
  const [id] = await insertTemplates(
    world.knex,
    [
      {
        ...EMPTY_TEMPLATE,
        name: 'Invented single',
        description: 'Invented 50 cc piston-port single',
        strokeMm: 40,
        rodMm: 80,
        rotation: 'ccw',
        staticAdvanceDeg: 18,
        portTargets: [
          { name: 'Exhaust', opensCrankDeg: 75, closesCrankDeg: 285 },
          { name: 'Transfer', opensCrankDeg: 114, closesCrankDeg: 246 },
        ],
        ...extra,
      },
    ],
    { workspaceId, userId: world.users.owner.id, at: new Date().toISOString(), action: 'create' },
  );
  return id!;
}

describe('build records: computed results', () => {
  it('stores the record with the same TDC, timing and port angles as the calculators give for the same figures', async () => {
    const build = await createAs(world.users.technician.id);
    expect(build).toMatchObject({ customerName: BUILD_SAMPLE.customerName, status: 'open', version: 1, technician: { name: 'World technician' } });

    // One code path: the calculators' own route handlers, given the same figures.
    const tdc = await callRoute(tdcCalc.POST, { body: BUILD_SAMPLE.stops });
    expect(build.tdc).toEqual({
      tdcReadingDeg: tdc.json.tdcReadingDeg,
      tdcReadingSide: tdc.json.tdcReadingSide,
      correctionDeg: tdc.json.correctionDeg,
      sweepDeg: tdc.json.sweepDeg,
      stopAngleDeg: tdc.json.stopAngleDeg,
    });
    // Midpoint of 340° and 24° is 2° (common practice): correction −2°.
    expect(build.tdc.correctionDeg).toBeCloseTo(-2, 9);

    const drop = await callRoute(pistonDropCalc.POST, { body: { strokeMm: 40, rodMm: 80, crankDeg: 360 - 18 } });
    expect(build.timingSetDegBTDC).toBe(18);
    expect(build.timingSetMmBTDC).toBe(drop.json.dropMm);
    expect(build.timingSetMmBTDC).toBeCloseTo(1.21796, 5); // Heywood eq. 2.5, worked in tests/lib/builds/build-results.test.ts

    const ports = await callRoute(portCalc.POST, { body: { strokeMm: 40, rodMm: 80, deckMm: 0.5, ports: BUILD_SAMPLE.ports } });
    const calcPorts = ports.json.ports as Array<{ opensDegATDC: number; closesDegATDC: number; durationDeg: number }>;
    build.ports.forEach((port: { opensDegATDC: number; closesDegATDC: number; durationDeg: number }, i: number) => {
      expect(port.opensDegATDC).toBe(calcPorts[i]!.opensDegATDC);
      expect(port.closesDegATDC).toBe(calcPorts[i]!.closesDegATDC);
      expect(port.durationDeg).toBe(calcPorts[i]!.durationDeg);
    });
    expect(build.ports[0].durationDeg).toBeCloseTo(211.0634, 4); // Heywood eq. 2.5 inverse, worked by hand
    expect(build.blowdownDeg).toBe(ports.json.blowdownDeg);

    // Stored, not only answered: the GET reads the same results back.
    actAs(world.users.viewer.id);
    expect((await (await buildApi.get(ws, build.id)).json()).build).toEqual(build);
  });

  it('starts from a template: geometry, rotation, advance and port targets, and keeps its id and version', async () => {
    const templateId = await seedTemplate(world.shop.id);
    const build = await createAs(world.users.technician.id, { customerName: 'Bryn Tallowmere', templateId, deckMm: 0.5, ports: BUILD_SAMPLE.ports });
    expect(build).toMatchObject({
      templateId,
      templateVersion: 1,
      template: { id: templateId, name: 'Invented single', version: 1 },
      strokeMm: 40,
      rodMm: 80,
      rotation: 'ccw',
      advanceDeg: 18,
      engineDescription: 'Invented 50 cc piston-port single',
    });
    // Target durations 210° and 132°; measured 211.06° and 140.53° (eq. 2.5), tolerance ±2° (common practice).
    expect(build.ports[0]).toMatchObject({ targetDurationDeg: 210, withinTolerance: true });
    expect(build.ports[0].deviationDeg).toBeCloseTo(1.0634, 4);
    expect(build.ports[1]).toMatchObject({ targetDurationDeg: 132, withinTolerance: false });
    expect(build.toleranceDeg).toBe(2);
  });

  it('judges deviations with the workspace tolerance setting', async () => {
    await world.knex(TABLES.workspaces).where('id', world.shop.id).update({ build_tolerance_deg: 0.5 });
    const templateId = await seedTemplate(world.shop.id);
    const build = await createAs(world.users.owner.id, { ...BUILD_SAMPLE, templateId });
    expect(build.toleranceDeg).toBe(0.5);
    expect(build.ports[0].withinTolerance).toBe(false);
  });

  it('takes the tolerance from the workspace setting, which only those allowed its settings change, within its range', async () => {
    const put = (toleranceDeg: unknown) => callRoute(buildSettings.PUT, { method: 'PUT', body: { toleranceDeg }, params: { workspace: ws } });
    actAs(world.users.technician.id);
    expect((await put(1)).status).toBe(403);
    actAs(world.users.owner.id);
    const tooWide = await put(20);
    expect(tooWide.status).toBe(400);
    expect(tooWide.json.issues).toEqual([{ path: 'toleranceDeg', message: 'Port duration tolerance must be at most 10° (allowed 0.5–10°)' }]);
    expect((await put(1)).status).toBe(200);
    const templateId = await seedTemplate(world.shop.id);
    // Exhaust +1.06° from its target: within ±2° (the default, common practice) but outside ±1°.
    const build = await createAs(world.users.technician.id, { ...BUILD_SAMPLE, templateId });
    expect(build.toleranceDeg).toBe(1);
    expect(build.ports[0].withinTolerance).toBe(false);
  });

  it('converts a timing set in mm to degrees and keeps both', async () => {
    const build = await createAs(world.users.technician.id, { ...BUILD_SAMPLE, timingSetDegBTDC: null, timingSetMmBTDC: 1.217955694410179 });
    expect(build.timingSetDegBTDC).toBeCloseTo(18, 6); // eq. 2.5 worked value, inverted
    expect(build.timingEnteredAs).toBe('mm');
    const patched = await (await buildApi.patch(ws, build.id, { version: 1, timingSetDegBTDC: 20 })).json();
    expect(patched.build).toMatchObject({ timingSetDegBTDC: 20, timingEnteredAs: 'deg', version: 2 });
    expect(patched.build.timingSetMmBTDC).toBeGreaterThan(1.217955694410179);
  });
});

describe('build records: bad input', () => {
  async function refused(body: unknown) {
    actAs(world.users.technician.id);
    const response = await buildApi.create(ws, body);
    expect(response.status).toBe(400);
    const json = await response.json();
    expect((await (await buildApi.list(ws)).json()).total).toBe(0);
    expect(JSON.stringify(json)).not.toMatch(/NaN/);
    return json.issues as Array<{ path: string; message: string }>;
  }

  it('names the field by label with the allowed range, and stores nothing', async () => {
    expect(await refused({ ...BUILD_SAMPLE, strokeMm: 5 })).toEqual([{ path: 'strokeMm', message: 'Stroke must be at least 10 mm (allowed 10–150 mm)' }]);
    expect(await refused({ ...BUILD_SAMPLE, deckMm: 30 })).toEqual([{ path: 'deckMm', message: 'Deck height must be at most 20 mm (allowed -20 to 20 mm)' }]);
    expect((await refused({ ...BUILD_SAMPLE, ports: [{ name: 'Exhaust', heightMm: -1 }] }))[0]).toEqual({
      path: 'ports.0.heightMm',
      message: 'Port edge height must be at least 0 mm (allowed 0–400 mm)',
    });
    expect((await refused({ ...BUILD_SAMPLE, customerName: '' }))[0]?.message).toBe('Customer name must not be empty (1–120 characters)');
  });

  it('refuses equal stop readings, an e-mail that is not one and a template of another workspace', async () => {
    expect((await refused({ ...BUILD_SAMPLE, stops: { numbering: 'full', readingADeg: 10, readingBDeg: 10 } }))[0]?.message).toMatch(
      /Reading B must differ from reading A/,
    );
    expect((await refused({ ...BUILD_SAMPLE, customerEmail: 'avery-at-home' }))[0]?.message).toMatch(/Customer e-mail must be an address/);
    const foreign = await seedTemplate(world.otherShop.id);
    expect(await refused({ ...BUILD_SAMPLE, templateId: foreign })).toEqual([
      { path: 'templateId', message: `Template: this workspace has no template number ${foreign}` },
    ]);
    expect((await refused({ ...BUILD_SAMPLE, technicianId: world.users.outsider.id }))[0]?.message).toBe('Technician must be a member of this workspace');
  });

  it('records a port the piston never uncovers beside it, not as an error', async () => {
    const build = await createAs(world.users.technician.id, { ...BUILD_SAMPLE, ports: [{ name: 'Deep', heightMm: 90 }] });
    expect(build.ports[0]).toMatchObject({ status: 'never-opens', opensDegATDC: null, durationDeg: 0 });
    expect(build.ports[0].note).toMatch(/Never opens/);
  });
});

describe('build records: status, roles, concurrency and history', () => {
  it('goes open → done → handed-over, back from done to open, and only an owner changes a handed-over record', async () => {
    const build = await createAs(world.users.technician.id);
    const skip = await buildApi.patch(ws, build.id, { version: 1, status: 'handed-over' });
    expect(skip.status).toBe(400);
    expect((await skip.json()).issues[0].message).toMatch(/open → done → handed-over/);

    const done = await (await buildApi.patch(ws, build.id, { version: 1, status: 'done' })).json();
    expect(done.build).toMatchObject({ status: 'done', version: 2 });
    expect(done.build.finishedOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const reopened = await (await buildApi.patch(ws, build.id, { version: 2, status: 'open' })).json();
    expect(reopened.build).toMatchObject({ status: 'open', finishedOn: null, version: 3 });
    await buildApi.patch(ws, build.id, { version: 3, status: 'done' });
    const handed = await (await buildApi.patch(ws, build.id, { version: 4, status: 'handed-over' })).json();
    expect(handed.build.handedOverOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);

    const refused = await buildApi.patch(ws, build.id, { version: 5, status: 'open' });
    expect(refused.status).toBe(403);
    expect((await buildApi.patch(ws, build.id, { version: 5, notes: 'late edit' })).status).toBe(403);
    actAs(world.users.owner.id);
    const owner = await (await buildApi.patch(ws, build.id, { version: 5, status: 'open' })).json();
    expect(owner.build).toMatchObject({ status: 'open', version: 6, handedOverOn: null });
  });

  it('of two saves from one version, writes one (200) and answers the other 409 naming who and when; nothing is lost', async () => {
    const build = await createAs(world.users.technician.id);
    const [a, b] = await Promise.all([
      buildApi.patch(ws, build.id, { version: 1, notes: 'First save' }),
      buildApi.patch(ws, build.id, { version: 1, squishMm: 1.1 }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    const conflict = await (a.status === 409 ? a : b).json();
    expect(conflict.error).toMatch(/changed by World technician at \d{4}-\d{2}-\d{2}T.* \(now version 2\)/);
    const stored = (await (await buildApi.get(ws, build.id)).json()).build;
    expect(stored.version).toBe(2);
    expect(stored).toEqual(conflict.current);
    // The refused change is applied again from the current version and both survive.
    const again = a.status === 409 ? { notes: 'First save' } : { squishMm: 1.1 };
    const merged = (await (await buildApi.patch(ws, build.id, { version: 2, ...again })).json()).build;
    expect(merged).toMatchObject({ notes: 'First save', squishMm: 1.1, version: 3 });

    const revisions = (await (await buildApi.revisions(ws, build.id)).json()).revisions;
    expect(revisions.map((r: { version: number }) => r.version)).toEqual([3, 2, 1]);
    expect(revisions[2].changes.map((c: { field: string }) => c.field)).toContain('customerName');
  });

  it('lets a viewer read but not write, an owner delete, and answers 404 to another workspace', async () => {
    const build = await createAs(world.users.technician.id);
    actAs(world.users.viewer.id);
    expect((await buildApi.get(ws, build.id)).status).toBe(200);
    expect((await buildApi.create(ws, BUILD_SAMPLE)).status).toBe(403);
    expect((await buildApi.patch(ws, build.id, { version: 1, notes: 'viewer' })).status).toBe(403);
    actAs(world.users.outsider.id);
    expect((await buildApi.get(ws, build.id)).status).toBe(404);
    expect((await buildApi.get(world.otherShop.slug, build.id)).status).toBe(404);
    actAs(world.users.technician.id);
    expect((await buildApi.delete(ws, build.id)).status).toBe(403);
    actAs(world.users.owner.id);
    expect((await buildApi.delete(ws, build.id)).status).toBe(204);
    expect((await buildApi.get(ws, build.id)).status).toBe(404);
  });

  it('lists with search, status, technician and template filters, sorted and paged in SQL', async () => {
    const templateId = await seedTemplate(world.shop.id);
    await createAs(world.users.technician.id, { ...BUILD_SAMPLE, customerName: 'Cora Vantwell', engineNumber: 'AA-1' });
    await createAs(world.users.owner.id, { ...BUILD_SAMPLE, customerName: 'Dov Pellarin', engineNumber: 'BB-2', templateId, status: 'done' });
    await createAs(world.users.owner.id, { ...BUILD_SAMPLE, customerName: 'Esme Harrowgate', engineNumber: 'CC-3' });
    const names = async (query: string) =>
      ((await (await buildApi.list(ws, query)).json()).items as Array<{ customerName: string }>).map((b) => b.customerName);
    expect(await names('?sort=customerName&dir=asc')).toEqual(['Cora Vantwell', 'Dov Pellarin', 'Esme Harrowgate']);
    expect(await names('?q=bb-2')).toEqual(['Dov Pellarin']);
    expect(await names('?status=done')).toEqual(['Dov Pellarin']);
    expect(await names(`?template=${templateId}`)).toEqual(['Dov Pellarin']);
    expect(await names(`?technician=${world.users.technician.id}`)).toEqual(['Cora Vantwell']);
    const page2 = await (await buildApi.list(ws, '?sort=customerName&dir=desc&pageSize=2&page=2')).json();
    expect(page2).toMatchObject({ total: 3, page: 2, pageSize: 2 });
    expect(page2.items.map((b: { customerName: string }) => b.customerName)).toEqual(['Cora Vantwell']);
    const bad = await buildApi.list(ws, '?status=lost');
    expect(bad.status).toBe(400);
    expect((await bad.json()).issues[0]).toEqual({ path: 'status', message: 'Status must be one of: open, done, handed-over, all' });
    const badIds = await (await buildApi.list(ws, '?technician=0&template=x&pageSize=101')).json();
    expect(badIds.issues).toEqual(
      expect.arrayContaining([
        { path: 'technician', message: 'Technician must be at least 1 (allowed 1 or more)' },
        { path: 'template', message: 'Template must be a whole number, 1 or more' },
        { path: 'pageSize', message: 'Page size must be at most 100 (allowed 1–100)' },
      ]),
    );
  });
});
