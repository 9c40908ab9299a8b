import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient, signedIn } from '../support/api-client';
import { makeUser } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
});
afterAll(() => ctx.close());
afterEach(() => {
  expect(ctx.loggedErrors).toEqual([]);
});

const job = { kerf: 3, trim: 0, minOffcut: 100, stock: [{ length: 6000, price: 30, qty: null }], parts: [{ length: 1200, qty: 4, label: 'A' }] };

describe('POST /api/plan/cut', () => {
  it('plans a pasted job for a signed-in user', async () => {
    const client = await signedIn(ctx.app, await makeUser(ctx.orm));
    const res = await client.post('/api/plan/cut', { job, timeLimitMs: 200 }).expect(200);
    // By hand: 4 × 1200 + 3 × 3 = 4809 mm on one 6000 mm bar; the 1191 mm leftover keeps 1188 mm after one more kerf.
    expect(res.body).toMatchObject({ barCount: 1, lowerBound: 1, optimal: true, cost: 30 });
    expect(res.body.bars[0].offcut).toBe(1188);
  });

  it('plans with the exact solver (HiGHS) in the worker thread, like the command line', async () => {
    const client = await signedIn(ctx.app, await makeUser(ctx.orm));
    // 8 × 1532 + 2 × 345 on 6 m at 72 and 3 m at 30: by hand, 2 × 6 m (3 × 1532 + 345 each, 5313 mm with kerfs) and
    // 2 × 3 m (1532 each) cost 204, the least (the exact model agrees).
    const priced = {
      kerf: 3,
      trim: 0,
      minOffcut: 100,
      stock: [{ length: 6000, price: 72 }, { length: 3000, price: 30 }],
      parts: [{ length: 1532, qty: 8, label: 'A' }, { length: 345, qty: 2, label: 'B' }],
    };
    const res = await client.post('/api/plan/cut', { job: priced, timeLimitMs: 2000 }).expect(200);
    expect(res.body.stats.mip).toBe(true);
    expect(res.body).toMatchObject({ cost: 204, optimal: true });
  });

  it('refuses a caller who is not signed in', async () => {
    const anon = new ApiClient(ctx.app);
    await anon.fetchCsrf();
    expect((await anon.post('/api/plan/cut', { job })).status).toBe(401);
  });

  it('names the bad field and the part at fault', async () => {
    const client = await signedIn(ctx.app, await makeUser(ctx.orm));
    const neg = await client.post('/api/plan/cut', { job: { ...job, kerf: -1 } });
    expect(neg.status).toBe(400);
    expect(neg.body.error.fields['job.kerf']).toBeTruthy();
    const long = await client.post('/api/plan/cut', { job: { ...job, parts: [{ length: 7000, qty: 1, label: 'A' }] } });
    expect(long.status).toBe(422);
    expect(long.body.error.message).toContain("part 'A' (7000 mm) is longer than every stock bar (6000 mm)");
    const slow = await client.post('/api/plan/cut', { job, timeLimitMs: 60_000 });
    expect(slow.status).toBe(400);
    expect(slow.body.error.fields.timeLimitMs).toBeTruthy();
  });
});
