import { moduleSizeAlong } from '../engine/resolve-datums';
import type { FrameDocument } from '../model/frame-document';
import type { Member } from '../model/member';
import { moduleLabel, type Module } from '../model/module';
import type { Position } from '../model/position';
import { bayModuleIds, type Bay, type Run } from '../model/run';
import { moduleDatumIds } from '../model/cabinet-run';
import { deleteItems } from './edits';
import { freshId, usedIds } from './ids';
import { layoutOf } from './layout';
import { bayWords, capital, refuse, type EditOutcome } from './outcome';
import { datumsOfMember, renameDatumRefs } from './references';

// Bay edits: a run's bays are its openings; its uprights stand at the boundaries and refer to the run's upright
// datums by number (`run.u2`), its rails and the members that carry modules refer to their bay's datums, which
// travel with the bay. Adding or removing a bay therefore renumbers the boundaries after it and adds or removes
// one boundary's members; reordering bays moves nothing but the bays.

const tidy = (v: number): number => Math.round(v * 1000) / 1000;

function findRun(doc: FrameDocument, runId: string): Run | undefined {
  return doc.runs.find((r) => r.id === runId);
}

/** The run and index of a bay. */
export function findBay(doc: FrameDocument, bayId: string): { run: Run; bay: Bay; index: number } | null {
  for (const run of doc.runs) {
    const index = run.bays.findIndex((b) => b.id === bayId);
    if (index >= 0) return { run, bay: run.bays[index], index };
  }
  return null;
}

/** Where a module is held: its run, bay, index of the bay, and its level in the bay's stack (0 at the bottom). */
export function placeOfModule(doc: FrameDocument, moduleId: string): { run: Run; bay: Bay; index: number; level: number } | null {
  for (const run of doc.runs) {
    for (let index = 0; index < run.bays.length; index++) {
      const level = bayModuleIds(run.bays[index]).indexOf(moduleId);
      if (level >= 0) return { run, bay: run.bays[index], index, level };
    }
  }
  return null;
}

const boundaryRe = (run: Run) => new RegExp(`^${run.id.replace(/[-]/g, '\\-')}\\.u(\\d+)$`);

/** Renumber the run's upright datums: boundary k becomes `to(k)`. */
function renumberBoundaries(doc: FrameDocument, run: Run, to: (k: number) => number): FrameDocument {
  const re = boundaryRe(run);
  return renameDatumRefs(doc, (id) => {
    const m = re.exec(id);
    if (!m) return id;
    const k = Number(m[1]);
    const n = to(k);
    return n === k ? id : `${run.id}.u${n}`;
  });
}

const bayDatum = (bayId: string, which: 'start' | 'mid' | 'end') => `${bayId}.${which}`;
export const refersToBay = (m: Member, bayId: string) => datumsOfMember(m).some((d) => d.startsWith(`${bayId}.`));
const atBoundary = (m: Member, run: Run, k: number) => datumsOfMember(m).includes(`${run.id}.u${k}`);

/** A bay's rails: members along the run from its start to its end that carry no module of their own. */
export function spanningRails(doc: FrameDocument, run: Run, bay: Bay): Member[] {
  const own = new Set(bayModuleIds(bay).flatMap(moduleDatumIds));
  return doc.members.filter(
    (m) =>
      m.axis === run.axis &&
      m.start.datum === bayDatum(bay.id, 'start') &&
      m.end?.datum === bayDatum(bay.id, 'end') &&
      !datumsOfMember(m).some((d) => own.has(d)),
  );
}

/** Copies of members with their datums renamed; references between the copied members follow the copies. */
function cloneMembers(doc: FrameDocument, originals: readonly Member[], datum: (id: string) => string, name: (m: Member) => string | undefined): Member[] {
  const used = usedIds(doc);
  const idMap = new Map<string, string>();
  for (const m of originals) idMap.set(m.id, freshId(used, m.id.replace(/-\d+$/, '')));
  const pos = <P extends Position | undefined>(p: P): P => {
    if (!p) return p;
    let q: Position = p;
    if (p.datum !== undefined && datum(p.datum) !== p.datum) q = { ...q, datum: datum(p.datum) };
    if (p.member !== undefined && idMap.has(p.member)) q = { ...q, member: idMap.get(p.member) };
    return q as P;
  };
  return originals.map((m) => {
    const { mark: _mark, name: _name, ...rest } = m;
    void _mark;
    void _name;
    const c: Member = { ...rest, id: idMap.get(m.id) as string, start: pos(m.start), place: {} };
    if (m.end) c.end = pos(m.end);
    for (const a of ['x', 'y', 'z'] as const) if (m.place[a]) c.place[a] = pos(m.place[a]);
    const n = name(m);
    if (n !== undefined) c.name = n;
    return c;
  });
}

/** "Upright 3, front" / "Bay 2: top rail" names of a cabinet layout, renumbered; other names are kept. */
function renumberName(name: string | undefined, prefix: 'Upright' | 'Cross-member' | 'Bay', n: number): string | undefined {
  if (name === undefined) return undefined;
  const re = new RegExp(`^${prefix} \\d+`);
  return re.test(name) ? name.replace(re, `${prefix} ${n}`) : name;
}

/** Names of the layout's members that say which upright or bay they belong to, brought up to date. */
export function renameByPlace(doc: FrameDocument, run: Run): FrameDocument {
  const re = boundaryRe(run);
  const bayIndex = new Map(run.bays.map((b, i) => [b.id, i]));
  const members = doc.members.map((m) => {
    if (m.name === undefined) return m;
    let name = m.name;
    for (const d of datumsOfMember(m)) {
      const u = re.exec(d);
      if (u) name = renumberName(renumberName(name, 'Upright', Number(u[1]) + 1), 'Cross-member', Number(u[1]) + 1) as string;
      const b = bayIndex.get(d.replace(/\.(start|mid|end)$/, ''));
      if (b !== undefined && /\.(start|mid|end)$/.test(d)) name = renumberName(name, 'Bay', b + 1) as string;
    }
    return name === m.name ? m : { ...m, name };
  });
  return members.some((m, i) => m !== doc.members[i]) ? { ...doc, members } : doc;
}

export type BayWhere = 'end' | { before: string } | { after: string };

/**
 * A new open bay in a run, with the members a neighbouring bay has at a boundary (its uprights and cross-members)
 * and along its opening (its rails), copied to the new boundary and bay. The boundaries after it are renumbered,
 * so the bays beyond move along by the new bay and one upright. `width_mm` defaults to the neighbour's width.
 */
export function addBay(doc: FrameDocument, runId: string, where: BayWhere = 'end', width_mm?: number): EditOutcome<{ bayId: string }> {
  const run = findRun(doc, runId);
  if (!run) return refuse('That run is no longer in the frame.');
  let i = run.bays.length;
  if (where !== 'end') {
    const ref = 'before' in where ? where.before : where.after;
    const k = run.bays.findIndex((b) => b.id === ref);
    if (k < 0) return refuse('That bay is no longer in the run.');
    i = 'before' in where ? k : k + 1;
  }
  if (width_mm !== undefined && !(width_mm > 0 && width_mm <= 10_000)) return refuse('A bay’s width must be more than 0 and at most 10 m.');
  const template = run.bays[i > 0 ? i - 1 : 0];
  const layout = layoutOf(doc);
  const tb = layout.datums.bays.get(template.id);
  const width = tidy(width_mm ?? tb?.width_mm ?? 400);
  const used = usedIds(doc);
  const bayId = freshId(used, 'bay');
  const n = run.bays.length;

  // Old boundary k ≥ i + 1 moves to k + 1; the new boundary i + 1 gets copies of boundary i (or of the last one).
  const from = Math.min(i, n);
  let next = renumberBoundaries(doc, run, (k) => (k >= i + 1 ? k + 1 : k));
  const atFrom = doc.members.filter((m) => atBoundary(m, run, from));
  const newUprights = cloneMembers(next, atFrom, (d) => (d === `${run.id}.u${from}` ? `${run.id}.u${i + 1}` : d), (m) =>
    renumberName(renumberName(m.name, 'Upright', i + 2), 'Cross-member', i + 2),
  );
  next = { ...next, members: [...next.members, ...newUprights] };
  const rails = cloneMembers(
    next,
    spanningRails(doc, run, template),
    (d) => (d.startsWith(`${template.id}.`) ? d.replace(`${template.id}.`, `${bayId}.`) : d),
    (m) => renumberName(m.name, 'Bay', i + 1),
  );
  const bays = run.bays.slice();
  bays.splice(i, 0, { id: bayId, width_mm: width });
  const runs = next.runs.map((r) => (r.id === run.id ? { ...r, bays } : r));
  next = { ...next, members: [...next.members, ...rails], runs };
  next = renameByPlace(next, runs.find((r) => r.id === run.id) as Run);
  return { ok: true, doc: next, label: `Add a bay ${where === 'end' ? 'at the end' : 'before' in where ? `before ${bayWords(run, i)}` : `after ${bayWords(run, i - 1)}`}`, bayId };
}

/**
 * Remove a bay: its rails and the members that carry its modules go, with one boundary's uprights and
 * cross-members; the bays after it close up. Its modules go too, unless `keepModules`, when they stand free where
 * they are. What referred to a removed member is pinned where it is now.
 */
export function removeBay(doc: FrameDocument, bayId: string, opts: { keepModules?: boolean } = {}): EditOutcome<{ removedMembers: string[] }> {
  const where = findBay(doc, bayId);
  if (!where) return refuse('That bay is no longer in the frame.');
  const { run, bay, index: i } = where;
  if (run.bays.length === 1) return refuse(`${capital(bayWords(run, i))} is the only bay of its run, and a run keeps at least one; delete the run’s members instead.`);
  const layout = layoutOf(doc);
  const held = bayModuleIds(bay);
  const own = new Set(held.flatMap(moduleDatumIds));
  const removed = new Set(
    doc.members
      .filter((m) => refersToBay(m, bay.id) || atBoundary(m, run, i + 1) || datumsOfMember(m).some((d) => own.has(d)))
      .map((m) => m.id),
  );
  const modules = new Set(opts.keepModules ? [] : held);
  let next = deleteItems(doc, layout.scene, removed, modules);
  if (opts.keepModules) {
    // Each module keeps its place along the run where the bay put it.
    next = {
      ...next,
      modules: next.modules.map((m) => {
        if (!held.includes(m.id)) return m;
        const g = layout.scene.modules.find((x) => x.id === m.id);
        const k = { x: 0, y: 1, z: 2 }[run.axis];
        return g ? { ...m, place: { ...m.place, [run.axis]: { offset_mm: tidy(g.box.min[k]) } } } : m;
      }),
    };
  }
  const bays = run.bays.filter((b) => b.id !== bay.id);
  next = { ...next, runs: next.runs.map((r) => (r.id === run.id ? { ...r, bays } : r)) };
  next = renumberBoundaries(next, run, (k) => (k > i + 1 ? k - 1 : k));
  // Datums that only carried the removed modules go with them (their size terms would name nothing).
  const stillUsed = new Set<string>();
  for (const m of next.members) for (const d of datumsOfMember(m)) stillUsed.add(d);
  for (const m of next.modules) for (const p of [m.place.x, m.place.y, m.place.z]) if (p?.datum) stillUsed.add(p.datum);
  for (const d of next.datums) if (d.from) stillUsed.add(d.from);
  const gone = new Set(next.datums.filter((d) => own.has(d.id) && !stillUsed.has(d.id)).map((d) => d.id));
  if (gone.size > 0) next = { ...next, datums: next.datums.filter((d) => !gone.has(d.id)) };
  next = renameByPlace(next, next.runs.find((r) => r.id === run.id) as Run);
  const names = held.map((id) => doc.modules.find((m) => m.id === id)).filter((m): m is Module => m !== undefined).map(moduleLabel);
  const label = `Remove ${bayWords(run, i)}${names.length > 0 && !opts.keepModules ? ` with ${names.join(' and ')}` : ''}`;
  return { ok: true, doc: next, label, removedMembers: [...removed] };
}

/** Put a bay at another place in its run; the bays between close up and the uprights move to the new boundaries. */
export function moveBay(doc: FrameDocument, bayId: string, toIndex: number): EditOutcome {
  const where = findBay(doc, bayId);
  if (!where) return refuse('That bay is no longer in the frame.');
  const { run, bay, index } = where;
  const to = Math.max(0, Math.min(run.bays.length - 1, Math.round(toIndex)));
  if (to === index) return { ok: true, doc, label: 'Move bay' };
  const bays = run.bays.slice();
  bays.splice(index, 1);
  bays.splice(to, 0, bay);
  const moved = { ...run, bays };
  return {
    ok: true,
    doc: renameByPlace({ ...doc, runs: doc.runs.map((r) => (r.id === run.id ? moved : r)) }, moved),
    label: `Move ${bayWords(run, index)} to place ${to + 1}`,
  };
}

/**
 * Give a bay a fixed width, or with null let it follow its module (its width plus the clearance either side).
 * A width too narrow for what the bay holds is refused.
 */
export function setBayWidth(doc: FrameDocument, bayId: string, width_mm: number | null): EditOutcome {
  const where = findBay(doc, bayId);
  if (!where) return refuse('That bay is no longer in the frame.');
  const { run, bay, index } = where;
  const held = bayModuleIds(bay).map((id) => doc.modules.find((m) => m.id === id)).filter((m): m is Module => m !== undefined);
  if (width_mm === null) {
    if (held.length === 0) return refuse(`${capital(bayWords(run, index))} is open, with no module to follow: give it a width.`);
    const { width_mm: _w, ...rest } = bay;
    void _w;
    return { ok: true, doc: replaceBay(doc, run, rest), label: `Let ${bayWords(run, index)} follow ${moduleLabel(held[0])}` };
  }
  if (!(width_mm > 0 && width_mm <= 10_000)) return refuse('A bay’s width must be more than 0 and at most 10 m.');
  const clearance = bay.clearance_mm ?? run.clearance_mm;
  for (const m of held) {
    const need = moduleSizeAlong(m, run.axis) + 2 * clearance;
    if (width_mm + 1e-6 < need) {
      return refuse(`${capital(moduleLabel(m))} needs ${tidy(need)} mm (its ${tidy(moduleSizeAlong(m, run.axis))} mm and ${tidy(clearance)} mm clearance each side); a bay of ${tidy(width_mm)} mm cannot hold it. Make the bay wider or the module narrower.`);
    }
  }
  return { ok: true, doc: replaceBay(doc, run, { ...bay, width_mm: tidy(width_mm) }), label: `Make ${bayWords(run, index)} ${tidy(width_mm)} mm wide` };
}

function replaceBay(doc: FrameDocument, run: Run, bay: Bay): FrameDocument {
  return { ...doc, runs: doc.runs.map((r) => (r.id === run.id ? { ...r, bays: r.bays.map((b) => (b.id === bay.id ? bay : b)) } : r)) };
}

/** Bay records with a module taken out: an emptied bay keeps its width so nothing else moves. */
function withoutModule(bay: Bay, moduleId: string, width_mm: number): Bay {
  if (bay.module === moduleId) {
    const { module: _m, ...rest } = bay;
    void _m;
    const stack = rest.stack ?? [];
    return { ...rest, width_mm: bay.width_mm ?? tidy(width_mm), ...(stack.length > 0 ? { stack } : {}) };
  }
  const stack = (bay.stack ?? []).filter((id) => id !== moduleId);
  const { stack: _s, ...rest } = bay;
  void _s;
  return { ...rest, width_mm: bay.width_mm ?? tidy(width_mm), ...(stack.length > 0 ? { stack } : {}) };
}

/**
 * The members that carry a module in its bay: those a cabinet layout made for it (at its own height datums) and
 * the members beside or under it that refer to its bay but do not span the whole opening (bearers, slide rails,
 * hangers). The bay's own rails stay with the bay.
 */
export function carryingMembers(doc: FrameDocument, moduleId: string): Member[] {
  const place = placeOfModule(doc, moduleId);
  if (!place) return [];
  const own = new Set(moduleDatumIds(moduleId));
  const rails = new Set(spanningRails(doc, place.run, place.bay).map((m) => m.id));
  const alone = bayModuleIds(place.bay).length === 1;
  return doc.members.filter((m) => {
    const ds = datumsOfMember(m);
    if (ds.some((d) => own.has(d))) return true;
    if (!alone || rails.has(m.id) || !refersToBay(m, place.bay.id)) return false;
    // A member across the run (a bearer, a slide rail) placed from the bay's edges.
    return m.axis !== place.run.axis && ds.every((d) => !/\.u\d+$/.test(d));
  });
}

/**
 * Move a module into an open bay (of the same run or another). The members that carry it go with it, so it sits
 * in the new bay as it sat in the old one; its old bay stays open at its width. A module that stands free goes in
 * as it is (it then bears on what it finds in the bay).
 */
export function moveModuleToBay(doc: FrameDocument, moduleId: string, bayId: string): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  const target = findBay(doc, bayId);
  if (!target) return refuse('That bay is no longer in the frame.');
  const name = moduleLabel(mod);
  const heldThere = bayModuleIds(target.bay);
  if (heldThere.includes(moduleId)) return { ok: true, doc, label: `Move ${name}` };
  if (heldThere.length > 0) {
    const other = doc.modules.find((m) => m.id === heldThere[0]);
    return refuse(`${capital(bayWords(target.run, target.index))} already holds ${other ? moduleLabel(other) : 'a module'}: swap the two instead, or move that one out first.`);
  }
  const from = placeOfModule(doc, moduleId);
  if (from && bayModuleIds(from.bay).length > 1) {
    return refuse(`${capital(name)} is stacked with other modules in ${bayWords(from.run, from.index)}; the rails that carry it hang on theirs. Move it out of the run first, then into the open bay.`);
  }
  const layout = layoutOf(doc);
  let next = doc;
  if (from) {
    const carriers = new Set(carryingMembers(doc, moduleId).map((m) => m.id));
    const old = from.bay.id;
    next = {
      ...next,
      members: next.members.map((m) => {
        if (!carriers.has(m.id)) return m;
        const re = (p: Position | undefined) => (p?.datum?.startsWith(`${old}.`) ? { ...p, datum: p.datum.replace(`${old}.`, `${bayId}.`) } : p);
        const c: Member = { ...m, start: re(m.start) as Member['start'], place: { ...m.place } };
        if (m.end) c.end = re(m.end) as Member['start'];
        for (const a of ['x', 'y', 'z'] as const) if (m.place[a]) c.place[a] = re(m.place[a]);
        return c;
      }),
    };
    // Datums that place its members from the old bay's middle move to the new bay too.
    const mine = new Set(moduleDatumIds(moduleId));
    next = { ...next, datums: next.datums.map((d) => (mine.has(d.id) && d.from?.startsWith(`${old}.`) ? { ...d, from: d.from.replace(`${old}.`, `${bayId}.`) } : d)) };
    const width = layout.datums.bays.get(old)?.width_mm ?? 100;
    next = { ...next, runs: next.runs.map((r) => (r.id === from.run.id ? { ...r, bays: r.bays.map((b) => (b.id === old ? withoutModule(b, moduleId, width) : b)) } : r)) };
  }
  next = {
    ...next,
    runs: next.runs.map((r) =>
      r.id !== target.run.id
        ? r
        : {
            ...r,
            bays: r.bays.map((b) => {
              if (b.id !== bayId) return b;
              const { width_mm: _w, ...rest } = b;
              void _w;
              return { ...rest, module: moduleId };
            }),
          },
    ),
  };
  return { ok: true, doc: next, label: `Move ${name} into ${bayWords(target.run, target.index)}` };
}

/**
 * Take a module out of its run: it stands free where it is now (its members stay in the bay, which keeps its
 * width, so it still bears on them until it is moved).
 */
export function moveModuleOutOfRun(doc: FrameDocument, moduleId: string): EditOutcome {
  const mod = doc.modules.find((m) => m.id === moduleId);
  if (!mod) return refuse('That module is no longer in the frame.');
  const from = placeOfModule(doc, moduleId);
  if (!from) return refuse(`${capital(moduleLabel(mod))} already stands free, in no bay.`);
  const layout = layoutOf(doc);
  const g = layout.scene.modules.find((m) => m.id === moduleId);
  const k = { x: 0, y: 1, z: 2 }[from.run.axis];
  const width = layout.datums.bays.get(from.bay.id)?.width_mm ?? 100;
  const bay = withoutModule(from.bay, moduleId, width);
  const modules = doc.modules.map((m) => (m.id === moduleId && g ? { ...m, place: { ...m.place, [from.run.axis]: { offset_mm: tidy(g.box.min[k]) } } } : m));
  return {
    ok: true,
    doc: { ...doc, modules, runs: doc.runs.map((r) => (r.id === from.run.id ? { ...r, bays: r.bays.map((b) => (b.id === bay.id ? bay : b)) } : r)) },
    label: `Take ${moduleLabel(mod)} out of ${bayWords(from.run, from.index)}`,
  };
}
