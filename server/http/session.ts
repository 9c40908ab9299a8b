import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import { LRUCache } from 'lru-cache';
import type { RequestHandler } from 'express';
import type pg from 'pg';
import type { Config } from '../config';
import { SESSION_TABLE } from '../mikro-orm.config';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
    csrfToken?: string;
  }
}

export const SESSION_COOKIE = 'slotwright.sid';

/**
 * How often a session in use has its expiry pushed on. express-session touches the store on every request, which
 * was an UPDATE of the sessions table per API call; pushing it on at most this often keeps a session in use alive
 * (it ends at most this much earlier than a touch per request would make it) for one small read per request.
 */
export const SESSION_TOUCH_EVERY_MS = 5 * 60_000;

/**
 * Sessions in PostgreSQL (table created by a migration, so nothing creates tables at run time).
 * `pruneIntervalSeconds: false` turns off the background clean-up timer (tests); `touchEveryMs` see above.
 */
export function createSessionStore(pool: pg.Pool, opts: { pruneIntervalSeconds?: number | false; touchEveryMs?: number; now?: () => number } = {}): session.Store {
  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: SESSION_TABLE,
    createTableIfMissing: false,
    pruneSessionInterval: opts.pruneIntervalSeconds ?? 15 * 60,
  });
  const every = opts.touchEveryMs ?? SESSION_TOUCH_EVERY_MS;
  const now = opts.now ?? Date.now;
  // When this process last pushed each session on; a session it has not seen is touched at once. Bounded: a
  // forgotten one only costs one UPDATE more.
  const touchedAt = new LRUCache<string, number>({ max: 50_000 });
  const touch = store.touch.bind(store);
  store.touch = (sid, sess, done) => {
    const last = touchedAt.get(sid);
    if (last !== undefined && now() - last < every) return done?.();
    touchedAt.set(sid, now());
    touch(sid, sess, done);
  };
  // A saved session has just had its expiry written.
  const set = store.set.bind(store);
  store.set = (sid, sess, done) => {
    touchedAt.set(sid, now());
    set(sid, sess, done);
  };
  const destroy = store.destroy.bind(store);
  store.destroy = (sid, done) => {
    touchedAt.delete(sid);
    destroy(sid, done);
  };
  return store;
}

export function sessionMiddleware(config: Config, store: session.Store): RequestHandler {
  return session({
    store,
    name: SESSION_COOKIE,
    secret: config.sessionSecret,
    resave: false,
    // An anonymous session is stored only once it holds something (the CSRF token).
    saveUninitialized: false,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: config.cookieSecure,
      maxAge: config.sessionMaxAgeMs,
      path: '/',
    },
  });
}

/** express-session's callback API as promises. */
export function regenerateSession(req: Express.Request & { session: session.Session }): Promise<void> {
  return new Promise((resolve, reject) => req.session.regenerate((err: unknown) => (err ? reject(err) : resolve())));
}

export function saveSession(req: { session: session.Session }): Promise<void> {
  return new Promise((resolve, reject) => req.session.save((err: unknown) => (err ? reject(err) : resolve())));
}

export function destroySession(req: { session: session.Session }): Promise<void> {
  return new Promise((resolve, reject) => req.session.destroy((err: unknown) => (err ? reject(err) : resolve())));
}
