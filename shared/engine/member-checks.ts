import { beam, type BeamInput, type BeamLoad, type BeamResult, type BeamSupport } from './beam';
import type { MemberGeometry } from './resolve-members';

/** Loads closer than this are at one point; spans shorter than this are not checked (mm). */
export const SAME_POINT_MM = 1;

/** A load on a member in its own coordinates (from its start face), newtons, already times the shock factor. */
export type MemberLoad = { kind: 'point'; P_N: number; x_mm: number } | { kind: 'udl'; w_N_per_mm: number; from_mm: number; to_mm: number };

/**
 * Where a member is held up, along it, and which member (or upright) takes the reaction there; `butt` when the
 * support is the member's own end butting into that member (held by the join method alone).
 */
export type Support = { x_mm: number; target: number | null; butt?: { method: string } };

export type SpanCheck = {
  from_mm: number;
  to_mm: number;
  span_mm: number;
  /** `simple` between two supports (fixed ends give the lower bound), `cantilever` past the last support. */
  support: 'simple' | 'cantilever';
  /** A cantilever's root when it is the member's own butting end, held by its join method alone. */
  root: { method: string } | null;
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
  /**
   * For a section with a product of inertia (an angle): bending about its principal axes with nothing holding it
   * sideways multiplies the vertical deflection and the stress of plain bending by these; null when symmetric.
   */
  unsymmetric: { deflection_factor: number; stress_factor: number } | null;
  /** Largest ratio of deflection to its limit or stress to its allowable; null when the member has no support. */
  utilisation: number | null;
  governing: 'deflection' | 'stress' | null;
};

export type Limits = { shockFactor: number; deflectionLimitN: number; safetyFactor: number };

/** A product of inertia below this share of √(Ix·Iy) is float noise: the section is symmetric. */
const SYMMETRIC = 1e-9;

export type Bending = { axis: 'x' | 'y'; I: number; W: number; unsymmetric: { deflection_factor: number; stress_factor: number } | null };

const bendingCache = new WeakMap<object, Bending[]>();

/**
 * How a member bends under a vertical load: about the section's x axis at rotation 0 or 180 (load along its
 * height), about y at 90 or 270. A section with a product of inertia Ixy, free to deflect sideways, bends about its
 * principal axes instead: the vertical deflection is Ia·Ib/(Ia·Ib − Ixy²) times the plain figure and the stress at
 * (u, v) from the centroid is M·(Ib·v − Ixy·u)/(Ia·Ib − Ixy²) (unsymmetric bending; Roark, Formulas for Stress
 * and Strain, ch. 8; Boresi & Schmidt, Advanced Mechanics of Materials, ch. 7). Lateral restraint is never assumed,
 * so an angle screwed to a panel is over-reported, never under-.
 */
export function bendingOf(m: MemberGeometry): Bending {
  const upright = m.member.rotation_deg === 0 || m.member.rotation_deg === 180;
  let list = bendingCache.get(m.info);
  if (!list) {
    list = [bend(m, true), bend(m, false)];
    bendingCache.set(m.info, list);
  }
  return upright ? list[0] : list[1];
}

function bend(m: MemberGeometry, upright: boolean): Bending {
  const s = m.info.section;
  const [Ia, Ib, W] = upright ? [s.Ix_mm4, s.Iy_mm4, s.Wx_mm3] : [s.Iy_mm4, s.Ix_mm4, s.Wy_mm3];
  const P = s.Ixy_mm4 ?? 0;
  const axis = upright ? 'x' : 'y';
  if (!(Math.abs(P) > SYMMETRIC * Math.sqrt(Ia * Ib))) return { axis, I: Ia, W, unsymmetric: null };
  const det = Ia * Ib - P * P;
  let worst = 0;
  for (const p of m.info.profile.outline.outer) {
    const x = p.x - s.cx_mm;
    const y = p.y - s.cy_mm;
    const [u, v] = upright ? [x, y] : [y, x];
    worst = Math.max(worst, Math.abs(Ib * v - P * u));
  }
  return { axis, I: Ia, W, unsymmetric: { deflection_factor: (Ia * Ib) / det, stress_factor: (worst / det) * W } };
}

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
  const bending = bendingOf(m);
  const { I, W } = bending;
  const fd = bending.unsymmetric?.deflection_factor ?? 1;
  const fs = bending.unsymmetric?.stress_factor ?? 1;
  const allowable = s.yield_MPa / limits.safetyFactor;
  const total = loads.reduce((sum, l) => sum + (l.kind === 'point' ? l.P_N : l.w_N_per_mm * (l.to_mm - l.from_mm)), 0);
  const reactions = supports.map(() => 0);
  const base = { member: m.index, load_N: total, bending_axis: bending.axis, I_mm4: I, W_mm3: W, E_MPa: s.E_MPa, unsymmetric: bending.unsymmetric };
  if (supports.length === 0) return { result: { ...base, spans: [], utilisation: null, governing: null }, reactions };

  const spans: SpanCheck[] = [];
  let worst = 0;
  let governing: 'deflection' | 'stress' = 'deflection';
  const run = (lo: number, hi: number, support: BeamSupport, beamLoads: BeamLoad[], root: { method: string } | null = null) => {
    const span = hi - lo;
    if (span < SAME_POINT_MM || beamLoads.length === 0) return null;
    const input = { span_mm: span, E_MPa: s.E_MPa, I_mm4: I, loads: beamLoads };
    const limit = (support === 'cantilever' ? 2 * span : span) / limits.deflectionLimitN;
    const r = memo({ ...input, support });
    const fixed = support === 'simple' ? memo({ ...input, support: 'fixed' }) : null;
    const stress = (fs * r.max_moment_Nmm) / W;
    const deflection = fd * Math.abs(r.deflection_mm);
    const dRatio = deflection / limit;
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
      deflection_mm: deflection,
      deflection_fixed_mm: fixed ? fd * Math.abs(fixed.deflection_mm) : null,
      limit_mm: limit,
      moment_Nmm: r.max_moment_Nmm,
      moment_fixed_Nmm: fixed ? fixed.max_moment_Nmm : null,
      root: support === 'cantilever' ? root : null,
      stress_MPa: stress,
      allowable_MPa: allowable,
      utilisation: u,
    });
    return r;
  };

  const first = supports[0].x_mm;
  const last = supports[supports.length - 1].x_mm;
  // Overhang before the first support: a cantilever fixed there, measured outwards.
  const left = run(0, first, 'cantilever', clip(loads, 0, first, false, true), supports[0].butt ?? null);
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
  const right = run(
    last,
    L,
    'cantilever',
    clip(loads, last, L, true, false).filter((l) => l.kind !== 'point' || l.a_mm > 0),
    supports[supports.length - 1].butt ?? null,
  );
  if (right) reactions[supports.length - 1] += right.reactions_N[0];
  // A load standing right on a lone support goes straight into it.
  if (supports.length === 1) {
    for (const l of loads) if (l.kind === 'point' && Math.abs(l.x_mm - first) < 1e-9) reactions[0] += l.P_N;
  }
  return { result: { ...base, spans, utilisation: worst, governing }, reactions };
}

/**
 * The reactions of a member on its supports (statics alone: the lever rule within each span, an overhang's load
 * all to its root) and an upper bound of its utilisation, without solving any beam: to pass loads down a frame
 * in every load case, and to rank the cases so only those that can govern are solved. Bounds per span, from each
 * load's magnitude (AWC DA6 Figs. 8 and 14; AISC Manual Table 3-23): a point load P at a on a simple span gives at
 * most P·a·b/L of moment and Pb(L² − b²)^1.5/(9√3·EIL) of deflection; a patch of total Q and length ℓ no more
 * moment than Q(L/4 − ℓ/8) (the average of the moment influence line over ℓ); on a cantilever P·a at the root and
 * Pa²(3L − a)/6EI at the tip.
 */
export function memberStatics(
  m: MemberGeometry,
  L: number,
  loads: readonly MemberLoad[],
  supports: readonly Support[],
  limits: Limits,
): { reactions: number[]; bound: number | null } {
  const n = supports.length;
  const reactions = new Array<number>(n).fill(0);
  if (n === 0) return { reactions, bound: null };
  const s = m.info.section;
  const bending = bendingOf(m);
  const EI = s.E_MPa * bending.I;
  const fd = bending.unsymmetric?.deflection_factor ?? 1;
  const fs = bending.unsymmetric?.stress_factor ?? 1;
  const allowable = s.yield_MPa / limits.safetyFactor;
  // Segments: 0 the overhang before the first support, k (1…n−1) the span from support k−1 to k, n the one after.
  const M = new Array<number>(n + 1).fill(0);
  const D = new Array<number>(n + 1).fill(0);
  const xs = supports.map((p) => p.x_mm);
  const first = xs[0];
  const last = xs[n - 1];
  const segOf = (x: number): number => {
    if (x < first) return 0;
    if (x > last) return n;
    let lo = 0;
    let hi = n - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (xs[mid] <= x) lo = mid;
      else hi = mid;
    }
    return n === 1 ? n : lo + 1;
  };
  const point = (P: number, x: number, seg: number) => {
    const A = Math.abs(P);
    if (seg === 0 || seg === n) {
      const root = seg === 0 ? 0 : n - 1;
      reactions[root] += P;
      const a = Math.abs(x - xs[root]);
      const S = seg === 0 ? first : L - last;
      M[seg] += A * a;
      D[seg] += (A * a * a * (3 * S - a)) / (6 * EI);
      return;
    }
    const lo = xs[seg - 1];
    const S = xs[seg] - lo;
    const a = Math.min(Math.max(x - lo, 0), S);
    reactions[seg] += (P * a) / S;
    reactions[seg - 1] += (P * (S - a)) / S;
    const b = Math.min(a, S - a);
    M[seg] += (A * a * (S - a)) / S;
    D[seg] += (A * b * (S * S - b * b) ** 1.5) / (9 * Math.sqrt(3) * EI * S);
  };
  const cuts = [0, ...xs, L];
  for (const l of loads) {
    if (l.kind === 'point') {
      point(l.P_N, l.x_mm, segOf(l.x_mm));
      continue;
    }
    for (let seg = 0; seg <= n; seg++) {
      const a = Math.max(l.from_mm, cuts[seg]);
      const b = Math.min(l.to_mm, cuts[seg + 1]);
      if (b - a <= 1e-9) continue;
      const Q = l.w_N_per_mm * (b - a);
      const A = Math.abs(Q);
      if (seg === 0 || seg === n) {
        const root = seg === 0 ? 0 : n - 1;
        reactions[root] += Q;
        const far = Math.max(Math.abs(a - xs[root]), Math.abs(b - xs[root]));
        const S = seg === 0 ? first : L - last;
        M[seg] += (A * (Math.abs(a - xs[root]) + Math.abs(b - xs[root]))) / 2;
        D[seg] += (A * far * far * (3 * S - far)) / (6 * EI);
        continue;
      }
      const lo = xs[seg - 1];
      const S = xs[seg] - lo;
      const c = (a + b) / 2 - lo;
      reactions[seg] += (Q * c) / S;
      reactions[seg - 1] += (Q * (S - c)) / S;
      // The point of the patch nearest midspan is where a point load would do most.
      const near = Math.min(Math.max(S / 2, a - lo), b - lo);
      const bb = Math.min(near, S - near);
      M[seg] += Math.min(A * (S / 4 - (b - a) / 8), (A * near * (S - near)) / S);
      D[seg] += (A * bb * (S * S - bb * bb) ** 1.5) / (9 * Math.sqrt(3) * EI * S);
    }
  }
  let bound = 0;
  for (let seg = 0; seg <= n; seg++) {
    const S = seg === 0 ? first : seg === n ? L - last : xs[seg] - xs[seg - 1];
    if (S < SAME_POINT_MM) continue;
    const limit = (seg === 0 || seg === n ? 2 * S : S) / limits.deflectionLimitN;
    bound = Math.max(bound, (fd * D[seg]) / limit, (fs * M[seg]) / bending.W / allowable);
  }
  return { reactions, bound };
}
