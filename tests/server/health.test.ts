import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { healthResponseSchema } from '@shared/api/errors';
import { createApp, disposeApp } from '../../server/app';
import { createTestContext, type TestContext } from '../support/test-app';

describe('GET /api/health', () => {
  let ctx: TestContext;
  beforeAll(async () => {
    ctx = await createTestContext();
  });
  afterAll(() => ctx.close());

  it('reports the database up', async () => {
    const res = await request(ctx.app).get('/api/health').expect(200);
    expect(healthResponseSchema.parse(res.body)).toEqual({ ok: true, db: 'up' });
  });

  it('answers without creating a session', async () => {
    const res = await request(ctx.app).get('/api/health').expect(200);
    expect(res.headers['set-cookie']).toBeUndefined();
  });

  it('reports 503 when the database cannot be reached', async () => {
    // Nothing listens on port 1; the probe's own connection fails at once.
    const app = createApp({ orm: ctx.orm, config: { ...ctx.config, databaseUrl: 'postgres://slotwright@127.0.0.1:1/none' }, workers: ctx.workers });
    try {
      const res = await request(app).get('/api/health');
      expect(res.status).toBe(503);
      expect(res.body).toEqual({ ok: false, db: 'down' });
      expect(res.headers['retry-after']).toBe('5');
    } finally {
      await disposeApp(app);
    }
  });

  it('an app given no session store opens its own PostgreSQL store and closes it on dispose', async () => {
    const app = createApp({ orm: ctx.orm, config: ctx.config });
    try {
      const res = await request(app).get('/api/auth/csrf').expect(200);
      expect(res.body.token).toEqual(expect.any(String));
      const cookie = String(res.headers['set-cookie']).split(';')[0];
      const rows = await ctx.orm.em.fork().getConnection().execute('select count(*)::int as n from "session"');
      expect(rows[0].n).toBeGreaterThan(0);
      expect(cookie).toMatch(/^slotwright\.sid=/);
    } finally {
      await disposeApp(app);
    }
  });
});
