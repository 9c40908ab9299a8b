import { describe, expect, it } from 'vitest';
import { drillSheet } from '@shared/shop/drill-list';
import { partLabels } from '@shared/shop/labels';
import { planCutsSync } from '@shared/planner';
import { toProfilePlan } from '@shared/shop/from-plan';
import { orderList, orderText } from '@shared/shop/order-list';
import { pickSheet } from '@shared/shop/pick-list';
import { barSegments, sawSheet } from '@shared/shop/saw-list';
import { cutList, jobs, meta, plans } from './fixtures';

describe('saw sheet', () => {
  const sheet = sawSheet(cutList, plans, meta);

  it('keeps the plan: bars per profile in saw order, every cut once', () => {
    expect(sheet.barCount).toBe(3);
    expect(sheet.cutCount).toBe(14);
    expect(sheet.profiles[0].bars[0].cuts.map((c) => c.mark).join('')).toBe('BBBBAC');
    const keys = sheet.profiles.flatMap((p) => p.bars.flatMap((b) => b.cuts.map((c) => c.key)));
    expect(new Set(keys).size).toBe(14);
  });

  it('numbers the pieces of each mark across bars', () => {
    const a = sheet.profiles[0].bars.flatMap((b) => b.cuts).filter((c) => c.mark === 'A');
    expect(a.map((c) => `${c.piece}/${c.of}`)).toEqual(['1/4', '2/4', '3/4', '4/4']);
  });

  it('places cuts by the kerf convention: trim, then parts one kerf apart (worked by hand)', () => {
    const segs = barSegments(plans[0].bars[0], 3, 10);
    const cuts = segs.filter((s) => s.kind === 'cut');
    // first part starts after the 10 mm trim; the last ends at 10 + 4×1120 + 850 + 520 + 5×3 = 5875
    expect(cuts[0].from_mm).toBe(10);
    expect(cuts.at(-1)!.to_mm).toBe(5875);
    expect(segs.filter((s) => s.kind === 'kerf')).toHaveLength(5);
    expect(segs.at(-1)).toEqual({ kind: 'waste', from_mm: 5875, to_mm: 6000 });
    // a kept leftover is separated by one more kerf: 6000 − 4135 − 3 = 1862
    const kept = barSegments(plans[0].bars[1], 3, 10).at(-1)!;
    expect(kept.kind).toBe('leftover');
    expect(kept.to_mm - kept.from_mm).toBe(1862);
  });

  it('prints machining beside the cut', () => {
    expect(sheet.profiles[0].bars[0].cuts[0].ops).toEqual(['tap start M8', 'tap end M8']);
  });
});

describe('drill list, pick list, labels', () => {
  it('lists only parts with machining, with totals per tap and drill', () => {
    const d = drillSheet(cutList, meta.units);
    expect(d.rows.map((r) => r.mark)).toEqual(['B', 'C']);
    expect(d.totals).toEqual([
      { what: 'Access holes Ø8 mm', count: 4 },
      { what: 'End taps M8 (drill Ø6.8 mm)', count: 8 },
    ]);
  });

  it('groups hardware and keeps the slide-in warnings', () => {
    const p = pickSheet(cutList);
    expect(p.groups.map((g) => g.title)).toEqual(['Brackets and plates', 'Connectors', 'Screws', 'T-nuts and nuts', 'End caps']);
    expect(p.total).toBe(18 + 36 + 36 + 9 + 4);
    expect(p.nutWarnings).toHaveLength(1);
  });

  it('makes one label per piece', () => {
    const labels = partLabels(cutList, meta);
    expect(labels).toHaveLength(14);
    expect(labels.filter((l) => l.mark === 'D').map((l) => l.lengthText)).toEqual(['480 mm', '480 mm']);
  });
});

describe('order list (through the stock planner)', () => {
  const planned = jobs.map((j) => ({ ...j, plan: planCutsSync(j.job, { timeLimitMs: 200 }) }));
  const order = orderList(planned, 'EUR', { cutFee: 1.5, pricePerMetre: { '40x40-s8': 9.5, '20x20-s6': 4 } });

  it('buys the fewest bars and takes the shelf offcut first', () => {
    // 40×40: 10 + 4×1120 + 4×850 + 4×520 + kerfs needs more than one 6000 mm bar, and two are enough (worked by hand
    // in fixtures.ts), so 2 bars at 42.00 = 84.00; 20×20 comes from the 1200 mm offcut on hand.
    expect(order.barsToBuy).toBe(2);
    expect(order.stockTotal).toBe(84);
    const shelf = order.profiles[1].order.stock.lines;
    expect(shelf).toEqual([expect.objectContaining({ stockLength: 1200, qty: 1, onHand: true })]);
  });

  it('prices the cut-to-length alternative (worked by hand)', () => {
    // per part: length in m × price per metre + 1.50 per cut
    // 40×40: 4×(1.12×9.5+1.5) = 48.56; 4×(0.85×9.5+1.5) = 38.30; 4×(0.52×9.5+1.5) = 25.76 → 112.62
    // 20×20: 2×(0.48×4+1.5) = 6.84; total 119.46 for 14 cuts
    expect(order.profiles[0].order.cutToLength.cost).toBe(112.62);
    expect(order.cutCount).toBe(14);
    expect(order.cutToLengthTotal).toBe(119.46);
  });

  it('writes a plain-text order with the chosen way of buying first', () => {
    const f = { lengthText: (mm: number) => `${mm} mm`, money: (v: number) => `€${v.toFixed(2)}`, heading: 'Order' };
    const text = orderText(order, 'stock', f);
    expect(text).toContain('2 × 40×40 slot 8, 6000 mm bars at €42.00 each = €84.00');
    expect(text.indexOf('Stock bars to buy')).toBeLessThan(text.indexOf('cut to length'));
    expect(text).not.toContain('1200 mm bars');
    const alt = orderText(order, 'cut-to-length', f);
    expect(alt.indexOf('Parts cut to length')).toBeLessThan(alt.indexOf('as stock bars'));
    expect(alt).toContain('4 × 40×40 slot 8 cut to 1120 mm (part marks B)');
  });

  it('turns each plan into saw-list bars that respect the kerf convention', () => {
    const p = toProfilePlan('40x40-s8', '40×40 slot 8', jobs[0].job, planned[0].plan);
    for (const bar of p.bars) {
      const used = 10 + bar.cuts.reduce((s, c) => s + c.length_mm, 0) + (bar.cuts.length - 1) * 3;
      expect(used).toBeLessThanOrEqual(bar.stock_mm);
    }
    expect(p.bars.flatMap((b) => b.cuts.map((c) => c.mark)).sort().join('')).toBe('AAAABBBBCCCC');
    expect(toProfilePlan('20x20-s6', '20×20 slot 6', jobs[1].job, planned[1].plan).bars[0].fromShelf).toBe(true);
  });
});
