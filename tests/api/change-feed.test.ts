// The change feed and the per-process caches behind it: a repeated read of a panel page by a
// signed-in user costs no SQL, and a change made elsewhere (another server instance, stood in for
// here by a separate database connection) is seen as soon as PostgreSQL announces it; while the
// feed is down every read asks the database, and the feed reconnects by itself.
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, onTestFinished } from 'vitest';
import { inject } from 'vitest';
import pg from 'pg';
import argon2 from 'argon2';
import { anonymous, demoUser, send, signIn, signInAs, testApp, type Session } from '../setup/api';
import { changeFeed, type ChangeKind } from '../../server/db/change-feed';
import { User } from '../../server/db/models/user';
import { Organisation } from '../../server/db/models/organisation';
import { DEMO_ORGANISATION } from '../../server/db/seeders/demo';
import { catalogueFor } from '../../server/modules/catalogue/repository';
import { activeCombinations } from '../../server/modules/catalogue/combinations';

const uniq = () => `CF-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e5)}`;
let other: pg.Client; // "another instance": its own connection, not this process's pools
let designer: Session;
let panelId: number;
let jobId: number;

/** SQL statements this process sends while fn runs (every pool connection is a pg.Client). */
async function queriesDuring(fn: () => Promise<unknown>): Promise<string[]> {
  const proto = pg.Client.prototype as unknown as { query: (...a: unknown[]) => unknown };
  const original = proto.query;
  const seen: string[] = [];
  proto.query = function (this: unknown, ...args: unknown[]) {
    const q = args[0];
    seen.push(typeof q === 'string' ? q : String((q as { text?: string }).text ?? q));
    return original.apply(this, args);
  };
  try {
    await fn();
  } finally {
    proto.query = original;
  }
  return seen;
}

async function until<T>(what: string, probe: () => Promise<T | undefined>, ms = 2000): Promise<{ value: T; after: number }> {
  const started = Date.now();
  for (;;) {
    const value = await probe();
    if (value !== undefined) return { value, after: Date.now() - started };
    if (Date.now() - started > ms) throw new Error(`${what}: not seen within ${ms} ms`);
    await new Promise((r) => setTimeout(r, 10));
  }
}

/** Signs in and returns the session with its id (read from the cookie the sign-in sets). */
async function signInWithSid(email: string, password: string): Promise<{ s: Session; sid: string }> {
  const s = await anonymous();
  const r = await s.agent.post('/api/auth/sign-in').set('x-csrf-token', s.token).send({ email, password }).expect(200);
  const cookie = ([] as string[]).concat(r.headers['set-cookie'] ?? []).find((c) => c.startsWith('pw.sid='))!;
  const raw = decodeURIComponent(cookie.split(';')[0]!.slice('pw.sid='.length)); // s:<sid>.<signature>
  return { s: { agent: s.agent, token: r.body.token as string }, sid: raw.slice(2, raw.lastIndexOf('.')) };
}

/** Reads until one costs no SQL (a notification of an earlier change may still be on its way). */
async function quietRead(s: Session): Promise<string[]> {
  let sql: string[] = [];
  for (let i = 0; i < 10; i++) {
    sql = await queriesDuring(() => getPanel(s).expect(200));
    if (sql.length === 0) break;
  }
  return sql;
}

const getPanel = (s: Session) => s.agent.get(`/api/panels/${panelId}`);

beforeAll(async () => {
  testApp();
  await until('the change feed to listen', async () => (changeFeed().live ? true : undefined), 10_000);
  other = new pg.Client({ connectionString: inject('databaseUrl') });
  await other.connect();
  designer = await signInAs('designer');
  const job = (await send(designer, 'post', '/api/jobs', { number: uniq(), name: 'Clarifier drives', availableFaultKa: 22 }).expect(201))
    .body as { id: number };
  jobId = job.id;
  panelId = ((await send(designer, 'post', `/api/jobs/${job.id}/panels`, { name: 'MCC-C' }).expect(201)).body as { id: number }).id;
});

afterAll(async () => {
  await other?.end();
});

describe('change notifications', () => {
  it('announces a changed panel, job, user and session through PostgreSQL, naming a session only by a digest', async () => {
    const seen: Array<[ChangeKind, string]> = [];
    const off = changeFeed().onChange((k, key) => seen.push([k, key]));
    try {
      const { s, sid } = await signInWithSid(demoUser('engineer').email, demoUser('engineer').password);
      const engineerId = ((await s.agent.get('/api/auth/me').expect(200)).body as { id: number }).id;
      await other.query('update panels set description = $1 where id = $2', ['clarifier drives', panelId]);
      await other.query('update jobs set name = name where id = $1', [jobId]);
      await other.query('update users set last_sign_in_at = now() where id = $1', [engineerId]);
      await other.query('delete from session where sid = $1', [sid]);
      const digest = createHash('md5').update(sid).digest('hex');
      const expected: Array<[ChangeKind, string]> = [
        ['p', String(panelId)],
        ['j', String(jobId)],
        ['u', String(engineerId)],
        ['s', digest],
      ];
      const has = () => expected.every(([k, key]) => seen.some(([k2, key2]) => k2 === k && key2 === key));
      await until('the four notifications', async () => (has() ? true : undefined));
      expect(seen).toEqual(expect.arrayContaining(expected));
      expect(JSON.stringify(seen)).not.toContain(sid);
    } finally {
      off();
    }
  });
});

describe('reads answered from memory', () => {
  it('answers a repeated panel read of a signed-in user with no SQL at all', async () => {
    expect(await quietRead(designer)).toEqual([]);
    const sql = await queriesDuring(async () => {
      expect(((await getPanel(designer).expect(200)).body as { id: number }).id).toBe(panelId);
      await designer.agent.get('/api/auth/me').expect(200);
    });
    expect(sql).toEqual([]);
  });

  it('shows this process’s own change on the very next read, every time, even with notifications running late', async () => {
    // hold every notification back 300 ms: the next read must not depend on its arrival
    const client = (changeFeed() as unknown as { client: { emit: (event: string, ...args: unknown[]) => boolean } }).client;
    const emit = client.emit;
    client.emit = function (this: unknown, event: string, ...args: unknown[]) {
      if (event !== 'notification') return emit.call(this, event, ...args);
      setTimeout(() => emit.call(this, event, ...args), 300);
      return true;
    };
    onTestFinished(() => {
      client.emit = emit;
    });
    for (let i = 0; i < 15; i++) {
      const before = (await getPanel(designer).expect(200)).body as { version: number };
      const name = `MCC-C rev ${i}`;
      await send(designer, 'patch', `/api/panels/${panelId}`, { name, version: before.version }).expect(200);
      const after = (await getPanel(designer).expect(200)).body as { name: string; version: number };
      expect(after).toMatchObject({ name, version: before.version + 1 });
    }
  });
});

describe('a change made by another instance', () => {
  it('shows a renamed panel once PostgreSQL announces it (within 2 s; typically a few ms)', async () => {
    expect(await quietRead(designer)).toEqual([]); // the page is held in memory
    const name = `Renamed elsewhere ${uniq()}`;
    await other.query('update panels set name = $1, version = version + 1, updated_at = now() where id = $2', [name, panelId]);
    const seen = await until('the new name', async () => {
      const b = (await getPanel(designer).expect(200)).body as { name: string };
      return b.name === name ? b : undefined;
    });
    expect(seen.value.name).toBe(name);
  });

  it('ends a session signed out elsewhere', async () => {
    const { s, sid } = await signInWithSid(demoUser('estimator').email, demoUser('estimator').password);
    expect(await quietRead(s)).toEqual([]); // the session is now held in memory
    await other.query('delete from session where sid = $1', [sid]);
    await until('401 after the session is gone', async () => ((await s.agent.get('/api/auth/me')).status === 401 ? true : undefined));
    await getPanel(s).expect(401);
  });

  it('refuses a person deactivated elsewhere', async () => {
    const org = (await Organisation.findOne({ where: { name: DEMO_ORGANISATION } }))!;
    const password = 'feed-test-pass-1';
    const email = `${uniq().toLowerCase()}@copperline.test`;
    const u = await User.create({
      organisationId: org.id,
      email,
      name: 'Ilse Marwood',
      roles: ['designer'],
      passwordHash: await argon2.hash(password),
      inviteToken: null,
      lastSignInAt: null,
    });
    const s = await signIn(email, password);
    expect(await quietRead(s)).toEqual([]); // the person is now held in memory
    await other.query('update users set active = false where id = $1', [u.id]);
    await until('401 for the deactivated person', async () => ((await getPanel(s)).status === 401 ? true : undefined));
  });
});

describe('the catalogue', () => {
  it('is read once and then kept, frozen, until a catalogue statement runs anywhere', async () => {
    const org = (await Organisation.findOne({ where: { name: DEMO_ORGANISATION } }))!;
    let items = await catalogueFor(org.id);
    for (let i = 0; i < 10 && (await queriesDuring(() => catalogueFor(org.id))).length > 0; i++);
    expect(await queriesDuring(async () => (items = await catalogueFor(org.id)))).toEqual([]);
    expect(items.length).toBeGreaterThanOrEqual(758); // the seed catalogue
    expect(Object.isFrozen(items) && Object.isFrozen(items[0]) && Object.isFrozen(items[0]!.ratings)).toBe(true);

    // a price changed by another instance
    const first = items[0]!;
    await other.query('update catalogue_items set unit_cost = unit_cost + 1 where organisation_id = $1 and code = $2', [
      org.id,
      first.code,
    ]);
    const changed = await until('the new price', async () => {
      const now = (await catalogueFor(org.id)).find((c) => c.code === first.code)!;
      return now.unitCost === first.unitCost + 1 ? now : undefined;
    });
    expect(changed.value.unitCost).toBe(first.unitCost + 1);

    // an item added by another instance
    const code = `PW-CF-${uniq()}`;
    await other.query(
      `insert into catalogue_items (organisation_id, code, description, category, unit, ratings, sccr_ka, heat_loss_w, unit_cost, labour_hours, terminations, lead_time_days, active, version, created_at, updated_at)
       select organisation_id, $2, description, category, unit, ratings, sccr_ka, heat_loss_w, unit_cost, labour_hours, terminations, lead_time_days, active, 0, now(), now()
         from catalogue_items where organisation_id = $1 and code = $3`,
      [org.id, code, first.code],
    );
    await until('the new item', async () => ((await catalogueFor(org.id)).some((c) => c.code === code) ? true : undefined));
    await other.query('update catalogue_items set unit_cost = unit_cost - 1 where organisation_id = $1 and code = $2', [
      org.id,
      first.code,
    ]);
    await other.query('delete from catalogue_items where organisation_id = $1 and code = $2', [org.id, code]);
  });

  it('keeps the tested combinations the same way, and drops them when another instance adds one', async () => {
    const org = (await Organisation.findOne({ where: { name: DEMO_ORGANISATION } }))!;
    await activeCombinations(org.id);
    for (let i = 0; i < 10 && (await queriesDuring(() => activeCombinations(org.id))).length > 0; i++);
    expect(await queriesDuring(() => activeCombinations(org.id))).toEqual([]);
    const ref = `CF-${uniq()}`;
    await other.query(
      `insert into combination_ratings (organisation_id, ref, component_codes, rating_ka, max_volts, source, active, version, created_at, updated_at)
       values ($1, $2, '["PW-BR-3P-030", "PW-CN-N1-120"]', 14, 480, 'test data', true, 0, now(), now())`,
      [org.id, ref],
    );
    await until('the new combination', async () => ((await activeCombinations(org.id)).some((c) => c.id === ref) ? true : undefined));
    await other.query('delete from combination_ratings where organisation_id = $1 and ref = $2', [org.id, ref]);
  });
});

describe('when the feed is down', () => {
  it('asks the database on every read, so a change elsewhere shows at once, and listens again by itself', async () => {
    const feed = changeFeed();
    await getPanel(designer).expect(200);
    await other.query(
      `select pg_terminate_backend(pid) from pg_stat_activity where application_name = 'panelwright-change-feed' and datname = current_database()`,
    );
    await until('the feed to notice', async () => (feed.live ? undefined : true));
    // no notification can arrive now: the read itself must find the change
    const name = `Renamed while deaf ${uniq()}`;
    await other.query('update panels set name = $1, version = version + 1, updated_at = now() where id = $2', [name, panelId]);
    expect(((await getPanel(designer).expect(200)).body as { name: string }).name).toBe(name);
    const sql = await queriesDuring(() => getPanel(designer).expect(200));
    expect(sql.length).toBeGreaterThan(0);

    await until('the feed to listen again', async () => (feed.live ? true : undefined), 10_000);
    expect(await quietRead(designer)).toEqual([]);
  });
});

describe('a connection that stops hearing', () => {
  it('is dropped by the heartbeat and replaced, so no cache is served from a deaf feed', async () => {
    const feed = changeFeed();
    feed.setHeartbeat(200, 150);
    // reconnect so that the short heartbeat applies
    await other.query(
      `select pg_terminate_backend(pid) from pg_stat_activity where application_name = 'panelwright-change-feed' and datname = current_database()`,
    );
    await until('the feed to notice', async () => (feed.live ? undefined : true));
    await until('the feed to listen again', async () => (feed.live ? true : undefined), 10_000);
    expect(await quietRead(designer)).toEqual([]);

    // the connection stays open but no notification reaches the process any more
    const client = (feed as unknown as { client: { emit: (event: string, ...args: unknown[]) => boolean } }).client;
    const emit = client.emit;
    client.emit = function (this: unknown, event: string, ...args: unknown[]) {
      return event === 'notification' ? true : emit.call(this, event, ...args);
    };
    await until('the heartbeat to notice', async () => (feed.live ? undefined : true), 3000);
    // the deaf connection is gone: a change made elsewhere shows on the next read
    const name = `Renamed after deafness ${uniq()}`;
    await other.query('update panels set name = $1, version = version + 1, updated_at = now() where id = $2', [name, panelId]);
    expect(((await getPanel(designer).expect(200)).body as { name: string }).name).toBe(name);
    // and a new connection, which hears, takes over
    await until('a new connection that hears', async () => (feed.live ? true : undefined), 10_000);
    expect((feed as unknown as { client: unknown }).client).not.toBe(client);
    expect(await quietRead(designer)).toEqual([]);
    feed.setHeartbeat(15_000, 5_000);
  });
});
