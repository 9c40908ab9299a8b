import type { SnapTarget } from '@shared/editing/snap';
import type { Rect2 } from '@shared/editing/views';

/** One snap shown on screen: the target line and the point that snapped to it. */
export type SnapCue = { axis: 'h' | 'v'; target: SnapTarget; h: number; v: number };

/** What the interactive layer shows besides the selection: everything in view millimetres. */
export type OverlayState = {
  /** Where dragged or stretched things would go. */
  ghost: Rect2[];
  /** A member being drawn. */
  draft: Rect2 | null;
  /** A box being dragged to select. */
  box: { ax: number; ay: number; bx: number; by: number } | null;
  cues: SnapCue[];
  /** The module a dragged module would swap with. */
  swapTarget: Rect2 | null;
  /** A short note beside the pointer ("snapped to u0 face", "swap with Cooler"). */
  note: string | null;
  pointer: { h: number; v: number } | null;
  /** What a click would pick. */
  hover: Rect2 | null;
};

export const emptyOverlay = (): OverlayState => ({ ghost: [], draft: null, box: null, cues: [], swapTarget: null, note: null, pointer: null, hover: null });
