import { readFile } from 'node:fs/promises';
import { InputError } from '../../shared/errors';

/**
 * The arguments of the commands that plan a job file (`calc cut`, `calc sheets`): `JOB.json [--time-limit MS]`,
 * with the job read and parsed; errors name the argument. `maxMs` bounds the limit where the command has one.
 */
export async function readJobArgs(args: string[], usage: string, maxMs?: number): Promise<{ job: unknown; timeLimitMs: number | undefined }> {
  let file: string | undefined;
  let timeLimitMs: number | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--time-limit') {
      timeLimitMs = Number(args[++i]);
      if (!Number.isFinite(timeLimitMs) || timeLimitMs < 0 || (maxMs !== undefined && timeLimitMs > maxMs)) {
        throw new InputError('--time-limit', maxMs === undefined ? '--time-limit: expected milliseconds ≥ 0' : `--time-limit: expected milliseconds from 0 to ${maxMs}`);
      }
    } else if (!file) file = a;
    else throw new InputError('arguments', `unexpected argument "${a}"`);
  }
  if (!file) throw new InputError('JOB.json', `usage: ${usage}`);
  try {
    return { job: JSON.parse(await readFile(file, 'utf8')), timeLimitMs };
  } catch (err) {
    throw new InputError('JOB.json', `JOB.json: cannot read ${file}: ${err instanceof Error ? err.message : String(err)}`);
  }
}
