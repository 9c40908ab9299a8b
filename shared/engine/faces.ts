import type { Axis } from '../model/axis';

/** A member face by the way it looks: x runs left → right, y front → back, z bottom → top. */
export type FaceName = 'left' | 'right' | 'front' | 'back' | 'bottom' | 'top';

export function faceName(axis: Axis, side: 'min' | 'max'): FaceName {
  switch (axis) {
    case 'x':
      return side === 'min' ? 'left' : 'right';
    case 'y':
      return side === 'min' ? 'front' : 'back';
    case 'z':
      return side === 'min' ? 'bottom' : 'top';
  }
}

export const otherAxis = (a: Axis, b: Axis): Axis => (['x', 'y', 'z'] as const).find((c) => c !== a && c !== b) as Axis;
