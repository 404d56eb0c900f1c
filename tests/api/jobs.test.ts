import { describe, expect, it } from 'vitest';
import argon2 from 'argon2';
import { send, signIn, signInAs } from '../setup/api';
import { Organisation } from '../../server/db/models/organisation';
import { User } from '../../server/db/models/user';

const uniq = () => `T-${Date.now().toString(36)}-${Math.floor(Math.random() * 1e6)}`;

describe('jobs', () => {
  it('creates a job with the defaults a panel shop expects and lists it', async () => {
    const s = await signInAs('designer');
    const number = uniq();
    const created = await send(s, 'post', '/api/jobs', { number, name: 'Clarifier drives' }).expect(201);
    expect(created.body).toMatchObject({ number, supplyVolts: 480, supplyPhases: 3, supplyHz: 60, codeEdition: '2023', version: 0 });
    const list = await s.agent.get(`/api/jobs?q=${number}`).expect(200);
    expect(list.body.map((j: { number: string }) => j.number)).toEqual([number]);
    expect(list.body[0]).toMatchObject({ panelCount: 0, motorCount: 0 });
  });

  it('names every bad field in a validation error', async () => {
    const s = await signInAs('designer');
    const r = await send(s, 'post', '/api/jobs', { number: '', name: 'x', supplyVolts: 5000, supplyHz: 55 }).expect(400);
    expect(r.body.error.code).toBe('validation_failed');
    const paths = r.body.error.details.map((d: { path: string }) => d.path).sort();
    expect(paths).toEqual(['body.number', 'body.supplyHz', 'body.supplyVolts']);
    expect(JSON.stringify(r.body)).not.toMatch(/at .*\.ts:\d+/);
  });

  it('refuses a duplicate job number in the organisation', async () => {
    const s = await signInAs('designer');
    const number = uniq();
    await send(s, 'post', '/api/jobs', { number, name: 'A' }).expect(201);
    const r = await send(s, 'post', '/api/jobs', { number, name: 'B' }).expect(400);
    expect(r.body.error.details).toEqual([{ path: 'body.number', message: 'already used' }]);
  });

  it('answers 409 when two people edit the same job (optimistic locking)', async () => {
    const a = await signInAs('designer');
    const b = await signInAs('admin');
    const job = (await send(a, 'post', '/api/jobs', { number: uniq(), name: 'Lock test' }).expect(201)).body;
    await send(a, 'patch', `/api/jobs/${job.id}`, { name: 'First edit', version: job.version }).expect(200);
    const late = await send(b, 'patch', `/api/jobs/${job.id}`, { name: 'Second edit', version: job.version }).expect(409);
    expect(late.body.error.code).toBe('conflict');
    expect(late.body.error.message).toMatch(/Someone else changed this job/);
    const now = await a.agent.get(`/api/jobs/${job.id}`).expect(200);
    expect(now.body.name).toBe('First edit');
  });

  it('archives and restores, and records who did what', async () => {
    const s = await signInAs('designer');
    const job = (await send(s, 'post', '/api/jobs', { number: uniq(), name: 'Archive me' }).expect(201)).body;
    const archived = await send(s, 'post', `/api/jobs/${job.id}/archive`, { archived: true, version: job.version }).expect(200);
    expect(archived.body.archivedAt).not.toBeNull();
    const active = await s.agent.get('/api/jobs').expect(200);
    expect(active.body.some((j: { id: number }) => j.id === job.id)).toBe(false);
    const inArchive = await s.agent.get('/api/jobs?archived=true').expect(200);
    expect(inArchive.body.some((j: { id: number }) => j.id === job.id)).toBe(true);
    const log = await s.agent.get(`/api/jobs/${job.id}/activity`).expect(200);
    expect(log.body.map((a: { action: string }) => a.action)).toEqual(['archived', 'created']);
    expect(log.body[0].user).toBe('Dev Halloran');
  });

  it("never shows another organisation's job, by list or by id", async () => {
    const org = await Organisation.create({ name: 'Other shop (test)' });
    const email = `other.${Date.now()}@other.test`;
    await User.create({
      organisationId: org.id,
      email,
      name: 'Other Designer',
      roles: ['designer'],
      passwordHash: await argon2.hash('other-shop-pass-1'),
      inviteToken: null,
      lastSignInAt: null,
    });
    const other = await signIn(email, 'other-shop-pass-1');
    const mine = await signInAs('designer');
    const job = (await send(mine, 'post', '/api/jobs', { number: uniq(), name: 'Private job' }).expect(201)).body;
    const list = await other.agent.get('/api/jobs').expect(200);
    expect(list.body).toEqual([]);
    const r = await other.agent.get(`/api/jobs/${job.id}`).expect(404);
    expect(r.body.error.code).toBe('not_found');
    await send(other, 'patch', `/api/jobs/${job.id}`, { name: 'hijack', version: 0 }).expect(404);
    const still = await mine.agent.get(`/api/jobs/${job.id}`).expect(200);
    expect(still.body.name).toBe('Private job');
  });
});

describe('error contract', () => {
  it('answers unknown API routes with 404 JSON', async () => {
    const s = await signInAs('designer');
    const r = await s.agent.get('/api/no-such-thing').expect(404);
    expect(r.body).toEqual({ error: { code: 'not_found', message: 'No API route GET /api/no-such-thing', details: null } });
  });

  it('answers malformed JSON with 400 JSON and no stack trace', async () => {
    const s = await signInAs('designer');
    const r = await s.agent
      .post('/api/jobs')
      .set('x-csrf-token', s.token)
      .set('content-type', 'application/json')
      .send('{"number": ')
      .expect(400);
    expect(r.body.error.code).toBe('bad_json');
    expect(r.text).not.toMatch(/node_modules|at .*\(/);
  });
});
