import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { solveKnapsack } from '../../../shared/planner/core/knapsack';

/** Exhaustive bounded knapsack (tiny instances only). */
function brute(w: number[], v: number[], u: number[], cap: number): number {
  let best = 0;
  const rec = (i: number, room: number, val: number): void => {
    if (i === w.length) {
      best = Math.max(best, val);
      return;
    }
    for (let a = 0; a <= u[i] && a * w[i] <= room; a++) rec(i + 1, room - a * w[i], val + a * v[i]);
  };
  rec(0, cap, 0);
  return best;
}

describe('pricing knapsack', () => {
  const inst = fc.array(fc.record({ w: fc.integer({ min: 1, max: 60 }), v: fc.double({ min: 0, max: 1, noNaN: true }), u: fc.integer({ min: 0, max: 3 }) }), {
    minLength: 1,
    maxLength: 7,
  });
  it('matches exhaustive search, small capacity (dynamic programme)', () => {
    fc.assert(
      fc.property(inst, fc.integer({ min: 1, max: 150 }), (items, cap) => {
        const w = items.map((i) => i.w);
        const v = items.map((i) => i.v);
        const u = items.map((i) => i.u);
        const r = solveKnapsack(w, v, u, cap);
        const b = brute(w, v, u, cap);
        expect(r.value).toBeCloseTo(b, 9);
        expect(r.upper).toBeGreaterThanOrEqual(b - 1e-12);
        let load = 0;
        let val = 0;
        r.counts.forEach((c, i) => {
          expect(c).toBeLessThanOrEqual(u[i]);
          load += c * w[i];
          val += c * v[i];
        });
        expect(load).toBeLessThanOrEqual(cap);
        expect(val).toBeCloseTo(r.value, 9);
      }),
      { numRuns: 300, seed: 3 },
    );
  });
  it('matches exhaustive search at large capacity with many items, one of each', () => {
    // Long lists of distinct lengths on long bars (the case the pruned state list serves); at most one of each keeps
    // the exhaustive check small.
    const many = fc.array(fc.record({ w: fc.integer({ min: 10_000, max: 50_000 }), v: fc.double({ min: 0.05, max: 1, noNaN: true }) }), {
      minLength: 8,
      maxLength: 16,
    });
    fc.assert(
      fc.property(many, fc.integer({ min: 100_000, max: 150_000 }), (items, cap) => {
        const w = items.map((i) => i.w);
        const v = items.map((i) => i.v);
        const u = items.map(() => 1);
        const r = solveKnapsack(w, v, u, cap);
        expect(r.value).toBeCloseTo(brute(w, v, u, cap), 9);
        let load = 0;
        let val = 0;
        r.counts.forEach((c, i) => {
          expect(c).toBeLessThanOrEqual(1);
          load += c * w[i];
          val += c * v[i];
        });
        expect(load).toBeLessThanOrEqual(cap);
        expect(val).toBeCloseTo(r.value, 9);
      }),
      { numRuns: 300, seed: 5 },
    );
  });
  it('matches exhaustive search at large capacity (no table over the capacity)', () => {
    fc.assert(
      fc.property(inst, fc.integer({ min: 200_000, max: 900_000 }), (items, cap) => {
        // Scale weights so patterns hold a handful of items, as on 100 000-unit bars.
        const w = items.map((i) => i.w * 7919);
        const v = items.map((i) => i.v);
        const u = items.map((i) => i.u);
        const r = solveKnapsack(w, v, u, cap);
        expect(r.value).toBeCloseTo(brute(w, v, u, cap), 9);
        let load = 0;
        r.counts.forEach((c, i) => (load += c * w[i]));
        expect(load).toBeLessThanOrEqual(cap);
      }),
      { numRuns: 300, seed: 4 },
    );
  });
});
