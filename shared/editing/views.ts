import type { Box } from '../engine/box';
import { AXIS_INDEX, type Axis } from '../model/axis';

/**
 * The three orthographic views. Each looks along one axis; `h` runs left → right on the screen and `v` bottom →
 * top. `toward` says which way the viewer looks along the depth axis: +1 when the viewer stands at the low end
 * (front view: standing in front, y = 0, looking towards the back), −1 at the high end (side view from the right,
 * top view from above). Nearer things are drawn over farther ones.
 */
export type ViewId = 'front' | 'side' | 'top';
export const VIEW_IDS: readonly ViewId[] = ['front', 'side', 'top'];

export type ViewDef = { id: ViewId; label: string; h: Axis; v: Axis; depth: Axis; toward: 1 | -1 };

export const VIEWS: Readonly<Record<ViewId, ViewDef>> = {
  front: { id: 'front', label: 'Front', h: 'x', v: 'z', depth: 'y', toward: 1 },
  // Standing on the right (high x) looking back along −x, with z up, +y points to the right.
  side: { id: 'side', label: 'Side', h: 'y', v: 'z', depth: 'x', toward: -1 },
  // From above looking down, with the front (y = 0) at the bottom of the screen.
  top: { id: 'top', label: 'Top', h: 'x', v: 'y', depth: 'z', toward: -1 },
};

/** A box seen in a view: its extent on the view's h and v axes (mm) and how near it is (larger = nearer). */
export type Rect2 = { x0: number; x1: number; y0: number; y1: number };
export type Projected = Rect2 & { near: number };

export function projectBox(view: ViewDef, b: Box): Projected {
  const h = AXIS_INDEX[view.h];
  const v = AXIS_INDEX[view.v];
  const d = AXIS_INDEX[view.depth];
  // The face nearest the viewer decides drawing order.
  const near = view.toward === 1 ? -b.min[d] : b.max[d];
  return { x0: b.min[h], x1: b.max[h], y0: b.min[v], y1: b.max[v], near };
}

/** The 3D vector for a movement of (dh, dv) in the view's plane. */
export function viewDelta(view: ViewDef, dh: number, dv: number): { x: number; y: number; z: number } {
  const out = { x: 0, y: 0, z: 0 };
  out[view.h] += dh;
  out[view.v] += dv;
  return out;
}

/** Which screen direction a 3D axis runs in a view: 'h', 'v', or null when it points at the viewer. */
export function screenAxis(view: ViewDef, axis: Axis): 'h' | 'v' | null {
  if (axis === view.h) return 'h';
  if (axis === view.v) return 'v';
  return null;
}

export const rectContains = (r: Rect2, x: number, y: number, pad = 0): boolean =>
  x >= r.x0 - pad && x <= r.x1 + pad && y >= r.y0 - pad && y <= r.y1 + pad;

export const rectsOverlap = (a: Rect2, b: Rect2): boolean => a.x0 <= b.x1 && b.x0 <= a.x1 && a.y0 <= b.y1 && b.y0 <= a.y1;

export const rectInside = (inner: Rect2, outer: Rect2): boolean =>
  inner.x0 >= outer.x0 && inner.x1 <= outer.x1 && inner.y0 >= outer.y0 && inner.y1 <= outer.y1;

export function normaliseRect(ax: number, ay: number, bx: number, by: number): Rect2 {
  return { x0: Math.min(ax, bx), x1: Math.max(ax, bx), y0: Math.min(ay, by), y1: Math.max(ay, by) };
}

/**
 * The small projected preview: an isometric view from the front, right and above (the eye along (1, −1, 1)), so
 * the front, right-hand and top faces show. +x runs down-right, +y up-right (into the picture), +z straight up.
 * Returns picture coordinates (mm, w up) and a depth for painter's order (larger = nearer the eye).
 */
export function axonometric(p: { x: number; y: number; z: number }): { u: number; w: number; depth: number } {
  const c = Math.cos(Math.PI / 6);
  const s = Math.sin(Math.PI / 6);
  return { u: (p.x + p.y) * c, w: p.z + (p.y - p.x) * s, depth: p.x - p.y + p.z };
}
