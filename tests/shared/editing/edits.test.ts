import { describe, expect, it } from 'vitest';
import { addMember, arrayMembers, copyMembers, deleteItems, mirrorCopy, moveMembers, setMemberLength, shiftModule, stretchMember, swapModules, updateModule } from '@shared/editing/edits';
import { parseFrameDocument } from '@shared/model/parse';
import { box, sceneMember, sceneOf, twoBayDoc } from './fixtures';

const byId = (doc: ReturnType<typeof twoBayDoc>, id: string) => doc.members.find((m) => m.id === id)!;

describe('moving members', () => {
  it('changes offsets and keeps references, so a moved upright still follows its bay datum', () => {
    const doc = moveMembers(twoBayDoc(), new Set(['u1']), { x: 15, y: 0, z: 0 });
    expect(byId(doc, 'u1').place.x).toEqual({ datum: 'run1.u1', offset_mm: 15 });
    expect(() => parseFrameDocument(doc)).not.toThrow();
  });

  it('moves along the member’s own axis by its ends, and leaves ends attached to a moved member alone', () => {
    const doc = moveMembers(twoBayDoc(), new Set(['top', 'u0']), { x: 30, y: 0, z: 5 });
    const top = byId(doc, 'top');
    // Its start hangs off u0, which moves too: no change needed there.
    expect(top.start).toEqual({ member: 'u0', face: 'max', offset_mm: 0 });
    // Its end hangs off u2, which stays: the offset carries the move.
    expect(top.end).toEqual({ member: 'u2', face: 'min', offset_mm: 30 });
    expect(top.place.z?.offset_mm).toBe(765);
  });

  it('returns the same document for an empty move', () => {
    const d = twoBayDoc();
    expect(moveMembers(d, new Set(['u1']), { x: 0, y: 0, z: 0 })).toBe(d);
  });
});

describe('stretching and lengths', () => {
  const sm = sceneMember('u1', 'z', box(440, 0, 0, 480, 40, 800));

  it('moves the end by the difference between where it is and where it should be', () => {
    const doc = stretchMember(twoBayDoc(), sm, 'end', 900);
    expect(byId(doc, 'u1').end?.offset_mm).toBe(900);
  });

  it('attaches the end to what it snapped to', () => {
    const doc = stretchMember(twoBayDoc(), sm, 'end', 760, { member: 'top', face: 'min', offset_mm: 0 });
    expect(byId(doc, 'u1').end).toEqual({ member: 'top', face: 'min', offset_mm: 0 });
  });

  it('sets a length from the start (749.3 mm is 29 1/2 in)', () => {
    const doc = setMemberLength(twoBayDoc(), sm, 749.3);
    expect(byId(doc, 'u1').end?.offset_mm).toBeCloseTo(749.3, 6);
  });
});

describe('deleting', () => {
  it('pins what referred to a deleted member where it was, so the document stays valid', () => {
    const scene = sceneOf([sceneMember('u0', 'z', box(0, 0, 0, 40, 40, 800))]);
    const doc = deleteItems(twoBayDoc(), scene, new Set(['u0']), new Set());
    expect(doc.members.map((m) => m.id)).toEqual(['u1', 'u2', 'top']);
    expect(byId(doc, 'top').start).toEqual({ offset_mm: 40 });
    expect(() => parseFrameDocument(doc)).not.toThrow();
  });

  it('keeps a deleted module’s bay open at the width it had', () => {
    const scene = sceneOf([], { bays: [{ id: 'bay-a', run: 'run1', axis: 'x', index: 0, start_mm: 40, end_mm: 450, module: 'cooler' }] });
    const doc = deleteItems(twoBayDoc(), scene, new Set(), new Set(['cooler']));
    expect(doc.runs[0].bays[0]).toEqual({ id: 'bay-a', width_mm: 410 });
    expect(() => parseFrameDocument(doc)).not.toThrow();
  });
});

describe('copies', () => {
  it('copies point at each other’s copies and keep other references', () => {
    const { doc, ids } = copyMembers(twoBayDoc(), ['u0', 'top'], { x: 0, y: 500, z: 0 });
    expect(ids).toHaveLength(2);
    const top2 = byId(doc, ids[1]);
    expect(top2.start.member).toBe(ids[0]);
    expect(top2.end?.member).toBe('u2');
    expect(top2.place.y?.offset_mm).toBe(500);
    expect(() => parseFrameDocument(doc)).not.toThrow();
  });

  it('an array of 3 at 100 mm gives copies 100, 200 and 300 mm on', () => {
    const { doc, ids } = arrayMembers(twoBayDoc(), ['u1'], 3, 100, 'y');
    expect(ids.map((id) => byId(doc, id).place.y?.offset_mm)).toEqual([100, 200, 300]);
  });

  it('mirrors across a plane: a member at 0–40 mirrored about 500 lands at 960–1000', () => {
    const scene = sceneOf([sceneMember('u0', 'z', box(0, 0, 0, 40, 40, 800))]);
    const { doc, ids } = mirrorCopy(twoBayDoc(), scene, ['u0'], 'x', 500);
    expect(byId(doc, ids[0]).place.x).toEqual({ offset_mm: 960 });
    expect(() => parseFrameDocument(doc)).not.toThrow();
  });

  it('adds a drawn member attached to the faces it snapped to', () => {
    const { doc, id } = addMember(twoBayDoc(), {
      axis: 'x',
      profile: '40x40-s8',
      start: { value: 40, ref: { member: 'u0', face: 'max', offset_mm: 0 } },
      end: { value: 440, ref: { member: 'u1', face: 'min', offset_mm: 0 } },
      place: { y: 0, z: 300 },
    });
    const m = byId(doc, id);
    expect(m.axis).toBe('x');
    expect(m.start).toEqual({ member: 'u0', face: 'max', offset_mm: 0 });
    expect(m.place.z).toEqual({ offset_mm: 300 });
    expect(() => parseFrameDocument(doc)).not.toThrow();
  });
});

describe('modules', () => {
  it('swapping reorders the bays and touches no member', () => {
    const before = twoBayDoc();
    const after = swapModules(before, 'cooler', 'drawers');
    expect(after.runs[0].bays.map((b) => b.id)).toEqual(['bay-b', 'bay-a']);
    expect(after.members).toBe(before.members);
  });

  it('swapping twice gives back the first order', () => {
    const d = twoBayDoc();
    expect(swapModules(swapModules(d, 'cooler', 'drawers'), 'drawers', 'cooler').runs).toEqual(d.runs);
  });

  it('shifts a module one bay along and stops at the run’s end', () => {
    const d = twoBayDoc();
    expect(shiftModule(d, 'cooler', 1).runs[0].bays.map((b) => b.module)).toEqual(['drawers', 'cooler']);
    expect(shiftModule(d, 'cooler', -1)).toBe(d);
  });

  it('resizes a module', () => {
    const d = updateModule(twoBayDoc(), 'cooler', { size: { w_mm: 450 } });
    expect(d.modules[0].size).toEqual({ w_mm: 450, d_mm: 500, h_mm: 500 });
  });
});
