import { diffDocuments, type Change } from '@shared/editing/change';
import { bayOfModule, copyMembers, deleteItems, mirrorCopy, moveMembers, moveModules, shiftModule } from '@shared/editing/edits';
import type { Scene } from '@shared/editing/scene';
import { viewDelta, type ViewDef, type ViewId } from '@shared/editing/views';
import { AXIS_INDEX } from '@shared/model/axis';
import type { FrameDocument } from '@shared/model/frame-document';
import type { Selection } from '@/stores/document';
import { swapPicked } from './module-moves';
import type { ToolId } from './tools/tool';

/** What commands read: the document, the scene, the selection and the view they act in. */
export type CommandState = {
  doc: FrameDocument | null;
  scene: Scene;
  selection: Selection;
  readOnly: boolean;
  view: ViewDef;
  canUndo: boolean;
  canRedo: boolean;
  gridStep: number;
  tool: ToolId;
};

/** What commands may do besides changing the document. */
export type CommandUi = {
  undo(): void;
  redo(): void;
  zoomToFit(): void;
  zoomBy(factor: number): void;
  showHelp(): void;
  setTool(id: ToolId): void;
  setView(id: ViewId): void;
  openArray(): void;
  /** Open the duplicate dialog (copy at a typed offset). */
  openDuplicate?(): void;
  select(next: Selection): void;
  /** Say in plain words why a command did nothing (a swap with one module picked, say). */
  refuse?(label: string, reason: string): void;
};

export type Shortcut = { key: string; mod?: boolean; shift?: boolean; alt?: boolean };

export type CommandGroup = 'Edit' | 'Modules' | 'Select' | 'View' | 'Tools';

/**
 * A command as data: the toolbar, the keyboard and the help dialog all read this one list. `run` returns the
 * change to apply (the host applies it through the document store) or null when the command acts on the view.
 */
export type Command = {
  id: string;
  label: string;
  group: CommandGroup;
  shortcuts: Shortcut[];
  /** Changes the document (hidden or disabled when read-only). */
  edits: boolean;
  /** Show what a re-lay did to the parts. */
  summarise?: boolean;
  enabled(s: CommandState): boolean;
  run(s: CommandState, ui: CommandUi): Change | null;
};

const hasSelection = (s: CommandState) => s.selection.members.length + s.selection.modules.length > 0;
const writable = (s: CommandState) => !s.readOnly && s.doc !== null;
const change = (s: CommandState, label: string, f: (d: FrameDocument) => FrameDocument): Change | null =>
  s.doc ? diffDocuments(s.doc, f(s.doc), label) : null;

const countLabel = (s: CommandState): string => {
  const n = s.selection.members.length + s.selection.modules.length;
  return n === 1 ? (s.selection.members.length ? 'member' : 'module') : `${n} items`;
};

function nudge(id: string, label: string, key: string, dh: number, dv: number, big: boolean): Command {
  return {
    id,
    label,
    group: 'Edit',
    shortcuts: [{ key, shift: big }],
    edits: true,
    enabled: (s) => writable(s) && hasSelection(s),
    run: (s) => {
      const k = big ? 10 : 1;
      const d = viewDelta(s.view, dh * s.gridStep * k, dv * s.gridStep * k);
      return change(s, `Nudge ${countLabel(s)}`, (doc) =>
        moveModules(moveMembers(doc, new Set(s.selection.members), d), new Set(s.selection.modules), d),
      );
    },
  };
}

/** The bay module picked, when exactly one is. */
function oneBayModule(s: CommandState): string | null {
  if (s.selection.modules.length !== 1 || s.selection.members.length > 0 || !s.doc) return null;
  return bayOfModule(s.doc, s.selection.modules[0]) ? s.selection.modules[0] : null;
}

function stepThrough(s: CommandState, ui: CommandUi, step: 1 | -1): null {
  const ids = s.scene.members.map((m) => m.id);
  if (ids.length === 0) return null;
  const current = s.selection.members.length === 1 ? ids.indexOf(s.selection.members[0]) : -1;
  const next = current < 0 ? (step === 1 ? 0 : ids.length - 1) : (current + step + ids.length) % ids.length;
  ui.select({ members: [ids[next]], modules: [] });
  return null;
}

const moduleName = (s: CommandState, id: string) => s.scene.modules.find((m) => m.id === id)?.name ?? id;

export const COMMANDS: readonly Command[] = [
  {
    id: 'undo',
    label: 'Undo',
    group: 'Edit',
    shortcuts: [{ key: 'z', mod: true }],
    edits: true,
    enabled: (s) => writable(s) && s.canUndo,
    run: (_s, ui) => (ui.undo(), null),
  },
  {
    id: 'redo',
    label: 'Redo',
    group: 'Edit',
    shortcuts: [
      { key: 'z', mod: true, shift: true },
      { key: 'y', mod: true },
    ],
    edits: true,
    enabled: (s) => writable(s) && s.canRedo,
    run: (_s, ui) => (ui.redo(), null),
  },
  {
    id: 'delete',
    label: 'Delete',
    group: 'Edit',
    shortcuts: [{ key: 'Delete' }, { key: 'Backspace' }],
    edits: true,
    enabled: (s) => writable(s) && hasSelection(s),
    run: (s) =>
      change(s, `Delete ${countLabel(s)}`, (doc) => deleteItems(doc, s.scene, new Set(s.selection.members), new Set(s.selection.modules))),
  },
  {
    id: 'duplicate',
    label: 'Duplicate…',
    group: 'Edit',
    shortcuts: [{ key: 'd', mod: true }],
    edits: true,
    enabled: (s) => writable(s) && s.selection.members.length > 0,
    run: (s, ui) => {
      // With the editor's dialog: copies at a typed offset (in place by default). Without it, beside the original.
      if (ui.openDuplicate) return (ui.openDuplicate(), null);
      const d = viewDelta(s.view, 100, 0);
      return change(s, `Duplicate ${countLabel(s)}`, (doc) => copyMembers(doc, s.selection.members, d).doc);
    },
  },
  {
    id: 'mirror',
    label: 'Mirror copy across the centre',
    group: 'Edit',
    shortcuts: [{ key: 'm' }],
    edits: true,
    enabled: (s) => writable(s) && s.selection.members.length > 0 && s.scene.bounds !== null,
    run: (s) => {
      const b = s.scene.bounds;
      if (!b) return null;
      const k = AXIS_INDEX[s.view.h];
      const centre = (b.min[k] + b.max[k]) / 2;
      return change(s, `Mirror ${countLabel(s)}`, (doc) => mirrorCopy(doc, s.scene, s.selection.members, s.view.h, centre).doc);
    },
  },
  {
    id: 'array',
    label: 'Array copies…',
    group: 'Edit',
    shortcuts: [{ key: 'a' }],
    edits: true,
    enabled: (s) => writable(s) && s.selection.members.length > 0,
    run: (_s, ui) => (ui.openArray(), null),
  },
  nudge('nudge-left', 'Nudge left', 'ArrowLeft', -1, 0, false),
  nudge('nudge-right', 'Nudge right', 'ArrowRight', 1, 0, false),
  nudge('nudge-up', 'Nudge up', 'ArrowUp', 0, 1, false),
  nudge('nudge-down', 'Nudge down', 'ArrowDown', 0, -1, false),
  nudge('nudge-left-far', 'Nudge left ×10', 'ArrowLeft', -1, 0, true),
  nudge('nudge-right-far', 'Nudge right ×10', 'ArrowRight', 1, 0, true),
  nudge('nudge-up-far', 'Nudge up ×10', 'ArrowUp', 0, 1, true),
  nudge('nudge-down-far', 'Nudge down ×10', 'ArrowDown', 0, -1, true),
  {
    id: 'swap-modules',
    label: 'Swap the two modules',
    group: 'Modules',
    shortcuts: [{ key: 's' }],
    edits: true,
    summarise: true,
    // Always offered: with the wrong things picked it says what to pick rather than doing nothing silently.
    enabled: (s) => writable(s) && s.scene.modules.length > 0,
    run: (s, ui) => {
      if (!s.doc) return null;
      const r = swapPicked(s.doc, s.scene, s.selection.modules);
      if (!r.ok) {
        ui.refuse?.('Swap modules', r.reason);
        return null;
      }
      return diffDocuments(s.doc, r.doc, r.label);
    },
  },
  {
    id: 'module-back',
    label: 'Move module one bay back along the run',
    group: 'Modules',
    shortcuts: [{ key: '[' }],
    edits: true,
    summarise: true,
    enabled: (s) => writable(s) && oneBayModule(s) !== null,
    run: (s) => {
      const id = oneBayModule(s) as string;
      return change(s, `Move ${moduleName(s, id)} one bay back`, (doc) => shiftModule(doc, id, -1));
    },
  },
  {
    id: 'module-on',
    label: 'Move module one bay on along the run',
    group: 'Modules',
    shortcuts: [{ key: ']' }],
    edits: true,
    summarise: true,
    enabled: (s) => writable(s) && oneBayModule(s) !== null,
    run: (s) => {
      const id = oneBayModule(s) as string;
      return change(s, `Move ${moduleName(s, id)} one bay on`, (doc) => shiftModule(doc, id, 1));
    },
  },
  {
    id: 'select-all',
    label: 'Select all members',
    group: 'Select',
    shortcuts: [{ key: 'a', mod: true }],
    edits: false,
    enabled: (s) => s.scene.members.length > 0,
    run: (s, ui) => (ui.select({ members: s.scene.members.map((m) => m.id), modules: [] }), null),
  },
  {
    id: 'select-none',
    label: 'Clear the selection',
    group: 'Select',
    shortcuts: [{ key: 'Escape' }],
    edits: false,
    enabled: (s) => hasSelection(s),
    run: (_s, ui) => (ui.select({ members: [], modules: [] }), null),
  },
  {
    id: 'select-next',
    label: 'Select the next member',
    group: 'Select',
    shortcuts: [{ key: 'n' }],
    edits: false,
    enabled: (s) => s.scene.members.length > 0,
    run: (s, ui) => stepThrough(s, ui, 1),
  },
  {
    id: 'select-previous',
    label: 'Select the previous member',
    group: 'Select',
    shortcuts: [{ key: 'n', shift: true }],
    edits: false,
    enabled: (s) => s.scene.members.length > 0,
    run: (s, ui) => stepThrough(s, ui, -1),
  },
  { id: 'tool-select', label: 'Pick and move', group: 'Tools', shortcuts: [{ key: 'v' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.setTool('select'), null) },
  { id: 'tool-draw', label: 'Draw a member', group: 'Tools', shortcuts: [{ key: 'd' }], edits: true, enabled: writable, run: (_s, ui) => (ui.setTool('draw'), null) },
  { id: 'tool-pan', label: 'Pan the view', group: 'Tools', shortcuts: [{ key: 'h' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.setTool('pan'), null) },
  { id: 'zoom-fit', label: 'Zoom to fit', group: 'View', shortcuts: [{ key: 'f' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.zoomToFit(), null) },
  {
    id: 'zoom-in',
    label: 'Zoom in',
    group: 'View',
    shortcuts: [{ key: '=' }, { key: '+' }],
    edits: false,
    enabled: () => true,
    run: (_s, ui) => (ui.zoomBy(1.25), null),
  },
  { id: 'zoom-out', label: 'Zoom out', group: 'View', shortcuts: [{ key: '-' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.zoomBy(0.8), null) },
  { id: 'view-front', label: 'Front view', group: 'View', shortcuts: [{ key: '1' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.setView('front'), null) },
  { id: 'view-side', label: 'Side view', group: 'View', shortcuts: [{ key: '2' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.setView('side'), null) },
  { id: 'view-top', label: 'Top view', group: 'View', shortcuts: [{ key: '3' }], edits: false, enabled: () => true, run: (_s, ui) => (ui.setView('top'), null) },
  {
    id: 'help',
    label: 'Keyboard shortcuts',
    group: 'View',
    shortcuts: [{ key: '?', shift: true }, { key: 'F1' }],
    edits: false,
    enabled: () => true,
    run: (_s, ui) => (ui.showHelp(), null),
  },
];

export const commandById = (id: string): Command => {
  const c = COMMANDS.find((x) => x.id === id);
  if (!c) throw new Error(`no command "${id}"`);
  return c;
};

const isMac = () => typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform);

/** "Ctrl+Shift+Z" (or ⌘ on a Mac), for buttons' titles and the help dialog. */
export function shortcutText(s: Shortcut): string {
  const names: Record<string, string> = { ArrowLeft: '←', ArrowRight: '→', ArrowUp: '↑', ArrowDown: '↓', Escape: 'Esc', Delete: 'Del', Backspace: 'Backspace' };
  const parts: string[] = [];
  if (s.mod) parts.push(isMac() ? '⌘' : 'Ctrl');
  if (s.alt) parts.push('Alt');
  if (s.shift && s.key !== '?') parts.push('Shift');
  parts.push(names[s.key] ?? (s.key.length === 1 ? s.key.toUpperCase() : s.key));
  return parts.join('+');
}

/** The command a key press asks for, if any. */
export function commandForKey(e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey'>): Command | null {
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  for (const c of COMMANDS) {
    for (const s of c.shortcuts) {
      const want = s.key.length === 1 ? s.key.toLowerCase() : s.key;
      if (want !== key) continue;
      if (!!s.mod !== mod) continue;
      // '?' and '+' need shift on most layouts; don't insist on it either way.
      if (!['?', '+'].includes(s.key) && !!s.shift !== e.shiftKey) continue;
      if (!!s.alt !== e.altKey) continue;
      return c;
    }
  }
  return null;
}
