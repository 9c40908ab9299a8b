import type { AlloyId } from './alloys';
import type { Outline } from './outlines';

export type Series = 'metric' | 'inch';
export type Fastener = 'M5' | 'M6' | 'M8' | '1/4-20' | '5/16-18';
export type ProfileKind = 'slotted' | 'rect' | 'tube' | 'angle';

/**
 * A profile's cross-section and what a builder picks it by. Coordinates of `outline` put the lower-left corner of
 * the bounding box at the origin, x along `width_mm`, y along `height_mm`.
 */
export type Profile = {
  id: string;
  /** Display name, e.g. "40×40 slot 8", "1.5×3 in", "tube 40×20×2". */
  name: string;
  kind: ProfileKind;
  series: Series;
  width_mm: number;
  height_mm: number;
  /** Slot opening width; null for plain sections. */
  slot_mm: number | null;
  /** Fastener the slots and end bores are made for; null for plain sections. */
  fastener: Fastener | null;
  /** Centre bore diameter (tap drill for an end tap); null when there is none. */
  bore_mm: number | null;
  alloy: AlloyId;
  outline: Outline;
};
