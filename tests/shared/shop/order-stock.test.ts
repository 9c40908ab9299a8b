// Orders plan against every bar the supplier quotes that fits the profile, and say which bars were considered and
// why the plan buys what it buys.
import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { planCutsSync } from '@shared/planner';
import { explainChoice } from '@shared/shop/order-list';
import { cutJobs } from '@shared/shop/shop-plan';

const report = computeReport(demoFrameDocument());
const profile = report.cut_list[0].profile;

describe('supplier bars for an order', () => {
  it('plans on the profile’s 6 m bar at 48 and an “any profile” 3 m bar at 26 together: 218, not 240', () => {
    const [j] = cutJobs(report, [{ profileId: profile, length_mm: 6000, price: 48 }, { profileId: null, length_mm: 3000, price: 26 }], [], { trim_mm: 10, minOffcut_mm: 150 });
    // By hand: nine 2900 mm parts; a 6 m bar holds two (10 + 2 × 2900 + 3 = 5813), a 3 m bar one (10 + 2900 = 2910).
    // Four 6 m bars and one 3 m bar = 4 × 48 + 26 = 218; 6 m bars alone need five = 240.
    const job = { ...j.job, kerf: 3, parts: [{ length: 2900, qty: 9, label: 'post' }] };
    const plan = planCutsSync(job, { timeLimitMs: 500 });
    expect(plan.cost).toBe(218);
    const { considered, choice } = explainChoice({ profileId: profile, profileName: 'x', job, plan, considered: j.considered });
    expect(considered.map((c) => [c.length_mm, c.source, c.used])).toEqual([
      [3000, 'any profile', 1],
      [6000, 'profile', 4],
    ]);
    expect(choice).toContain('4 × 6000 mm at 48');
    expect(choice).toContain('proven');
    // In an inch workshop the same words in inches: 6000 mm / 25.4 = 236.22 in, 236 1/4 to the sixteenth (NIST: 1 in = 25.4 mm exactly).
    const inches = explainChoice({ profileId: profile, profileName: 'x', job, plan, considered: j.considered }, { display: 'in', frac: 16 });
    expect(inches.choice).toContain('4 × 236 1/4" at 48');
    expect(inches.choice).not.toMatch(/\d mm/);
  });

  it('offers one length once, at the cheaper of two quotes', () => {
    const [j] = cutJobs(report, [{ profileId: profile, length_mm: 6000, price: 48 }, { profileId: null, length_mm: 6000, price: 44 }], [], { trim_mm: 0, minOffcut_mm: 0 });
    expect(j.job.stock).toEqual([{ length: 6000, price: 44 }]);
    expect(j.considered.find((c) => !c.offered)?.note).toMatch(/cheaper/);
  });
});
