// `calc cut JOB.json [--time-limit MS]`: plan the cutting of one profile's parts from stock bars.
import { readFile } from 'node:fs/promises';
import { InputError } from '../../shared/errors';
import highsLoader from 'highs';
import { planCutsSync, useMipSolver, type MipSolver } from '../../shared/planner/index';

export async function run(args: string[]): Promise<unknown> {
  let file: string | undefined;
  let timeLimitMs: number | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--time-limit') {
      timeLimitMs = Number(args[++i]);
      if (!Number.isFinite(timeLimitMs) || timeLimitMs < 0) throw new InputError('--time-limit', '--time-limit: expected milliseconds ≥ 0');
    } else if (!file) file = a;
    else throw new InputError('arguments', `unexpected argument "${a}"`);
  }
  if (!file) throw new InputError('JOB.json', 'usage: calc cut JOB.json [--time-limit MS]');
  let job: unknown;
  try {
    job = JSON.parse(await readFile(file, 'utf8'));
  } catch (err) {
    throw new InputError('JOB.json', `JOB.json: cannot read ${file}: ${err instanceof Error ? err.message : String(err)}`);
  }
  // HiGHS for the exact model on small jobs with several bar lengths (the server and the browser load it too).
  useMipSolver((await highsLoader()).solve as unknown as MipSolver);
  const plan = planCutsSync(job as Parameters<typeof planCutsSync>[0], { timeLimitMs });
  return {
    barCount: plan.barCount,
    lowerBound: plan.lowerBound,
    optimal: plan.optimal,
    cost: plan.cost,
    waste_pct: plan.waste_pct,
    bars: plan.bars.map((b) => ({
      stock: b.stock,
      ...(b.stockLabel ? { stockLabel: b.stockLabel } : {}),
      cuts: b.cuts.map((c) => ({ length: c.length, label: c.label })),
      offcut: b.offcut,
      waste: b.waste,
    })),
    objective: plan.objective,
    costLowerBound: plan.costLowerBound,
    gap: plan.gap,
    elapsedMs: plan.stats.elapsedMs,
  };
}
