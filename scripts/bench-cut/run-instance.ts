// One benchmark instance through the public planner (kerf 0, trim 0: bin packing is cutting stock without kerf) and
// through plain first fit decreasing as the baseline.
import { greedyPack } from '../../shared/planner/core/greedy';
import type { Problem } from '../../shared/planner/core/problem';
import { planCutsSync } from '../../shared/planner/index';
import type { BenchInstance } from './instances';

export interface InstanceResult {
  name: string;
  set: string;
  optimum: number;
  bars: number;
  lowerBound: number;
  optimal: boolean;
  /** Time on the chosen clock (CPU by default). */
  ms: number;
  wallMs: number;
  ffdBars: number;
  ffdMs: number;
  feasible: boolean;
}

/** Process CPU time in ms: on a machine shared with other work, wall time measures the neighbours' load. */
export const cpuClock = (): number => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};
const wallClock = (): number => performance.now();

export function runInstance(ins: BenchInstance, timeLimitMs: number, clockName: 'cpu' | 'wall' = 'cpu'): InstanceResult {
  const clock = clockName === 'cpu' ? cpuClock : wallClock;
  const counts = new Map<number, number>();
  for (const x of ins.items) counts.set(x, (counts.get(x) ?? 0) + 1);
  const t0 = clock();
  const w0 = wallClock();
  const plan = planCutsSync(
    {
      kerf: 0,
      trim: 0,
      minOffcut: 0,
      stock: [{ length: ins.capacity }],
      parts: [...counts].map(([length, qty]) => ({ length, qty, label: String(length) })),
    },
    { timeLimitMs, clock },
  );
  const ms = clock() - t0;
  const wallMs = wallClock() - w0;
  // Independent check of the answer: every item placed once, no bar over capacity.
  const placed = new Map<number, number>();
  let feasible = true;
  for (const bar of plan.bars) {
    let load = 0;
    for (const c of bar.cuts) {
      load += c.length;
      placed.set(c.length, (placed.get(c.length) ?? 0) + 1);
    }
    if (load > ins.capacity) feasible = false;
  }
  for (const [len, q] of counts) if (placed.get(len) !== q) feasible = false;

  const sizes = [...counts.keys()].sort((a, b) => b - a);
  const p: Problem = { sizes, demand: sizes.map((s) => counts.get(s)!), types: [{ capacity: ins.capacity, cost: 1, qty: null }], costUnit: 1 };
  const f0 = clock();
  const ffd = greedyPack(p, p.demand, [null], 'first');
  const ffdMs = clock() - f0;
  return {
    name: ins.name,
    set: ins.set,
    optimum: ins.optimum,
    bars: plan.barCount,
    lowerBound: plan.lowerBound,
    optimal: plan.optimal,
    ms,
    wallMs,
    ffdBars: ffd ? ffd.length : Infinity,
    ffdMs,
    feasible,
  };
}
