import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyChange, diffDocuments, invertChange, mergeChanges } from '@shared/editing/change';
import { deleteItems, moveMembers, swapModules } from '@shared/editing/edits';
import { twoBayDoc } from './fixtures';

describe('changes', () => {
  it('a diff applied to the old document gives the new one, and its inverse gives the old one back', () => {
    const before = twoBayDoc();
    const after = moveMembers(before, new Set(['u1']), { x: 25, y: 0, z: -10 });
    const change = diffDocuments(before, after, 'Move');
    expect(change.ops).toHaveLength(1);
    expect(applyChange(before, change)).toEqual(after);
    expect(applyChange(after, invertChange(change))).toEqual(before);
  });

  it('undoing a deletion puts the records back where they stood in their lists', () => {
    const before = twoBayDoc();
    const scene = { members: [], modules: [], bays: [], bounds: null, cog: null };
    const after = deleteItems(before, scene, new Set(['u0', 'u2']), new Set());
    const change = diffDocuments(before, after, 'Delete');
    const undone = applyChange(after, invertChange(change));
    expect(undone.members.map((m) => m.id)).toEqual(['u0', 'u1', 'u2', 'top']);
    expect(undone).toEqual(before);
  });

  it('leaves untouched lists shared with the input', () => {
    const before = twoBayDoc();
    const after = applyChange(before, diffDocuments(before, swapModules(before, 'cooler', 'drawers'), 'Swap'));
    expect(after.members).toBe(before.members);
    expect(after.runs).not.toBe(before.runs);
  });

  it('merging the steps of a drag keeps the first "before" and the last "after"', () => {
    const d0 = twoBayDoc();
    const d1 = moveMembers(d0, new Set(['u1']), { x: 10, y: 0, z: 0 });
    const d2 = moveMembers(d1, new Set(['u1']), { x: 10, y: 0, z: 0 });
    const merged = mergeChanges(diffDocuments(d0, d1, 'Move'), diffDocuments(d1, d2, 'Move'));
    expect(merged.ops).toHaveLength(1);
    expect(applyChange(d0, merged)).toEqual(d2);
    expect(applyChange(d2, invertChange(merged))).toEqual(d0);
  });

  it('a record created and then deleted within one merged change leaves no trace', () => {
    const d0 = twoBayDoc();
    const extra = { ...d0.members[1], id: 'tmp' };
    const d1 = { ...d0, members: [...d0.members, extra] };
    const merged = mergeChanges(diffDocuments(d0, d1, 'Add'), diffDocuments(d1, d0, 'Remove'));
    expect(merged.ops).toEqual([]);
  });

  it('apply then invert is the identity for any sequence of moves', () => {
    const ids = ['u0', 'u1', 'u2', 'top'];
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.constantFrom(...ids), fc.integer({ min: -500, max: 500 }), fc.integer({ min: -500, max: 500 })), { minLength: 1, maxLength: 8 }),
        (moves) => {
          const d0 = twoBayDoc();
          let doc = d0;
          let change = { label: 'x', ops: [] as ReturnType<typeof diffDocuments>['ops'] };
          for (const [id, dx, dz] of moves) {
            const next = moveMembers(doc, new Set([id]), { x: dx, y: 0, z: dz });
            change = mergeChanges(change, diffDocuments(doc, next, 'Move'));
            doc = next;
          }
          expect(applyChange(d0, change)).toEqual(doc);
          expect(applyChange(doc, invertChange(change))).toEqual(d0);
        },
      ),
      { numRuns: 100 },
    );
  });
});
