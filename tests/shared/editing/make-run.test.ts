import { describe, expect, it } from 'vitest';
import { addBay, removeBay } from '@shared/editing/bays';
import { trySwapModules } from '@shared/editing/swap';
import { layoutOf } from '@shared/editing/layout';
import { makeRunFromMembers } from '@shared/editing/make-run';
import type { EditOutcome } from '@shared/editing/outcome';
import { seatModule, snapModule } from '@shared/editing/seat';
import { computeReport, type FrameReport } from '@shared/engine/report';
import { frameDocumentSchema, type FrameDocument } from '@shared/model/frame-document';
import type { MemberInput } from '@shared/model/member';
import type { ModuleInput } from '@shared/model/module';
import { parseFrameDocument } from '@shared/model/parse';

const ok = <X>(r: EditOutcome<X>) => {
  if (!r.ok) throw new Error(`refused: ${r.reason}`);
  return r;
};
const member = (r: FrameReport, id: string) => r.members.find((m) => m.id === id) as FrameReport['members'][number];

/**
 * Drawn by hand as a new builder would, with typed positions and faces snapped to faces: uprights (40×40, 800 tall)
 * at the given x positions, front (y 0) and back (y 460); in each opening rails front and back at the top and at
 * 100–140 mm, hung off the uprights' faces, and two bearers across at 140 mm.
 */
function handDrawn(xs: number[], modules: ModuleInput[] = [], profile = (_k: number) => '40x40-s8'): FrameDocument {
  const members: MemberInput[] = [];
  xs.forEach((x, k) => {
    for (const [side, y] of [
      ['f', 0],
      ['b', 460],
    ] as const) {
      members.push({ type: 'member', id: `u${k}${side}`, profile: profile(k), axis: 'z', start: { offset_mm: 0 }, end: { offset_mm: 800 }, place: { x: { offset_mm: x }, y: { offset_mm: y } } });
    }
  });
  for (let k = 0; k + 1 < xs.length; k++) {
    for (const [side, y] of [
      ['f', 0],
      ['b', 460],
    ] as const) {
      for (const [level, z] of [
        ['top', 760],
        ['low', 100],
      ] as const) {
        members.push({ type: 'member', id: `r${k}${side}-${level}`, profile: '40x40-s8', axis: 'x', start: { member: `u${k}${side}`, face: 'max' }, end: { member: `u${k + 1}${side}`, face: 'min' }, place: { y: { offset_mm: y }, z: { offset_mm: z } } });
      }
    }
    const x0 = xs[k] + 40;
    const x1 = xs[k + 1];
    for (const [side, x] of [
      ['l', x0 + 20],
      ['r', x1 - 60],
    ] as const) {
      members.push({ type: 'member', id: `b${k}${side}`, profile: '40x40-s8', axis: 'y', start: { member: `r${k}f-low`, face: 'max' }, end: { member: `r${k}b-low`, face: 'min' }, place: { x: { offset_mm: x }, z: { offset_mm: 100 } } });
    }
  }
  return frameDocumentSchema.parse({ schemaVersion: 1, name: 'By hand', members, modules });
}

const fridge = (x: number, z = 140): ModuleInput => ({
  type: 'module',
  id: 'module-1',
  name: 'Camp fridge',
  kind: 'appliance',
  bearing: 'base',
  size: { w_mm: 400, d_mm: 400, h_mm: 450 },
  mass_kg: 20,
  contents_kg: 15,
  place: { x: { offset_mm: x }, y: { offset_mm: 40 }, z: { offset_mm: z } },
});

describe('making bays from hand-drawn uprights', () => {
  it('turns a row of four uprights into a one-bay run that re-lays when its module is resized', () => {
    // Opening 40 … 500 (460 wide); the fridge (400) centred in it at 70 … 470.
    const doc = handDrawn([0, 500], [fridge(70)]);
    const r0 = computeReport(doc);
    const ids = doc.members.filter((m) => m.axis === 'z').map((m) => m.id);
    const out = ok(makeRunFromMembers(doc, ids, 'Cooler cabinet'));
    const next = parseFrameDocument(out.doc);
    const r1 = computeReport(next);
    expect(out.notes).toEqual([]);
    expect(next.runs[0]).toMatchObject({ axis: 'x', upright_mm: 40, bays: [{ module: 'module-1', clearance_mm: 30 }] });
    // Nothing moves in the conversion itself.
    for (const m of r0.members) expect(member(r1, m.id).min_mm).toEqual(m.min_mm);
    expect(r1.modules[0].min_mm).toEqual(r0.modules[0].min_mm);
    expect(r1.modules[0].bears_on.map((c) => c.member_id)).toEqual(['b0l', 'b0r']);
    // A wider fridge (450): the right uprights move 50 mm, the rails are 50 mm longer, the right bearer follows.
    const wider = { ...next, modules: next.modules.map((m) => ({ ...m, size: { ...m.size, w_mm: 450 } })) };
    const r2 = computeReport(wider);
    expect(member(r2, 'u1f').min_mm.x).toBe(550);
    expect(member(r2, 'r0b-top').cut_length_mm).toBe(member(r1, 'r0b-top').cut_length_mm + 50);
    expect(member(r2, 'b0r').min_mm.x).toBe(member(r1, 'b0r').min_mm.x + 50);
    expect(r2.modules[0].bears_on.map((c) => c.member_id)).toEqual(['b0l', 'b0r']);
  });

  it('makes two bays from three pairs of uprights, so that their modules can be swapped', () => {
    const tank: ModuleInput = { ...fridge(560), id: 'module-2', name: 'Water tank', kind: 'tank', size: { w_mm: 300, d_mm: 400, h_mm: 300 }, mass_kg: 3, litres: 30, contents_kg: 0 };
    const doc = handDrawn([0, 500, 900], [fridge(70), { ...tank, place: { ...tank.place, x: { offset_mm: 570 } } }]);
    const out = ok(makeRunFromMembers(doc, doc.members.map((m) => m.id)));
    const swapped = ok(trySwapModules(out.doc, 'module-1', 'module-2'));
    const r = computeReport(swapped.doc);
    // Tank bay first: 40 + (300 + 2 × 30) = 400, so the middle uprights move from 500 to 400.
    expect(member(r, 'u1f').min_mm.x).toBe(400);
    expect(member(r, 'u2b').min_mm.x).toBe(900);
    for (const m of r.modules) expect(m.bears_on.length, m.id).toBe(2);
    expect(swapped.label).toBe('Swap “Camp fridge” and “Water tank”');
  });

  it('then takes bay edits like a layout: a bay added at the end gets uprights and rails, a removed one takes its own', () => {
    const doc = handDrawn([0, 500, 900], [fridge(70)]);
    const run = ok(makeRunFromMembers(doc, doc.members.map((m) => m.id)));
    const r0 = computeReport(run.doc);
    const added = ok(addBay(run.doc, run.runId, 'end'));
    const r1 = computeReport(parseFrameDocument(added.doc));
    const fresh = r1.members.filter((m) => !r0.members.some((o) => o.id === m.id));
    // Copies of the last boundary's two uprights and of the neighbour's four rails (its bearers carry nothing).
    expect(fresh.map((m) => m.role).sort()).toEqual(['rail', 'rail', 'rail', 'rail', 'upright', 'upright']);
    // The neighbour's opening was 900 − 540 = 360; the new uprights stand 360 + 40 beyond the last ones.
    for (const m of fresh.filter((x) => x.role === 'upright')) expect(m.min_mm.x).toBe(900 + 40 + 360);
    const removed = ok(removeBay(run.doc, run.doc.runs[0].bays[0].id));
    const r2 = computeReport(parseFrameDocument(removed.doc));
    // Bay 1 goes with its fridge, its rails and bearers and the middle uprights; the second opening closes up.
    expect(removed.removedMembers.sort()).toEqual(['b0l', 'b0r', 'r0b-low', 'r0b-top', 'r0f-low', 'r0f-top', 'u1b', 'u1f']);
    expect(r2.modules).toEqual([]);
    expect(member(r2, 'u2f').min_mm.x).toBe(40 + 360);
  });

  it('says what it leaves as it was, and refuses a row that cannot be a run', () => {
    const doc = handDrawn([0, 500], [{ ...fridge(20), size: { w_mm: 520, d_mm: 400, h_mm: 450 } }]);
    const out = ok(makeRunFromMembers(doc, ['u0f', 'u0b', 'u1f', 'u1b']));
    expect(out.notes).toEqual(['“Camp fridge” is wider than its opening; it stands free as before.']);
    const mixed = handDrawn([0, 500], [], (k) => (k === 1 ? '30x30-s8' : '40x40-s8'));
    const r = makeRunFromMembers(mixed, ['u0f', 'u0b', 'u1f', 'u1b']);
    expect(r.ok ? '' : r.reason).toMatch(/^The uprights are not all one size along the row \(30 mm, 40 mm\)/);
    const one = makeRunFromMembers(doc, ['u0f']);
    expect(one.ok ? '' : one.reason).toMatch(/^Pick at least two uprights/);
  });
});

describe('seating a module on a hand-drawn frame', () => {
  it('snaps its base onto the bearers and attaches it there, so its load is on them', () => {
    // Dropped 6 mm above the bearers' tops (146 instead of 140): out of bearing reach, inside a 10 mm snap.
    const doc = handDrawn([0, 500], [fridge(70, 146)]);
    const before = computeReport(doc);
    expect(before.modules[0].bears_on).toEqual([]);
    const warning = before.warnings.find((w) => w.code === 'module-unsupported')?.message ?? '';
    expect(warning).toMatch(/^“Camp fridge” sits on no member, so its weight is not checked: /);
    expect(warning).not.toMatch(/module-1|bearsOn/);
    const { scene } = layoutOf(doc);
    const box = scene.modules[0].box;
    const snaps = snapModule(scene, 'module-1', box, 10);
    const z = snaps.find((s) => s.axis === 'z');
    expect(z).toMatchObject({ side: 'min', low_mm: 140, moved_mm: -6, target: { kind: 'member' } });
    const seated = ok(seatModule(doc, 'module-1', snaps.filter((s) => s.axis === 'z'))).doc;
    const r = computeReport(parseFrameDocument(seated));
    expect(r.modules[0].min_mm.z).toBe(140);
    expect(r.modules[0].bears_on.map((c) => c.member_id)).toEqual(['b0l', 'b0r']);
    // Its weight is on the bearers now: each one is checked.
    for (const id of ['b0l', 'b0r']) expect(r.loads.members.find((c) => c.member_id === id)?.utilisation).toBeGreaterThan(0);
  });

  it('finds bearing within a few millimetres, not beyond (3 mm, common practice, no source)', () => {
    const at = (z: number) => computeReport(handDrawn([0, 500], [fridge(70, z)])).modules[0].bears_on.length;
    expect(at(140)).toBe(2);
    expect(at(142.5)).toBe(2);
    expect(at(137.5)).toBe(2);
    expect(at(144)).toBe(0);
  });
});
