import { describe, expect, it } from 'vitest';
import { planCuts } from '../../../shared/planner';
import { orderList } from '../../../shared/planner/order-list';
import { checkPlan } from './helpers';

// Triplets by construction (each 1000 mm bar exactly filled by three parts, kerf 0): the optimum is 40 bars, and
// first fit decreasing is known to miss it on such lists (Falkenauer 1996), so the improvement stage has work to do.
function tripletJob() {
  let s = 5;
  const rnd = () => ((s = (s * 1103515245 + 12345) & 0x7fffffff) / 0x80000000);
  const lengths: number[] = [];
  while (lengths.length < 120) {
    const a = 250 + Math.floor(rnd() * 250);
    const b = 250 + Math.floor(rnd() * 250);
    const c = 1000 - a - b;
    if (c >= 250 && c < 500) lengths.push(a, b, c);
  }
  return { kerf: 0, stock: [{ length: 1000 }], parts: lengths.map((length, i) => ({ length, qty: 1, label: `T${i}` })) };
}

describe('planCuts (async)', () => {
  it('reports progress and returns a feasible plan', async () => {
    const job = tripletJob();
    const phases: string[] = [];
    const plan = await planCuts(job, { timeLimitMs: 1500, onProgress: (p) => phases.push(p.phase) });
    expect(checkPlan(job, plan)).toEqual([]);
    expect(phases[0]).toBe('greedy');
    expect(plan.lowerBound).toBeLessThanOrEqual(40);
    expect(plan.barCount).toBeGreaterThanOrEqual(40);
  }, 30_000);

  it('rejects when cancelled', async () => {
    const ctl = new AbortController();
    ctl.abort();
    await expect(planCuts(tripletJob(), { signal: ctl.signal })).rejects.toThrow();
  });
});

describe('order list', () => {
  it('groups bars by stock and prices the cut-to-length alternative', async () => {
    const job = {
      kerf: 3,
      stock: [{ length: 6000, price: 30 }, { length: 1500, price: 0, qty: 2, label: 'shelf' }],
      parts: [
        { length: 2900, qty: 4, label: 'U' },
        { length: 1400, qty: 2, label: 'R' },
      ],
    };
    const plan = await planCuts(job, { timeLimitMs: 200 });
    const list = orderList('40×40 slot 8', job, plan, { cutFee: 1.5 });
    // Two 6 m bars take the four 2900 parts (2 × 2900 + 3 = 5803); the shelf offcuts take the 1400 parts.
    expect(list.stock.barsToBuy).toBe(2);
    expect(list.stock.cost).toBe(60);
    expect(list.stock.lines.find((l) => l.onHand)?.qty).toBe(2);
    // Cut to length at the 6 m bar's rate (30 / 6 m = 5 per metre) plus 1.5 per cut:
    // 4 × (2.9 × 5 + 1.5) + 2 × (1.4 × 5 + 1.5) = 64 + 17 = 81.
    expect(list.cutToLength.cuts).toBe(6);
    expect(list.cutToLength.cost).toBeCloseTo(81, 9);
  });
});
