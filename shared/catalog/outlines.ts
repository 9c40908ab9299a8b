import { add, perpLeft, scale, sub, type Pt } from '../geometry/vec';
import { circleRing, rectRing } from '../geometry/polygon';

/** A cross-section: outer boundary counter-clockwise, holes (bores, cores) listed separately. Millimetres. */
export type Outline = { outer: Pt[]; holes: Pt[][] };

/**
 * One T-slot as seen from the face it opens on: `opening` wide through a `lip` of that thickness, then a chamber
 * `chamberWidth` wide for `chamberStraight`, narrowing to `bottomWidth` at `depth` below the face.
 */
export type SlotShape = {
  opening: number;
  lip: number;
  chamberWidth: number;
  chamberStraight: number;
  depth: number;
  bottomWidth: number;
};

/**
 * A slotted profile made of `cols` × `rows` square cells of side `module`: one slot per cell on each outer face, a
 * centre bore in each cell, optional square cavities in the outer corners and a cavity where two cells meet.
 */
export type SlottedSpec = {
  module: number;
  cols: number;
  rows: number;
  slot: SlotShape;
  bore: number;
  cornerCavity?: { size: number; inset: number };
  /** Cavity centred on each boundary between two cells; `width` runs along that boundary. */
  jointCavity?: { width: number; height: number };
};

const BORE_SEGMENTS = 24;

/** Slot notch points in face coordinates (t along the face from the slot centre, v inward), in walking order. */
function notch(s: SlotShape): [number, number][] {
  const h = s.lip + s.chamberStraight;
  return [
    [-s.opening / 2, 0],
    [-s.opening / 2, s.lip],
    [-s.chamberWidth / 2, s.lip],
    [-s.chamberWidth / 2, h],
    [-s.bottomWidth / 2, s.depth],
    [s.bottomWidth / 2, s.depth],
    [s.chamberWidth / 2, h],
    [s.chamberWidth / 2, s.lip],
    [s.opening / 2, s.lip],
    [s.opening / 2, 0],
  ];
}

export function slottedOutline(spec: SlottedSpec): Outline {
  const { module: u, cols, rows } = spec;
  const W = cols * u;
  const H = rows * u;
  const corners: Pt[] = [
    { x: 0, y: 0 },
    { x: W, y: 0 },
    { x: W, y: H },
    { x: 0, y: H },
  ];
  const slotsOnFace = [cols, rows, cols, rows];
  const outer: Pt[] = [];
  const shape = notch(spec.slot);
  for (let f = 0; f < 4; f++) {
    const a = corners[f];
    const b = corners[(f + 1) % 4];
    const length = f % 2 === 0 ? W : H;
    const d = scale(sub(b, a), 1 / length);
    const n = perpLeft(d); // inward, since the outer boundary runs counter-clockwise
    outer.push(a);
    for (let i = 0; i < slotsOnFace[f]; i++) {
      const c = (i + 0.5) * u;
      for (const [t, v] of shape) outer.push(add(a, add(scale(d, c + t), scale(n, v))));
    }
  }

  const holes: Pt[][] = [];
  for (let i = 0; i < cols; i++) {
    for (let j = 0; j < rows; j++) holes.push(circleRing((i + 0.5) * u, (j + 0.5) * u, spec.bore / 2, BORE_SEGMENTS));
  }
  if (spec.cornerCavity) {
    const { size, inset } = spec.cornerCavity;
    holes.push(
      rectRing(inset, inset, size, size),
      rectRing(W - inset - size, inset, size, size),
      rectRing(W - inset - size, H - inset - size, size, size),
      rectRing(inset, H - inset - size, size, size),
    );
  }
  if (spec.jointCavity) {
    const { width, height } = spec.jointCavity;
    for (let i = 0; i < cols; i++) {
      for (let j = 1; j < rows; j++) holes.push(rectRing((i + 0.5) * u - width / 2, j * u - height / 2, width, height));
    }
    for (let i = 1; i < cols; i++) {
      for (let j = 0; j < rows; j++) holes.push(rectRing(i * u - height / 2, (j + 0.5) * u - width / 2, height, width));
    }
  }
  return { outer, holes };
}

/** Solid rectangle W wide (x) by H high (y). */
export const rectOutline = (w: number, h: number): Outline => ({ outer: rectRing(0, 0, w, h), holes: [] });

/** Rectangular tube with square inside corners (no radii), wall t. */
export const tubeOutline = (w: number, h: number, t: number): Outline => ({
  outer: rectRing(0, 0, w, h),
  holes: [rectRing(t, t, w - 2 * t, h - 2 * t)],
});

/** Equal or unequal angle, heel at the origin: leg a along x, leg b along y, thickness t, no root radius. */
export const angleOutline = (a: number, b: number, t: number): Outline => ({
  outer: [
    { x: 0, y: 0 },
    { x: a, y: 0 },
    { x: a, y: t },
    { x: t, y: t },
    { x: t, y: b },
    { x: 0, y: b },
  ],
  holes: [],
});
