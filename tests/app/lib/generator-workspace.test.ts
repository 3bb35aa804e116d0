import { describe, expect, it, vi } from 'vitest';
import { generatorWorkspaceProfiles } from '@/app/lib/generator-workspace';
import { addProfile, setDefaultProfile } from '@/db/printer-profiles';
import { useAccessWorldPerTest } from '@/tests/support/route-test-hooks';
import { actAs } from '@/tests/support/session';

vi.mock('@/app/lib/session', () => import('@/tests/support/session'));

const world = useAccessWorldPerTest();

describe('the sheet maker’s workspace printer profiles', () => {
  it('offers a signed-in member their workspace’s profiles with its default first chosen; nothing to a visitor or an outsider', async () => {
    const front = await addProfile(world.shop.id, world.users.owner.id, { name: 'Front desk laser', printerScaleX: 0.996, printerScaleY: 1.003 });
    await addProfile(world.shop.id, world.users.owner.id, { name: 'Back office inkjet', printerScaleX: 1.01, printerScaleY: 1 });
    await setDefaultProfile(world.shop.id, Number(front.id));

    actAs(world.users.viewer.id);
    const offered = await generatorWorkspaceProfiles(world.shop.slug);
    expect(offered?.workspaceName).toBe(world.shop.name);
    expect(offered?.profiles.map((p) => p.name)).toEqual(['Back office inkjet', 'Front desk laser']);
    expect(offered?.defaultId).toBe(front.id);

    actAs(world.users.outsider.id);
    expect((await generatorWorkspaceProfiles(world.shop.slug))?.workspaceName).toBe(world.otherShop.name);
    actAs(null);
    expect(await generatorWorkspaceProfiles(world.shop.slug)).toBeNull();
  });
});
