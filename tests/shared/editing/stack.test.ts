import { describe, expect, it } from 'vitest';
import { moveBay } from '@shared/editing/bays';
import type { EditOutcome } from '@shared/editing/outcome';
import { addToStack, removeFromStack, swapInStack } from '@shared/editing/stack';
import { trySwapModules } from '@shared/editing/swap';
import { computeReport, type FrameReport } from '@shared/engine/report';
import { updateModule } from '@shared/editing/edits';
import { parseFrameDocument } from '@shared/model/parse';
import { addCabinetRun } from '@shared/editing/cabinet';
import { galleyDoc, galleySpec } from './cabinet-fixtures';

const ok = <X>(r: EditOutcome<X>) => {
  if (!r.ok) throw new Error(`refused: ${r.reason}`);
  return r;
};
const mod = (r: FrameReport, id: string) => r.modules.find((m) => m.id === id) as FrameReport['modules'][number];
const shelf = { name: 'Spice shelf', kind: 'shelf' as const, bearing: 'base' as const, size: { w_mm: 380, d_mm: 300, h_mm: 18 }, mass_kg: 2, contents_kg: 5 };

// The galley's first bay: a cooler on the seat (480 mm tall, from the side-galley example) with a 140 mm drawer
// on slides above it.
describe('editing a bay’s stack', () => {
  const doc = galleyDoc();
  const r0 = computeReport(doc);

  it('a shelf added above the cooler sits on members of its own, and the drawer above it moves up', () => {
    const out = ok(addToStack(doc, 'bay-cooler', shelf, { above: 'cooler' }));
    const r1 = computeReport(parseFrameDocument(out.doc));
    expect(out.doc.runs[0].bays[0]).toMatchObject({ module: 'cooler', stack: [out.moduleId, 'cooler-drawer'] });
    const s = mod(r1, out.moduleId);
    expect(s.bears_on.length).toBeGreaterThan(0);
    expect(s.min_mm.z).toBeGreaterThanOrEqual(mod(r1, 'cooler').max_mm.z);
    // The drawer rises by at least the shelf's 18 mm (plus the room under the shelf for its rails).
    expect(mod(r1, 'cooler-drawer').min_mm.z - mod(r0, 'cooler-drawer').min_mm.z).toBeGreaterThanOrEqual(18);
    expect(out.label).toBe('Add “Spice shelf” above “Compressor cooler”');
    for (const m of r1.modules) expect(m.bears_on.length, m.id).toBeGreaterThan(0);
  });

  it('one added below the cooler goes on the seat and the cooler stands on it', () => {
    const out = ok(addToStack(doc, 'bay-cooler', shelf, { below: 'cooler' }));
    const r1 = computeReport(parseFrameDocument(out.doc));
    expect(mod(r1, out.moduleId).min_mm.z).toBeCloseTo(mod(r0, 'cooler').min_mm.z, 6);
    expect(mod(r1, 'cooler').min_mm.z).toBeGreaterThan(mod(r1, out.moduleId).max_mm.z);
    for (const m of r1.modules) expect(m.bears_on.length, m.id).toBeGreaterThan(0);
  });

  it('removing the cooler brings the drawer down to the seat and takes the cooler’s members', () => {
    const out = ok(removeFromStack(doc, 'cooler'));
    const r1 = computeReport(parseFrameDocument(out.doc));
    expect(r1.modules.some((m) => m.id === 'cooler')).toBe(false);
    expect(mod(r1, 'cooler-drawer').min_mm.z).toBeCloseTo(mod(r0, 'cooler').min_mm.z, 6);
    expect(mod(r1, 'cooler-drawer').bears_on.length).toBeGreaterThan(0);
    expect(out.doc.members.some((m) => m.id === 'bay-cooler-bearer-l')).toBe(false);
    expect(out.label).toBe('Remove “Compressor cooler” from bay 1');
  });

  it('resizing the cooler moves the drawer above by the same amount', () => {
    // 480 mm → 560 mm.
    const taller = updateModule(doc, 'cooler', { size: { h_mm: 560 } });
    const r1 = computeReport(taller);
    expect(mod(r1, 'cooler-drawer').min_mm.z - mod(r0, 'cooler-drawer').min_mm.z).toBeCloseTo(80, 6);
  });

  it('two modules of one stack swap levels; twice gives the document back', () => {
    const once = ok(trySwapModules(doc, 'cooler', 'cooler-drawer'));
    const r1 = computeReport(parseFrameDocument(once.doc));
    expect(once.doc.runs[0].bays[0]).toMatchObject({ module: 'cooler-drawer', stack: ['cooler'] });
    expect(mod(r1, 'cooler-drawer').min_mm.z).toBeCloseTo(mod(r0, 'cooler').min_mm.z, 6);
    expect(mod(r1, 'cooler').min_mm.z).toBeGreaterThan(mod(r1, 'cooler-drawer').max_mm.z);
    for (const m of r1.modules) expect(m.bears_on.length, m.id).toBeGreaterThan(0);
    expect(ok(swapInStack(once.doc, 'cooler', 'cooler-drawer')).doc).toEqual(doc);
  });

  it('works on a cabinet run added beside a frame, whose datums are its own', () => {
    const base = addCabinetRun(galleyDoc(), galleySpec(), { x: 3000, y: 0, z: 0 });
    const d = ok(base).doc;
    const run = d.runs[1];
    const [a, b] = [run.bays[0].module as string, (run.bays[0].stack as string[])[0]];
    const once = ok(swapInStack(d, a, b));
    expect(computeReport(parseFrameDocument(once.doc)).modules.every((m) => m.bears_on.length > 0)).toBe(true);
    expect(ok(swapInStack(once.doc, a, b)).doc).toEqual(d);
  });

  it('names follow a reorder: the rails of the bay moved to place 3 are called bay 3', () => {
    const out = ok(moveBay(doc, 'bay-cooler', 2));
    expect(out.doc.members.find((m) => m.id === 'bay-cooler-top-f')?.name).toBe('Bay 3: top rail, front');
    expect(out.doc.members.find((m) => m.id === 'bay-tank-top-f')?.name).toBe('Bay 2: top rail, front');
  });

  it('a bay drawn by hand is refused in plain words', () => {
    const hand = { ...doc, datums: doc.datums.filter((x) => x.id !== 'seat'), members: doc.members.map((m) => (m.place.z?.datum === 'seat' ? { ...m, place: { ...m.place, z: { offset_mm: 120, align: 'max' as const } } } : m)) };
    const r = addToStack(hand, 'bay-cooler', shelf, 'top');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.reason).toMatch(/^Bay 1 was not laid out from a cabinet layout/);
  });
});
