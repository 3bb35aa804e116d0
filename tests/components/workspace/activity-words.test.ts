// Source under test: components/workspace/activity-words.ts with db/activity.ts feeding it real records.
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import sharp from 'sharp';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { DELETE as removeRoute, PATCH as roleRoute } from '@/app/api/v1/workspaces/[workspace]/members/[userId]/route';
import { activityLine } from '@/components/workspace/activity-words';
import { workspaceActivity } from '@/db/activity';
import { api, SAMPLE } from '@/tests/app/api/v1/workspaces/[workspace]/templates/templates-support';
import { callRoute } from '@/tests/support/call-route';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest({ actingAs: 'owner' });
let uploadDir: string;

beforeEach(() => {
  uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-activity-'));
  process.env.RIMSCALE_UPLOAD_DIR = uploadDir;
});
afterEach(() => {
  delete process.env.RIMSCALE_UPLOAD_DIR;
  fs.rmSync(uploadDir, { recursive: true, force: true });
});

async function lines() {
  return (await workspaceActivity(world.shop.id)).map((record) => activityLine(record, world.shop.slug, 'en-GB'));
}

describe('workspace activity in words', () => {
  it('says who made whom what, and who removed whom, never JSON', async () => {
    const changed = await callRoute(roleRoute, {
      method: 'PATCH',
      params: { workspace: world.shop.slug, userId: String(world.users.viewer.id) },
      body: { role: 'technician' },
    });
    expect(changed.status).toBe(200);
    await callRoute(removeRoute, { method: 'DELETE', params: { workspace: world.shop.slug, userId: String(world.users.technician.id) } });
    const texts = (await lines()).map((line) => line.text);
    expect(texts).toEqual([
      'World owner removed World technician from the workspace',
      'World owner made World viewer a technician (was viewer)',
    ]);
    for (const text of texts) expect(text).not.toMatch(/[{}]/);
  });

  it('covers template creation, edits with old → new values, archiving, imports, photos and deletion, newest first', async () => {
    actAs(world.users.technician.id);
    const created = (await (await api.create(world.shop.slug, SAMPLE)).json()).template;
    await api.patch(world.shop.slug, created.id, { version: 1, staticAdvanceDeg: 18 });
    await api.archive(world.shop.slug, created.id, { version: 2, archived: true });
    const photoBytes = await sharp({ create: { width: 20, height: 10, channels: 3, background: '#808080' } }).png().toBuffer();
    const uploaded = await (await api.upload(world.shop.slug, created.id, new Blob([new Uint8Array(photoBytes)], { type: 'image/png' }), 'p.png')).json();
    await api.deletePhoto(world.shop.slug, created.id, uploaded.photo.id);
    const imported = await api.importCsv(world.shop.slug, 'name,rim_diameter_mm\nCoastline 125,128\nHarbour 80,110\n');
    expect(imported.status).toBe(201);
    actAs(world.users.owner.id);
    await api.delete(world.shop.slug, created.id);

    const all = await lines();
    const texts = all.map((line) => line.text);
    expect(texts).toContain('World owner deleted the template Test single 50');
    expect(texts).toContain('World technician imported 2 new templates from a CSV file');
    expect(texts).toContain('World technician added a photo to Test single 50');
    expect(texts).toContain('World technician deleted a photo of Test single 50');
    expect(texts.indexOf('World owner deleted the template Test single 50')).toBeLessThan(texts.indexOf('World technician added a photo to Test single 50'));
    expect(all.filter((line) => line.group === 'photos')).toHaveLength(2);
    expect(all.filter((line) => line.group === 'members')).toHaveLength(0);
  });

  it('writes an edit as field: old → new, in the unit of the field', async () => {
    actAs(world.users.technician.id);
    const created = (await (await api.create(world.shop.slug, { ...SAMPLE, name: 'Coastline 125' })).json()).template;
    await api.patch(world.shop.slug, created.id, { version: 1, staticAdvanceDeg: 18 });
    await api.archive(world.shop.slug, created.id, { version: 2, archived: true });
    const texts = (await lines()).map((line) => line.text);
    expect(texts).toEqual([
      'World technician archived Coastline 125',
      'World technician edited Coastline 125: static advance 17° BTDC → 18° BTDC',
      'World technician created Coastline 125',
    ]);
  });
});

describe('build records in the activity', () => {
  it('says who opened and who edited which record, old → new, and links to it', () => {
    const base = { source: 'build-revision' as const, at: '2026-12-03T08:00:00.000Z', actorName: 'Teo Lindqvist', buildId: 7, buildName: 'Jo Harker, 125 scooter' };
    const opened = activityLine({ ...base, id: 1, action: 'create', changes: [] }, 'harbour-lane', 'en-GB');
    expect(opened).toMatchObject({ group: 'builds', text: 'Teo Lindqvist opened the build record Jo Harker, 125 scooter', href: '/w/harbour-lane/builds/7' });
    const edited = activityLine({ ...base, id: 2, action: 'update', changes: [{ field: 'customerPhone', from: '', to: '0400 000' }] }, 'harbour-lane', 'en-GB');
    expect(edited.text).toBe('Teo Lindqvist edited the build record Jo Harker, 125 scooter: customer phone — → 0400 000');
  });

  it('writes changed figures in the reader’s locale (de-DE: decimal comma, CLDR via Node’s Intl)', () => {
    const base = { source: 'build-revision' as const, at: '2026-12-03T08:00:00.000Z', actorName: 'Teo Lindqvist', buildId: 7, buildName: 'Jo Harker, 125 scooter' };
    const edited = activityLine({ ...base, id: 3, action: 'update', changes: [{ field: 'squishMm', from: 1.2, to: 0.95 }] }, 'harbour-lane', 'de-DE');
    expect(edited.text).toBe('Teo Lindqvist edited the build record Jo Harker, 125 scooter: squish clearance 1,2 → 0,95');
  });
});
