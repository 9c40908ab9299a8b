import { moduleSizeAlong } from '../engine/resolve-datums';
import { AXIS_INDEX, type Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import { moduleLabel } from '../model/module';
import type { Position } from '../model/position';
import type { Bay, Run } from '../model/run';
import { freshId, usedIds } from './ids';
import { layoutOf } from './layout';
import { refuse, type EditOutcome } from './outcome';
import { rewritePositions } from './references';
import type { SceneMember } from './scene';

/** Faces closer than this are the same face (mm): what hand drawing on a 1 mm grid or by typing gives. */
const SAME_MM = 0.5;

const tidy = (v: number): number => {
  const r = Math.round(v * 1000) / 1000;
  return Object.is(r, -0) ? 0 : r;
};

type Boundary = { low: number; high: number; uprights: SceneMember[] };

/** A member as the builder knows it, for the notes. */
const memberWords = (m: SceneMember, name: string | undefined) => (name?.trim() ? `“${name.trim()}”` : m.mark ? `part ${m.mark}` : `a ${m.role}`);

/**
 * Turn a row of hand-drawn uprights into a run, so that the modules in its openings can be swapped and resized.
 * From `memberIds` (a row of uprights, or all the members of a cabinet) the uprights are those standing along z;
 * they are grouped by where they stand along the row (a front and a back upright make one boundary), and each gap
 * between boundaries becomes a bay. Then every position along the row of what lies within the uprights' reach —
 * rails, bearers, the uprights themselves — is tied to the run's datums (an upright face, or a bay's start plus an
 * offset), and each module in an opening goes into its bay (one above another, a stack). `notes` says what was
 * left as it was and why; a row that cannot be a run is refused with the reason.
 */
export function makeRunFromMembers(doc: FrameDocument, memberIds: readonly string[], name?: string): EditOutcome<{ runId: string; notes: string[] }> {
  const layout = layoutOf(doc);
  const { scene } = layout;
  const picked = scene.members.filter((m) => memberIds.includes(m.id));
  const uprights = picked.filter((m) => m.axis === 'z');
  if (uprights.length < 2) return refuse('Pick at least two uprights (members standing upright) to make bays between them.');
  const record = new Map(doc.members.map((m) => [m.id, m]));
  for (const u of uprights) {
    const m = record.get(u.id);
    if (m && [m.place.x, m.place.y].some((p) => p?.datum !== undefined && layout.datums.axes.has(p.datum) && doc.runs.some((r) => p.datum?.startsWith(`${r.id}.`)))) {
      return refuse(`${memberWords(u, m.name)} is already part of a run; its bays can be edited as they are.`);
    }
  }
  // The row runs along the horizontal axis the uprights spread over most.
  const spread = (a: Axis) => {
    const k = AXIS_INDEX[a];
    return Math.max(...uprights.map((u) => u.box.min[k])) - Math.min(...uprights.map((u) => u.box.min[k]));
  };
  const axis: Axis = spread('x') >= spread('y') ? 'x' : 'y';
  const k = AXIS_INDEX[axis];
  const sorted = [...uprights].sort((p, q) => p.box.min[k] - q.box.min[k]);
  const boundaries: Boundary[] = [];
  for (const u of sorted) {
    const last = boundaries[boundaries.length - 1];
    if (last && Math.abs(u.box.min[k] - last.low) <= SAME_MM) last.uprights.push(u);
    else boundaries.push({ low: u.box.min[k], high: u.box.max[k], uprights: [u] });
  }
  if (boundaries.length < 2) return refuse('The uprights all stand at one place along the row; pick uprights on both sides of each opening.');
  const sizes = new Set<number>();
  for (const b of boundaries) for (const u of b.uprights) sizes.add(tidy(u.box.max[k] - u.box.min[k]));
  if (sizes.size > 1) {
    return refuse(`The uprights are not all one size along the row (${[...sizes].sort((p, q) => p - q).join(' mm, ')} mm); a run needs uprights of one size. Change the odd ones’ profile or turn them, then try again.`);
  }
  const t = [...sizes][0];
  for (let i = 1; i < boundaries.length; i++) {
    if (boundaries[i].low < boundaries[i - 1].high + SAME_MM) return refuse('Two of the uprights overlap along the row; move them apart so there is an opening between each pair.');
  }

  const used = usedIds(doc);
  const runId = freshId(used, 'run');
  const bays: Bay[] = boundaries.slice(1).map((b, i) => ({ id: freshId(used, 'bay'), width_mm: tidy(b.low - boundaries[i].high) }));
  const notes: string[] = [];

  // What lies within the uprights' reach is tied to the run.
  const reach = {
    min: [0, 1, 2].map((i) => Math.min(...uprights.map((u) => u.box.min[i])) - SAME_MM),
    max: [0, 1, 2].map((i) => Math.max(...uprights.map((u) => u.box.max[i])) + SAME_MM),
  };
  const within = (b: { min: readonly number[]; max: readonly number[] }) => [0, 1, 2].every((i) => b.min[i] >= reach.min[i] && b.max[i] <= reach.max[i]);
  const opening = (v: number) => boundaries.findIndex((b, j) => j < bays.length && v > b.high + SAME_MM && v < boundaries[j + 1].low - SAME_MM);
  const column = (v: number) => boundaries.findIndex((b) => v >= b.low - SAME_MM && v <= b.high + SAME_MM);

  // Modules in the openings go into their bays, bottom to top.
  const held = new Map<number, { id: string; z: number; zTop: number; lo: number; hi: number }[]>();
  for (const g of scene.modules) {
    if (g.bay !== null) continue;
    if (!within(g.box)) continue;
    const mod = doc.modules.find((m) => m.id === g.id);
    if (!mod) continue;
    const i = opening((g.box.min[k] + g.box.max[k]) / 2);
    if (i < 0) {
      notes.push(`${moduleLabel(mod)} is not in an opening between the uprights; it stands free as before.`);
      continue;
    }
    if (g.box.min[k] < boundaries[i].high - SAME_MM || g.box.max[k] > boundaries[i + 1].low + SAME_MM) {
      notes.push(`${moduleLabel(mod)} is wider than its opening; it stands free as before.`);
      continue;
    }
    const list = held.get(i) ?? [];
    list.push({ id: g.id, z: g.box.min[2], zTop: g.box.max[2], lo: g.box.min[k], hi: g.box.max[k] });
    held.set(i, list);
  }
  /** The bay (left or right of boundary c) whose module a member at heights lo…hi stands beside, if any. */
  const besideModule = (c: number, lo: number, hi: number): 'left' | 'right' | null => {
    const overlaps = (i: number) => (held.get(i) ?? []).some((x) => Math.min(hi, x.zTop) - Math.max(lo, x.z) > SAME_MM);
    if (c < bays.length && overlaps(c)) return 'right';
    if (c > 0 && overlaps(c - 1)) return 'left';
    return null;
  };

  // A position inside an opening follows the nearer edge of its bay; one in an upright's column follows the
  // upright (a rail's end there follows its own bay, so it travels with the bay when bays change places).
  const tie = (v: number, role: 'start' | 'end' | 'across', zLo: number, zHi: number): { datum: string; offset_mm: number } | null => {
    const i = opening(v);
    if (i >= 0) {
      const lo = boundaries[i].high;
      const hi = boundaries[i + 1].low;
      return v - lo <= hi - v ? { datum: `${bays[i].id}.start`, offset_mm: tidy(v - lo) } : { datum: `${bays[i].id}.end`, offset_mm: tidy(v - hi) };
    }
    const c = column(v);
    if (c < 0) return null;
    const b = boundaries[c];
    const atHigh = Math.abs(v - b.high) <= SAME_MM;
    const atLow = Math.abs(v - b.low) <= SAME_MM;
    if (role === 'start' && atHigh && c < bays.length) return { datum: `${bays[c].id}.start`, offset_mm: 0 };
    if (role === 'end' && atLow && c > 0) return { datum: `${bays[c - 1].id}.end`, offset_mm: 0 };
    if (role === 'across') {
      const side = besideModule(c, zLo, zHi);
      if (side === 'right') return { datum: `${bays[c].id}.start`, offset_mm: tidy(v - b.high) };
      if (side === 'left') return { datum: `${bays[c - 1].id}.end`, offset_mm: tidy(v - b.low) };
    }
    if (atHigh && c === bays.length) return { datum: `${runId}.end`, offset_mm: 0 };
    return { datum: `${runId}.u${c}`, offset_mm: tidy(v - b.low) };
  };

  const inRun = new Set(scene.members.filter((m) => within(m.drawn)).map((m) => m.id));
  const boxOf = new Map(scene.members.map((m) => [m.id, m.drawn]));
  let untied = 0;
  let next = rewritePositions(doc, (p, a, owner) => {
    if (a !== axis || owner.kind !== 'member' || !inRun.has(owner.id)) return p;
    const box = boxOf.get(owner.id);
    const m = record.get(owner.id);
    if (!box || !m) return p;
    let v: number;
    let role: 'start' | 'end' | 'across' = 'across';
    if (m.axis === axis) {
      role = p === m.start ? 'start' : 'end';
      v = role === 'start' ? box.min[k] : box.max[k];
    } else v = p.align === 'max' ? box.max[k] : p.align === 'center' ? (box.min[k] + box.max[k]) / 2 : box.min[k];
    const r = m.axis === 'z' ? { datum: `${runId}.u${column(v)}`, offset_mm: tidy(v - (boundaries[column(v)]?.low ?? v)) } : tie(v, role, box.min[2], box.max[2]);
    if (!r || r.datum.endsWith('.u-1')) {
      untied += 1;
      return p;
    }
    const { member: _m, face: _f, datum: _d, offset_mm: _o, ...keep } = p as Position & Record<string, unknown>;
    void _m;
    void _f;
    void _d;
    void _o;
    return { ...keep, ...r } as Position;
  });
  if (untied > 0) notes.push(`${untied} position${untied === 1 ? '' : 's'} outside the openings stay as drawn.`);

  for (const [i, list] of held) {
    list.sort((p, q) => p.z - q.z);
    const room = boundaries[i + 1].low - boundaries[i].high;
    const widest = Math.max(...list.map((x) => moduleSizeAlong(doc.modules.find((m) => m.id === x.id) as never, axis)));
    const [first, ...rest] = list;
    bays[i] = { id: bays[i].id, module: first.id, ...(rest.length > 0 ? { stack: rest.map((x) => x.id) } : {}), clearance_mm: tidy((room - widest) / 2) };
    for (const x of list) {
      const off = tidy((x.lo + x.hi) / 2 - (boundaries[i].high + boundaries[i + 1].low) / 2);
      if (Math.abs(off) > SAME_MM) {
        const mod = doc.modules.find((m) => m.id === x.id);
        if (mod) notes.push(`${moduleLabel(mod)} is now centred in its bay (it moved ${Math.abs(off)} mm).`);
      }
    }
  }
  const run: Run = {
    type: 'run',
    id: runId,
    ...(name ? { name } : {}),
    axis,
    start: { offset_mm: tidy(boundaries[0].low) },
    upright_mm: t,
    clearance_mm: 0,
    bays,
  };
  next = { ...next, runs: [...next.runs, run] };
  const n = bays.length;
  return { ok: true, doc: next, label: `Make ${n} bay${n === 1 ? '' : 's'} from ${uprights.length} uprights`, runId, notes };
}
