// Small process helpers for the set-up scripts: run a command visibly, or capture its output.
import { spawn, spawnSync, type SpawnOptions } from 'node:child_process';
import { appendFileSync, closeSync, mkdirSync, openSync, readFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';

export function sh(cmd: string, args: string[], opts: SpawnOptions = {}): void {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} exited with ${r.status ?? r.signal}`);
}

/** Where the set-up keeps the full output of the tools it runs (.data/logs/NAME.log under the project). */
export function logPath(name: string): string {
  return join(dirname(dirname(import.meta.dirname)), '.data', 'logs', `${name}.log`);
}

/**
 * Runs a set-up tool with its output going to a log file instead of the terminal: the set-up prints its own short
 * lines, and a tool's own advice (initdb's "you can now start the database server…") is not taken for a step to
 * do. On failure the end of the log is shown with where the rest is.
 */
export function logged(name: string, cmd: string, args: string[], opts: SpawnOptions = {}): void {
  const file = logPath(name);
  mkdirSync(dirname(file), { recursive: true });
  appendFileSync(file, `\n$ ${cmd} ${args.join(' ')}    (${new Date().toISOString()})\n`);
  const fd = openSync(file, 'a');
  let r;
  try {
    r = spawnSync(cmd, args, { ...opts, stdio: ['ignore', fd, fd] });
  } finally {
    closeSync(fd);
  }
  if (r.error) throw r.error;
  if (r.status !== 0) {
    const tail = readFileSync(file, 'utf8').trimEnd().split('\n').slice(-25).join('\n');
    console.error(tail);
    throw new Error(`${cmd} ${args.join(' ')} exited with ${r.status ?? r.signal}; the full output is in ${relative(process.cwd(), file) || file}`);
  }
}

export function capture(cmd: string, args: string[], opts: SpawnOptions = {}): { ok: boolean; out: string } {
  const r = spawnSync(cmd, args, { encoding: 'utf8', ...opts, stdio: ['ignore', 'pipe', 'pipe'] });
  return { ok: r.status === 0, out: `${r.stdout ?? ''}${r.stderr ?? ''}`.trim() };
}

/** Runs a command to completion, streaming its output; resolves to its exit code. */
export function runAsync(cmd: string, args: string[], opts: SpawnOptions = {}): Promise<number> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: 'inherit', ...opts });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

export const isRoot = (): boolean => typeof process.getuid === 'function' && process.getuid() === 0;

/** Installs Debian packages, as root or through password-less sudo; explains what to do otherwise. */
export function aptInstall(packages: string[]): void {
  const prefix = isRoot() ? [] : ['sudo', '-n'];
  if (!isRoot() && !capture('sudo', ['-n', 'true']).ok) {
    throw new Error(`Please install these Debian packages first (needs root): apt-get install ${packages.join(' ')}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const [cmd, ...pre] = [...prefix, 'apt-get'];
  console.log(`Installing ${packages.join(', ')} from Debian's packages...`);
  logged('apt-get', cmd!, [...pre, 'update', '-qq'], { env });
  logged('apt-get', cmd!, [...pre, 'install', '-y', '-qq', '--no-install-recommends', ...packages], { env });
}
