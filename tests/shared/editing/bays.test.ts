import { describe, expect, it } from 'vitest';
import { addBay, moveBay, moveModuleOutOfRun, moveModuleToBay, removeBay, setBayWidth } from '@shared/editing/bays';
import { trySwapModules } from '@shared/editing/swap';
import { applyChange, diffDocuments, invertChange } from '@shared/editing/change';
import type { EditOutcome } from '@shared/editing/outcome';
import { diffReports } from '@shared/engine/diff';
import { computeReport, type FrameReport } from '@shared/engine/report';
import type { FrameDocument } from '@shared/model/frame-document';
import { parseFrameDocument } from '@shared/model/parse';
import { coolerAndOpenBay, galleyDoc } from './cabinet-fixtures';

const ok = <X>(r: EditOutcome<X>) => {
  if (!r.ok) throw new Error(`refused: ${r.reason}`);
  return r;
};
const refused = (r: EditOutcome): string => {
  if (r.ok) throw new Error('expected a refusal');
  return r.reason;
};
const member = (r: FrameReport, id: string) => r.members.find((m) => m.id === id) as FrameReport['members'][number];
const bay = (r: FrameReport, id: string) => r.bays.find((b) => b.id === id) as FrameReport['bays'][number];
const datum = (r: FrameReport, id: string) => r.datums.find((d) => d.id === id)?.value_mm as number;

/** Record ids and document field names that must never reach a builder's eyes. */
function expectPlainWords(text: string, doc: FrameDocument) {
  // The builder's own names (in quotes) may hold any word; what is left must name no record.
  const words = text.replace(/“[^”]*”/g, '“…”');
  const ids = [...doc.modules.map((m) => m.id), ...doc.runs.flatMap((r) => r.bays.map((b) => b.id)), ...doc.members.map((m) => m.id)];
  for (const id of ids) expect(words, `"${text}" names ${id}`).not.toMatch(new RegExp(`(^|[^\\w-])${id}([^\\w-]|$)`));
  expect(words).not.toMatch(/bearsOn|width_mm|modules\[|runs\[|place\./);
}

describe('adding a bay', () => {
  const doc = galleyDoc();
  const r0 = computeReport(doc);

  it('at the end: a boundary of uprights and cross-members and the neighbour’s rails, all by reference', () => {
    const out = ok(addBay(doc, 'galley', 'end'));
    const r1 = computeReport(parseFrameDocument(out.doc));
    // Width of the open neighbour (250); the run grows by it and one 40 mm upright: 1645.4 + 290.
    expect(bay(r1, out.bayId).width_mm).toBe(250);
    expect(datum(r1, 'galley.end')).toBeCloseTo(datum(r0, 'galley.end') + 290, 9);
    const added = r1.members.filter((m) => !r0.members.some((o) => o.id === m.id));
    // Two uprights and two cross-members at the new boundary, four rails along the new bay.
    expect(added.map((m) => m.role).sort()).toEqual(['cross-member', 'cross-member', 'rail', 'rail', 'rail', 'rail', 'upright', 'upright']);
    for (const m of added.filter((x) => x.role === 'rail')) expect(m.cut_length_mm).toBe(250);
    for (const m of added.filter((x) => x.role === 'upright')) expect(m.min_mm.x).toBeCloseTo(datum(r1, 'galley.u5'), 9);
    expect(added.find((m) => m.role === 'upright')?.name).toBe('Upright 6, front');
    // Every new member is joined: no free rail ends in the new bay.
    for (const m of added.filter((x) => x.role === 'rail')) expect([m.ends.start.role, m.ends.end.role]).toEqual(['butts', 'butts']);
    const changed = diffReports(r0, r1);
    expect(changed.totals).toMatchObject({ new: 8, removed: 0, kept: r0.members.length });
  });

  it('before a bay: the bays after it move along by its width and an upright, and keep their parts', () => {
    const out = ok(addBay(doc, 'galley', { before: 'bay-sink' }, 300));
    const r1 = computeReport(out.doc);
    expect(out.doc.runs[0].bays.map((b) => b.id)).toEqual(['bay-cooler', out.bayId, 'bay-sink', 'bay-tank', 'bay-open']);
    for (const id of ['bay-sink-top-f', 'bay-sink-sink-hanger-l', 'bay-tank-bearer-r', 'galley-u4-b']) {
      expect(member(r1, id).min_mm.x - member(r0, id).min_mm.x).toBeCloseTo(340, 9);
      expect(member(r1, id).cut_length_mm).toBe(member(r0, id).cut_length_mm);
    }
    for (const id of ['galley-u0-f', 'galley-u1-f', 'bay-cooler-bearer-l']) expect(member(r1, id).min_mm).toEqual(member(r0, id).min_mm);
    expect(out.label).toBe('Add a bay before bay 2');
  });

  it('is one undo step', () => {
    const out = ok(addBay(doc, 'galley', { after: 'bay-cooler' }));
    const change = diffDocuments(doc, out.doc, out.label);
    expect(applyChange(doc, change)).toEqual(out.doc);
    expect(applyChange(out.doc, invertChange(change))).toEqual(doc);
  });
});

describe('removing a bay', () => {
  const doc = galleyDoc();
  const r0 = computeReport(doc);

  it('takes its members and modules and one boundary; What changed lists the removed parts', () => {
    const out = ok(removeBay(doc, 'bay-tank'));
    const next = parseFrameDocument(out.doc);
    const r1 = computeReport(next);
    // Tank bay: 4 rails, 2 bearers, 2 rails and 2 bearers under the shelf; boundary 4: 2 uprights, 2 cross-members.
    expect(out.removedMembers).toHaveLength(14);
    expect(next.modules.map((m) => m.id)).not.toContain('shelf');
    expect(next.datums.map((d) => d.id)).not.toContain('shelf-base');
    const changed = diffReports(r0, r1);
    expect(changed.totals.removed).toBe(14);
    expect(changed.parts.filter((p) => p.status === 'removed').map((p) => p.member_id).sort()).toEqual([...out.removedMembers].sort());
    // The open bay closes up: it starts where the tank's bay started.
    expect(bay(r1, 'bay-open').start_mm).toBe(bay(r0, 'bay-tank').start_mm);
    expect(out.label).toBe('Remove bay 3 with “Fresh water tank 25 L” and “Shelf over the tank”');
  });

  it('keeps the modules standing free when asked', () => {
    const out = ok(removeBay(doc, 'bay-cooler', { keepModules: true }));
    const r1 = computeReport(out.doc);
    expect(r1.modules.find((m) => m.id === 'cooler')?.min_mm).toEqual(r0.modules.find((m) => m.id === 'cooler')?.min_mm);
    expect(r1.modules.find((m) => m.id === 'cooler')?.bay_id).toBeNull();
  });

  it('after adding one, gives the document back', () => {
    const added = ok(addBay(doc, 'galley', { before: 'bay-tank' }));
    expect(ok(removeBay(added.doc, added.bayId)).doc).toEqual(doc);
  });

  it('refuses the only bay of a run, in words', () => {
    const one = ok(removeBay(ok(removeBay(ok(removeBay(doc, 'bay-open')).doc, 'bay-tank')).doc, 'bay-sink')).doc;
    const reason = refused(removeBay(one, 'bay-cooler'));
    expect(reason).toMatch(/^Bay 1 is the only bay of its run/);
    expectPlainWords(reason, one);
  });
});

describe('reordering, widths and moving modules', () => {
  it('moves a bay along the run; the uprights stay at the boundaries', () => {
    const doc = galleyDoc();
    const r0 = computeReport(doc);
    const out = ok(moveBay(doc, 'bay-open', 0));
    const r1 = computeReport(out.doc);
    expect(out.doc.runs[0].bays.map((b) => b.id)).toEqual(['bay-open', 'bay-cooler', 'bay-sink', 'bay-tank']);
    expect(bay(r1, 'bay-open').start_mm).toBe(40);
    expect(bay(r1, 'bay-cooler').start_mm).toBe(40 + 250 + 40);
    expect(datum(r1, 'galley.end')).toBe(datum(r0, 'galley.end'));
    expect(r1.cut_list).toEqual(r0.cut_list);
  });

  it('sets a bay’s width, refuses one too narrow for its module, and lets it follow the module again', () => {
    const doc = galleyDoc();
    const wide = ok(setBayWidth(doc, 'bay-cooler', 500)).doc;
    expect(bay(computeReport(wide), 'bay-cooler').width_mm).toBe(500);
    const back = ok(setBayWidth(wide, 'bay-cooler', null)).doc;
    expect(bay(computeReport(back), 'bay-cooler').width_mm).toBe(420);
    const reason = refused(setBayWidth(doc, 'bay-cooler', 300));
    expect(reason).toMatch(/^“Compressor cooler” needs 420 mm/);
    expectPlainWords(reason, doc);
    expectPlainWords(refused(setBayWidth(doc, 'bay-open', null)), doc);
  });

  it('moves a module into an open bay with the bearers that carry it', () => {
    const doc = coolerAndOpenBay();
    const out = ok(moveModuleToBay(doc, 'cooler', 'bay-b'));
    const r1 = computeReport(parseFrameDocument(out.doc));
    const cooler = r1.modules.find((m) => m.id === 'cooler') as FrameReport['modules'][number];
    expect(cooler.bay_id).toBe('bay-b');
    expect(cooler.bears_on.map((c) => c.member_id)).toEqual(['bay-a-bearer-l', 'bay-a-bearer-r']);
    // The bay it left stays open at its width (400 + 2 × 10); the new one follows the cooler.
    expect(bay(r1, 'bay-a').width_mm).toBe(420);
    expect(bay(r1, 'bay-b').width_mm).toBe(420);
    expect(member(r1, 'bay-a-bearer-l').min_mm.x).toBeGreaterThan(bay(r1, 'bay-b').start_mm);
    expect(r1.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
  });

  it('refuses a bay that is taken and a module in a stack, in words', () => {
    const doc = galleyDoc();
    for (const r of [moveModuleToBay(doc, 'cooler', 'bay-tank'), moveModuleToBay(doc, 'shelf', 'bay-open')]) expectPlainWords(refused(r), doc);
  });

  it('takes a module out of its run, leaving it where it stood', () => {
    const doc = coolerAndOpenBay();
    const r0 = computeReport(doc);
    const out = ok(moveModuleOutOfRun(doc, 'cooler'));
    const r1 = computeReport(out.doc);
    expect(r1.modules[0].bay_id).toBeNull();
    expect(r1.modules[0].min_mm).toEqual(r0.modules[0].min_mm);
    expect(r1.modules[0].bears_on).toEqual(r0.modules[0].bears_on);
    expect(bay(r1, 'bay-a').width_mm).toBe(420);
  });
});

describe('swapping modules', () => {
  const doc = galleyDoc();

  it('swaps bays of one run and re-lays the uprights; twice is the document again', () => {
    const once = ok(trySwapModules(doc, 'cooler', 'tank'));
    expect(once.doc.runs[0].bays.map((b) => b.id)).toEqual(['bay-tank', 'bay-sink', 'bay-cooler', 'bay-open']);
    expect(once.label).toBe('Swap the bays of “Compressor cooler” and “Fresh water tank 25 L”');
    expect(ok(trySwapModules(once.doc, 'tank', 'cooler')).doc).toEqual(doc);
  });

  it('two modules of one stack exchange levels rather than bays', () => {
    const out = ok(trySwapModules(doc, 'drawer-mid', 'drawer-low'));
    expect(out.doc.runs[0].bays[1]).toMatchObject({ module: 'drawer-mid', stack: ['drawer-low', 'sink'] });
    expect(out.doc.runs[0].bays.map((b) => b.id)).toEqual(doc.runs[0].bays.map((b) => b.id));
    expect(out.label).toBe('Swap “Cutlery drawer” and “Pan drawer” in bay 2');
  });

  it('says why it cannot, in plain words', () => {
    const free = { ...doc, runs: doc.runs.map((r) => ({ ...r, bays: r.bays.map((b) => (b.id === 'bay-tank' ? { id: b.id, width_mm: 300 } : b)) })) };
    const reasons = [trySwapModules(doc, 'cooler', 'cooler'), trySwapModules(free, 'cooler', 'tank')].map(refused);
    expect(reasons[0]).toMatch(/^Pick two different modules/);
    expect(reasons[1]).toMatch(/^“Fresh water tank 25 L” stands free/);
    for (const r of reasons) expectPlainWords(r, doc);
  });
});

describe('adding a module to a run', () => {
  it('into a new bay at the end: uprights, rails and bearers appear, and it bears on its bearers', async () => {
    const { addModuleToRun } = await import('@shared/editing/fit-module');
    const { MODULE_LIBRARY } = await import('@shared/editing/module-library');
    const doc = coolerAndOpenBay();
    const r0 = computeReport(doc);
    const fridge = MODULE_LIBRARY.find((m) => m.key === 'fridge')!;
    const { key: _k, label, ...input } = fridge;
    void _k;
    const out = ok(addModuleToRun(doc, { ...input, name: label }, 'r', 'end'));
    const r1 = computeReport(parseFrameDocument(out.doc));
    expect(out.notes).toEqual([]);
    const added = r1.members.filter((m) => !r0.members.some((o) => o.id === m.id));
    // Boundary: 2 uprights + 2 cross-members; rails: 4; bearers: 2.
    expect(added).toHaveLength(10);
    // The new bay follows the fridge: 450 + 2 × 10.
    expect(bay(r1, out.bayId).width_mm).toBe(470);
    const m = r1.modules.find((x) => x.id === out.moduleId)!;
    expect(m.bears_on).toHaveLength(2);
    // It sits on the seat: the top of the bottom rails, 120.
    expect(m.min_mm.z).toBe(120);
    expect(r1.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
    expect(out.label).toBe('Add “Upright fridge”');
  });

  it('a module standing free, into an open bay: slide rails for a drawer stack, hangers for a sink', async () => {
    const { putModuleInBay } = await import('@shared/editing/fit-module');
    for (const [bearing, count] of [
      ['side-rails', 2],
      ['hung', 2],
    ] as const) {
      const doc = coolerAndOpenBay();
      const withFree: FrameDocument = {
        ...doc,
        modules: [...doc.modules, { type: 'module', id: 'extra', name: 'Extra', kind: 'other', bearing, size: { w_mm: 300, d_mm: 400, h_mm: 200 }, mass_kg: 5, contents_kg: 0, place: { x: { offset_mm: 2000 } } }],
      };
      const out = ok(putModuleInBay(withFree, 'extra', 'bay-b'));
      const r = computeReport(parseFrameDocument(out.doc));
      expect(r.modules.find((m) => m.id === 'extra')?.bears_on, bearing).toHaveLength(count);
    }
  });
});

describe('adding a cabinet run to an existing frame', () => {
  it('puts the whole layout beside what is there, with its own datums and ids, every module seated', async () => {
    const { addCabinetRun } = await import('@shared/editing/cabinet');
    const { galleySpec } = await import('./cabinet-fixtures');
    const doc = galleyDoc();
    const out = ok(addCabinetRun(doc, galleySpec(), { x: 2500, y: 0, z: 0 }));
    const next = parseFrameDocument(out.doc);
    expect(next.runs).toHaveLength(2);
    expect(next.members).toHaveLength(doc.members.length * 2);
    const r = computeReport(next);
    const r0 = computeReport(doc);
    // The copy stands 2500 mm to the right: its first upright at 2500, its tank at the tank's height.
    expect(member(r, `${out.runId}-u0-f`).min_mm.x).toBe(2500);
    const tank = r.modules.find((m) => m.id !== 'tank' && m.name === 'Fresh water tank 25 L')!;
    expect(tank.min_mm.z).toBe(r0.modules.find((m) => m.id === 'tank')!.min_mm.z);
    for (const m of r.modules) expect(m.bears_on.length, m.id).toBeGreaterThan(0);
    const bad = addCabinetRun(doc, { ...galleySpec(), depth_mm: -1 });
    expect(bad.ok ? '' : bad.reason).toMatch(/^depth_mm: must be more than 0/);
  });
});

describe('moving a module to another run', () => {
  it('leaves its old carrying members behind and gets new ones from the new bay’s rails', async () => {
    const { addCabinetRun } = await import('@shared/editing/cabinet');
    const { putModuleInBay } = await import('@shared/editing/fit-module');
    const doc = coolerAndOpenBay();
    const two = ok(addCabinetRun(doc, { name: 'Second', profile: '30x30-s8', depth_mm: 600, height_mm: 700, seat_mm: 200, clearance_mm: 10, bays: [{ id: 'bay-c', width_mm: 400 }] }, { x: 2000, y: 0, z: 0 }));
    const open = two.doc.runs[1].bays[0].id;
    const out = ok(putModuleInBay(two.doc, 'cooler', open));
    const r = computeReport(parseFrameDocument(out.doc));
    const cooler = r.modules.find((m) => m.id === 'cooler')!;
    expect(cooler.bay_id).toBe(open);
    // On the second cabinet's seat (200) now, on two new bearers; the old ones are gone.
    expect(cooler.min_mm.z).toBe(200);
    expect(cooler.bears_on).toHaveLength(2);
    expect(r.members.map((m) => m.id)).not.toContain('bay-a-bearer-l');
    expect(r.warnings.filter((w) => w.code === 'module-unsupported')).toEqual([]);
  });
});
