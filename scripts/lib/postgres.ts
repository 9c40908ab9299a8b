// The project-local PostgreSQL cluster: installed from Debian's packages when missing, kept in .data/pg (or, when
// the postgres user cannot reach the project folder, in /var/lib/slotwright/<folder hash>), listening on 127.0.0.1
// only, with its socket in a folder of ours. As root, every server command runs as the postgres user, which
// PostgreSQL requires.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, chmodSync, chownSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { aptInstall, capture, isRoot, logged, logPath } from './run.ts';

export const projectRoot = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
export const appUser = 'slotwright';

export interface Cluster {
  bin: string;
  base: string;
  data: string;
  socketDir: string;
  logFile: string;
  port: number;
}

function findBin(): string | null {
  const root = '/usr/lib/postgresql';
  if (existsSync(root)) {
    const versions = readdirSync(root)
      .filter((v) => existsSync(join(root, v, 'bin', 'initdb')))
      .sort((a, b) => Number(b) - Number(a));
    if (versions[0]) return join(root, versions[0], 'bin');
  }
  const cfg = capture('pg_config', ['--bindir']);
  if (cfg.ok && existsSync(join(cfg.out, 'initdb'))) return cfg.out;
  return null;
}

function postgresIds(): { uid: number; gid: number } {
  const uid = Number(capture('id', ['-u', 'postgres']).out);
  const gid = Number(capture('id', ['-g', 'postgres']).out);
  if (!Number.isInteger(uid) || !Number.isInteger(gid)) throw new Error('the postgres system user is missing');
  return { uid, gid };
}

/** A PostgreSQL server program's command line, as the postgres user when we are root. */
function serverCommand(cmd: string, args: string[]): [string, string[]] {
  return isRoot() ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
}

/** Runs a server program; its output goes to .data/logs/postgres.log (the server's own log is `logFile`). */
function asServerUser(cmd: string, args: string[]): void {
  logged('postgres', ...serverCommand(cmd, args), { cwd: '/' });
}

function serverUserCanReach(dir: string): boolean {
  if (!isRoot()) return true;
  return capture('runuser', ['-u', 'postgres', '--', 'test', '-x', dir], { cwd: '/' }).ok;
}

function chooseBase(): string {
  if (process.env.SLOTWRIGHT_PGBASE) return resolve(process.env.SLOTWRIGHT_PGBASE);
  const local = join(projectRoot, '.data');
  mkdirSync(local, { recursive: true });
  if (isRoot()) chmodSync(local, 0o755);
  if (serverUserCanReach(local)) return local;
  // A clone under a root-only folder (e.g. /root) is out of the postgres user's reach: keep the cluster elsewhere,
  // one folder per clone so that two clones never share a cluster.
  const hash = createHash('sha256').update(projectRoot).digest('hex').slice(0, 12);
  const outside = join('/var/lib/slotwright', hash);
  mkdirSync(outside, { recursive: true, mode: 0o755 });
  chmodSync('/var/lib/slotwright', 0o755);
  return outside;
}

export function clusterPaths(): Cluster {
  const bin = findBin() ?? '';
  const base = chooseBase();
  return {
    bin,
    base,
    data: join(base, 'pg'),
    socketDir: join(base, 'pg-socket'),
    logFile: join(base, 'pg-socket', 'server.log'),
    port: Number(process.env.PGPORT ?? 55432),
  };
}

export function ensurePostgresInstalled(): string {
  let bin = findBin();
  if (!bin) {
    aptInstall(['postgresql']);
    bin = findBin();
  }
  if (!bin) throw new Error('PostgreSQL server programs not found after installing the postgresql package');
  return bin;
}

function ownedFolder(dir: string, mode: number): void {
  mkdirSync(dir, { recursive: true });
  chmodSync(dir, mode);
  if (isRoot()) {
    const { uid, gid } = postgresIds();
    chownSync(dir, uid, gid);
  }
}

export function isRunning(c: Cluster): boolean {
  if (!existsSync(join(c.data, 'PG_VERSION'))) return false;
  return capture(...serverCommand(join(c.bin, 'pg_ctl'), ['-D', c.data, 'status']), { cwd: '/' }).ok;
}

/** Creates the cluster if needed and starts it; returns whether this call started it. */
export function startCluster(): { cluster: Cluster; started: boolean } {
  const bin = ensurePostgresInstalled();
  const c = { ...clusterPaths(), bin };
  ownedFolder(c.socketDir, 0o755);
  if (!existsSync(join(c.data, 'PG_VERSION'))) {
    ownedFolder(c.data, 0o700);
    console.log(`Creating the local PostgreSQL cluster in ${c.data}`);
    asServerUser(join(bin, 'initdb'), ['-D', c.data, '-U', 'postgres', '-A', 'trust', '-E', 'UTF8', '--no-locale']);
  }
  if (isRunning(c)) return { cluster: c, started: false };
  const opts = `-p ${c.port} -k ${c.socketDir} -c listen_addresses=127.0.0.1`;
  asServerUser(join(bin, 'pg_ctl'), ['-D', c.data, '-l', c.logFile, '-o', opts, '-w', '-t', '60', 'start']);
  console.log(`Started the local PostgreSQL cluster on 127.0.0.1:${c.port} (set-up output in ${logPath('postgres')})`);
  return { cluster: c, started: true };
}

export function stopCluster(c: Cluster = { ...clusterPaths(), bin: findBin() ?? '' }): void {
  if (!c.bin || !isRunning(c)) {
    console.log('The local PostgreSQL cluster is not running.');
    return;
  }
  asServerUser(join(c.bin, 'pg_ctl'), ['-D', c.data, '-m', 'fast', '-w', 'stop']);
  console.log('Stopped the local PostgreSQL cluster.');
}

export function databaseUrl(c: Cluster, database: string): string {
  return `postgres://${appUser}@127.0.0.1:${c.port}/${database}`;
}

async function withAdmin<T>(c: Cluster, fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ host: '127.0.0.1', port: c.port, user: 'postgres', database: 'postgres' });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Makes sure the application role and database exist; `fresh` drops and recreates the database. */
export async function ensureDatabase(c: Cluster, database: string, fresh = false): Promise<string> {
  if (!/^[a-z_][a-z0-9_]*$/.test(database)) throw new Error(`bad database name "${database}"`);
  await withAdmin(c, async (db) => {
    const role = await db.query('SELECT 1 FROM pg_roles WHERE rolname = $1', [appUser]);
    if (role.rowCount === 0) await db.query(`CREATE ROLE ${appUser} LOGIN CREATEDB`);
    if (fresh) await db.query(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
    const found = await db.query('SELECT 1 FROM pg_database WHERE datname = $1', [database]);
    if (found.rowCount === 0) await db.query(`CREATE DATABASE ${database} OWNER ${appUser}`);
  });
  return databaseUrl(c, database);
}
