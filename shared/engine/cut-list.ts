import type { MemberLength } from './lengths';
import type { MachiningOp } from './machining';
import { assignMarks, type MarkHint } from './part-marks';
import type { MemberGeometry } from './resolve-members';

export type CutGroup = {
  mark: string;
  profile: string;
  /** Members in document order; the first is the pattern for the machining list. */
  members: number[];
  cut_length_mm: number;
  length_mm: number;
  tolerance_mm: number | null;
  ops: MachiningOp[];
};

const tenth = (v: number) => Math.round(v * 10);

/**
 * The machining as a part carries it, the same whichever way round it is picked up: compared both ways and the
 * smaller signature kept, so a rail tapped at its left end and one tapped at its right end are one part.
 */
function opsSignature(ops: readonly MachiningOp[], length: number): string {
  const forward: string[] = [];
  const reverse: string[] = [];
  for (const op of ops) {
    if (op.kind === 'end-tap') {
      forward.push(`tap:${op.end}:${op.thread}:${op.depth_mm}`);
      reverse.push(`tap:${op.end === 'start' ? 'end' : 'start'}:${op.thread}:${op.depth_mm}`);
    } else {
      forward.push(`hole:${tenth(op.at_mm)}:${op.diameter_mm}`);
      reverse.push(`hole:${tenth(length - op.at_mm)}:${op.diameter_mm}`);
    }
  }
  const f = forward.sort().join(',');
  const r = reverse.sort().join(',');
  return f < r ? f : r;
}

/**
 * Identical parts grouped (same profile, same cut length to 0.1 mm, same machining) and marked; the list in saw
 * order: by profile, longest first.
 */
export function cutList(
  members: readonly MemberGeometry[],
  lengths: readonly MemberLength[],
  ops: readonly MachiningOp[][],
  hints: ReadonlyMap<string, MarkHint>,
): { groups: CutGroup[]; markOf: string[] } {
  const byKey = new Map<string, number[]>();
  members.forEach((m, i) => {
    const key = `${m.member.profile}|${tenth(lengths[i].cut_length_mm)}|${opsSignature(ops[i], lengths[i].length_mm)}`;
    const list = byKey.get(key);
    if (list) list.push(i);
    else byKey.set(key, [i]);
  });
  // Map iteration follows first insertion, i.e. each group's first member in document order.
  const lists = [...byKey.values()];
  const marks = assignMarks(
    lists.map((l) => ({ members: l.map((i) => members[i].member.id), cut_length_mm: lengths[l[0]].cut_length_mm })),
    hints,
  );
  const markOf: string[] = members.map(() => '');
  const groups = lists.map((l, k): CutGroup => {
    for (const i of l) markOf[i] = marks[k];
    const first = l[0];
    return {
      mark: marks[k],
      profile: members[first].member.profile,
      members: l,
      cut_length_mm: lengths[first].cut_length_mm,
      length_mm: lengths[first].length_mm,
      tolerance_mm: lengths[first].tolerance_mm,
      ops: ops[first],
    };
  });
  groups.sort((p, q) => (p.profile < q.profile ? -1 : p.profile > q.profile ? 1 : q.cut_length_mm - p.cut_length_mm || (p.mark.length - q.mark.length || (p.mark < q.mark ? -1 : 1))));
  return { groups, markOf };
}
