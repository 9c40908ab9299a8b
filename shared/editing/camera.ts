import type { Rect2 } from './views';

/**
 * Where millimetres meet pixels, and the only place they do: `scale` pixels per millimetre, and the screen
 * position (px) of the view's origin. The view's v axis points up, the screen's y down.
 */
export type Camera = { scale: number; ox: number; oy: number };

export const MIN_SCALE = 0.02; // 50 mm per pixel: a 20 m frame fits in 400 px
export const MAX_SCALE = 40; // 40 px per mm: a slot 8 opening is 320 px wide

export const clampScale = (s: number): number => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

export const toScreenX = (c: Camera, h: number): number => c.ox + h * c.scale;
export const toScreenY = (c: Camera, v: number): number => c.oy - v * c.scale;
export const toWorld = (c: Camera, sx: number, sy: number): { h: number; v: number } => ({
  h: (sx - c.ox) / c.scale,
  v: (c.oy - sy) / c.scale,
});

/** A length on screen (px) as millimetres. */
export const pxToMm = (c: Camera, px: number): number => px / c.scale;

/** Zoom by `factor` keeping the world point under the screen point (sx, sy) where it is. */
export function zoomAt(c: Camera, factor: number, sx: number, sy: number): Camera {
  const scale = clampScale(c.scale * factor);
  const k = scale / c.scale;
  return { scale, ox: sx - (sx - c.ox) * k, oy: sy - (sy - c.oy) * k };
}

export const panBy = (c: Camera, dx: number, dy: number): Camera => ({ scale: c.scale, ox: c.ox + dx, oy: c.oy + dy });

/** The camera that shows `r` (mm) centred in a `width` × `height` px viewport with `margin` px around it. */
export function fitRect(r: Rect2 | null, width: number, height: number, margin = 40): Camera {
  const box = r ?? { x0: 0, x1: 1000, y0: 0, y1: 1000 };
  const w = Math.max(box.x1 - box.x0, 1);
  const h = Math.max(box.y1 - box.y0, 1);
  const scale = clampScale(Math.min((width - 2 * margin) / w, (height - 2 * margin) / h));
  const cx = (box.x0 + box.x1) / 2;
  const cy = (box.y0 + box.y1) / 2;
  return { scale, ox: width / 2 - cx * scale, oy: height / 2 + cy * scale };
}

/** The world rectangle (mm) a viewport shows. */
export function visibleRect(c: Camera, width: number, height: number): Rect2 {
  const a = toWorld(c, 0, height);
  const b = toWorld(c, width, 0);
  return { x0: a.h, x1: b.h, y0: a.v, y1: b.v };
}
