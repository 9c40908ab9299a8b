import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { addCabinetRun } from '@/editor/cabinet/add-cabinet-run';
import { defaultDraft, specFromDraft } from '@/editor/cabinet/cabinet-draft';

// "Add a cabinet run" on a frame that has one already: the new run stands beside it, the frame's own members and
// modules stay exactly where they were, and the new modules bear on the new run's members.

describe('adding a cabinet run to an existing frame', () => {
  it('lays the run out beside the frame without moving anything of the frame', () => {
    const doc = demoFrameDocument();
    const before = computeReport(doc);
    const far = Math.max(...before.members.map((m) => m.max_mm.x));
    const r = addCabinetRun(doc, specFromDraft(defaultDraft()), far + 300);
    if (!r.ok) throw new Error(r.reason);
    const after = computeReport(r.doc);
    // Everything the frame had is where it was.
    for (const m of before.members) {
      const same = after.members.find((x) => x.id === m.id)!;
      expect(same.min_mm).toEqual(m.min_mm);
      expect(same.max_mm).toEqual(m.max_mm);
    }
    // The new run: three more modules, each bearing on members, all past the gap.
    const added = after.modules.filter((m) => !before.modules.some((b) => b.id === m.id));
    expect(added).toHaveLength(3);
    for (const m of added) {
      expect(m.bears_on.length, `${m.name} bears on members`).toBeGreaterThan(0);
      expect(m.min_mm.x).toBeGreaterThan(far + 300);
    }
    expect(r.doc.runs).toHaveLength(doc.runs.length + 1);
  });

  it('names the field when the layout is wrong', () => {
    const spec = { ...specFromDraft(defaultDraft()), depth_mm: -5 };
    const r = addCabinetRun(demoFrameDocument(), spec, 0);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/depth/);
  });
});
