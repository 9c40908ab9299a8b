import { describe, expect, it } from 'vitest';
import { computeReport } from '@shared/engine/report';
import { buildCabinetRun, parseCabinetSpec } from '@shared/model/cabinet-run';
import { defaultDraft, draftBay, draftLayout, draftProblem, specFromDraft, stackHeights } from '@/editor/cabinet/cabinet-draft';

// The cabinet layout form's draft: what it hands the engine must be a spec the engine accepts, laid out so that
// every module bears on a member, and its preview must agree with the engine on where things are.

describe('cabinet layout drafts', () => {
  it('the default draft (cooler, sink, drawers) lays out with every module bearing on members', () => {
    const d = defaultDraft();
    expect(draftProblem(d)).toBeNull();
    const doc = buildCabinetRun(parseCabinetSpec(specFromDraft(d)));
    const r = computeReport(doc);
    expect(r.modules.map((m) => m.name)).toEqual(['Compressor cooler', 'Sink with tap', 'Drawer stack']);
    for (const m of r.modules) expect(m.bears_on.length, `${m.name} bears on something`).toBeGreaterThan(0);
    // The preview's outside length is the engine's: the run's far face.
    const far = Math.max(...r.members.map((m) => m.max_mm.x));
    expect(draftLayout(d).width).toBeCloseTo(far, 6);
  });

  it('a drawer stacked over the cooler sits where the preview draws it, on members of its own', () => {
    const d = defaultDraft();
    d.bays[0].stack = [{ ...draftBay('drawers'), name: 'Drawer', h_mm: 150 }];
    expect(draftProblem(d)).toBeNull();
    const r = computeReport(buildCabinetRun(parseCabinetSpec(specFromDraft(d))));
    const drawer = r.modules.find((m) => m.name === 'Drawer')!;
    const drawn = stackHeights(d, d.bays[0])[1];
    expect(drawer.min_mm.z).toBeCloseTo(drawn.z0, 6);
    expect(drawer.max_mm.z).toBeCloseTo(drawn.z1, 6);
    expect(drawer.bears_on.length).toBeGreaterThan(0);
  });

  it('says in words what is wrong: a stack too tall for the frame, a module deeper than the inside', () => {
    const tall = defaultDraft();
    tall.bays[0].stack = [{ ...draftBay('fridge'), name: 'Tall one' }];
    expect(draftProblem(tall)).toMatch(/Bay 1 .*the stack reaches \d+ mm, above the top rails/);
    const deep = defaultDraft();
    deep.bays[1].d_mm = 900;
    expect(draftProblem(deep)).toMatch(/Bay 2 \(Sink with tap\) is 900 mm deep/);
    const none = { ...defaultDraft(), bays: [] };
    expect(draftProblem(none)).toBe('Add at least one bay');
  });
});
