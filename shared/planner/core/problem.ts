// The planner's integer core: item sizes and bar capacities already include the kerf (a part of length l takes
// l + kerf on a bar of usable capacity L − trim + kerf), so cutting stock and bin packing share one solver.

export interface StockType {
  capacity: number;
  /** Cost of one bar in the objective (1 per bar when no prices are given). */
  cost: number;
  /** Bars available, or null for as many as needed. */
  qty: number | null;
}

export interface Problem {
  /** Distinct item sizes, strictly decreasing. */
  sizes: number[];
  demand: number[];
  types: StockType[];
  /** Smallest step between attainable costs (1 for bar counts, the price unit otherwise), or 0 if none. */
  costUnit: number;
}

/** One bar layout: a stock type and how many of each item it holds (dense over items). */
export interface Pattern {
  type: number;
  counts: Int32Array;
}

export interface PatternUse {
  pattern: Pattern;
  mult: number;
}

export function patternLoad(p: Problem, counts: ArrayLike<number>): number {
  let s = 0;
  for (let i = 0; i < counts.length; i++) s += counts[i] * p.sizes[i];
  return s;
}

export function solutionCost(p: Problem, sol: readonly PatternUse[]): number {
  let c = 0;
  for (const u of sol) c += p.types[u.pattern.type].cost * u.mult;
  return c;
}

export function solutionBars(sol: readonly PatternUse[]): number {
  let b = 0;
  for (const u of sol) b += u.mult;
  return b;
}

/** Round a lower bound up to the next attainable objective value, with a margin for floating-point noise. */
export function roundUpBound(p: Problem, lb: number): number {
  const tol = 1e-6 * Math.max(1, Math.abs(lb));
  if (p.costUnit > 0) return p.costUnit * Math.ceil((lb - tol) / p.costUnit - 1e-9);
  return lb - tol;
}
