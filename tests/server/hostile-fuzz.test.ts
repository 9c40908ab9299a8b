import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiErrorSchema } from '@shared/api/errors';
import type { Role } from '@shared/api/roles';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Every state-changing route, called by every kind of caller with hostile values (fast-check): never a 5xx,
// always the JSON error shape on a refusal, and a refused request changes no row. Bounded: a fixed number of
// runs and a time limit.

type Actor = Role | 'outsider' | 'anonymous';
const ACTORS: Actor[] = ['owner', 'designer', 'cutter', 'viewer', 'outsider', 'anonymous'];

interface World {
  workshopId: string;
  projectId: string;
  frameId: string;
  memberId: string;
}

type Method = 'post' | 'put' | 'patch' | 'delete';
const ROUTES: { name: string; method: Method; path: (w: World) => string; fields: string[] }[] = [
  { name: 'POST /workshops', method: 'post', path: () => '/api/workshops', fields: ['name'] },
  { name: 'PATCH /workshops/:id', method: 'patch', path: (w) => `/api/workshops/${w.workshopId}`, fields: ['name'] },
  { name: 'POST members', method: 'post', path: (w) => `/api/workshops/${w.workshopId}/members`, fields: ['email', 'role'] },
  { name: 'PATCH member', method: 'patch', path: (w) => `/api/workshops/${w.workshopId}/members/${w.memberId}`, fields: ['role'] },
  { name: 'POST projects', method: 'post', path: (w) => `/api/workshops/${w.workshopId}/projects`, fields: ['name', 'client', 'notes'] },
  { name: 'PATCH project', method: 'patch', path: (w) => `/api/projects/${w.projectId}`, fields: ['name', 'client', 'notes'] },
  { name: 'POST frames', method: 'post', path: (w) => `/api/projects/${w.projectId}/frames`, fields: ['name', 'document'] },
  { name: 'PATCH frame', method: 'patch', path: (w) => `/api/frames/${w.frameId}`, fields: ['name'] },
  { name: 'PUT document', method: 'put', path: (w) => `/api/frames/${w.frameId}/document`, fields: ['baseVersion', 'document'] },
  { name: 'POST restore', method: 'post', path: (w) => `/api/frames/${w.frameId}/restore`, fields: [] },
  { name: 'POST project import', method: 'post', path: (w) => `/api/workshops/${w.workshopId}/projects/import`, fields: ['file'] },
  { name: 'POST project restore', method: 'post', path: (w) => `/api/projects/${w.projectId}/restore`, fields: [] },
  { name: 'POST suppliers', method: 'post', path: (w) => `/api/workshops/${w.workshopId}/suppliers`, fields: ['name', 'email', 'currency', 'stock', 'cutFee', 'notes'] },
  { name: 'POST orders', method: 'post', path: (w) => `/api/workshops/${w.workshopId}/orders`, fields: ['frameId', 'supplierId', 'mode', 'settings'] },
  { name: 'POST cutting', method: 'post', path: (w) => `/api/frames/${w.frameId}/cutting`, fields: ['settings', 'restart'] },
  { name: 'POST ticks', method: 'post', path: (w) => `/api/frames/${w.frameId}/cutting/ticks`, fields: ['cutKey'] },
  { name: 'POST plan/cut', method: 'post', path: () => '/api/plan/cut', fields: ['job', 'timeLimitMs'] },
  { name: 'POST signup', method: 'post', path: () => '/api/auth/signup', fields: ['email', 'password', 'name'] },
  { name: 'POST signin', method: 'post', path: () => '/api/auth/signin', fields: ['email', 'password'] },
];

let ctx: TestContext;
let world: World;
const clients = new Map<Actor, ApiClient>();

/** Every row of the tables a refused request must not touch, as one digest. */
async function digest(): Promise<string> {
  const tables = ['users', 'workshops', 'memberships', 'projects', 'frames', 'frame_revisions', 'suppliers', 'orders', 'cut_sessions', 'cut_ticks'];
  const conn = ctx.orm.em.fork().getConnection();
  const parts = await Promise.all(tables.map((t) => conn.execute<{ d: string | null }[]>(`select md5(coalesce(string_agg(x::text, ',' order by x::text), '')) as d from "${t}" x`)));
  return parts.map((p) => p[0].d).join('|');
}

const nested = (depth: number): unknown => (depth === 0 ? 'x' : { a: nested(depth - 1) });
const nestedArray = (depth: number): unknown => (depth === 0 ? 1 : [nestedArray(depth - 1)]);
const hostile: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom<unknown>(
    null,
    true,
    [],
    {},
    1e308,
    -1e308,
    Number.MAX_SAFE_INTEGER + 2,
    1e12,
    'NaN',
    'Infinity',
    '-0',
    '1e999',
    'a\u0000b',
    '\uD800',
    'x\uDFFFy',
    '__proto__',
    { ['__proto__']: { admin: true } },
    { constructor: { prototype: { polluted: true } } },
    nested(40),
    nestedArray(40),
    '\u202Eevil',
    '../../etc/passwd',
    "'; drop table users; --",
  ),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 20 }),
  fc.double(),
  fc.integer(),
  fc.array(fc.anything({ maxDepth: 2 }), { maxLength: 4 }),
);

type Send = { kind: 'json'; body: unknown } | { kind: 'raw'; contentType: string; encoding?: string; body: string };
const sends: fc.Arbitrary<(fields: string[]) => Send> = fc.oneof(
  { weight: 6, arbitrary: fc.array(hostile, { minLength: 1, maxLength: 6 }).map((vals) => (fields: string[]) => ({ kind: 'json' as const, body: Object.fromEntries(fields.map((f, i) => [f, vals[i % vals.length]])) })) },
  { weight: 2, arbitrary: hostile.map((v) => () => ({ kind: 'json' as const, body: v })) },
  {
    weight: 2,
    arbitrary: fc.constantFrom<Send>(
      { kind: 'raw', contentType: 'application/json', body: '{"name": "a", "__proto__": {"isAdmin": true}}' },
      { kind: 'raw', contentType: 'application/json', body: '{"name": ' },
      { kind: 'raw', contentType: 'application/json', encoding: 'gzip', body: '{"name":"plain"}' },
      { kind: 'raw', contentType: 'application/json', encoding: 'br', body: 'not brotli' },
      { kind: 'raw', contentType: 'application/json; charset=utf-16', body: '{"name":"x"}' },
      { kind: 'raw', contentType: 'application/json; charset=klingon', body: '{"name":"x"}' },
      { kind: 'raw', contentType: 'multipart/form-data; boundary=zz', body: '--zz\r\nbroken' },
      { kind: 'raw', contentType: 'application/json', body: `${'['.repeat(5000)}${']'.repeat(5000)}` },
    ).map((s) => () => s),
  },
);

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const roles: Role[] = ['owner', 'designer', 'cutter', 'viewer'];
  const members = await Promise.all(roles.map(() => makeUser(ctx.orm)));
  const outsider = await makeUser(ctx.orm);
  const w = await makeWorkshop(ctx.orm, roles.map((role, i) => ({ user: members[i], role })));
  const p = await makeProject(ctx.orm, w);
  const f = await makeFrame(ctx.orm, p);
  world = { workshopId: w.id, projectId: p.id, frameId: f.id, memberId: members[3].id };
  for (const [i, role] of roles.entries()) clients.set(role, await signedIn(ctx.app, members[i]));
  clients.set('outsider', await signedIn(ctx.app, outsider));
  const anon = new ApiClient(ctx.app);
  await anon.fetchCsrf();
  clients.set('anonymous', anon);
});
afterAll(() => ctx.close());

describe('hostile values on every state-changing route, for every caller', () => {
  it('never a 5xx; refusals in the JSON error shape and with no row changed', { timeout: 240_000 }, async () => {
    const seen = new Set<string>();
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...ROUTES), fc.constantFrom(...ACTORS), sends, async (route, actor, make) => {
        const client = clients.get(actor) as ApiClient;
        const send = make(route.fields);
        const before = await digest();
        let req = client.agent[route.method](route.path(world));
        if (client.csrf) req = req.set('X-CSRF-Token', client.csrf);
        if (send.kind === 'json') req = req.set('Content-Type', 'application/json').send(JSON.stringify(send.body) ?? 'null');
        else {
          req = req.set('Content-Type', send.contentType);
          if (send.encoding) req = req.set('Content-Encoding', send.encoding);
          req = req.send(send.body);
        }
        const res = await req;
        seen.add(`${route.name} ${res.status}`);
        expect(res.status, `${route.name} as ${actor}: ${JSON.stringify(res.body).slice(0, 300)}`).toBeLessThan(500);
        if (res.status >= 400) {
          expect(apiErrorSchema.safeParse(res.body).success, `${route.name}: ${res.text.slice(0, 200)}`).toBe(true);
          expect(await digest(), `${route.name} as ${actor} was refused (${res.status}) but changed rows`).toBe(before);
        }
      }),
      { numRuns: 150, interruptAfterTimeLimit: 150_000, seed: 20261202 },
    );
    expect(ctx.loggedErrors).toEqual([]);
    expect(seen.size).toBeGreaterThan(10);
  });

  it('a 5 MB string in a name → 413 in our shape, nothing changed', async () => {
    const before = await digest();
    const res = await (clients.get('owner') as ApiClient).post(`/api/workshops/${world.workshopId}/projects`, { name: 'x'.repeat(5 * 1024 * 1024) });
    expect(res.status).toBe(413);
    expect(apiErrorSchema.parse(res.body).error.code).toBe('payload_too_large');
    expect(await digest()).toBe(before);
  });
});
