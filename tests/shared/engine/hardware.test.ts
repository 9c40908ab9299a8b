import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FASTENER_DATA, screwLengthFor, screwMass_g } from '@shared/engine/fastening';
import { computeReport } from '@shared/engine/report';
import type { FrameReport } from '@shared/engine/report-types';
import { parseFrameDocument } from '@shared/model/parse';
import { boxFrame, module } from './frames';

const line = (r: FrameReport, kind: string) => r.hardware.lines.filter((l) => l.kind === kind);
const count = (r: FrameReport, kind: string) => line(r, kind).reduce((n, l) => n + l.count, 0);
const example = (name: string) => parseFrameDocument(JSON.parse(readFileSync(new URL(`../../../scripts/examples/${name}.json`, import.meta.url), 'utf8')));

describe('hardware on the hand-worked box (8 rail ends against 4 uprights)', () => {
  const r = computeReport(boxFrame());

  it('counts brackets, screws, T-nuts and end caps from the joints', () => {
    // One inside corner bracket per joint: 8. Each bracket takes one screw and T-nut into each member: 8 × 2 = 16.
    // End caps on the open upright ends, top and bottom: 4 × 2 = 8.
    expect(count(r, 'bracket')).toBe(8);
    expect(count(r, 'screw')).toBe(16);
    expect(count(r, 't-nut')).toBe(16);
    expect(count(r, 'end-cap')).toBe(8);
  });

  it('sizes the screws from the profile’s fastener: bracket thickness + nut engagement, next stocked length', () => {
    // 40×40 slot 8 takes M8; bracket 5 mm + 10 mm through the nut (common practice) = 15 → M8 × 16 (ISO 4762
    // length series, recalled from memory).
    const [screw] = line(r, 'screw');
    expect(screw).toMatchObject({ size: 'M8', length_mm: 16, name: 'cap screw M8 × 16' });
    expect(screwLengthFor('M8', FASTENER_DATA.M8.bracket_mm)).toBe(16);
    // Approximate steel mass: π/4 (8² × 16 + 13² × 8) mm³ × 7.85 g/cm³ (ISO 4762 head 13 × 8) ≈ 14.2 g.
    expect(screwMass_g('M8', 16)).toBeCloseTo((Math.PI / 4) * (64 * 16 + 169 * 8) * 7.85e-3, 9);
  });

  it('adds the spares percentage, rounded up', () => {
    // 10 %: 8 → 8.8 → 9; 16 → 17.6 → 18.
    expect(line(r, 'bracket')[0].order_qty).toBe(9);
    expect(line(r, 'screw')[0].order_qty).toBe(18);
    const none = computeReport(boxFrame({ settings: { sparesPct: 0 } }));
    expect(line(none, 'screw')[0].order_qty).toBe(16);
    // 25 % of 16 is exactly 4: 20, not 21.
    expect(line(computeReport(boxFrame({ settings: { sparesPct: 25 } })), 'screw')[0].order_qty).toBe(20);
  });

  it('adds a screw and T-nut per module fixing point', () => {
    // A base module on the two rails: 4 fixing points (common practice), 2 into each rail's top face.
    const withBox = computeReport(boxFrame({ modules: [module('box', [920, 500, 100], 20, [40, 0, 800])] }));
    expect(withBox.modules[0].bears_on.map((b) => [b.member_id, b.face])).toEqual([
      ['R1', 'top'],
      ['R2', 'top'],
    ]);
    expect(count(withBox, 'screw')).toBe(16 + 4);
    expect(count(withBox, 't-nut')).toBe(16 + 4);
  });

  it('warns which slot needs its T-nuts before assembly: a rail closed at both ends by uprights', () => {
    // R1 butts against U1 and U2, so every slot of R1 is closed once both are fitted. The bracket at each end sits
    // inside the corner, under the rail (the uprights reach down from it): bottom face, one nut per end.
    const order = r.hardware.t_nut_order.find((t) => t.member_id === 'R1' && t.face === 'bottom');
    expect(order).toMatchObject({ slot: 1, count: 2, closed_by: ['U1', 'U2'] });
    expect(order?.message).toContain('slide in 2 T-nuts');
    // The uprights' slots stay open at their capped ends: no order for them.
    expect(r.hardware.t_nut_order.some((t) => t.member_id.startsWith('U'))).toBe(false);
    // Module fixings go in the top slot of each rail, which is closed too.
    const withBox = computeReport(boxFrame({ modules: [module('box', [920, 500, 100], 20, [40, 0, 800])] }));
    expect(withBox.hardware.t_nut_order.find((t) => t.member_id === 'R1' && t.face === 'top')).toMatchObject({ count: 2, for: ['box'] });
    // With drop-in nuts nothing has to go in first.
    expect(computeReport(boxFrame({ settings: { tNut: 'drop-in' } })).hardware.t_nut_order).toEqual([]);
  });

  it('uses a builder’s own join method and its hardware recipe', () => {
    const doc = boxFrame();
    const custom = parseFrameDocument({
      ...doc,
      joinMethods: [
        { type: 'join-method', id: 'double-angle', name: 'Two heavy angles', parts: [{ name: 'heavy angle', qty: 2, mass_g: 120 }], fastenersPerMember: 2, clamp_mm: 6 },
      ],
      members: doc.members.map((m) => (m.id === 'R1' ? { ...m, start: { ...m.start, join: 'double-angle' } } : m)),
    });
    const r2 = computeReport(custom);
    // One joint changes from 1 bracket + 2 screws to 2 angles + 2 × 2 screws; the 6 mm clamp takes M8 × 16.
    expect(count(r2, 'bracket')).toBe(7);
    expect(line(r2, 'part')).toMatchObject([{ name: 'heavy angle', count: 2, unit_mass_g: 120 }]);
    expect(count(r2, 'screw')).toBe(14 + 4);
    expect(r2.joints.find((j) => j.id === 'R1|U1')?.method).toBe('double-angle');
  });

  it('bolts right through plain sections, with hex nuts and a warning', () => {
    const doc = boxFrame();
    const tube = computeReport(parseFrameDocument({ ...doc, members: doc.members.map((m) => ({ ...m, profile: 'tube:40x40x2' })) }));
    expect(count(tube, 't-nut')).toBe(0);
    expect(count(tube, 'nut')).toBe(16);
    expect(tube.warnings.map((w) => w.code)).toContain('plain-section-fastener');
  });
});

describe('hardware and machining on the workshop bench example', () => {
  const r = computeReport(example('workshop-bench'));

  it('counts by hand', () => {
    // Joints: 4 top rails ends + 4 top cross-member ends + 2 middle cross-member ends + 4 shelf cross-member
    // ends = 14 corner brackets; the 4 shelf rail ends use end connectors.
    expect(count(r, 'bracket')).toBe(14);
    expect(count(r, 'connector')).toBe(4);
    // Screws: 14 brackets × 2 = 28, + worktop 4 fixing points + tool chest 4 = 36; T-nuts the same.
    expect(count(r, 'screw')).toBe(36);
    expect(count(r, 't-nut')).toBe(36);
    // 4 legs, capped top and bottom.
    expect(count(r, 'end-cap')).toBe(8);
    // 10 % spares: 36 → 39.6 → 40; 14 → 15.4 → 16; 4 → 4.4 → 5.
    expect(line(r, 'screw')[0].order_qty).toBe(40);
    expect(line(r, 'bracket')[0].order_qty).toBe(16);
    expect(line(r, 'connector')[0].order_qty).toBe(5);
  });

  it('lists end taps on the shelf rails and access holes in the legs', () => {
    const s1 = r.members.find((m) => m.id === 'S1');
    // Tap drill for M8: major diameter − pitch = 8 − 1.25 = 6.75 ≈ 6.8 mm (REFERENCES.md); depth 2·d + 2 = 18 mm
    // (2·d engagement into aluminium, common practice).
    expect(s1?.ops).toEqual([
      { kind: 'end-tap', end: 'start', thread: 'M8', tap_drill_mm: 6.8, depth_mm: 18, joint_id: 'L1|S1' },
      { kind: 'end-tap', end: 'end', thread: 'M8', tap_drill_mm: 6.8, depth_mm: 18, joint_id: 'L2|S1' },
    ]);
    // Leg L1: hole at the shelf rail's centre line, 150 + 40 / 2 = 170 mm up, on the front face; Ø key 6 mm
    // (ISO 4762 M8) + 2 mm = 8 mm.
    expect(r.members.find((m) => m.id === 'L1')?.ops).toEqual([
      { kind: 'access-hole', at_mm: 170, face: 'front', diameter_mm: 8, for_member_id: 'S1', joint_id: 'L1|S1' },
    ]);
    // The cut list carries them per part: the four legs are one part (A) with the same hole.
    const legs = r.cut_list.find((c) => c.member_ids.includes('L1'));
    expect(legs).toMatchObject({ qty: 4, cut_length_mm: 900 });
    expect(legs?.ops).toHaveLength(1);
  });
});
