// Database migrations (MikroORM migrator, TypeScript files in migrations/).
//   tsx scripts/migrate.ts            run pending migrations (what npm start / npm test do)
//   tsx scripts/migrate.ts create     write a new migration from the difference between the entities and the schema
//   tsx scripts/migrate.ts status     list executed and pending migrations
// Reads DATABASE_URL (through server/config.ts).
import { pathToFileURL } from 'node:url';
import pg from 'pg';
import { loadConfig } from '../server/config';
import { createOrm } from '../server/db';

/** pg_advisory_lock key for migrations: any fixed bigint, the same for every server and script on the database. */
export const MIGRATION_LOCK_KEY = 5_117_113_000_101;

/**
 * Runs every pending migration; returns the names it ran (empty when the schema is up to date). Two servers
 * starting at once on one database take turns: the second waits on a PostgreSQL advisory lock, then finds
 * nothing left to run.
 */
export async function runMigrations(databaseUrl?: string): Promise<string[]> {
  const config = loadConfig(databaseUrl ? { ...process.env, DATABASE_URL: databaseUrl } : process.env);
  const lock = new pg.Client({ connectionString: config.databaseUrl });
  await lock.connect();
  try {
    await lock.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    const orm = await createOrm(config);
    try {
      const done = await orm.getMigrator().up();
      return done.map((m) => m.name);
    } finally {
      await orm.close(true);
    }
  } finally {
    // Ending the session releases the lock too, should the unlock itself fail.
    await lock.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => undefined);
    await lock.end();
  }
}

/** Writes a migration for whatever the entities changed; returns its file name, or null when nothing changed. */
export async function createMigration(initial = false): Promise<string | null> {
  const orm = await createOrm(loadConfig());
  try {
    const result = await orm.getMigrator().createMigration(undefined, false, initial);
    return result.diff.up.length > 0 ? result.fileName : null;
  } finally {
    await orm.close(true);
  }
}

async function status(): Promise<{ executed: string[]; pending: string[] }> {
  const orm = await createOrm(loadConfig());
  try {
    const migrator = orm.getMigrator();
    const executed = (await migrator.getExecutedMigrations()).map((m) => m.name);
    const pending = (await migrator.getPendingMigrations()).map((m) => m.name);
    return { executed, pending };
  } finally {
    await orm.close(true);
  }
}

async function main(argv: string[]): Promise<void> {
  const [command = 'up'] = argv;
  if (command === 'up') {
    const ran = await runMigrations();
    console.log(ran.length ? `Migrated: ${ran.join(', ')}` : 'Database schema is up to date.');
  } else if (command === 'create' || command === 'create-initial') {
    const file = await createMigration(command === 'create-initial');
    console.log(file ? `Wrote migrations/${file}` : 'No schema changes to migrate.');
  } else if (command === 'status') {
    console.log(JSON.stringify(await status(), null, 2));
  } else {
    throw new Error(`usage: migrate [up|create|create-initial|status] (unknown command "${command}")`);
  }
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  main(process.argv.slice(2)).catch((err: unknown) => {
    console.error(`migrate: ${err instanceof Error ? err.message : String(err)}`);
    process.exit(1);
  });
}
