import { STANDARD_GRAVITY } from '../geometry/units';
import { principalAxes } from '../geometry/polygon';
import type { FrameDocument } from '../model/frame-document';
import { roleOf } from '../model/member';
import { ai, type Box } from './box';
import { bucklingClassOf, checkColumn, type ColumnResult } from './column';
import type { JointsResult } from './joints';
import { loadCases, type LoadCase } from './load-cases';
import { beamMemo, checkMember, memberStatics, SAME_POINT_MM, type MemberCheck, type MemberLoad, type Support } from './member-checks';
import type { ModuleBearing } from './bearing';
import { DEFAULT_MOUNT_POINTS, moduleLabel } from '../model/module';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import { linearReactions, safeSideReactions, type RestPoint } from './statics';
import { lowerFirst, memberRef } from './names';
import type { FaceName } from './faces';
import type { ReportWarning } from './warnings';

export type ModuleLoad = { module: number; weight_N: number; factored_N: number; contacts: number };

/** A module's reactions on one member in one load case: the sum over its contact, where its resultant acts. */
export type ModuleReaction = { member: number; R_N: number; x_mm: number };

export type ModuleStatics = {
  module: number;
  case: string;
  /** Vertical load of the case (weight × its vertical factor) and the plan point it acts through. */
  load_N: number;
  at: { x: number; y: number };
  reactions: ModuleReaction[];
  tips: { toward: FaceName } | null;
  collinear: boolean;
};

export type ColumnCheck = ColumnResult & {
  member: number;
  axial_N: number;
  case: string;
  K_reason: string;
  I_mm4: number;
  area_mm2: number;
  fo_MPa: number;
  buckling_class: 'A' | 'B';
};

export type FixingPoint = { member: number; kind: 'floor' | 'wall'; at: { x: number; y: number; z: number }; vertical_N: number; horizontal_N: number };
export type CaseFixings = { case: string; points: FixingPoint[]; horizontal_N: number; vertical_N: number };

/**
 * A member pushed sideways by braking or cornering: the inertia of what it carries and of itself, across it, bending
 * it about its other axis between the same supports. Combined with the vertical bending of the same case on the
 * safe side: the two stress ratios added (their peaks may sit at different corners and places), the deflections
 * added as vectors of their largest values.
 */
export type LateralCheck = {
  load_N: number;
  bending_axis: 'x' | 'y';
  deflection_mm: number;
  stress_MPa: number;
  utilisation: number;
  combined_utilisation: number;
  governing: 'deflection' | 'stress';
};

export type GoverningCheck = MemberCheck & { case: string; self_weight_N: number; lateral: LateralCheck | null };

function lateralCheck(v: MemberCheck, h: MemberCheck): LateralCheck | null {
  if (h.utilisation === null || h.spans.length === 0) return null;
  const ratio = (c: MemberCheck, f: (s: MemberCheck['spans'][number]) => number) => Math.max(0, ...c.spans.map(f));
  const d = (s: MemberCheck['spans'][number]) => s.deflection_mm / s.limit_mm;
  const st = (s: MemberCheck['spans'][number]) => s.stress_MPa / s.allowable_MPa;
  const dc = Math.hypot(ratio(v, d), ratio(h, d));
  const sc = ratio(v, st) + ratio(h, st);
  return {
    load_N: h.load_N,
    bending_axis: h.bending_axis,
    deflection_mm: Math.max(...h.spans.map((s) => s.deflection_mm)),
    stress_MPa: Math.max(...h.spans.map((s) => s.stress_MPa)),
    utilisation: h.utilisation,
    combined_utilisation: Math.max(dc, sc),
    governing: dc >= sc ? 'deflection' : 'stress',
  };
}

export type LoadsResult = {
  modules: ModuleLoad[];
  checks: GoverningCheck[];
  /** Largest axial load of each member over the load cases (uprights), newtons. */
  axial_N: number[];
  cases: LoadCase[];
  statics: ModuleStatics[];
  columns: ColumnCheck[];
  fixings: CaseFixings[];
  K: { value: number; reason: string };
  warnings: ReportWarning[];
};

/** Strips a contact is cut into for the statics: the module's pressure varies linearly along it. */
const STRIPS = 8;

type Rest = RestPoint & { contact: number; member: number; from: number; to: number };


/**
 * Where each module rests, in plan: every contact cut into strips (a base or side-rail module presses along the
 * length it touches), or the two ends of each hung contact (its hangers). Each strip counts by its length.
 */
function restPoints(b: ModuleBearing, members: readonly MemberGeometry[], eff: readonly Box[]): Rest[] {
  const out: Rest[] = [];
  b.contacts.forEach((c, k) => {
    const m = members[c.member];
    const a = ai(m.axis);
    const box = eff[c.member];
    const across = m.axis === 'x' ? 1 : 0;
    const acrossAt = (box.min[across] + box.max[across]) / 2;
    const plan = (s: number) => (m.axis === 'x' ? { x: box.min[a] + s, y: acrossAt } : { x: acrossAt, y: box.min[a] + s });
    const len = c.to_mm - c.from_mm;
    if (len < SAME_POINT_MM) {
      const s = (c.from_mm + c.to_mm) / 2;
      out.push({ ...plan(s), weight: 1, contact: k, member: c.member, from: s, to: s });
    } else if (b.bearing === 'hung') {
      for (const s of [c.from_mm, c.to_mm]) out.push({ ...plan(s), weight: 1, contact: k, member: c.member, from: s, to: s });
    } else {
      const step = len / STRIPS;
      for (let i = 0; i < STRIPS; i++) {
        const s0 = c.from_mm + i * step;
        out.push({ ...plan(s0 + step / 2), weight: step, contact: k, member: c.member, from: s0, to: s0 + step });
      }
    }
  });
  return out;
}

/**
 * Member loads from one module's reactions. A strip carries the larger of its two edge values of the linearly
 * varying pressure (over-reporting by at most half a strip's change), a pulled strip nothing (uplift is not relied
 * on to relieve a member); equal neighbouring strips merge into one distributed load.
 */
function memberLoadsOf(points: readonly Rest[], reactions: readonly number[], push: (member: number, l: MemberLoad) => void): void {
  let k = 0;
  while (k < points.length) {
    const p = points[k];
    if (p.to - p.from < 1e-9) {
      if (reactions[k] > 0) push(p.member, { kind: 'point', P_N: reactions[k], x_mm: p.from });
      k++;
      continue;
    }
    let end = k;
    while (end + 1 < points.length && points[end + 1].contact === p.contact) end++;
    const R = (i: number) => reactions[i];
    const q: number[] = [];
    for (let i = k; i <= end; i++) {
      const left = i > k ? (R(i - 1) + R(i)) / 2 : end > k ? R(i) - (R(i + 1) - R(i)) / 2 : R(i);
      const right = i < end ? (R(i + 1) + R(i)) / 2 : end > k ? R(i) + (R(i) - R(i - 1)) / 2 : R(i);
      q.push(Math.max(0, R(i), left, right) / (points[i].to - points[i].from));
    }
    let i = k;
    while (i <= end) {
      let j = i;
      while (j + 1 <= end && Math.abs(q[j + 1 - k] - q[i - k]) <= 1e-9 * Math.max(q[i - k], 1e-12)) j++;
      if (q[i - k] > 0) push(p.member, { kind: 'udl', w_N_per_mm: q[i - k], from_mm: points[i].from, to_mm: points[j].to });
      i = j + 1;
    }
    k = end + 1;
  }
}

/**
 * Loads for every load case. Each module's weight (times the case's vertical factor) goes to the members it bears
 * on by the statics of a rigid body on its supports (lever rule along and across them); a horizontal inertia
 * force at its centre of gravity shifts that resultant toward the side it pushes. Every member adds its own
 * weight as a distributed load (uprights: axially). Then member by member, each before the members that hold it
 * up: each horizontal member a series of beams between its supports, their reactions passed on as point loads to
 * the members supporting it, or as axial load to uprights. Uprights are checked as columns, and what reaches the
 * floor is listed per case at the feet of the uprights. Deflection is held to span / N and bending stress to yield
 * / safety factor; a cantilever's limit uses twice its length (IBC Table 1604.3 footnote, recalled from memory).
 */
export function checkLoads(
  doc: Pick<FrameDocument, 'settings'>,
  members: readonly MemberGeometry[],
  modules: readonly ModuleGeometry[],
  bearings: readonly ModuleBearing[],
  joints: Pick<JointsResult, 'joints' | 'effective' | 'ends'>,
  methodName: (id: string) => string = (id) => id,
): LoadsResult {
  const settings = doc.settings;
  const { shockFactor, deflectionLimitN, safetyFactor } = settings;
  const cases = loadCases(settings);
  const warnings: ReportWarning[] = [];
  const eff = joints.effective;
  const lengthOf = (i: number) => eff[i].max[ai(members[i].axis)] - eff[i].min[ai(members[i].axis)];
  const along = (i: number, v: { x: number; y: number; z: number }) =>
    Math.min(Math.max(v[members[i].axis] - eff[i].min[ai(members[i].axis)], 0), lengthOf(i));
  const vertical = (i: number) => members[i].axis === 'z';
  const centreZ = (b: Box) => (b.min[2] + b.max[2]) / 2;
  const selfWeight = members.map((m, i) => (m.info.section.mass_kg_per_m / 1000) * STANDARD_GRAVITY * lengthOf(i));
  // The same member turned a quarter: it bends about its other axis, as under a load across it.
  const turned = members.map((m) => ({ ...m, member: { ...m.member, rotation_deg: ((m.member.rotation_deg + 90) % 360) as 0 | 90 | 180 | 270 } }));
  const sideways = (i: number): MemberGeometry => turned[i];

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
    if (!vertical(b)) supports[b].push({ x_mm: along(b, j.at), target: t, butt: { method: methodName(j.method) } });
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
          member_ids: [members[i].member.id, members[t].member.id],
          message:
            `${memberRef(members[i].member.id)} and ${memberRef(members[t].member.id)} hold each other up, so the load from the first to the second is not followed: ` +
            'put an upright under one of them or let one run through the other',
        });
      } else if (state[t] === 0) visit(t);
    }
    state[i] = 2;
    order.push(i);
  };
  for (let i = 0; i < members.length; i++) if (state[i] === 0) visit(i);
  order.reverse();

  const jointAt = new Map<string, { x: number; y: number; z: number }>();
  for (const j of joints.joints) {
    jointAt.set(`${j.butting}>${j.through ?? j.other}`, j.at);
    if (j.through !== null) jointAt.set(`${j.through}>${j.butting}`, j.at);
  }

  const rests = bearings.map((b) => restPoints(b, members, eff));
  const planeZ = bearings.map((b) => {
    const box = modules[b.module].box;
    if (b.bearing === 'base') return box.min[2];
    if (b.bearing === 'hung') return box.max[2];
    const zs = b.contacts.map((c) => centreZ(eff[c.member]));
    return zs.length ? zs.reduce((s, z) => s + z, 0) / zs.length : centreZ(box);
  });

  const memo = beamMemo();
  const statics: ModuleStatics[] = [];
  const perCase = cases.map((lc) => {
    const pending: MemberLoad[][] = members.map(() => []);
    const lateral: MemberLoad[][] = members.map(() => []);
    bearings.forEach((b, k) => {
      const g = modules[b.module];
      const W = g.mass_kg * STANDARD_GRAVITY * lc.vertical;
      const box = g.box;
      const lever = (box.min[2] + box.max[2]) / 2 - planeZ[k];
      const at = {
        x: (box.min[0] + box.max[0]) / 2 + (lc.ax / lc.vertical) * lever,
        y: (box.min[1] + box.max[1]) / 2 + (lc.ay / lc.vertical) * lever,
      };
      const pts = rests[k];
      const bound = safeSideReactions(pts, W, at);
      const res = { ...bound.equal, reactions: bound.reactions };
      // Only a module standing on its supports can tip off them; hangers and slides hold both ways.
      const tips = b.bearing === 'base' && res.tips ? { toward: res.tips.toward } : null;
      memberLoadsOf(pts, res.reactions, (member, l) => pending[member].push(l));
      // Sideways, each member it bears on takes the module's whole inertia force across it (as if the others held
      // nothing), spread over the stretch it touches.
      b.contacts.forEach((c) => {
        const a = members[c.member].axis === 'x' ? lc.ay : lc.ax;
        if (a === 0) return;
        const F = Math.abs(a) * g.mass_kg * STANDARD_GRAVITY;
        const len = c.to_mm - c.from_mm;
        lateral[c.member].push(len < SAME_POINT_MM ? { kind: 'point', P_N: F, x_mm: (c.from_mm + c.to_mm) / 2 } : { kind: 'udl', w_N_per_mm: F / len, from_mm: c.from_mm, to_mm: c.to_mm });
      });
      const byContact = new Map<number, ModuleReaction & { m: number }>();
      pts.forEach((p, i) => {
        const r = byContact.get(p.contact) ?? { member: p.member, R_N: 0, x_mm: 0, m: 0 };
        r.R_N += res.reactions[i];
        r.m += res.reactions[i] * ((p.from + p.to) / 2);
        byContact.set(p.contact, r);
      });
      statics.push({
        module: b.module,
        case: lc.id,
        load_N: W,
        at,
        reactions: [...byContact.values()].map((r) => ({ member: r.member, R_N: r.R_N, x_mm: Math.abs(r.R_N) > 1e-12 ? r.m / r.R_N : 0 })),
        tips,
        collinear: res.collinear,
      });
    });

    const axial = members.map(() => 0);
    const bounds: (number | null)[] = members.map(() => null);
    const finalLoads: (MemberLoad[] | null)[] = members.map(() => null);
    const lateralLoads: (MemberLoad[] | null)[] = members.map(() => null);
    const lateralBounds: (number | null)[] = members.map(() => null);
    const sendTo = (from: number, target: number | null, R: number, at: { x: number; y: number; z: number }) => {
      if (target === null || cut.has(`${from}>${target}`) || Math.abs(R) < 1e-9) return;
      if (vertical(target)) axial[target] += R;
      else pending[target].push({ kind: 'point', P_N: R, x_mm: along(target, at) });
    };
    for (const i of order) {
      if (vertical(i)) {
        axial[i] += selfWeight[i] * lc.vertical;
        const d = downTo[i];
        if (d) sendTo(i, d.target, axial[i], jointAt.get(`${i}>${d.target}`) as { x: number; y: number; z: number });
        continue;
      }
      const L = lengthOf(i);
      const loads = pending[i];
      if (selfWeight[i] > 0 && L >= SAME_POINT_MM) loads.push({ kind: 'udl', w_N_per_mm: (selfWeight[i] * lc.vertical) / L, from_mm: 0, to_mm: L });
      const across = Math.abs(members[i].axis === 'x' ? lc.ay : lc.ax);
      if (across > 0 && selfWeight[i] > 0 && L >= SAME_POINT_MM) lateral[i].push({ kind: 'udl', w_N_per_mm: (selfWeight[i] * across) / L, from_mm: 0, to_mm: L });
      if (lateral[i].length > 0) {
        lateralLoads[i] = lateral[i];
        lateralBounds[i] = memberStatics(sideways(i), L, lateral[i], supports[i], { shockFactor, deflectionLimitN, safetyFactor }).bound;
      }
      if (loads.length === 0) continue;
      const check = memberStatics(members[i], L, loads, supports[i], { shockFactor, deflectionLimitN, safetyFactor });
      bounds[i] = check.bound;
      finalLoads[i] = loads;
      supports[i].forEach((s, k) => {
        const at = jointAt.get(`${i}>${s.target}`);
        if (at) sendTo(i, s.target, check.reactions[k], at);
      });
    }
    return { bounds, axial, finalLoads, lateralLoads, lateralBounds };
  });

  // The governing case of each member: its largest utilisation. Cases are solved in order of their upper bound
  // until no remaining bound can beat the worst found, so the governing one is always among those solved.
  const checks: GoverningCheck[] = [];
  const moduleLoaded = new Set<number>();
  for (const b of bearings) for (const c of b.contacts) moduleLoaded.add(c.member);
  const full = { shockFactor, deflectionLimitN, safetyFactor };
  for (let i = 0; i < members.length; i++) {
    const ranked = perCase
      .map((r, k) => ({ k, bound: (r.bounds[i] ?? 0) + (r.lateralBounds[i] ?? 0), loads: r.finalLoads[i], lateral: r.lateralLoads[i] }))
      .filter((r) => r.loads !== null)
      .sort((p, q) => q.bound - p.bound || p.k - q.k);
    if (ranked.length === 0) continue;
    let best: { c: MemberCheck; k: number; u: number | null; lateral: LateralCheck | null } | null = null;
    for (const r of ranked) {
      if (best !== null && (best.u === null || r.bound <= best.u)) break;
      const c = checkMember(memo, members[i], lengthOf(i), r.loads as MemberLoad[], supports[i], full).result;
      const lat = r.lateral ? lateralCheck(c, checkMember(memo, sideways(i), lengthOf(i), r.lateral, supports[i], full).result) : null;
      const u = c.utilisation === null ? null : Math.max(c.utilisation, lat?.combined_utilisation ?? 0);
      if (best === null || (u ?? -1) > (best.u ?? -1)) best = { c, k: r.k, u, lateral: lat };
    }
    const { c: vertical_, k, u, lateral: lat } = best as { c: MemberCheck; k: number; u: number | null; lateral: LateralCheck | null };
    const c: MemberCheck = { ...vertical_, utilisation: u, governing: lat && u !== null && u > (vertical_.utilisation ?? 0) ? lat.governing : vertical_.governing };
    checks.push({ ...c, case: cases[k].id, self_weight_N: selfWeight[i], lateral: lat });
    if (c.utilisation === null && (c.load_N > selfWeight[i] * cases[k].vertical * 1.000001 || moduleLoaded.has(i))) {
      warnings.push({
        code: 'member-unsupported',
        member_id: members[i].member.id,
        message: `${memberRef(members[i].member.id)} carries load but nothing holds it up (no butting end, no upright under it), so its load is not checked: join it to an upright or put one under it`,
      });
    }
    const root = c.spans.find((s) => s.support === 'cantilever' && s.root !== null && supports[i].length === 1);
    if (root) {
      warnings.push({
        code: 'cantilever-joint',
        member_id: members[i].member.id,
        message:
          `${memberRef(members[i].member.id)} is held at one end only: a ${Math.round(root.span_mm)} mm cantilever off its ${lowerFirst(root.root?.method ?? 'joint')}. ` +
          `The member is checked as a cantilever, but the joint's capacity to hold it is not checked: add a second support (an upright or a brace under the free end)`,
      });
    }
  }
  const axial_N = members.map((_, i) => Math.max(0, ...perCase.map((r) => r.axial[i])));

  // Uprights as columns; K from the frame unless the user set it.
  const braced = members.some((m) => roleOf(m.member) === 'brace');
  const K =
    settings.columnK !== undefined
      ? { value: settings.columnK, reason: 'set by the user' }
      : braced
        ? { value: 1, reason: 'braces stop the frame swaying: both ends held (K = 1, AISC Commentary Table C-A-7.1, pinned–pinned)' }
        : { value: 2, reason: 'no braces: the frame can sway (K = 2, AISC Commentary Table C-A-7.1, fixed–free; a sway frame with pinned bases has K ≥ 2)' };
  const columns: ColumnCheck[] = [];
  for (let i = 0; i < members.length; i++) {
    if (!vertical(i)) continue;
    const k = perCase.reduce((w, r, c) => (r.axial[i] > perCase[w].axial[i] ? c : w), 0);
    const N = perCase[k].axial[i];
    if (!(N > 1e-9)) continue;
    const s = members[i].info.section;
    const I = principalAxes(s.Ix_mm4, s.Iy_mm4, s.Ixy_mm4 ?? 0).I2;
    const cls = bucklingClassOf(s.alloy);
    const r = checkColumn({ length_mm: lengthOf(i), K: K.value, E_MPa: s.E_MPa, I_mm4: I, area_mm2: s.area_mm2, fo_MPa: s.yield_MPa, bucklingClass: cls, load_N: N });
    columns.push({ ...r, member: i, axial_N: N, case: cases[k].id, K_reason: K.reason, I_mm4: I, area_mm2: s.area_mm2, fo_MPa: s.yield_MPa, buckling_class: cls });
  }

  // Where the frame is fixed to the vehicle, per case: the feet of the uprights (their lower end free) on the floor,
  // and the member ends the builder marked as bolted to the wall. The horizontal inertia of every mass, acting at
  // its height above the floor, adds an overturning moment. How the fixings share the load depends on how stiff
  // each is, so each is given at least what it would take if the others were weaker: every fixing the whole
  // horizontal force; the feet the weight and the overturning moment between them (pushing and pulling); each
  // wall fixing the whole weight as well, and the whole overturning moment as a pull at its height.
  const feet = members.filter((m, i) => vertical(i) && joints.ends[i][0].role === 'free').map((m) => m.index);
  const floorZ = feet.length ? Math.min(...feet.map((i) => eff[i].min[2])) : Math.min(0, ...members.map((_, i) => eff[i].min[2]));
  const wall: { member: number; at: { x: number; y: number; z: number } }[] = [];
  members.forEach((m, i) => {
    const w = m.member.wallFixing;
    if (!w) return;
    const a = ai(m.axis);
    const c = { x: (eff[i].min[0] + eff[i].max[0]) / 2, y: (eff[i].min[1] + eff[i].max[1]) / 2, z: (eff[i].min[2] + eff[i].max[2]) / 2 };
    for (const end of ['start', 'end'] as const) {
      if (w !== 'both' && w !== end) continue;
      const at = { ...c };
      at[m.axis] = end === 'start' ? eff[i].min[a] : eff[i].max[a];
      wall.push({ member: i, at });
    }
  });
  const masses: { m: number; z: number }[] = [
    ...members.map((m, i) => ({ m: selfWeight[i] / STANDARD_GRAVITY, z: centreZ(eff[i]) })),
    ...bearings.map((b, k) => ({ m: modules[b.module].mass_kg, z: planeZ[k] })),
  ];
  const totalMass = masses.reduce((s, p) => s + p.m, 0);
  const fixings: CaseFixings[] = cases.map((lc, k) => {
    const H = totalMass * STANDARD_GRAVITY * Math.hypot(lc.ax, lc.ay);
    const V = totalMass * STANDARD_GRAVITY * lc.vertical;
    const pts = feet.map((i) => ({ x: (eff[i].min[0] + eff[i].max[0]) / 2, y: (eff[i].min[1] + eff[i].max[1]) / 2, weight: 1 }));
    let tx = 0;
    let ty = 0;
    for (const p of masses) {
      tx += p.m * STANDARD_GRAVITY * lc.ax * (p.z - floorZ);
      ty += p.m * STANDARD_GRAVITY * lc.ay * (p.z - floorZ);
    }
    let extra = pts.map(() => 0);
    if (pts.length > 0 && (tx !== 0 || ty !== 0)) {
      // A pure overturning moment: the difference of a unit load moved off the footprint's centroid by T.
      const c = { x: pts.reduce((s, p) => s + p.x, 0) / pts.length, y: pts.reduce((s, p) => s + p.y, 0) / pts.length };
      const moved = linearReactions(pts, 1, { x: c.x + tx, y: c.y + ty }).reactions;
      const still = linearReactions(pts, 1, c).reactions;
      extra = moved.map((r, j) => r - still[j]);
    }
    const T = Math.hypot(tx, ty);
    const points: FixingPoint[] = feet.map((i, j) => ({
      member: i,
      kind: 'floor',
      at: { x: pts[j].x, y: pts[j].y, z: eff[i].min[2] },
      vertical_N: perCase[k].axial[i] + extra[j],
      horizontal_N: H,
    }));
    for (const w of wall) {
      const h = w.at.z - floorZ;
      // A fixing at the floor's own level cannot hold the frame from turning over: the feet must, as above.
      const pull = h >= SAME_POINT_MM ? T / h : 0;
      points.push({ member: w.member, kind: 'wall', at: w.at, vertical_N: V, horizontal_N: H + pull });
    }
    const floorV = points.filter((p) => p.kind === 'floor').reduce((s, p) => s + p.vertical_N, 0);
    return { case: lc.id, points, horizontal_N: H, vertical_N: feet.length ? floorV : V };
  });

  // Racking: braking and cornering push the frame over like a parallelogram; only braces stop that, and racking
  // itself is not checked, so a frame without them that moves is warned about.
  const horizontalCases = cases.filter((c) => c.ax !== 0 || c.ay !== 0);
  if (horizontalCases.length > 0 && !braced && members.some((m) => m.axis === 'z')) {
    const H = Math.max(...fixings.filter((f) => horizontalCases.some((c) => c.id === f.case)).map((f) => f.horizontal_N));
    warnings.push({
      code: 'frame-racking',
      message:
        `The frame has no diagonal braces: under braking and cornering (up to ${Math.round(H)} N sideways in all) it can lean over like a parallelogram, ` +
        'and that racking is not checked. Add a diagonal brace in each wall of the frame, and fix it to the vehicle at the top as well as at the floor',
    });
  }

  // Modules: warnings from the statics, naming them as the user did.
  // A module that would tip under gravity and shock alone, or has no fixings, is an error; under braking or
  // cornering, one that is screwed down relies on its fixings pulling, which are not checked.
  const told = new Set<number>();
  for (const st of statics) {
    const g = modules[st.module];
    if (!st.tips || told.has(st.module)) continue;
    const lc = cases.find((c) => c.id === st.case) as LoadCase;
    const fixed = (g.module.mounting?.points ?? DEFAULT_MOUNT_POINTS[g.module.bearing]) > 0;
    const on = [...new Set(st.reactions.map((r) => memberRef(members[r.member].member.id)))].join(', ');
    const pull = -st.reactions.reduce((sum, r) => sum + Math.min(r.R_N, 0), 0);
    if (lc.ax === 0 && lc.ay === 0) {
      told.add(st.module);
      warnings.push({
        code: 'module-tips',
        severity: 'error',
        module_id: g.module.id,
        message:
          `${moduleLabel(g.module)} tips off toward the ${st.tips.toward}: its centre of gravity is outside its supports (${on}), ` +
          `so a support would have to pull${pull > 0 ? ` ${Math.round(pull)} N` : ''}. Move it, or add a member under that side`,
      });
    } else if (!fixed) {
      told.add(st.module);
      warnings.push({
        code: 'module-tips',
        severity: 'error',
        module_id: g.module.id,
        message: `${moduleLabel(g.module)} tips off toward the ${st.tips.toward} under ${lc.name} and has no fixings: screw it down to ${on}`,
      });
    } else if (!told.has(st.module)) {
      told.add(st.module);
      warnings.push({
        code: 'module-held-down',
        module_id: g.module.id,
        message:
          `${moduleLabel(g.module)} would tip toward the ${st.tips.toward} under ${lc.name}: its fixings must hold it down` +
          `${pull > 0 ? ` (about ${Math.round(pull)} N of pull)` : ''}, and their capacity is not checked; use screws and T-nuts rated for that, or move it further onto its supports`,
      });
    }
  }
  bearings.forEach((b) => {
    const g = modules[b.module];
    const on = new Set(b.contacts.map((c) => c.member));
    if (b.bearing === 'base' && on.size === 1) {
      const id = memberRef(members[[...on][0]].member.id);
      warnings.push({
        code: 'module-one-member',
        module_id: g.module.id,
        message: `${moduleLabel(g.module)} stands on one member only (${id}): nothing stops it turning over that member; set it on two or more members`,
      });
    }
  });

  const moduleLoads = bearings.map((b): ModuleLoad => {
    const weight = modules[b.module].mass_kg * STANDARD_GRAVITY;
    return { module: b.module, weight_N: weight, factored_N: weight * shockFactor, contacts: b.contacts.length };
  });
  checks.sort((p, q) => p.member - q.member);
  return { modules: moduleLoads, checks, axial_N, cases, statics, columns, fixings, K, warnings };
}
