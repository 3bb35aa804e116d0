/**
 * The two-instance check (run through scripts/check-two-instances.sh, which builds, starts
 * PostgreSQL, migrates and seeds): starts the S3 fake and the mail fake, two production
 * servers (`npm start`: scripts/server.mjs over the `next build` output) on the same
 * DATABASE_URL, bucket and session key, and shows through HTTP alone that what one
 * instance writes the other reads. Prints each check; exits 1 on any failure.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { ListObjectsV2Command, S3Client } from '@aws-sdk/client-s3';
import knexFactory from 'knex';
import sharp from 'sharp';
import { postgresConfig } from '../db/config';
import { TABLES } from '../db/tables';
import { startMailFake } from './mail-fake/start-mail-fake';
import { startS3Fake, type S3Fake } from './s3-fake/start-s3-fake';

const WORKSPACE = 'harbour-lane';
const TECHNICIAN = { email: 'tech@harbourlane.test', password: 'harbour-tech-26' };

type Instance = { name: string; url: string; server: ChildProcess };

const failures: string[] = [];
function check(what: string, ok: boolean, detail = ''): void {
  console.log(`${ok ? 'ok  ' : 'FAIL'} ${what}${detail ? ` (${detail})` : ''}`);
  if (!ok) failures.push(what);
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = net.createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as net.AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

async function startInstance(name: string, env: NodeJS.ProcessEnv): Promise<Instance> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  // The production server (`npm start`): the built app as `next start` serves it, plus the socket peer the limits count.
  const server = spawn(process.execPath, [path.join('scripts', 'server.mjs')], {
    env: { ...env, HOST: '127.0.0.1', PORT: String(port), APP_URL: url, NEXTAUTH_URL: url },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (server.exitCode !== null) throw new Error(`${name} exited with code ${server.exitCode}`);
    const health = await fetch(`${url}/api/health`).catch(() => null);
    if (health?.ok) return { name, url, server };
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${name} did not answer /api/health within 60 s`);
}

/** Signs in through next-auth's credentials flow and answers the session cookie. */
async function signIn(instance: Instance): Promise<string> {
  const csrf = await fetch(`${instance.url}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const csrfCookie = csrf.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const answer = await fetch(`${instance.url}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie: csrfCookie },
    body: new URLSearchParams({ csrfToken, ...TECHNICIAN, json: 'true' }),
  });
  const session = answer.headers.getSetCookie().find((c) => c.includes('session-token='));
  if (!session) throw new Error(`sign-in on ${instance.name} gave no session cookie (status ${answer.status})`);
  return session.split(';')[0]!;
}

/** Where the data went: the rows in PostgreSQL, the photo in the bucket, nothing on local disk. */
async function checkSharedServices(templateId: number, s3: S3Fake, localDir: string): Promise<void> {
  const knex = knexFactory(postgresConfig(process.env.DATABASE_URL!));
  try {
    const row = await knex(TABLES.templates).where({ id: templateId }).first();
    check(`the template row is in PostgreSQL at version 2`, row?.version === 2);
    const limits = await knex(TABLES.rateLimits).where('key', 'like', 'reset%').select('key');
    check(`the password-reset counters are rows of rate_limits in PostgreSQL`, limits.length > 0, limits.map((l) => l.key.split(':')[0]).join(', '));
  } finally {
    await knex.destroy();
  }
  const client = new S3Client({
    endpoint: s3.env.S3_ENDPOINT,
    region: s3.env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: s3.env.AWS_ACCESS_KEY_ID, secretAccessKey: s3.env.AWS_SECRET_ACCESS_KEY },
  });
  const listed = await client.send(new ListObjectsV2Command({ Bucket: s3.bucket, Prefix: `templates/${templateId}/` }));
  client.destroy();
  check(`the photo and its thumbnail are objects in the S3 fake's bucket`, listed.Contents?.length === 2, `${listed.Contents?.length ?? 0} object(s)`);
  const local = fs.readdirSync(localDir);
  check(`nothing was written to the instances' local upload folder or SQLite file`, local.length === 0, local.join(', '));
}

async function run(a: Instance, b: Instance): Promise<number> {
  const cookie = await signIn(a);
  const api = (i: Instance, route: string, init: RequestInit = {}) =>
    fetch(`${i.url}/api/v1/workspaces/${WORKSPACE}/templates${route}`, { ...init, headers: { cookie, ...init.headers } });
  const json = (body: unknown): RequestInit => ({ body: JSON.stringify(body), headers: { 'content-type': 'application/json' } });

  const name = `Two-instance check ${crypto.randomBytes(3).toString('hex')}`;
  const created = await api(a, '', { method: 'POST', ...json({ name, boreMm: 40, strokeMm: 39.2, rodMm: 85, rimDiameterMm: 112 }) });
  check(`A saved a template (session cookie from A accepted by A)`, created.status === 201, `status ${created.status}`);
  const { template } = (await created.json()) as { template: { id: number; version: number } };

  const readOnB = await api(b, `/${template.id}`);
  const readBody = readOnB.ok ? ((await readOnB.json()) as { template: { name: string; version: number } }).template : null;
  check(`B read it with A's session cookie: same name, version 1`, readBody?.name === name && readBody.version === 1, `status ${readOnB.status}`);

  const editOnB = await api(b, `/${template.id}`, { method: 'PATCH', ...json({ version: 1, notes: 'edited through B' }) });
  const edited = editOnB.ok ? ((await editOnB.json()) as { template: { version: number } }).template : null;
  check(`B edited it from version 1: now version 2`, edited?.version === 2, `status ${editOnB.status}`);
  const staleOnA = await api(a, `/${template.id}`, { method: 'PATCH', ...json({ version: 1, notes: 'stale edit through A' }) });
  check(`A's edit from the stale version 1 is refused with 409 (the version check holds across instances)`, staleOnA.status === 409, `status ${staleOnA.status}`);
  const afterOnA = (await (await api(a, `/${template.id}`)).json()) as { template: { notes: string; version: number } };
  check(`A reads B's edit`, afterOnA.template.notes === 'edited through B' && afterOnA.template.version === 2);

  const png = await sharp({ create: { width: 120, height: 90, channels: 3, background: { r: 30, g: 120, b: 60 } } }).png().toBuffer();
  const form = new FormData();
  form.set('photo', new Blob([new Uint8Array(png)], { type: 'image/png' }), 'pointer.png');
  const uploaded = await api(a, `/${template.id}/photos`, { method: 'POST', body: form });
  check(`A stored a photo`, uploaded.status === 201, `status ${uploaded.status}`);
  const { photo } = (await uploaded.json()) as { photo: { id: number } };
  const servedByB = await api(b, `/${template.id}/photos/${photo.id}`);
  const servedByA = await api(a, `/${template.id}/photos/${photo.id}`);
  const [bytesB, bytesA] = [Buffer.from(await servedByB.arrayBuffer()), Buffer.from(await servedByA.arrayBuffer())];
  const meta = servedByB.ok ? await sharp(bytesB).metadata() : null;
  check(`B served the photo stored through A: the same bytes, a 120×90 PNG`, servedByB.ok && bytesB.equals(bytesA) && meta?.format === 'png' && meta.width === 120 && meta.height === 90, `status ${servedByB.status}`);

  // Password-reset requests are limited per address; trip the limit on A, then ask B.
  const email = `nobody-${crypto.randomBytes(4).toString('hex')}@example.test`;
  const reset = (i: Instance) =>
    fetch(`${i.url}/api/v1/account/password-reset`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-forwarded-for': '203.0.113.7' }, body: JSON.stringify({ email }) });
  let tripped = 0;
  for (let attempt = 1; attempt <= 50; attempt++) {
    if ((await reset(a)).status === 429) {
      tripped = attempt;
      break;
    }
  }
  check(`A refused password-reset requests with 429 once the limit was used up`, tripped > 0, tripped ? `after ${tripped - 1} accepted` : 'never refused');
  const onB = await reset(b);
  check(`B refuses the same address too (429): the limit holds on the other instance`, onB.status === 429, `status ${onB.status}`);
  return template.id;
}

async function main(): Promise<void> {
  const s3 = await startS3Fake();
  const mail = await startMailFake({ smtpPort: 0, httpPort: 0 });
  console.log(`== S3 fake ${s3.env.S3_ENDPOINT}, bucket ${s3.bucket}; mail fake smtp://127.0.0.1:${mail.smtpPort}`);
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    ...s3.env,
    NODE_ENV: 'production',
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
    SMTP_URL: `smtp://127.0.0.1:${mail.smtpPort}`,
    // One session key for both: a cookie signed by one instance is valid on the other.
    NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET || crypto.randomBytes(32).toString('base64'),
  };
  // Local places that must stay empty: the check fails if an instance falls back to them.
  const localDir = fs.mkdtempSync(path.join(os.tmpdir(), 'rimscale-two-instances-'));
  Object.assign(env, { RIMSCALE_UPLOAD_DIR: path.join(localDir, 'uploads'), RIMSCALE_DB_FILE: path.join(localDir, 'unused.sqlite') });
  const instances: Instance[] = [];
  try {
    instances.push(await startInstance('A', env), await startInstance('B', env));
    console.log(`== instance A ${instances[0]!.url}, instance B ${instances[1]!.url}, both on ${process.env.DATABASE_URL}`);
    const templateId = await run(instances[0]!, instances[1]!);
    await checkSharedServices(templateId, s3, localDir);
  } catch (err) {
    check('the check ran to its end', false, err instanceof Error ? err.message : String(err));
  } finally {
    for (const i of instances) i.server.kill('SIGTERM');
    await mail.stop();
    await s3.stop();
    fs.rmSync(localDir, { recursive: true, force: true });
  }
  console.log(failures.length === 0 ? '== two-instance check passed' : `== two-instance check FAILED: ${failures.length} check(s)`);
  process.exit(failures.length === 0 ? 0 : 1);
}

void main();
