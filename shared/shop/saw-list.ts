import { lengthText, opShort } from './format';
import type { PlannedBar, ProfilePlan, ShopCutList, ShopMeta, ShopPart } from './types';

/** Stable name of one cut in a frozen plan: what a tick at the saw refers to. */
export const cutKey = (profileId: string, bar: number, cut: number): string => `${profileId}/${bar}/${cut}`;

export type SawCut = {
  key: string;
  /** 1-based position on the bar, in saw order. */
  seq: number;
  mark: string;
  length_mm: number;
  lengthText: string;
  /** This piece is number `piece` of `of` pieces with this mark. */
  piece: number;
  of: number;
  ops: string[];
};

export type DiagramSegment = { kind: 'trim' | 'cut' | 'kerf' | 'leftover' | 'waste'; from_mm: number; to_mm: number; mark?: string };

export type SawBar = {
  /** 1-based bar number within its profile. */
  n: number;
  stock_mm: number;
  stockText: string;
  fromShelf: boolean;
  cuts: SawCut[];
  leftover_mm: number;
  leftoverText: string;
  leftoverKept: boolean;
  segments: DiagramSegment[];
};

export type SawProfile = {
  profileId: string;
  profileName: string;
  kerfText: string;
  trimText: string;
  bars: SawBar[];
  cutCount: number;
  /** Longest stock length of this profile: the diagram's full width, so every bar of the profile is to one scale. */
  scale_mm: number;
  scaleText: string;
};

export type SawSheet = {
  meta: ShopMeta;
  toleranceClass: string;
  kerfText: string;
  profiles: SawProfile[];
  barCount: number;
  cutCount: number;
};

/** Where each cut sits on the bar under the planner's convention: trim, then parts separated by one kerf. */
export function barSegments(bar: PlannedBar, kerf_mm: number, trim_mm: number): DiagramSegment[] {
  const segs: DiagramSegment[] = [];
  let at = 0;
  if (trim_mm > 0) {
    segs.push({ kind: 'trim', from_mm: 0, to_mm: trim_mm });
    at = trim_mm;
  }
  bar.cuts.forEach((c, i) => {
    if (i > 0 && kerf_mm > 0) {
      segs.push({ kind: 'kerf', from_mm: at, to_mm: at + kerf_mm });
      at += kerf_mm;
    }
    segs.push({ kind: 'cut', from_mm: at, to_mm: at + c.length_mm, mark: c.mark });
    at += c.length_mm;
  });
  if (at < bar.stock_mm - 1e-6) {
    if (bar.leftoverKept && kerf_mm > 0 && bar.cuts.length > 0) {
      const k = Math.min(kerf_mm, bar.stock_mm - at);
      segs.push({ kind: 'kerf', from_mm: at, to_mm: at + k });
      at += k;
    }
    if (at < bar.stock_mm - 1e-6) segs.push({ kind: bar.leftoverKept ? 'leftover' : 'waste', from_mm: at, to_mm: bar.stock_mm });
  }
  return segs;
}

function partsByMark(cutList: ShopCutList): Map<string, ShopPart> {
  return new Map(cutList.parts.map((p) => [`${p.profileId}|${p.mark}`, p]));
}

function profileSheet(plan: ProfilePlan, parts: Map<string, ShopPart>, meta: ShopMeta): SawProfile {
  const u = meta.units;
  const counters = new Map<string, number>();
  const totals = new Map<string, number>();
  for (const b of plan.bars) for (const c of b.cuts) totals.set(c.mark, (totals.get(c.mark) ?? 0) + 1);
  let cutCount = 0;
  const bars = plan.bars.map((bar, bi): SawBar => {
    const cuts = bar.cuts.map((c, ci): SawCut => {
      const piece = (counters.get(c.mark) ?? 0) + 1;
      counters.set(c.mark, piece);
      const part = parts.get(`${plan.profileId}|${c.mark}`);
      cutCount++;
      return {
        key: cutKey(plan.profileId, bi, ci),
        seq: ci + 1,
        mark: c.mark,
        length_mm: c.length_mm,
        lengthText: lengthText(c.length_mm, u),
        piece,
        of: totals.get(c.mark) ?? 1,
        ops: part ? part.ops.map((op) => opShort(op, u)) : [],
      };
    });
    return {
      n: bi + 1,
      stock_mm: bar.stock_mm,
      stockText: lengthText(bar.stock_mm, u),
      fromShelf: bar.fromShelf,
      cuts,
      leftover_mm: bar.leftover_mm,
      leftoverText: lengthText(bar.leftover_mm, u),
      leftoverKept: bar.leftoverKept,
      segments: barSegments(bar, plan.kerf_mm, plan.trim_mm),
    };
  });
  const scale = Math.max(1, ...plan.bars.map((b) => b.stock_mm));
  return {
    profileId: plan.profileId,
    profileName: plan.profileName,
    kerfText: lengthText(plan.kerf_mm, u),
    trimText: lengthText(plan.trim_mm, u),
    bars,
    cutCount,
    scale_mm: scale,
    scaleText: lengthText(scale, u),
  };
}

/** The saw list: per profile, bar by bar in the planner's saw order, each cut with its mark, length and machining. */
export function sawSheet(cutList: ShopCutList, plans: readonly ProfilePlan[], meta: ShopMeta): SawSheet {
  const parts = partsByMark(cutList);
  const profiles = plans.map((p) => profileSheet(p, parts, meta));
  return {
    meta,
    toleranceClass: cutList.toleranceClass,
    kerfText: lengthText(cutList.kerf_mm, meta.units),
    profiles,
    barCount: profiles.reduce((n, p) => n + p.bars.length, 0),
    cutCount: profiles.reduce((n, p) => n + p.cutCount, 0),
  };
}
