import { describe, expect, it } from 'vitest';
import { applyChange, diffDocuments } from '@shared/editing/change';
import { moveMembers } from '@shared/editing/edits';
import { createHistory } from '@shared/editing/history';
import { twoBayDoc } from './fixtures';

describe('history', () => {
  it('a gesture of many moves is one undo step that restores the start', () => {
    const h = createHistory();
    const d0 = twoBayDoc();
    let doc = d0;
    h.begin();
    for (let k = 0; k < 5; k++) {
      const next = moveMembers(doc, new Set(['u1']), { x: 7, y: 0, z: 0 });
      h.record(diffDocuments(doc, next, 'Move'));
      doc = next;
    }
    h.end('Move upright');
    expect(h.undoLabel()).toBe('Move upright');
    const undo = h.undo()!;
    expect(applyChange(doc, undo)).toEqual(d0);
    expect(h.canUndo()).toBe(false);
    expect(applyChange(d0, h.redo()!)).toEqual(doc);
  });

  it('a new change after an undo drops the redo stack', () => {
    const h = createHistory();
    const d0 = twoBayDoc();
    const d1 = moveMembers(d0, new Set(['u1']), { x: 1, y: 0, z: 0 });
    h.record(diffDocuments(d0, d1, 'a'));
    h.undo();
    expect(h.canRedo()).toBe(true);
    h.record(diffDocuments(d0, moveMembers(d0, new Set(['u2']), { x: 1, y: 0, z: 0 }), 'b'));
    expect(h.canRedo()).toBe(false);
  });

  it('keeps at most the limit of steps', () => {
    const h = createHistory(3);
    let doc = twoBayDoc();
    for (let k = 0; k < 5; k++) {
      const next = moveMembers(doc, new Set(['u1']), { x: 1, y: 0, z: 0 });
      h.record(diffDocuments(doc, next, `m${k}`));
      doc = next;
    }
    expect([h.undo()?.label, h.undo()?.label, h.undo()?.label, h.undo()]).toEqual(['m4', 'm3', 'm2', null]);
  });
});
