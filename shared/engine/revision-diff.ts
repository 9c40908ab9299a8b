import type { Vec3 } from '../model/axis';
import type { FrameReport, ReportMember } from './report-types';

/** Closer than this is the same place (mm): below what a tape or a drawing shows. */
const SAME_MM = 0.05;

export type MemberChange = 'added' | 'removed' | 'moved' | 'changed' | 'same';

export type DrawnBox = { min_mm: Vec3; max_mm: Vec3 };

export type MemberDiff = {
  member_id: string;
  name: string | null;
  /** added: only in the later revision; removed: only in the earlier; moved: its box changed (place or length);
   * changed: same box, other profile, turn or machining; same: nothing that shows on the drawing or the saw. */
  change: MemberChange;
  axis: 'x' | 'y' | 'z';
  mark_before: string | null;
  mark_after: string | null;
  profile_before: string | null;
  profile_after: string | null;
  cut_length_before_mm: number | null;
  cut_length_after_mm: number | null;
  box_before: DrawnBox | null;
  box_after: DrawnBox | null;
  /** How far its centre went (mm), for moved members. */
  moved_mm: number | null;
};

/** One line of the cut list (profile and cut length) whose count or mark differs between the two revisions. */
export type CutLineDiff = {
  profile: string;
  profile_name: string;
  cut_length_mm: number;
  cut_length_text: string;
  mark_before: string | null;
  mark_after: string | null;
  qty_before: number;
  qty_after: number;
};

export type HardwareDiff = { key: string; name: string; count_before: number; count_after: number; order_before: number; order_after: number };

export type RevisionDiff = {
  members: MemberDiff[];
  cut_list: CutLineDiff[];
  hardware: HardwareDiff[];
  modules_before: (DrawnBox & { id: string; name: string })[];
  modules_after: (DrawnBox & { id: string; name: string })[];
  totals: {
    added: number;
    removed: number;
    moved: number;
    changed: number;
    same: number;
    parts_before: number;
    parts_after: number;
    mass_before_kg: number;
    mass_after_kg: number;
  };
};

const box = (m: Pick<ReportMember, 'min_mm' | 'max_mm'>): DrawnBox => ({ min_mm: { ...m.min_mm }, max_mm: { ...m.max_mm } });
const close = (a: Vec3, b: Vec3) => Math.abs(a.x - b.x) < SAME_MM && Math.abs(a.y - b.y) < SAME_MM && Math.abs(a.z - b.z) < SAME_MM;
const centre = (m: DrawnBox): Vec3 => ({ x: (m.min_mm.x + m.max_mm.x) / 2, y: (m.min_mm.y + m.max_mm.y) / 2, z: (m.min_mm.z + m.max_mm.z) / 2 });
const round1 = (v: number) => Math.round(v * 10) / 10;
const opsKey = (m: ReportMember) => JSON.stringify(m.ops);
const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

function memberDiff(o: ReportMember | undefined, n: ReportMember | undefined): MemberDiff {
  const any = (n ?? o) as ReportMember;
  let change: MemberChange = 'same';
  let moved: number | null = null;
  if (!o) change = 'added';
  else if (!n) change = 'removed';
  else if (!close(o.min_mm, n.min_mm) || !close(o.max_mm, n.max_mm)) {
    change = 'moved';
    const a = centre(o);
    const b = centre(n);
    moved = round1(Math.hypot(b.x - a.x, b.y - a.y, b.z - a.z));
  } else if (o.profile !== n.profile || o.rotation_deg !== n.rotation_deg || Math.abs(o.cut_length_mm - n.cut_length_mm) >= SAME_MM || opsKey(o) !== opsKey(n)) {
    change = 'changed';
  }
  return {
    member_id: any.id,
    name: any.name,
    change,
    axis: any.axis,
    mark_before: o?.mark ?? null,
    mark_after: n?.mark ?? null,
    profile_before: o?.profile ?? null,
    profile_after: n?.profile ?? null,
    cut_length_before_mm: o?.cut_length_mm ?? null,
    cut_length_after_mm: n?.cut_length_mm ?? null,
    box_before: o ? box(o) : null,
    box_after: n ? box(n) : null,
    moved_mm: moved,
  };
}

/** The cut list folded to profile and cut length (to 0.1 mm, as the saw list rounds), machining aside. */
function cutLines(r: Pick<FrameReport, 'cut_list'>): Map<string, { line: FrameReport['cut_list'][number]; qty: number; marks: string[] }> {
  const out = new Map<string, { line: FrameReport['cut_list'][number]; qty: number; marks: string[] }>();
  for (const l of r.cut_list) {
    const key = `${l.profile}|${Math.round(l.cut_length_mm * 10)}`;
    const had = out.get(key);
    if (had) {
      had.qty += l.qty;
      had.marks.push(l.mark);
    } else out.set(key, { line: l, qty: l.qty, marks: [l.mark] });
  }
  return out;
}

type Compared = Pick<FrameReport, 'members' | 'cut_list' | 'hardware' | 'modules' | 'mass'>;

/**
 * What differs between two revisions of a frame: every member by id (added, removed, moved, changed, same) with
 * its box in each so both drawings can be marked, the cut-list lines whose count or mark differs, and the
 * hardware lines whose count differs. Members in document order, the later revision's first; deterministic.
 */
export function compareReports(before: Compared, after: Compared): RevisionDiff {
  const old = new Map(before.members.map((m) => [m.id, m]));
  const now = new Map(after.members.map((m) => [m.id, m]));
  const members = [
    ...after.members.map((n) => memberDiff(old.get(n.id), n)),
    ...before.members.filter((o) => !now.has(o.id)).map((o) => memberDiff(o, undefined)),
  ];

  const a = cutLines(before);
  const b = cutLines(after);
  const cut_list: CutLineDiff[] = [];
  for (const key of new Set([...a.keys(), ...b.keys()])) {
    const x = a.get(key);
    const y = b.get(key);
    const line = (y ?? x)!.line;
    const markBefore = x ? x.marks.join(', ') : null;
    const markAfter = y ? y.marks.join(', ') : null;
    if ((x?.qty ?? 0) === (y?.qty ?? 0) && markBefore === markAfter) continue;
    cut_list.push({
      profile: line.profile,
      profile_name: line.profile_name,
      cut_length_mm: line.cut_length_mm,
      cut_length_text: line.cut_length_text,
      mark_before: markBefore,
      mark_after: markAfter,
      qty_before: x?.qty ?? 0,
      qty_after: y?.qty ?? 0,
    });
  }
  cut_list.sort((p, q) => byText(p.profile, q.profile) || q.cut_length_mm - p.cut_length_mm);

  const ha = new Map(before.hardware.lines.map((l) => [l.key, l]));
  const hb = new Map(after.hardware.lines.map((l) => [l.key, l]));
  const hardware: HardwareDiff[] = [];
  for (const key of new Set([...ha.keys(), ...hb.keys()])) {
    const x = ha.get(key);
    const y = hb.get(key);
    if ((x?.count ?? 0) === (y?.count ?? 0)) continue;
    hardware.push({ key, name: (y ?? x)!.name, count_before: x?.count ?? 0, count_after: y?.count ?? 0, order_before: x?.order_qty ?? 0, order_after: y?.order_qty ?? 0 });
  }
  hardware.sort((p, q) => byText(p.name, q.name) || byText(p.key, q.key));

  const modules = (r: Compared) => r.modules.map((m) => ({ id: m.id, name: m.name ?? m.kind, ...box(m) }));
  const count = (c: MemberChange) => members.filter((m) => m.change === c).length;
  return {
    members,
    cut_list,
    hardware,
    modules_before: modules(before),
    modules_after: modules(after),
    totals: {
      added: count('added'),
      removed: count('removed'),
      moved: count('moved'),
      changed: count('changed'),
      same: count('same'),
      parts_before: before.members.length,
      parts_after: after.members.length,
      mass_before_kg: before.mass.total_kg,
      mass_after_kg: after.mass.total_kg,
    },
  };
}
