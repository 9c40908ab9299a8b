// Openings read off a resolved frame: the clear space between the inner faces of the members around a drawer
// module or a bay face, found by looking outwards from a point inside it along each axis to the nearest member.
import type { Vec3 } from '../model/axis';
import type { FrameReport, ReportMember } from '../engine/report-types';

type Axis3 = 'x' | 'y' | 'z';
const EPS = 1e-6;
const others = (a: Axis3): [Axis3, Axis3] => (a === 'x' ? ['y', 'z'] : a === 'y' ? ['x', 'z'] : ['x', 'y']);

/** Nearest member faces either side of `p` along `axis`, among members whose box holds p's other two coordinates. */
export function clearSpan(members: readonly ReportMember[], p: Vec3, axis: Axis3): { lo: number; hi: number; loMember: ReportMember | null; hiMember: ReportMember | null } {
  const [a, b] = others(axis);
  let lo = -Infinity;
  let hi = Infinity;
  let loMember: ReportMember | null = null;
  let hiMember: ReportMember | null = null;
  for (const m of members) {
    if (m.min_mm[a] > p[a] + EPS || m.max_mm[a] < p[a] - EPS || m.min_mm[b] > p[b] + EPS || m.max_mm[b] < p[b] - EPS) continue;
    if (m.max_mm[axis] <= p[axis] + EPS && m.max_mm[axis] > lo) (lo = m.max_mm[axis]), (loMember = m);
    if (m.min_mm[axis] >= p[axis] - EPS && m.min_mm[axis] < hi) (hi = m.min_mm[axis]), (hiMember = m);
  }
  return { lo, hi, loMember, hiMember };
}

export type DrawerOpening = {
  module_id: string;
  bay_id: string | null;
  name: string;
  width_mm: number;
  height_mm: number;
  depth_mm: number;
  /** Where the opening sits in the frame (x between the side members, y front to back, z the module's height). */
  min_mm: Vec3;
  max_mm: Vec3;
  /** A slide fixes to a member running front to back beside it, or needs L-brackets to the uprights. */
  support: { left: 'member' | 'bracket'; right: 'member' | 'bracket' };
};

/** One opening per drawer module: between the members either side at its mid-height, front to back between the uprights. */
export function drawerOpenings(report: FrameReport): DrawerOpening[] {
  const out: DrawerOpening[] = [];
  for (const mod of report.modules) {
    if (mod.kind !== 'drawer-stack') continue;
    const c: Vec3 = { x: (mod.min_mm.x + mod.max_mm.x) / 2, y: (mod.min_mm.y + mod.max_mm.y) / 2, z: (mod.min_mm.z + mod.max_mm.z) / 2 };
    const xs = clearSpan(report.members, c, 'x');
    const left = Number.isFinite(xs.lo) ? xs.lo : mod.min_mm.x;
    const right = Number.isFinite(xs.hi) ? xs.hi : mod.max_mm.x;
    // Depth at the side members' line, where the uprights stand.
    const ys = clearSpan(report.members, { ...c, x: xs.loMember ? (xs.loMember.min_mm.x + xs.loMember.max_mm.x) / 2 : left }, 'y');
    const front = Number.isFinite(ys.lo) ? ys.lo : mod.min_mm.y;
    const back = Number.isFinite(ys.hi) ? ys.hi : mod.max_mm.y;
    const side = (m: ReportMember | null): 'member' | 'bracket' => (m && m.axis === 'y' && m.min_mm.y <= front + EPS + 50 && m.max_mm.y >= back - EPS - 50 ? 'member' : 'bracket');
    out.push({
      module_id: mod.id,
      bay_id: mod.bay_id,
      name: mod.name ?? mod.id,
      width_mm: right - left,
      height_mm: mod.max_mm.z - mod.min_mm.z,
      depth_mm: back - front,
      min_mm: { x: left, y: front, z: mod.min_mm.z },
      max_mm: { x: right, y: back, z: mod.max_mm.z },
      support: { left: side(xs.loMember), right: side(xs.hiMember) },
    });
  }
  return out;
}

export type FaceOpening = { length_mm: number; width_mm: number; min_mm: Vec3; max_mm: Vec3; crossed_by: string[] };
export type BayFaceOpenings = { bay_id: string; back: FaceOpening; floor: FaceOpening; top: FaceOpening; left: FaceOpening | null; right: FaceOpening | null };

/**
 * The faces a panel can close on a bay: the back (x by z), the floor and the top (x by y, on the seat and top
 * members), and a side at either end of the run (y by z). A member in the plane of a face inside its outline (a
 * slide rail in line with the uprights) is listed in `crossed_by`: a panel set in the slot cannot pass it.
 */
export function bayFaceOpenings(report: FrameReport, bayId: string): BayFaceOpenings {
  const bay = report.bays.find((b) => b.id === bayId);
  if (!bay) throw new Error(`no bay "${bayId}"`);
  const runBays = report.bays.filter((b) => b.run_id === bay.run_id).sort((p, q) => p.index - q.index);
  const ms = report.members;
  const zTop = Math.max(...ms.map((m) => m.max_mm.z));
  const zBottom = Math.min(...ms.map((m) => m.min_mm.z));
  const cx = (bay.start_mm + bay.end_mm) / 2;
  // Depth between the front and back uprights, taken at the bay's left boundary.
  const atBoundary = bay.start_mm - EPS * 10;
  const mid: Vec3 = { x: atBoundary, y: (Math.min(...ms.map((m) => m.min_mm.y)) + Math.max(...ms.map((m) => m.max_mm.y))) / 2, z: (zTop + zBottom) / 2 };
  const ys = clearSpan(ms, mid, 'y');
  const front = ys.lo;
  const back = ys.hi;
  const backPlane = back + (ys.hiMember ? (ys.hiMember.max_mm.y - ys.hiMember.min_mm.y) / 2 : 0);
  const crossing = (m: ReportMember, box: { min: Vec3; max: Vec3 }, plane: Axis3, at: number): boolean =>
    m.min_mm[plane] <= at + EPS && m.max_mm[plane] >= at - EPS && (['x', 'y', 'z'] as Axis3[]).filter((a) => a !== plane).every((a) => m.max_mm[a] > box.min[a] + EPS && m.min_mm[a] < box.max[a] - EPS);
  const face = (plane: Axis3, at: number, lengthAxis: Axis3, widthAxis: Axis3, min: Vec3, max: Vec3): FaceOpening => ({
    length_mm: max[lengthAxis] - min[lengthAxis],
    width_mm: max[widthAxis] - min[widthAxis],
    min_mm: min,
    max_mm: max,
    crossed_by: ms.filter((m) => crossing(m, { min, max }, plane, at)).map((m) => m.id),
  });
  // Back: between the back rails' faces at the bay's middle.
  const zb = clearSpan(ms, { x: cx, y: backPlane, z: mid.z }, 'z');
  const back_ = face('y', backPlane, 'x', 'z', { x: bay.start_mm, y: back, z: zb.lo }, { x: bay.end_mm, y: back, z: zb.hi });
  // Floor and top: on the lowest and highest rails, between the front and back members at the bay's middle.
  const lowRail = zb.loMember;
  const topRail = zb.hiMember;
  const floorZ = lowRail ? (lowRail.min_mm.z + lowRail.max_mm.z) / 2 : zBottom;
  const topZ = topRail ? (topRail.min_mm.z + topRail.max_mm.z) / 2 : zTop;
  const yf = clearSpan(ms, { x: cx, y: mid.y, z: floorZ }, 'y');
  const yt = clearSpan(ms, { x: cx, y: mid.y, z: topZ }, 'y');
  const floor = face('z', floorZ, 'x', 'y', { x: bay.start_mm, y: yf.lo, z: zb.lo }, { x: bay.end_mm, y: yf.hi, z: zb.lo });
  const top = face('z', topZ, 'x', 'y', { x: bay.start_mm, y: yt.lo, z: zb.hi }, { x: bay.end_mm, y: yt.hi, z: zb.hi });
  // Sides at the run's ends only: in the plane of the end upright, from the lowest to the highest member there.
  const endSide = (x: number): FaceOpening => {
    const zs = ms.filter((m) => m.min_mm.x <= x + EPS && m.max_mm.x >= x - EPS && m.min_mm.y < back && m.max_mm.y > front).sort((p, q) => p.min_mm.z - q.min_mm.z);
    const lowTop = zs.length ? Math.min(...zs.filter((m) => m.axis !== 'z').map((m) => m.max_mm.z)) : zBottom;
    const highBottom = zs.length ? Math.max(...zs.filter((m) => m.axis !== 'z').map((m) => m.min_mm.z)) : zTop;
    return face('x', x, 'y', 'z', { x, y: front, z: lowTop }, { x, y: back, z: highBottom });
  };
  const first = runBays[0]?.id === bay.id;
  const last = runBays[runBays.length - 1]?.id === bay.id;
  const leftUpright = clearSpan(ms, { x: cx, y: front - EPS * 10, z: mid.z }, 'x').loMember;
  const rightUpright = clearSpan(ms, { x: cx, y: front - EPS * 10, z: mid.z }, 'x').hiMember;
  return {
    bay_id: bay.id,
    back: back_,
    floor,
    top,
    left: first && leftUpright ? endSide((leftUpright.min_mm.x + leftUpright.max_mm.x) / 2) : null,
    right: last && rightUpright ? endSide((rightUpright.min_mm.x + rightUpright.max_mm.x) / 2) : null,
  };
}
