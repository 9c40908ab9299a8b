// The stock planner off the main thread: one job per message; the page cancels by terminating the worker.
import { planCuts, type CutJob, type CutPlan, type PlanProgress } from '@shared/planner';

export type PlannerRequest = { job: CutJob; timeLimitMs: number };
export type PlannerReply =
  | { type: 'progress'; progress: PlanProgress }
  | { type: 'done'; plan: CutPlan }
  | { type: 'error'; message: string };

const post = (m: PlannerReply): void => (self as unknown as Worker).postMessage(m);

self.onmessage = async (e: MessageEvent<PlannerRequest>) => {
  try {
    const plan = await planCuts(e.data.job, { timeLimitMs: e.data.timeLimitMs, onProgress: (progress) => post({ type: 'progress', progress }) });
    post({ type: 'done', plan });
  } catch (err) {
    post({ type: 'error', message: err instanceof Error ? err.message : String(err) });
  }
};
