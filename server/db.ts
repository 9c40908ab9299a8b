import { MikroORM } from '@mikro-orm/postgresql';
import pg from 'pg';
import type { Config } from './config';
import { ormOptions } from './mikro-orm.config';

export type Orm = MikroORM;

/** Connects the ORM (no schema changes: migrations are run by scripts/migrate.ts). */
export async function createOrm(config: Pick<Config, 'databaseUrl' | 'dbPoolMax' | 'logSql'>): Promise<Orm> {
  return MikroORM.init(ormOptions(config));
}

/**
 * A small pg pool for the session store, separate from the ORM's so each can be closed on its own. An idle
 * client whose server went away emits 'error' on the pool; without a listener that would end the process, so
 * it is noted and the pool opens a fresh client on the next request.
 */
export function createSessionPool(config: Pick<Config, 'databaseUrl'>): pg.Pool {
  const pool = new pg.Pool({ connectionString: config.databaseUrl, max: 4, connectionTimeoutMillis: 5_000, idleTimeoutMillis: 30_000 });
  pool.on('error', (err: Error & { code?: string }) => {
    console.warn(`session database connection lost (${err.code ?? err.name}); reconnecting on the next request`);
  });
  return pool;
}

/** True when an error means the database cannot be reached right now (rather than a bad query). */
export function isDatabaseDown(err: unknown): boolean {
  if (!(err instanceof Error)) return false;
  if (err.name === 'ConnectionException') return true;
  const code = (err as { code?: unknown }).code;
  if (typeof code !== 'string') return /Connection terminated|timeout exceeded when trying to connect|Knex: Timeout acquiring a connection/i.test(err.message);
  // 08xxx connection exceptions (but 08P01, a protocol violation such as a NUL in a parameter, is a bad
  // request's fault), 57P01-57P03 admin shutdown / crash shutdown / cannot connect now.
  if (code === '08P01') return false;
  return /^08|^57P0[123]$|^ECONNREFUSED$|^ECONNRESET$|^ETIMEDOUT$|^EPIPE$/.test(code);
}
