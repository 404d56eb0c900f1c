// Helpers for API tests: the app on the run's database, and signed-in supertest agents.
import { inject } from 'vitest';
import request from 'supertest';
import type { Express } from 'express';
import { connectDatabase } from '../../server/db/sequelize';
import { createApp } from '../../server/app';
import { changeFeed } from '../../server/db/change-feed';
import { DEMO_USERS } from '../../server/db/seeders/demo';

let app: Express | null = null;

export function testApp(): Express {
  if (!app) {
    process.env.PW_SIGNIN_LIMIT ??= '1000';
    const url = inject('databaseUrl');
    connectDatabase(url, { poolMax: 10 });
    void changeFeed().start(url);
    app = createApp({ databaseUrl: url, sessionSecret: 'test-secret-for-sessions-only' });
  }
  return app;
}

export type Agent = ReturnType<typeof request.agent>;

export interface Session {
  agent: Agent;
  token: string;
}

export async function anonymous(a: Express = testApp()): Promise<Session> {
  const agent = request.agent(a);
  const r = await agent.get('/api/auth/csrf').expect(200);
  return { agent, token: r.body.token as string };
}

export async function signIn(email: string, password: string, a: Express = testApp()): Promise<Session> {
  const s = await anonymous(a);
  const r = await s.agent.post('/api/auth/sign-in').set('x-csrf-token', s.token).send({ email, password });
  if (r.status !== 200) throw new Error(`sign-in failed for ${email}: ${r.status} ${JSON.stringify(r.body)}`);
  return { agent: s.agent, token: r.body.token as string };
}

export type DemoRole = 'admin' | 'designer' | 'estimator' | 'engineer';

export function demoUser(role: DemoRole) {
  return DEMO_USERS.find((u) => u.roles[0] === role)!;
}

export async function signInAs(role: DemoRole): Promise<Session> {
  const u = demoUser(role);
  return signIn(u.email, u.password);
}

/** A state-changing request with the session's CSRF token. */
export function send(s: Session, method: 'post' | 'patch' | 'put' | 'delete', url: string, body?: unknown) {
  const r = s.agent[method](url).set('x-csrf-token', s.token);
  return body === undefined ? r : r.send(body as object);
}

/**
 * Adds a second make of a catalogue item: the same ratings under a new code, dearer (so the matcher keeps
 * picking the first), for a swap that meets the line's requirement. Returns the new code.
 */
export async function addSecondMake(s: Session, code: string, extraCost = 20): Promise<string> {
  const items = (await s.agent.get(`/api/catalogue/items?q=${encodeURIComponent(code)}&active=all`).expect(200)).body as Array<
    Record<string, unknown> & { code: string }
  >;
  const item = items.find((i) => i.code === code);
  if (!item) throw new Error(`no catalogue item ${code}`);
  const { id: _id, version: _v, updatedAt: _u, ...fields } = item as Record<string, unknown>;
  const second = `${code}-B${Math.floor(Math.random() * 1e6)}`.slice(0, 40);
  await send(s, 'post', '/api/catalogue/items', {
    ...fields,
    code: second,
    description: `${String(item.description)} (second make, test)`.slice(0, 200),
    unitCost: Number(item.unitCost) + extraCost,
    active: true,
  }).expect(201);
  return second;
}

/** A supertest parser that collects a binary answer (a workbook, a PDF, an SVG) into one Buffer. */
export function binary(res: unknown, cb: (err: Error | null, body: Buffer) => void) {
  const stream = res as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
}
