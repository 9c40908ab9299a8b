import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { delayAfter } from '../../server/modules/auth/throttle';
import { ApiClient } from '../support/api-client';
import { makeUser } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

// Sign-in limits live in PostgreSQL (every server and every restart sees them), a per-address cap spans
// e-mails, delays grow instead of locking the owner out, unknown e-mails cost a real bcrypt compare, and very
// common passwords are refused at sign-up. SIGNIN_RATE_MAX=2: two free failures per address and e-mail, six
// per address across e-mails.

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext({ SIGNIN_RATE_MAX: '2' });
  await truncateAll(ctx.orm);
});
afterAll(() => ctx.close());

async function client(app = ctx.app): Promise<ApiClient> {
  const c = new ApiClient(app);
  await c.fetchCsrf();
  return c;
}

describe('growing delays', () => {
  it('free failures cost nothing, then each doubles the wait, never past the window', () => {
    const rule = { free: 3, windowMs: 15 * 60_000, firstDelayS: 30 };
    expect([0, 1, 2].map((f) => delayAfter(f, rule))).toEqual([0, 0, 0]);
    expect([3, 4, 5].map((f) => delayAfter(f, rule))).toEqual([30, 60, 120]);
    expect(delayAfter(40, rule)).toBe(900);
  });
});

describe('limits in the database', () => {
  it('blocked after the allowance, still blocked through a second server (or a restart) on the same database', { timeout: 90_000 }, async () => {
    const user = await makeUser(ctx.orm);
    const c = await client();
    for (let i = 0; i < 2; i++) expect((await c.post('/api/auth/signin', { email: user.email, password: `nope ${i}` })).status).toBe(401);
    const blocked = await c.post('/api/auth/signin', { email: user.email, password: user.password });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);

    const other = await createTestContext({ SIGNIN_RATE_MAX: '2' });
    try {
      const c2 = await client(other.app);
      expect((await c2.post('/api/auth/signin', { email: user.email, password: user.password })).status).toBe(429);
    } finally {
      await other.close();
    }
    const rows = await ctx.orm.em.fork().getConnection().execute<{ key: string }[]>('select key from sign_in_throttles');
    expect(rows.map((r) => r.key).some((k) => k.startsWith('pair:') && k.endsWith(`|${user.email}`))).toBe(true);
  });

  it('one address trying many e-mails is capped across them', { timeout: 90_000 }, async () => {
    await truncateAll(ctx.orm);
    const c = await client();
    for (let i = 0; i < 6; i++) {
      expect((await c.post('/api/auth/signin', { email: `guess${i}@example.test`, password: 'whatever it is' })).status).toBe(401);
    }
    const user = await makeUser(ctx.orm);
    expect((await c.post('/api/auth/signin', { email: user.email, password: user.password })).status).toBe(429);
  });
});

describe('reset requests limited in the database', () => {
  it('past the allowance a reset request is 429, through a second server too, and the count is a row', { timeout: 90_000 }, async () => {
    await truncateAll(ctx.orm);
    const c = await client();
    const email = 'forgetful@example.test';
    for (let i = 0; i < 2; i++) expect((await c.post('/api/auth/password-reset', { email })).status).toBe(202);
    const blocked = await c.post('/api/auth/password-reset', { email });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);

    // Another server on the same database (or this one after a restart) sees the same count.
    const other = await createTestContext({ SIGNIN_RATE_MAX: '2' });
    try {
      const c2 = await client(other.app);
      expect((await c2.post('/api/auth/password-reset', { email })).status).toBe(429);
    } finally {
      await other.close();
    }
    const rows = await ctx.orm.em.fork().getConnection().execute<{ key: string; failures: number }[]>("select key, failures from sign_in_throttles where key like 'reset%'");
    expect(rows.find((r) => r.key.startsWith('reset:') && r.key.endsWith(`|${email}`))?.failures).toBe(2);
  });

  it('one address asking for many e-mails is capped across them', { timeout: 90_000 }, async () => {
    await truncateAll(ctx.orm);
    const c = await client();
    for (let i = 0; i < 6; i++) expect((await c.post('/api/auth/password-reset', { email: `someone${i}@example.test` })).status).toBe(202);
    expect((await c.post('/api/auth/password-reset', { email: 'someone-new@example.test' })).status).toBe(429);
  });
});

describe('no tell-tale timing, no common passwords', () => {
  it('an unknown e-mail takes about as long as a wrong password for a real one (same bcrypt cost)', { timeout: 90_000 }, async () => {
    await truncateAll(ctx.orm);
    const user = await makeUser(ctx.orm);
    const known: number[] = [];
    const unknown: number[] = [];
    for (let i = 0; i < 4; i++) {
      // A fresh caller each time, and the throttle emptied, so the limit never answers instead of bcrypt.
      await ctx.orm.em.fork().getConnection().execute('delete from sign_in_throttles');
      const c = await client();
      let t = performance.now();
      await c.post('/api/auth/signin', { email: user.email, password: 'wrong password' }).expect(401);
      known.push(performance.now() - t);
      t = performance.now();
      await c.post('/api/auth/signin', { email: `nobody${i}@example.test`, password: 'wrong password' }).expect(401);
      unknown.push(performance.now() - t);
    }
    const median = (v: number[]) => v.sort((a, b) => a - b)[Math.floor(v.length / 2)];
    // Cost 10 against 12 was a ratio of about 0.3; the same cost gives about 1.
    expect(median(unknown) / median(known)).toBeGreaterThan(0.6);
  });

  it('sign-up refuses a very common password, naming the field, and takes a good passphrase', { timeout: 90_000 }, async () => {
    const c = await client();
    const weak = await c.post('/api/auth/signup', { email: 'weak@example.test', password: 'password123', name: 'Weak' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.fields).toHaveProperty('password');
    const ok = await c.post('/api/auth/signup', { email: 'strong@example.test', password: 'galley rivet harbour lantern', name: 'Strong' });
    expect(ok.status).toBe(201);
  });
});
