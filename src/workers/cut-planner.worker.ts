// The stock planner off the main thread: one job per message; the page cancels by terminating the worker.
import highsLoader from 'highs';
import wasmUrl from 'highs/runtime?url';
import { planCuts, useMipSolver, type CutJob, type CutPlan, type MipSolver, type PlanProgress } from '@shared/planner';

export type PlannerRequest = { job: CutJob; timeLimitMs: number };
export type PlannerReply =
  | { type: 'progress'; progress: PlanProgress }
  | { type: 'done'; plan: CutPlan }
  | { type: 'error'; message: string };

const post = (m: PlannerReply): void => (self as unknown as Worker).postMessage(m);

// HiGHS (WebAssembly) for the exact model on small jobs with several bar lengths; if it cannot load, the search plans alone.
const mip = highsLoader({ locateFile: () => wasmUrl })
  .then((highs) => useMipSolver(highs.solve as unknown as MipSolver))
  .catch(() => undefined);

self.onmessage = async (e: MessageEvent<PlannerRequest>) => {
  try {
    await mip;
    const plan = await planCuts(e.data.job, { timeLimitMs: e.data.timeLimitMs, onProgress: (progress) => post({ type: 'progress', progress }) });
    post({ type: 'done', plan });
  } catch (err) {
    post({ type: 'error', message: err instanceof Error ? err.message : String(err) });
  }
};
