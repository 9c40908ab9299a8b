import type { Datum } from '../model/datum';
import type { FrameDocument } from '../model/frame-document';
import type { JoinMethod } from '../model/join-method';
import type { Member } from '../model/member';
import type { Module } from '../model/module';
import type { ProfileOverride } from '../model/profile-override';
import type { Run } from '../model/run';

/** The document's lists of records that carry an `id`. */
export type RecordMap = {
  members: Member;
  modules: Module;
  runs: Run;
  datums: Datum;
  profiles: ProfileOverride;
  joinMethods: JoinMethod;
};
export type RecordCollection = keyof RecordMap;
export const RECORD_COLLECTIONS: readonly RecordCollection[] = ['members', 'modules', 'runs', 'datums', 'profiles', 'joinMethods'];

/** Document fields that are replaced whole (they have no ids of their own). */
export type FieldKey = 'name' | 'settings' | 'units' | 'joints' | 'goods';
export const FIELD_KEYS: readonly FieldKey[] = ['name', 'settings', 'units', 'joints', 'goods'];

type RecordOpOf<C extends RecordCollection> = {
  kind: 'record';
  collection: C;
  id: string;
  /** null: the record is created by this op. */
  before: RecordMap[C] | null;
  /** null: the record is deleted by this op. */
  after: RecordMap[C] | null;
  /** Where the record stands in its list (before the op for a deletion, after it for a creation). */
  index: number;
};
export type RecordOp = { [C in RecordCollection]: RecordOpOf<C> }[RecordCollection];

type FieldOpOf<K extends FieldKey> = { kind: 'field'; key: K; before: FrameDocument[K]; after: FrameDocument[K] };
export type FieldOp = { [K in FieldKey]: FieldOpOf<K> }[FieldKey];

export type Op = RecordOp | FieldOp;

/**
 * One edit as data: what each touched record or field was and became. Undo applies the inverse; history keeps
 * these, never whole documents. `label` is what the undo button and the history say ("Move 3 members").
 */
export type Change = { label: string; ops: Op[] };

export const isEmptyChange = (c: Change): boolean => c.ops.length === 0;

function applyRecordOp(list: readonly { id: string }[], op: RecordOp): { id: string }[] {
  const out = list.slice();
  const at = out.findIndex((r) => r.id === op.id);
  if (op.after === null) {
    if (at >= 0) out.splice(at, 1);
    return out;
  }
  if (at >= 0) out[at] = op.after;
  else out.splice(Math.min(Math.max(op.index, 0), out.length), 0, op.after);
  return out;
}

/**
 * The document after `change`. Lists and records the change does not touch are shared with the input (nothing is
 * mutated), so a redraw can tell what moved by identity.
 */
export function applyChange(doc: FrameDocument, change: Change): FrameDocument {
  if (change.ops.length === 0) return doc;
  const next: FrameDocument = { ...doc };
  const lists = next as unknown as Record<RecordCollection, { id: string }[]>;
  const fields = next as unknown as Record<FieldKey, unknown>;
  for (const op of change.ops) {
    if (op.kind === 'record') lists[op.collection] = applyRecordOp(lists[op.collection], op);
    else fields[op.key] = op.after;
  }
  return next;
}

/** The change that undoes `change`. */
export function invertChange(change: Change): Change {
  const ops = change.ops
    .slice()
    .reverse()
    .map((op): Op => ({ ...op, before: op.after, after: op.before }) as Op);
  return { label: change.label, ops };
}

const opKey = (op: Op): string => (op.kind === 'record' ? `${op.collection}/${op.id}` : `field/${op.key}`);

/**
 * `first` then `second` as one change (a drag made of many small moves becomes one undo step). Each record keeps
 * its state before `first` and after `second`; a record created and then deleted disappears from the change.
 */
export function mergeChanges(first: Change, second: Change, label = second.label): Change {
  const ops = first.ops.slice();
  const where = new Map<string, number>();
  ops.forEach((op, i) => where.set(opKey(op), i));
  for (const op of second.ops) {
    const i = where.get(opKey(op));
    if (i === undefined) {
      where.set(opKey(op), ops.length);
      ops.push(op);
    } else {
      const prev = ops[i];
      ops[i] = { ...prev, after: op.after, index: op.kind === 'record' && op.after !== null ? op.index : (prev as RecordOp).index } as Op;
    }
  }
  return { label, ops: ops.filter((op) => !(op.before === null && op.after === null) && op.before !== op.after) };
}

/**
 * The change that turns `before` into `after`, found by comparing records by identity (edits replace a record,
 * they never mutate it). Edit functions work document → document; this turns their result into a Change.
 */
export function diffDocuments(before: FrameDocument, after: FrameDocument, label: string): Change {
  const ops: Op[] = [];
  for (const collection of RECORD_COLLECTIONS) {
    const a = before[collection] as readonly { id: string }[];
    const b = after[collection] as readonly { id: string }[];
    if (a === b) continue;
    const old = new Map(a.map((r, i) => [r.id, { r, i }]));
    const now = new Map(b.map((r, i) => [r.id, { r, i }]));
    a.forEach((r, i) => {
      if (!now.has(r.id)) ops.push({ kind: 'record', collection, id: r.id, before: r, after: null, index: i } as RecordOp);
    });
    b.forEach((r, i) => {
      const was = old.get(r.id);
      if (!was) ops.push({ kind: 'record', collection, id: r.id, before: null, after: r, index: i } as RecordOp);
      else if (was.r !== r) ops.push({ kind: 'record', collection, id: r.id, before: was.r, after: r, index: i } as RecordOp);
    });
  }
  for (const key of FIELD_KEYS) {
    if (before[key] !== after[key]) ops.push({ kind: 'field', key, before: before[key], after: after[key] } as FieldOp);
  }
  // Deletions first, highest index first, so that undoing (which runs the ops backwards) re-inserts in order.
  const deletions = ops.filter((op) => op.kind === 'record' && op.after === null).sort((p, q) => (q as RecordOp).index - (p as RecordOp).index);
  const rest = ops.filter((op) => !(op.kind === 'record' && op.after === null));
  return { label, ops: [...deletions, ...rest] };
}

/** Ids of the members and modules a change touches (to keep a selection valid, to say what moved). */
export function touchedIds(change: Change): { members: Set<string>; modules: Set<string> } {
  const members = new Set<string>();
  const modules = new Set<string>();
  for (const op of change.ops) {
    if (op.kind !== 'record') continue;
    if (op.collection === 'members') members.add(op.id);
    if (op.collection === 'modules') modules.add(op.id);
  }
  return { members, modules };
}
