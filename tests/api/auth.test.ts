import { describe, expect, it } from 'vitest';
import request from 'supertest';
import { anonymous, demoUser, send, signIn, signInAs, testApp } from '../setup/api';
import { createApp } from '../../server/app';
import { resetEnvCache } from '../../server/config/env';
import { inject } from 'vitest';

function sessionCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith('pw.sid='))?.split(';')[0];
}

describe('sign-in', () => {
  it('signs in the demo designer and answers who is signed in, without any hash', async () => {
    const s = await signInAs('designer');
    const me = await s.agent.get('/api/auth/me').expect(200);
    expect(me.body).toMatchObject({ email: 'designer@copperline.test', roles: ['designer'] });
    expect(JSON.stringify(me.body)).not.toMatch(/argon2|passwordHash|password_hash/);
  });

  it('refuses a wrong password with 401 JSON and the same message as an unknown e-mail', async () => {
    const s = await anonymous();
    const wrong = await send(s, 'post', '/api/auth/sign-in', { email: 'designer@copperline.test', password: 'not-the-password-9' }).expect(
      401,
    );
    const unknown = await send(s, 'post', '/api/auth/sign-in', { email: 'nobody@copperline.test', password: 'not-the-password-9' }).expect(
      401,
    );
    expect(wrong.body.error.code).toBe('unauthenticated');
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
  });

  it('gives a new session id at sign-in (session fixation)', async () => {
    const app = testApp();
    const agent = request.agent(app);
    const first = await agent.get('/api/auth/csrf').expect(200);
    const before = sessionCookie(first);
    expect(before).toBeDefined();
    const u = demoUser('engineer');
    const res = await agent
      .post('/api/auth/sign-in')
      .set('x-csrf-token', first.body.token)
      .send({ email: u.email, password: u.password })
      .expect(200);
    const after = sessionCookie(res);
    expect(after).toBeDefined();
    expect(after).not.toBe(before);
    const raw = (res.headers['set-cookie'] as unknown as string[]).join(';');
    expect(raw).toMatch(/HttpOnly/i);
    expect(raw).toMatch(/SameSite=Lax/i);
  });

  it('refuses a state-changing request without the CSRF token', async () => {
    const s = await signInAs('designer');
    const r = await s.agent.post('/api/jobs').send({ number: 'X-1', name: 'x' }).expect(403);
    expect(r.body.error.code).toBe('csrf_failed');
    const wrong = await s.agent.post('/api/jobs').set('x-csrf-token', 'forged').send({ number: 'X-1', name: 'x' }).expect(403);
    expect(wrong.body.error.code).toBe('csrf_failed');
  });

  it('signs out: the session no longer reaches the API', async () => {
    const s = await signInAs('estimator');
    await send(s, 'post', '/api/auth/sign-out').expect(204);
    await s.agent.get('/api/jobs').expect(401);
  });

  it('throttles repeated failed sign-ins with 429 JSON', async () => {
    const prev = process.env.PW_SIGNIN_LIMIT;
    process.env.PW_SIGNIN_LIMIT = '3';
    resetEnvCache();
    try {
      const app = createApp({ databaseUrl: inject('databaseUrl'), sessionSecret: 'throttle-test-secret-1234' });
      const s = await anonymous(app);
      const statuses: number[] = [];
      for (let i = 0; i < 5; i++) {
        const r = await send(s, 'post', '/api/auth/sign-in', { email: 'admin@copperline.test', password: `wrong-password-${i}` });
        statuses.push(r.status);
        if (r.status === 429) expect(r.body.error.code).toBe('too_many_requests');
      }
      expect(statuses).toEqual([401, 401, 401, 429, 429]);
    } finally {
      process.env.PW_SIGNIN_LIMIT = prev;
      resetEnvCache();
    }
  });

  it('sets helmet security headers', async () => {
    const r = await request(testApp()).get('/api/health').expect(200);
    expect(r.headers['x-content-type-options']).toBe('nosniff');
    expect(r.headers['content-security-policy']).toContain("default-src 'self'");
    expect(r.headers['x-powered-by']).toBeUndefined();
  });
});

describe('people (admin)', () => {
  it('invites a person, who sets a password and signs in with the given role', async () => {
    const admin = await signInAs('admin');
    const email = `new.${Date.now()}@copperline.test`;
    const created = await send(admin, 'post', '/api/users', { email, name: 'Noor Vance', roles: ['estimator'] }).expect(201);
    expect(created.body).toMatchObject({ email, roles: ['estimator'], invited: true });
    expect(JSON.stringify(created.body)).not.toMatch(/passwordHash|password_hash/);
    const token = String(created.body.inviteLink).split('/').pop()!;
    const anon = await anonymous();
    const weak = await send(anon, 'post', '/api/auth/accept-invite', { token, password: 'short' }).expect(400);
    expect(weak.body.error.details[0].path).toBe('body.password');
    await send(anon, 'post', '/api/auth/accept-invite', { token, password: 'a-long-enough-pass-7' }).expect(200);
    const s = await signIn(email, 'a-long-enough-pass-7');
    const me = await s.agent.get('/api/auth/me').expect(200);
    expect(me.body.roles).toEqual(['estimator']);
  });

  it('does not let a user raise their own role', async () => {
    const designer = await signInAs('designer');
    const me = await designer.agent.get('/api/auth/me');
    const r = await send(designer, 'patch', `/api/users/${me.body.id}`, { roles: ['admin'], version: 0 }).expect(403);
    expect(r.body.error.code).toBe('forbidden');
    const again = await designer.agent.get('/api/auth/me');
    expect(again.body.roles).toEqual(['designer']);
  });

  it('deactivating a user ends their access at the next request', async () => {
    const admin = await signInAs('admin');
    const email = `temp.${Date.now()}@copperline.test`;
    const created = await send(admin, 'post', '/api/users', { email, name: 'Temp Person', roles: ['designer'] }).expect(201);
    const token = String(created.body.inviteLink).split('/').pop()!;
    await send(await anonymous(), 'post', '/api/auth/accept-invite', { token, password: 'temporary-pass-42' }).expect(200);
    const s = await signIn(email, 'temporary-pass-42');
    await s.agent.get('/api/jobs').expect(200);
    await send(admin, 'patch', `/api/users/${created.body.id}`, { active: false, version: created.body.version }).expect(200);
    await s.agent.get('/api/jobs').expect(401);
  });

  it('keeps at least one administrator', async () => {
    const admin = await signInAs('admin');
    const me = await admin.agent.get('/api/auth/me');
    const list = await admin.agent.get('/api/users').expect(200);
    const self = list.body.find((u: { id: number }) => u.id === me.body.id);
    const r = await send(admin, 'patch', `/api/users/${me.body.id}`, { roles: ['designer'], version: self.version }).expect(403);
    expect(r.body.error.message).toMatch(/at least one active administrator/);
  });
});
