import { AXES, type Axis } from '../model/axis';
import type { FrameDocument } from '../model/frame-document';
import type { Member } from '../model/member';
import type { Module } from '../model/module';
import type { Position } from '../model/position';

/** A rewrite of one position: return it unchanged (the same object) to leave the record alone. */
export type PositionRewrite = (p: Position, axis: Axis, owner: { kind: 'member' | 'module'; id: string }) => Position;

function rewriteMember(m: Member, f: PositionRewrite): Member {
  const who = { kind: 'member' as const, id: m.id };
  let changed = false;
  const next: Member = { ...m, place: { ...m.place } };
  for (const end of ['start', 'end'] as const) {
    const e = m[end];
    if (!e) continue;
    const r = f(e, m.axis, who);
    if (r !== e) {
      next[end] = r as Member['start'];
      changed = true;
    }
  }
  for (const a of AXES) {
    const p = m.place[a];
    if (!p) continue;
    const r = f(p, a, who);
    if (r !== p) {
      next.place[a] = r;
      changed = true;
    }
  }
  return changed ? next : m;
}

function rewriteModule(m: Module, f: PositionRewrite): Module {
  const who = { kind: 'module' as const, id: m.id };
  let place: Module['place'] | null = null;
  for (const a of AXES) {
    const p = m.place[a];
    if (!p) continue;
    const r = f(p, a, who);
    if (r !== p) place = { ...(place ?? m.place), [a]: r };
  }
  return place ? { ...m, place } : m;
}

/** Every member and module position through `f`; records `f` leaves alone stay the same objects. */
export function rewritePositions(doc: FrameDocument, f: PositionRewrite): FrameDocument {
  const members = doc.members.map((m) => rewriteMember(m, f));
  const modules = doc.modules.map((m) => rewriteModule(m, f));
  const same = <T>(a: readonly T[], b: readonly T[]) => a.every((x, i) => x === b[i]);
  return {
    ...doc,
    members: same(members, doc.members) ? doc.members : members,
    modules: same(modules, doc.modules) ? doc.modules : modules,
  };
}

/**
 * Rename datum references everywhere they are used (positions, datums built on others, runs' starts). `map`
 * returns the id unchanged for the ones to keep.
 */
export function renameDatumRefs(doc: FrameDocument, map: (id: string) => string): FrameDocument {
  const out = rewritePositions(doc, (p) => {
    if (p.datum === undefined) return p;
    const to = map(p.datum);
    return to === p.datum ? p : { ...p, datum: to };
  });
  const datums = doc.datums.map((d) => {
    if (d.from === undefined) return d;
    const to = map(d.from);
    return to === d.from ? d : { ...d, from: to };
  });
  const runs = doc.runs.map((r) => {
    if (r.start.datum === undefined) return r;
    const to = map(r.start.datum);
    return to === r.start.datum ? r : { ...r, start: { ...r.start, datum: to } };
  });
  return {
    ...out,
    datums: datums.some((d, i) => d !== doc.datums[i]) ? datums : doc.datums,
    runs: runs.some((r, i) => r !== doc.runs[i]) ? runs : doc.runs,
  };
}

/** The datum ids a member's positions name. */
export function datumsOfMember(m: Member): string[] {
  const ids: string[] = [];
  for (const p of [m.start, m.end, m.place.x, m.place.y, m.place.z]) if (p?.datum !== undefined) ids.push(p.datum);
  return ids;
}
