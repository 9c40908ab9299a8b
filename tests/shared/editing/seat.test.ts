import { describe, expect, it } from 'vitest';
import { layoutOf } from '@shared/editing/layout';
import type { EditOutcome } from '@shared/editing/outcome';
import { bearingMembers, seatModule, setBearing, setModulePosition, snapModule } from '@shared/editing/seat';
import type { Box } from '@shared/engine/box';
import { computeReport } from '@shared/engine/report';
import { parseFrameDocument } from '@shared/model/parse';
import { coolerAndOpenBay, galleyDoc } from './cabinet-fixtures';

const ok = <X>(r: EditOutcome<X>) => {
  if (!r.ok) throw new Error(`refused: ${r.reason}`);
  return r;
};
const shifted = (b: Box, dz: number, dx = 0): Box => ({ min: [b.min[0] + dx, b.min[1], b.min[2] + dz], max: [b.max[0] + dx, b.max[1], b.max[2] + dz] });

describe('snapping a module', () => {
  it('snaps its base onto another module’s top when that is the nearest face (a box on the tank)', () => {
    const doc = galleyDoc();
    const { scene } = layoutOf(doc);
    const tank = scene.modules.find((m) => m.id === 'tank')!;
    const shelf = scene.modules.find((m) => m.id === 'shelf')!;
    // Shelf lowered to 4 mm above the tank's top (420): nearer the tank than its rails (470).
    const snaps = snapModule(scene, 'shelf', shifted(shelf.box, tank.box.max[2] + 4 - shelf.box.min[2]), 8, ['z']);
    expect(snaps).toHaveLength(1);
    expect(snaps[0]).toMatchObject({ side: 'min', low_mm: 420, target: { kind: 'module', id: 'tank' }, ref: null, label: 'top of Fresh water tank 25 L' });
  });

  it('snaps a side against an upright’s face and gives the face as the cue', () => {
    const doc = coolerAndOpenBay();
    const { scene } = layoutOf(doc);
    const cooler = scene.modules[0];
    // The cooler's left side 7 mm right of the first upright's inner face (x = 40).
    const box = shifted(cooler.box, 0, 40 + 7 - cooler.box.min[0]);
    const [x] = snapModule(scene, 'cooler', box, 10, ['x']);
    expect(x).toMatchObject({ axis: 'x', side: 'min', low_mm: 40, moved_mm: -7, target: { kind: 'member' } });
    expect(x.cue.min[0]).toBe(40);
    expect(x.cue.max[0]).toBe(40);
  });

  it('finds nothing beyond the tolerance', () => {
    const { scene } = layoutOf(coolerAndOpenBay());
    const cooler = scene.modules[0];
    expect(snapModule(scene, 'cooler', shifted(cooler.box, 30), 10, ['z'])).toEqual([]);
  });
});

describe('seating, position fields and bearing in words', () => {
  it('a snap to a rail’s underside hangs the module there, top aligned', () => {
    const doc = coolerAndOpenBay();
    const out = ok(seatModule(doc, 'cooler', [{ axis: 'z', side: 'max', low_mm: 0, moved_mm: 0, ref: { member: 'bay-a-top-f', face: 'min', offset_mm: 0 }, target: { kind: 'member', id: 'bay-a-top-f' }, cue: { min: [0, 0, 0], max: [0, 0, 0] }, label: '' }]));
    const r = computeReport(parseFrameDocument(out.doc));
    // Top rail 860 … 900: the cooler's top at 860.
    expect(r.modules[0].max_mm.z).toBe(860);
    expect(out.doc.modules[0].place.z).toEqual({ member: 'bay-a-top-f', face: 'min', offset_mm: 0, align: 'max' });
  });

  it('moves by a typed position keeping what it is placed against; along its run the bay decides, and says so', () => {
    const doc = coolerAndOpenBay();
    const { scene } = layoutOf(doc);
    const up = ok(setModulePosition(doc, scene, 'cooler', 'z', 150));
    expect(up.doc.modules[0].place.z).toEqual({ datum: 'seat', offset_mm: 30 });
    const along = setModulePosition(doc, scene, 'cooler', 'x', 300);
    expect(along.ok ? '' : along.reason).toMatch(/^“Camp cooler” sits in a bay, which places it along the run/);
  });

  it('chooses how a module bears in words, and lists the members it bears on with their loads', () => {
    const doc = coolerAndOpenBay();
    expect(ok(setBearing(doc, 'cooler', 'hung')).label).toBe('“Camp cooler” hangs from the members over it');
    const r = computeReport(doc);
    const list = bearingMembers(r, 'cooler');
    expect(list.map((m) => [m.member_id, m.name, m.face])).toEqual([
      ['bay-a-bearer-l', 'Bay 1: bearer, left', 'top'],
      ['bay-a-bearer-r', 'Bay 1: bearer, right', 'top'],
    ]);
    for (const m of list) {
      expect(m.utilisation).toBeGreaterThan(0);
      expect(m.deflection_mm).toBeGreaterThan(0);
    }
  });
});
