// `calc sheets JOB.json [--time-limit MS]`: nest sheet parts (drawers, faces, panels) on sheets with guillotine cuts.
import { readFile } from 'node:fs/promises';
import { InputError } from '../../shared/errors';
import { planSheets } from '../../shared/sheets/index';

const r2 = (v: number): number => Math.round(v * 100) / 100;

export async function run(args: string[]): Promise<unknown> {
  let file: string | undefined;
  let timeLimitMs: number | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (a === '--time-limit') {
      timeLimitMs = Number(args[++i]);
      if (!Number.isFinite(timeLimitMs) || timeLimitMs < 0 || timeLimitMs > 600_000) throw new InputError('--time-limit', '--time-limit: expected milliseconds from 0 to 600000');
    } else if (!file) file = a;
    else throw new InputError('arguments', `unexpected argument "${a}"`);
  }
  if (!file) throw new InputError('JOB.json', 'usage: calc sheets JOB.json [--time-limit MS]');
  let job: unknown;
  try {
    job = JSON.parse(await readFile(file, 'utf8'));
  } catch (err) {
    throw new InputError('JOB.json', `JOB.json: cannot read ${file}: ${err instanceof Error ? err.message : String(err)}`);
  }
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
