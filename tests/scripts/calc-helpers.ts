import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));
const tsx = fileURLToPath(new URL('../../node_modules/.bin/tsx', import.meta.url));

/** Run `calc <args>` as a user would, in a child process. */
export function calcCli(args: string[]): { code: number | null; stdout: string; stderr: string } {
  const r = spawnSync(tsx, ['scripts/calc.ts', ...args], { cwd: root, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
