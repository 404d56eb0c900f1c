// Property tests: random and malformed bodies posted to every write route of the route table (the one
// the app mounts, so a new route is covered without editing this file). Whatever arrives, the answer
// is a 4xx JSON error { error: { code, message, details } }, never a 500; a validation error names
// exactly the fields the route's own schema names; and nothing is written. Integers the database's
// 32-bit columns cannot hold are refused by the schema in every integer field; no request anywhere in
// this file is answered with a 500.
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import type { z } from 'zod';
import { anonymous, signInAs, testApp, type DemoRole, type Session } from '../setup/api';
import { paramValues } from '../setup/route-params';
import { routeTable, type AnyRoute } from '../../server/http/route-table';
import { db } from '../../server/db/sequelize';
import { LoadSchema } from '../../shared/schemas/load';
import { zodIssues } from '../../shared/errors';
import { INT4_MAX } from '../../shared/schemas/bounds';

const RUNS = 20;
const BODY_LIMIT = 1024 * 1024; // express.json({ limit: '1mb' }) in server/app.ts

/** A JSON tree whose objects are key/value lists, so "__proto__" can be an own key of the text. */
type J = null | boolean | number | string | J[] | { entries: Array<[string, J]> };

function toJson(v: J): string {
  if (v === null || typeof v !== 'object') return JSON.stringify(v) ?? 'null';
  if (Array.isArray(v)) return `[${v.map(toJson).join(',')}]`;
  return `{${v.entries.map(([k, x]) => `${JSON.stringify(k)}:${toJson(x)}`).join(',')}}`;
}

const PROTO_KEYS = ['__proto__', 'constructor', 'prototype'];
const nastyString = fc.constantFrom(
  '',
  ' ',
  'x'.repeat(5000),
  'y'.repeat(120_000),
  '<script>alert(1)</script>',
  "'; drop table jobs; --",
  '=HYPERLINK("http://example.invalid","x")',
  '\u0000\u0007',
  '\ud83d\udd0c plug',
  '../../etc/passwd',
  '2024-13-45T99:00:00Z',
  '1e999',
  'NaN',
);
const scalar: fc.Arbitrary<J> = fc.oneof(
  fc.constant(null),
  fc.boolean(),
  fc.integer({ min: -3_000_000_000, max: 3_000_000_000 }),
  fc.double(),
  fc.constantFrom(-1, 0, 1, 1.5, 1e308, -1e308, 2 ** 53 + 2, 2_147_483_648),
  fc.string({ maxLength: 30 }),
  nastyString,
);
const junk: fc.Arbitrary<J> = fc.letrec<{ value: J }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small' },
    scalar,
    fc.array(tie('value'), { maxLength: 4 }),
    fc.record({
      entries: fc.array(fc.tuple(fc.oneof(fc.string({ maxLength: 8 }), fc.constantFrom(...PROTO_KEYS, 'roles', 'isAdmin')), tie('value')), {
        maxLength: 4,
      }),
    }),
  ),
})).value;

const LOAD_KEYS = Object.keys((LoadSchema as unknown as { shape?: Record<string, unknown> }).shape ?? {}).concat([
  'tag',
  'supply',
  'hp',
  'kw',
  'volts',
  'fla',
  'singlePhaseType',
  'dcField',
  'conductor',
  'scpdOverride',
]);
/** Motor answers close to valid: the engine's field names with near-miss or junk values. */
const answersArb: fc.Arbitrary<J> = fc.record({
  entries: fc.array(
    fc.tuple(
      fc.oneof({ weight: 6, arbitrary: fc.constantFrom(...LOAD_KEYS) }, { weight: 1, arbitrary: fc.constantFrom(...PROTO_KEYS) }),
      fc.oneof(junk, fc.constantFrom<J>('ac3', 'ac1', 'dc', 'T-1', 460, 230, 10, 0.5, -3, 0, true, 'shunt', 'washdown', 'capacitor-start')),
    ),
    { maxLength: 8 },
  ),
});

function shapeKeys(schema: z.ZodType | undefined): string[] {
  const s = schema as unknown as { shape?: Record<string, unknown>; _zod?: { def?: { shape?: Record<string, unknown> } } } | undefined;
  return Object.keys(s?.shape ?? s?._zod?.def?.shape ?? {});
}

/** Bodies for one route: malformed text, non-objects, and objects built from the route's own field names. */
function bodies(route: AnyRoute): fc.Arbitrary<string> {
  const keys = shapeKeys(route.body);
  const near = fc.constantFrom<J>(
    0,
    1,
    'x',
    'A valid-looking name',
    true,
    false,
    [],
    { entries: [] },
    new Date(0).toISOString(),
    'wall-mounted',
    'panelwright-job',
  );
  const keyArb = keys.length
    ? fc.oneof(
        { weight: 6, arbitrary: fc.constantFrom(...keys) },
        { weight: 1, arbitrary: fc.constantFrom(...PROTO_KEYS, 'id', 'organisationId', 'roles', 'passwordHash') },
        { weight: 1, arbitrary: fc.string({ maxLength: 10 }) },
      )
    : fc.oneof(fc.constantFrom(...PROTO_KEYS, 'id', 'roles'), fc.string({ maxLength: 10 }));
  const valueFor = (k: string): fc.Arbitrary<J> => (k === 'answers' || k === 'changes' ? fc.oneof(answersArb, junk) : fc.oneof(junk, near));
  const objectBody = fc
    .array(
      keyArb.chain((k) => valueFor(k).map((v): [string, J] => [k, v])),
      { maxLength: keys.length + 3 },
    )
    .map((entries) => toJson({ entries }));
  const raw = fc.constantFrom(
    '{"__proto__": {"roles": ["admin"], "isAdmin": true, "version": 0}}',
    '{"constructor": {"prototype": {"polluted": "yes"}}}',
    '{"version": 0, "__proto__": {"polluted": "yes"}}',
    '{"a":',
    '{"version": 01}',
    "{'single': 'quotes'}",
    'not json at all',
    '"just a string"',
    '42',
    'null',
    `{"name": "${'z'.repeat(1_100_000)}"}`,
  );
  return fc.oneof({ weight: 5, arbitrary: objectBody }, { weight: 2, arbitrary: junk.map(toJson) }, { weight: 2, arbitrary: raw });
}

/** Integers beyond PostgreSQL's INTEGER (2,147,483,647): the one found by fuzzing, the first out of range, 2^53 − 1. */
const BIG_INTEGERS = [481_025_102_958_626, INT4_MAX + 1, 2 ** 53 - 1, 10_000_000_000];

type Segment = string | number;
interface ZodDef {
  type: string;
  shape?: Record<string, z.ZodType>;
  innerType?: z.ZodType;
  element?: z.ZodType;
  in?: z.ZodType;
  options?: z.ZodType[];
  left?: z.ZodType;
  right?: z.ZodType;
}
const defOf = (schema: z.ZodType) => (schema as unknown as { _zod: { def: ZodDef } })._zod.def;

/** Paths to every integer field of a schema (a number field that refuses 1.5 and takes 0 or 1), through objects, arrays, optionals and unions. */
function integerFields(schema: z.ZodType, path: Segment[] = []): Segment[][] {
  const d = defOf(schema);
  switch (d.type) {
    case 'object':
      return Object.entries(d.shape ?? {}).flatMap(([k, v]) => integerFields(v, [...path, k]));
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'readonly':
    case 'catch':
    case 'nonoptional':
      return integerFields(d.innerType!, path);
    case 'array':
      return integerFields(d.element!, [...path, 0]);
    case 'pipe':
      return integerFields(d.in!, path);
    case 'union':
      return (d.options ?? []).flatMap((o) => integerFields(o, path)).slice(0, 1);
    case 'intersection':
      return [...integerFields(d.left!, path), ...integerFields(d.right!, path)];
    case 'number':
      return !schema.safeParse(1.5).success && (schema.safeParse(0).success || schema.safeParse(1).success) ? [path] : [];
    default:
      return [];
  }
}

/** A JSON object holding `value` at `path` (an index makes a one-element array). */
function bodyWith(path: Segment[], value: number): unknown {
  if (path.length === 0) return value;
  const [head, ...rest] = path;
  return typeof head === 'number' ? [bodyWith(rest, value)] : { [head!]: bodyWith(rest, value) };
}

const issuePath = (path: Segment[]) => zodIssues([{ path, message: '' }])[0]!.path;

interface Expected {
  status: number;
  code: string;
  paths?: string[];
}

/** What the server must answer to this text, worked out from the route's own schema; null when the body is acceptable. */
function expected(route: AnyRoute, text: string): Expected | null {
  if (Buffer.byteLength(text) > BODY_LIMIT) return { status: 413, code: 'payload_too_large' };
  if (!/^\s*[[{]/.test(text)) return { status: 400, code: 'bad_json' }; // body-parser's strict mode: objects and arrays only
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    return { status: 400, code: 'bad_json' };
  }
  if (!route.body) {
    // upload routes answer that the file is missing; others ignore the body (covered by the params property)
    return route.before?.length ? { status: 400, code: 'validation_failed', paths: ['file'] } : null;
  }
  const r = route.body.safeParse(parsed ?? {});
  if (!r.success)
    return { status: 400, code: 'validation_failed', paths: zodIssues(r.error.issues).map((i) => (i.path ? `body.${i.path}` : 'body')) };
  const answers = (r.data as { answers?: unknown }).answers;
  if (answers !== undefined) {
    const a = LoadSchema.safeParse(answers);
    if (!a.success)
      return {
        status: 400,
        code: 'validation_failed',
        paths: zodIssues(a.error.issues).map((i) => (i.path ? `body.answers.${i.path}` : 'body.answers')),
      };
  }
  return null;
}

const ORDER: DemoRole[] = ['admin', 'designer', 'engineer', 'estimator'];
function roleFor(route: AnyRoute): DemoRole | null {
  if (route.access === 'public') return null;
  if (route.access === 'signed-in') return 'admin';
  return ORDER.find((r) => (route.access as readonly string[]).includes(r)) ?? null;
}

/** Every table but the session store: row count and a digest of every row. */
async function tableDigest() {
  const tables = await db().query<{ name: string }>(
    `select table_name as name from information_schema.tables where table_schema = 'public' and table_type = 'BASE TABLE' and table_name not in ('session') order by 1`,
    { type: QueryTypes.SELECT },
  );
  const out: Record<string, string> = {};
  for (const { name } of tables) {
    const [row] = await db().query<{ n: number; h: string }>(
      `select count(*)::int as n, md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as h from "${name}" t`,
      { type: QueryTypes.SELECT },
    );
    out[name] = `${row!.n}:${row!.h}`;
  }
  return out;
}

function fill(path: string, params: Record<string, string>) {
  return path.replace(/:(\w+)/g, (_m, n: string) => {
    if (!(n in params)) throw new Error(`fuzz: no value for :${n} in ${path}`);
    return params[n]!;
  });
}

function checkShape(body: unknown, where: string) {
  const e = (body as { error?: { code?: unknown; message?: unknown; details?: unknown } }).error;
  expect(e, where).toBeDefined();
  expect(typeof e!.code, where).toBe('string');
  expect(typeof e!.message, where).toBe('string');
  expect(e!.message as string, where).not.toMatch(/\bat .+\.(ts|js):\d+/); // no stack trace
  expect('details' in e!, where).toBe(true);
}

describe('malformed input on every write route', () => {
  testApp();
  const writeRoutes = () =>
    routeTable.filter((r) => r.method !== 'get' && r.path !== '/api/auth/sign-in' && r.path !== '/api/auth/sign-out');
  const sessions = new Map<DemoRole | null, Session>();
  let params: Record<string, string>;
  let before: Record<string, string>;
  // the error middleware logs every answer it turns into a 500: none may appear in this file
  const serverErrors: string[] = [];
  const consoleError = vi.spyOn(console, 'error').mockImplementation((...args: unknown[]) => {
    if (typeof args[0] === 'string' && args[0].startsWith('[error]')) serverErrors.push(args.map(String).join(' '));
  });
  afterAll(() => consoleError.mockRestore());

  beforeAll(async () => {
    params = await paramValues();
    for (const role of [null, ...ORDER] as Array<DemoRole | null>) sessions.set(role, role ? await signInAs(role) : await anonymous());
    before = await tableDigest();
  }, 60_000);

  it('has write routes to fuzz', () => {
    expect(writeRoutes().length).toBeGreaterThan(15);
  });

  it('answers every malformed body with a 4xx JSON error naming the fields, never a 500', async () => {
    const failures: string[] = [];
    let checked = 0;
    for (const route of writeRoutes()) {
      // routes that take no body (duplicate, copy, delete) ignore it: their input is the path, fuzzed below
      if (!route.body && !route.before?.length) continue;
      const s = sessions.get(roleFor(route))!;
      const url = fill(route.path, params);
      const where = `${route.method.toUpperCase()} ${route.path}`;
      await fc
        .assert(
          fc.asyncProperty(bodies(route), async (text) => {
            const want = expected(route, text);
            fc.pre(want !== null);
            const r = await s.agent[route.method as 'post'](url)
              .set('x-csrf-token', s.token)
              .set('content-type', 'application/json')
              .send(text);
            checked++;
            const got = `${r.status} ${JSON.stringify(r.body).slice(0, 300)}`;
            expect(r.headers['content-type'], `${where}: ${got}`).toMatch(/application\/json/);
            checkShape(r.body, `${where}: ${got}`);
            expect(r.status, `${where} body ${text.slice(0, 200)}: ${got}`).toBe(want!.status);
            expect(r.body.error.code, `${where}: ${got}`).toBe(want!.code);
            if (want!.paths) {
              const paths = (r.body.error.details as Array<{ path: string; message: string }>).map((d) => d.path);
              expect(paths.length, `${where}: ${got}`).toBeGreaterThan(0);
              expect([...paths].sort(), `${where} body ${text.slice(0, 200)}`).toEqual([...want!.paths].sort());
            }
          }),
          { numRuns: RUNS, maxSkipsPerRun: 50 },
        )
        .catch((e: unknown) =>
          failures.push(
            `${where}: ${
              e instanceof Error
                ? e.message
                    .split('\n')
                    .filter((l) => !/^\s*at |Hint|^$/.test(l))
                    .slice(0, 14)
                    .join('\n')
                : String(e)
            }`,
          ),
        );
    }
    expect(failures).toEqual([]);
    expect(checked).toBeGreaterThan(writeRoutes().length * 10);
  }, 120_000);

  it('answers junk path parameters with 400 naming the parameter, or 404, never a 500', async () => {
    // a small, fixed set: every value on every parameter of every route
    const junkParams = [
      '0',
      '-1',
      'abc',
      '1.5',
      '1e400',
      'NaN',
      'Infinity',
      '99999999999999999999',
      '2147483648',
      '1%3Bdrop',
      '%00',
      '%2e%2e',
      '%F0%9F%94%8C',
    ];
    const failures: string[] = [];
    let checked = 0;
    for (const route of routeTable.filter((r) => /:\w+/.test(r.path) && r.path !== '/api/auth/sign-out')) {
      const s = sessions.get(roleFor(route))!;
      for (const name of [...route.path.matchAll(/:(\w+)/g)].map((m) => m[1]!)) {
        for (const value of junkParams) {
          const url = fill(route.path, { ...params, [name]: value });
          const r =
            route.method === 'get'
              ? await s.agent.get(url)
              : await s.agent[route.method as 'post'](url).set('x-csrf-token', s.token).send({});
          checked++;
          const where = `${route.method.toUpperCase()} ${route.path} ${name}=${value}: ${r.status} ${JSON.stringify(r.body).slice(0, 200)}`;
          if (r.status >= 500) failures.push(where);
          if (r.status >= 500 || (route.method === 'get' && r.status < 300)) continue; // a read that needs no row (e.g. a template)
          if (r.status !== 400 && r.status !== 404) failures.push(where);
          else if (!r.body?.error || typeof r.body.error.message !== 'string') failures.push(`${where} (not the error shape)`);
          else if (r.status === 400) {
            const paths = ((r.body.error.details ?? []) as Array<{ path: string }>).map((d) => d.path);
            if (
              r.body.error.code !== 'validation_failed' ||
              paths.length === 0 ||
              !paths.every((p) => /^(params\.\w+|query\.\w+|body(\.|$)|file$)/.test(p))
            )
              failures.push(`${where} (field not named)`);
          }
        }
      }
    }
    expect(failures).toEqual([]);
    expect(checked).toBeGreaterThan(200);
  }, 120_000);

  it('refuses an integer the database cannot hold in every integer field of every write route, naming the field', async () => {
    const failures: string[] = [];
    let checked = 0;
    for (const route of writeRoutes()) {
      if (!route.body) continue;
      const s = sessions.get(roleFor(route))!;
      const url = fill(route.path, params);
      const fields = integerFields(route.body);
      for (const path of fields) {
        for (const big of BIG_INTEGERS) {
          const r = await s.agent[route.method as 'post'](url)
            .set('x-csrf-token', s.token)
            .send(bodyWith(path, big) as object);
          checked++;
          const where = `${route.method.toUpperCase()} ${route.path} ${issuePath(path)}=${big}: ${r.status} ${JSON.stringify(r.body).slice(0, 300)}`;
          const named = ((r.body?.error?.details ?? []) as Array<{ path: string }>).map((d) => d.path);
          if (r.status !== 400 || r.body?.error?.code !== 'validation_failed' || !named.includes(`body.${issuePath(path)}`))
            failures.push(where);
        }
      }
    }
    expect(failures).toEqual([]);
    // versions, ids, positions and counts on at least a dozen write routes (found by walking their schemas)
    expect(checked).toBeGreaterThan(12 * BIG_INTEGERS.length);
  }, 120_000);

  it('refuses the archive with version 481025102958626 (the value that reached PostgreSQL as "out of range for type integer") and its kin, with every other field valid', async () => {
    const cases: Array<{ role: DemoRole; method: 'post' | 'patch'; path: string; body: Record<string, unknown>; field: string }> = [
      {
        role: 'designer',
        method: 'post',
        path: '/api/panels/:panelId/archive',
        body: { archived: true, version: 481025102958626 },
        field: 'body.version',
      },
      {
        role: 'designer',
        method: 'post',
        path: '/api/panels/:panelId/archive',
        body: { archived: false, version: INT4_MAX + 1 },
        field: 'body.version',
      },
      {
        role: 'designer',
        method: 'post',
        path: '/api/jobs/:id/archive',
        body: { archived: true, version: 2 ** 53 - 1 },
        field: 'body.version',
      },
      {
        role: 'designer',
        method: 'patch',
        path: '/api/jobs/:id',
        body: { name: 'Renamed by a big version', version: 481025102958626 },
        field: 'body.version',
      },
      {
        role: 'designer',
        method: 'post',
        path: '/api/panels/:panelId/reselect',
        body: { version: 481025102958626 },
        field: 'body.version',
      },
      {
        role: 'designer',
        method: 'post',
        path: '/api/panels/:panelId/comments',
        body: { body: 'A comment on a motor', loadId: 481025102958626 },
        field: 'body.loadId',
      },
      {
        role: 'admin',
        method: 'patch',
        path: '/api/users/:id',
        body: { name: 'Big version', version: INT4_MAX + 1 },
        field: 'body.version',
      },
    ];
    for (const c of cases) {
      const s = sessions.get(c.role)!;
      const r = await s.agent[c.method](fill(c.path, { ...params, id: c.path.startsWith('/api/users') ? params.userId! : params.id! }))
        .set('x-csrf-token', s.token)
        .send(c.body);
      const where = `${c.method.toUpperCase()} ${c.path} ${JSON.stringify(c.body)}: ${r.status} ${JSON.stringify(r.body).slice(0, 300)}`;
      expect(r.status, where).toBe(400);
      expect(r.body.error.code, where).toBe('validation_failed');
      expect(
        (r.body.error.details as Array<{ path: string }>).map((d) => d.path),
        where,
      ).toEqual([c.field]);
    }
    // the same numbers as path parameters
    const s = sessions.get('designer')!;
    for (const value of ['2147483648', '481025102958626']) {
      const r = await s.agent.get(`/api/panels/${value}`);
      expect(r.status, `GET /api/panels/${value}: ${r.status}`).toBe(400);
      expect(r.body.error.details.map((d: { path: string }) => d.path)).toEqual(['params.panelId']);
    }
    const ok = await s.agent.get(`/api/panels/${params.panelId}`);
    expect(ok.status).toBe(200); // the bound leaves ordinary ids alone
  });

  it('answered no request in this file with a 500', () => {
    expect(serverErrors).toEqual([]);
  });

  it('wrote nothing for any rejected request and polluted no prototype in the server process', async () => {
    expect(await tableDigest()).toEqual(before);
    const probe = {} as Record<string, unknown>;
    expect(probe.polluted).toBeUndefined();
    expect(probe.roles).toBeUndefined();
    expect(probe.isAdmin).toBeUndefined();
  });
});
