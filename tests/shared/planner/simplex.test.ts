// The master LP's own revised simplex against HiGHS (the `highs` package, an independent reference solver).
import fc from 'fast-check';
import highsLoader from 'highs';
import { describe, expect, it } from 'vitest';
import { RevisedSimplex } from '../../../shared/planner/core/simplex';

interface Lp {
  m: number;
  cols: { coef: number[]; cost: number }[];
  b: number[];
}

const lpArb: fc.Arbitrary<Lp> = fc.integer({ min: 2, max: 8 }).chain((m) =>
  fc.record({
    m: fc.constant(m),
    cols: fc.array(fc.record({ coef: fc.array(fc.integer({ min: 0, max: 5 }), { minLength: m, maxLength: m }), cost: fc.integer({ min: 1, max: 10 }) }), {
      minLength: m,
      maxLength: 3 * m,
    }),
    b: fc.array(fc.integer({ min: 0, max: 20 }), { minLength: m, maxLength: m }),
  }),
);

function ours(lp: Lp): number {
  const s = new RevisedSimplex(lp.m);
  const heads: number[] = [];
  for (let i = 0; i < lp.m; i++) {
    heads.push(s.addColumn({ rows: Int32Array.of(i), vals: Float64Array.of(1), cost: 1e4 })); // artificial
    s.addColumn({ rows: Int32Array.of(i), vals: Float64Array.of(-1), cost: 0 }); // surplus
  }
  for (const c of lp.cols) {
    const rows: number[] = [];
    const vals: number[] = [];
    c.coef.forEach((a, i) => {
      if (a) {
        rows.push(i);
        vals.push(a);
      }
    });
    s.addColumn({ rows: Int32Array.from(rows), vals: Float64Array.from(vals), cost: c.cost });
  }
  s.setBasis(heads);
  s.setRhs(lp.b);
  expect(s.primal(10_000)).toBe('optimal');
  return s.objective();
}

function lpText(lp: Lp): string {
  const obj = lp.cols.map((c, j) => `${c.cost} x${j}`).join(' + ');
  const rows = lp.b.map((bi, i) => {
    const terms = lp.cols.map((c, j) => (c.coef[i] ? `${c.coef[i]} x${j}` : '')).filter(Boolean);
    return ` r${i}: ${terms.length ? terms.join(' + ') : '0 x0'} >= ${bi}`;
  });
  return `Minimize\n obj: ${obj}\nSubject To\n${rows.join('\n')}\nEnd\n`;
}

describe('revised simplex', () => {
  it('reaches the optimum HiGHS finds on random covering LPs', async () => {
    const highs = await highsLoader();
    fc.assert(
      fc.property(lpArb, (lp) => {
        // Only feasible LPs: every row with demand has some column covering it.
        fc.pre(lp.b.every((bi, i) => bi === 0 || lp.cols.some((c) => c.coef[i] > 0)));
        const ref = highs.solve(lpText(lp), { output_flag: false });
        expect(ref.Status).toBe('Optimal');
        expect(ours(lp)).toBeCloseTo(ref.ObjectiveValue, 6);
      }),
      { numRuns: 80, seed: 11 },
    );
  }, 60_000);

  it('re-optimises with the dual simplex after the right-hand side drops', async () => {
    const highs = await highsLoader();
    fc.assert(
      fc.property(lpArb, fc.array(fc.integer({ min: 0, max: 20 }), { minLength: 8, maxLength: 8 }), (lp, b2raw) => {
        fc.pre(lp.b.every((bi, i) => bi === 0 || lp.cols.some((c) => c.coef[i] > 0)));
        const s = new RevisedSimplex(lp.m);
        const heads: number[] = [];
        for (let i = 0; i < lp.m; i++) {
          heads.push(s.addColumn({ rows: Int32Array.of(i), vals: Float64Array.of(1), cost: 1e4 }));
          s.addColumn({ rows: Int32Array.of(i), vals: Float64Array.of(-1), cost: 0 });
        }
        for (const c of lp.cols) {
          const rows = c.coef.map((a, i) => (a ? i : -1)).filter((i) => i >= 0);
          s.addColumn({ rows: Int32Array.from(rows), vals: Float64Array.from(rows.map((i) => c.coef[i])), cost: c.cost });
        }
        s.setBasis(heads);
        s.setRhs(lp.b);
        s.primal(10_000);
        const b2 = lp.b.map((bi, i) => Math.min(bi, b2raw[i]));
        s.setRhs(b2);
        expect(s.dual(10_000)).toBe('optimal');
        expect(s.primal(10_000)).toBe('optimal');
        const ref = highs.solve(lpText({ ...lp, b: b2 }), { output_flag: false });
        expect(s.objective()).toBeCloseTo(ref.ObjectiveValue, 6);
      }),
      { numRuns: 60, seed: 12 },
    );
  }, 60_000);
});
