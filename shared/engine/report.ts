import { InputError } from '../errors';
import { formatLength, STANDARD_GRAVITY } from '../geometry/units';
import { type Axis, type Vec3 } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { roleOf } from '../model/member';
import { checkReferences } from '../model/references';
import { findBearings } from './bearing';
import { findClashes } from './clashes';
import { ai, type Box } from './box';
import { CAUTIONS, DEFLECTION_NOTE, FIXINGS_CAUTION, LOAD_MODEL_NOTES, SAFETY_FACTOR_NOTE, SHOCK_FACTOR_NOTE } from './cautions';
import { COLUMN_SOURCE } from './column';
import { frameWarnings } from './frame-warnings';
import { cutList } from './cut-list';
import { hardwareList } from './hardware';
import { methodTable } from './join-methods';
import { END_NAMES, findJoints, type EndName } from './joints';
import { memberLengths } from './lengths';
import { memberTitle, nameWarnings } from './names';
import { checkLoads } from './loads';
import { machiningOps, type MachiningOp } from './machining';
import { massAndCentre } from './mass';
import type { MarkHint } from './part-marks';
import { profileTable } from './profile-table';
import type { FrameReport, ReportEnd, ReportMember } from './report-types';
import { resolveDatums } from './resolve-datums';
import { resolveMembers } from './resolve-members';
import { resolveModules } from './resolve-modules';
import { TOLERANCE_CLASS_NAMES } from './tolerance';

export type { FrameReport } from './report-types';

export type ReportOptions = {
  /** The report before this change (or just its members), so part marks carry over to the same parts. */
  previous?: { members: ReadonlyArray<Pick<ReportMember, 'id' | 'mark' | 'cut_length_mm'>> };
};

const round = (v: number, digits: number): number => {
  const f = 10 ** digits;
  const r = Math.round(v * f) / f;
  return Object.is(r, -0) ? 0 : r;
};
/** Rounded away from zero, so a reported load, deflection or utilisation is never below the one worked out (loads err on the safe side). */
const roundOut = (v: number, digits: number): number => {
  const f = 10 ** digits;
  const r = (Math.sign(v) * Math.ceil(Math.abs(v) * f - 1e-7)) / f;
  return Object.is(r, -0) ? 0 : r;
};
/** Rounded toward zero, for what a member can take: a reported capacity is never above the one worked out. */
const roundIn = (v: number, digits: number): number => {
  const f = 10 ** digits;
  const r = (Math.sign(v) * Math.floor(Math.abs(v) * f + 1e-7)) / f;
  return Object.is(r, -0) ? 0 : r;
};
const mm = (v: number) => round(v, 4);
const vec = (v: Vec3, d = 4): Vec3 => ({ x: round(v.x, d), y: round(v.y, d), z: round(v.z, d) });
const boxMin = (b: Box): Vec3 => vec({ x: b.min[0], y: b.min[1], z: b.min[2] });
const boxMax = (b: Box): Vec3 => vec({ x: b.max[0], y: b.max[1], z: b.max[2] });

function faceCentre(b: Box, axis: Axis, end: EndName): Vec3 {
  const c = { x: (b.min[0] + b.max[0]) / 2, y: (b.min[1] + b.max[1]) / 2, z: (b.min[2] + b.max[2]) / 2 };
  c[axis] = end === 'start' ? b.min[ai(axis)] : b.max[ai(axis)];
  return vec(c);
}

const roundOp = (op: MachiningOp): MachiningOp => (op.kind === 'access-hole' ? { ...op, at_mm: mm(op.at_mm) } : op);

/**
 * The whole report on a frame document in one pure call: resolved datums and members, joints, cut lengths,
 * the cut list with part marks, machining, hardware and T-nut order, module loads and beam checks, mass and
 * centre of gravity, warnings and cautions. Throws InputError (naming the field) for a document that cannot be
 * resolved: a dangling reference, a cycle of datums or member faces, a member of no length.
 */
export function computeReport(doc: FrameDocument, opts: ReportOptions = {}): FrameReport {
  checkReferences(doc);
  const profileOf = profileTable(doc);
  const methods = methodTable(doc);
  const datums = resolveDatums(doc);
  const members = resolveMembers(doc, datums, profileOf);
  const joints = findJoints(doc, members, methods);
  const lengths = memberLengths(doc, members, joints);
  lengths.forEach((l, i) => {
    if (!(l.length_mm > 0.05) || !(l.cut_length_mm > 0.05)) {
      throw new InputError(
        `members[${i}]`,
        `members[${i}]: the ${roleOf(members[i].member)}${members[i].member.name ? ` “${members[i].member.name}”` : ''} is cut back to ${mm(l.length_mm)} mm by the members it meets; move its ends or theirs`,
      );
    }
  });
  const eff = joints.effective;
  const modules = resolveModules(doc, datums, members, (m) => eff[m.index]);
  const ops = machiningOps(members, joints, methods);

  const hints = new Map<string, MarkHint>();
  for (const p of opts.previous?.members ?? []) hints.set(p.id, { mark: p.mark, pinned: false, cut_length_mm: p.cut_length_mm });
  for (const m of doc.members) if (m.mark !== undefined) hints.set(m.id, { mark: m.mark, pinned: true });
  const cuts = cutList(members, lengths, ops, hints);

  const { bearings, warnings: bearingWarnings } = findBearings(modules, members, eff);
  const hardware = hardwareList(doc, members, joints, methods, modules, bearings);
  const loads = checkLoads(doc, members, modules, bearings, joints, (id) => methods.get(id)?.name ?? id);
  const mass = massAndCentre(members, lengths, eff, modules, hardware);

  const { display, frac } = doc.units;
  const text = (v: number) => formatLength(v, display, frac);
  const idOf = (i: number) => members[i].member.id;
  const markCount = new Map<string, number>();
  for (const k of cuts.markOf) markCount.set(k, (markCount.get(k) ?? 0) + 1);
  // Where a part with a shared mark is: its place on the two axes across it, at the centre of its section.
  const whereOf = (i: number) => {
    const b = eff[i];
    const across = (['x', 'y', 'z'] as const).filter((a) => a !== members[i].axis);
    return `at ${across.map((a) => `${a} ${text((b.min[ai(a)] + b.max[ai(a)]) / 2)}`).join(', ')}`;
  };
  const titles = new Map(
    members.map((g, i) => [
      g.member.id,
      memberTitle({ role: roleOf(g.member), mark: cuts.markOf[i], name: g.member.name, where: (markCount.get(cuts.markOf[i]) ?? 0) > 1 ? whereOf(i) : undefined }),
    ]),
  );
  const titleOf = (id: string) => titles.get(id) ?? 'a member';

  const reportMembers: ReportMember[] = members.map((g, i) => {
    const m = g.member;
    const ends = END_NAMES.map((end, k): ReportEnd => {
      const e = joints.ends[i][k];
      const j = e.joint === null ? null : joints.joints[e.joint];
      const meets = j === null ? null : idOf(j.butting === i ? j.other : j.butting);
      return { role: e.role, joint_id: j?.id ?? null, meets, method: e.method };
    });
    const l = lengths[i];
    return {
      id: m.id,
      name: m.name ?? null,
      role: roleOf(m),
      profile: m.profile,
      profile_name: g.info.name,
      axis: m.axis,
      rotation_deg: m.rotation_deg,
      min_mm: boxMin(eff[i]),
      max_mm: boxMax(eff[i]),
      start_mm: faceCentre(eff[i], m.axis, 'start'),
      end_mm: faceCentre(eff[i], m.axis, 'end'),
      length_mm: mm(l.length_mm),
      cut_length_mm: mm(l.cut_length_mm),
      allowance_start_mm: l.allowance_start_mm,
      allowance_end_mm: l.allowance_end_mm,
      tolerance_mm: l.tolerance_mm,
      cut_length_text: text(l.cut_length_mm),
      mark: cuts.markOf[i],
      title: titleOf(m.id),
      wall_fixing: m.wallFixing ?? null,
      ends: { start: ends[0], end: ends[1] },
      ops: ops[i].map(roundOp),
      mass_kg: round(mass.member_kg[i], 5),
    };
  });

  const tNutOrder = hardware.slotOrder.map((s) => {
    const id = idOf(s.member);
    const nuts = s.count === 1 ? '1 T-nut' : `${s.count} T-nuts`;
    return {
      member_id: id,
      mark: cuts.markOf[s.member],
      face: s.face,
      slot: s.slot,
      count: s.count,
      closed_by: s.closed_by,
      for: s.for,
      message: `${titleOf(id)}, ${s.face} face, slot ${s.slot}: both ends are closed by ${titleOf(s.closed_by[0])} and ${titleOf(s.closed_by[1])}; slide in ${nuts} before fitting them, or use drop-in T-nuts`,
    };
  });

  const checks = loads.checks.map((c) => ({
    member_id: idOf(c.member),
    mark: cuts.markOf[c.member],
    load_N: roundOut(c.load_N, 3),
    bending_axis: c.bending_axis,
    I_mm4: round(c.I_mm4, 1),
    W_mm3: round(c.W_mm3, 1),
    E_MPa: c.E_MPa,
    spans: c.spans.map((s) => ({
      from_mm: mm(s.from_mm),
      to_mm: mm(s.to_mm),
      span_mm: mm(s.span_mm),
      support: s.support,
      deflection_mm: roundOut(s.deflection_mm, 5),
      deflection_fixed_mm: s.deflection_fixed_mm === null ? null : roundOut(s.deflection_fixed_mm, 5),
      limit_mm: roundIn(s.limit_mm, 4),
      moment_Nmm: roundOut(s.moment_Nmm, 1),
      moment_fixed_Nmm: s.moment_fixed_Nmm === null ? null : roundOut(s.moment_fixed_Nmm, 1),
      root: s.root,
      stress_MPa: roundOut(s.stress_MPa, 4),
      allowable_MPa: roundIn(s.allowable_MPa, 4),
      utilisation: roundOut(s.utilisation, 5),
    })),
    utilisation: c.utilisation === null ? null : roundOut(c.utilisation, 5),
    governing: c.governing,
    governing_case: c.case,
    self_weight_N: roundOut(c.self_weight_N, 3),
    lateral: c.lateral
      ? {
          load_N: roundOut(c.lateral.load_N, 3),
          bending_axis: c.lateral.bending_axis,
          deflection_mm: roundOut(c.lateral.deflection_mm, 5),
          stress_MPa: roundOut(c.lateral.stress_MPa, 4),
          utilisation: roundOut(c.lateral.utilisation, 5),
          combined_utilisation: roundOut(c.lateral.combined_utilisation, 5),
          governing: c.lateral.governing,
        }
      : null,
    unsymmetric: c.unsymmetric ? { deflection_factor: roundOut(c.unsymmetric.deflection_factor, 5), stress_factor: roundOut(c.unsymmetric.stress_factor, 5) } : null,
  }));
  const columns = loads.columns.map((c) => ({
    member_id: idOf(c.member),
    mark: cuts.markOf[c.member],
    axial_N: roundOut(c.axial_N, 3),
    governing_case: c.case,
    length_mm: mm(c.length_mm),
    K: c.K,
    K_reason: c.K_reason,
    I_mm4: round(c.I_mm4, 1),
    area_mm2: round(c.area_mm2, 2),
    fo_MPa: c.fo_MPa,
    buckling_class: c.buckling_class,
    slenderness: round(c.slenderness, 3),
    relative_slenderness: round(c.relative_slenderness, 5),
    euler_N: roundIn(c.euler_N, 3),
    chi: roundIn(c.chi, 5),
    capacity_N: roundIn(c.capacity_N, 3),
    utilisation: roundOut(c.utilisation, 5),
    source: COLUMN_SOURCE,
  }));
  let governing: { member_id: string; utilisation: number; check: 'beam' | 'column' } | null = null;
  for (const c of checks) if (c.utilisation !== null && (governing === null || c.utilisation > governing.utilisation)) governing = { member_id: c.member_id, utilisation: c.utilisation, check: 'beam' };
  for (const c of columns) if (governing === null || c.utilisation > governing.utilisation) governing = { member_id: c.member_id, utilisation: c.utilisation, check: 'column' };

  const warnings = nameWarnings([...joints.warnings, ...frameWarnings(members, joints), ...bearingWarnings, ...findClashes(modules, members, eff), ...hardware.warnings, ...loads.warnings], titleOf);
  for (const c of columns) {
    if (c.utilisation > 1) {
      warnings.push({
        code: 'column-over-utilised',
        member_id: c.member_id,
        message: `${titleOf(c.member_id)} carries ${Math.round(c.axial_N)} N as a column, ${Math.round(c.utilisation * 100)} % of its buckling resistance (${Math.round(c.capacity_N)} N at K = ${c.K}): use a stiffer profile, brace the frame or shorten the upright`,
      });
    }
  }
  const unsymmetric = new Set(checks.filter((c) => c.unsymmetric !== null).map((c) => c.member_id));
  if (unsymmetric.size > 0) {
    warnings.push({
      code: 'unsymmetric-section',
      member_id: [...unsymmetric][0],
      member_ids: [...unsymmetric],
      message: `${[...unsymmetric].map(titleOf).join(', ')}: unsymmetric sections (angles) bend about their principal axes; they are checked with nothing holding them sideways (lateral restraint not assumed), which over-reports a member screwed along a panel`,
    });
  }
  for (const c of checks) {
    if (c.utilisation !== null && c.utilisation > 1) {
      warnings.push({
        code: 'over-utilised',
        member_id: c.member_id,
        message: `${titleOf(c.member_id)} is at ${Math.round(c.utilisation * 100)} % of its ${c.governing} limit${c.lateral && c.lateral.combined_utilisation >= c.utilisation ? ` with the sideways push of ${loads.cases.find((x) => x.id === c.governing_case)?.name ?? 'braking or cornering'}` : ''}: use a stiffer profile, shorten the span or add a support`,
      });
    }
  }
  if (tNutOrder.length > 0) {
    const nuts = tNutOrder.reduce((n, t) => n + t.count, 0);
    warnings.push({
      code: 'slot-closed',
      message: `${nuts} T-nut${nuts === 1 ? '' : 's'} in ${tNutOrder.length} slot${tNutOrder.length === 1 ? '' : 's'} closed at both ends must be slid in before assembly (or use drop-in T-nuts): see the T-nut order`,
    });
  }

  const byProfile = new Map<string, { profile: string; length_mm: number; mass_kg: number }>();
  members.forEach((g, i) => {
    const p = byProfile.get(g.member.profile) ?? { profile: g.member.profile, length_mm: 0, mass_kg: 0 };
    p.length_mm += lengths[i].length_mm;
    p.mass_kg += mass.member_kg[i];
    byProfile.set(g.member.profile, p);
  });

  const s = doc.settings;
  return {
    report_version: 1,
    name: doc.name,
    units: { display, frac, mass: doc.units.mass, date: doc.units.date, decimal_comma: doc.units.decimalComma },
    settings: {
      kerf_mm: s.kerf_mm,
      trim_mm: s.trim_mm,
      min_offcut_mm: s.minOffcut_mm,
      machining_allowance_mm: s.machiningAllowance_mm,
      tolerance_class: s.toleranceClass,
      tolerance_standard: TOLERANCE_CLASS_NAMES[s.toleranceClass],
      shock_factor: s.shockFactor,
      deflection_limit_n: s.deflectionLimitN,
      safety_factor: s.safetyFactor,
      in_vehicle: s.inVehicle,
      forward_g: s.forward_g,
      rearward_g: s.rearward_g,
      sideways_g: s.sideways_g,
      forward: s.forward,
      column_k: s.columnK ?? null,
      spares_pct: s.sparesPct,
      t_nut: s.tNut,
    },
    datums: [...datums.values.entries()]
      .map(([id, v]) => ({ id, axis: datums.axes.get(id) as Axis, value_mm: mm(v) }))
      .sort((p, q) => (p.id < q.id ? -1 : p.id > q.id ? 1 : 0)),
    bays: [...datums.bays.values()].map((b) => ({
      id: b.bay.id,
      run_id: b.run.id,
      index: b.index,
      module_id: b.bay.module ?? null,
      stack_ids: b.bay.stack ?? [],
      start_mm: mm(b.start_mm),
      end_mm: mm(b.end_mm),
      width_mm: mm(b.width_mm),
    })),
    members: reportMembers,
    joints: joints.joints.map((j) => ({
      id: j.id,
      kind: j.kind,
      butting: { member_id: idOf(j.butting), end: j.buttingEnd },
      other: { member_id: idOf(j.other), end: j.otherEnd },
      runs_through: j.through === null ? null : idOf(j.through),
      method: j.method,
      method_name: methods.get(j.method)?.name ?? j.method,
      at_mm: vec(j.at),
    })),
    cut_list: cuts.groups.map((g) => ({
      mark: g.mark,
      profile: g.profile,
      profile_name: members[g.members[0]].info.name,
      length_mm: mm(g.length_mm),
      cut_length_mm: mm(g.cut_length_mm),
      cut_length_text: text(g.cut_length_mm),
      tolerance_mm: g.tolerance_mm,
      qty: g.members.length,
      member_ids: g.members.map(idOf),
      ops: g.ops.map(roundOp),
    })),
    hardware: {
      lines: hardware.lines.map((l) => ({ ...l, length_mm: l.length_mm === null ? null : mm(l.length_mm), unit_mass_g: round(l.unit_mass_g, 2) })),
      spares_pct: s.sparesPct,
      mass_kg: round(hardware.mass_kg, 5),
      mass_approximate: true,
      t_nut_order: tNutOrder,
    },
    modules: modules.map((g, k) => ({
      id: g.module.id,
      name: g.module.name ?? null,
      kind: g.module.kind,
      bay_id: g.bay,
      mass_kg: round(g.mass_kg, 5),
      min_mm: boxMin(g.box),
      max_mm: boxMax(g.box),
      bearing: g.module.bearing,
      bears_on: bearings[k].contacts.map((c) => ({ member_id: idOf(c.member), face: c.face, from_mm: mm(c.from_mm), to_mm: mm(c.to_mm) })),
    })),
    loads: {
      g_m_s2: STANDARD_GRAVITY,
      shock_factor: s.shockFactor,
      shock_factor_note: SHOCK_FACTOR_NOTE,
      deflection_limit_n: s.deflectionLimitN,
      deflection_note: DEFLECTION_NOTE,
      safety_factor: s.safetyFactor,
      safety_factor_note: SAFETY_FACTOR_NOTE,
      modules: loads.modules.map((l) => ({
        module_id: modules[l.module].module.id,
        weight_N: roundOut(l.weight_N, 3),
        factored_N: roundOut(l.factored_N, 3),
        members: l.contacts,
      })),
      members: checks,
      uprights: members
        .filter((g) => g.axis === 'z' && loads.axial_N[g.index] > 1e-9)
        .map((g) => ({ member_id: g.member.id, axial_N: roundOut(loads.axial_N[g.index], 3) })),
      max_utilisation: governing?.utilisation ?? null,
      governing_member_id: governing?.member_id ?? null,
      governing_check: governing?.check ?? null,
      cases: loads.cases.map((c) => ({ id: c.id, name: c.name, vertical_factor: c.vertical, ax_g: c.ax, ay_g: c.ay, source: c.source })),
      statics: loads.statics.map((st) => ({
        module_id: modules[st.module].module.id,
        case: st.case,
        load_N: roundOut(st.load_N, 3),
        at_mm: { x: round(st.at.x, 2), y: round(st.at.y, 2) },
        reactions: st.reactions.map((r) => ({ member_id: idOf(r.member), R_N: roundOut(r.R_N, 3), x_mm: round(r.x_mm, 2) })),
        tips_toward: st.tips?.toward ?? null,
      })),
      columns,
      column_K: loads.K,
      fixings: loads.fixings.map((f) => ({
        case: f.case,
        horizontal_N: roundOut(f.horizontal_N, 3),
        vertical_N: roundOut(f.vertical_N, 3),
        points: f.points.map((p) => ({
          member_id: idOf(p.member),
          mark: cuts.markOf[p.member],
          title: titleOf(idOf(p.member)),
          kind: p.kind,
          at_mm: vec(p.at, 2),
          vertical_N: roundOut(p.vertical_N, 3),
          horizontal_N: roundOut(p.horizontal_N, 3),
        })),
      })),
      fixings_caution: FIXINGS_CAUTION,
      model_notes: [...LOAD_MODEL_NOTES],
    },
    mass: {
      frame_kg: round(mass.frame_kg, 5),
      hardware_kg: round(mass.hardware_kg, 5),
      hardware_approximate: true,
      modules_kg: round(mass.modules_kg, 5),
      total_kg: round(mass.total_kg, 5),
      cog_mm: mass.cog ? vec(mass.cog, 1) : null,
      frame_cog_mm: mass.frame_cog ? vec(mass.frame_cog, 1) : null,
      by_profile: [...byProfile.values()]
        .sort((p, q) => (p.profile < q.profile ? -1 : 1))
        .map((p) => ({ profile: p.profile, length_mm: mm(p.length_mm), mass_kg: round(p.mass_kg, 5) })),
    },
    warnings,
    cautions: [...CAUTIONS],
  };
}
