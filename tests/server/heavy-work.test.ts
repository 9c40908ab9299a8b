import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiErrorSchema } from '@shared/api/errors';
import { revisionComparisonSchema } from '@shared/api/frames';
import { signedIn, type ApiClient } from '../support/api-client';
import { makeFrame, makeProject, makeUser, makeWorkshop } from '../support/factories';
import { demoDocument } from './shop-world';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Plans and revision compares run in a pool of worker threads behind a bounded queue. Here the pool is one thread
// and a queue of one, so the limits show with three requests.

let ctx: TestContext;
let user: ApiClient;
let frameId: string;

beforeAll(async () => {
  ctx = await createTestContext({}, { threads: 1, queue: 1 });
  await truncateAll(ctx.orm);
  const u = await makeUser(ctx.orm);
  user = await signedIn(ctx.app, u);
  const project = await makeProject(ctx.orm, await makeWorkshop(ctx.orm, [{ user: u, role: 'owner' }]));
  frameId = (await makeFrame(ctx.orm, project, { document: demoDocument() })).id;
});
afterAll(() => ctx.close());

// Hundreds of distinct lengths and thousands of pieces on one bar length: too large for the search to prove its
// plan optimal early, so it uses its limit.
const slowJob = () => ({
  kerf: 3,
  stock: [{ length: 6000 }],
  parts: Array.from({ length: 400 }, (_, i) => ({ length: 700 + ((i * 7919) % 2300), qty: 20 })),
});

/** Runs `during` while one slow plan holds the pool's thread and another fills its queue; both plans must finish. */
async function whilePoolIsFull<T>(during: () => Promise<T>): Promise<T> {
  const first = user.post('/api/plan/cut', { job: slowJob(), timeLimitMs: 1500 }).then((r) => r);
  await new Promise((r) => setTimeout(r, 300));
  const second = user.post('/api/plan/cut', { job: slowJob(), timeLimitMs: 200 }).then((r) => r);
  await new Promise((r) => setTimeout(r, 100));
  const out = await during();
  expect([(await first).status, (await second).status]).toEqual([200, 200]);
  return out;
}

describe('POST /api/plan/cut under load', () => {
  it('a quantity of 1e9 is refused with 400 naming the parts, before any planning', async () => {
    const res = await user.post('/api/plan/cut', { job: { stock: [{ length: 6000 }], parts: [{ length: 500, qty: 1e9 }] } });
    expect(res.status).toBe(400);
    expect(apiErrorSchema.parse(res.body).error.fields).toHaveProperty(['job.parts']);
  });

  it('past the queue → 503 with Retry-After; the running and the queued plan still finish', async () => {
    const third = await whilePoolIsFull(() => user.post('/api/plan/cut', { job: slowJob(), timeLimitMs: 200 }));
    expect(third.status).toBe(503);
    expect(apiErrorSchema.parse(third.body).error.code).toBe('unavailable');
    expect(Number(third.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('a revision compare and the cutting view wait in the same queue: past it 503, and once the plans are done they answer', async () => {
    // Worked out on the event loop, their reports would come at once however busy the pool is.
    const [compare, cutting] = await whilePoolIsFull(() =>
      Promise.all([user.get(`/api/frames/${frameId}/revisions/compare?from=1&to=1`), user.get(`/api/frames/${frameId}/cutting`)]),
    );
    for (const busy of [compare, cutting]) {
      expect(busy.status).toBe(503);
      expect(Number(busy.headers['retry-after'])).toBeGreaterThan(0);
    }
    const res = await user.get(`/api/frames/${frameId}/revisions/compare?from=1&to=1`).expect(200);
    expect(revisionComparisonSchema.parse(res.body).diff.totals.same).toBe((demoDocument().members as unknown[]).length);
    await user.get(`/api/frames/${frameId}/cutting`).expect(200);
  });

  it('a client that leaves ends its plan: its worker thread is ended and replaced, the next caller is served', async () => {
    const before = ctx.workers.stats;
    await user.post('/api/plan/cut', { job: slowJob(), timeLimitMs: 5000 }).timeout(600).catch(() => undefined);
    for (let i = 0; i < 50 && ctx.workers.stats.cancelled === before.cancelled; i++) await new Promise((r) => setTimeout(r, 100));
    expect(ctx.workers.stats.cancelled).toBe(before.cancelled + 1);
    const next = await user.post('/api/plan/cut', { job: { stock: [{ length: 6000 }], parts: [{ length: 500, qty: 3 }] }, timeLimitMs: 0 });
    expect(next.status).toBe(200);
    // piscina terminates the thread running an aborted task: none of the threads from before is left.
    expect(ctx.workers.stats.threadIds.filter((id) => before.threadIds.includes(id))).toEqual([]);
    expect(ctx.loggedErrors).toEqual([]);
  });
});

describe('the sheet-plan PDF', () => {
  it('is made in the worker pool like the other shop documents: 503 while the pool is full, a PDF once it is free', async () => {
    const owner = await makeUser(ctx.orm);
    const workshop = await makeWorkshop(ctx.orm, [{ user: owner, role: 'owner' }]);
    const frame = await makeFrame(ctx.orm, await makeProject(ctx.orm, workshop), { document: demoDocument() });
    const shop = await signedIn(ctx.app, owner);
    const running = user.post('/api/plan/cut', { job: slowJob(), timeLimitMs: 1500 }).then((r) => r);
    await new Promise((r) => setTimeout(r, 300));
    const queued = user.post('/api/plan/cut', { job: slowJob(), timeLimitMs: 200 }).then((r) => r);
    await new Promise((r) => setTimeout(r, 100));
    // One thread busy and one task queued: a document made on the event loop would not notice.
    const busy = await shop.get(`/api/frames/${frame.id}/shop/sheet-plan.pdf`);
    expect(busy.status).toBe(503);
    expect(Number(busy.headers['retry-after'])).toBeGreaterThan(0);
    expect((await running).status).toBe(200);
    expect((await queued).status).toBe(200);
    const made = await shop.get(`/api/frames/${frame.id}/shop/sheet-plan.pdf`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (d: Buffer) => chunks.push(d));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(made.status).toBe(200);
    expect(made.headers['content-type']).toBe('application/pdf');
    expect((made.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
  });
});
