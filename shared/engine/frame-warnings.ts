import type { JointsResult } from './joints';
import type { MemberGeometry } from './resolve-members';
import { memberRef } from './names';
import type { ReportWarning } from './warnings';

const memberLabel = (m: MemberGeometry) => memberRef(m.member.id);

/**
 * Members that cannot be what was meant: one that touches no other member (nothing holds it, it holds nothing),
 * and two drawn in the same place with the same profile (the cut list and the mass would count the part twice).
 */
export function frameWarnings(members: readonly MemberGeometry[], joints: Pick<JointsResult, 'joints'>): ReportWarning[] {
  const warnings: ReportWarning[] = [];
  if (members.length < 2) return warnings;
  const joined = new Uint8Array(members.length);
  for (const j of joints.joints) {
    joined[j.butting] = 1;
    joined[j.other] = 1;
  }
  for (const m of members) {
    if (joined[m.index]) continue;
    warnings.push({
      code: 'member-isolated',
      member_id: m.member.id,
      message: `${memberLabel(m)} touches no other member: nothing holds it up and it is not part of the frame; move it onto the frame or delete it`,
    });
  }
  // Same place to a tenth of a millimetre: well below any saw's accuracy.
  const seen = new Map<string, MemberGeometry>();
  for (const m of members) {
    const b = m.drawn;
    const key = [m.member.profile, m.axis, m.member.rotation_deg % 180, ...b.min, ...b.max].map((v) => (typeof v === 'number' ? Math.round(v * 10) : v)).join('|');
    const first = seen.get(key);
    if (!first) {
      seen.set(key, m);
      continue;
    }
    warnings.push({
      code: 'member-duplicate',
      member_id: m.member.id,
      member_ids: [m.member.id, first.member.id],
      message: `${memberLabel(m)} is drawn twice in the same place with the same profile: the part is counted twice in the cut list and the mass; delete one of the two`,
    });
  }
  return warnings;
}
