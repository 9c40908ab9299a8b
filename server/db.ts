import { MikroORM } from '@mikro-orm/postgresql';
import pg from 'pg';
import type { Config } from './config';
import { ormOptions } from './mikro-orm.config';

export type Orm = MikroORM;

/** Connects the ORM (no schema changes: migrations are run by scripts/migrate.ts). */
export async function createOrm(config: Pick<Config, 'databaseUrl' | 'dbPoolMax' | 'logSql'>): Promise<Orm> {
  return MikroORM.init(ormOptions(config));
}

/** A small pg pool for the session store, separate from the ORM's so each can be closed on its own. */
export function createSessionPool(config: Pick<Config, 'databaseUrl'>): pg.Pool {
  return new pg.Pool({ connectionString: config.databaseUrl, max: 4 });
}
