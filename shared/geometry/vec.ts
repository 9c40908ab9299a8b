/** A point or vector in millimetres. In a profile cross-section x runs along the width, y along the height. */
export type Pt = { x: number; y: number };

export const pt = (x: number, y: number): Pt => ({ x, y });
export const add = (a: Pt, b: Pt): Pt => ({ x: a.x + b.x, y: a.y + b.y });
export const sub = (a: Pt, b: Pt): Pt => ({ x: a.x - b.x, y: a.y - b.y });
export const scale = (a: Pt, k: number): Pt => ({ x: a.x * k, y: a.y * k });
export const dot = (a: Pt, b: Pt): number => a.x * b.x + a.y * b.y;
/** z component of the 3-D cross product: positive when b is counter-clockwise from a. */
export const cross = (a: Pt, b: Pt): number => a.x * b.y - a.y * b.x;
export const len = (a: Pt): number => Math.hypot(a.x, a.y);
export const dist = (a: Pt, b: Pt): number => Math.hypot(a.x - b.x, a.y - b.y);
/** Rotate a quarter turn counter-clockwise: the inward normal of a counter-clockwise boundary's edge direction. */
export const perpLeft = (a: Pt): Pt => ({ x: -a.y, y: a.x });
export const rotate = (a: Pt, radians: number): Pt => {
  const c = Math.cos(radians);
  const s = Math.sin(radians);
  return { x: a.x * c - a.y * s, y: a.x * s + a.y * c };
};
export const translate = (pts: readonly Pt[], d: Pt): Pt[] => pts.map((p) => add(p, d));
