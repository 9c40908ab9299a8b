import { FASTENER_THREADS } from '../catalog/fasteners';
import type { Fastener } from '../catalog/profiles';
import { crossAxes, type Axis, type Vec3 } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { DEFAULT_MOUNT_CLAMP_MM, DEFAULT_MOUNT_POINTS } from '../model/module';
import type { ModuleBearing } from './bearing';
import { ai, type Box } from './box';
import { hexNutMass_g, screwLabel, screwLengthFor, screwMass_g, stockScrewLength, tNutMass_g } from './fastening';
import { faceName, otherAxis, type FaceName } from './faces';
import { END_NAMES, type EndName, type Joint, type JointsResult } from './joints';
import type { MethodDef, PartKind } from './join-methods';
import { fastenerOf } from './profile-table';
import type { ModuleGeometry } from './resolve-modules';
import type { MemberGeometry } from './resolve-members';
import type { ReportWarning } from './warnings';

export type HardwareKind = PartKind | 'screw' | 't-nut' | 'nut';

export type HardwareLine = {
  key: string;
  kind: HardwareKind;
  name: string;
  size: Fastener | null;
  length_mm: number | null;
  count: number;
  /** Count plus the spares percentage, rounded up. */
  order_qty: number;
  /** Approximate: worked from the part's rough shape and material density, not from a maker's data. */
  unit_mass_g: number;
};

/** T-nuts that must go into a slot before both its ends are closed. */
export type SlotOrder = {
  member: number;
  face: FaceName;
  /** 1-based, counted from the face's low side (left, front or bottom). */
  slot: number;
  count: number;
  closed_by: [string, string];
  /** Joint ids and module ids the nuts are for. */
  for: string[];
};

export type HardwareResult = {
  lines: HardwareLine[];
  mass_kg: number;
  /** Σ mass × position, for the centre of gravity (kg·mm). */
  moment: Vec3;
  slotOrder: SlotOrder[];
  warnings: ReportWarning[];
};

type NutUse = { member: number; face: FaceName; slot: number; count: number; source: string };

/** Which slot of a face a fastener at `target` (a coordinate across the face) goes in. */
function slotIndex(m: MemberGeometry, box: Box, face: FaceName, target: number): number {
  const normal: Axis = face === 'left' || face === 'right' ? 'x' : face === 'front' || face === 'back' ? 'y' : 'z';
  const across = ai(otherAxis(m.axis, normal));
  const width = box.max[across] - box.min[across];
  const count = Math.max(1, Math.round(width / m.info.module_mm));
  const k = Math.floor(((target - box.min[across]) / width) * count);
  return Math.min(Math.max(k, 0), count - 1) + 1;
}

const across = (m: MemberGeometry, face: FaceName): Axis => {
  const normal: Axis = face === 'left' || face === 'right' ? 'x' : face === 'front' || face === 'back' ? 'y' : 'z';
  return otherAxis(m.axis, normal);
};

/**
 * The hardware list: each joint's recipe (brackets, plates, connectors, screws and T-nuts into each member), end
 * caps on open ends, and a screw and T-nut per module fixing point; counts, spares, approximate masses. Then the
 * T-nut order: every slot closed at both ends by butting members, with the nuts that must be slid in first.
 */
export function hardwareList(
  doc: Pick<FrameDocument, 'settings'>,
  members: readonly MemberGeometry[],
  joints: Pick<JointsResult, 'joints' | 'effective' | 'ends'>,
  methods: ReadonlyMap<string, MethodDef>,
  modules: readonly ModuleGeometry[],
  bearings: readonly ModuleBearing[],
): HardwareResult {
  const eff = joints.effective;
  const lines = new Map<string, HardwareLine>();
  const moment = { x: 0, y: 0, z: 0 };
  let mass_g = 0;
  const nuts: NutUse[] = [];
  const warnings: ReportWarning[] = [];

  const add = (line: Omit<HardwareLine, 'count' | 'order_qty'>, qty: number, at: Vec3) => {
    if (qty <= 0) return;
    const have = lines.get(line.key);
    if (have) have.count += qty;
    else lines.set(line.key, { ...line, count: qty, order_qty: 0 });
    const g = line.unit_mass_g * qty;
    mass_g += g;
    moment.x += g * at.x;
    moment.y += g * at.y;
    moment.z += g * at.z;
  };

  type Lines = { screw: Omit<HardwareLine, 'count' | 'order_qty'>; nut: Omit<HardwareLine, 'count' | 'order_qty'> };
  const fastenerLines = new Map<string, Lines>();
  /** The screw and nut lines for a fastening into a member of this profile through `clamp_mm`, worked out once. */
  const linesFor = (m: MemberGeometry, clamp_mm: number): Lines => {
    const key = `${m.info.id}|${clamp_mm}`;
    let lines = fastenerLines.get(key);
    if (lines) return lines;
    const f = fastenerOf(m.info);
    if (m.info.slotted) {
      const len = screwLengthFor(f, clamp_mm);
      const slot = m.info.profile.slot_mm as number;
      lines = {
        screw: { key: `screw|${f}|${len}`, kind: 'screw', name: `cap screw ${screwLabel(f, len)}`, size: f, length_mm: len, unit_mass_g: screwMass_g(f, len) },
        nut: { key: `t-nut|${f}|${slot}`, kind: 't-nut', name: `T-nut ${f} for ${slot} mm slot`, size: f, length_mm: null, unit_mass_g: tNutMass_g(f) },
      };
    } else {
      // A plain section has no slot: a bolt right through it and a hex nut.
      const len = stockScrewLength(f, clamp_mm + m.info.module_mm + FASTENER_THREADS[f].major_mm);
      lines = {
        screw: { key: `screw|${f}|${len}`, kind: 'screw', name: `cap screw ${screwLabel(f, len)}`, size: f, length_mm: len, unit_mass_g: screwMass_g(f, len) },
        nut: { key: `nut|${f}`, kind: 'nut', name: `hex nut ${f}`, size: f, length_mm: null, unit_mass_g: hexNutMass_g(f) },
      };
      warnings.push({
        code: 'plain-section-fastener',
        member_id: m.member.id,
        message: `${m.info.name} has no T-slots: its fastenings are listed as ${f} bolts right through it with hex nuts`,
      });
    }
    fastenerLines.set(key, lines);
    return lines;
  };

  /** `qty` screws, each with its nut, into member `m`'s `face`, slot under `target`, clamping `clamp_mm`. */
  const fasten = (m: MemberGeometry, face: FaceName, target: number, clamp_mm: number, qty: number, source: string, at: Vec3) => {
    if (qty <= 0) return;
    const lines = linesFor(m, clamp_mm);
    add(lines.screw, qty, at);
    add(lines.nut, qty, at);
    if (m.info.slotted) nuts.push({ member: m.index, face, slot: slotIndex(m, eff[m.index], face, target), count: qty, source });
  };

  const centreOn = (box: Box, a: Axis) => (box.min[ai(a)] + box.max[ai(a)]) / 2;

  for (const j of joints.joints) {
    const method = methods.get(j.method) as MethodDef;
    const b = members[j.butting];
    const o = members[j.other];
    const recipe = method.recipe(b.info, o.info);
    for (const p of recipe.parts) add({ key: p.key, kind: p.kind, name: p.name, size: null, length_mm: null, unit_mass_g: p.mass_g }, p.qty, j.at);
    if (recipe.fastenersPerMember === 0) continue;
    const faces = fastenerFaces(j, b, o, eff, recipe.placement);
    fasten(b, faces.butting, centreOn(eff[o.index], across(b, faces.butting)), recipe.clamp_mm, recipe.fastenersPerMember, j.id, j.at);
    fasten(o, faces.other, centreOn(eff[b.index], across(o, faces.other)), recipe.clamp_mm, recipe.fastenersPerMember, j.id, j.at);
  }

  members.forEach((m, i) => {
    END_NAMES.forEach((end, k) => {
      const info = joints.ends[i][k];
      if (info.role === 'butts') return;
      const recipe = (methods.get(info.method) as MethodDef).recipe(m.info, null);
      const at = endPoint(eff[i], m.axis, end);
      for (const p of recipe.parts) add({ key: p.key, kind: p.kind, name: p.name, size: null, length_mm: null, unit_mass_g: p.mass_g }, p.qty, at);
    });
  });

  for (const b of bearings) {
    const g = modules[b.module];
    if (b.contacts.length === 0) continue;
    const points = g.module.mounting?.points ?? DEFAULT_MOUNT_POINTS[b.bearing];
    const clamp = g.module.mounting?.clamp_mm ?? DEFAULT_MOUNT_CLAMP_MM;
    b.contacts.forEach((c, k) => {
      const m = members[c.member];
      const qty = Math.floor(points / b.contacts.length) + (k < points % b.contacts.length ? 1 : 0);
      const box = eff[m.index];
      const a = ai(m.axis);
      const at = { x: centreOn(box, 'x'), y: centreOn(box, 'y'), z: centreOn(box, 'z') };
      at[m.axis] = box.min[a] + (c.from_mm + c.to_mm) / 2;
      fasten(m, c.face, centreOn(g.box, across(m, c.face)), clamp, qty, g.module.id, at);
    });
  }

  const pct = doc.settings.sparesPct;
  const sorted = [...lines.values()].sort((p, q) => KIND_ORDER[p.kind] - KIND_ORDER[q.kind] || (p.key < q.key ? -1 : p.key > q.key ? 1 : 0));
  // Integer arithmetic first, so 10 × 110 % is 11, not 11.000000000000002 rounded up to 12.
  for (const l of sorted) l.order_qty = Math.ceil((l.count * (100 + pct)) / 100 - 1e-9);

  return { lines: sorted, mass_kg: mass_g / 1000, moment: { x: moment.x / 1000, y: moment.y / 1000, z: moment.z / 1000 }, slotOrder: slotOrder(doc, members, joints, nuts), warnings };
}

const KIND_ORDER: Readonly<Record<HardwareKind, number>> = { bracket: 0, plate: 1, connector: 2, part: 3, screw: 4, 't-nut': 5, nut: 6, 'end-cap': 7 };

function endPoint(box: Box, axis: Axis, end: EndName): Vec3 {
  const p = { x: (box.min[0] + box.max[0]) / 2, y: (box.min[1] + box.max[1]) / 2, z: (box.min[2] + box.max[2]) / 2 };
  p[axis] = end === 'start' ? box.min[ai(axis)] : box.max[ai(axis)];
  return p;
}

/**
 * Where a joint's screws go. An inside bracket sits in the corner: on the member butted against, the face the
 * butting end meets; on the butting member, the face towards the longer part of the other (inside the L). A
 * plate lies over the joint on the low face across both (front, left or bottom).
 */
function fastenerFaces(j: Joint, b: MemberGeometry, o: MemberGeometry, eff: readonly Box[], placement: 'inside-corner' | 'side-plate'): { butting: FaceName; other: FaceName } {
  if (j.kind === 'inline' || b.axis === o.axis) {
    const side = crossAxes(b.axis)[0];
    return { butting: faceName(side, 'min'), other: faceName(side, 'min') };
  }
  if (placement === 'side-plate') {
    const c = otherAxis(b.axis, o.axis);
    return { butting: faceName(c, 'min'), other: faceName(c, 'min') };
  }
  const t = ai(o.axis);
  const box = eff[o.index];
  const at = j.at[o.axis];
  return {
    other: faceName(b.axis, j.buttingEnd === 'end' ? 'min' : 'max'),
    butting: faceName(o.axis, box.max[t] - at >= at - box.min[t] ? 'max' : 'min'),
  };
}

/** Slots closed at both ends: both ends of the member butt against other members (an end cap comes off). */
function slotOrder(
  doc: Pick<FrameDocument, 'settings'>,
  members: readonly MemberGeometry[],
  joints: Pick<JointsResult, 'joints' | 'ends'>,
  nuts: readonly NutUse[],
): SlotOrder[] {
  if (doc.settings.tNut === 'drop-in') return [];
  const closers = members.map((_, i) => {
    const [s, e] = joints.ends[i];
    if (s.role !== 'butts' || e.role !== 'butts') return null;
    const other = (k: number | null) => {
      const j = joints.joints[k as number];
      return members[j.butting === i ? j.other : j.butting].member.id;
    };
    return [other(s.joint), other(e.joint)] as [string, string];
  });
  const groups = new Map<string, SlotOrder>();
  for (const n of nuts) {
    const closed = closers[n.member];
    if (!closed) continue;
    const key = `${n.member}|${n.face}|${n.slot}`;
    const g = groups.get(key);
    if (g) {
      g.count += n.count;
      if (!g.for.includes(n.source)) g.for.push(n.source);
    } else groups.set(key, { member: n.member, face: n.face, slot: n.slot, count: n.count, closed_by: closed, for: [n.source] });
  }
  return [...groups.values()].sort((p, q) => p.member - q.member || (p.face < q.face ? -1 : p.face > q.face ? 1 : 0) || p.slot - q.slot);
}
