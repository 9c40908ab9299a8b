import { describe, expect, it } from 'vitest';
import { applyChange } from '@shared/editing/change';
import { sceneFromReport } from '@shared/editing/scene-from-report';
import { VIEWS } from '@shared/editing/views';
import { computeReport } from '@shared/engine/report';
import { demoFrameDocument } from '@shared/model/demo-frame';
import { parseFrameDocument } from '@shared/model/parse';
import { commandById, commandForKey, COMMANDS, type CommandState, type CommandUi } from '@/editor/commands';

const doc = demoFrameDocument();
const scene = sceneFromReport(doc, computeReport(doc));

function state(over: Partial<CommandState> = {}): CommandState {
  return {
    doc,
    scene,
    selection: { members: [], modules: [] },
    readOnly: false,
    view: VIEWS.front,
    canUndo: false,
    canRedo: false,
    gridStep: 10,
    tool: 'select',
    ...over,
  };
}

const calls: string[] = [];
const ui: CommandUi = {
  undo: () => calls.push('undo'),
  redo: () => calls.push('redo'),
  zoomToFit: () => calls.push('fit'),
  zoomBy: () => calls.push('zoom'),
  showHelp: () => calls.push('help'),
  setTool: (id) => calls.push(`tool:${id}`),
  setView: (id) => calls.push(`view:${id}`),
  openArray: () => calls.push('array'),
  select: () => calls.push('select'),
};

const key = (k: string, mods: { ctrl?: boolean; shift?: boolean; alt?: boolean } = {}) =>
  commandForKey({ key: k, ctrlKey: !!mods.ctrl, metaKey: false, shiftKey: !!mods.shift, altKey: !!mods.alt });

describe('the command list', () => {
  it('gives every command a distinct id and every shortcut to one command only', () => {
    expect(new Set(COMMANDS.map((c) => c.id)).size).toBe(COMMANDS.length);
    const seen = new Map<string, string>();
    for (const c of COMMANDS) {
      for (const s of c.shortcuts) {
        const k = `${s.mod ? 'mod+' : ''}${s.shift ? 'shift+' : ''}${s.alt ? 'alt+' : ''}${s.key.toLowerCase()}`;
        expect(seen.get(k), `${k} is used by ${seen.get(k)} and ${c.id}`).toBeUndefined();
        seen.set(k, c.id);
      }
    }
  });

  it('maps the keys builders expect', () => {
    expect(key('z', { ctrl: true })?.id).toBe('undo');
    expect(key('Z', { ctrl: true, shift: true })?.id).toBe('redo');
    expect(key('Delete')?.id).toBe('delete');
    expect(key('ArrowLeft', { shift: true })?.id).toBe('nudge-left-far');
    expect(key('d')?.id).toBe('tool-draw');
    expect(key('d', { ctrl: true })?.id).toBe('duplicate');
    expect(key('?', { shift: true })?.id).toBe('help');
    expect(key('q')).toBeNull();
  });

  it('offers no edits to a read-only viewer', () => {
    const s = state({ readOnly: true, selection: { members: ['galley-u1-f'], modules: [] } });
    for (const c of COMMANDS.filter((x) => x.edits)) expect(c.enabled(s), c.id).toBe(false);
    expect(commandById('zoom-fit').enabled(s)).toBe(true);
  });

  it('nudges the selection one step to the right in the front view', () => {
    const s = state({ selection: { members: ['galley-u1-f'], modules: [] } });
    const change = commandById('nudge-right').run(s, ui)!;
    const after = applyChange(doc, change);
    const before = doc.members.find((m) => m.id === 'galley-u1-f')!.place.x!.offset_mm;
    expect(after.members.find((m) => m.id === 'galley-u1-f')!.place.x!.offset_mm).toBe(before + 10);
  });

  it('swaps two selected modules by reordering their bays; members stay as they are but for names that say their bay', () => {
    const s = state({ selection: { members: [], modules: ['cooler', 'tank'] } });
    expect(commandById('swap-modules').enabled(s)).toBe(true);
    const after = applyChange(doc, commandById('swap-modules').run(s, ui)!);
    expect(after.runs[0].bays.map((b) => b.module)).toEqual(['pantry', 'tank', 'cooler', 'cooktop']);
    expect(after.members.map(({ name: _n, ...m }) => m)).toEqual(doc.members.map(({ name: _n, ...m }) => m));
    expect(after.members.find((m) => m.id === 'bay-cooler-top-f')?.name).toBe('Bay 3: top rail, front');
  });

  it('deletes, duplicates and mirrors into documents the model accepts', () => {
    const s = state({ selection: { members: ['galley-u1-f', 'bay-cooler-low-f'], modules: ['cooler'] } });
    for (const id of ['delete', 'duplicate', 'mirror']) {
      const change = commandById(id).run(s, ui);
      expect(change, id).not.toBeNull();
      expect(() => parseFrameDocument(applyChange(doc, change!)), id).not.toThrow();
    }
  });

  it('view commands act on the view and change nothing', () => {
    calls.length = 0;
    expect(commandById('zoom-fit').run(state(), ui)).toBeNull();
    expect(commandById('view-top').run(state(), ui)).toBeNull();
    expect(calls).toEqual(['fit', 'view:top']);
  });
});
