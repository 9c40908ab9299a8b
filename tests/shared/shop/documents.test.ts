import { describe, expect, it } from 'vitest';
import { drillSheet } from '@shared/shop/drill-list';
import { partLabels } from '@shared/shop/labels';
import { orderList, orderText } from '@shared/shop/order-list';
import { pickSheet } from '@shared/shop/pick-list';
import { barSegments, sawSheet } from '@shared/shop/saw-list';
import { cutList, meta, plans } from './fixtures';

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

describe('order list', () => {
  const order = orderList(plans, cutList, 'EUR', { feePerCut: 1.5, pricePerMetre: { '40x40-s8': 9.5, '20x20-s6': 4 } });

  it('groups bought bars by profile and length and leaves shelf offcuts out', () => {
    expect(order.stock).toEqual([{ profileId: '40x40-s8', profileName: '40×40 slot 8', length_mm: 6000, qty: 2, unitPrice: 42, cost: 84 }]);
    expect(order.stockTotal).toBe(84);
  });

  it('prices the cut-to-length alternative (worked by hand)', () => {
    // 40×40: 4×850 + 4×1120 + 4×520 = 9960 mm = 9.96 m × 9.50 = 94.62; 20×20: 0.96 m × 4.00 = 3.84;
    // 14 cuts × 1.50 = 21.00; total 119.46
    expect(order.cutToLengthMetres.map((m) => m.cost)).toEqual([3.84, 94.62]);
    expect(order.cutCount).toBe(14);
    expect(order.cutToLengthTotal).toBe(119.46);
  });

  it('leaves the alternative total open when a price is unknown', () => {
    expect(orderList(plans, cutList, 'EUR', { feePerCut: null, pricePerMetre: {} }).cutToLengthTotal).toBeNull();
  });

  it('writes a plain-text order', () => {
    const text = orderText(order, { lengthText: (mm) => `${mm} mm`, money: (v) => `€${v.toFixed(2)}`, heading: 'Order' });
    expect(text).toContain('2 × 40×40 slot 8, 6000 mm bars at €42.00 = €84.00');
    expect(text).toContain('14 cuts at €1.50 per cut');
  });
});
