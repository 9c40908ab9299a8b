// `calc sheets JOB.json [--time-limit MS]`: nest sheet parts (drawers, faces, panels) on sheets with guillotine cuts.
import { planSheets } from '../../shared/sheets/index';
import { readJobArgs } from './job-args';

const r2 = (v: number): number => Math.round(v * 100) / 100;

export async function run(args: string[]): Promise<unknown> {
  const { job, timeLimitMs } = await readJobArgs(args, 'calc sheets JOB.json [--time-limit MS]', 600_000);
  const plan = planSheets(job, { timeLimitMs });
  return {
    sheetCount: plan.sheetCount,
    lowerBound: plan.lowerBound,
    areaBound: plan.areaBound,
    waste_pct: r2(plan.waste_pct),
    cost: r2(plan.cost),
    sheets: plan.sheets.map((s) => ({
      length: s.length,
      width: s.width,
      ...(s.label ? { label: s.label } : {}),
      placements: s.placements.map((p) => ({ label: p.label, x: r2(p.x), y: r2(p.y), length: p.length, width: p.width, rotated: p.rotated })),
      cuts: s.cuts.map((c) => ({ x1: r2(c.x1), y1: r2(c.y1), x2: r2(c.x2), y2: r2(c.y2), stage: c.stage, kind: c.kind })),
    })),
    elapsedMs: plan.stats.elapsedMs,
  };
}
