import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api-client';
import { makeUser, makeWorkshop } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Two app servers on one database, sharing nothing else (each has its own ORM, session pool and workers): what
// one of them knows, the other knows too, because it lives in PostgreSQL.

let a: TestContext;
let b: TestContext;
beforeAll(async () => {
  a = await createTestContext();
  b = await createTestContext();
  await truncateAll(a.orm);
});
afterAll(async () => {
  await a.close();
  await b.close();
});

describe('two servers, one database', () => {
  it('a session made on one is valid on the other, for reads and writes, until signed out on either', { timeout: 90_000 }, async () => {
    const user = await makeUser(a.orm);
    const workshopId = (await makeWorkshop(a.orm, [{ user, role: 'owner' }])).id;
    const onA = new ApiClient(a.app);
    const signIn = await onA.signIn(user.email, user.password);
    expect(signIn.status).toBe(200);
    const cookie = String(signIn.headers['set-cookie']).split(';')[0];
    const csrf = onA.csrf as string;

    const me = await request(b.app).get('/api/auth/me').set('Cookie', cookie);
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(user.email);
    await request(b.app).post(`/api/workshops/${workshopId}/projects`).set('Cookie', cookie).set('X-CSRF-Token', csrf).send({ name: 'Made on B' }).expect(201);
    const list = await onA.get(`/api/workshops/${workshopId}/projects`).expect(200);
    expect(list.body.map((p: { name: string }) => p.name)).toEqual(['Made on B']);

    await request(b.app).post('/api/auth/signout').set('Cookie', cookie).set('X-CSRF-Token', csrf).expect(204);
    expect((await onA.get('/api/auth/me')).status).toBe(401);
  });

  it('sign-in limits counted on one server hold on the other', { timeout: 90_000 }, async () => {
    const c = await createTestContext({ SIGNIN_RATE_MAX: '1' });
    const d = await createTestContext({ SIGNIN_RATE_MAX: '1' });
    try {
      const user = await makeUser(c.orm);
      const onC = new ApiClient(c.app);
      await onC.fetchCsrf();
      expect((await onC.post('/api/auth/signin', { email: user.email, password: 'not it at all' })).status).toBe(401);
      const onD = new ApiClient(d.app);
      expect((await onD.signIn(user.email, user.password)).status).toBe(429);
    } finally {
      await c.close();
      await d.close();
    }
  });
});
