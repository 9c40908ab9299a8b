import type { MachiningOp } from './machining';
import type { FrameReport, ReportMember } from './report-types';

/** Lengths closer than this are the same part (mm), as the cut list groups them (to 0.1 mm). */
const SAME_MM = 0.05;

export type PartStatus = 'kept' | 'shorter' | 'longer' | 'new' | 'removed' | 'profile-changed';

export type PartChange = {
  member_id: string;
  status: PartStatus;
  profile_before: string | null;
  profile_after: string | null;
  mark_before: string | null;
  mark_after: string | null;
  cut_length_before_mm: number | null;
  cut_length_after_mm: number | null;
  /** Machining the part needs now and did not before, and machining it no longer needs (end taps, access holes). */
  machining_added: string[];
  machining_removed: string[];
};

/**
 * How each part of the new frame is obtained: `keep` its own old part as it is, `reuse` another old part of the
 * same length, `recut` an old longer part down (leaving an offcut), or `cut-new` from stock.
 */
export type ReuseStep = {
  member_id: string;
  mark: string;
  profile: string;
  cut_length_mm: number;
  action: 'keep' | 'reuse' | 'recut' | 'cut-new';
  from_member_id: string | null;
  from_mark: string | null;
  from_cut_length_mm: number | null;
  offcut_mm: number | null;
  /** Machining to do on the part before it goes in (what the old part lacks); an old hole that is not needed stays. */
  machining: string[];
};

export type WhatChanged = {
  kerf_mm: number;
  parts: PartChange[];
  plan: ReuseStep[];
  /** Old parts the new frame does not use: freed for the offcut shelf. */
  spare: { member_id: string; mark: string; profile: string; cut_length_mm: number }[];
  totals: {
    kept: number;
    shorter: number;
    longer: number;
    new: number;
    removed: number;
    profile_changed: number;
    keep_parts: number;
    reuse_parts: number;
    recut_parts: number;
    new_parts: number;
    new_material_mm: number;
    spare_parts: number;
    /** Parts that need new machining (an end tap, an access hole) whatever happens to their length. */
    machining_parts: number;
    end_taps_added: number;
    access_holes_added: number;
  };
};

type Part = Pick<ReportMember, 'id' | 'mark' | 'profile' | 'cut_length_mm'> & { ops?: readonly MachiningOp[] };

/** A machining step in words, the same for the same work wherever its joint id came from. */
export function describeOp(op: MachiningOp): string {
  if (op.kind === 'end-tap') return `end tap ${op.thread} at the ${op.end} end`;
  return `access hole Ø${op.diameter_mm} mm in the ${op.face} face at ${Math.round(op.at_mm * 10) / 10} mm`;
}

/** Ops of `now` not in `was`, by description (a multiset difference). Unknown old machining counts as none. */
function missing(now: readonly MachiningOp[] | undefined, was: readonly MachiningOp[] | undefined): string[] {
  const left = new Map<string, number>();
  for (const op of was ?? []) left.set(describeOp(op), (left.get(describeOp(op)) ?? 0) + 1);
  const out: string[] = [];
  for (const op of now ?? []) {
    const d = describeOp(op);
    const n = left.get(d) ?? 0;
    if (n > 0) left.set(d, n - 1);
    else out.push(d);
  }
  return out;
}

const byId = (p: { member_id: string }, q: { member_id: string }) => (p.member_id < q.member_id ? -1 : p.member_id > q.member_id ? 1 : 0);

/**
 * What changed between two reports of a frame, part by part (same member id: kept, shorter, longer; new ids;
 * removed ids), and a reuse plan treating the old parts, already cut, as free stock for the new ones: first every
 * part that can stay as it is, then the new requirements longest first, each from an old part of the same length
 * or else the shortest old part that is long enough for it plus a kerf (its own old part on a tie). Longest-first
 * best fit keeps the long old parts for the long new ones, so little new material is cut. Deterministic.
 */
export function diffReports(
  before: { members: readonly Part[] } | Pick<FrameReport, 'members'>,
  after: Pick<FrameReport, 'members' | 'settings'>,
): WhatChanged {
  const kerf = after.settings.kerf_mm;
  const old = new Map<string, Part>(before.members.map((m) => [m.id, m]));
  const now = new Map<string, Part>(after.members.map((m) => [m.id, m]));

  const parts: PartChange[] = [];
  for (const m of after.members) {
    const o = old.get(m.id);
    let status: PartStatus = 'new';
    if (o) {
      const d = m.cut_length_mm - o.cut_length_mm;
      status = o.profile !== m.profile ? 'profile-changed' : Math.abs(d) < SAME_MM ? 'kept' : d < 0 ? 'shorter' : 'longer';
    }
    parts.push({
      member_id: m.id,
      status,
      profile_before: o?.profile ?? null,
      profile_after: m.profile,
      mark_before: o?.mark ?? null,
      mark_after: m.mark,
      cut_length_before_mm: o?.cut_length_mm ?? null,
      cut_length_after_mm: m.cut_length_mm,
      machining_added: o ? missing(m.ops, o.ops) : missing(m.ops, []),
      machining_removed: o ? missing(o.ops, m.ops) : [],
    });
  }
  for (const o of before.members) {
    if (now.has(o.id)) continue;
    parts.push({
      member_id: o.id,
      status: 'removed',
      profile_before: o.profile,
      profile_after: null,
      mark_before: o.mark,
      mark_after: null,
      cut_length_before_mm: o.cut_length_mm,
      cut_length_after_mm: null,
      machining_added: [],
      machining_removed: [],
    });
  }
  parts.sort(byId);

  // Old parts as stock, by profile, shortest first (ties by id) so the first fit found is the best fit.
  const stock = new Map<string, Part[]>();
  for (const o of [...before.members].sort((p, q) => p.cut_length_mm - q.cut_length_mm || (p.id < q.id ? -1 : 1))) {
    const list = stock.get(o.profile) ?? [];
    list.push(o);
    stock.set(o.profile, list);
  }
  const used = new Set<string>();
  const plan = new Map<string, ReuseStep>();
  const step = (m: Part, action: ReuseStep['action'], from: Part | null): ReuseStep => ({
    member_id: m.id,
    mark: m.mark,
    profile: m.profile,
    cut_length_mm: m.cut_length_mm,
    action,
    from_member_id: from?.id ?? null,
    from_mark: from?.mark ?? null,
    from_cut_length_mm: from?.cut_length_mm ?? null,
    offcut_mm: action === 'recut' && from ? Math.round((from.cut_length_mm - m.cut_length_mm - kerf) * 10000) / 10000 : null,
    // A re-cut part loses its cut-off end and whatever was machined there: only a kept or same-length part keeps its ops.
    machining: action === 'keep' || action === 'reuse' ? missing(m.ops, from?.ops) : missing(m.ops, []),
  });

  for (const m of after.members) {
    const o = old.get(m.id);
    if (o && o.profile === m.profile && Math.abs(o.cut_length_mm - m.cut_length_mm) < SAME_MM) {
      used.add(o.id);
      plan.set(m.id, step(m, 'keep', o));
    }
  }
  const open = after.members
    .filter((m) => !plan.has(m.id))
    .sort((p, q) => q.cut_length_mm - p.cut_length_mm || (p.id < q.id ? -1 : 1));
  for (const m of open) {
    const list = (stock.get(m.profile) ?? []).filter((o) => !used.has(o.id));
    const same = list.find((o) => Math.abs(o.cut_length_mm - m.cut_length_mm) < SAME_MM);
    if (same) {
      used.add(same.id);
      plan.set(m.id, step(m, 'reuse', same));
      continue;
    }
    const fits = list.filter((o) => o.cut_length_mm >= m.cut_length_mm + kerf - 1e-9);
    if (fits.length > 0) {
      const shortest = fits[0].cut_length_mm;
      const own = fits.find((o) => o.id === m.id && Math.abs(o.cut_length_mm - shortest) < SAME_MM);
      const from = own ?? fits[0];
      used.add(from.id);
      plan.set(m.id, step(m, 'recut', from));
      continue;
    }
    plan.set(m.id, step(m, 'cut-new', null));
  }

  const steps = after.members.map((m) => plan.get(m.id) as ReuseStep).sort(byId);
  const spare = before.members
    .filter((o) => !used.has(o.id))
    .map((o) => ({ member_id: o.id, mark: o.mark, profile: o.profile, cut_length_mm: o.cut_length_mm }))
    .sort(byId);
  const count = (s: PartStatus) => parts.filter((p) => p.status === s).length;
  const act = (a: ReuseStep['action']) => steps.filter((s) => s.action === a);
  return {
    kerf_mm: kerf,
    parts,
    plan: steps,
    spare,
    totals: {
      kept: count('kept'),
      shorter: count('shorter'),
      longer: count('longer'),
      new: count('new'),
      removed: count('removed'),
      profile_changed: count('profile-changed'),
      keep_parts: act('keep').length,
      reuse_parts: act('reuse').length,
      recut_parts: act('recut').length,
      new_parts: act('cut-new').length,
      new_material_mm: Math.round(act('cut-new').reduce((s, p) => s + p.cut_length_mm, 0) * 10000) / 10000,
      spare_parts: spare.length,
      machining_parts: steps.filter((p) => p.machining.length > 0).length,
      end_taps_added: steps.reduce((n, p) => n + p.machining.filter((d) => d.startsWith('end tap')).length, 0),
      access_holes_added: steps.reduce((n, p) => n + p.machining.filter((d) => d.startsWith('access hole')).length, 0),
    },
  };
}
