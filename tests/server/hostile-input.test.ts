import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiErrorSchema } from '@shared/api/errors';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop, sampleDocument, storedFrame } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Requests a stranger can send to hurt the server: each one is refused with our JSON error shape and a 4xx,
// nothing stored changes, and nothing reaches the error log as unexpected.

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
  const p = await makeProject(ctx.orm, w, { name: 'Bench' });
  workshopId = w.id;
  projectId = p.id;
  frameId = (await makeFrame(ctx.orm, p)).id;
  owner = await signedIn(ctx.app, u);
});
afterAll(() => ctx.close());

function expectClientError(res: request.Response, status: number | number[]) {
  expect([status].flat()).toContain(res.status);
  expect(res.headers['content-type']).toMatch(/application\/json/);
  apiErrorSchema.parse(res.body);
  expect(ctx.loggedErrors).toEqual([]);
}

const docWith = (patch: (d: Record<string, any>) => void) => {
  const d = structuredClone(sampleDocument(2, 'h')) as Record<string, any>;
  patch(d);
  return d;
};

describe('a frame document past the bounds', () => {
  it('a member end 1e12 mm away → 422 naming the field; the stored frame is unchanged', async () => {
    const before = await storedFrame(ctx.orm, frameId);
    const doc = docWith((d) => {
      delete d.members[0].length_mm;
      d.members[0].end = { offset_mm: 1e12 };
    });
    const res = await owner.put(`/api/frames/${frameId}/document`, { baseVersion: before.version, document: doc });
    expectClientError(res, 422);
    expect(res.body.error.fields).toHaveProperty(['document.members[0].end.offset_mm']);
    expect(await storedFrame(ctx.orm, frameId)).toEqual(before);
  });

  it('more members than a frame may have → 422 on document.members', async () => {
    const many = sampleDocument(1, 'm') as Record<string, any>;
    const member = many.members[0];
    many.members = Array.from({ length: 5001 }, (_, i) => ({ ...member, id: `m${i}` }));
    const res = await owner.post(`/api/projects/${projectId}/frames`, { name: 'Too many', document: many });
    expectClientError(res, 422);
    expect(res.body.error.fields).toHaveProperty(['document.members']);
  });

  it('datums chained past 1 km pass the schema, but the engine refuses the shop documents with 422 instead of working on them', async () => {
    const doc = docWith((d) => {
      d.datums = Array.from({ length: 20 }, (_, i) => ({ type: 'datum', id: `d${i}`, axis: 'x', ...(i > 0 ? { from: `d${i - 1}` } : {}), offset_mm: 100_000 }));
      d.members[0].start = { datum: 'd19', offset_mm: 0 };
    });
    const created = await owner.post(`/api/projects/${projectId}/frames`, { name: 'Far away', document: doc }).expect(201);
    const t0 = Date.now();
    const res = await owner.get(`/api/frames/${created.body.id}/shop/cut-list.csv`);
    expectClientError(res, 422);
    expect(JSON.stringify(res.body.error.fields)).toMatch(/members\[0\]/);
    expect(Date.now() - t0).toBeLessThan(5000);
  });
});

describe('text the database cannot store → 400 naming the field, nothing written', () => {
  it('a NUL in a project name', async () => {
    const res = await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'Van\u0000 galley' });
    expectClientError(res, 400);
    expect(res.body.error.fields).toHaveProperty('name');
    const list = (await owner.get(`/api/workshops/${workshopId}/projects`).expect(200)).body as { name: string }[];
    expect(list.map((p) => p.name)).toEqual(['Bench']);
  });

  it('an unpaired surrogate in a member name inside a frame document (stored as jsonb)', async () => {
    const before = await storedFrame(ctx.orm, frameId);
    const doc = docWith((d) => {
      d.members[1].name = 'rail \uD800 left';
    });
    const res = await owner.put(`/api/frames/${frameId}/document`, { baseVersion: before.version, document: doc });
    expectClientError(res, 400);
    expect(res.body.error.fields).toHaveProperty(['document.members.1.name']);
    expect(await storedFrame(ctx.orm, frameId)).toEqual(before);
  });

  it('a NUL in an object key, and a lone low surrogate in a supplier note', async () => {
    const a = await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'x', ['no\u0000te']: 1 });
    expectClientError(a, 400);
    const b = await owner.post(`/api/workshops/${workshopId}/suppliers`, { name: 'Bars', email: 'bars@example.test', notes: 'a\uDC00b' });
    expectClientError(b, 400);
    expect(b.body.error.fields).toHaveProperty('notes');
  });

  it('a body nested 10,000 levels deep', async () => {
    const deep = `${'{"a":'.repeat(10_000)}1${'}'.repeat(10_000)}`;
    const res = await owner.agent
      .post(`/api/workshops/${workshopId}/projects`)
      .set('X-CSRF-Token', owner.csrf as string)
      .set('Content-Type', 'application/json')
      .send(deep);
    expectClientError(res, 400);
  });

  it('a well-formed emoji (a surrogate pair) is kept', async () => {
    const res = await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'Galley 🚐' }).expect(201);
    expect(res.body.name).toBe('Galley 🚐');
  });
});

describe('requests that do not decode → 4xx JSON, never 500', () => {
  it('GET /api/projects/%ff', async () => {
    expectClientError(await owner.get('/api/projects/%ff'), 400);
  });

  it('Content-Encoding: gzip on a plain JSON body', async () => {
    const res = await owner.agent
      .post(`/api/workshops/${workshopId}/projects`)
      .set('X-CSRF-Token', owner.csrf as string)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'gzip')
      .send('{"name":"plain"}');
    expectClientError(res, 400);
  });

  it('an unknown Content-Encoding → 400 (body-parser says 415)', async () => {
    const res = await owner.agent
      .post(`/api/workshops/${workshopId}/projects`)
      .set('X-CSRF-Token', owner.csrf as string)
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'x-bogus')
      .send('{"name":"plain"}');
    expectClientError(res, [400, 415]);
  });

  it('a multipart body cut off in the middle of a part', async () => {
    const boundary = 'XyZ123';
    const body = `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="a.png"\r\nContent-Type: image/png\r\n\r\n\x89PNG partial`;
    const res = await owner.agent
      .post(`/api/projects/${projectId}/attachments`)
      .set('X-CSRF-Token', owner.csrf as string)
      .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
      .send(body);
    expectClientError(res, 400);
  });

  it('a multipart header that is not one', async () => {
    const boundary = 'AbC';
    const body = `--${boundary}\r\nnot a header at all\r\n\r\nx\r\n--${boundary}--\r\n`;
    const res = await owner.agent
      .post(`/api/workshops/${workshopId}/offcuts/import`)
      .set('X-CSRF-Token', owner.csrf as string)
      .set('Content-Type', `multipart/form-data; boundary=${boundary}`)
      .send(body);
    expectClientError(res, 400);
  });

  it('a body larger than the limit → 413 in our shape', async () => {
    const res = await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'x', notes: 'n'.repeat(3 * 1024 * 1024) });
    expectClientError(res, 413);
    expect(res.body.error.code).toBe('payload_too_large');
  });
});

describe('uploads and 404s', () => {
  it('an anonymous upload is refused (401) before its body is read; a stranger’s with the same 404 as a missing project', async () => {
    const anon = new ApiClient(ctx.app);
    await anon.fetchCsrf();
    const big = Buffer.alloc(5 * 1024 * 1024, 0x41);
    const a = await anon.agent.post(`/api/projects/${projectId}/attachments`).set('X-CSRF-Token', anon.csrf as string).attach('file', big, 'a.png');
    expectClientError(a, 401);
    const stranger = await signedIn(ctx.app, await makeUser(ctx.orm));
    const theirs = await stranger.agent.post(`/api/projects/${projectId}/attachments`).set('X-CSRF-Token', stranger.csrf as string).attach('file', Buffer.from('x'), 'a.png');
    const missing = await stranger.agent
      .post('/api/projects/00000000-0000-4000-8000-000000000000/attachments')
      .set('X-CSRF-Token', stranger.csrf as string)
      .attach('file', Buffer.from('x'), 'a.png');
    expectClientError(theirs, 404);
    expect(theirs.body).toEqual(missing.body);
  });

  it('a supplier of another workshop and one that does not exist give the same 404', async () => {
    const created = await owner.post(`/api/workshops/${workshopId}/suppliers`, { name: 'Bars Ltd', email: 'bars@example.test' }).expect(201);
    const stranger = await signedIn(ctx.app, await makeUser(ctx.orm));
    const theirs = await stranger.patch(`/api/suppliers/${created.body.id}`, { notes: 'x' });
    const missing = await stranger.patch('/api/suppliers/00000000-0000-4000-8000-000000000000', { notes: 'x' });
    expectClientError(theirs, 404);
    expect(theirs.body).toEqual(missing.body);
  });
});
