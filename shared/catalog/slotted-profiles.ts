import type { AlloyId } from './alloys';
import { tapDrill } from './fasteners';
import { slottedOutline, type SlotShape, type SlottedSpec } from './outlines';
import type { Fastener, Profile, Series } from './profile-types';

// Generic slotted profiles drawn for this product: round-number proportions chosen so that masses and stiffness land
// in the range builders expect, not copied from any supplier. Real sections differ; users can override the figures.

const SLOT_6_ON_20: SlotShape = { opening: 6.2, lip: 1.8, chamberWidth: 11, chamberStraight: 1.5, depth: 6.1, bottomWidth: 5.5 };
const SLOT_8_ON_30: SlotShape = { opening: 8.2, lip: 2, chamberWidth: 16.5, chamberStraight: 2.5, depth: 9.5, bottomWidth: 7.5 };
const SLOT_8_ON_40: SlotShape = { opening: 8.2, lip: 2.2, chamberWidth: 22, chamberStraight: 3.5, depth: 13.5, bottomWidth: 10 };
const SLOT_10_ON_45: SlotShape = { opening: 10.2, lip: 3, chamberWidth: 25, chamberStraight: 4, depth: 15, bottomWidth: 11 };
const SLOT_ON_1IN: SlotShape = { opening: 6.6, lip: 2.3, chamberWidth: 14, chamberStraight: 1.5, depth: 7.6, bottomWidth: 6.5 };
const SLOT_ON_15IN: SlotShape = { opening: 8.1, lip: 2.5, chamberWidth: 20, chamberStraight: 3, depth: 12.5, bottomWidth: 9.5 };

type Def = {
  id: string;
  name: string;
  series: Series;
  fastener: Fastener;
  alloy: AlloyId;
  spec: Omit<SlottedSpec, 'bore'>;
};

const INCH = 25.4;

const DEFS: Def[] = [
  {
    id: '20x20-s6',
    name: '20×20 slot 6',
    series: 'metric',
    fastener: 'M5',
    alloy: '6063-T5',
    spec: { module: 20, cols: 1, rows: 1, slot: SLOT_6_ON_20 },
  },
  {
    id: '30x30-s8',
    name: '30×30 slot 8',
    series: 'metric',
    fastener: 'M6',
    alloy: '6063-T5',
    spec: { module: 30, cols: 1, rows: 1, slot: SLOT_8_ON_30, cornerCavity: { size: 3.1, inset: 1.8 } },
  },
  {
    id: '40x40-s8',
    name: '40×40 slot 8',
    series: 'metric',
    fastener: 'M8',
    alloy: '6063-T5',
    spec: { module: 40, cols: 1, rows: 1, slot: SLOT_8_ON_40, cornerCavity: { size: 5.4, inset: 1.8 } },
  },
  {
    id: '40x80-s8',
    name: '40×80 slot 8',
    series: 'metric',
    fastener: 'M8',
    alloy: '6063-T5',
    spec: {
      module: 40,
      cols: 1,
      rows: 2,
      slot: SLOT_8_ON_40,
      cornerCavity: { size: 5.4, inset: 1.8 },
      jointCavity: { width: 36.4, height: 14 },
    },
  },
  {
    id: '45x45-s10',
    name: '45×45 slot 10',
    series: 'metric',
    fastener: 'M8',
    alloy: '6063-T5',
    spec: { module: 45, cols: 1, rows: 1, slot: SLOT_10_ON_45, cornerCavity: { size: 6.4, inset: 1.8 } },
  },
  {
    id: '1x1',
    name: '1×1 in',
    series: 'inch',
    fastener: '1/4-20',
    alloy: '6063-T5',
    spec: { module: INCH, cols: 1, rows: 1, slot: SLOT_ON_1IN, cornerCavity: { size: 2.6, inset: 1.5 } },
  },
  {
    id: '1x2',
    name: '1×2 in',
    series: 'inch',
    fastener: '1/4-20',
    alloy: '6063-T5',
    spec: {
      module: INCH,
      cols: 1,
      rows: 2,
      slot: SLOT_ON_1IN,
      cornerCavity: { size: 2.6, inset: 1.5 },
      jointCavity: { width: 22.2, height: 7.8 },
    },
  },
  {
    id: '1.5x1.5',
    name: '1.5×1.5 in',
    series: 'inch',
    fastener: '5/16-18',
    alloy: '6063-T5',
    spec: { module: 1.5 * INCH, cols: 1, rows: 1, slot: SLOT_ON_15IN, cornerCavity: { size: 5.4, inset: 1.8 } },
  },
  {
    id: '1.5x3',
    name: '1.5×3 in',
    series: 'inch',
    fastener: '5/16-18',
    alloy: '6063-T5',
    spec: {
      module: 1.5 * INCH,
      cols: 1,
      rows: 2,
      slot: SLOT_ON_15IN,
      cornerCavity: { size: 5.4, inset: 1.8 },
      jointCavity: { width: 34.5, height: 14 },
    },
  },
];

function build(d: Def): Profile {
  const bore = tapDrill(d.fastener);
  return {
    id: d.id,
    name: d.name,
    kind: 'slotted',
    series: d.series,
    width_mm: d.spec.cols * d.spec.module,
    height_mm: d.spec.rows * d.spec.module,
    slot_mm: d.spec.slot.opening,
    fastener: d.fastener,
    bore_mm: bore,
    alloy: d.alloy,
    outline: slottedOutline({ ...d.spec, bore }),
  };
}

export const SLOTTED_PROFILES: readonly Profile[] = Object.freeze(DEFS.map(build));
