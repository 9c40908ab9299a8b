// Sheet plans off the main thread: a galley's materials take up to a second or so to plan, which on the page would
// hold every click and key until it is done. One request per message; the page cancels by terminating the worker.
import { planSheets, type SheetJob } from '@shared/sheets/index';

export type SheetPlanRequest = { jobs: (SheetJob | null)[]; maxPasses: number; timeLimitMs: number };
export type SheetPlanSummary = { sheetCount: number; lowerBound: number; waste_pct: number; cost: number; offcutsUsed: number };
export type SheetPlanReply = { type: 'done'; plans: (SheetPlanSummary | null)[] } | { type: 'error'; message: string };

self.onmessage = (e: MessageEvent<SheetPlanRequest>) => {
  let reply: SheetPlanReply;
  try {
    const plans = e.data.jobs.map((job) => {
      if (!job) return null;
      const plan = planSheets(job, { maxPasses: e.data.maxPasses, timeLimitMs: e.data.timeLimitMs });
      const offcutsUsed = plan.sheets.filter((s) => s.label === 'offcut').length;
      return { sheetCount: plan.sheetCount, lowerBound: plan.lowerBound, waste_pct: plan.waste_pct, cost: plan.cost, offcutsUsed };
    });
    reply = { type: 'done', plans };
  } catch (err) {
    reply = { type: 'error', message: err instanceof Error ? err.message : String(err) };
  }
  (self as unknown as Worker).postMessage(reply);
};
