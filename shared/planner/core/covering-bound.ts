// A cost bound without the LP: every part takes its length (kerf included) out of some bar, so the bars bought must at
// least add up to the parts' total. The least cost of whole bars that do is a valid lower bound, and unlike the
// fractional material bound (the cheapest rate per millimetre times the total) it counts that a bar is bought whole,
// which is what proves most small priced jobs optimal.

export interface CoverStock {
  capacity: number;
  cost: number;
  /** Bars available, or null for as many as needed. */
  qty: number | null;
}

/** Search nodes before falling back to the fractional bound (still valid, only weaker). */
const NODE_LIMIT = 200_000;

/** Least Σ cost·x with Σ capacity·x ≥ need, 0 ≤ x ≤ qty integer; Infinity when the stock cannot cover `need`. */
export function coveringCost(types: readonly CoverStock[], need: number): number {
  const ts = types
    .filter((t) => t.capacity > 0 && t.qty !== 0)
    .map((t) => ({ cap: t.capacity, cost: t.cost, max: t.qty ?? Infinity }))
    .sort((a, b) => a.cost / a.cap - b.cost / b.cap);
  // Fractional bound over types k…: fill at the cheapest rate first.
  const fractional = (k: number, left: number): number => {
    let cost = 0;
    for (let t = k; t < ts.length && left > 0; t++) {
      const use = Math.min(left, ts[t].max * ts[t].cap);
      cost += (use * ts[t].cost) / ts[t].cap;
      left -= use;
    }
    return left > 0 ? Infinity : cost;
  };
  if (need <= 0) return 0;
  const floor = fractional(0, need);
  if (floor === Infinity) return Infinity;
  let best = Infinity;
  let nodes = 0;
  const search = (k: number, left: number, cost: number): void => {
    if (left <= 0) {
      best = Math.min(best, cost);
      return;
    }
    if (k === ts.length || ++nodes > NODE_LIMIT) return;
    if (cost + fractional(k, left) >= best - 1e-9) return;
    const t = ts[k];
    for (let c = Math.min(t.max, Math.ceil(left / t.cap)); c >= 0; c--) search(k + 1, left - c * t.cap, cost + c * t.cost);
  };
  search(0, need, 0);
  return nodes > NODE_LIMIT ? floor : best;
}

/**
 * Least Σ capacity of exactly `bars` whole bars (within each type's quantity) costing at most `maxCost` and adding up
 * to at least `need`: no plan with that many bars at that cost uses less stock. Infinity when none exists; 0 (proves
 * nothing) past the node limit.
 */
export function leastStockLength(types: readonly CoverStock[], bars: number, maxCost: number, need: number): number {
  const ts = types.filter((t) => t.capacity > 0 && t.qty !== 0).map((t) => ({ cap: t.capacity, cost: t.cost, max: t.qty ?? Infinity }));
  ts.sort((a, b) => a.cap - b.cap);
  let best = Infinity;
  let nodes = 0;
  const search = (k: number, left: number, cost: number, cap: number): boolean => {
    if (++nodes > NODE_LIMIT) return false;
    if (cost > maxCost + 1e-9 || cap >= best) return true;
    if (left === 0) {
      if (cap >= need) best = cap;
      return true;
    }
    if (k === ts.length) return true;
    const t = ts[k];
    for (let c = 0; c <= Math.min(left, t.max); c++) {
      if (!search(k + 1, left - c, cost + c * t.cost, cap + c * t.cap)) return false;
    }
    return true;
  };
  return search(0, bars, 0, 0) ? best : 0;
}
