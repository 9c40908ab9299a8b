import { invertChange, isEmptyChange, mergeChanges, type Change } from './change';

/**
 * Undo and redo as two stacks of changes. A gesture (a drag, a typed value that is corrected as you type) opens
 * with `begin()`; everything recorded until `end()` becomes one undo step.
 */
export type History = {
  record(change: Change): void;
  begin(): void;
  end(label?: string): void;
  /** The change that undoes the last step (already removed from the undo stack), or null. */
  undo(): Change | null;
  redo(): Change | null;
  canUndo(): boolean;
  canRedo(): boolean;
  undoLabel(): string | null;
  redoLabel(): string | null;
  clear(): void;
};

export function createHistory(limit = 200): History {
  let done: Change[] = [];
  let undone: Change[] = [];
  let open: Change | null = null;
  let depth = 0;

  const push = (c: Change) => {
    if (isEmptyChange(c)) return;
    done.push(c);
    if (done.length > limit) done = done.slice(done.length - limit);
    undone = [];
  };

  return {
    record(change) {
      if (depth > 0) open = open ? mergeChanges(open, change, open.label) : change;
      else push(change);
    },
    begin() {
      depth += 1;
    },
    end(label) {
      if (depth === 0) return;
      depth -= 1;
      if (depth === 0 && open) {
        push(label ? { ...open, label } : open);
        open = null;
      }
    },
    undo() {
      const c = done.pop();
      if (!c) return null;
      undone.push(c);
      return invertChange(c);
    },
    redo() {
      const c = undone.pop();
      if (!c) return null;
      done.push(c);
      return c;
    },
    canUndo: () => done.length > 0,
    canRedo: () => undone.length > 0,
    undoLabel: () => done[done.length - 1]?.label ?? null,
    redoLabel: () => undone[undone.length - 1]?.label ?? null,
    clear() {
      done = [];
      undone = [];
      open = null;
      depth = 0;
    },
  };
}
