// Independent checks used by the planner tests: plan feasibility from first principles, and an exact minimum bar
// count by exhaustive search (small jobs only).
import type { CutJob, CutPlan } from '../../../shared/planner';
import { DEFAULT_KERF_MM } from '../../../shared/planner/job';

export function checkPlan(job: CutJob, plan: CutPlan): string[] {
  const errs: string[] = [];
  const kerf = job.kerf ?? DEFAULT_KERF_MM;
  const trim = job.trim ?? 0;
  const minOffcut = job.minOffcut ?? 0;
  const want = new Map<string, number>();
  for (const p of job.parts) want.set(`${p.length}|${p.label ?? ''}`, (want.get(`${p.length}|${p.label ?? ''}`) ?? 0) + p.qty);
  const got = new Map<string, number>();
  const usedPerStock = new Map<number, number>();
  let cost = 0;
  plan.bars.forEach((bar, b) => {
    const stock = job.stock[bar.stockIndex];
    if (!stock || stock.length !== bar.stock) errs.push(`bar ${b}: stock ${bar.stock} does not match stock[${bar.stockIndex}]`);
    usedPerStock.set(bar.stockIndex, (usedPerStock.get(bar.stockIndex) ?? 0) + 1);
    cost += stock?.price ?? 0;
    if (bar.cuts.length === 0) errs.push(`bar ${b}: no cuts`);
    for (const c of bar.cuts) got.set(`${c.length}|${c.label}`, (got.get(`${c.length}|${c.label}`) ?? 0) + 1);
    const sum = bar.cuts.reduce((s, c) => s + c.length, 0);
    // The kerf convention: trim + Σ parts + (parts − 1) × kerf ≤ bar length.
    const used = trim + sum + (bar.cuts.length - 1) * kerf;
    if (used > bar.stock + 1e-9) errs.push(`bar ${b}: over-filled (${used} > ${bar.stock})`);
    const keep = bar.stock - used - kerf;
    const expected = keep > 0 && keep >= minOffcut ? keep : 0;
    if (Math.abs(bar.offcut - expected) > 1e-6) errs.push(`bar ${b}: offcut ${bar.offcut}, expected ${expected}`);
    if (Math.abs(bar.waste - (bar.stock - sum - expected)) > 1e-6) errs.push(`bar ${b}: waste ${bar.waste} is wrong`);
    for (let i = 1; i < bar.cuts.length; i++) {
      if (bar.cuts[i].length > bar.cuts[i - 1].length) errs.push(`bar ${b}: cuts not longest first`);
    }
  });
  for (const [k, q] of want) if ((got.get(k) ?? 0) !== q) errs.push(`part ${k}: cut ${got.get(k) ?? 0} times, wanted ${q}`);
  for (const [k, q] of got) if (!want.has(k)) errs.push(`unknown part ${k} cut ${q} times`);
  for (const [i, n] of usedPerStock) {
    const q = job.stock[i].qty;
    if (q !== null && q !== undefined && n > q) errs.push(`stock[${i}]: ${n} bars used, only ${q} available`);
  }
  if (plan.barCount !== plan.bars.length) errs.push('barCount differs from bars.length');
  if (Math.abs(plan.cost - cost) > 1e-6) errs.push(`cost ${plan.cost}, expected ${cost}`);
  if (plan.lowerBound > plan.barCount) errs.push('lower bound above the bar count');
  return errs;
}

/**
 * Exact minimum number of bars by exhaustive search with symmetry breaking, checking each bar directly by the kerf
 * convention (Σ parts + (parts − 1) × kerf ≤ usable length) rather than through the planner's transformation.
 */
export function exactBars(lengths: number[], usable: number, kerf: number): number {
  const items = lengths.slice().sort((a, b) => b - a);
  let best = items.length;
  const sum: number[] = [];
  const count: number[] = [];
  const rec = (i: number): void => {
    if (sum.length >= best) return;
    if (i === items.length) {
      best = sum.length;
      return;
    }
    const seen = new Set<string>();
    for (let b = 0; b < sum.length; b++) {
      const key = `${sum[b]}|${count[b]}`;
      if (seen.has(key) || sum[b] + items[i] + count[b] * kerf > usable) continue;
      seen.add(key);
      sum[b] += items[i];
      count[b]++;
      rec(i + 1);
      sum[b] -= items[i];
      count[b]--;
    }
    sum.push(items[i]);
    count.push(1);
    rec(i + 1);
    sum.pop();
    count.pop();
  };
  rec(0);
  return best;
}

/** Group a list of item sizes into strictly decreasing distinct sizes with counts, as the solver core takes them. */
export function groupSizes(items: number[]): { sizes: number[]; demand: number[] } {
  const m = new Map<number, number>();
  for (const x of items) m.set(x, (m.get(x) ?? 0) + 1);
  const sizes = [...m.keys()].sort((a, b) => b - a);
  return { sizes, demand: sizes.map((s) => m.get(s)!) };
}

/** Problems with a packing of the core (bars as counts over sizes): a part placed too often or too rarely, an over-filled or empty bar. */
export function packingErrors(bars: ArrayLike<number>[], sizes: number[], demand: number[], cap: number): string[] {
  const errs: string[] = [];
  const placed = new Array<number>(sizes.length).fill(0);
  bars.forEach((bar, b) => {
    let load = 0;
    for (let i = 0; i < sizes.length; i++) {
      if (bar[i] < 0) errs.push(`bar ${b}: negative count of size ${sizes[i]}`);
      load += bar[i] * sizes[i];
      placed[i] += bar[i];
    }
    if (load <= 0) errs.push(`bar ${b}: empty`);
    if (load > cap) errs.push(`bar ${b}: load ${load} over capacity ${cap}`);
  });
  sizes.forEach((s, i) => {
    if (placed[i] !== demand[i]) errs.push(`size ${s}: placed ${placed[i]} times, wanted ${demand[i]}`);
  });
  return errs;
}
