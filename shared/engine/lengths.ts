import type { FrameDocument } from '../model/frame-document';
import { ai, tidy } from './box';
import { END_NAMES, type JointsResult } from './joints';
import type { MemberGeometry } from './resolve-members';
import { iso2768Tolerance } from './tolerance';

export type MemberLength = {
  /** Between the faces the member meets (or its free ends): the finished length. */
  length_mm: number;
  allowance_start_mm: number;
  allowance_end_mm: number;
  /** Finished length plus the machining allowance at each end: what the saw cuts. */
  cut_length_mm: number;
  /** ± on the finished length by the frame's ISO 2768-1 class; null outside the table. */
  tolerance_mm: number | null;
};

/**
 * Cut lengths. A butting end is cut to the face it meets (the joints step already moved it there), plus the
 * frame's machining allowance unless the end sets its own; free and through ends get no allowance unless set.
 */
export function memberLengths(
  doc: Pick<FrameDocument, 'settings'>,
  members: readonly MemberGeometry[],
  joints: Pick<JointsResult, 'effective' | 'ends'>,
): MemberLength[] {
  return members.map((m, i) => {
    const a = ai(m.axis);
    const length = tidy(joints.effective[i].max[a] - joints.effective[i].min[a]);
    const [start, end] = END_NAMES.map((name, k) => {
      const own = m.member[name]?.allowance_mm;
      if (own !== undefined) return own;
      return joints.ends[i][k].role === 'butts' ? doc.settings.machiningAllowance_mm : 0;
    });
    return {
      length_mm: length,
      allowance_start_mm: start,
      allowance_end_mm: end,
      cut_length_mm: tidy(length + start + end),
      tolerance_mm: iso2768Tolerance(length, doc.settings.toleranceClass),
    };
  });
}
