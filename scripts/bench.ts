// One run, every figure the README records:
//   (a) the selection engine on 500 motors against the sizing functions alone (scripts/bench-engine.ts);
//   (b) bill-of-materials build and .xlsx export of a 200-motor job (scripts/bench-bom.ts);
//   (c) GET /api/panels/:panelId at 50 concurrent signed-in clients: autocannon against the real server
//       (its own process) and PostgreSQL on loopback, 10 s after a 2 s warm-up;
//   (d) the SQL queries of one panel's data (panelDetail) for 10 and 200 motors.
// (a) and (b) run as child processes, one after the other, before the database work starts.
//   npm run -s bench
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { AddressInfo } from 'node:net';
import pg from 'pg';

const root = path.resolve(import.meta.dirname, '..');
const PANEL_MOTORS = [10, 200];
const CLIENTS = 50;
const DURATION_S = 10;
const WARMUP_S = 2;
const BUDGET = { queries: 5, p95Ms: 50 };

/** The part of autocannon used here (the package ships no type declarations). */
interface Cannon extends PromiseLike<{ requests: { total: number }; duration: number; non2xx: number; errors: number; timeouts: number }> {
  on(event: 'response', fn: (client: unknown, status: number, bytes: number, responseTime: number) => void): void;
}
type CannonRequest = { method: string; path: string; headers?: Record<string, string> };
type AutocannonFn = (opts: {
  url: string;
  connections: number;
  duration: number;
  requests: Array<{ method: string; path: string; setupRequest: (req: CannonRequest, context: Record<string, unknown>) => CannonRequest }>;
}) => Cannon;
const moduleName = 'autocannon';

function tsx(script: string): { out: string; ok: boolean } {
  const r = spawnSync(process.execPath, [...process.execArgv, path.join(root, 'scripts', script)], {
    cwd: root,
    encoding: 'utf8',
    env: { ...process.env, PW_QUIET: '1' },
  });
  return { out: `${r.stdout}${r.stderr}`, ok: r.status === 0 };
}

const num = (out: string, re: RegExp): number | null => {
  const m = re.exec(out);
  return m ? Number(m[1]) : null;
};

// ---- the server process of (c) -----------------------------------------------------------------
async function serve(url: string) {
  const { connectDatabase } = await import('../server/db/sequelize');
  const { createApp } = await import('../server/app');
  const { changeFeed } = await import('../server/db/change-feed');
  connectDatabase(url, { poolMax: 20 });
  // every statement this server sends (sessions, people, panels), read by the bench over IPC
  let statements = 0;
  const proto: { query: (...a: unknown[]) => unknown } = pg.Client.prototype;
  const query = proto.query;
  proto.query = function (this: unknown, ...args: unknown[]) {
    statements++;
    return query.apply(this, args);
  };
  process.on('message', (m) => {
    if (m === 'statements') process.send?.({ statements });
  });
  void changeFeed().start(url);
  const app = createApp({ databaseUrl: url, sessionSecret: 'bench-session-secret-not-for-use' });
  const server = app.listen(0, '127.0.0.1', () => console.log(`PORT ${(server.address() as AddressInfo).port}`));
  process.on('SIGTERM', () => {
    server.close(() => process.exit(0));
    server.closeAllConnections();
  });
}

// ---- (c) -----------------------------------------------------------------------------------------
async function signedInCookies(base: string, email: string, password: string, n: number): Promise<string[]> {
  const cookies: string[] = [];
  for (let i = 0; i < n; i++) {
    const first = await fetch(`${base}/api/auth/csrf`);
    const anon = first.headers
      .getSetCookie()
      .find((c) => c.startsWith('pw.sid='))!
      .split(';')[0]!;
    const { token } = (await first.json()) as { token: string };
    const r = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-csrf-token': token, cookie: anon },
      body: JSON.stringify({ email, password }),
    });
    if (r.status !== 200) throw new Error(`bench sign-in ${i} failed: ${r.status} ${await r.text()}`);
    cookies.push(
      r.headers
        .getSetCookie()
        .find((c) => c.startsWith('pw.sid='))!
        .split(';')[0]!,
    );
  }
  return cookies;
}

function percentile(sorted: Float64Array, p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))]!;
}

async function load(base: string, urlPath: string, cookies: string[], seconds: number) {
  const times: number[] = [];
  let next = 0;
  const autocannon = ((await import(moduleName)) as { default: AutocannonFn }).default;
  const instance = autocannon({
    url: base,
    connections: CLIENTS,
    duration: seconds,
    // one signed-in session per connection: the context lives as long as the connection's client
    requests: [
      {
        method: 'GET',
        path: urlPath,
        setupRequest: (req, context) => {
          const ctx = context as { cookie?: string };
          ctx.cookie ??= cookies[next++ % cookies.length];
          // as a browser sends it: with its session cookie and accepting gzip
          return { ...req, headers: { ...req.headers, cookie: ctx.cookie!, 'accept-encoding': 'gzip' } };
        },
      },
    ],
  });
  instance.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime));
  const result = await instance;
  const sorted = Float64Array.from(times).sort();
  return {
    requests: result.requests.total,
    perSecond: result.requests.total / result.duration,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    p99: percentile(sorted, 99),
    non2xx: result.non2xx,
    errors: result.errors + result.timeouts,
  };
}

// ---- (d) -----------------------------------------------------------------------------------------
/** Counts the statements the pg driver sends while fn runs (connection set-up left out). */
async function countQueries<T>(fn: () => Promise<T>): Promise<{ count: number; value: T; texts: string[] }> {
  const proto: { query: (...args: unknown[]) => unknown } = pg.Client.prototype;
  const original = proto.query;
  const texts: string[] = [];
  proto.query = function (this: unknown, ...args: unknown[]) {
    const q = args[0] as string | { text?: string };
    const text = (typeof q === 'string' ? q : (q?.text ?? '')).replace(/\s+/g, ' ').slice(0, 140);
    // a new pool connection's own set-up (SET client_min_messages …, type lookups) is not a query of the panel
    if (!/^SET |pg_type/i.test(text)) texts.push(text);
    return original.apply(this, args);
  };
  try {
    const value = await fn();
    return { count: texts.length, value, texts };
  } finally {
    proto.query = original;
  }
}

async function main() {
  if (process.argv[2] === '--serve') return serve(process.argv[3]!);
  const started = new Date();

  console.log('(a) selection engine …');
  const engine = tsx('bench-engine.ts');
  console.log('(b) bill of materials …');
  const bomScript = fs.existsSync(path.join(root, 'scripts', 'bench-bom.ts'));
  const bom = bomScript ? tsx('bench-bom.ts') : { out: 'scripts/bench-bom.ts is missing', ok: false };
  console.log('(b2) drawings …');
  const drawings = tsx('bench-drawings.ts');

  console.log('(c, d) database, server and load …');
  const { acquireCluster, releaseCluster, createDatabase, dropDatabase, serverUrl } = await import('./postgres');
  const { prepareDatabase } = await import('../server/boot');
  const { closeDatabase } = await import('../server/db/sequelize');
  const { Organisation } = await import('../server/db/models/organisation');
  const { Job } = await import('../server/db/models/job');
  const { Panel } = await import('../server/db/models/panel');
  const { Load } = await import('../server/db/models/load');
  const { DEMO_ORGANISATION, DEMO_USERS } = await import('../server/db/seeders/demo');
  const { DEMO_MOTORS } = await import('../server/db/seeders/demo-panels');
  const { selectAll } = await import('../server/modules/selection/service');
  const { panelDetail } = await import('../server/modules/panels/service');
  const { findUserById } = await import('../server/modules/users/repository');

  process.env.PW_QUIET = '1';
  // a cluster the bench had to start is stopped when it is done, as npm test does (PW_KEEP_DB=1 keeps it)
  const admin = await acquireCluster();
  const name = `pw_bench_${process.pid}`;
  await createDatabase(admin, name, { dropFirst: true });
  const url = serverUrl(name);
  let child: ReturnType<typeof spawn> | null = null;
  try {
    await prepareDatabase(url, { seed: true });
    const org = (await Organisation.findOne({ where: { name: DEMO_ORGANISATION } }))!;
    const job = await Job.create({ organisationId: org.id, number: 'J-BENCH', name: 'Benchmark job', archivedAt: null, createdBy: null });
    const panelIds: Record<number, number> = {};
    for (const n of PANEL_MOTORS) {
      const answers = Array.from({ length: n }, (_, i) => ({
        ...DEMO_MOTORS[i % DEMO_MOTORS.length]!,
        tag: `${DEMO_MOTORS[i % DEMO_MOTORS.length]!.tag}-${i + 1}`,
      }));
      const out = await selectAll(job, answers);
      const panel = await Panel.create({
        organisationId: org.id,
        jobId: job.id,
        name: `Bench ${n} motors`,
        revisionNumber: null,
        archivedAt: null,
        rollup: out ? out.panel : null,
        submittedAt: null,
      });
      await Load.bulkCreate(
        answers.map((a, i) => ({
          organisationId: org.id,
          panelId: panel.id,
          tag: a.tag,
          position: i + 1,
          answers: a,
          selection: out!.results[i],
          overrides: [],
        })),
      );
      panelIds[n] = panel.id;
    }

    // (d)
    const designer = DEMO_USERS.find((u) => u.roles[0] === 'designer')!;
    const u = (await findUserById(
      (await (await import('../server/db/models/user')).User.findOne({ where: { email: designer.email } }))!.id,
    ))!;
    const actor = {
      id: u.id,
      organisationId: u.organisationId,
      organisationName: u.organisationName,
      email: u.email,
      name: u.name,
      roles: u.roles as never,
    };
    const queries: Record<number, number> = {};
    for (const n of PANEL_MOTORS) {
      await panelDetail(actor, panelIds[n]!); // warm the pool: a first connection is not a query of the panel
      const { count, value, texts } = await countQueries(() => panelDetail(actor, panelIds[n]!));
      if (process.env.PW_BENCH_SQL === '1') console.log(`queries for ${n} motors:\n  ${texts.join('\n  ')}`);
      if (value.loads.length !== n) throw new Error(`panel of ${n} motors came back with ${value.loads.length}`);
      queries[n] = count;
    }
    await closeDatabase();

    // (c)
    // PW_BENCH_PROFILE=<dir> writes a CPU profile of the server process there
    const profile = process.env.PW_BENCH_PROFILE ? ['--cpu-prof', `--cpu-prof-dir=${process.env.PW_BENCH_PROFILE}`] : [];
    child = spawn(process.execPath, [...profile, ...process.execArgv, import.meta.filename, '--serve', url], {
      cwd: root,
      env: { ...process.env, NODE_ENV: 'production', PW_QUIET: '1', PW_SIGNIN_LIMIT: '1000' },
      stdio: ['ignore', 'pipe', 'inherit', 'ipc'],
    });
    const statements = () =>
      new Promise<number>((resolve) => {
        child!.once('message', (m) => resolve((m as { statements: number }).statements));
        child!.send('statements');
      });
    const port = await new Promise<number>((resolve, reject) => {
      let buf = '';
      child!.stdout!.on('data', (d: Buffer) => {
        buf += d.toString();
        const m = /PORT (\d+)/.exec(buf);
        if (m) resolve(Number(m[1]));
      });
      child!.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
    });
    const base = `http://127.0.0.1:${port}`;
    const cookies = await signedInCookies(base, designer.email, designer.password, CLIENTS);
    const urlPath = `/api/panels/${panelIds[10]}`;
    const check = await fetch(`${base}${urlPath}`, { headers: { cookie: cookies[0]! } });
    const body = (await check.json()) as { loads?: unknown[] };
    if (check.status !== 200 || body.loads?.length !== 10) throw new Error(`GET ${urlPath} answered ${check.status}`);
    await load(base, urlPath, cookies, WARMUP_S);
    const sqlBefore = await statements();
    const api = await load(base, urlPath, cookies, DURATION_S);
    const sqlPerRequest = ((await statements()) - sqlBefore) / api.requests;

    // ---- the table ----
    const e = {
      engine: num(engine.out, /selectPanel, 500 motors.*?median ([\d.]+) ms/),
      sizing: num(engine.out, /sizing functions alone.*?median ([\d.]+) ms/),
      ratio: num(engine.out, /ratio engine \/ sizing alone: ([\d.]+)x/),
    };
    const b = {
      build: num(bom.out, /build:\s+median ([\d.]+) ms/),
      xlsx: num(bom.out, /\.xlsx:\s+median ([\d.]+) ms/),
      kb: num(bom.out, /\.xlsx:.*?, (\d+) kB/),
      lines: num(bom.out, /lines: (\d+)/),
    };
    const dr = {
      job: num(drawings.out, /drawings, 200-motor job.*?median ([\d.]+) ms/),
      bucket: num(drawings.out, /one bucket's schematic SVG.*?median ([\d.]+) ms/),
      layout: num(drawings.out, /backplate layouts.*?median ([\d.]+) ms/),
    };
    const maxQueries = Math.max(...Object.values(queries));
    const rows: Array<[string, string, string]> = [
      ['Selection engine, 500 motors (rules + sizing + roll-up)', e.engine === null ? 'n/a' : `${e.engine.toFixed(1)} ms`, ''],
      ['Sizing functions alone, same 500 motors', e.sizing === null ? 'n/a' : `${e.sizing.toFixed(1)} ms`, ''],
      ['Ratio engine / sizing alone', e.ratio === null ? 'n/a' : `${e.ratio.toFixed(1)}×`, ''],
      [
        `Bill of materials build, 200 motors (${b.lines ?? '?'} lines)`,
        b.build === null ? 'n/a' : `${b.build.toFixed(1)} ms`,
        b.build === null ? '' : b.build < 1000 ? '< 1000 ms: met' : '< 1000 ms: NOT met',
      ],
      [
        'Bill of materials .xlsx export, 200 motors',
        b.xlsx === null ? 'n/a' : `${b.xlsx.toFixed(1)} ms (${b.kb} kB)`,
        b.xlsx === null ? '' : b.xlsx < 2000 ? '< 2000 ms: met' : '< 2000 ms: NOT met',
      ],
      [
        'Drawings, 200-motor job (all panels, all sheets, backplate layout, terminal plan, wire list)',
        dr.job === null ? 'n/a' : `${dr.job.toFixed(0)} ms`,
        dr.job === null ? '' : dr.job < 1000 ? '< 1000 ms: met' : '< 1000 ms: NOT met',
      ],
      ['  of which the backplate layouts (placed and drawn)', dr.layout === null ? 'n/a' : `${dr.layout.toFixed(1)} ms`, ''],
      [
        'One bucket’s schematic SVG',
        dr.bucket === null ? 'n/a' : `${dr.bucket.toFixed(2)} ms`,
        dr.bucket === null ? '' : dr.bucket < 20 ? '< 20 ms: met' : '< 20 ms: NOT met',
      ],
      [`GET /api/panels/:panelId (10 motors), ${CLIENTS} clients, ${DURATION_S} s: p50`, `${api.p50.toFixed(1)} ms`, ''],
      ['  p95', `${api.p95.toFixed(1)} ms`, api.p95 < BUDGET.p95Ms ? `< ${BUDGET.p95Ms} ms: met` : `< ${BUDGET.p95Ms} ms: NOT met`],
      ['  p99', `${api.p99.toFixed(1)} ms`, ''],
      [
        '  throughput',
        `${api.perSecond.toFixed(0)} requests/s (${api.requests} requests, ${api.non2xx} non-2xx, ${api.errors} errors)`,
        '',
      ],
      ['  SQL statements per request, whole server (session, person, panel)', sqlPerRequest.toFixed(3), ''],
      ...PANEL_MOTORS.map((n): [string, string, string] => [
        `SQL queries, panel data, ${n} motors`,
        String(queries[n]),
        queries[n]! <= BUDGET.queries ? `≤ ${BUDGET.queries}: met` : `≤ ${BUDGET.queries}: NOT met`,
      ]),
    ];
    const w0 = Math.max(...rows.map((r) => r[0].length));
    const w1 = Math.max(...rows.map((r) => r[1].length));
    const cpu = os.cpus();
    console.log('');
    console.log(
      `Panelwright bench, ${started.toISOString().slice(0, 10)}, ${cpu.length} × ${cpu[0]?.model.trim() ?? 'CPU'}, ${(os.totalmem() / 2 ** 30).toFixed(1)} GB RAM, Node ${process.version}, ${os.platform()} ${os.release()}`,
    );
    console.log('');
    console.log(`| ${'Measure'.padEnd(w0)} | ${'Figure'.padEnd(w1)} | Budget |`);
    console.log(`| ${'-'.repeat(w0)} | ${'-'.repeat(w1)} | ------ |`);
    for (const [a, f, bud] of rows) console.log(`| ${a.padEnd(w0)} | ${f.padEnd(w1)} | ${bud} |`);
    console.log('');
    console.log("SQL queries, panel data: one panelDetail call (the panel page's data built from the database), counted at");
    console.log("the pg driver; a newly opened pool connection's set-up is left out. PW_BENCH_SQL=1 lists the statements.");
    console.log('SQL statements per request: everything the server process sent during the measured run, divided by the');
    console.log('requests; repeated reads are answered from per-process caches kept current by the change feed.');
    console.log(
      `Load: autocannon in this process, the server in a child process (NODE_ENV=production), PostgreSQL on 127.0.0.1; one signed-in session per connection; ${WARMUP_S} s warm-up not counted.`,
    );
    if (!engine.ok) console.log(`\nbench-engine failed:\n${engine.out}`);
    if (!bom.ok) console.log(`\nbench-bom failed:\n${bom.out}`);
    if (!drawings.ok) console.log(`\nbench-drawings failed:\n${drawings.out}`);
    const failed = api.p95 >= BUDGET.p95Ms || maxQueries > BUDGET.queries || api.non2xx > 0 || !engine.ok || !bom.ok || !drawings.ok;
    if (failed) process.exitCode = 1;
  } finally {
    if (child && child.exitCode === null) {
      const exited = new Promise((r) => child!.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    }
    await closeDatabase();
    await dropDatabase(admin, name).catch(() => undefined);
    releaseCluster();
  }
}

main().catch((err) => {
  console.error(err instanceof Error ? (err.stack ?? err.message) : err);
  process.exit(1);
});
