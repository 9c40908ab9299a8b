// Least cost, then fewest bars, then least stock, on priced jobs with several stock lengths: the jobs that the planner
// once got wrong, and random small jobs against two exact references written apart from the planner (a brute force
// over every partition of the pieces into bars, and the maximal-pattern integer model on HiGHS, the `highs` package).
import fc from 'fast-check';
import highsLoader from 'highs';
import { describe, expect, it } from 'vitest';
import { planCutsSync, type CutJob, type CutPlan } from '../../../shared/planner';
import { reference } from '../../../scripts/bench-cut/reference';
import { checkPlan } from './helpers';

/** Least (cost, bars, stock length) over every partition of the pieces into bars, each bar of any stock that holds it. */
function bruteForce(job: CutJob): { cost: number; bars: number; stock: number } {
  const kerf = job.kerf ?? 3;
  const trim = job.trim ?? 0;
  const pieces = job.parts.flatMap((p) => Array.from({ length: p.qty }, () => p.length));
  const fits = (block: number[], length: number): boolean =>
    trim + block.reduce((s, x) => s + x, 0) + (block.length - 1) * kerf <= length;
  let best = { cost: Infinity, bars: Infinity, stock: Infinity };
  const better = (a: typeof best, b: typeof best): boolean =>
    a.cost < b.cost - 1e-9 || (Math.abs(a.cost - b.cost) <= 1e-9 && (a.bars < b.bars || (a.bars === b.bars && a.stock < b.stock)));
  // Stock for each block of a partition, within the quantities on hand.
  const assign = (blocks: number[][], k: number, left: (number | null)[], cost: number, stock: number): void => {
    if (k === blocks.length) {
      const cand = { cost, bars: blocks.length, stock };
      if (better(cand, best)) best = cand;
      return;
    }
    job.stock.forEach((s, t) => {
      if (left[t] === 0 || !fits(blocks[k], s.length)) return;
      const next = left.slice();
      if (next[t] !== null) next[t]!--;
      assign(blocks, k + 1, next, cost + (s.price ?? 0), stock + s.length);
    });
  };
  const blocks: number[][] = [];
  const part = (i: number): void => {
    if (i === pieces.length) {
      assign(blocks, 0, job.stock.map((s) => s.qty ?? null), 0, 0);
      return;
    }
    for (const b of blocks) {
      b.push(pieces[i]);
      part(i + 1);
      b.pop();
    }
    blocks.push([pieces[i]]);
    part(i + 1);
    blocks.pop();
  };
  part(0);
  return best;
}

const stockUsed = (plan: CutPlan): number => plan.bars.reduce((s, b) => s + b.stock, 0);

describe('priced jobs with several stock lengths', () => {
  it('finds the 138 plan on 6 m, 3 m and two 2650 mm offcuts (a greedy pass gives 144)', async () => {
    // Reconstructed job: the hand-checked witness 6000: 2×1947 + 1575 + 3×161; 3000: 2151; 3000: 2151; 2650: 2151;
    // 2650: 1575 costs 72 + 2 × 33 + 0 = 138 with the 2650 mm bars as offcuts on hand (two, free).
    const job: CutJob = {
      kerf: 3,
      stock: [
        { length: 6000, price: 72 },
        { length: 3000, price: 33 },
        { length: 2650, price: 0, qty: 2, label: 'offcut on hand' },
      ],
      parts: [
        { length: 1947, qty: 2, label: 'A' },
        { length: 1575, qty: 2, label: 'B' },
        { length: 161, qty: 3, label: 'C' },
        { length: 2151, qty: 3, label: 'D' },
      ],
    };
    // The witness fits by the kerf rule: 2×1947 + 1575 + 3×161 + 5 × 3 = 5967 ≤ 6000; the others hold one part each.
    expect(2 * 1947 + 1575 + 3 * 161 + 5 * 3).toBeLessThanOrEqual(6000);
    const plan = planCutsSync(job);
    expect(checkPlan(job, plan)).toEqual([]);
    expect(plan.cost).toBe(138);
    expect(plan.optimal).toBe(true);
    const ref = reference(await highsLoader(), job, 30);
    expect(ref.proven).toBe(true);
    expect([plan.cost, plan.barCount]).toEqual([ref.cost, ref.bars]);
  }, 60_000);

  it('cuts 8 × 1532 + 2 × 345 from 6 m @ 72 and 3 m @ 30 for 204', () => {
    // By hand: a 6 m bar holds three 1532 (4596) and both 345; two 6 m bars and two 3 m bars (one 1532 each) = 204;
    // three 6 m bars cost 216.
    const job: CutJob = {
      kerf: 3,
      stock: [
        { length: 6000, price: 72 },
        { length: 3000, price: 30 },
      ],
      parts: [
        { length: 1532, qty: 8, label: 'rail' },
        { length: 345, qty: 2, label: 'stub' },
      ],
    };
    const plan = planCutsSync(job);
    expect(checkPlan(job, plan)).toEqual([]);
    expect(plan.cost).toBe(204);
    expect(plan.optimal).toBe(true);
    expect(plan.costLowerBound).toBe(204);
  });

  it('agrees with a brute force over every partition on random jobs of up to 7 pieces', () => {
    const jobArb = fc.record({
      kerf: fc.integer({ min: 0, max: 4 }),
      stock: fc.uniqueArray(fc.record({ length: fc.integer({ min: 1500, max: 6000 }), price: fc.integer({ min: 1, max: 80 }) }), {
        minLength: 2,
        maxLength: 3,
        selector: (s) => s.length,
      }),
      offcut: fc.option(fc.record({ length: fc.integer({ min: 500, max: 2500 }), qty: fc.integer({ min: 1, max: 2 }) }), { nil: undefined }),
      parts: fc.array(fc.record({ length: fc.integer({ min: 100, max: 1500 }), qty: fc.integer({ min: 1, max: 3 }) }), { minLength: 1, maxLength: 4 }),
    });
    fc.assert(
      fc.property(jobArb, (r) => {
        const parts = r.parts.map((p, i) => ({ ...p, label: `P${i}` }));
        fc.pre(parts.reduce((s, p) => s + p.qty, 0) <= 7);
        const stock = [...r.stock, ...(r.offcut ? [{ ...r.offcut, price: 0 }] : [])];
        const job: CutJob = { kerf: r.kerf, stock, parts };
        const plan = planCutsSync(job, { timeLimitMs: 500 });
        const exact = bruteForce(job);
        expect(checkPlan(job, plan)).toEqual([]);
        expect([plan.cost, plan.barCount, stockUsed(plan)]).toEqual([exact.cost, exact.bars, exact.stock]);
        expect(plan.optimal).toBe(true);
      }),
      { numRuns: 60, seed: 15 },
    );
  }, 60_000);

  it('reaches the least cost and bar count of the exact model on HiGHS on random jobs of up to 24 pieces', async () => {
    const highs = await highsLoader();
    const jobArb = fc.record({
      stock: fc.uniqueArray(fc.record({ length: fc.constantFrom(6000, 5000, 4000, 3000, 2500), price: fc.integer({ min: 20, max: 90 }) }), {
        minLength: 2,
        maxLength: 3,
        selector: (s) => s.length,
      }),
      parts: fc.array(fc.record({ length: fc.integer({ min: 150, max: 2400 }), qty: fc.integer({ min: 1, max: 6 }) }), { minLength: 2, maxLength: 5 }),
    });
    fc.assert(
      fc.property(jobArb, (r) => {
        const parts = r.parts.map((p, i) => ({ ...p, label: `P${i}` }));
        fc.pre(parts.reduce((s, p) => s + p.qty, 0) <= 24);
        const job: CutJob = { kerf: 3, stock: r.stock, parts };
        const ref = reference(highs, job, 20);
        fc.pre(ref.proven);
        const plan = planCutsSync(job, { timeLimitMs: 1500 });
        expect(checkPlan(job, plan)).toEqual([]);
        expect([plan.cost, plan.barCount]).toEqual([ref.cost, ref.bars]);
      }),
      { numRuns: 15, seed: 21 },
    );
  }, 120_000);
});
