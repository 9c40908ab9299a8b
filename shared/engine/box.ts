import { AXIS_INDEX, type Axis, type Vec3 } from '../model/axis';

/** An axis-aligned box in millimetres, indexed x = 0, y = 1, z = 2. */
export type Box = { min: [number, number, number]; max: [number, number, number] };

export const boxCentre = (b: Box): Vec3 => ({
  x: (b.min[0] + b.max[0]) / 2,
  y: (b.min[1] + b.max[1]) / 2,
  z: (b.min[2] + b.max[2]) / 2,
});

export const cloneBox = (b: Box): Box => ({ min: [b.min[0], b.min[1], b.min[2]], max: [b.max[0], b.max[1], b.max[2]] });

/** Length of the overlap of two boxes on one axis (negative when they are apart). */
export const overlapOn = (a: Box, b: Box, i: number): number => Math.min(a.max[i], b.max[i]) - Math.max(a.min[i], b.min[i]);

export const ai = (a: Axis): 0 | 1 | 2 => AXIS_INDEX[a];

/** Round to 1e-6 mm so that sums of offsets print and compare cleanly. */
export const tidy = (v: number): number => {
  const r = Math.round(v * 1e6) / 1e6;
  return Object.is(r, -0) ? 0 : r;
};
