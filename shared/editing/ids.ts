import type { FrameDocument } from '../model/frame-document';

/** Every id in use in the document (records, bays), since positions and joints refer to them by id alone. */
export function usedIds(doc: FrameDocument): Set<string> {
  const ids = new Set<string>();
  for (const list of [doc.members, doc.modules, doc.runs, doc.datums, doc.joinMethods]) for (const r of list) ids.add(r.id);
  for (const r of doc.runs) for (const b of r.bays) ids.add(b.id);
  return ids;
}

/** `prefix-n` for the smallest n not yet used; the new id is added to `used`. */
export function freshId(used: Set<string>, prefix: string): string {
  const base = prefix.replace(/[^A-Za-z0-9_-]/g, '-').replace(/^[^A-Za-z0-9]+/, '') || 'item';
  for (let n = 1; ; n++) {
    const id = `${base}-${n}`;
    if (!used.has(id)) {
      used.add(id);
      return id;
    }
  }
}
