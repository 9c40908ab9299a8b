import type { ViewItem } from './scene';
import { normaliseRect, rectContains, rectInside, rectsOverlap, type Rect2 } from './views';

/**
 * The nearest item under a point (mm), allowing `pad` mm around thin things so a 20 mm member drawn a few
 * pixels wide can still be picked. Items are in drawing order (far first), so the search runs backwards. An exact
 * hit beats a padded one.
 */
export function hitItem(items: readonly ViewItem[], h: number, v: number, pad = 0): ViewItem | null {
  for (let i = items.length - 1; i >= 0; i--) if (rectContains(items[i], h, v)) return items[i];
  if (pad <= 0) return null;
  let best: ViewItem | null = null;
  let bestDist = Infinity;
  for (let i = items.length - 1; i >= 0; i--) {
    const r = items[i];
    if (!rectContains(r, h, v, pad)) continue;
    const dx = Math.max(r.x0 - h, 0, h - r.x1);
    const dy = Math.max(r.y0 - v, 0, v - r.y1);
    const d = Math.hypot(dx, dy);
    if (d < bestDist) {
      best = r;
      bestDist = d;
    }
  }
  return best;
}

/**
 * Items picked by a dragged box from (ax, ay) to (bx, by): dragged rightwards, only those wholly inside; dragged
 * leftwards, everything the box touches. (A wide box over a dense frame would otherwise catch everything.)
 */
export function boxSelect(items: readonly ViewItem[], ax: number, ay: number, bx: number, by: number): ViewItem[] {
  const box = normaliseRect(ax, ay, bx, by);
  const touching = bx < ax;
  return items.filter((r) => (touching ? rectsOverlap(r, box) : rectInside(r, box)));
}

/** Which end handle of a member (drawn along the view's h or v) is under a point, if any. */
export function hitEndHandle(
  r: Rect2,
  along: 'h' | 'v',
  h: number,
  v: number,
  pad: number,
): 'start' | 'end' | null {
  if (along === 'h') {
    if (v < r.y0 - pad || v > r.y1 + pad) return null;
    if (Math.abs(h - r.x0) <= pad) return 'start';
    if (Math.abs(h - r.x1) <= pad) return 'end';
    return null;
  }
  if (h < r.x0 - pad || h > r.x1 + pad) return null;
  if (Math.abs(v - r.y0) <= pad) return 'start';
  if (Math.abs(v - r.y1) <= pad) return 'end';
  return null;
}
