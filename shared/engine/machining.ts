import type { Fastener } from '../catalog/profiles';
import { ai, tidy } from './box';
import { accessHoleDiameter, endTapFor } from './fastening';
import { faceName, otherAxis, type FaceName } from './faces';
import type { Joint, JointsResult, EndName } from './joints';
import type { MethodDef } from './join-methods';
import { fastenerOf } from './profile-table';
import type { MemberGeometry } from './resolve-members';

export type MachiningOp =
  | { kind: 'end-tap'; end: EndName; thread: Fastener; tap_drill_mm: number; depth_mm: number; joint_id: string }
  | {
      kind: 'access-hole';
      /** From the member's start face (finished length), to the hole's centre. */
      at_mm: number;
      face: FaceName;
      diameter_mm: number;
      /** The member whose end connector it reaches. */
      for_member_id: string;
      joint_id: string;
    };

/**
 * Machining after the saw: an end tap in each butting end joined by a method that needs one, and an access hole
 * in the member it butts against, on a face beside the butted one (front, left or bottom first, where it shows
 * least), at the butting member's centre line.
 */
export function machiningOps(
  members: readonly MemberGeometry[],
  joints: Pick<JointsResult, 'joints' | 'effective'>,
  methods: ReadonlyMap<string, MethodDef>,
): MachiningOp[][] {
  const ops: MachiningOp[][] = members.map(() => []);
  const visit = (j: Joint) => {
    if (j.through === null) return;
    const b = members[j.butting];
    const t = members[j.through];
    const recipe = methods.get(j.method)?.recipe(b.info, t.info);
    if (!recipe) return;
    const f = fastenerOf(b.info);
    if (recipe.endTap) ops[b.index].push({ kind: 'end-tap', end: j.buttingEnd, ...endTapFor(f), joint_id: j.id });
    if (recipe.accessHole) {
      const ta = ai(t.axis);
      ops[t.index].push({
        kind: 'access-hole',
        at_mm: tidy(j.at[t.axis] - joints.effective[t.index].min[ta]),
        face: faceName(otherAxis(t.axis, b.axis), 'min'),
        diameter_mm: accessHoleDiameter(f),
        for_member_id: b.member.id,
        joint_id: j.id,
      });
    }
  };
  joints.joints.forEach(visit);
  for (const list of ops) list.sort((p, q) => opOrder(p) - opOrder(q));
  return ops;
}

/** End taps first (start, then end), then access holes from the start. */
const opOrder = (op: MachiningOp): number => (op.kind === 'end-tap' ? (op.end === 'start' ? -2 : -1) : op.at_mm);
