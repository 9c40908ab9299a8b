import { STANDARD_GRAVITY } from '../geometry/units';
import type { FrameDocument } from '../model/frame-document';
import { ai, type Box } from './box';
import type { JointsResult } from './joints';
import { beamMemo, checkMember, SAME_POINT_MM, type MemberCheck, type MemberLoad, type Support } from './member-checks';
import type { ModuleBearing } from './bearing';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import type { ReportWarning } from './warnings';

export type ModuleLoad = { module: number; weight_N: number; factored_N: number; contacts: number };

export type LoadsResult = { modules: ModuleLoad[]; checks: MemberCheck[]; axial_N: number[]; warnings: ReportWarning[] };

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

