import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cuttingKey, fnv1a32 } from '@shared/engine/cutting-key';
import { computeReport } from '@shared/engine/report';
import { compareReports } from '@shared/engine/revision-diff';
import { demoFrameDocument } from '@shared/model/demo-frame';
import type { FrameDocument } from '@shared/model/frame-document';
import { resizeModule, swapBays } from './relay-helpers';

const demo = demoFrameDocument();
const r0 = computeReport(demo);
const without = (doc: FrameDocument, id: string): FrameDocument => ({ ...doc, members: doc.members.filter((m) => m.id !== id) });

describe('comparing two revisions', () => {
  it('a revision compared with itself: every member the same, no cut-list or hardware line', () => {
    const d = compareReports(r0, computeReport(demo));
    expect(d.members.every((m) => m.change === 'same')).toBe(true);
    expect(d.members).toHaveLength(r0.members.length);
    expect([d.cut_list, d.hardware]).toEqual([[], []]);
  });

  it('a removed member is listed once with its old box and mark; the cut list loses one of its part', () => {
    const gone = r0.members[r0.members.length - 1];
    const d = compareReports(r0, computeReport(without(demo, gone.id)));
    const m = d.members.find((x) => x.member_id === gone.id)!;
    expect(m).toMatchObject({ change: 'removed', mark_before: gone.mark, mark_after: null, box_after: null, box_before: { min_mm: gone.min_mm, max_mm: gone.max_mm } });
    expect(d.totals.removed).toBe(1);
    const line = d.cut_list.find((l) => l.profile === gone.profile && Math.abs(l.cut_length_mm - gone.cut_length_mm) < 0.05)!;
    expect(line.qty_after).toBe(line.qty_before - 1);
  });

  it('swapping the order is symmetric: what one way calls added the other calls removed', () => {
    const gone = r0.members[0].id;
    const r1 = computeReport(without(demo, gone));
    const there = compareReports(r0, r1);
    const back = compareReports(r1, r0);
    expect(there.members.find((m) => m.member_id === gone)!.change).toBe('removed');
    expect(back.members.find((m) => m.member_id === gone)!.change).toBe('added');
    expect(back.cut_list.map((l) => [l.qty_after, l.qty_before])).toEqual(there.cut_list.map((l) => [l.qty_before, l.qty_after]));
  });

  it('a re-lay marks the members it moved or re-sized as moved, and leaves the others alone', () => {
    const r1 = computeReport(resizeModule(demo, 'cooler', { w_mm: 500 }));
    const d = compareReports(r0, r1);
    const moved = d.members.filter((m) => m.change === 'moved');
    expect(moved.length).toBeGreaterThan(0);
    for (const m of moved) expect(m.box_before).not.toEqual(m.box_after);
    for (const m of d.members.filter((x) => x.change === 'same')) expect(m.box_before).toEqual(m.box_after);
    // Wider bay rails are longer parts: the cut list shows the change.
    expect(d.cut_list.length).toBeGreaterThan(0);
    expect(d.totals.parts_after).toBe(d.totals.parts_before);
  });

  it('totals always add up to the members of both revisions (property)', () => {
    const ids = r0.members.map((m) => m.id);
    fc.assert(
      fc.property(fc.subarray(ids), fc.subarray(ids), (a, b) => {
        const ra = computeReport(a.reduce(without, demo));
        const rb = computeReport(b.reduce(without, demo));
        const d = compareReports(ra, rb);
        const t = d.totals;
        expect(t.added + t.moved + t.changed + t.same).toBe(rb.members.length);
        expect(t.removed + t.moved + t.changed + t.same).toBe(ra.members.length);
        // A cut-list line is listed only when its count or mark differs.
        for (const l of d.cut_list) expect(l.qty_before !== l.qty_after || l.mark_before !== l.mark_after).toBe(true);
      }),
      { numRuns: 15 },
    );
  });
});

describe('the cutting key', () => {
  it('is FNV-1a (32 bit) over the parts: the published test vectors', () => {
    // Test vectors from the FNV reference (Fowler, Noll, Vo), "" / "a" / "foobar" (from memory).
    expect([fnv1a32(''), fnv1a32('a'), fnv1a32('foobar')]).toEqual(['811c9dc5', 'e40c292c', 'bf9cf968']);
  });

  it('does not change with the order of the parts, member ids or the document beyond what is cut', () => {
    const parts = r0.members;
    expect(cuttingKey([...parts].reverse())).toBe(cuttingKey(parts));
    const renamed = { ...demo, members: demo.members.map((m, i) => (i === 0 ? { ...m, name: 'Renamed rail' } : m)) };
    expect(cuttingKey(computeReport(renamed).members)).toBe(cuttingKey(parts));
    // Swapping two bays moves modules, not parts of another length.
    expect(cuttingKey(computeReport(swapBays(demo, 'galley', 0, 3)).members)).toBe(cuttingKey(parts));
  });

  it('changes when a part is added, removed, re-sized or re-marked', () => {
    const k = cuttingKey(r0.members);
    expect(cuttingKey(r0.members.slice(1))).not.toBe(k);
    expect(cuttingKey(r0.members.map((m, i) => (i === 0 ? { ...m, cut_length_mm: m.cut_length_mm + 1 } : m)))).not.toBe(k);
    expect(cuttingKey(r0.members.map((m, i) => (i === 0 ? { ...m, mark: 'ZZ' } : m)))).not.toBe(k);
  });
});
