// Small process helpers for the set-up scripts: run a command visibly, or capture its output.
import { spawn, spawnSync, type SpawnOptions } from 'node:child_process';

export function sh(cmd: string, args: string[], opts: SpawnOptions = {}): void {
  const r = spawnSync(cmd, args, { stdio: 'inherit', ...opts });
  if (r.error) throw r.error;
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} exited with ${r.status ?? r.signal}`);
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
  sh(cmd!, [...pre, 'update', '-qq'], { env });
  sh(cmd!, [...pre, 'install', '-y', '-qq', '--no-install-recommends', ...packages], { env });
}
