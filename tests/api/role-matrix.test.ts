// Every API route, with every role and signed out: the status proves the server checks the role.
// The route table is the one the app mounts, so a new route is covered without editing this file;
// params are filled from a map that must know every :param (the test fails on an unknown one).
import { beforeAll, describe, expect, it } from 'vitest';
import { anonymous, send, signInAs, testApp, type DemoRole, type Session } from '../setup/api';
import { routeTable, type AnyRoute } from '../../server/http/route-table';
import { paramValues } from '../setup/route-params';

const ROLES: DemoRole[] = ['admin', 'designer', 'estimator', 'engineer'];

function allowed(route: AnyRoute, role: DemoRole | null) {
  if (route.access === 'public') return true;
  if (!role) return false;
  if (route.access === 'signed-in') return true;
  return route.access.includes(role);
}

async function call(s: Session, route: AnyRoute, params: Record<string, string>) {
  const path = route.path.replace(/:(\w+)/g, (_m, name: string) => {
    if (!(name in params)) throw new Error(`role matrix: no value for :${name} in ${route.path}`);
    return params[name];
  });
  if (route.method === 'get') return s.agent.get(path);
  // An empty body: allowed roles get a validation answer, refused ones 401/403 before validation.
  return send(s, route.method, path, {});
}

describe('role matrix', () => {
  let params: Record<string, string>;
  beforeAll(async () => {
    testApp();
    params = await paramValues();
  });

  it('has the routes mounted', () => {
    expect(routeTable.length).toBeGreaterThan(10);
  });

  for (const who of [null, ...ROLES] as Array<DemoRole | null>) {
    it(`answers every route correctly for ${who ?? 'a signed-out visitor'}`, async () => {
      const failures: string[] = [];
      let s = who ? await signInAs(who) : await anonymous();
      for (const route of routeTable) {
        if (route.path === '/api/auth/sign-in' || route.path === '/api/auth/accept-invite') continue; // covered in auth tests
        const r = await call(s, route, params);
        const ok = allowed(route, who);
        const expected = ok ? 'not 401/403' : who ? '403' : '401';
        const good = ok ? r.status !== 401 && r.status !== 403 && r.status < 500 : r.status === (who ? 403 : 401);
        if (!good)
          failures.push(
            `${route.method.toUpperCase()} ${route.path}: ${r.status} (expected ${expected}) ${JSON.stringify(r.body).slice(0, 160)}`,
          );
        if (!ok) expect(r.body.error?.code).toBe(who ? 'forbidden' : 'unauthenticated');
        if (route.path === '/api/auth/sign-out' && who) s = await signInAs(who);
      }
      expect(failures).toEqual([]);
    });
  }

  it('refuses every state-changing route without a CSRF token', async () => {
    const s = await signInAs('admin');
    const failures: string[] = [];
    for (const route of routeTable.filter((r) => r.method !== 'get')) {
      const path = route.path.replace(/:(\w+)/g, (_m, n: string) => params[n]);
      const r = await s.agent[route.method](path).send({});
      if (r.status !== 403 || r.body.error?.code !== 'csrf_failed') failures.push(`${route.method} ${route.path}: ${r.status}`);
    }
    expect(failures).toEqual([]);
  });
});
