// The exact pattern model for small jobs on several stock types: every maximal bar layout (no demanded part would still
// fit) as an integer variable, demand as covering rows, bars on hand as upper rows (Gilmore & Gomory 1961, solved as an
// integer program instead of by columns). Solved lexicographically with a MIP solver (HiGHS, injected by the caller so
// the engine stays free of I/O): least cost, then fewest bars at that cost, then least stock length (least waste) at
// both. Each stage is optimal or the plan is not marked optimal.
import type { Pattern, PatternUse, Problem } from './problem';

/** The subset of a HiGHS solution the model reads. */
export interface MipResult {
  Status: string;
  ObjectiveValue?: number;
  Columns?: Record<string, { Primal?: number }>;
}
/** Solve a model in CPLEX LP format (HiGHS's `solve(text, options)`). */
export type MipSolver = (model: string, options: Record<string, number | boolean | string>) => MipResult;

/** Most layouts the model takes; past it (many distinct lengths per bar) the column generation search runs instead. */
export const EXACT_MAX_PATTERNS = 6000;

/** Maximal layouts of every stock type, or null when there are more than `limit`. */
export function maximalPatterns(p: Problem, limit = EXACT_MAX_PATTERNS): Pattern[] | null {
  const n = p.sizes.length;
  const out: Pattern[] = [];
  // Load of items i… at full demand: when the room left exceeds it by a size still short of demand, no completion is maximal.
  const tailLoad = new Float64Array(n + 1);
  for (let i = n - 1; i >= 0; i--) tailLoad[i] = tailLoad[i + 1] + p.sizes[i] * p.demand[i];
  for (let t = 0; t < p.types.length; t++) {
    const cap = p.types[t].capacity;
    const counts = new Int32Array(n);
    // `open`: the smallest size placed short of its demand so far (the final room must stay under it).
    const walk = (i: number, room: number, open: number): boolean => {
      if (room - tailLoad[i] >= open) return true;
      if (i === n) {
        if (counts.some((c) => c > 0)) {
          out.push({ type: t, counts: Int32Array.from(counts) });
          if (out.length > limit) return false;
        }
        return true;
      }
      const most = Math.min(p.demand[i], Math.floor(room / p.sizes[i]));
      for (let c = most; c >= 0; c--) {
        counts[i] = c;
        if (!walk(i + 1, room - c * p.sizes[i], c < p.demand[i] ? Math.min(open, p.sizes[i]) : open)) return false;
      }
      counts[i] = 0;
      return true;
    };
    if (!walk(0, cap, Infinity)) return null;
  }
  return out;
}

export interface ExactOutcome {
  solution: PatternUse[] | null;
  /** 1 when the least cost is proven, else 0. */
  proven: 0 | 1;
  /** Proven least cost (stage 1), else null. */
  cost: number | null;
}

const terms = (coefs: readonly number[], cols: readonly number[]): string => {
  const parts: string[] = [];
  cols.forEach((j, k) => {
    const c = coefs[k];
    if (c !== 0) parts.push(`${c >= 0 ? '+' : '-'} ${Math.abs(c)} x${j}`);
  });
  // Short lines: LP-format readers need not take long ones.
  const lines: string[] = [];
  for (let k = 0; k < parts.length; k += 8) lines.push(' ' + parts.slice(k, k + 8).join(' '));
  return lines.join('\n') || ' 0 x0';
};

export function solveExact(p: Problem, patterns: readonly Pattern[], mip: MipSolver, secondsLeft: () => number): ExactOutcome {
  const m = patterns.length;
  const all = patterns.map((_, j) => j);
  const cost = patterns.map((pt) => p.types[pt.type].cost);
  const cap = patterns.map((pt) => p.types[pt.type].capacity);
  const rows: string[] = [];
  for (let i = 0; i < p.sizes.length; i++) {
    const cols = all.filter((j) => patterns[j].counts[i] > 0);
    rows.push(` d${i}:\n${terms(cols.map((j) => patterns[j].counts[i]), cols)}\n >= ${p.demand[i]}`);
  }
  p.types.forEach((t, k) => {
    if (t.qty === null) return;
    const cols = all.filter((j) => patterns[j].type === k);
    if (cols.length) rows.push(` q${k}:\n${terms(cols.map(() => 1), cols)}\n <= ${t.qty}`);
  });
  // A layout is never needed more often than it takes to cover the demand of one of its items.
  const bounds = patterns.map((pt, j) => {
    let ub = 0;
    pt.counts.forEach((c, i) => {
      if (c > 0) ub = Math.max(ub, Math.ceil(p.demand[i] / c));
    });
    const q = p.types[pt.type].qty;
    return ` 0 <= x${j} <= ${q === null ? ub : Math.min(ub, q)}`;
  });
  const generals: string[] = [];
  for (let k = 0; k < m; k += 12) generals.push(' ' + all.slice(k, k + 12).map((j) => `x${j}`).join(' '));
  const model = (objective: readonly number[], extra: string[]): string =>
    ['Minimize', ` obj:\n${terms(objective, all)}`, 'Subject To', ...rows, ...extra, 'Bounds', ...bounds, 'General', ...generals, 'End'].join('\n');

  let solution: PatternUse[] | null = null;
  let proven: 0 | 1 = 0;
  let provenCost: number | null = null;
  const run = (objective: readonly number[], extra: string[]): { value: number; optimal: boolean } | null => {
    const left = secondsLeft();
    if (left <= 0) return null;
    let r: MipResult;
    try {
      r = mip(model(objective, extra), { output_flag: false, time_limit: left, mip_rel_gap: 0, mip_abs_gap: 1e-7, threads: 1 });
    } catch {
      return null;
    }
    if (!r.Columns || r.ObjectiveValue === undefined || !Number.isFinite(r.ObjectiveValue)) return null;
    const uses: PatternUse[] = [];
    for (let j = 0; j < m; j++) {
      const v = Math.round(r.Columns[`x${j}`]?.Primal ?? 0);
      if (v > 0) uses.push({ pattern: patterns[j], mult: v });
    }
    const sol = trimToDemand(p, uses);
    if (!sol) return null;
    solution = sol;
    return { value: r.ObjectiveValue, optimal: r.Status === 'Optimal' };
  };
  // Least cost by the model; the bar count and stock length at that cost then by trying the few bar mixes of that cost
  // in order (./lex-refine): the model proves those far more slowly (its LP hardly bounds them).
  const s1 = run(cost, []);
  if (s1 && s1.optimal) {
    proven = 1;
    provenCost = s1.value;
  }
  return { solution, proven, cost: provenCost };
}

/** Layouts from the model may cover more pieces than demanded (rows are ≥): take each piece once, in order. */
function trimToDemand(p: Problem, uses: readonly PatternUse[]): PatternUse[] | null {
  const left = Int32Array.from(p.demand);
  const out: PatternUse[] = [];
  for (const u of uses) {
    for (let c = 0; c < u.mult; c++) {
      const counts = new Int32Array(left.length);
      let any = false;
      for (let i = 0; i < left.length; i++) {
        const k = Math.min(u.pattern.counts[i], left[i]);
        counts[i] = k;
        left[i] -= k;
        if (k > 0) any = true;
      }
      if (any) out.push({ pattern: { type: u.pattern.type, counts }, mult: 1 });
    }
  }
  return left.every((d) => d === 0) ? out : null;
}
