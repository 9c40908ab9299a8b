import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { member } from './frames';

describe('joints re-found after a through-member change', () => {
  // Three members at a corner: upright U, rail R along x and cross-member C along y, both at the top. By default
  // U runs through and both butt into it. Set R to run through U: U is cut back to R's underside, so C (drawn
  // against U's face) no longer meets U; it meets R's end instead.
  const members = [member('U', 'z', 0, 800, { x: 0, y: 0 }), member('R', 'x', 40, 960, { y: 0, z: 760 }), member('C', 'y', 40, 460, { x: 0, z: 760 })];

  it('by default both butt into the upright', () => {
    const r = computeReport(parseFrameDocument({ schemaVersion: 1, members }));
    expect(r.joints.map((j) => [j.id, j.runs_through])).toEqual([
      ['R|U', 'U'],
      ['C|U', 'U'],
    ]);
  });

  it('with the rail running through, no joint lists the cross-member into the upright it no longer meets', () => {
    const r = computeReport(parseFrameDocument({ schemaVersion: 1, members, joints: [{ type: 'joint', members: ['R', 'U'], through: 'R' }] }));
    const c = r.joints.find((j) => j.butting.member_id === 'C');
    expect(c?.runs_through).toBe('R');
    expect(r.joints.some((j) => j.id === 'C|U')).toBe(false);
    // Every joint's two members touch in the finished geometry.
    const box = (id: string) => r.members.find((m) => m.id === id) as (typeof r.members)[number];
    for (const j of r.joints) {
      const a = box(j.butting.member_id);
      const b = box(j.other.member_id);
      for (const k of ['x', 'y', 'z'] as const) expect(Math.min(a.max_mm[k], b.max_mm[k]) - Math.max(a.min_mm[k], b.min_mm[k])).toBeGreaterThanOrEqual(-0.05);
    }
    const end = r.members.find((m) => m.id === 'C')?.ends.start;
    expect(end).toMatchObject({ role: 'butts', meets: 'R' });
  });
});
