import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { authResponseSchema, meResponseSchema } from '@shared/api/auth';
import { User } from '../../server/modules/users/user.entity';
import { ApiClient, sessionCookie, signedIn } from '../support/api-client';
import { makeUser, makeWorkshop, uniqueEmail } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

function sessionCookieHeader(res: request.Response): string {
  return (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('slotwright.sid='))!;
}

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
});
afterAll(() => ctx.close());

describe('sign-up', () => {
  it('creates the account, signs in, and stores the e-mail lower-cased with a cost-12 bcrypt hash', async () => {
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    const email = uniqueEmail('Mixed').replace('mixed', 'MiXeD');
    const res = await client.post('/api/auth/signup', { email: `  ${email} `, password: 'long enough password', name: ' Ada ' });
    expect(res.status).toBe(201);
    const body = authResponseSchema.parse(res.body);
    expect(body.user).toEqual({ id: expect.any(String), email: email.toLowerCase(), name: 'Ada' });
    expect(JSON.stringify(res.body)).not.toMatch(/password|\$2[aby]\$/i);

    const stored = await ctx.orm.em.fork().findOneOrFail(User, { id: body.user.id });
    expect(stored.email).toBe(email.toLowerCase());
    // bcrypt modular crypt format: $2b$<cost>$...; cost 12 as required.
    expect(stored.passwordHash).toMatch(/^\$2[aby]\$12\$/);

    client.csrf = body.csrfToken;
    const me = await client.get('/api/auth/me').expect(200);
    expect(meResponseSchema.parse(me.body).user.id).toBe(body.user.id);
  });

  it('refuses a second account for the same e-mail in another case (409, fields.email)', async () => {
    const existing = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    const res = await client.post('/api/auth/signup', { email: existing.email.toUpperCase(), password: 'long enough password', name: 'Copy' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('conflict');
    expect(res.body.error.fields).toHaveProperty('email');
  });

  it('names every bad field (400)', async () => {
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    const res = await client.post('/api/auth/signup', { email: 'not-an-email', password: 'short' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'password']);
  });

  it('refuses a password longer than bcrypt reads (72 bytes)', async () => {
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    const res = await client.post('/api/auth/signup', { email: uniqueEmail(), password: 'ü'.repeat(37), name: 'Long' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('password');
  });
});

describe('sign-in', () => {
  it('signs in with any case of the e-mail and returns the user and a new CSRF token', async () => {
    const user = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    const anonymousToken = await client.fetchCsrf();
    const res = await client.post('/api/auth/signin', { email: user.email.toUpperCase(), password: user.password });
    expect(res.status).toBe(200);
    const body = authResponseSchema.parse(res.body);
    expect(body.user).toEqual({ id: user.id, email: user.email, name: user.name });
    expect(body.csrfToken).not.toBe(anonymousToken);
  });

  it('regenerates the session id (the anonymous session is not promoted)', async () => {
    const user = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    const csrfRes = await client.agent.get('/api/auth/csrf').expect(200);
    const anonymousCookie = sessionCookie(csrfRes);
    client.csrf = csrfRes.body.token;
    const res = await client.post('/api/auth/signin', { email: user.email, password: user.password }).expect(200);
    const signedInCookie = sessionCookie(res);
    expect(signedInCookie).not.toBe(anonymousCookie);

    // The old session id no longer carries anyone.
    await request(ctx.app).get('/api/auth/me').set('Cookie', anonymousCookie).expect(401);
    await request(ctx.app).get('/api/auth/me').set('Cookie', signedInCookie).expect(200);
  });

  it('sets an httpOnly, SameSite=Lax cookie (not Secure over plain http)', async () => {
    const user = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    const res = await client.post('/api/auth/signin', { email: user.email, password: user.password }).expect(200);
    const raw = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('slotwright.sid='))!;
    expect(raw).toMatch(/HttpOnly/i);
    expect(raw).toMatch(/SameSite=Lax/i);
    expect(raw).not.toMatch(/;\s*Secure/i);
  });

  it('marks the cookie Secure when the request came over https through a trusted proxy', async () => {
    const proxied = await createTestContext({ TRUST_PROXY: 'loopback' });
    try {
      const res = await request(proxied.app).get('/api/auth/csrf').set('X-Forwarded-Proto', 'https').expect(200);
      const raw = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('slotwright.sid='))!;
      expect(raw).toMatch(/;\s*Secure/i);
      // The same header from an untrusted address changes nothing.
      const direct = await request(ctx.app).get('/api/auth/csrf').set('X-Forwarded-Proto', 'https').expect(200);
      expect(sessionCookieHeader(direct)).not.toMatch(/;\s*Secure/i);
    } finally {
      await proxied.close();
    }
  });

  it('answers a wrong password and an unknown e-mail alike: 401 invalid_credentials', async () => {
    const user = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    const wrong = await client.post('/api/auth/signin', { email: user.email, password: 'not the password' });
    const unknown = await client.post('/api/auth/signin', { email: uniqueEmail('nobody'), password: 'whatever password' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body).toEqual({ error: { code: 'invalid_credentials', message: expect.any(String) } });
    }
    await client.get('/api/auth/me').expect(401);
  });
});

describe('current user and sign-out', () => {
  it('GET /me → 401 without a session', async () => {
    const res = await request(ctx.app).get('/api/auth/me').expect(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('GET /me lists the workshops with their roles', async () => {
    const user = await makeUser(ctx.orm);
    const a = await makeWorkshop(ctx.orm, [{ user, role: 'owner' }], 'A workshop');
    const b = await makeWorkshop(ctx.orm, [{ user, role: 'viewer' }], 'B workshop');
    const client = await signedIn(ctx.app, user);
    const me = meResponseSchema.parse((await client.get('/api/auth/me').expect(200)).body);
    expect(me.memberships).toEqual([
      { workshop: { id: a.id, name: 'A workshop' }, role: 'owner' },
      { workshop: { id: b.id, name: 'B workshop' }, role: 'viewer' },
    ]);
    expect(me.csrfToken).toBe(client.csrf);
  });

  it('sign-out ends the session (204, then 401)', async () => {
    const user = await makeUser(ctx.orm);
    const client = await signedIn(ctx.app, user);
    await client.post('/api/auth/signout').expect(204);
    await client.get('/api/auth/me').expect(401);
  });
});
