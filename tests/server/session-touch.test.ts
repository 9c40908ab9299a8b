import type session from 'express-session';
import type pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSessionPool } from '../../server/db';
import { createSessionStore } from '../../server/http/session';
import { testConfig } from '../support/test-app';

// A session in use is pushed on in the sessions table at most once per interval, not on every request.

let pool: pg.Pool;
let updates: string[];
beforeAll(() => {
  pool = createSessionPool(testConfig());
  updates = [];
  const query = pool.query.bind(pool) as (...a: unknown[]) => unknown;
  (pool as unknown as { query: (...a: unknown[]) => unknown }).query = (...a: unknown[]) => {
    if (typeof a[0] === 'string' && /^UPDATE/i.test(a[0])) updates.push(a[0]);
    return query(...a);
  };
});
afterAll(() => pool.end());

const call = (f: (cb: (err?: unknown) => void) => void) => new Promise<void>((res, rej) => f((err) => (err ? rej(err) : res())));

function sessionData(expires: Date): session.SessionData {
  return { cookie: { originalMaxAge: 3_600_000, expires, httpOnly: true, path: '/' } } as unknown as session.SessionData;
}

async function expiryOf(sid: string): Promise<number> {
  const r = await pool.query<{ expire: Date }>('SELECT expire FROM session WHERE sid = $1', [sid]);
  return r.rows[0].expire.getTime();
}

describe('session touch', () => {
  it('skips the UPDATE within the interval after a save or a touch, and pushes the expiry on after it', async () => {
    let clock = 1_000_000;
    const store = createSessionStore(pool, { pruneIntervalSeconds: false, touchEveryMs: 60_000, now: () => clock });
    const sid = `touch-${Date.now()}-${Math.random()}`;
    const t0 = new Date(Date.now() + 3_600_000);
    await call((cb) => store.set(sid, sessionData(t0), cb));
    updates.length = 0;

    for (let k = 0; k < 5; k++) {
      clock += 10_000;
      await call((cb) => store.touch!(sid, sessionData(new Date(t0.getTime() + clock)), cb));
    }
    expect(updates).toEqual([]);
    expect(Math.abs((await expiryOf(sid)) - t0.getTime())).toBeLessThan(1000);

    clock += 60_000;
    const later = new Date(t0.getTime() + 7_200_000);
    await call((cb) => store.touch!(sid, sessionData(later), cb));
    expect(updates).toHaveLength(1);
    expect(Math.abs((await expiryOf(sid)) - later.getTime())).toBeLessThan(1000);

    await call((cb) => store.destroy(sid, cb));
  });

  it('touches a session this process has not seen yet (another server saved it, or a restart)', async () => {
    const writer = createSessionStore(pool, { pruneIntervalSeconds: false });
    const reader = createSessionStore(pool, { pruneIntervalSeconds: false });
    const sid = `touch-other-${Date.now()}-${Math.random()}`;
    await call((cb) => writer.set(sid, sessionData(new Date(Date.now() + 3_600_000)), cb));
    updates.length = 0;
    const later = new Date(Date.now() + 7_200_000);
    await call((cb) => reader.touch!(sid, sessionData(later), cb));
    await call((cb) => reader.touch!(sid, sessionData(later), cb));
    expect(updates).toHaveLength(1);
    expect(Math.abs((await expiryOf(sid)) - later.getTime())).toBeLessThan(1000);
    await call((cb) => writer.destroy(sid, cb));
  });
});
