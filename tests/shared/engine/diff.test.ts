import { describe, expect, it } from 'vitest';
import { diffReports } from '@shared/engine/diff';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { parseFrameDocument } from '@shared/model/parse';
import { boxFrame, member } from './frames';
import { resizeModule, swapBays } from './relay-helpers';

describe('what changed', () => {
  const doc = demoFrameDocument();
  const r0 = computeReport(doc);

  it('a swap changes no part', () => {
    const d = diffReports(r0, computeReport(swapBays(doc, 'galley', 1, 2), { previous: r0 }));
    expect(d.totals).toMatchObject({ kept: 44, shorter: 0, longer: 0, new: 0, removed: 0, keep_parts: 44, new_parts: 0, spare_parts: 0, new_material_mm: 0 });
  });

  it('a wider cooler: its four bay rails are longer and cut new; the old ones are freed', () => {
    const r1 = computeReport(resizeModule(doc, 'cooler', { w_mm: 500 }), { previous: r0 });
    const d = diffReports(r0, r1);
    const rails = ['bay-cooler-low-b', 'bay-cooler-low-f', 'bay-cooler-top-b', 'bay-cooler-top-f'];
    expect(d.parts.filter((p) => p.status === 'longer').map((p) => p.member_id)).toEqual(rails);
    // Every old part of 850 or less is already in use; nothing is 520 + 3 mm kerf or longer and spare: 4 × 520 new.
    expect(d.totals).toMatchObject({ kept: 40, longer: 4, new_parts: 4, new_material_mm: 2080, spare_parts: 4 });
    expect(d.spare.map((s) => [s.member_id, s.cut_length_mm])).toEqual(rails.map((id) => [id, 480]));
  });

  it('a narrower cooler: each rail is re-cut from its own old part, offcut = 480 − 420 − 3 mm kerf = 57', () => {
    const d = diffReports(r0, computeReport(resizeModule(doc, 'cooler', { w_mm: 400 }), { previous: r0 }));
    const recut = d.plan.filter((s) => s.action === 'recut');
    expect(recut).toHaveLength(4);
    for (const s of recut) expect(s).toMatchObject({ from_member_id: s.member_id, from_cut_length_mm: 480, cut_length_mm: 420, offcut_mm: 57 });
    expect(d.totals.new_material_mm).toBe(0);
  });

  it('a removed member’s part serves a new one when it is long enough (plus kerf)', () => {
    // Box: remove cross-member C2 (420) and add a 400 mm brace elsewhere; 420 ≥ 400 + 3 → re-cut, offcut 17.
    const before = computeReport(boxFrame());
    const b = boxFrame();
    const after = computeReport(
      parseFrameDocument({ ...b, members: [...b.members.filter((m) => m.id !== 'C2'), member('N1', 'x', 2000, 2400, { y: 0, z: 0 })] }),
      { previous: before },
    );
    const d = diffReports(before, after);
    expect(d.parts.find((p) => p.member_id === 'C2')?.status).toBe('removed');
    expect(d.parts.find((p) => p.member_id === 'N1')?.status).toBe('new');
    expect(d.plan.find((s) => s.member_id === 'N1')).toMatchObject({ action: 'recut', from_member_id: 'C2', offcut_mm: 17 });
    expect(d.totals).toMatchObject({ new_parts: 0, spare_parts: 0, removed: 1, new: 1 });
  });

  it('prefers an old part of exactly the right length, then the shortest that fits (longest requirement first)', () => {
    const mk = (lengths: number[]) =>
      computeReport(
        parseFrameDocument({
          schemaVersion: 1,
          members: lengths.map((l, k) => member(`M${k}`, 'x', 0, l, { y: 0, z: 100 * k })),
        }),
      );
    // Old parts 1000, 700, 500; new 690 (its own id M1 was 700), 500 (M2 was 500: kept), 400 (new id M3).
    const before = mk([1000, 700, 500]);
    const after = computeReport(
      parseFrameDocument({
        schemaVersion: 1,
        members: [member('M1', 'x', 0, 690, { y: 0, z: 100 }), member('M2', 'x', 0, 500, { y: 0, z: 200 }), member('M3', 'x', 0, 400, { y: 0, z: 300 })],
      }),
    );
    const d = diffReports(before, after);
    // M2 kept; then longest first: M1 690 ← 700 (shortest ≥ 693), M3 400 ← 1000 (the only one left).
    expect(d.plan.map((s) => [s.member_id, s.action, s.from_member_id])).toEqual([
      ['M1', 'recut', 'M1'],
      ['M2', 'keep', 'M2'],
      ['M3', 'recut', 'M0'],
    ]);
    expect(d.parts.find((p) => p.member_id === 'M0')?.status).toBe('removed');
    expect(d.spare).toEqual([]);
  });
});

describe('what changed: machining', () => {
  it('switching the demo pod to end connectors keeps every length but lists the new end taps and access holes', () => {
    const doc = demoFrameDocument();
    const r0 = computeReport(doc);
    const r1 = computeReport({ ...doc, settings: { ...doc.settings, defaultJoin: 'end-connector' } }, { previous: r0 });
    const d = diffReports(r0, r1);
    // An end connector needs a tapped end on the butting member and an access hole in the one it butts against
    // (DOMAIN.md, joining methods); the bracket needed neither.
    const taps = r1.members.reduce((n, m) => n + m.ops.filter((o) => o.kind === 'end-tap').length, 0);
    const holes = r1.members.reduce((n, m) => n + m.ops.filter((o) => o.kind === 'access-hole').length, 0);
    expect(taps).toBeGreaterThan(0);
    expect(d.totals.end_taps_added).toBe(taps);
    expect(d.totals.access_holes_added).toBe(holes);
    expect(d.totals.machining_parts).toBe(r1.members.filter((m) => m.ops.length > 0).length);
    const tapped = d.plan.find((s) => s.machining.some((x) => x.startsWith('end tap')));
    expect(tapped?.action).toBe('keep');
    expect(d.parts.find((p) => p.member_id === tapped?.member_id)?.machining_added.length).toBeGreaterThan(0);
    // And back again: the taps and holes are no longer needed.
    const back = diffReports(r1, computeReport(doc, { previous: r1 }));
    expect(back.totals.machining_parts).toBe(0);
    expect(back.parts.filter((p) => p.machining_removed.length > 0).length).toBe(r1.members.filter((m) => m.ops.length > 0).length);
  });
});
