import { z } from 'zod';

/** x = width (along a run, left to right), y = depth (front to back), z = height (floor up). */
export type Axis = 'x' | 'y' | 'z';
export const AXES: readonly Axis[] = ['x', 'y', 'z'];
export const axisSchema = z.enum(['x', 'y', 'z']);

export const AXIS_INDEX: Readonly<Record<Axis, 0 | 1 | 2>> = { x: 0, y: 1, z: 2 };

/**
 * The two axes across a member lying along `axis`, in the order the profile's width and height map onto them
 * at rotation 0: along x or y the width lies horizontal and the height vertical (a 40×80 stands tall); an upright
 * (along z) has its width along x and its height along y.
 */
export function crossAxes(axis: Axis): readonly [Axis, Axis] {
  switch (axis) {
    case 'x':
      return ['y', 'z'];
    case 'y':
      return ['x', 'z'];
    case 'z':
      return ['x', 'y'];
  }
}

export type Vec3 = { x: number; y: number; z: number };
