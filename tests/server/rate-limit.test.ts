import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ApiClient } from '../support/api-client';
import { makeUser } from '../support/factories';
import { createTestContext, truncateAll, type TestContext } from '../support/test-app';

let ctx: TestContext;
beforeAll(async () => {
  // The production default: 10 failed attempts per address and e-mail in 15 minutes.
  ctx = await createTestContext();
  await truncateAll(ctx.orm);
});
afterAll(() => ctx.close());

describe('sign-in rate limit', () => {
  it('after 10 failed attempts the 11th is refused with 429, even with the right password', async () => {
    expect(ctx.config.signInRateLimit).toEqual({ max: 10, windowMs: 15 * 60_000 });
    const user = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    await client.fetchCsrf();
    for (let i = 0; i < 10; i++) {
      const res = await client.post('/api/auth/signin', { email: user.email, password: `wrong guess ${i}` });
      expect(res.status).toBe(401);
    }
    const blocked = await client.post('/api/auth/signin', { email: user.email, password: user.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.headers['ratelimit-policy'] ?? blocked.headers['ratelimit']).toBeDefined();

    // The limit is per address and e-mail: someone else signing in from the same address is not locked out.
    const other = await makeUser(ctx.orm);
    const ok = await client.post('/api/auth/signin', { email: other.email, password: other.password });
    expect(ok.status).toBe(200);
  }, 90_000);

  it('successful sign-ins do not use up the allowance', async () => {
    const user = await makeUser(ctx.orm);
    const client = new ApiClient(ctx.app);
    for (let i = 0; i < 11; i++) {
      const res = await client.signIn(user.email, user.password);
      expect(res.status).toBe(200);
    }
  }, 90_000);
});
