import { beforeEach, describe, expect, it, vi } from 'vitest';
import { actAs } from '@/tests/support/session';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { api, SAMPLE } from './templates-support';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest();
let ws: string;
beforeEach(() => {
  ws = world.shop.slug;
});

async function createAs(userId: number, body: unknown = SAMPLE) {
  actAs(userId);
  const response = await api.create(ws, body);
  expect(response.status).toBe(201);
  return (await response.json()).template;
}

describe('template CRUD by role', () => {
  it('lets a technician create, read, update and archive; stores every field as sent', async () => {
    const created = await createAs(world.users.technician.id);
    expect(created).toMatchObject({ ...SAMPLE, version: 1, archived: false, createdBy: { name: 'World technician' } });

    const read = await (await api.get(ws, created.id)).json();
    expect(read.template).toEqual(created);
    expect(read.photos).toEqual([]);

    const patched = await api.patch(ws, created.id, { version: 1, boreMm: 40.5, notes: 'Rebored' });
    expect(patched.status).toBe(200);
    expect((await patched.json()).template).toMatchObject({ boreMm: 40.5, notes: 'Rebored', version: 2, strokeMm: 39.2 });

    const archived = await api.patch(ws, created.id, { version: 2, archived: true });
    expect((await archived.json()).template).toMatchObject({ archived: true, version: 3 });
  });

  it('lets an owner write too, and only an owner delete', async () => {
    const created = await createAs(world.users.owner.id);
    actAs(world.users.technician.id);
    expect((await api.delete(ws, created.id)).status).toBe(403);
    actAs(world.users.owner.id);
    expect((await api.delete(ws, created.id)).status).toBe(204);
    expect((await api.get(ws, created.id)).status).toBe(404);
  });

  it('lets a viewer read but answers 403 on every write, writing nothing', async () => {
    const created = await createAs(world.users.technician.id);
    actAs(world.users.viewer.id);
    expect((await api.get(ws, created.id)).status).toBe(200);
    expect((await api.list(ws)).status).toBe(200);
    expect((await api.revisions(ws, created.id)).status).toBe(200);
    expect((await api.create(ws, SAMPLE)).status).toBe(403);
    expect((await api.patch(ws, created.id, { version: 1, name: 'Viewer edit' })).status).toBe(403);
    expect((await api.archive(ws, created.id)).status).toBe(403);
    expect((await api.restore(ws, created.id, 1, { version: 1 })).status).toBe(403);
    expect((await api.delete(ws, created.id)).status).toBe(403);
    expect((await api.importCsv(ws, 'name\nX')).status).toBe(403);
    const body = await (await api.create(ws, SAMPLE)).json();
    expect(body.error).toMatch(/technician/);
    actAs(world.users.owner.id);
    expect((await (await api.get(ws, created.id)).json()).template).toMatchObject({ name: SAMPLE.name, version: 1 });
    expect((await (await api.list(ws)).json()).total).toBe(1);
  });

  it('answers 404 to a member of another workspace, for existing and missing ids alike', async () => {
    const created = await createAs(world.users.technician.id);
    actAs(world.users.outsider.id);
    for (const response of [
      await api.list(ws),
      await api.get(ws, created.id),
      await api.patch(ws, created.id, { version: 1, name: 'Outsider' }),
      await api.revisions(ws, created.id),
      await api.exportCsv(ws),
    ])
      expect(response.status).toBe(404);
    // The outsider's own workspace does not see the template either.
    expect((await api.get(world.otherShop.slug, created.id)).status).toBe(404);
    expect((await api.patch(world.otherShop.slug, created.id, { version: 1, name: 'Sideways' })).status).toBe(404);
    actAs(world.users.technician.id);
    expect((await (await api.get(ws, created.id)).json()).template.name).toBe(SAMPLE.name);
  });

  it('answers 401 when signed out', async () => {
    actAs(null);
    expect((await api.list(ws)).status).toBe(401);
    expect((await api.create(ws, SAMPLE)).status).toBe(401);
  });
});

describe('template validation', () => {
  it('refuses bad fields with the API error shape, naming the field and range', async () => {
    actAs(world.users.technician.id);
    const response = await api.create(ws, { ...SAMPLE, boreMm: 400, rotation: 'sideways', name: '' });
    expect(response.status).toBe(400);
    const body = await response.json();
    expect(body.error).toBe('Some fields are not valid');
    const byPath = Object.fromEntries(body.issues.map((i: { path: string; message: string }) => [i.path, i.message]));
    expect(byPath.boreMm).toMatch(/Bore must be at most 150 mm \(allowed 10–150 mm\)/);
    expect(byPath.rotation).toMatch(/cw, ccw/);
    expect(byPath.name).toMatch(/must not be empty/);
  });

  it('checks cross-field rules on the merged template when patching', async () => {
    const created = await createAs(world.users.technician.id);
    const response = await api.patch(ws, created.id, { version: 1, hubHoleMm: 110 });
    expect(response.status).toBe(400);
    expect((await response.json()).issues[0]).toMatchObject({ path: 'hubHoleMm', message: expect.stringMatching(/smaller than the flywheel face diameter/) });
    expect((await (await api.get(ws, created.id)).json()).template.version).toBe(1);
  });

  it('refuses a patch without a version or with unknown fields', async () => {
    const created = await createAs(world.users.technician.id);
    expect((await api.patch(ws, created.id, { name: 'No version' })).status).toBe(400);
    expect((await api.patch(ws, created.id, { version: 1, colour: 'red' })).status).toBe(400);
  });
});

describe('concurrent edits (optimistic concurrency by version)', () => {
  it('of two saves from the same version one wins, the other gets 409 naming who and when; nothing is lost', async () => {
    const created = await createAs(world.users.technician.id);
    // Both requests start before either finishes (the session double holds one acting user, the owner).
    actAs(world.users.owner.id);
    const [first, second] = await Promise.all([
      api.patch(ws, created.id, { version: 1, boreMm: 41 }),
      api.patch(ws, created.id, { version: 1, strokeMm: 40 }),
    ]);
    const statuses = [first.status, second.status].sort();
    expect(statuses).toEqual([200, 409]);
    const winner = first.status === 200 ? first : second;
    const loser = first.status === 409 ? first : second;
    const won = (await winner.json()).template;
    const lost = await loser.json();
    expect(won.version).toBe(2);
    // The time is written for people: en-GB (no Accept-Language) in UTC, CLDR "d MMM y, HH:mm z", e.g. "3 Dec 2026, 07:58 UTC".
    expect(lost.error).toMatch(new RegExp(`changed by ${won.updatedBy.name} at \\d{1,2} [A-Z][a-z]{2} \\d{4}, \\d{2}:\\d{2} UTC \\(now version 2\\) — reload`));
    expect(lost.issues[0].path).toBe('version');
    // The loser gets the current state back to re-apply its edit on: nothing silently overwritten.
    expect(lost.current).toEqual(won);

    // History: the creation and the winner's save; the refused attempt is reported (409), not stored.
    actAs(world.users.viewer.id);
    const { revisions } = await (await api.revisions(ws, created.id)).json();
    expect(revisions.map((r: { version: number; action: string }) => [r.version, r.action])).toEqual([
      [2, 'update'],
      [1, 'create'],
    ]);
    expect(revisions[0].user.name).toBe('World owner');
    expect(won.updatedBy.name).toBe('World owner');
    expect(revisions[0].changes).toEqual(
      won.boreMm === 41 ? [{ field: 'boreMm', from: 40, to: 41 }] : [{ field: 'strokeMm', from: 39.2, to: 40 }],
    );

    // The loser reloads (version 2) and saves again: both edits are now kept.
    actAs(world.users.owner.id);
    const retryBody = won.boreMm === 41 ? { version: 2, strokeMm: 40 } : { version: 2, boreMm: 41 };
    const retry = await api.patch(ws, created.id, retryBody);
    expect(retry.status).toBe(200);
    expect((await retry.json()).template).toMatchObject({ boreMm: 41, strokeMm: 40, version: 3 });
  });

  it('answers 409 to a save from an old version even long after', async () => {
    const created = await createAs(world.users.technician.id);
    await api.patch(ws, created.id, { version: 1, notes: 'one' });
    await api.patch(ws, created.id, { version: 2, notes: 'two' });
    const stale = await api.patch(ws, created.id, { version: 1, notes: 'stale' });
    expect(stale.status).toBe(409);
    expect((await (await api.get(ws, created.id)).json()).template.notes).toBe('two');
  });
});

describe('history and restore', () => {
  it('records who changed which fields old → new, and restores an earlier revision as a new one', async () => {
    const created = await createAs(world.users.technician.id);
    await api.patch(ws, created.id, { version: 1, rimDiameterMm: 115, advanceMarksDeg: [18] });
    actAs(world.users.owner.id);
    await api.patch(ws, created.id, { version: 2, name: 'Renamed single' });

    const { revisions } = await (await api.revisions(ws, created.id)).json();
    expect(revisions).toHaveLength(3);
    expect(revisions[1]).toMatchObject({
      version: 2,
      action: 'update',
      user: { name: 'World technician' },
      changes: [
        { field: 'rimDiameterMm', from: 112, to: 115 },
        { field: 'advanceMarksDeg', from: [16, 17, 18], to: [18] },
      ],
    });
    expect(revisions[2].changes).toContainEqual({ field: 'name', from: null, to: SAMPLE.name });

    const restored = await api.restore(ws, created.id, 1, { version: 3 });
    expect(restored.status).toBe(200);
    expect((await restored.json()).template).toMatchObject({ ...SAMPLE, version: 4 });
    const after = (await (await api.revisions(ws, created.id)).json()).revisions;
    expect(after[0]).toMatchObject({ version: 4, action: 'restore', restoredFromVersion: 1, user: { name: 'World owner' } });
    expect(after[0].changes).toEqual([
      { field: 'name', from: 'Renamed single', to: SAMPLE.name },
      { field: 'rimDiameterMm', from: 115, to: 112 },
      { field: 'advanceMarksDeg', from: [18], to: [16, 17, 18] },
    ]);

    expect((await api.restore(ws, created.id, 1, { version: 3 })).status).toBe(409);
    expect((await api.restore(ws, created.id, 99, { version: 4 })).status).toBe(404);
  });

  it('archives through POST …/archive and lists archived templates only when asked', async () => {
    const created = await createAs(world.users.technician.id);
    await createAs(world.users.technician.id, { ...SAMPLE, name: 'Kept in list' });
    const archived = await api.archive(ws, created.id);
    expect(archived.status).toBe(200);
    expect((await archived.json()).template).toMatchObject({ archived: true, version: 2 });
    const active = await (await api.list(ws)).json();
    expect(active.items.map((t: { name: string }) => t.name)).toEqual(['Kept in list']);
    const onlyArchived = await (await api.list(ws, '?archived=true')).json();
    expect(onlyArchived.items.map((t: { id: number }) => t.id)).toEqual([created.id]);
    expect((await (await api.list(ws, '?archived=all')).json()).total).toBe(2);
  });
});

describe('list: search, sort and server-side pages', () => {
  beforeEach(async () => {
    actAs(world.users.technician.id);
    const rows = [
      { name: 'Bravo kart', description: 'reed valve 100', rimDiameterMm: 120 },
      { name: 'alpha moped', description: 'piston port 50', rimDiameterMm: 95 },
      { name: 'Charlie scooter', description: 'piston port 125', rimDiameterMm: 150 },
      { name: 'Delta 100% test_1', description: 'wildcards in name', rimDiameterMm: null },
    ];
    for (const row of rows) expect((await api.create(ws, row)).status).toBe(201);
  });

  it('sorts by name case-insensitively and by a number with unknown values last', async () => {
    const byName = await (await api.list(ws, '?sort=name&dir=asc')).json();
    expect(byName.items.map((t: { name: string }) => t.name)).toEqual(['alpha moped', 'Bravo kart', 'Charlie scooter', 'Delta 100% test_1']);
    const byRim = await (await api.list(ws, '?sort=rimDiameterMm&dir=desc')).json();
    expect(byRim.items.map((t: { rimDiameterMm: number | null }) => t.rimDiameterMm)).toEqual([150, 120, 95, null]);
  });

  it('searches name and description, treating % and _ literally', async () => {
    const port = await (await api.list(ws, '?q=piston%20port')).json();
    expect(port.items.map((t: { name: string }) => t.name)).toEqual(['alpha moped', 'Charlie scooter']);
    const kart = await (await api.list(ws, '?q=KART')).json();
    expect(kart.total).toBe(1);
    expect((await (await api.list(ws, '?q=100%25')).json()).items.map((t: { name: string }) => t.name)).toEqual(['Delta 100% test_1']);
    expect((await (await api.list(ws, '?q=t_1')).json()).total).toBe(1);
    expect((await (await api.list(ws, '?q=%25')).json()).total).toBe(1);
  });

  it('finds a hyphenated engine from words with a space and the other way round, every word required', async () => {
    expect((await api.create(ws, { name: 'Echo', description: 'piston-port 80', rimDiameterMm: 110 })).status).toBe(201);
    const names = async (q: string) => (await (await api.list(ws, `?q=${encodeURIComponent(q)}&sort=name`)).json()).items.map((t: { name: string }) => t.name);
    expect(await names('piston port')).toEqual(['alpha moped', 'Charlie scooter', 'Echo']);
    expect(await names('piston-port')).toEqual(['alpha moped', 'Charlie scooter', 'Echo']);
    expect(await names('port 125')).toEqual(['Charlie scooter']);
  });

  it('pages with limit/offset and reports the total', async () => {
    const page2 = await (await api.list(ws, '?sort=name&pageSize=3&page=2')).json();
    expect(page2).toMatchObject({ total: 4, page: 2, pageSize: 3 });
    expect(page2.items.map((t: { name: string }) => t.name)).toEqual(['Delta 100% test_1']);
  });

  it('refuses bad query parameters: the path names the parameter, the message its label and range', async () => {
    const response = await api.list(ws, '?sort=colour&pageSize=1000&page=1.5');
    expect(response.status).toBe(400);
    const issues = (await response.json()).issues as Array<{ path: string; message: string }>;
    expect(issues.map((i) => i.path)).toEqual(expect.arrayContaining(['sort', 'pageSize', 'page']));
    const messageOf = (path: string) => issues.find((i) => i.path === path)?.message;
    expect(messageOf('pageSize')).toBe('Page size must be at most 100 (allowed 1–100)');
    expect(messageOf('page')).toBe('Page must be a whole number (allowed 1 or more)');
    expect(messageOf('sort')).toMatch(/^Sort must be one of: name, /);
    for (const issue of issues) expect(issue.message).not.toMatch(/\(\w+\)/); // no code key in brackets
  });
});
