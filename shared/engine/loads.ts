import { STANDARD_GRAVITY } from '../geometry/units';
import type { FrameDocument } from '../model/frame-document';
import { beam, type BeamInput, type BeamLoad, type BeamResult, type BeamSupport } from './beam';
import { ai, type Box } from './box';
import type { JointsResult } from './joints';
import type { ModuleBearing } from './bearing';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import type { ReportWarning } from './warnings';

/** A load on a member in its own coordinates (from its start face), newtons, already times the shock factor. */
type MemberLoad = { kind: 'point'; P_N: number; x_mm: number } | { kind: 'udl'; w_N_per_mm: number; from_mm: number; to_mm: number };

type Support = { x_mm: number; target: number | null };

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

export type ModuleLoad = { module: number; weight_N: number; factored_N: number; contacts: number };

export type LoadsResult = { modules: ModuleLoad[]; checks: MemberCheck[]; axial_N: number[]; warnings: ReportWarning[] };

const SAME_POINT_MM = 1;

/**
 * Module weights onto the members they bear on, then member by member (each before the members that hold it up):
 * each horizontal member a series of beams between its supports, their reactions passed on as point loads to the
 * members supporting it, or as axial load to uprights. Supports of a horizontal member: its butting ends (held
 * by what they butt against) and uprights standing under it. Loads are weight × shock factor; deflection is held
 * to span / N and bending stress to yield / safety factor. A cantilever's limit uses twice its length (IBC Table
 * 1604.3 footnote, recalled from memory).
 */
export function checkLoads(
  doc: Pick<FrameDocument, 'settings'>,
  members: readonly MemberGeometry[],
  modules: readonly ModuleGeometry[],
  bearings: readonly ModuleBearing[],
  joints: Pick<JointsResult, 'joints' | 'effective' | 'ends'>,
): LoadsResult {
  const { shockFactor, deflectionLimitN, safetyFactor } = doc.settings;
  const warnings: ReportWarning[] = [];
  const eff = joints.effective;
  const lengthOf = (i: number) => eff[i].max[ai(members[i].axis)] - eff[i].min[ai(members[i].axis)];
  const along = (i: number, v: { x: number; y: number; z: number }) =>
    Math.min(Math.max(v[members[i].axis] - eff[i].min[ai(members[i].axis)], 0), lengthOf(i));
  const vertical = (i: number) => members[i].axis === 'z';
  const centreZ = (b: Box) => (b.min[2] + b.max[2]) / 2;

  const pending: MemberLoad[][] = members.map(() => []);
  const moduleLoads = bearings.map((b): ModuleLoad => {
    const g = modules[b.module];
    const weight = g.mass_kg * STANDARD_GRAVITY;
    const factored = weight * shockFactor;
    const share = b.contacts.length > 0 ? factored / b.contacts.length : 0;
    for (const c of b.contacts) {
      const len = c.to_mm - c.from_mm;
      if (b.bearing === 'hung' && len >= SAME_POINT_MM) {
        pending[c.member].push({ kind: 'point', P_N: share / 2, x_mm: c.from_mm }, { kind: 'point', P_N: share / 2, x_mm: c.to_mm });
      } else if (len >= SAME_POINT_MM) {
        pending[c.member].push({ kind: 'udl', w_N_per_mm: share / len, from_mm: c.from_mm, to_mm: c.to_mm });
      } else {
        pending[c.member].push({ kind: 'point', P_N: share, x_mm: (c.from_mm + c.to_mm) / 2 });
      }
    }
    return { module: b.module, weight_N: weight, factored_N: factored, contacts: b.contacts.length };
  });

  // Supports of horizontal members; where an upright's load goes.
  const supports: Support[][] = members.map(() => []);
  const downTo: ({ target: number; x_mm: number } | null)[] = members.map(() => null);
  for (const j of joints.joints) {
    const b = j.butting;
    if (j.kind === 'inline') {
      if (!vertical(b)) supports[b].push({ x_mm: along(b, j.at), target: j.other });
      continue;
    }
    const t = j.through as number;
    if (!vertical(b)) supports[b].push({ x_mm: along(b, j.at), target: t });
    else if (!vertical(t) && centreZ(eff[b]) < centreZ(eff[t])) supports[t].push({ x_mm: along(t, j.at), target: b });
    else if (!vertical(t) && j.buttingEnd === 'start') downTo[b] = { target: t, x_mm: along(t, j.at) };
  }
  for (const list of supports) {
    list.sort((p, q) => p.x_mm - q.x_mm || (p.target ?? -1) - (q.target ?? -1));
    for (let k = list.length - 1; k > 0; k--) if (list[k].x_mm - list[k - 1].x_mm < SAME_POINT_MM) list.splice(k, 1);
  }

  // Each member before the members it passes load to; a circle of supports is broken where it closes.
  const order: number[] = [];
  const state = new Uint8Array(members.length);
  const cut = new Set<string>();
  const targetsOf = (i: number): number[] =>
    vertical(i) ? (downTo[i] ? [downTo[i]!.target] : []) : supports[i].map((s) => s.target).filter((t): t is number => t !== null);
  const visit = (i: number) => {
    state[i] = 1;
    for (const t of targetsOf(i)) {
      if (state[t] === 1) {
        cut.add(`${i}>${t}`);
        warnings.push({
          code: 'load-cycle',
          member_id: members[i].member.id,
          message: `${members[i].member.id} and ${members[t].member.id} hold each other up; load from ${members[i].member.id} to ${members[t].member.id} is not followed`,
        });
      } else if (state[t] === 0) visit(t);
    }
    state[i] = 2;
    order.push(i);
  };
  for (let i = 0; i < members.length; i++) if (state[i] === 0) visit(i);
  order.reverse();

  const axial = members.map(() => 0);
  const checks: MemberCheck[] = [];
  const memo = beamMemo();
  const sendTo = (from: number, target: number | null, R: number, at: { x: number; y: number; z: number }) => {
    if (target === null || cut.has(`${from}>${target}`) || Math.abs(R) < 1e-9) return;
    if (vertical(target)) axial[target] += R;
    else pending[target].push({ kind: 'point', P_N: R, x_mm: along(target, at) });
  };
  const jointAt = new Map<string, { x: number; y: number; z: number }>();
  for (const j of joints.joints) {
    jointAt.set(`${j.butting}>${j.through ?? j.other}`, j.at);
    if (j.through !== null) jointAt.set(`${j.through}>${j.butting}`, j.at);
  }

  for (const i of order) {
    if (vertical(i)) {
      const d = downTo[i];
      if (d) {
        const at = jointAt.get(`${i}>${d.target}`) as { x: number; y: number; z: number };
        sendTo(i, d.target, axial[i], at);
      }
      continue;
    }
    const loads = pending[i];
    if (loads.length === 0) continue;
    const check = checkMember(memo, members[i], lengthOf(i), loads, supports[i], { shockFactor, deflectionLimitN, safetyFactor });
    checks.push(check.result);
    if (check.result.utilisation === null) {
      warnings.push({
        code: 'member-unsupported',
        member_id: members[i].member.id,
        message: `${members[i].member.id} carries load but nothing holds it up (no butting end, no upright under it); its load is not checked`,
      });
    }
    supports[i].forEach((s, k) => {
      const at = jointAt.get(`${i}>${s.target}`);
      if (at) sendTo(i, s.target, check.reactions[k], at);
    });
  }
  checks.sort((p, q) => p.member - q.member);
  return { modules: moduleLoads, checks, axial_N: axial, warnings };
}

type Limits = { shockFactor: number; deflectionLimitN: number; safetyFactor: number };

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
type BeamMemo = (input: BeamInput) => BeamResult;

function beamMemo(): BeamMemo {
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

function checkMember(
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
