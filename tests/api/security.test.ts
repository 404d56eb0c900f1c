// Abuse cases beyond the role matrix: session fixation, forged cross-site requests, sign-in
// throttling, raising one's own role, reaching into another organisation by id, password rules,
// and secrets kept out of API answers and server logs.
import { afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import request from 'supertest';
import argon2 from 'argon2';
import { inject } from 'vitest';
import { anonymous, demoUser, send, signIn, signInAs, testApp, type Session } from '../setup/api';
import { createApp } from '../../server/app';
import { resetEnvCache } from '../../server/config/env';
import { routeTable } from '../../server/http/route-table';
import { Organisation } from '../../server/db/models/organisation';
import { User } from '../../server/db/models/user';
import { Job } from '../../server/db/models/job';
import { Panel } from '../../server/db/models/panel';
import { Load } from '../../server/db/models/load';
import { Comment } from '../../server/db/models/comment';
import { paramValues } from '../setup/route-params';

function sessionCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith('pw.sid='))?.split(';')[0];
}

/** A second organisation with its own job, panel, motor and comment, made directly with the models. */
async function otherOrganisation() {
  const stamp = Date.now().toString(36);
  const org = await Organisation.create({ name: `Brightwater Controls ${stamp} (fictional)` });
  const password = 'other-org-pass-2024';
  const user = await User.create({
    organisationId: org.id,
    email: `lead.${stamp}@brightwater.test`,
    name: 'Rosa Penhallow',
    roles: ['admin', 'designer'],
    passwordHash: await argon2.hash(password),
    inviteToken: null,
    lastSignInAt: null,
  });
  const job = await Job.create({
    organisationId: org.id,
    number: 'J-2041',
    name: 'Other shop, same job number',
    archivedAt: null,
    createdBy: user.id,
  });
  const panel = await Panel.create({
    organisationId: org.id,
    jobId: job.id,
    name: 'Other MCC',
    revisionNumber: null,
    archivedAt: null,
    rollup: null,
    submittedAt: null,
  });
  const answers = { tag: 'X-1', supply: 'ac3' as const, hp: 10, volts: 460 };
  const load = await Load.create({ organisationId: org.id, panelId: panel.id, tag: 'X-1', answers, selection: null, overrides: [] });
  await Comment.create({
    organisationId: org.id,
    panelId: panel.id,
    loadId: null,
    userId: user.id,
    body: 'Private note of the other shop',
  });
  return { org, user, password, job, panel, load };
}

describe('sessions and cross-site requests', () => {
  beforeAll(() => {
    testApp();
  });

  it('the cookie of the session before sign-in does not carry the signed-in user (fixation)', async () => {
    const app = testApp();
    const agent = request.agent(app);
    const first = await agent.get('/api/auth/csrf').expect(200);
    const planted = sessionCookie(first)!;
    const u = demoUser('designer');
    const res = await agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', first.body.token)
      .send({ email: u.email, password: u.password })
      .expect(200);
    expect(sessionCookie(res)).not.toBe(planted);
    await agent.get('/api/auth/me').expect(200);
    // someone holding the pre-sign-in cookie (planted by an attacker) is not signed in
    const replay = await request(app).get('/api/auth/me').set('cookie', planted);
    expect(replay.status).toBe(401);
    // and the CSRF token changed with the session
    expect(res.body.token).not.toBe(first.body.token);
  });

  it('refuses a CSRF token that belongs to another session', async () => {
    const a = await signInAs('designer');
    const b = await signInAs('admin');
    const r = await a.agent
      .post('/api/jobs')
      .set('x-csrf-token', b.token)
      .send({ number: `X-${Date.now()}`, name: 'Forged' });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('csrf_failed');
  });

  it('refuses a cross-site form post carrying the victim cookie (no token header; token in body or query ignored)', async () => {
    const s = await signInAs('designer');
    const number = `XS-${Date.now()}`;
    const form = await s.agent
      .post('/api/jobs')
      .set('origin', 'https://attacker.invalid')
      .set('referer', 'https://attacker.invalid/page')
      .type('form')
      .send({ number, name: 'Cross-site', _csrf: s.token });
    expect(form.status).toBe(403);
    expect(form.body.error.code).toBe('csrf_failed');
    const inBody = await s.agent.post('/api/jobs').send({ number, name: 'Cross-site', csrfToken: s.token, _csrf: s.token });
    expect(inBody.status).toBe(403);
    const inQuery = await s.agent.post(`/api/jobs?_csrf=${encodeURIComponent(s.token)}`).send({ number, name: 'Cross-site' });
    expect(inQuery.status).toBe(403);
    expect(await Job.count({ where: { number } })).toBe(0);
  });

  it('does not let another site read the CSRF token (no CORS grant)', async () => {
    const r = await request(testApp()).get('/api/auth/csrf').set('origin', 'https://attacker.invalid').expect(200);
    expect(r.headers['access-control-allow-origin']).toBeUndefined();
    expect(r.headers['access-control-allow-credentials']).toBeUndefined();
    const pre = await request(testApp())
      .options('/api/jobs')
      .set('origin', 'https://attacker.invalid')
      .set('access-control-request-method', 'POST');
    expect(pre.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('refuses the old CSRF token and cookie after sign-out', async () => {
    const s = await signInAs('designer');
    await send(s, 'post', '/api/auth/sign-out').expect(204);
    const r = await s.agent
      .post('/api/jobs')
      .set('x-csrf-token', s.token)
      .send({ number: `SO-${Date.now()}`, name: 'After sign-out' });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('csrf_failed');
  });
});

describe('sign-in throttling', () => {
  it('locks one e-mail after repeated failures, even for the right password, without locking others', async () => {
    const prev = process.env.PW_SIGNIN_LIMIT;
    process.env.PW_SIGNIN_LIMIT = '4';
    resetEnvCache();
    try {
      const app = createApp({ databaseUrl: inject('databaseUrl'), sessionSecret: 'throttle-security-secret-1' });
      const s = await anonymous(app);
      const target = demoUser('engineer');
      const statuses: number[] = [];
      for (let i = 0; i < 4; i++)
        statuses.push((await send(s, 'post', '/api/auth/sign-in', { email: target.email, password: `guess-number-${i}` })).status);
      expect(statuses).toEqual([401, 401, 401, 401]);
      const locked = await send(s, 'post', '/api/auth/sign-in', { email: target.email, password: target.password });
      expect(locked.status).toBe(429);
      expect(locked.body.error.code).toBe('too_many_requests');
      expect(locked.headers['ratelimit-policy'] ?? locked.headers.ratelimit).toBeDefined();
      // the same address in another case is the same account: still locked
      expect((await send(s, 'post', '/api/auth/sign-in', { email: target.email.toUpperCase(), password: target.password })).status).toBe(
        429,
      );
      // another person signing in from the same place is not locked out
      const other = demoUser('estimator');
      expect((await send(s, 'post', '/api/auth/sign-in', { email: other.email, password: other.password })).status).toBe(200);
    } finally {
      process.env.PW_SIGNIN_LIMIT = prev;
      resetEnvCache();
    }
  });
});

describe('roles', () => {
  it('refuses every way of raising one’s own role', async () => {
    const designer = await signInAs('designer');
    const me = (await designer.agent.get('/api/auth/me').expect(200)).body;
    // the people routes are the administrator's
    expect((await send(designer, 'patch', `/api/users/${me.id}`, { roles: ['admin'], version: 0 })).status).toBe(403);
    expect(
      (await send(designer, 'post', '/api/users', { email: `sock.${Date.now()}@copperline.test`, name: 'Sock Puppet', roles: ['admin'] }))
        .status,
    ).toBe(403);
    // mass assignment through other routes and the sign-in body is ignored or refused
    const u = demoUser('designer');
    const again = await signIn(u.email, u.password);
    const re = await send(again, 'post', '/api/auth/sign-in', { email: u.email, password: u.password, roles: ['admin'] }).expect(200);
    again.token = re.body.token;
    const raw = await again.agent
      .post('/api/jobs')
      .set('x-csrf-token', again.token)
      .set('content-type', 'application/json')
      .send(`{"number": "PP-${Date.now()}", "name": "Proto", "__proto__": {"roles": ["admin"]}, "roles": ["admin"]}`);
    expect([201, 400]).toContain(raw.status);
    const after = (await again.agent.get('/api/auth/me').expect(200)).body;
    expect(after.roles).toEqual(['designer']);
    expect((await User.findByPk(me.id))!.roles).toEqual(['designer']);
    // an administrator's edit of a person cannot set the hash, the organisation or the invite token
    const admin = await signInAs('admin');
    const list = (await admin.agent.get('/api/users').expect(200)).body as Array<{ id: number; version: number; email: string }>;
    const target = list.find((x) => x.email === u.email)!;
    for (const field of ['passwordHash', 'organisationId', 'inviteToken', 'email']) {
      const r = await send(admin, 'patch', `/api/users/${target.id}`, {
        [field]: field === 'organisationId' ? 999 : 'x',
        version: target.version,
      });
      expect(r.status, field).toBe(400);
      expect(r.body.error.details[0].path, field).toBe('body');
    }
  });

  // A partial PATCH must carry only the fields sent: the update schema must not fill in the
  // creation defaults (mounting, labour rate …), or the estimator's markup change counts as a
  // change of every field and is refused.
  it('lets an estimator change only markup and labour rate on a panel, and keeps the other fields', async () => {
    const p = await paramValues();
    await Panel.update({ mounting: 'row-end', labourRate: 95 }, { where: { id: Number(p.panelId) } });
    const est = await signInAs('estimator');
    const v = (await est.agent.get(`/api/panels/${p.panelId}`).expect(200)).body.version;
    const rename = await send(est, 'patch', `/api/panels/${p.panelId}`, { name: 'Renamed by estimator', version: v });
    expect(rename.status).toBe(403);
    const markup = await send(est, 'patch', `/api/panels/${p.panelId}`, { markupPercent: 22, version: v });
    expect(markup.status, JSON.stringify(markup.body)).toBe(200);
    const stored = (await Panel.findByPk(Number(p.panelId)))!;
    expect([stored.name, stored.mounting, stored.labourRate, stored.markupPercent]).toEqual(['Role matrix panel', 'row-end', 95, 22]);
  });
});

describe('another organisation’s data', () => {
  let other: Awaited<ReturnType<typeof otherOrganisation>>;
  let designer: Session;
  let admin: Session;

  beforeAll(async () => {
    testApp();
    other = await otherOrganisation();
    designer = await signInAs('designer');
    admin = await signInAs('admin');
  });

  it('answers 404 to every read route given the other organisation’s ids', async () => {
    const ids: Record<string, string> = {
      id: String(other.job.id),
      panelId: String(other.panel.id),
      loadId: String(other.load.id),
      userId: String(other.user.id),
      number: '0',
    };
    const leaks: string[] = [];
    for (const route of routeTable.filter((r) => r.method === 'get' && /:(id|panelId|loadId)\b/.test(r.path))) {
      const query = /change-report(\.xlsx)?$/.test(route.path) ? '?from=0&to=0' : '';
      const url = route.path.replace(/:(\w+)/g, (_m, n: string) => ids[n] ?? '1');
      // every route under another shop's id answers 404, even one whose answer does not depend on the row
      // (the motor-list template): a byte comparison with an unknown id's answer is at the mercy of a
      // timestamp inside the file
      const r = await admin.agent.get(`${url}${query}`);
      if (r.status !== 404) leaks.push(`${route.path}: ${r.status} ${JSON.stringify(r.body).slice(0, 120)}`);
      if (JSON.stringify(r.body ?? '').includes('Private note') || JSON.stringify(r.body ?? '').includes('Other MCC'))
        leaks.push(`${route.path}: shows the other organisation's data`);
    }
    expect(leaks).toEqual([]);
    const jobs = (await admin.agent.get('/api/jobs').expect(200)).body as Array<{ id: number }>;
    expect(jobs.map((j) => j.id)).not.toContain(other.job.id);
  });

  it('keeps the other organisation’s panel off our sign-off queue while it waits on theirs', async () => {
    await Panel.update({ status: 'in_review', submittedAt: new Date() }, { where: { id: other.panel.id } });
    try {
      const theirs = await signIn(other.user.email, other.password);
      const theirQueue = (await theirs.agent.get('/api/sign-off-queue').expect(200)).body as Array<{ panelId: number }>;
      expect(theirQueue.map((q) => q.panelId)).toContain(other.panel.id);
      const ours = await admin.agent.get('/api/sign-off-queue').expect(200);
      expect((ours.body as Array<{ panelId: number }>).map((q) => q.panelId)).not.toContain(other.panel.id);
      expect(ours.text).not.toContain('Private note');
    } finally {
      await Panel.update({ status: 'draft', submittedAt: null }, { where: { id: other.panel.id } });
    }
  });

  it('answers 404 for the other organisation’s panel even while that shop’s own reads keep it in memory', async () => {
    const theirs = await signIn(other.user.email, other.password);
    for (let i = 0; i < 3; i++) expect((await theirs.agent.get(`/api/panels/${other.panel.id}`).expect(200)).body.name).toBe('Other MCC');
    const r = await admin.agent.get(`/api/panels/${other.panel.id}`);
    expect(r.status).toBe(404);
    expect(r.text).not.toContain('Other MCC');
  });

  it('refuses to change the other organisation’s job, panel and motor, and changes nothing', async () => {
    const before = JSON.stringify([
      await Job.findByPk(other.job.id),
      await Panel.findByPk(other.panel.id),
      await Load.findByPk(other.load.id),
    ]);
    const attempts: Array<[string, Promise<request.Response>]> = [
      ['patch job', send(designer, 'patch', `/api/jobs/${other.job.id}`, { name: 'Taken over', version: 0 })],
      ['archive job', send(designer, 'post', `/api/jobs/${other.job.id}/archive`, { archived: true, version: 0 })],
      ['new panel in job', send(designer, 'post', `/api/jobs/${other.job.id}/panels`, { name: 'Planted panel' })],
      ['patch panel', send(designer, 'patch', `/api/panels/${other.panel.id}`, { name: 'Taken over', version: 0 })],
      [
        'add motor',
        send(designer, 'post', `/api/panels/${other.panel.id}/loads`, { answers: { tag: 'Z-9', supply: 'ac3', hp: 5, volts: 460 } }),
      ],
      ['duplicate panel', send(designer, 'post', `/api/panels/${other.panel.id}/duplicate`)],
      ['comment', send(designer, 'post', `/api/panels/${other.panel.id}/comments`, { body: 'Planted comment' })],
      [
        'change motor',
        send(designer, 'put', `/api/loads/${other.load.id}`, { answers: { tag: 'X-1', supply: 'ac3', hp: 50, volts: 460 }, version: 0 }),
      ],
      ['copy motor', send(designer, 'post', `/api/loads/${other.load.id}/copy`)],
      ['delete motor', send(designer, 'delete', `/api/loads/${other.load.id}`)],
      ['overrides', send(designer, 'put', `/api/loads/${other.load.id}/overrides`, { overrides: [], version: 0 })],
      ['export', designer.agent.get(`/api/jobs/${other.job.id}/export`)],
    ];
    for (const [name, pending] of attempts) {
      const r = await pending;
      expect(r.status, `${name}: ${JSON.stringify(r.body)}`).toBe(404);
      expect(r.body.error.code, name).toBe('not_found');
    }
    expect(
      JSON.stringify([await Job.findByPk(other.job.id), await Panel.findByPk(other.panel.id), await Load.findByPk(other.load.id)]),
    ).toBe(before);
    expect(await Panel.count({ where: { jobId: other.job.id } })).toBe(1);
    expect(await Comment.count({ where: { panelId: other.panel.id } })).toBe(1);
  });

  it('refuses the other organisation’s motor in a request on one’s own panel', async () => {
    const p = await paramValues();
    const v = (await designer.agent.get(`/api/panels/${p.panelId}`).expect(200)).body.version;
    const bulk = await send(designer, 'post', `/api/panels/${p.panelId}/loads/bulk-edit`, {
      loadIds: [Number(p.loadId), other.load.id],
      changes: { critical: true },
      panelVersion: v,
    });
    expect(bulk.status).toBe(404);
    const comment = await send(designer, 'post', `/api/panels/${p.panelId}/comments`, { body: 'About their motor', loadId: other.load.id });
    expect(comment.status).toBe(400);
    expect(comment.body.error.details[0].path).toBe('body.loadId');
    expect((await Load.findByPk(other.load.id))!.answers).toEqual({ tag: 'X-1', supply: 'ac3', hp: 10, volts: 460 });
  });

  it('keeps the other organisation’s people to themselves', async () => {
    const users = (await admin.agent.get('/api/users').expect(200)).body as Array<{ email: string }>;
    expect(users.map((u) => u.email)).not.toContain(other.user.email);
    const r = await send(admin, 'patch', `/api/users/${other.user.id}`, { roles: ['estimator'], version: 0 });
    expect(r.status).toBe(404);
    expect((await User.findByPk(other.user.id))!.roles).toEqual(['admin', 'designer']);
    // their own sign-in sees only their job J-2041, not the demo one
    const them = await signIn(other.user.email, other.password);
    const jobs = (await them.agent.get('/api/jobs').expect(200)).body as Array<{ id: number; name: string }>;
    expect(jobs.map((j) => j.id)).toEqual([other.job.id]);
  });
});

describe('passwords and secrets', () => {
  const logged: string[] = [];
  function captureLogs() {
    for (const m of ['log', 'info', 'warn', 'error', 'debug'] as const) {
      vi.spyOn(console, m).mockImplementation((...args: unknown[]) => {
        logged.push(
          args.map((a) => (a instanceof Error ? `${a.message} ${a.stack}` : typeof a === 'string' ? a : JSON.stringify(a))).join(' '),
        );
      });
    }
    const write = (stream: NodeJS.WriteStream) =>
      vi.spyOn(stream, 'write').mockImplementation(((chunk: unknown) => {
        logged.push(String(chunk));
        return true;
      }) as never);
    write(process.stdout);
    write(process.stderr);
  }
  afterEach(() => {
    vi.restoreAllMocks();
  });

  it('applies the password rules on accept-invite, and the invitation works once', async () => {
    const admin = await signInAs('admin');
    const email = `rules.${Date.now()}@copperline.test`;
    const created = await send(admin, 'post', '/api/users', { email, name: 'Pia Rules', roles: ['designer'] }).expect(201);
    const token = String(created.body.inviteLink).split('/').pop()!;
    const anon = await anonymous();
    const weak: Array<[string, string]> = [
      ['short1!', 'Use at least 12 characters'],
      ['onlylettersherebutlong', 'Mix letters with digits or symbols'],
      ['123456789012345', 'Mix letters with digits or symbols'],
      [`a1${'b'.repeat(199)}`, 'Use at most 200 characters'],
    ];
    for (const [password, message] of weak) {
      const r = await send(anon, 'post', '/api/auth/accept-invite', { token, password });
      expect(r.status, password).toBe(400);
      expect(r.body.error.details).toContainEqual({ path: 'body.password', message });
    }
    expect((await User.findOne({ where: { email } }))!.passwordHash).toBeNull();
    await send(anon, 'post', '/api/auth/accept-invite', { token, password: 'a-sound-pass-2024' }).expect(200);
    const reuse = await send(anon, 'post', '/api/auth/accept-invite', { token, password: 'another-pass-2025' });
    expect(reuse.status).toBe(404);
    await signIn(email, 'a-sound-pass-2024');
  });

  it('never answers with a password hash or an invite token', async () => {
    const admin = await signInAs('admin');
    await send(admin, 'post', '/api/users', {
      email: `pending.${Date.now()}@copperline.test`,
      name: 'Pending Person',
      roles: ['estimator'],
    }).expect(201);
    const secrets = (await User.findAll()).flatMap((u) => [u.passwordHash, u.inviteToken]).filter((x): x is string => !!x);
    expect(secrets.some((x) => x.startsWith('$argon2'))).toBe(true);
    expect(secrets.length).toBeGreaterThan(4);
    const params = await paramValues();
    const bodies: string[] = [];
    // every read route as the administrator (the development outbox exists to show invitation mail, so it is left out)
    for (const route of routeTable.filter((r) => r.method === 'get' && r.path !== '/api/outbox')) {
      const url = route.path.replace(/:(\w+)/g, (_m, n: string) => params[n] ?? '1');
      const r = await admin.agent.get(`${url}${/change-report(\.xlsx)?$/.test(route.path) ? '?from=0&to=0' : ''}`);
      bodies.push(`${route.path} ${r.text}`);
    }
    expect(bodies.find((b) => b.startsWith('/api/users '))).toBeDefined();
    expect(bodies.find((b) => b.startsWith('/api/auth/me '))).toBeDefined();
    const leaks = bodies.filter(
      (b) => secrets.some((s) => b.includes(s)) || /passwordHash|password_hash|inviteToken|invite_token|\$argon2/.test(b),
    );
    expect(leaks.map((b) => b.slice(0, 80))).toEqual([]);
  });

  it('writes no password, hash or invite token to the server output during failed sign-ins', async () => {
    const secrets = (await User.findAll()).flatMap((u) => [u.passwordHash, u.inviteToken]).filter((x): x is string => !!x);
    const tried = ['Wrong-Password-Canary-731', 'second-canary-pass-9', `${'x'.repeat(150)}canary`];
    const anon = await anonymous();
    captureLogs();
    const designer = demoUser('designer');
    await send(anon, 'post', '/api/auth/sign-in', { email: designer.email, password: tried[0] });
    await send(anon, 'post', '/api/auth/sign-in', { email: 'nobody@copperline.test', password: tried[1] });
    await send(anon, 'post', '/api/auth/sign-in', { email: designer.email, password: tried[2] });
    await send(anon, 'post', '/api/auth/sign-in', { email: 'not-an-email', password: tried[0] });
    await send(anon, 'post', '/api/auth/accept-invite', { token: 'no-such-invitation-token', password: tried[1] });
    await anon.agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', anon.token)
      .set('content-type', 'application/json')
      .send(`{"email": "${designer.email}", "password": "${tried[0]}"`);
    vi.restoreAllMocks();
    const out = logged.join('\n');
    for (const t of tried) expect(out).not.toContain(t);
    for (const s of secrets) expect(out).not.toContain(s);
    expect(out).not.toContain(designer.password);
  });

  it('sends the security headers on API answers and on errors', async () => {
    const app = testApp();
    for (const r of [
      await request(app).get('/api/health'),
      await request(app).get('/api/no-such-route'),
      await request(app).get('/api/jobs'),
    ]) {
      expect(r.headers['x-content-type-options']).toBe('nosniff');
      expect(r.headers['x-frame-options']).toBe('SAMEORIGIN');
      expect(r.headers['content-security-policy']).toContain("frame-ancestors 'none'");
      expect(r.headers['content-security-policy']).toContain("object-src 'none'");
      expect(r.headers['content-security-policy']).toContain("script-src 'self'");
      expect(r.headers['referrer-policy']).toBe('no-referrer');
      expect(r.headers['cross-origin-opener-policy']).toBe('same-origin');
      expect(r.headers['strict-transport-security']).toMatch(/max-age=\d+/);
      expect(r.headers['x-powered-by']).toBeUndefined();
    }
    const notFound = await request(app).get('/api/no-such-route');
    expect(notFound.status).toBe(404);
    expect(notFound.body).toEqual({ error: { code: 'not_found', message: 'No API route GET /api/no-such-route', details: null } });
  });
});

describe('uploads of a motor list', () => {
  beforeAll(() => {
    testApp();
  });

  async function upload(
    s: Session,
    panelId: string,
    step: 'preview' | 'commit',
    data: Buffer,
    filename: string,
    contentType = 'application/octet-stream',
  ) {
    return s.agent
      .post(`/api/panels/${panelId}/import/${step}`)
      .set('x-csrf-token', s.token)
      .attach('file', data, { filename, contentType });
  }

  it('refuses a wrong type, an oversized file and a package that expands to an absurd size, importing nothing', async () => {
    const { MAX_IMPORT_BYTES } = await import('../../server/modules/panels/import');
    const { makeZip } = await import('../unit/bom/zip');
    const p = await paramValues();
    const designer = await signInAs('designer');
    const exe = await upload(designer, p.panelId, 'preview', Buffer.from('MZ\u0090\u0000\u0003 not a motor list'), 'motors.exe');
    expect(exe.status).toBe(415);
    expect(exe.body.error.code).toBe('unsupported_file');
    const binaryCsv = await upload(designer, p.panelId, 'preview', Buffer.from('tag,supply\u0000\u0001\u0002'), 'motors.csv', 'text/csv');
    expect(binaryCsv.status).toBe(415);
    const textAsXlsx = await upload(designer, p.panelId, 'preview', Buffer.from('tag,supply,hp,volts\nA-1,ac3,5,460\n'), 'motors.xlsx');
    expect(textAsXlsx.status).toBe(415);
    const big = await upload(designer, p.panelId, 'commit', Buffer.alloc(MAX_IMPORT_BYTES + 1, 0x41), 'motors.csv', 'text/csv');
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('payload_too_large');
    // a sheet of 64 MB of spaces that deflates to a few dozen kB, its expanded size understated in the headers
    const sheet = Buffer.concat([
      Buffer.from('<?xml version="1.0"?><worksheet xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main"><sheetData>'),
      Buffer.alloc(64 * 1024 * 1024, 0x20),
      Buffer.from('</sheetData></worksheet>'),
    ]);
    const bomb = makeZip([
      {
        name: '[Content_Types].xml',
        data: Buffer.from('<?xml version="1.0"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"/>'),
      },
      { name: 'xl/worksheets/sheet1.xml', data: sheet, declaredSize: 4096 },
    ]);
    expect(bomb.length).toBeLessThan(MAX_IMPORT_BYTES);
    const started = Date.now();
    const r = await upload(designer, p.panelId, 'commit', bomb, 'motors.xlsx');
    expect(r.status).toBeGreaterThanOrEqual(400);
    expect(r.status).toBeLessThan(500);
    expect(Date.now() - started).toBeLessThan(10_000);
    expect(await Load.count({ where: { panelId: Number(p.panelId) } })).toBe(1);
  });

  it('keeps formula text in cells as plain text', async () => {
    const p = await paramValues();
    const designer = await signInAs('designer');
    const formulas = ['=HYPERLINK("http://example.invalid","open")', "+cmd|' /C calc'!A0", '@SUM(1+1)', '-2+3'];
    const csv = ['tag,description,supply,hp,volts', ...formulas.map((f, i) => `FX-${i + 1},"${f.replace(/"/g, '""')}",ac3,5,460`)].join(
      '\n',
    );
    const r = await upload(designer, p.panelId, 'commit', Buffer.from(csv), 'motors.csv', 'text/csv');
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const detail = (await designer.agent.get(`/api/panels/${p.panelId}`).expect(200)).body as {
      loads: Array<{ tag: string; answers: { description?: string } }>;
    };
    const stored = formulas.map((_f, i) => detail.loads.find((l) => l.tag === `FX-${i + 1}`)?.answers.description);
    expect(stored).toEqual(formulas);
  });
});
