import { fileURLToPath } from 'node:url';
import { defineConfig, type Options } from '@mikro-orm/postgresql';
import { Migrator } from '@mikro-orm/migrations';
import type { Config } from './config';
import { entities } from './entities';

const migrationsDir = fileURLToPath(new URL('../migrations', import.meta.url));

/** The sessions table belongs to connect-pg-simple; it is created by a migration and left out of schema diffs. */
export const SESSION_TABLE = 'session';

export function ormOptions(config: Pick<Config, 'databaseUrl' | 'dbPoolMax' | 'logSql'>): Options {
  return defineConfig({
    clientUrl: config.databaseUrl,
    entities,
    extensions: [Migrator],
    discovery: { disableDynamicFileAccess: true },
    // Fail loudly if something uses the global EntityManager outside a request context.
    allowGlobalContext: false,
    forceUtcTimezone: true,
    // A request waits at most 5 s for a connection: with the database down it gets a 503 rather than hanging.
    pool: { min: 0, max: config.dbPoolMax, acquireTimeoutMillis: 5_000 },
    driverOptions: { connection: { connectionTimeoutMillis: 5_000 } },
    debug: config.logSql,
    schemaGenerator: { skipTables: [SESSION_TABLE] },
    migrations: {
      tableName: 'mikro_orm_migrations',
      path: migrationsDir,
      pathTs: migrationsDir,
      glob: '!(*.d).{js,ts}',
      emit: 'ts',
      // No snapshot file: running migrations would rewrite a committed file. `migrate create` diffs the
      // entities against a migrated development database instead.
      snapshot: false,
      transactional: true,
      allOrNothing: true,
      disableForeignKeys: false,
    },
  });
}

// The mikro-orm CLI reads this default export (package.json "mikro-orm".configPaths); the app itself
// calls ormOptions(config) with the validated config.
export default async function cliOptions(): Promise<Options> {
  const { loadConfig } = await import('./config');
  return ormOptions(loadConfig());
}
