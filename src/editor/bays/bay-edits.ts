import { deleteItems } from '@shared/editing/edits';
import { freshId, usedIds } from '@shared/editing/ids';
import type { Scene } from '@shared/editing/scene';
import { AXES, AXIS_INDEX } from '@shared/model/axis';
import type { FrameDocument } from '@shared/model/frame-document';
import type { Member, MemberEnd } from '@shared/model/member';
import type { Position } from '@shared/model/position';
import type { Bay, Run } from '@shared/model/run';

// Bay edits on a run whose members refer to the run's datums (a laid-out cabinet or a converted frame). A new bay
// copies its neighbour's pattern: the members spanning the neighbour's opening (its rails) and the last upright
// pair with its cross-members; removing a bay takes its members and the last upright pair with it. Every edit is
// document → document; a result the frame cannot hold comes back as a reason in plain words.

export type BayResult = { ok: true; doc: FrameDocument } | { ok: false; reason: string };

const positions = (m: Member): (Position | undefined)[] => [m.start, m.end, ...AXES.map((a) => m.place[a])];
const refersTo = (m: Member, datums: ReadonlySet<string>) => positions(m).some((p) => p?.datum !== undefined && datums.has(p.datum));
const bayDatums = (bay: string) => new Set([`${bay}.start`, `${bay}.mid`, `${bay}.end`]);
/** Members spanning a bay's opening from its start to its end: its rails. */
const spans = (m: Member, bay: string) => m.start.datum === `${bay}.start` && m.end?.datum === `${bay}.end`;

function runOf(doc: FrameDocument, runId: string): Run | null {
  return doc.runs.find((r) => r.id === runId) ?? null;
}
const withRun = (doc: FrameDocument, run: Run): FrameDocument => ({ ...doc, runs: doc.runs.map((r) => (r.id === run.id ? run : r)) });

/** Copies of members with their ids, names and datums renamed; references among the copies point at the copies. */
function cloneMembers(doc: FrameDocument, list: readonly Member[], rename: (s: string) => string, datum: (d: string) => string): Member[] {
  const used = usedIds(doc);
  const ids = new Map<string, string>();
  for (const m of list) {
    const wanted = rename(m.id);
    const id = wanted !== m.id && !used.has(wanted) ? wanted : freshId(used, wanted);
    used.add(id);
    ids.set(m.id, id);
  }
  const fix = <P extends Position>(p: P | undefined): P | undefined => {
    if (!p) return p;
    if (p.datum !== undefined) return { ...p, datum: datum(p.datum) };
    if (p.member !== undefined && ids.has(p.member)) return { ...p, member: ids.get(p.member) };
    return p;
  };
  return list.map((m) => {
    const { mark: _mark, ...rest } = m;
    void _mark;
    const c: Member = { ...rest, id: ids.get(m.id) as string, start: fix(m.start) as MemberEnd, end: fix(m.end), place: { x: fix(m.place.x), y: fix(m.place.y), z: fix(m.place.z) } };
    if (m.name) c.name = rename(m.name);
    if (c.end === undefined) delete c.end;
    for (const a of AXES) if (c.place[a] === undefined) delete c.place[a];
    return c;
  });
}

/**
 * A new open bay `width_mm` wide at `index` (0 = before the first bay; the bay count = at the end), with rails
 * like its neighbour's and one more upright pair at the end of the run.
 */
export function addBay(doc: FrameDocument, runId: string, index: number, width_mm: number): BayResult {
  const run = runOf(doc, runId);
  if (!run) return { ok: false, reason: 'that run is no longer in the frame.' };
  if (!(width_mm > 0)) return { ok: false, reason: 'a bay needs a width of more than 0.' };
  const at = Math.max(0, Math.min(index, run.bays.length));
  const n = run.bays.length;
  const used = usedIds(doc);
  const id = freshId(used, 'bay');
  const neighbour = run.bays[Math.min(at, n - 1)];
  const rails = doc.members.filter((m) => spans(m, neighbour.id));
  const newRails = cloneMembers(
    doc,
    rails,
    (s) => s.split(neighbour.id).join(id),
    (d) => (d.startsWith(`${neighbour.id}.`) ? `${id}.${d.slice(neighbour.id.length + 1)}` : d),
  );
  const last = `${run.id}.u${n}`;
  const uprights = doc.members.filter((m) => refersTo(m, new Set([last])));
  const withRails: FrameDocument = { ...doc, members: [...doc.members, ...newRails] };
  const number = (s: string) => s.replace(new RegExp(`(?<=[ux])${n}(?=\\b|-|$)`), String(n + 1)).replace(new RegExp(`(?<= )${n + 1}(?=\\b)`), String(n + 2));
  const newUprights = cloneMembers(withRails, uprights, number, (d) => (d === last ? `${run.id}.u${n + 1}` : d));
  const bay: Bay = { id, width_mm };
  const bays = [...run.bays.slice(0, at), bay, ...run.bays.slice(at)];
  return { ok: true, doc: withRun({ ...withRails, members: [...withRails.members, ...newUprights] }, { ...run, bays }) };
}

/** Remove a bay: its rails, bearers and modules go, with the run's last upright pair (the bays close up). */
export function removeBay(doc: FrameDocument, scene: Scene, runId: string, bayId: string): BayResult {
  const run = runOf(doc, runId);
  const bay = run?.bays.find((b) => b.id === bayId);
  if (!run || !bay) return { ok: false, reason: 'that bay is no longer in the frame.' };
  if (run.bays.length === 1) return { ok: false, reason: 'it is the only bay of the run; delete the members instead if the cabinet should go.' };
  const datums = bayDatums(bay.id);
  datums.add(`${run.id}.u${run.bays.length}`);
  const members = new Set(doc.members.filter((m) => refersTo(m, datums)).map((m) => m.id));
  const modules = new Set(bay.module !== undefined ? [bay.module] : []);
  for (const extra of (bay as Bay & { stack?: string[] }).stack ?? []) modules.add(extra);
  const cleared = deleteItems(doc, scene, members, modules);
  const r = runOf(cleared, runId) as Run;
  return { ok: true, doc: withRun(cleared, { ...r, bays: r.bays.filter((b) => b.id !== bayId) }) };
}

/** Move a bay one place along its run (its members and module travel with it; the uprights re-lay). */
export function moveBay(doc: FrameDocument, runId: string, bayId: string, to: number): BayResult {
  const run = runOf(doc, runId);
  const i = run?.bays.findIndex((b) => b.id === bayId) ?? -1;
  if (!run || i < 0) return { ok: false, reason: 'that bay is no longer in the frame.' };
  const j = Math.max(0, Math.min(to, run.bays.length - 1));
  if (j === i) return { ok: true, doc };
  const bays = run.bays.slice();
  const [b] = bays.splice(i, 1);
  bays.splice(j, 0, b);
  return { ok: true, doc: withRun(doc, { ...run, bays }) };
}

/** Fix a bay's width, or (undefined) let it follow its module's width plus the clearance. */
export function setBayWidth(doc: FrameDocument, runId: string, bayId: string, width_mm: number | undefined): BayResult {
  const run = runOf(doc, runId);
  const bay = run?.bays.find((b) => b.id === bayId);
  if (!run || !bay) return { ok: false, reason: 'that bay is no longer in the frame.' };
  if (width_mm === undefined && bay.module === undefined) return { ok: false, reason: 'an open bay has no module to follow; give it a width.' };
  if (width_mm !== undefined && !(width_mm > 0)) return { ok: false, reason: 'a bay needs a width of more than 0.' };
  const { width_mm: _w, ...rest } = bay;
  void _w;
  const next: Bay = width_mm === undefined ? rest : { ...rest, width_mm };
  return { ok: true, doc: withRun(doc, { ...run, bays: run.bays.map((b) => (b.id === bayId ? next : b)) }) };
}

/** Take a module out of its run: it stays where it is, standing free; its bay stays open at its width. */
export function moduleOutOfRun(doc: FrameDocument, scene: Scene, moduleId: string): BayResult {
  const run = doc.runs.find((r) => r.bays.some((b) => b.module === moduleId));
  const sm = scene.modules.find((m) => m.id === moduleId);
  const sb = scene.bays.find((b) => b.module === moduleId);
  if (!run || !sm || !sb) return { ok: false, reason: 'it is not in a bay.' };
  const k = AXIS_INDEX[run.axis];
  const bays = run.bays.map((b) => {
    if (b.module !== moduleId) return b;
    const { module: _m, ...rest } = b;
    void _m;
    return { ...rest, width_mm: b.width_mm ?? Math.round((sb.end_mm - sb.start_mm) * 1000) / 1000 };
  });
  const modules = doc.modules.map((m) => (m.id === moduleId ? { ...m, place: { ...m.place, [run.axis]: { offset_mm: Math.round(sm.box.min[k] * 1000) / 1000 } } } : m));
  return { ok: true, doc: withRun({ ...doc, modules }, { ...run, bays }) };
}

/**
 * Put a module into an open bay. It sits across the run like the run's other modules, and gets the carrying
 * members (bearers or slide rails) a bay with a module that bears the same way has.
 */
export function moduleIntoBay(doc: FrameDocument, moduleId: string, runId: string, bayId: string): BayResult {
  const run = runOf(doc, runId);
  const bay = run?.bays.find((b) => b.id === bayId);
  const module = doc.modules.find((m) => m.id === moduleId);
  if (!run || !bay || !module) return { ok: false, reason: 'that bay or module is no longer in the frame.' };
  if (bay.module !== undefined) return { ok: false, reason: 'that bay already holds a module; swap the two instead.' };
  if (doc.runs.some((r) => r.bays.some((b) => b.module === moduleId))) return { ok: false, reason: 'it is already in a bay; take it out of the run first, or swap it.' };
  const like = run.bays.find((b) => b.module !== undefined && doc.modules.find((m) => m.id === b.module)?.bearing === module.bearing);
  const sibling = like ? doc.modules.find((m) => m.id === like.module) : doc.modules.find((m) => run.bays.some((b) => b.module === m.id));
  const place = sibling ? Object.fromEntries(Object.entries(sibling.place).filter(([a]) => a !== run.axis)) : Object.fromEntries(Object.entries(module.place).filter(([a]) => a !== run.axis));
  let members = doc.members;
  if (like) {
    const carriers = doc.members.filter((m) => m.axis !== run.axis && [m.place[run.axis]].some((p) => p?.datum === `${like.id}.start` || p?.datum === `${like.id}.end`));
    const clones = cloneMembers(
      doc,
      carriers,
      (s) => s.split(like.id).join(bay.id),
      (d) => (d.startsWith(`${like.id}.`) ? `${bay.id}.${d.slice(like.id.length + 1)}` : d),
    );
    members = [...members, ...clones];
  }
  const { width_mm: _w, ...open } = bay;
  void _w;
  const modules = doc.modules.map((m) => (m.id === moduleId ? { ...m, place } : m));
  return { ok: true, doc: withRun({ ...doc, members, modules }, { ...run, bays: run.bays.map((b) => (b.id === bayId ? { ...open, module: moduleId } : b)) }) };
}
