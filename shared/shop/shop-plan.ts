import { planCuts, type CutJob, type StockInput } from '../planner';
import type { FrameReport } from '../engine/report-types';
import { shopCutList } from './from-report';
import { toProfilePlan } from './from-plan';
import type { PlannedProfile } from './order-list';
import type { ConsideredBar, ProfilePlan, ShopCutList } from './types';

/** A bar a supplier sells: for one profile, or (profileId null) for any profile they stock. */
export type StockOffer = { profileId: string | null; length_mm: number; price: number };
export type ShelfOffcut = { profileId: string; length_mm: number; qty: number };

export type ShopSettings = {
  /** Squaring cut at the start of each bar. */
  trim_mm: number;
  /** Shorter leftovers are waste; longer ones go back on the shelf. */
  minOffcut_mm: number;
};

/** 6 m bars, the commonest metric stock length (DOMAIN.md), priced 0 when no supplier offers anything. */
export const FALLBACK_STOCK_MM = 6000;

export type ShopPlanResult = { cutList: ShopCutList; planned: PlannedProfile[]; plans: ProfilePlan[] };

/** The stock planner's jobs for a frame: its parts per profile, the supplier's bars and the shelf's offcuts. */
export function cutJobs(
  report: FrameReport,
  offers: readonly StockOffer[],
  shelf: readonly ShelfOffcut[],
  s: ShopSettings,
): { profileId: string; profileName: string; job: CutJob; considered: ConsideredBar[] }[] {
  const byProfile = new Map<string, { name: string; parts: CutJob['parts'] }>();
  for (const l of report.cut_list) {
    const e = byProfile.get(l.profile) ?? { name: l.profile_name, parts: [] };
    e.parts.push({ length: l.cut_length_mm, qty: l.qty, label: l.mark });
    byProfile.set(l.profile, e);
  }
  return [...byProfile].map(([profileId, e]) => {
    const longest = Math.max(...e.parts.map((p) => p.length));
    const shortest = Math.min(...e.parts.map((p) => p.length));
    // Every bar the supplier quotes that fits the profile, its own or "any profile", goes to the planner, which picks
    // the cheapest mix; of two quotes for one length the cheaper is offered (the profile's own on a tie).
    const fitting = offers
      .filter((o) => o.profileId === profileId || o.profileId === null)
      .map((o) => ({ o, source: (o.profileId === null ? 'any profile' : 'profile') as ConsideredBar['source'] }))
      .sort((a, b) => a.o.length_mm - b.o.length_mm || a.o.price - b.o.price || (a.source === 'profile' ? -1 : 1));
    const considered: ConsideredBar[] = [];
    const stock: StockInput[] = [];
    for (const { o, source } of fitting) {
      const same = considered.find((c) => c.length_mm === o.length_mm && c.offered);
      considered.push({ length_mm: o.length_mm, price: o.price, source, offered: !same, used: 0, ...(same ? { note: 'the same length is quoted cheaper' } : {}) });
      if (!same) stock.push({ length: o.length_mm, price: o.price });
    }
    if (!stock.some((x) => x.length - s.trim_mm >= longest)) {
      const length = Math.max(FALLBACK_STOCK_MM, Math.ceil(longest + s.trim_mm));
      stock.push({ length, price: 0 });
      considered.push({ length_mm: length, price: 0, source: 'fallback', offered: true, used: 0, note: 'no quoted bar holds the longest part; priced 0' });
    }
    // Offcuts of one length are one kind of stock, however many rows they came in on.
    const byLength = new Map<number, number>();
    for (const o of shelf) {
      if (o.profileId === profileId && o.qty > 0 && o.length_mm >= s.trim_mm + shortest) byLength.set(o.length_mm, (byLength.get(o.length_mm) ?? 0) + o.qty);
    }
    const onShelf: StockInput[] = [...byLength].sort((a, b) => b[0] - a[0]).map(([length, qty]) => ({ length, qty, price: 0, label: 'offcut on hand' }));
    return {
      profileId,
      profileName: e.name,
      job: { kerf: report.settings.kerf_mm, trim: s.trim_mm, minOffcut: s.minOffcut_mm, stock: [...onShelf, ...stock], parts: e.parts },
      considered,
    };
  });
}

/** Cut list, planner jobs and plans for a frame in one go (the planner runs per profile, time-limited). */
export async function planShop(report: FrameReport, offers: readonly StockOffer[], shelf: readonly ShelfOffcut[], s: ShopSettings, timeLimitMs = 1500): Promise<ShopPlanResult> {
  const cutList = shopCutList(report);
  const planned: PlannedProfile[] = [];
  for (const j of cutJobs(report, offers, shelf, s)) planned.push({ ...j, plan: await planCuts(j.job, { timeLimitMs }) });
  return { cutList, planned, plans: planned.map((p) => toProfilePlan(p.profileId, p.profileName, p.job, p.plan)) };
}
