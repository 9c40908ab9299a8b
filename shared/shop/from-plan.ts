import type { CutJob, CutPlan } from '../planner';
import type { ProfilePlan } from './types';

/** Offcuts on the shelf are stock with a quantity and no price (the planner's own rule for "on hand"). */
export const isShelfStock = (s: { qty?: number | null; price?: number }): boolean => s.qty !== null && s.qty !== undefined && (s.price ?? 0) === 0;

/** The planner's plan for one profile, as the saw list and the cutting view read it. */
export function toProfilePlan(profileId: string, profileName: string, job: CutJob, plan: CutPlan): ProfilePlan {
  return {
    profileId,
    profileName,
    kerf_mm: plan.kerf,
    trim_mm: plan.trim,
    bars: plan.bars.map((b) => {
      const used = plan.trim + b.cuts.reduce((s, c) => s + c.length, 0) + Math.max(0, b.cuts.length - 1) * plan.kerf;
      const kept = b.offcut > 0;
      return {
        stock_mm: b.stock,
        fromShelf: isShelfStock(job.stock[b.stockIndex]),
        price: b.price,
        cuts: b.cuts.map((c) => ({ length_mm: c.length, mark: c.label })),
        leftover_mm: kept ? b.offcut : Math.max(0, Math.round((b.stock - used) * 1000) / 1000),
        leftoverKept: kept,
      };
    }),
    cost: plan.cost,
    waste_pct: plan.waste_pct,
    lowerBound: plan.lowerBound,
    optimal: plan.optimal,
  };
}
