// `npm run bench:sheets [-- --quick] [--passes N] [--time-limit MS]`: the sheet planner on generated instances of the classic
// two-dimensional bin-packing classes (Berkey–Wang I–VI, Martello–Vigo VII–X; parts may turn, no kerf) and on
// drawer-and-panel jobs (kerf 3, trim 10, grain kept on faces and panels). Per class: sheets against the area bound
// and against our strongest bound, time per job, and the same for a well-known npm rectangle packer (MaxRects, which
// does not make guillotine cuts) and for plain shelf first-fit decreasing. Tuning seeds and held-out seeds are
// reported apart. Sequential on purpose: the machine is shared. The planner works to a pass budget, so its sheets do
// not depend on the machine's load; the time limit is its safety stop, and jobs that reach it are counted.
import { MaxRectsPacker } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { checkSheetPlan, DEFAULT_PASSES, planSheets, shelfFirstFit, validateSheetJob, type SheetJob } from '../shared/sheets/index';
import { cabinetJobs } from './bench-sheets/cabinet-jobs';
import { CLASSES, generate } from './bench-sheets/classes';

const argv = process.argv.slice(2);
const quick = argv.includes('--quick');
const tl = argv.indexOf('--time-limit');
const timeLimitMs = tl >= 0 ? Number(argv[tl + 1]) : 10_000;
const pa = argv.indexOf('--passes');
const maxPasses = pa >= 0 ? Number(argv[pa + 1]) : DEFAULT_PASSES;
const SIZES = quick ? [20, 60, 100] : [20, 40, 60, 80, 100];
const TUNING = [1, 2];
const HELD_OUT = quick ? [11] : [11, 12, 13];

type Row = { cls: string; set: 'tuning' | 'held-out'; sheets: number; area: number; lb: number; ms: number; mr: number; mrMs: number; shelf: number; ok: boolean; timedOut: boolean };

function maxRects(job: SheetJob): { bins: number; ms: number } {
  const t0 = performance.now();
  const k = job.kerf ?? 0;
  const trim = job.trim ?? 0;
  const s = job.sheets[0];
  // Grown sizes, as the planner uses, so kerf is honoured the same way; parts may turn unless they keep a grain, and
  // the packer's rotation is all-or-nothing, so grain parts make it run without rotation.
  const rotate = job.parts.every((p) => !p.grain);
  const packer = new MaxRectsPacker(s.length - 2 * trim + k, s.width - 2 * trim + k, 0, { smart: false, pot: false, square: false, allowRotation: rotate, border: 0 });
  for (const p of job.parts) for (let q = 0; q < p.qty; q++) packer.add(p.length + k, p.width + k, { label: p.label });
  return { bins: packer.bins.length, ms: performance.now() - t0 };
}

function runJob(cls: string, set: Row['set'], job: SheetJob, rows: Row[], name: string): void {
  const t0 = performance.now();
  const plan = planSheets(job, { maxPasses, timeLimitMs });
  const ms = performance.now() - t0;
  const valid = validateSheetJob(job);
  const problems = checkSheetPlan(valid, plan);
  if (problems.length) console.log(`  ${name}: PLAN FAILS ITS CHECK: ${problems.slice(0, 3).join('; ')}`);
  const mr = maxRects(job);
  const items = valid.parts.flatMap((p) => Array.from({ length: p.qty }, () => ({ l: p.length, w: p.width, rotatable: !p.grain })));
  const s = valid.sheets[0];
  const shelf = shelfFirstFit(items, { L: s.length - 2 * valid.trim, W: s.width - 2 * valid.trim }, valid.kerf);
  rows.push({ cls, set, sheets: plan.sheetCount, area: plan.areaBound, lb: plan.lowerBound, ms, mr: mr.bins, mrMs: mr.ms, shelf, ok: problems.length === 0, timedOut: plan.stats.stopped === 'time' });
}

const rows: Row[] = [];
const t0 = performance.now();
for (const cls of CLASSES) {
  for (const [set, seeds] of [['tuning', TUNING], ['held-out', HELD_OUT]] as const) {
    for (const seed of seeds) {
      for (const n of SIZES) {
        const ins = generate(cls, n, seed);
        const job: SheetJob = { kerf: 0, trim: 0, sheets: [{ length: ins.bin.L, width: ins.bin.W }], parts: ins.items.map((it, i) => ({ length: it.l, width: it.w, qty: 1, label: `p${i + 1}` })) };
        runJob(cls, set, job, rows, ins.name);
      }
    }
  }
}
for (const [set, seeds] of [['tuning', TUNING], ['held-out', HELD_OUT]] as const) {
  for (const seed of seeds) for (const cj of cabinetJobs(seed)) runJob('galley', set, cj.job, rows, cj.name);
}

const mean = (xs: number[]): number => xs.reduce((a, b) => a + b, 0) / xs.length;
const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[xs.length >> 1];
const pad = (s: string, n: number): string => s.padEnd(n);
console.log(`sheet planner, ${maxPasses} passes a job (safety stop ${timeLimitMs} ms); sizes n = ${SIZES.join(', ')}; tuning seeds ${TUNING.join(', ')}, held-out seeds ${HELD_OUT.join(', ')}`);
console.log('ratios are means per job of sheets / bound; "vs best LB" uses our strongest certified bound');
for (const set of ['tuning', 'held-out'] as const) {
  console.log(`\n${set}`);
  console.log(`${pad('class', 8)}${pad('jobs', 6)}${pad('ours/area', 11)}${pad('ours/LB', 9)}${pad('MaxRects/area', 15)}${pad('shelf/area', 12)}${pad('ours med ms', 13)}${pad('MR med ms', 11)}worse than MR`);
  const classRatios: { ours: number; oursLb: number; mr: number; shelf: number }[] = [];
  for (const cls of [...CLASSES, 'galley']) {
    const rs = rows.filter((r) => r.cls === cls && r.set === set);
    if (!rs.length) continue;
    const ours = mean(rs.map((r) => r.sheets / r.area));
    const mr = mean(rs.map((r) => r.mr / r.area));
    const shelf = mean(rs.map((r) => r.shelf / r.area));
    if (cls !== 'galley') classRatios.push({ ours, oursLb: mean(rs.map((r) => r.sheets / r.lb)), mr, shelf });
    const worse = rs.filter((r) => r.sheets > r.mr).length;
    console.log(
      `${pad(cls, 8)}${pad(String(rs.length), 6)}${pad(ours.toFixed(3), 11)}${pad(mean(rs.map((r) => r.sheets / r.lb)).toFixed(3), 9)}${pad(mr.toFixed(3), 15)}${pad(shelf.toFixed(3), 12)}${pad(median(rs.map((r) => r.ms)).toFixed(0), 13)}${pad(median(rs.map((r) => r.mrMs)).toFixed(1), 11)}${worse}`,
    );
  }
  const all = rows.filter((r) => r.set === set);
  console.log(
    `classes I–X mean of class means: ours/area ${mean(classRatios.map((c) => c.ours)).toFixed(3)}, ours/LB ${mean(classRatios.map((c) => c.oursLb)).toFixed(3)}, MaxRects/area ${mean(classRatios.map((c) => c.mr)).toFixed(3)}, shelf/area ${mean(classRatios.map((c) => c.shelf)).toFixed(3)}; ` +
      `sheets in all: ours ${all.reduce((a, r) => a + r.sheets, 0)}, MaxRects ${all.reduce((a, r) => a + r.mr, 0)}, shelf ${all.reduce((a, r) => a + r.shelf, 0)}; median ${median(all.map((r) => r.ms)).toFixed(0)} ms, max ${Math.max(...all.map((r) => r.ms)).toFixed(0)} ms a job`,
  );
}
const bad = rows.filter((r) => !r.ok).length;
console.log(`\n${rows.length} jobs in ${((performance.now() - t0) / 1000).toFixed(1)} s; ${bad} plans failed the guillotine/feasibility check; ${rows.filter((r) => r.timedOut).length} stopped by the time limit`);
process.exit(bad ? 1 : 0);
