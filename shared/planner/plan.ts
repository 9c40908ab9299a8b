// From the core's patterns back to bars of labelled parts in millimetres.
import type { CoreResult } from './core/solver';
import type { PreparedJob } from './scale';

export interface PlannedCut {
  length: number;
  label: string;
}

export interface PlannedBar {
  /** Stock bar length (mm). */
  stock: number;
  /** Index into the job's stock list. */
  stockIndex: number;
  stockLabel?: string;
  price: number;
  /** Cuts in saw order: longest first, so a mis-cut part can still become a shorter one (common practice). */
  cuts: PlannedCut[];
  /** Reusable offcut kept (mm), 0 when none. */
  offcut: number;
  /** Material lost on this bar: trim, kerfs and any leftover too short to keep (mm). */
  waste: number;
}

export interface CutPlan {
  barCount: number;
  /** Certified lower bound on the number of bars. */
  lowerBound: number;
  /** The plan is proven optimal for its objective (cost when prices are given, bar count otherwise). */
  optimal: boolean;
  cost: number;
  /** Certified lower bound on the cost (equal to the bar-count bound × price semantics when no prices). */
  costLowerBound: number;
  /** (stock used − parts − kept offcuts) / stock used × 100. */
  waste_pct: number;
  /** Relative gap between the plan and its bound on the objective (0 when proven optimal). */
  gap: number;
  objective: 'cost' | 'bars';
  bars: PlannedBar[];
  kerf: number;
  trim: number;
  minOffcut: number;
  /** lpBound: the LP relaxation's optimum when the root LP finished, else null (`lowerBound` is the certified bound). */
  /** mip: the exact model's MIP solver (HiGHS) was at hand for this plan. */
  stats: { elapsedMs: number; greedyBars: number; lpBound: number | null; nodes: number; mip: boolean };
}

const round3 = (v: number): number => Math.round(v * 1000) / 1000;

export function buildPlan(prep: PreparedJob, res: CoreResult, elapsedMs: number, mip = false): CutPlan {
  const { job, problem } = prep;
  // Each core item's part lines, drawn from one piece at a time as bars take them.
  const queues = prep.pieces.map((list) => list.map((x) => ({ ...x })));
  const draw = (i: number): { length: number; label: string } | undefined => {
    const q = queues[i];
    while (q.length && q[q.length - 1].qty === 0) q.pop();
    const top = q[q.length - 1];
    if (!top) return undefined;
    top.qty--;
    return top;
  };
  const bars: PlannedBar[] = [];
  for (const use of res.solution) {
    for (let c = 0; c < use.mult; c++) {
      const stockIndex = prep.stockIndex[use.pattern.type];
      const stock = job.stock[stockIndex];
      const cuts: PlannedCut[] = [];
      use.pattern.counts.forEach((k, i) => {
        for (let t = 0; t < k; t++) {
          const piece = draw(i);
          if (piece) cuts.push({ length: piece.length, label: piece.label });
        }
      });
      if (cuts.length === 0) continue;
      cuts.sort((a, b) => b.length - a.length || a.label.localeCompare(b.label));
      const used = job.trim + cuts.reduce((s, x) => s + x.length, 0) + (cuts.length - 1) * job.kerf;
      const leftover = stock.length - used;
      const keep = leftover - job.kerf;
      const offcut = keep >= job.minOffcut && keep > 0 ? round3(keep) : 0;
      bars.push({
        stock: stock.length,
        stockIndex,
        ...(stock.label ? { stockLabel: stock.label } : {}),
        price: stock.price ?? 0,
        cuts,
        offcut,
        waste: round3(stock.length - (used - job.trim - (cuts.length - 1) * job.kerf) - offcut),
      });
    }
  }
  bars.sort((a, b) => a.stockIndex - b.stockIndex || b.cuts[0].length - a.cuts[0].length);
  const stockUsed = bars.reduce((s, b) => s + b.stock, 0);
  const partsLen = job.parts.reduce((s, p) => s + p.length * p.qty, 0);
  const offcuts = bars.reduce((s, b) => s + b.offcut, 0);
  const cost = bars.reduce((s, b) => s + b.price, 0);
  const single = prep.unitPrice !== null;
  const barsLb = prep.byCost && !single ? res.barLowerBound : res.lowerBound;
  const costLb = single ? res.lowerBound * prep.unitPrice! : prep.byCost ? res.lowerBound : 0;
  const value = prep.byCost ? cost : bars.length;
  const bound = prep.byCost ? costLb : barsLb;
  return {
    barCount: bars.length,
    lowerBound: Math.min(barsLb, bars.length),
    optimal: res.optimal,
    cost: Math.round(cost * 1e4) / 1e4,
    costLowerBound: Math.round(Math.min(costLb, cost) * 1e4) / 1e4,
    waste_pct: stockUsed > 0 ? Math.round(((stockUsed - partsLen - offcuts) / stockUsed) * 1e5) / 1e3 : 0,
    gap: res.optimal || bound <= 0 ? 0 : Math.round(((value - bound) / bound) * 1e5) / 1e5,
    objective: prep.byCost ? 'cost' : 'bars',
    bars,
    kerf: job.kerf,
    trim: job.trim,
    minOffcut: job.minOffcut,
    stats: { elapsedMs: Math.round(elapsedMs), greedyBars: res.stats.greedyBars, lpBound: res.lpBound, nodes: res.stats.nodes, mip },
  };
}
