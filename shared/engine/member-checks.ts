import { beam, type BeamInput, type BeamLoad, type BeamResult, type BeamSupport } from './beam';
import type { MemberGeometry } from './resolve-members';

/** Loads closer than this are at one point; spans shorter than this are not checked (mm). */
export const SAME_POINT_MM = 1;

/** A load on a member in its own coordinates (from its start face), newtons, already times the shock factor. */
export type MemberLoad = { kind: 'point'; P_N: number; x_mm: number } | { kind: 'udl'; w_N_per_mm: number; from_mm: number; to_mm: number };

/** Where a member is held up, along it, and which member (or upright) takes the reaction there. */
export type Support = { x_mm: number; target: number | null };

export type SpanCheck = {
  from_mm: number;
  to_mm: number;
  span_mm: number;
  /** `simple` between two supports (fixed ends give the lower bound), `cantilever` past the last support. */
  support: 'simple' | 'cantilever';
  deflection_mm: number;
  deflection_fixed_mm: number | null;
  limit_mm: number;
  moment_Nmm: number;
  moment_fixed_Nmm: number | null;
  stress_MPa: number;
  allowable_MPa: number;
  utilisation: number;
};

export type MemberCheck = {
  member: number;
  load_N: number;
  /** Section axis used: the one that bends under a vertical load at the member's rotation. */
  bending_axis: 'x' | 'y';
  I_mm4: number;
  W_mm3: number;
  E_MPa: number;
  spans: SpanCheck[];
  /** Largest ratio of deflection to its limit or stress to its allowable; null when the member has no support. */
  utilisation: number | null;
  governing: 'deflection' | 'stress' | null;
};

export type Limits = { shockFactor: number; deflectionLimitN: number; safetyFactor: number };

function clip(loads: readonly MemberLoad[], lo: number, hi: number, includeHi: boolean, mirror: boolean): BeamLoad[] {
  const span = hi - lo;
  const pos = (x: number) => Math.min(Math.max(mirror ? hi - x : x - lo, 0), span);
  const out: BeamLoad[] = [];
  for (const l of loads) {
    if (l.kind === 'point') {
      const inside = l.x_mm >= lo && (l.x_mm < hi || (includeHi && l.x_mm <= hi));
      if (inside) out.push({ kind: 'point', P_N: l.P_N, a_mm: pos(l.x_mm) });
    } else {
      const a = Math.max(l.from_mm, lo);
      const b = Math.min(l.to_mm, hi);
      if (b - a <= 1e-9) continue;
      const [p, q] = mirror ? [pos(b), pos(a)] : [pos(a), pos(b)];
      out.push(p <= 1e-9 && q >= span - 1e-9 ? { kind: 'udl', w_N_per_mm: l.w_N_per_mm } : { kind: 'udl', w_N_per_mm: l.w_N_per_mm, from_mm: p, to_mm: q });
    }
  }
  return out;
}

/** Beams solved once per report: a long run repeats the same bay, and with it the same beams. */
export type BeamMemo = (input: BeamInput) => BeamResult;

export function beamMemo(): BeamMemo {
  const cache = new Map<string, BeamResult>();
  return (input) => {
    let key = `${input.support}|${input.span_mm}|${input.E_MPa}|${input.I_mm4}`;
    for (const l of input.loads) key += l.kind === 'point' ? `|p${l.P_N}@${l.a_mm}` : `|u${l.w_N_per_mm}@${l.from_mm ?? ''}-${l.to_mm ?? ''}`;
    let r = cache.get(key);
    if (!r) {
      r = beam(input);
      cache.set(key, r);
    }
    return r;
  };
}

/**
 * One horizontal member checked as a series of beams between its supports (simply supported, with fixed ends as
 * the lower bound), overhangs as cantilevers; returns the check and the reaction at each support.
 */
export function checkMember(
  memo: BeamMemo,
  m: MemberGeometry,
  L: number,
  loads: readonly MemberLoad[],
  supports: readonly Support[],
  limits: Limits,
): { result: MemberCheck; reactions: number[] } {
  const s = m.info.section;
  const upright = m.member.rotation_deg === 0 || m.member.rotation_deg === 180;
  const I = upright ? s.Ix_mm4 : s.Iy_mm4;
  const W = upright ? s.Wx_mm3 : s.Wy_mm3;
  const allowable = s.yield_MPa / limits.safetyFactor;
  const total = loads.reduce((sum, l) => sum + (l.kind === 'point' ? l.P_N : l.w_N_per_mm * (l.to_mm - l.from_mm)), 0);
  const reactions = supports.map(() => 0);
  const base = { member: m.index, load_N: total, bending_axis: (upright ? 'x' : 'y') as 'x' | 'y', I_mm4: I, W_mm3: W, E_MPa: s.E_MPa };
  if (supports.length === 0) return { result: { ...base, spans: [], utilisation: null, governing: null }, reactions };

  const spans: SpanCheck[] = [];
  let worst = 0;
  let governing: 'deflection' | 'stress' = 'deflection';
  const run = (lo: number, hi: number, support: BeamSupport, beamLoads: BeamLoad[]) => {
    const span = hi - lo;
    if (span < SAME_POINT_MM || beamLoads.length === 0) return null;
    const input = { span_mm: span, E_MPa: s.E_MPa, I_mm4: I, loads: beamLoads };
    const r = memo({ ...input, support });
    const fixed = support === 'simple' ? memo({ ...input, support: 'fixed' }) : null;
    const limit = (support === 'cantilever' ? 2 * span : span) / limits.deflectionLimitN;
    const stress = r.max_moment_Nmm / W;
    const dRatio = Math.abs(r.deflection_mm) / limit;
    const sRatio = stress / allowable;
    const u = Math.max(dRatio, sRatio);
    if (u > worst) {
      worst = u;
      governing = dRatio >= sRatio ? 'deflection' : 'stress';
    }
    spans.push({
      from_mm: lo,
      to_mm: hi,
      span_mm: span,
      support: support === 'cantilever' ? 'cantilever' : 'simple',
      deflection_mm: Math.abs(r.deflection_mm),
      deflection_fixed_mm: fixed ? Math.abs(fixed.deflection_mm) : null,
      limit_mm: limit,
      moment_Nmm: r.max_moment_Nmm,
      moment_fixed_Nmm: fixed ? fixed.max_moment_Nmm : null,
      stress_MPa: stress,
      allowable_MPa: allowable,
      utilisation: u,
    });
    return r;
  };

  const first = supports[0].x_mm;
  const last = supports[supports.length - 1].x_mm;
  // Overhang before the first support: a cantilever fixed there, measured outwards.
  const left = run(0, first, 'cantilever', clip(loads, 0, first, false, true));
  if (left) reactions[0] += left.reactions_N[0];
  for (let k = 0; k + 1 < supports.length; k++) {
    const lo = supports[k].x_mm;
    const hi = supports[k + 1].x_mm;
    const r = run(lo, hi, 'simple', clip(loads, lo, hi, k + 2 === supports.length, false));
    if (r) {
      reactions[k] += r.reactions_N[0];
      reactions[k + 1] += r.reactions_N[1];
    }
  }
  // Past the last support: a cantilever. A point load right on the support is taken by the span before it.
  const right = run(last, L, 'cantilever', clip(loads, last, L, true, false).filter((l) => l.kind !== 'point' || l.a_mm > 0));
  if (right) reactions[supports.length - 1] += right.reactions_N[0];
  // A load standing right on a lone support goes straight into it.
  if (supports.length === 1) {
    for (const l of loads) if (l.kind === 'point' && Math.abs(l.x_mm - first) < 1e-9) reactions[0] += l.P_N;
  }
  return { result: { ...base, spans, utilisation: worst, governing }, reactions };
}
