import { onBeforeUnmount, ref, shallowRef } from 'vue';
import type { CutJob, CutPlan, PlanProgress } from '@shared/planner';
import type { PlannerReply } from '@/workers/cut-planner.worker';

/** Runs the stock planner in a Web Worker: progress while it works, cancel by ending the worker. */
export function useCutPlanner() {
  const plan = shallowRef<CutPlan | null>(null);
  const progress = shallowRef<PlanProgress | null>(null);
  const error = ref<string | null>(null);
  const running = ref(false);
  let worker: Worker | null = null;

  function stop(): void {
    worker?.terminate();
    worker = null;
    running.value = false;
  }

  function run(job: CutJob, timeLimitMs: number): void {
    stop();
    error.value = null;
    progress.value = null;
    running.value = true;
    worker = new Worker(new URL('../workers/cut-planner.worker.ts', import.meta.url), { type: 'module' });
    worker.onmessage = (e: MessageEvent<PlannerReply>) => {
      const m = e.data;
      if (m.type === 'progress') progress.value = m.progress;
      else {
        if (m.type === 'done') plan.value = m.plan;
        else error.value = m.message;
        stop();
      }
    };
    worker.onerror = (e) => {
      error.value = e.message || 'The planner stopped unexpectedly.';
      stop();
    };
    worker.postMessage({ job, timeLimitMs });
  }

  onBeforeUnmount(stop);
  return { plan, progress, error, running, run, stop };
}
