// The plan never gets worse when the time limit grows. The planner's stages have fixed budgets on its clock, so with a
// clock that only advances when read (the same run, step for step, whatever the machine does) a longer limit repeats
// the shorter run and goes on after it.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { planCutsSync, type CutJob, type CutPlan } from '../../../shared/planner';

const tickClock = (): (() => number) => {
  let t = 0;
  return () => (t += 0.05);
};
const key = (p: CutPlan): [number, number, number] => [p.cost, p.barCount, p.bars.reduce((s, b) => s + b.stock, 0)];
const notWorse = (a: [number, number, number], b: [number, number, number]): boolean =>
  a[0] < b[0] - 1e-9 || (Math.abs(a[0] - b[0]) <= 1e-9 && (a[1] < b[1] || (a[1] === b[1] && a[2] <= b[2])));

const jobArb: fc.Arbitrary<CutJob> = fc
  .record({
    priced: fc.boolean(),
    stock: fc.uniqueArray(fc.record({ length: fc.integer({ min: 2000, max: 6000 }), price: fc.integer({ min: 10, max: 80 }) }), {
      minLength: 1,
      maxLength: 3,
      selector: (s) => s.length,
    }),
    parts: fc.array(fc.record({ length: fc.integer({ min: 50, max: 1900 }), qty: fc.integer({ min: 1, max: 12 }) }), { minLength: 1, maxLength: 12 }),
  })
  .map((r) => ({
    kerf: 0,
    stock: r.stock.map((s) => (r.priced ? s : { length: s.length })),
    parts: r.parts.map((p, i) => ({ ...p, label: `P${i}` })),
  }));

describe('time limit', () => {
  it('a longer limit on the same job never gives a worse plan (cost, then bars, then stock)', () => {
    fc.assert(
      fc.property(jobArb, fc.integer({ min: 1, max: 60 }), fc.integer({ min: 1, max: 150 }), (job, short, extra) => {
        const a = planCutsSync(job, { timeLimitMs: short, clock: tickClock() });
        const b = planCutsSync(job, { timeLimitMs: short + extra, clock: tickClock() });
        expect(notWorse(key(b), key(a)), `${key(b)} after ${key(a)}`).toBe(true);
      }),
      { numRuns: 30, seed: 42 },
    );
  }, 120_000);

  it('a single priced stock length gets the same plan as the same job without a price', () => {
    fc.assert(
      fc.property(jobArb, fc.integer({ min: 1, max: 90 }), (job, price) => {
        const one = { ...job, stock: [{ length: job.stock[0].length }] };
        const priced = { ...job, stock: [{ length: job.stock[0].length, price }] };
        const a = planCutsSync(one, { timeLimitMs: 100, clock: tickClock() });
        const b = planCutsSync(priced, { timeLimitMs: 100, clock: tickClock() });
        expect(b.barCount).toBe(a.barCount);
        expect(b.cost).toBe(a.barCount * price);
        expect(b.optimal).toBe(a.optimal);
      }),
      { numRuns: 30, seed: 43 },
    );
  }, 60_000);
});
