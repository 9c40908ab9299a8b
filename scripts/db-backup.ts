// `npm run db:backup [-- FILE]`: the whole app database (default `slotwright`, or SLOTWRIGHT_DB) of the local
// cluster to one pg_dump file in PostgreSQL's custom format (compressed; restorable table by table), by default
// .data/backups/<database>-<UTC time>.dump. Safe while the app runs: pg_dump reads one consistent snapshot.
import { mkdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { clusterPaths, databaseUrl, isRunning, projectRoot } from './lib/postgres.ts';
import { sh } from './lib/run.ts';

const database = process.env.SLOTWRIGHT_DB ?? 'slotwright';
const c = clusterPaths();
if (!c.bin || !isRunning(c)) throw new Error('The local PostgreSQL cluster is not running: `npm run db:up` first');
const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\..*/, 'Z');
const file = resolve(process.argv[2] ?? join(projectRoot, '.data', 'backups', `${database}-${stamp}.dump`));
mkdirSync(dirname(file), { recursive: true });
sh(join(c.bin, 'pg_dump'), ['--format=custom', '--no-owner', '--no-privileges', `--file=${file}`, databaseUrl(c, database)], { cwd: projectRoot });
console.log(`Backed up ${database} to ${file}`);
