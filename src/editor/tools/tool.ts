import type { Camera } from '@shared/editing/camera';
import type { Change } from '@shared/editing/change';
import type { Scene, ViewItem } from '@shared/editing/scene';
import type { SnapTargets } from '@shared/editing/snap';
import type { ViewDef } from '@shared/editing/views';
import type { FrameDocument } from '@shared/model/frame-document';
import type { ApplyOptions, Selection } from '@/stores/document';
import type { OverlayState } from '../overlay';

export type ToolId = 'select' | 'draw' | 'pan';

/** A pointer event as tools see it: screen pixels and the same point in view millimetres. */
export type PointerInput = { sx: number; sy: number; h: number; v: number; shift: boolean; alt: boolean; ctrl: boolean };

/** Everything a tool may read or do. Tools never touch Konva: they change the document, the selection or the overlay. */
export type ToolContext = {
  view: ViewDef;
  cam: Camera;
  scene: Scene;
  doc: FrameDocument;
  items: { members: ViewItem[]; modules: ViewItem[] };
  selection: Selection;
  readOnly: boolean;
  overlay: OverlayState;
  /** How close (mm) a point must come to a target to snap. */
  snapTolMm: number;
  /** The grid step (mm) points snap to. */
  gridStep: number;
  /** Snap targets of this view without the given members, cached for the length of a gesture. */
  targets(exclude: ReadonlySet<string>): SnapTargets;
  select(next: Selection): void;
  apply(change: Change, opts?: ApplyOptions): boolean;
  edit(label: string, f: (d: FrameDocument) => FrameDocument, opts?: ApplyOptions): boolean;
  /** Say why a gesture changed nothing. */
  refuse?(label: string, reason: string): void;
  /** The profile new members are drawn in. */
  profile: string;
  /** Where a member drawn in this view sits on the depth axis (its low face, mm). */
  depthDefault(): number;
};

export type Phase = 'idle' | 'pointing' | 'dragging';

/** A small state machine: idle → pointing (button down) → dragging (moved past the threshold) → idle. */
export interface Tool {
  readonly id: ToolId;
  readonly phase: Phase;
  down(p: PointerInput, ctx: ToolContext): void;
  move(p: PointerInput, ctx: ToolContext): void;
  up(p: PointerInput, ctx: ToolContext): void;
  /** Escape, or the pointer lost: drop the gesture, change nothing. */
  cancel(ctx: ToolContext): void;
  cursor(p: PointerInput | null, ctx: ToolContext): string;
}

/** Pixels the pointer must travel before a press becomes a drag (a click that wobbles stays a click). */
export const DRAG_THRESHOLD_PX = 4;

export const dragged = (a: PointerInput, b: PointerInput): boolean => Math.hypot(a.sx - b.sx, a.sy - b.sy) >= DRAG_THRESHOLD_PX;

export function clearOverlay(o: OverlayState): void {
  o.ghost = [];
  o.draft = null;
  o.box = null;
  o.cues = [];
  o.swapTarget = null;
  o.note = null;
  o.hover = null;
}
