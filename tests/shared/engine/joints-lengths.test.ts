import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { iso2768Tolerance } from '@shared/engine/tolerance';
import { parseFrameDocument } from '@shared/model/parse';
import { boxFrame, member } from './frames';

const byId = <T extends { id: string }>(list: T[], id: string): T => list.find((x) => x.id === id) as T;

describe('cut lengths on a hand-worked box (4 uprights 40×40, rails between them)', () => {
  const r = computeReport(boxFrame());

  it('uprights run full height; rails and cross-members are cut between the uprights’ faces', () => {
    // Uprights: 800 mm, floor to top.
    // Rails along x: outer width 1000 − two uprights 2 × 40 = 920 mm.
    // Cross-members along y: outer depth 500 − 2 × 40 = 420 mm.
    expect(['U1', 'U2', 'U3', 'U4'].map((id) => byId(r.members, id).cut_length_mm)).toEqual([800, 800, 800, 800]);
    expect(byId(r.members, 'R1').cut_length_mm).toBe(920);
    expect(byId(r.members, 'C2').cut_length_mm).toBe(420);
  });

  it('finds a joint at each rail end, the upright running through, and leaves the upright ends free', () => {
    // 2 rails × 2 ends + 2 cross-members × 2 ends = 8 joints.
    expect(r.joints).toHaveLength(8);
    for (const j of r.joints) expect(j.runs_through).toMatch(/^U/);
    const u1 = byId(r.members, 'U1');
    expect(u1.ends.start.role).toBe('free');
    expect(u1.ends.end.role).toBe('runs-through');
    expect(u1.ends.end.method).toBe('end-cap');
    expect(byId(r.members, 'R1').ends.start).toMatchObject({ role: 'butts', meets: 'U1', method: 'corner-bracket' });
  });

  it('groups the cut list by profile and length with quantities and part marks', () => {
    // Three distinct parts: 4 × 800, 2 × 920, 2 × 420; marks in order of first appearance in the document.
    expect(r.cut_list.map((c) => [c.mark, c.cut_length_mm, c.qty])).toEqual([
      ['B', 920, 2],
      ['A', 800, 4],
      ['C', 420, 2],
    ]);
    expect(byId(r.members, 'R2').mark).toBe('B');
  });

  it('adds the machining allowance to each butting end only', () => {
    const a = computeReport(boxFrame({ settings: { machiningAllowance_mm: 0.5 } }));
    // Rail: 920 + 2 × 0.5 = 921; upright ends are free: 800.
    expect(byId(a.members, 'R1').cut_length_mm).toBe(921);
    expect(byId(a.members, 'R1').length_mm).toBe(920);
    expect(byId(a.members, 'U1').cut_length_mm).toBe(800);
  });

  it('shows the ISO 2768-1 tolerance for the length (REFERENCES.md: 400–1000 mm m ±0.8, c ±2)', () => {
    expect(byId(r.members, 'R1').tolerance_mm).toBe(0.8);
    expect(r.settings.tolerance_standard).toBe('ISO 2768-1 m (medium)');
    const coarse = computeReport(boxFrame({ settings: { toleranceClass: 'c' } }));
    expect(byId(coarse.members, 'U1').tolerance_mm).toBe(2);
  });

  it('formats cut lengths in the display unit (1 in = 25.4 mm, NIST)', () => {
    const inch = computeReport(boxFrame({ units: { display: 'in', frac: 16 } }));
    // 920 mm = 36.2205 in → nearest 1/16: 579.53/16 → 580/16 = 36 1/4".
    expect(byId(inch.members, 'R1').cut_length_text).toBe('36 1/4"');
    // 420 mm = 16.5354 in → ×32 = 529.13 → 529/32 = 16 17/32".
    expect(byId(computeReport(boxFrame({ units: { display: 'in', frac: 32 } })).members, 'C1').cut_length_text).toBe('16 17/32"');
    expect(byId(r.members, 'C1').cut_length_text).toBe('420 mm');
  });
});

describe('who runs through', () => {
  // Drawn overlapping at the corners (both full length), the drawing does not say who runs through.
  const overlapping = (joints: { type: 'joint'; members: [string, string]; through: string }[] = []) =>
    parseFrameDocument({
      schemaVersion: 1,
      members: [member('U1', 'z', 0, 800, { x: 0, y: 0 }), member('U2', 'z', 0, 800, { x: 960, y: 0 }), member('R', 'x', 0, 1000, { y: 0, z: 760 })],
      joints,
    });

  it('by default the uprights run through and the rail is cut between their faces (1000 − 2 × 40 = 920)', () => {
    const r = computeReport(overlapping());
    expect(r.joints.map((j) => j.kind)).toEqual(['corner', 'corner']);
    expect(byId(r.members, 'R').cut_length_mm).toBe(920);
    expect(byId(r.members, 'U1').cut_length_mm).toBe(800);
    expect(byId(r.members, 'R').min_mm.x).toBe(40);
  });

  it('a joint record lets the rail run through instead: uprights cut to its underside (800 − 40 = 760)', () => {
    const r = computeReport(
      overlapping([
        { type: 'joint', members: ['U1', 'R'], through: 'R' },
        { type: 'joint', members: ['R', 'U2'], through: 'R' },
      ]),
    );
    expect(byId(r.members, 'R').cut_length_mm).toBe(1000);
    expect(byId(r.members, 'U1').cut_length_mm).toBe(760);
    expect(byId(r.members, 'U1').ends.end).toMatchObject({ role: 'butts', meets: 'R' });
    expect(byId(r.members, 'R').ends.start).toMatchObject({ role: 'runs-through', method: 'end-cap' });
  });

  it('drawn touching, the drawing decides: a rail laid over the uprights runs through', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      members: [member('U1', 'z', 0, 760, { x: 0, y: 0 }), member('U2', 'z', 0, 760, { x: 960, y: 0 }), member('R', 'x', 0, 1000, { y: 0, z: 760 })],
    });
    const r = computeReport(doc);
    expect(r.joints.every((j) => j.runs_through === 'R')).toBe(true);
    expect(byId(r.members, 'U1').cut_length_mm).toBe(760);
  });

  it('a T-joint cannot be turned around: the butting member stays butting, with a warning', () => {
    const doc = parseFrameDocument({
      schemaVersion: 1,
      members: [member('U1', 'z', 0, 800, { x: 0, y: 0 }), member('R', 'x', 40, 500, { y: 0, z: 300 })],
      joints: [{ type: 'joint', members: ['U1', 'R'], through: 'R' }],
    });
    const r = computeReport(doc);
    expect(r.joints[0]).toMatchObject({ kind: 'butt', runs_through: 'U1' });
    expect(r.warnings.map((w) => w.code)).toContain('through-not-possible');
  });

  it('two members end to end on one line make a splice, plated by default', () => {
    const doc = parseFrameDocument({ schemaVersion: 1, members: [member('A', 'x', 0, 600, { y: 0, z: 0 }), member('B', 'x', 600, 1000, { y: 0, z: 0 })] });
    const r = computeReport(doc);
    expect(r.joints).toHaveLength(1);
    expect(r.joints[0]).toMatchObject({ kind: 'inline', method: 'gusset', runs_through: null });
  });
});

describe('ISO 2768-1 general tolerances (REFERENCES.md [S]: 400–1000 and 1000–2000 mm rows)', () => {
  it('matches the published rows', () => {
    expect([iso2768Tolerance(500, 'f'), iso2768Tolerance(500, 'm'), iso2768Tolerance(500, 'c'), iso2768Tolerance(500, 'v')]).toEqual([0.3, 0.8, 2, 4]);
    expect([iso2768Tolerance(1500, 'f'), iso2768Tolerance(1500, 'm'), iso2768Tolerance(1500, 'c'), iso2768Tolerance(1500, 'v')]).toEqual([0.5, 1.2, 3, 6]);
    // Range bounds: "over 400 up to 1000", so 1000 is still in the 400–1000 row and 400 is not.
    expect(iso2768Tolerance(1000, 'm')).toBe(0.8);
    expect(iso2768Tolerance(1000.1, 'm')).toBe(1.2);
    expect(iso2768Tolerance(400, 'm')).not.toBe(0.8);
  });
});
