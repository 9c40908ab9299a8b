// Lower bounds must never exceed a proven optimum. Checked on the shared benchmark (read in place, never copied) when
// it is present; otherwise on instances built by hand with a known optimum.
import { describe, expect, it } from 'vitest';
import { martelloTothL2 } from '../../../shared/planner/core/bounds';
import { solveCore } from '../../../shared/planner/core/solver';
import type { Problem } from '../../../shared/planner/core/problem';
import { benchAvailable, benchDir, loadInstances } from '../../../scripts/bench-cut/instances';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';

function problemOf(items: number[], capacity: number): Problem {
  const m = new Map<number, number>();
  for (const x of items) m.set(x, (m.get(x) ?? 0) + 1);
  const sizes = [...m.keys()].sort((a, b) => b - a);
  return { sizes, demand: sizes.map((s) => m.get(s)!), types: [{ capacity, cost: 1, qty: null }], costUnit: 1 };
}

function runCore(p: Problem, ms: number) {
  const now = () => performance.now();
  const g = solveCore(p, { deadline: now() + ms, now });
  for (;;) {
    const r = g.next();
    if (r.done) return r.value;
  }
}

/** k bins each filled exactly by three items in [250, 500) of capacity 1000: the optimum is k (triplets). */
function triplets(k: number, seed: number): number[] {
  let s = seed;
  const rnd = () => ((s = (s * 1103515245 + 12345) & 0x7fffffff) / 0x80000000);
  const out: number[] = [];
  while (out.length < 3 * k) {
    const a = 250 + Math.floor(rnd() * 250);
    const b = 250 + Math.floor(rnd() * 250);
    const c = 1000 - a - b;
    if (c >= 250 && c < 500) out.push(a, b, c);
  }
  return out;
}

const present = benchAvailable();
if (!present) console.warn(`shared benchmark not found at ${benchDir}: checking hand-made instances only`);

describe('lower bounds', () => {
  it(present ? 'L2 equals the independently computed L2 and never exceeds the optimum on all 1,615 instances' : 'L2 and the LP bound hold on hand-made triplet instances', () => {
    if (!present) {
      for (let k = 3; k <= 12; k += 3) {
        const p = problemOf(triplets(k, k), 1000);
        expect(martelloTothL2(p.sizes, p.demand, 1000)).toBeLessThanOrEqual(k);
        const r = runCore(p, 300);
        expect(r.lowerBound).toBeLessThanOrEqual(k);
        expect(r.bars).toBeGreaterThanOrEqual(k);
      }
      return;
    }
    const all = loadInstances();
    expect(all.length).toBe(1615);
    // baselines_computed.tsv holds L2 values computed separately from the same files.
    const l2 = new Map<string, number>();
    for (const row of readFileSync(join(benchDir, 'baselines_computed.tsv'), 'utf8').trim().split(/\r?\n/).slice(1)) {
      const f = row.split('\t');
      l2.set(f[0], Number(f[4]));
    }
    let checked = 0;
    for (const ins of all) {
      const p = problemOf(ins.items, ins.capacity);
      const v = martelloTothL2(p.sizes, p.demand, ins.capacity);
      expect(v, ins.name).toBeLessThanOrEqual(ins.optimum);
      expect(v, ins.name).toBe(l2.get(ins.name));
      checked++;
    }
    expect(checked).toBe(1615);
  }, 60_000);

  it(present ? 'the certified LP bound never exceeds the optimum on a sample of the shared instances' : 'the certified LP bound never exceeds the optimum on hand-made instances', () => {
    if (!present) {
      const p = problemOf(triplets(20, 99), 1000);
      const r = runCore(p, 500);
      expect(r.lowerBound).toBeLessThanOrEqual(20);
      return;
    }
    // IRUP-tight hard28 instances (LP within 0.001 of the optimum) test the rounding margin hardest.
    const names = ['Hard28_BPP13', 'Hard28_BPP47', 'Hard28_BPP360', 'Hard28_BPP14', 'Falkenauer_t60_00', 'Falkenauer_u120_00', 'Waescher_TEST0022', 'Waescher_TEST0005'];
    const sample = loadInstances().filter((i) => names.includes(i.name));
    expect(sample.length).toBe(names.length);
    for (const ins of sample) {
      const r = runCore(problemOf(ins.items, ins.capacity), 400);
      expect(r.lowerBound, ins.name).toBeLessThanOrEqual(ins.optimum);
      expect(r.bars, ins.name).toBeGreaterThanOrEqual(ins.optimum);
      if (r.lpBound !== null) expect(r.lpBound, ins.name).toBeLessThanOrEqual(ins.optimum);
    }
  }, 60_000);
});
