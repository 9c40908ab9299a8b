// What every way of running the app shares: the database ready (cluster up, migrated, demo data), a session
// secret, and the server started as a child process that we can wait for and stop.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { spawn, type ChildProcess } from 'node:child_process';
import { join } from 'node:path';
import { ensureDatabase, projectRoot, startCluster, type Cluster } from './postgres.ts';
import { sh } from './run.ts';

/** node with the tsx loader: runs a TypeScript file without a build step. */
export function tsx(file: string, args: string[] = []): [string, string[]] {
  return [process.execPath, ['--import', 'tsx', join(projectRoot, file), ...args]];
}

function sessionSecret(): string {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const dir = join(projectRoot, '.data');
  const file = join(dir, 'session-secret');
  if (!existsSync(file)) {
    mkdirSync(dir, { recursive: true });
    writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  }
  return readFileSync(file, 'utf8').trim();
}

export interface PreparedDb {
  cluster: Cluster;
  startedCluster: boolean;
  env: NodeJS.ProcessEnv;
}

/** Cluster up, database created (fresh when asked), migrations run, demo data seeded when absent. */
export async function prepareDatabase(database: string, opts: { fresh?: boolean; seed?: boolean } = {}): Promise<PreparedDb> {
  const { cluster, started } = startCluster();
  const url = await ensureDatabase(cluster, database, opts.fresh ?? false);
  const env: NodeJS.ProcessEnv = { ...process.env, DATABASE_URL: url, SESSION_SECRET: sessionSecret() };
  sh(...tsx('scripts/migrate.ts'), { env, cwd: projectRoot });
  if (opts.seed ?? true) sh(...tsx('scripts/seed.ts'), { env, cwd: projectRoot });
  return { cluster, startedCluster: started, env };
}

export function buildClient(): void {
  sh(process.execPath, [join(projectRoot, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], { cwd: projectRoot });
}

export function startServer(env: NodeJS.ProcessEnv, opts: { watch?: boolean } = {}): ChildProcess {
  const [cmd, args] = opts.watch
    ? [process.execPath, [join(projectRoot, 'node_modules/tsx/dist/cli.mjs'), 'watch', join(projectRoot, 'server/index.ts')]]
    : tsx('server/index.ts');
  return spawn(cmd, args, { env, cwd: projectRoot, stdio: 'inherit' });
}

/** Polls /api/health until the server answers with the database up. */
export async function waitForHealth(baseUrl: string, timeoutMs = 60_000): Promise<void> {
  const until = Date.now() + timeoutMs;
  let last = '';
  while (Date.now() < until) {
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) return;
      last = `HTTP ${res.status}`;
    } catch (err) {
      last = err instanceof Error ? err.message : String(err);
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the server at ${baseUrl} did not become healthy in ${timeoutMs} ms (${last})`);
}

export function stopProcess(child: ChildProcess, timeoutMs = 10_000): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), timeoutMs);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
