import type { EntityManager } from '@mikro-orm/postgresql';
import { HttpError } from '../../errors';

/**
 * Growing delays instead of a lockout: the first `free` failures in a window cost nothing; each one after that
 * blocks the key for twice as long as the one before (from `firstDelayS`, at most the window). Waiting it out
 * always works, so an attacker can slow an owner down but never lock them out for good; and the owner's own
 * address has its own key (`pair:`), apart from a stranger's.
 */
export interface ThrottleRule {
  free: number;
  windowMs: number;
  firstDelayS: number;
}

export function delayAfter(failures: number, rule: ThrottleRule): number {
  if (failures < rule.free) return 0;
  return Math.min(rule.windowMs / 1000, rule.firstDelayS * 2 ** (failures - rule.free));
}

/** Seconds the caller must still wait on any of these keys (0: go ahead). */
export async function waitFor(em: EntityManager, keys: string[]): Promise<number> {
  const rows = await em
    .getConnection()
    .execute<{ wait: string | null }[]>(
      `select max(extract(epoch from blocked_until - now())) as wait from sign_in_throttles where key in (${keys.map(() => '?').join(', ')}) and blocked_until > now()`,
      keys,
    );
  const w = Number(rows[0]?.wait ?? 0);
  return w > 0 ? Math.ceil(w) : 0;
}

/** Counts one failure on `key` (a new window once the old one is over) and sets its block; returns the count. */
export async function recordFailure(em: EntityManager, key: string, rule: ThrottleRule): Promise<number> {
  const windowS = rule.windowMs / 1000;
  const rows = await em.getConnection().execute<{ failures: number }[]>(
    `insert into sign_in_throttles (key, failures, window_started_at, blocked_until) values (?, 1, now(), null)
     on conflict (key) do update set
       failures = case when sign_in_throttles.window_started_at < now() - make_interval(secs => ?) then 1 else sign_in_throttles.failures + 1 end,
       window_started_at = case when sign_in_throttles.window_started_at < now() - make_interval(secs => ?) then now() else sign_in_throttles.window_started_at end
     returning failures`,
    [key, windowS, windowS],
  );
  const failures = Number(rows[0].failures);
  const delay = delayAfter(failures, rule);
  if (delay > 0) {
    await em.getConnection().execute(`update sign_in_throttles set blocked_until = now() + make_interval(secs => ?) where key = ?`, [delay, key]);
  }
  return failures;
}

export async function forget(em: EntityManager, key: string): Promise<void> {
  await em.getConnection().execute('delete from sign_in_throttles where key = ?', [key]);
}

/** Throws 429 with Retry-After (and a RateLimit-Policy header's worth of information) when a key is blocked. */
export async function refuseIfBlocked(em: EntityManager, keys: string[], message: string): Promise<void> {
  const wait = await waitFor(em, keys);
  if (wait > 0) {
    const err = new HttpError('rate_limited', `${message} (about ${wait} s)`);
    err.retryAfterS = wait;
    throw err;
  }
}

/** Old rows are of no use once their window and block are over. */
export async function pruneThrottles(em: EntityManager, olderThanMs: number): Promise<void> {
  await em
    .getConnection()
    .execute(`delete from sign_in_throttles where window_started_at < now() - make_interval(secs => ?) and (blocked_until is null or blocked_until < now())`, [olderThanMs / 1000]);
}
