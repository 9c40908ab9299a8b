import { resolveProfile } from '../catalog/profiles';
import { InputError } from '../errors';
import type { Axis } from './axis';
import type { FrameDocument } from './frame-document';
import { BUILT_IN_JOIN_METHODS } from './join-method';
import type { Position } from './position';
import { runDatumIds } from './run';

/** `members[3].start.datum` from ['members', 3, 'start', 'datum']. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const p of path) {
    if (typeof p === 'number') out += `[${p}]`;
    else out += out === '' ? String(p) : `.${String(p)}`;
  }
  return out || 'document';
}

const fail = (path: readonly PropertyKey[], message: string): never => {
  const field = fieldPath(path);
  throw new InputError(field, `${field}: ${message}`);
};

function uniqueIds(items: readonly { id: string }[], path: string, seen = new Map<string, string>()): Map<string, string> {
  items.forEach((item, i) => {
    const where = `${path}[${i}]`;
    const before = seen.get(item.id);
    if (before !== undefined) fail([path, i, 'id'], `"${item.id}" is already used by ${before}`);
    seen.set(item.id, where);
  });
  return seen;
}

/** Every datum id in the document (the user's and those runs generate) with its axis. */
export function datumAxes(doc: Pick<FrameDocument, 'datums' | 'runs'>): Map<string, Axis> {
  const axes = new Map<string, Axis>();
  for (const d of doc.datums) axes.set(d.id, d.axis);
  for (const r of doc.runs) for (const id of runDatumIds(r)) axes.set(id, r.axis);
  return axes;
}

/** The profile ids members may name: the document's own records, then the catalogue and plain sections. */
export function checkProfileId(doc: Pick<FrameDocument, 'profiles'>, id: string, path: readonly PropertyKey[]): void {
  if (doc.profiles.some((p) => p.id === id)) return;
  try {
    resolveProfile(id);
  } catch (e) {
    fail(path, e instanceof Error ? e.message.replace(/^profile: /, '') : String(e));
  }
}

/**
 * Check that every reference in a (schema-valid) document points at something that exists and fits: ids unique,
 * datums on the right axis, members and modules named where they are used. Throws InputError naming the field.
 * Cycles are found when resolving (engine/resolve-datums.ts, engine/resolve-members.ts).
 */
export function checkReferences(doc: FrameDocument): void {
  uniqueIds(doc.datums, 'datums');
  const memberIds = uniqueIds(doc.members, 'members');
  const moduleIds = uniqueIds(doc.modules, 'modules');
  uniqueIds(doc.joinMethods, 'joinMethods');
  uniqueIds(doc.profiles, 'profiles');
  const runNames = uniqueIds(doc.runs, 'runs');
  const bayIds = new Map<string, string>(runNames);
  doc.runs.forEach((r, i) => uniqueIds(r.bays, `runs[${i}].bays`, bayIds));

  const axes = datumAxes(doc);
  const methods = new Set<string>([...BUILT_IN_JOIN_METHODS, ...doc.joinMethods.map((m) => m.id)]);
  if (!methods.has(doc.settings.defaultJoin)) fail(['settings', 'defaultJoin'], `"${doc.settings.defaultJoin}" is not a join method`);

  const datum = (id: string | undefined, axis: Axis, path: PropertyKey[]) => {
    if (id === undefined) return;
    const a = axes.get(id);
    if (a === undefined) fail(path, `no datum "${id}"`);
    if (a !== axis) fail(path, `datum "${id}" is on the ${a} axis, not ${axis}`);
  };
  const position = (p: Position | undefined, axis: Axis, path: PropertyKey[], self?: string) => {
    if (!p) return;
    datum(p.datum, axis, [...path, 'datum']);
    if (p.member !== undefined) {
      if (!memberIds.has(p.member)) fail([...path, 'member'], `no member "${p.member}"`);
      if (p.member === self) fail([...path, 'member'], 'a member cannot be placed against itself');
    }
  };

  doc.datums.forEach((d, i) => {
    datum(d.from, d.axis, ['datums', i, 'from']);
    d.plus.forEach((t, j) => {
      if (!moduleIds.has(t.module)) fail(['datums', i, 'plus', j, 'module'], `no module "${t.module}"`);
    });
  });

  const bayOf = new Map<string, string>();
  doc.runs.forEach((r, i) => {
    if (r.start.member !== undefined) fail(['runs', i, 'start', 'member'], 'a run starts from a datum, not a member face');
    datum(r.start.datum, r.axis, ['runs', i, 'start', 'datum']);
    r.bays.forEach((b, j) => {
      const held: [string, PropertyKey[]][] = [];
      if (b.module !== undefined) held.push([b.module, ['runs', i, 'bays', j, 'module']]);
      b.stack?.forEach((id, k) => held.push([id, ['runs', i, 'bays', j, 'stack', k]]));
      for (const [id, path] of held) {
        if (!moduleIds.has(id)) fail(path, `no module "${id}"`);
        const other = bayOf.get(id);
        if (other) fail(path, `module "${id}" is already in bay "${other}"`);
        bayOf.set(id, b.id);
      }
    });
  });

  const knownProfiles = new Set<string>();
  doc.members.forEach((m, i) => {
    if (!knownProfiles.has(m.profile)) {
      checkProfileId(doc, m.profile, ['members', i, 'profile']);
      knownProfiles.add(m.profile);
    }
    for (const end of ['start', 'end'] as const) {
      const e = m[end];
      if (!e) continue;
      position(e, m.axis, ['members', i, end], m.id);
      if (e.join !== undefined && !methods.has(e.join)) fail(['members', i, end, 'join'], `"${e.join}" is not a join method`);
    }
    for (const a of ['x', 'y', 'z'] as const) position(m.place[a], a, ['members', i, 'place', a], m.id);
  });

  doc.modules.forEach((m, i) => {
    for (const a of ['x', 'y', 'z'] as const) position(m.place[a], a, ['modules', i, 'place', a]);
    m.bearsOn?.forEach((id, j) => {
      if (!memberIds.has(id)) fail(['modules', i, 'bearsOn', j], `no member "${id}"`);
    });
  });

  const pairs = new Set<string>();
  doc.joints.forEach((j, i) => {
    j.members.forEach((id, k) => {
      if (!memberIds.has(id)) fail(['joints', i, 'members', k], `no member "${id}"`);
    });
    const key = [...j.members].sort().join('|');
    if (pairs.has(key)) fail(['joints', i, 'members'], 'these two members already have a joint record');
    pairs.add(key);
  });

  doc.profiles.forEach((p, i) => {
    const base = p.base ?? p.id;
    if (p.base !== undefined && doc.profiles.some((q) => q.id === p.base)) fail(['profiles', i, 'base'], 'must be a catalogue profile or a plain section');
    try {
      resolveProfile(base);
    } catch (e) {
      fail(['profiles', i, p.base === undefined ? 'id' : 'base'], e instanceof Error ? e.message.replace(/^profile: /, '') : String(e));
    }
  });
}
