import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiErrorSchema } from '@shared/api/errors';
import { clusterPaths, isRunning, startCluster, stopCluster } from '../../scripts/lib/postgres';
import { signedIn, type ApiClient } from '../support/api-client';
import { makeUser, makeWorkshop } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// A real stop and start of the project's PostgreSQL cluster under a running app: the process stays up (an
// 'error' on an idle pooled connection with no listener would end it, and this test with it), requests get a
// 503 in our shape while the database is away, and the same session works again once it is back.

let ctx: TestContext;
let owner: ApiClient;
let workshopId: string;

beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
  const u = await makeUser(ctx.orm);
  workshopId = (await makeWorkshop(ctx.orm, [{ user: u, role: 'owner' }])).id;
  owner = await signedIn(ctx.app, u);
});
afterAll(async () => {
  startCluster();
  await ctx.close();
});

async function until(fn: () => Promise<boolean>, ms: number): Promise<number> {
  const t0 = Date.now();
  while (Date.now() - t0 < ms) {
    if (await fn()) return Date.now() - t0;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`not within ${ms} ms`);
}

describe('the database stops and comes back', () => {
  it('503 "database down" meanwhile, recovery on its own afterwards', { timeout: 120_000 }, async () => {
    // Both pools hold idle connections when the server goes away.
    await owner.get(`/api/workshops/${workshopId}/projects`).expect(200);
    await request(ctx.app).get('/api/health').expect(200);

    stopCluster();
    expect(isRunning(clusterPaths())).toBe(false);
    try {
      const health = await request(ctx.app).get('/api/health');
      expect(health.status).toBe(503);
      expect(health.body).toEqual({ ok: false, db: 'down' });

      const read = await owner.get(`/api/workshops/${workshopId}/projects`);
      expect(read.status).toBe(503);
      expect(apiErrorSchema.parse(read.body).error.code).toBe('unavailable');
      expect(read.headers['retry-after']).toBeDefined();
      const write = await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'While down' });
      expect(write.status).toBe(503);
      expect(ctx.loggedErrors).toEqual([]);
    } finally {
      startCluster();
    }

    await until(async () => (await request(ctx.app).get('/api/health')).status === 200, 30_000);
    // The session made before the stop is still valid, and writes work again.
    await owner.post(`/api/workshops/${workshopId}/projects`, { name: 'After' }).expect(201);
    const list = (await owner.get(`/api/workshops/${workshopId}/projects`).expect(200)).body as { name: string }[];
    expect(list.map((p) => p.name)).toEqual(['After']);
  });
});
