// `npm start` leaves no database running behind it: stopped with SIGTERM, it stops the PostgreSQL it
// had to start, and leaves alone one that was running before (started with `npm run db`). Runs the
// real scripts/start.ts (without the client build) on a data folder of its own (PW_DATA_DIR), so the
// checkout's own cluster, which other tests use, is never touched.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { stopsClusterWhenDone } from '../../scripts/postgres';

const root = path.resolve(import.meta.dirname, '..', '..');
const hasPostgres =
  fs.existsSync('/usr/lib/postgresql') &&
  fs.readdirSync('/usr/lib/postgresql').some((v) => fs.existsSync(`/usr/lib/postgresql/${v}/bin/pg_ctl`));

let dataDir = '';
let env: NodeJS.ProcessEnv = {};

async function freePort(): Promise<number> {
  const probe = net.createServer();
  await new Promise<void>((resolve) => probe.listen(0, '127.0.0.1', () => resolve()));
  const port = (probe.address() as net.AddressInfo).port;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}

function tsx(script: string, args: string[] = []): ChildProcess {
  return spawn(process.execPath, ['--import', 'tsx', path.join(root, script), ...args], {
    cwd: root,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
}

/** Runs a script to its end; its output. */
async function run(script: string, args: string[] = []): Promise<{ code: number | null; out: string }> {
  const child = tsx(script, args);
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const code = await new Promise<number | null>((resolve) => child.once('exit', resolve));
  return { code, out };
}

/** `npm start` up to "Panelwright is running", then SIGTERM; resolves with its exit code and output. */
async function startThenTerminate(): Promise<{ code: number | null; out: string; postmasterWhileRunning: number }> {
  const child = tsx('scripts/start.ts');
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const exited = new Promise<number | null>((resolve) => child.once('exit', resolve));
  const started = Date.now();
  while (!out.includes('Panelwright is running at')) {
    if (child.exitCode !== null) throw new Error(`npm start ended early (${child.exitCode}):\n${out}`);
    if (Date.now() - started > 90_000) {
      child.kill('SIGKILL');
      throw new Error(`npm start did not come up within 90 s:\n${out}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  const postmasterWhileRunning = postmasterPid();
  child.kill('SIGTERM');
  return { code: await exited, out, postmasterWhileRunning };
}

function clusterDir(): string {
  return fs.realpathSync(path.join(dataDir, 'pg'));
}

/** The postmaster's pid from its pid file, or 0 when there is none. */
function postmasterPid(): number {
  const file = path.join(clusterDir(), 'postmaster.pid');
  return fs.existsSync(file) ? Number(fs.readFileSync(file, 'utf8').split('\n')[0]) : 0;
}

function alive(pid: number): boolean {
  if (!pid) return false;
  try {
    process.kill(pid, 0);
  } catch {
    return false;
  }
  const stat = fs.existsSync(`/proc/${pid}/stat`) ? fs.readFileSync(`/proc/${pid}/stat`, 'utf8') : '';
  return !/^\d+ \(.*\) Z/.test(stat); // a zombie waiting to be reaped is gone
}

/** Whether the process has gone within a few seconds (the pid file goes first, then the process). */
async function gone(pid: number): Promise<boolean> {
  for (let i = 0; i < 50 && alive(pid); i++) await new Promise((r) => setTimeout(r, 100));
  return !alive(pid);
}

describe.skipIf(!hasPostgres)('the PostgreSQL that npm start uses', () => {
  beforeAll(async () => {
    dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'pw-lifecycle-'));
    fs.chmodSync(dataDir, 0o755); // the postgres user must reach the cluster folder
    env = {
      ...process.env,
      PW_DATA_DIR: dataDir,
      PW_SKIP_BUILD: '1',
      PORT: String(await freePort()),
      PW_SMTP_FAKE_PORT: String(await freePort()),
      NODE_ENV: 'development',
    };
    for (const k of ['DATABASE_URL', 'PW_PG_PORT', 'PW_KEEP_DB', 'PW_DB_NAME', 'PW_QUIET', 'APP_URL']) delete env[k];
  });

  afterAll(() => {
    // whatever happened above, no cluster of this test stays running
    if (!dataDir) return;
    if (fs.existsSync(path.join(dataDir, 'pg')) && postmasterPid()) {
      const bin = fs
        .readdirSync('/usr/lib/postgresql')
        .map((v) => `/usr/lib/postgresql/${v}/bin/pg_ctl`)
        .find((f) => fs.existsSync(f))!;
      const asRoot = process.getuid?.() === 0;
      spawnSync(asRoot ? 'runuser' : bin, [
        ...(asRoot ? ['-u', 'postgres', '--', bin] : []),
        '-D',
        clusterDir(),
        '-m',
        'immediate',
        '-w',
        'stop',
      ]);
    }
    const target = fs.existsSync(path.join(dataDir, 'pg')) ? clusterDir() : null;
    fs.rmSync(dataDir, { recursive: true, force: true });
    if (target && !target.startsWith(dataDir)) fs.rmSync(target, { recursive: true, force: true });
  });

  it('keeps its own cluster only with PW_KEEP_DB=1', () => {
    expect(stopsClusterWhenDone({})).toBe(true);
    expect(stopsClusterWhenDone({ PW_KEEP_DB: '0' })).toBe(true);
    expect(stopsClusterWhenDone({ PW_KEEP_DB: '1' })).toBe(false);
  });

  it('stops the cluster it started when it gets SIGTERM', async () => {
    const r = await startThenTerminate();
    expect(r.postmasterWhileRunning, r.out).toBeGreaterThan(0);
    expect(r.code, r.out).toBe(0);
    expect(r.out).toContain('stopping the PostgreSQL this process started');
    expect(postmasterPid(), r.out).toBe(0);
    expect(await gone(r.postmasterWhileRunning)).toBe(true);
  }, 150_000);

  it('leaves alone a cluster that was running before it', async () => {
    const db = await run('scripts/postgres.ts'); // npm run db
    expect(db.code, db.out).toBe(0);
    const before = postmasterPid();
    expect(alive(before), db.out).toBe(true);
    const r = await startThenTerminate();
    expect(r.code, r.out).toBe(0);
    expect(r.postmasterWhileRunning).toBe(before);
    expect(r.out).not.toContain('stopping the PostgreSQL');
    expect(postmasterPid()).toBe(before);
    expect(alive(before)).toBe(true);
    // npm run db:stop stops it
    const stop = await run('scripts/postgres.ts', ['stop']);
    expect(stop.out).toContain('[postgres] stopped');
    expect(postmasterPid()).toBe(0);
    expect(await gone(before)).toBe(true);
  }, 150_000);
});
