/**
 * The production server for the load benchmark: a temporary migrated and seeded
 * database, scripts/server.mjs (what `npm start` runs: rate limits see the real TCP
 * peer) on a free port, its resident memory read from /proc.
 * Builds nothing: it serves the build in NEXT_DIST_DIR (default .next).
 */
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { startNodeFlags } from '../../scripts/start-flags.mjs';

export type RunningServer = { baseUrl: string; pid: number; dbFile: string; stop: () => Promise<void> };

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** A temporary folder with a migrated and seeded SQLite database (the knex CLI, as `npm run db:migrate` does). */
export function temporaryDatabase(): { dir: string; dbFile: string } {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'rimscale-load-'));
  const dbFile = path.join(dir, 'load.sqlite');
  const env = { ...process.env, RIMSCALE_DB_FILE: dbFile };
  for (const command of ['migrate:latest', 'seed:run']) execFileSync('bash', ['scripts/db.sh', command], { env, stdio: 'ignore' });
  return { dir, dbFile };
}

export function distDir(): string {
  return process.env.NEXT_DIST_DIR || '.next';
}

export function assertBuilt(): void {
  if (!existsSync(path.join(distDir(), 'BUILD_ID')))
    throw new Error(`no production build in ${distDir()}/: run \`npm run build\` first (the load benchmark builds nothing)`);
}

async function waitUntilUp(baseUrl: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited with code ${child.exitCode}`);
    try {
      const response = await fetch(new URL('/api/health', baseUrl));
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('the server did not answer /api/health within 60 s');
}

/** npm start's node flags, then any extra (BENCH_SERVER_NODE_OPTIONS, e.g. `--cpu-prof --cpu-prof-dir=/tmp/prof` to profile it). */
function serverNodeOptions(): string[] {
  return [...startNodeFlags(), ...(process.env.BENCH_SERVER_NODE_OPTIONS ?? '').split(' ').filter(Boolean)];
}

export async function startServer(dbFile: string, dir: string): Promise<RunningServer> {
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [...serverNodeOptions(), 'scripts/server.mjs'], {
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      RIMSCALE_DB_FILE: dbFile,
      RIMSCALE_UPLOAD_DIR: path.join(dir, 'uploads'),
      NEXTAUTH_SECRET: randomBytes(32).toString('base64'),
      APP_URL: baseUrl,
      SMTP_URL: process.env.SMTP_URL ?? 'smtp://127.0.0.1:9',
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  await waitUntilUp(baseUrl, child);
  const stop = async () => {
    if (child.exitCode !== null) return;
    const exited = new Promise((r) => child.once('exit', r));
    child.kill('SIGTERM');
    await Promise.race([exited, new Promise((r) => setTimeout(r, 5000))]);
    if (child.exitCode === null) child.kill('SIGKILL');
  };
  return { baseUrl, pid: child.pid!, dbFile, stop };
}

export function removeFolder(dir: string): void {
  rmSync(dir, { recursive: true, force: true });
}

function statusKb(pid: number, field: 'VmRSS' | 'VmHWM'): number {
  try {
    const match = new RegExp(`^${field}:\\s+(\\d+) kB`, 'm').exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return match ? Number(match[1]) : 0;
  } catch {
    return 0; // the process has gone
  }
}

/** The server process and any processes it started (worker threads are inside the process). */
function processTree(rootPid: number): number[] {
  const parents = new Map<number, number>();
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
      const ppid = Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]);
      parents.set(Number(entry), ppid);
    } catch {
      // gone meanwhile
    }
  }
  const tree = [rootPid];
  for (let i = 0; i < tree.length; i += 1) for (const [pid, ppid] of parents) if (ppid === tree[i]) tree.push(pid);
  return tree;
}

const MB = 1024; // /proc reports kB (KiB)

/** Resident memory of the server now, MiB. */
export function rssMb(rootPid: number): number {
  return processTree(rootPid).reduce((sum, pid) => sum + statusKb(pid, 'VmRSS'), 0) / MB;
}

/** The kernel's high-water mark of the server's resident memory, MiB. */
export function peakRssMb(rootPid: number): number {
  return processTree(rootPid).reduce((sum, pid) => sum + statusKb(pid, 'VmHWM'), 0) / MB;
}
