import { afterAll, afterEach, beforeAll, beforeEach } from 'vitest';
import { createAccessWorld, type AccessWorld } from './access-world';
import { useMailFake } from './mail-fake';
import { actAs } from './session';

/**
 * Set-up shared by the route-handler test files. Call these at the top level of a test file;
 * the file must still declare `vi.mock('@/app/lib/session', () => import('@/tests/support/session'))`
 * itself, since vitest hoists mocks only within the file that declares them.
 */

/** The origin mailed links are built on in these tests. */
export const TEST_APP_URL = 'http://rimscale.test';

type FileMail = Awaited<ReturnType<typeof useMailFake>>;

/**
 * The SMTP fake for the whole file, with `APP_URL` set so mailed links can be built.
 * The returned object reads the running fake (only inside hooks and tests).
 */
export function useMailFakeForFile(): Pick<FileMail, 'inbox' | 'smtpPort' | 'httpPort'> {
  let mail: FileMail | undefined;
  const running = (): FileMail => mail ?? fail('the mail fake runs only inside this file’s tests');
  beforeAll(async () => {
    mail = await useMailFake();
    process.env.APP_URL = TEST_APP_URL;
  });
  afterAll(async () => {
    delete process.env.APP_URL;
    await running().stop();
    mail = undefined;
  });
  return {
    inbox: (to) => running().inbox(to),
    get smtpPort() {
      return running().smtpPort;
    },
    get httpPort() {
      return running().httpPort;
    },
  };
}

/**
 * A fresh access world (tests/support/access-world.ts) for every test, signed in as `actingAs`
 * if given; after each test, signed out and cleaned up. The returned object reads the
 * current test's world.
 */
export function useAccessWorldPerTest(options: { actingAs?: keyof AccessWorld['users'] } = {}): Omit<AccessWorld, 'cleanup'> {
  let world: AccessWorld | undefined;
  const current = (): AccessWorld => world ?? fail('the access world exists only inside a test');
  beforeEach(async () => {
    world = await createAccessWorld();
    if (options.actingAs) actAs(world.users[options.actingAs].id);
  });
  afterEach(async () => {
    actAs(null);
    await current().cleanup();
    world = undefined;
  });
  return {
    get knex() {
      return current().knex;
    },
    get shop() {
      return current().shop;
    },
    get otherShop() {
      return current().otherShop;
    },
    get users() {
      return current().users;
    },
  };
}

function fail(message: string): never {
  throw new Error(message);
}
