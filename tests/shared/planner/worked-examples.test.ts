// Worked by hand. The kerf convention is the one stated for the planner: trim + Σ parts + (parts − 1) × kerf ≤ bar
// length, and a kept leftover is separated by one more kerf.
import { describe, expect, it } from 'vitest';
import { planCutsSync, validateCutJob } from '../../../shared/planner';
import { InputError } from '../../../shared/errors';

describe('kerf convention, by hand', () => {
  it('fits four 245 mm parts on a 1000 mm bar with 10 mm trim and 3 mm kerf (10 + 980 + 3 × 3 = 999)', () => {
    const plan = planCutsSync({ kerf: 3, trim: 10, minOffcut: 50, stock: [{ length: 1000 }], parts: [{ length: 245, qty: 4, label: 'R' }] });
    expect(plan.barCount).toBe(1);
    // Leftover 1 mm is less than the kerf that would separate it: no offcut, 1000 − 980 = 20 mm lost in all.
    expect(plan.bars[0].offcut).toBe(0);
    expect(plan.bars[0].waste).toBe(20);
    expect(plan.waste_pct).toBeCloseTo(2, 9);
  });

  it('needs a second bar for four 246 mm parts (10 + 984 + 9 = 1003 > 1000)', () => {
    const plan = planCutsSync({ kerf: 3, trim: 10, minOffcut: 50, stock: [{ length: 1000 }], parts: [{ length: 246, qty: 4, label: 'R' }] });
    expect(plan.barCount).toBe(2);
    expect(plan.lowerBound).toBe(2);
    expect(plan.optimal).toBe(true);
  });

  it('keeps the offcut after one more kerf: 6000 − (4 × 1200 + 3 × 3) − 3 = 1188 mm', () => {
    const plan = planCutsSync({ kerf: 3, trim: 0, minOffcut: 100, stock: [{ length: 6000, price: 30 }], parts: [{ length: 1200, qty: 4, label: 'A' }] });
    expect(plan.bars).toHaveLength(1);
    expect(plan.bars[0].offcut).toBe(1188);
    expect(plan.bars[0].waste).toBe(12);
    expect(plan.cost).toBe(30);
    // waste % = (6000 − 4800 − 1188) / 6000
    expect(plan.waste_pct).toBeCloseTo(0.2, 9);
  });

  it('counts a leftover shorter than the minimum offcut as waste', () => {
    // 2000 − (3 × 640 + 2 × 3) = 74; 74 − 3 = 71 < 100
    const plan = planCutsSync({ kerf: 3, trim: 0, minOffcut: 100, stock: [{ length: 2000 }], parts: [{ length: 640, qty: 3, label: 'C' }] });
    expect(plan.bars[0].offcut).toBe(0);
    expect(plan.bars[0].waste).toBe(80);
  });

  it('lists cuts longest first (saw order: a mis-cut long part can still become a short one; common practice)', () => {
    const plan = planCutsSync({
      kerf: 3,
      stock: [{ length: 3000 }],
      parts: [
        { length: 400, qty: 1, label: 'S' },
        { length: 1500, qty: 1, label: 'L' },
        { length: 900, qty: 1, label: 'M' },
      ],
    });
    expect(plan.bars[0].cuts.map((c) => c.label)).toEqual(['L', 'M', 'S']);
  });
});

describe('price-driven choice of stock, by hand', () => {
  const parts = [{ length: 1900, qty: 3, label: 'U' }];
  it('buys one 6 m bar at 25 rather than three 2 m bars at 10 (3 × 1900 + 2 × 3 = 5706 ≤ 6000)', () => {
    const plan = planCutsSync({ kerf: 3, stock: [{ length: 2000, price: 10 }, { length: 6000, price: 25 }], parts });
    expect(plan.cost).toBe(25);
    expect(plan.bars.map((b) => b.stock)).toEqual([6000]);
    expect(plan.optimal).toBe(true);
  });

  it('buys three 2 m bars when the 6 m bar costs 35 (30 < 35)', () => {
    const plan = planCutsSync({ kerf: 3, stock: [{ length: 2000, price: 10 }, { length: 6000, price: 35 }], parts });
    expect(plan.cost).toBe(30);
    expect(plan.bars.map((b) => b.stock)).toEqual([2000, 2000, 2000]);
    expect(plan.optimal).toBe(true);
  });

  it('uses an offcut on hand (price 0, qty 1) before buying', () => {
    // Two 2900 parts fill a bought 6 m bar (5803 mm); the 1900 part goes on the 2000 mm offcut rather than on a
    // second bought bar: cost 25 instead of 50.
    const plan = planCutsSync({
      kerf: 3,
      stock: [{ length: 6000, price: 25 }, { length: 2000, price: 0, qty: 1, label: 'shelf' }],
      parts: [
        { length: 1900, qty: 1, label: 'U' },
        { length: 2900, qty: 2, label: 'V' },
      ],
    });
    expect(plan.cost).toBe(25);
    expect(plan.bars.filter((b) => b.stockLabel === 'shelf')).toHaveLength(1);
  });
});

describe('input errors name the part', () => {
  it('rejects a part longer than every stock bar', () => {
    expect(() => validateCutJob({ stock: [{ length: 2000 }], parts: [{ length: 2400, qty: 1, label: 'A' }] })).toThrow(
      "part 'A' (2400 mm) is longer than every stock bar (2000 mm)",
    );
  });
  it('rejects a negative length and names the field', () => {
    try {
      validateCutJob({ stock: [{ length: 2000 }], parts: [{ length: 100, qty: 1, label: 'ok' }, { length: -5, qty: 1, label: 'B' }] });
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(InputError);
      expect((err as InputError).field).toBe('parts[1].length');
      expect((err as Error).message).toContain("part 'B'");
    }
  });
  it('rejects a kerf as long as a bar', () => {
    expect(() => validateCutJob({ kerf: 500, stock: [{ length: 500 }], parts: [{ length: 100, qty: 1, label: 'A' }] })).toThrow(/kerf/);
  });
});

describe('stock that cannot hold the parts', () => {
  it('says so, naming the stock, when only a short offcut is on hand', () => {
    // Two 900 mm parts need 900 + 3 + 900 = 1803 mm; the only stock is one 1000 mm offcut.
    expect(() =>
      planCutsSync({ kerf: 3, stock: [{ length: 1000, qty: 1, price: 0 }], parts: [{ length: 900, qty: 2, label: 'P' }] }),
    ).toThrow(/^stock: the bars available cannot hold every part/);
  });
});
