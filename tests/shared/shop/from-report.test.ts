import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { shopCutList } from '@shared/shop/from-report';
import { cutJobs, FALLBACK_STOCK_MM } from '@shared/shop/shop-plan';

const report = computeReport(demoFrameDocument());
const settings = { trim_mm: 10, minOffcut_mm: 150 };

describe('shop cut list from the engine report', () => {
  const list = shopCutList(report);

  it('keeps every part mark with its quantity and cut length', () => {
    expect(list.parts.map((p) => [p.mark, p.qty, p.cutLength_mm])).toEqual(report.cut_list.map((l) => [l.mark, l.qty, l.cut_length_mm]));
    expect(list.parts.reduce((n, p) => n + p.qty, 0)).toBe(report.members.length);
  });

  it('buys the order quantity of hardware, the difference being spares', () => {
    for (const [i, h] of list.hardware.entries()) {
      const line = report.hardware.lines[i];
      expect(h.toBuy).toBe(line.order_qty);
      expect(h.qty + h.spares).toBe(line.order_qty);
    }
  });

  it('names the members of each slide-in warning instead of their ids', () => {
    expect(list.nutWarnings).toHaveLength(report.hardware.t_nut_order.length);
    const w = list.nutWarnings[0];
    const t = report.hardware.t_nut_order[0];
    expect(w.count).toBe(t.count);
    expect(w.closedBy).toHaveLength(2);
    const named = report.members.find((m) => m.id === t.member_id)!;
    expect(w.member).toBe(named.name ?? named.role);
  });
});

describe('planner jobs for a frame', () => {
  it('offers the planner the supplier’s bars for the profile and their bars for any profile', () => {
    const [job] = cutJobs(report, [{ profileId: null, length_mm: 3000, price: 21 }, { profileId: '30x30-s8', length_mm: 6000, price: 38 }], [], settings);
    expect(job.job.stock).toEqual([
      { length: 3000, price: 21 },
      { length: 6000, price: 38 },
    ]);
    expect(job.considered.map((c) => [c.length_mm, c.source, c.offered])).toEqual([
      [3000, 'any profile', true],
      [6000, 'profile', true],
    ]);
    const [general] = cutJobs(report, [{ profileId: null, length_mm: 3000, price: 21 }], [], settings);
    expect(general.job.stock).toEqual([{ length: 3000, price: 21 }]);
  });

  it('falls back to an unpriced 6 m bar when nobody sells a bar long enough', () => {
    const [job] = cutJobs(report, [{ profileId: null, length_mm: 500, price: 5 }], [], settings);
    expect(job.job.stock.at(-1)).toEqual({ length: FALLBACK_STOCK_MM, price: 0 });
  });

  it('merges shelf offcuts of one length and leaves out those too short for any part', () => {
    const shelf = [
      { profileId: '30x30-s8', length_mm: 1500, qty: 2 },
      { profileId: '30x30-s8', length_mm: 1500, qty: 1 },
      { profileId: '30x30-s8', length_mm: 100, qty: 4 },
      { profileId: '40x40-s8', length_mm: 2000, qty: 1 },
    ];
    const [job] = cutJobs(report, [{ profileId: null, length_mm: 6000, price: 38 }], shelf, settings);
    expect(job.job.stock).toEqual([
      { length: 1500, qty: 3, price: 0, label: 'offcut on hand' },
      { length: 6000, price: 38 },
    ]);
    expect(job.job.kerf).toBe(report.settings.kerf_mm);
    expect(job.job.trim).toBe(10);
  });
});
