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
import { DEFAULT_MOUNT_POINTS } from '../model/module';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import { linearReactions, rigidBodyReactions, type RestPoint } from './statics';
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

export type FixingPoint = { member: number; at: { x: number; y: number; z: number }; vertical_N: number; horizontal_N: number };
export type CaseFixings = { case: string; points: FixingPoint[]; horizontal_N: number; vertical_N: number };

export type GoverningCheck = MemberCheck & { case: string; self_weight_N: number };

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

const label = (name: string | undefined, id: string) => (name ? `${name} (${id})` : id);

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
          message: `${members[i].member.id} and ${members[t].member.id} hold each other up; load from ${members[i].member.id} to ${members[t].member.id} is not followed`,
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
      const res = rigidBodyReactions(pts, W, at);
      // Only a module standing on its supports can tip off them; hangers and slides hold both ways.
      const tips = b.bearing === 'base' && res.tips ? { toward: res.tips.toward } : null;
      memberLoadsOf(pts, res.reactions, (member, l) => pending[member].push(l));
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
      if (loads.length === 0) continue;
      const check = memberStatics(members[i], L, loads, supports[i], { shockFactor, deflectionLimitN, safetyFactor });
      bounds[i] = check.bound;
      finalLoads[i] = loads;
      supports[i].forEach((s, k) => {
        const at = jointAt.get(`${i}>${s.target}`);
        if (at) sendTo(i, s.target, check.reactions[k], at);
      });
    }
    return { bounds, axial, finalLoads };
  });

  // The governing case of each member: its largest utilisation. Cases are solved in order of their upper bound
  // until no remaining bound can beat the worst found, so the governing one is always among those solved.
  const checks: GoverningCheck[] = [];
  const moduleLoaded = new Set<number>();
  for (const b of bearings) for (const c of b.contacts) moduleLoaded.add(c.member);
  const full = { shockFactor, deflectionLimitN, safetyFactor };
  for (let i = 0; i < members.length; i++) {
    const ranked = perCase
      .map((r, k) => ({ k, bound: r.bounds[i], loads: r.finalLoads[i] }))
      .filter((r) => r.loads !== null)
      .sort((p, q) => (q.bound ?? 0) - (p.bound ?? 0) || p.k - q.k);
    if (ranked.length === 0) continue;
    let best: { c: MemberCheck; k: number } | null = null;
    for (const r of ranked) {
      if (best !== null && (best.c.utilisation === null || (r.bound ?? 0) <= (best.c.utilisation as number))) break;
      const c = checkMember(memo, members[i], lengthOf(i), r.loads as MemberLoad[], supports[i], full).result;
      if (best === null || (c.utilisation ?? -1) > (best.c.utilisation ?? -1)) best = { c, k: r.k };
    }
    const { c, k } = best as { c: MemberCheck; k: number };
    checks.push({ ...c, case: cases[k].id, self_weight_N: selfWeight[i] });
    if (c.utilisation === null && (c.load_N > selfWeight[i] * cases[k].vertical * 1.000001 || moduleLoaded.has(i))) {
      warnings.push({
        code: 'member-unsupported',
        member_id: members[i].member.id,
        message: `${members[i].member.id} carries load but nothing holds it up (no butting end, no upright under it); its load is not checked`,
      });
    }
    const root = c.spans.find((s) => s.support === 'cantilever' && s.root !== null && supports[i].length === 1);
    if (root) {
      warnings.push({
        code: 'cantilever-joint',
        member_id: members[i].member.id,
        message:
          `${members[i].member.id} is held at one end only: a ${Math.round(root.span_mm)} mm cantilever off its ${root.root?.method}. ` +
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

  // What reaches the floor: the feet of the uprights (their lower end free), per case. The horizontal inertia of
  // every mass, acting at its height above the floor, adds an overturning moment the feet resist by pushing and
  // pulling; the horizontal force is shared equally among them.
  const feet = members.filter((m, i) => vertical(i) && joints.ends[i][0].role === 'free').map((m) => m.index);
  const floorZ = feet.length ? Math.min(...feet.map((i) => eff[i].min[2])) : 0;
  const masses: { m: number; z: number }[] = [
    ...members.map((m, i) => ({ m: selfWeight[i] / STANDARD_GRAVITY, z: centreZ(eff[i]) })),
    ...bearings.map((b, k) => ({ m: modules[b.module].mass_kg, z: planeZ[k] })),
  ];
  const totalMass = masses.reduce((s, p) => s + p.m, 0);
  const fixings: CaseFixings[] = cases.map((lc, k) => {
    const H = totalMass * STANDARD_GRAVITY * Math.hypot(lc.ax, lc.ay);
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
    const points = feet.map((i, j) => ({
      member: i,
      at: { x: pts[j].x, y: pts[j].y, z: eff[i].min[2] },
      vertical_N: perCase[k].axial[i] + extra[j],
      horizontal_N: H / feet.length,
    }));
    return { case: lc.id, points, horizontal_N: H, vertical_N: points.reduce((s, p) => s + p.vertical_N, 0) };
  });

  // Modules: warnings from the statics, naming them as the user did.
  // A module that would tip under gravity and shock alone, or has no fixings, is an error; under braking or
  // cornering, one that is screwed down relies on its fixings pulling, which are not checked.
  const told = new Set<number>();
  for (const st of statics) {
    const g = modules[st.module];
    if (!st.tips || told.has(st.module)) continue;
    const lc = cases.find((c) => c.id === st.case) as LoadCase;
    const fixed = (g.module.mounting?.points ?? DEFAULT_MOUNT_POINTS[g.module.bearing]) > 0;
    const on = [...new Set(st.reactions.map((r) => members[r.member].member.id))].join(', ');
    const pull = -st.reactions.reduce((sum, r) => sum + Math.min(r.R_N, 0), 0);
    if (lc.ax === 0 && lc.ay === 0) {
      told.add(st.module);
      warnings.push({
        code: 'module-tips',
        severity: 'error',
        module_id: g.module.id,
        message:
          `${label(g.module.name, g.module.id)} tips off toward the ${st.tips.toward}: its centre of gravity is outside its supports (${on}), ` +
          `so a support would have to pull${pull > 0 ? ` ${Math.round(pull)} N` : ''}. Move it, or add a member under that side`,
      });
    } else if (!fixed) {
      told.add(st.module);
      warnings.push({
        code: 'module-tips',
        severity: 'error',
        module_id: g.module.id,
        message: `${label(g.module.name, g.module.id)} tips off toward the ${st.tips.toward} under ${lc.name} and has no fixings: screw it down to ${on}`,
      });
    } else if (!told.has(st.module)) {
      told.add(st.module);
      warnings.push({
        code: 'module-held-down',
        module_id: g.module.id,
        message:
          `${label(g.module.name, g.module.id)} would tip toward the ${st.tips.toward} under ${lc.name}: its fixings must hold it down` +
          `${pull > 0 ? ` (about ${Math.round(pull)} N of pull)` : ''}; their capacity is not checked`,
      });
    }
  }
  bearings.forEach((b) => {
    const g = modules[b.module];
    const on = new Set(b.contacts.map((c) => c.member));
    if (b.bearing === 'base' && on.size === 1) {
      const id = members[[...on][0]].member.id;
      warnings.push({
        code: 'module-one-member',
        module_id: g.module.id,
        message: `${label(g.module.name, g.module.id)} stands on one member only (${id}): nothing stops it turning over that member; set it on two or more members`,
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
