import type { FrameDocument } from '../model/frame-document';

/** A, B, … Z, AA, AB, … (bijective base 26). */
export function markName(k: number): string {
  let s = '';
  let n = k + 1;
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** What a member was marked before: pinned in the document, or carried from the previous report. */
export type MarkHint = { mark: string; pinned: boolean; cut_length_mm?: number };

export type MarkGroup = { members: readonly string[]; cut_length_mm: number };

/**
 * Part marks for groups of identical parts, kept stable across re-lays. Each group takes the mark most of its
 * members had (pinned marks outvote carried ones); when a group splits, the part that kept its length keeps the
 * mark and the other gets a new one. Groups with no history get the next unused marks in order (groups arrive
 * ordered by their first member in the document, so adding a member late does not shift earlier marks). A mark
 * that was ever given out in the hints is not reused for a different part.
 */
export function assignMarks(groups: readonly MarkGroup[], hints: ReadonlyMap<string, MarkHint>): string[] {
  type Candidate = { group: number; mark: string; votes: number; sameLength: number };
  const candidates: Candidate[] = [];
  const hinted = new Set<string>();
  groups.forEach((g, group) => {
    const tally = new Map<string, Candidate>();
    for (const id of g.members) {
      const h = hints.get(id);
      if (!h) continue;
      hinted.add(h.mark);
      const c = tally.get(h.mark) ?? { group, mark: h.mark, votes: 0, sameLength: 0 };
      c.votes += h.pinned ? 1_000_000 : 1;
      if (h.cut_length_mm !== undefined && Math.abs(h.cut_length_mm - g.cut_length_mm) < 0.05) c.sameLength += 1;
      tally.set(h.mark, c);
    }
    candidates.push(...tally.values());
  });
  candidates.sort((p, q) => q.votes - p.votes || q.sameLength - p.sameLength || p.group - q.group || (p.mark < q.mark ? -1 : 1));
  const marks: (string | null)[] = groups.map(() => null);
  const used = new Set<string>();
  for (const c of candidates) {
    if (marks[c.group] !== null || used.has(c.mark)) continue;
    marks[c.group] = c.mark;
    used.add(c.mark);
  }
  let next = 0;
  return marks.map((m) => {
    if (m !== null) return m;
    while (used.has(markName(next)) || hinted.has(markName(next))) next += 1;
    const fresh = markName(next);
    used.add(fresh);
    return fresh;
  });
}

/**
 * The document with every member's current part mark pinned (`member.mark`), e.g. once parts are cut and
 * labelled, so that any later report (the server's printed lists included, which have no previous report to carry
 * marks from) gives the same parts the same marks.
 */
export function pinMarks(doc: FrameDocument, report: { members: ReadonlyArray<{ id: string; mark: string }> }): FrameDocument {
  const marks = new Map(report.members.map((m) => [m.id, m.mark]));
  return { ...doc, members: doc.members.map((m) => (marks.has(m.id) ? { ...m, mark: marks.get(m.id) } : m)) };
}
