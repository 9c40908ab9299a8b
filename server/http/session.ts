import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
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
 * Sessions in PostgreSQL (table created by a migration, so nothing creates tables at run time).
 * `pruneIntervalSeconds: false` turns off the background clean-up timer (tests).
 */
export function createSessionStore(pool: pg.Pool, opts: { pruneIntervalSeconds?: number | false } = {}): session.Store {
  const PgStore = connectPgSimple(session);
  return new PgStore({
    pool,
    tableName: SESSION_TABLE,
    createTableIfMissing: false,
    pruneSessionInterval: opts.pruneIntervalSeconds ?? 15 * 60,
  });
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
