// `npm run db:restore -- FILE`: replaces the app database (default `slotwright`, or SLOTWRIGHT_DB) of the local
// cluster with a file made by `npm run db:backup`. Stop the app first: the database is dropped and created again
// (open connections are ended), then pg_restore loads the file in one transaction, so a bad file changes nothing
// past the drop; then pending migrations run, so an older backup comes up on the current schema.
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { clusterPaths, databaseUrl, ensureDatabase, isRunning, projectRoot } from './lib/postgres.ts';
import { sh } from './lib/run.ts';
import { runMigrations } from './migrate.ts';

const database = process.env.SLOTWRIGHT_DB ?? 'slotwright';
const arg = process.argv[2];
if (!arg) throw new Error('usage: npm run db:restore -- FILE.dump');
const file = resolve(arg);
if (!existsSync(file)) throw new Error(`no such file: ${file}`);
const c = clusterPaths();
if (!c.bin || !isRunning(c)) throw new Error('The local PostgreSQL cluster is not running: `npm run db:up` first');
const url = await ensureDatabase(c, database, true);
sh(join(c.bin, 'pg_restore'), ['--no-owner', '--no-privileges', '--single-transaction', '--exit-on-error', `--dbname=${url}`, file], { cwd: projectRoot });
const ran = await runMigrations(databaseUrl(c, database));
console.log(`Restored ${database} from ${file}${ran.length ? ` (then migrated: ${ran.join(', ')})` : ''}`);
