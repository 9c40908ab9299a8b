// The planner's entry points. `planCuts` runs the solver in slices and yields to the event loop between them, so it
// reports progress and honours an AbortSignal both in a browser Web Worker and in-process on the server;
// `planCutsSync` runs the same steps without yielding (command line, benchmarks).
import type { MipSolver } from './core/exact';
import { solveCore, type CoreProgress, type CoreResult } from './core/solver';
import { InputError } from '../errors';
import { validateCutJob, type CutJob } from './job';
import { buildPlan, type CutPlan } from './plan';
import { prepareJob } from './scale';

export type PlanPhase = CoreProgress['phase'];

export interface PlanProgress {
  phase: PlanPhase;
  bestBars: number;
  bestCost: number;
  /** Lower bound on the objective (bars, or cost when prices are given). */
  lowerBound: number;
  elapsedMs: number;
}

export interface PlanOptions {
  /** Time allowed for the improvement stage (default 2000 ms). The greedy answer is always produced. */
  timeLimitMs?: number;
  onProgress?: (p: PlanProgress) => void;
  signal?: AbortSignal;
  /** Clock for the time limit, in ms (default: wall time). Benchmarks on a shared machine pass a CPU-time clock. */
  clock?: () => number;
  /** MIP solver for the exact model on small jobs with several stock types (default: the one given to useMipSolver). */
  mip?: MipSolver;
}

let registeredMip: MipSolver | undefined;
/**
 * Give the planner a MIP solver (HiGHS's `solve`, loaded by the caller: the engine does no I/O). Without one, small
 * jobs on several stock types are planned by the column-generation search alone and are proven optimal less often.
 */
export function useMipSolver(mip: MipSolver | undefined): void {
  registeredMip = mip;
}

export const DEFAULT_TIME_LIMIT_MS = 2000;
const SLICE_MS = 25;
const PROGRESS_EVERY_MS = 100;

const now = (): number => globalThis.performance?.now() ?? Date.now();

function start(job: CutJob, opts: PlanOptions) {
  const clock = opts.clock ?? now;
  const valid = validateCutJob(job);
  const prep = prepareJob(valid);
  if (prep.problem.types.length === 0) throw new InputError('stock', 'stock: no stock bars are available (every quantity is 0)');
  const t0 = clock();
  const limit = Math.max(0, opts.timeLimitMs ?? DEFAULT_TIME_LIMIT_MS);
  const mip = opts.mip ?? registeredMip;
  const gen = solveCore(prep.problem, { deadline: t0 + limit, now: clock, mip });
  return { prep, gen, t0: now(), mip: mip !== undefined };
}

function finish(prep: ReturnType<typeof prepareJob>, res: CoreResult, t0: number, mip: boolean): CutPlan {
  return buildPlan(prep, res, now() - t0, mip);
}

export function planCutsSync(job: CutJob, opts: Omit<PlanOptions, 'signal'> = {}): CutPlan {
  const { prep, gen, t0, mip } = start(job, opts);
  for (;;) {
    const r = gen.next();
    if (r.done) return finish(prep, r.value, t0, mip);
    opts.onProgress?.({ ...r.value, elapsedMs: now() - t0 });
  }
}

export async function planCuts(job: CutJob, opts: PlanOptions = {}): Promise<CutPlan> {
  opts.signal?.throwIfAborted();
  const { prep, gen, t0, mip } = start(job, opts);
  let sliceStart = now();
  let lastProgress = -Infinity;
  for (;;) {
    const r = gen.next();
    if (r.done) return finish(prep, r.value, t0, mip);
    const t = now();
    if (opts.onProgress && (t - lastProgress >= PROGRESS_EVERY_MS || r.value.phase !== 'improve')) {
      lastProgress = t;
      opts.onProgress({ ...r.value, elapsedMs: t - t0 });
    }
    if (t - sliceStart >= SLICE_MS) {
      await new Promise<void>((resolve) => setTimeout(resolve, 0));
      opts.signal?.throwIfAborted();
      sliceStart = now();
    }
  }
}
