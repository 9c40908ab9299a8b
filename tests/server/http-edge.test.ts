import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiErrorSchema } from '@shared/api/errors';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop, sampleDocument } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// What every request goes through before a route sees it: CSRF, body parsing and size, validation, routing,
// the error middleware, and the security headers.

let ctx: TestContext;
let owner: ApiClient;
let workshopId: string;
let projectId: string;
let frameId: string;

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const u = await makeUser(ctx.orm);
  const w = await makeWorkshop(ctx.orm, [{ user: u, role: 'owner' }]);
  const p = await makeProject(ctx.orm, w);
  workshopId = w.id;
  projectId = p.id;
  frameId = (await makeFrame(ctx.orm, p)).id;
  owner = await signedIn(ctx.app, u);
});
afterAll(() => ctx.close());

describe('CSRF', () => {
  it('a state-changing request without the token → 403 csrf, and nothing happens', async () => {
    const token = owner.csrf;
    owner.csrf = null;
    try {
      const res = await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'Sneaky' });
      expect(res.status).toBe(403);
      expect(apiErrorSchema.parse(res.body).error.code).toBe('csrf');
    } finally {
      owner.csrf = token;
    }
    const list = (await owner.get(`/api/workshops/${workshopId}/projects`).expect(200)).body as { name: string }[];
    expect(list.map((p) => p.name)).not.toContain('Sneaky');
  });

  it('a wrong token, or another session’s token → 403', async () => {
    const other = new ApiClient(ctx.app);
    const otherToken = await other.fetchCsrf();
    for (const bad of ['wrong', otherToken]) {
      const res = await owner.agent.patch(`/api/workshops/${workshopId}`).set('X-CSRF-Token', bad).send({ name: 'x' });
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('csrf');
    }
  });

  it('sign-in needs a token too (the client fetches one first)', async () => {
    const res = await request(ctx.app).post('/api/auth/signin').send({ email: 'a@b.test', password: 'whatever password' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });

  it('reads need no token', async () => {
    const token = owner.csrf;
    owner.csrf = null;
    try {
      await owner.get(`/api/frames/${frameId}`).expect(200);
    } finally {
      owner.csrf = token;
    }
  });
});

type BadCase = [name: string, method: 'get' | 'post' | 'put' | 'patch', path: () => string, body: unknown, fields: string[]];

describe('bad bodies and parameters → 400 naming the fields', () => {
  it.each<BadCase>([
    ['POST /workshops', 'post', () => '/api/workshops', { name: '' }, ['name']],
    ['POST /workshops (no body)', 'post', () => '/api/workshops', undefined, ['name']],
    ['POST members', 'post', () => `/api/workshops/${workshopId}/members`, { email: 'nope', role: 'boss' }, ['email', 'role']],
    ['PATCH member', 'patch', () => `/api/workshops/${workshopId}/members/not-a-uuid`, { role: 'viewer' }, ['userId']],
    ['POST projects', 'post', () => `/api/workshops/${workshopId}/projects`, { name: 42, client: ['x'], notes: 'n'.repeat(5001) }, ['client', 'name', 'notes']],
    ['PATCH project', 'patch', () => `/api/projects/${projectId}`, { name: '   ' }, ['name']],
    ['POST frames', 'post', () => `/api/projects/${projectId}/frames`, { name: 'x'.repeat(121), document: 'text' }, ['document', 'name']],
    ['PUT document', 'put', () => `/api/frames/${frameId}/document`, { baseVersion: 'one', document: [] }, ['baseVersion', 'document']],
    ['PUT document (fractional version)', 'put', () => `/api/frames/${frameId}/document`, { baseVersion: 1.5, document: {} }, ['baseVersion']],
    ['GET frames ?deleted', 'get', () => `/api/projects/${projectId}/frames?deleted=maybe`, undefined, ['deleted']],
    ['GET revision', 'get', () => `/api/frames/${frameId}/revisions/first`, undefined, ['version']],
    ['GET project (bad id)', 'get', () => '/api/projects/123', undefined, ['projectId']],
  ])('%s', async (_name, method, path, body, fields) => {
    const res = await owner.send(method, path(), body);
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    const err = apiErrorSchema.parse(res.body).error;
    expect(err.code).toBe('validation');
    expect(Object.keys(err.fields ?? {}).sort()).toEqual(fields);
    for (const message of Object.values(err.fields ?? {})) expect(message.length).toBeGreaterThan(0);
  });

  it('malformed JSON → 400 bad_request', async () => {
    const res = await owner.agent
      .post('/api/workshops')
      .set('X-CSRF-Token', owner.csrf!)
      .set('Content-Type', 'application/json')
      .send('{"name": ');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_request');
  });
});

describe('size limit', () => {
  it('a body over the limit → 413 payload_too_large, frame untouched', async () => {
    const huge = { baseVersion: 1, document: { schemaVersion: 1, members: [], padding: 'x'.repeat(2.5 * 1024 * 1024) } };
    const res = await owner.put(`/api/frames/${frameId}/document`, huge);
    expect(res.status).toBe(413);
    expect(res.body).toEqual({ error: { code: 'payload_too_large', message: expect.any(String) } });
    const frame = (await owner.get(`/api/frames/${frameId}`).expect(200)).body as { version: number };
    expect(frame.version).toBe(1);
  });

  it('a large frame under the limit is accepted', async () => {
    const document = sampleDocument(4000, 'm');
    expect(JSON.stringify(document).length).toBeGreaterThan(500_000);
    const res = await owner.put(`/api/frames/${frameId}/document`, { baseVersion: 1, document });
    expect(res.status).toBe(200);
  });
});

describe('routing and errors', () => {
  it('an unknown /api route → JSON 404', async () => {
    const res = await owner.get('/api/no/such/thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error.code).toBe('not_found');
    expect((await owner.post('/api/nothing-here', {})).status).toBe(404);
  });

  it('ids of things that do not exist → 404', async () => {
    const ghost = '6f1c2a3b-4d5e-4f60-8a7b-9c0d1e2f3a4b';
    for (const path of [`/api/projects/${ghost}`, `/api/frames/${ghost}`, `/api/workshops/${ghost}/members`]) {
      const res = await owner.get(path);
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe('not_found');
    }
  });

  it('a crash → 500 with a plain message and no stack trace; the error is reported server-side', async () => {
    const broken = await createTestContext();
    try {
      const u = await makeUser(ctx.orm);
      const client = await signedIn(broken.app, u);
      await broken.orm.close(true);
      const res = await client.get('/api/workshops');
      expect(res.status).toBe(500);
      expect(res.body).toEqual({ error: { code: 'internal', message: 'Something went wrong on the server' } });
      expect(res.text).not.toMatch(/at .+\.(ts|js):\d+/);
      expect(broken.loggedErrors.length).toBe(1);
    } finally {
      await broken.close();
    }
  });

  it('sends the usual security headers', async () => {
    const res = await request(ctx.app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toMatch(/default-src 'self'/);
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('session store', () => {
  it('a session survives a server restart (sessions live in PostgreSQL)', async () => {
    const u = await makeUser(ctx.orm);
    const first = await createTestContext();
    const client = await signedIn(first.app, u);
    const signin = await client.get('/api/auth/me').expect(200);
    const csrf = signin.body.csrfToken as string;
    const cookieJar = client.agent.jar.getCookie('slotwright.sid', { domain: '127.0.0.1', path: '/', secure: false, script: false });
    const cookie = cookieJar ? `slotwright.sid=${cookieJar.value}` : '';
    expect(cookie).not.toBe('');
    await first.close();

    const second = await createTestContext();
    try {
      const me = await request(second.app).get('/api/auth/me').set('Cookie', cookie).expect(200);
      expect(me.body.user.id).toBe(u.id);
      const created = await request(second.app).post('/api/workshops').set('Cookie', cookie).set('X-CSRF-Token', csrf).send({ name: 'After restart' });
      expect(created.status).toBe(201);
    } finally {
      await second.close();
    }
  });
});
