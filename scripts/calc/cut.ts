// `calc cut JOB.json [--time-limit MS]`: plan the cutting of one profile's parts from stock bars.
import highsLoader from 'highs';
import { planCutsSync, useMipSolver, type MipSolver } from '../../shared/planner/index';
import { readJobArgs } from './job-args';

export async function run(args: string[]): Promise<unknown> {
  const { job, timeLimitMs } = await readJobArgs(args, 'calc cut JOB.json [--time-limit MS]');
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
