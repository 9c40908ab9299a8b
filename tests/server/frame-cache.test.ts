import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { FrameDocumentJson } from '@shared/api/frames';
import { ApiClient, signedIn } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop, sampleDocument } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Reading a frame and its shop documents again: the frame answers with an ETag and 304 while unchanged
// (conditional requests, RFC 9110 §13.1.2 If-None-Match), the documents come from the cache until the frame
// changes, and nothing made for one frame, user or workshop is ever served for another.

let ctx: TestContext;
let alice: ApiClient;
let bob: ApiClient;
let carol: ApiClient;
let aliceFrame: string;
let bobFrame: string;

const csvLengths = (text: string) => text.split('\n').filter((l) => /\d/.test(l));

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const [a, b, c] = [await makeUser(ctx.orm), await makeUser(ctx.orm), await makeUser(ctx.orm)];
  const wa = await makeWorkshop(ctx.orm, [
    { user: a, role: 'owner' },
    { user: c, role: 'viewer' },
  ]);
  const wb = await makeWorkshop(ctx.orm, [{ user: b, role: 'owner' }]);
  aliceFrame = (await makeFrame(ctx.orm, await makeProject(ctx.orm, wa), { name: 'Bench', document: sampleDocument(3, 'a') })).id;
  bobFrame = (await makeFrame(ctx.orm, await makeProject(ctx.orm, wb), { name: 'Bench', document: sampleDocument(2, 'b') })).id;
  [alice, bob, carol] = [await signedIn(ctx.app, a), await signedIn(ctx.app, b), await signedIn(ctx.app, c)];
});
afterAll(() => ctx.close());

describe('GET /api/frames/:id', () => {
  it('answers with the stored document, an ETag, and 304 to a request that holds the current one', async () => {
    const res = await alice.get(`/api/frames/${aliceFrame}`).expect(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.document.members.map((m: { id: string }) => m.id)).toEqual(['a0', 'a1', 'a2']);
    expect(res.body).toMatchObject({ id: aliceFrame, version: 1, role: 'owner', memberCount: 3, name: 'Bench' });
    const etag = res.headers.etag as string;
    expect(etag).toBeTruthy();
    expect(res.headers['cache-control']).toMatch(/private/);
    const again = await alice.get(`/api/frames/${aliceFrame}`).set('If-None-Match', etag);
    expect(again.status).toBe(304);
    expect(again.text ?? '').toBe('');
  });

  it('a new version has a new ETag: the old one gets the new document, not a 304', async () => {
    const first = await alice.get(`/api/frames/${aliceFrame}`).expect(200);
    const etag = first.headers.etag as string;
    const doc = first.body.document as FrameDocumentJson;
    await alice.put(`/api/frames/${aliceFrame}/document`, { baseVersion: first.body.version, document: { ...doc, name: 'Bench, deeper' } }).expect(200);
    const res = await alice.get(`/api/frames/${aliceFrame}`).set('If-None-Match', etag);
    expect(res.status).toBe(200);
    expect(res.body.version).toBe(first.body.version + 1);
    expect(res.body.document.name).toBe('Bench, deeper');
    expect(res.headers.etag).not.toBe(etag);
  });

  it('never answers another member or an outsider from someone else’s copy', async () => {
    const owner = await alice.get(`/api/frames/${aliceFrame}`).expect(200);
    const etag = owner.headers.etag as string;
    // Another workshop's user holding the owner's ETag: still 404, as for any frame not theirs.
    expect((await bob.get(`/api/frames/${aliceFrame}`).set('If-None-Match', etag)).status).toBe(404);
    // A viewer of the same workshop: a different answer (their role), so the owner's ETag does not match.
    const viewer = await carol.get(`/api/frames/${aliceFrame}`).set('If-None-Match', etag);
    expect(viewer.status).toBe(200);
    expect(viewer.body.role).toBe('viewer');
  });
});

describe('shop documents from the cache', () => {
  it('the same document twice is the same bytes; a new version of the frame makes a new one', async () => {
    const url = `/api/frames/${aliceFrame}/shop/cut-list.csv`;
    const one = await alice.get(url).expect(200);
    const two = await alice.get(url).expect(200);
    expect(two.text).toBe(one.text);
    const current = await alice.get(`/api/frames/${aliceFrame}`).expect(200);
    const doc = current.body.document as FrameDocumentJson & { members: { id: string; length_mm: number }[] };
    const longer = { ...doc, members: doc.members.map((m) => (m.id === 'a0' ? { ...m, length_mm: 777 } : m)) };
    await alice.put(`/api/frames/${aliceFrame}/document`, { baseVersion: current.body.version, document: longer }).expect(200);
    const three = await alice.get(url).expect(200);
    expect(three.text).not.toBe(one.text);
    expect(three.text).toMatch(/777/);
    expect(one.text).not.toMatch(/777/);
    // The file name carries the new revision.
    expect(three.headers['content-disposition']).toMatch(new RegExp(`-r${current.body.version + 1}-cut-list`));
  });

  it('another workshop’s user gets 404 for a cached document, and their own frame’s document for theirs', async () => {
    const a = await alice.get(`/api/frames/${aliceFrame}/shop/cut-list.csv`).expect(200);
    expect((await bob.get(`/api/frames/${aliceFrame}/shop/cut-list.csv`)).status).toBe(404);
    const b = await bob.get(`/api/frames/${bobFrame}/shop/cut-list.csv`).expect(200);
    expect(b.text).not.toBe(a.text);
    expect(csvLengths(b.text).length).toBeLessThan(csvLengths(a.text).length);
  });

  it('the saw list PDF is served again from the cache with the same bytes, and units change it', async () => {
    const url = `/api/frames/${aliceFrame}/shop/saw-list.pdf`;
    const bin = (r: ReturnType<ApiClient['get']>) =>
      r.buffer(true).parse((res, cb) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    const one = await bin(alice.get(url)).expect(200);
    const two = await bin(alice.get(url)).expect(200);
    expect(Buffer.compare(one.body as Buffer, two.body as Buffer)).toBe(0);
    const inches = await bin(alice.get(`${url}?units=in`)).expect(200);
    expect(Buffer.compare(one.body as Buffer, inches.body as Buffer)).not.toBe(0);
  });
});
