import { buildCabinetRun, type CabinetSpec } from './cabinet-run';
import type { FrameDocument } from './frame-document';

/** Side-mount ball-bearing slides take about 1/2 in (12.7 mm) per side (common practice, DOMAIN.md). */
const SLIDE_CLEARANCE_MM = 12.7;

/**
 * Our invented demo: a rear kitchen pod for a mid-size van, one run across the back doors in 30 mm slot-8
 * profile. From the left: a narrow pantry pull-out, a compressor cooler, a 30 L water tank, and a cooktop drawer
 * under the worktop. Sizes and masses are round estimates of our own, not any product's.
 */
export const DEMO_FRAME_SPEC: CabinetSpec = {
  name: 'Rear kitchen pod',
  runId: 'galley',
  profile: '30x30-s8',
  depth_mm: 500,
  height_mm: 850,
  seat_mm: 150,
  clearance_mm: 10,
  bays: [
    {
      id: 'bay-pantry',
      clearance_mm: SLIDE_CLEARANCE_MM,
      module: { id: 'pantry', name: 'Pantry pull-out', kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: 140, d_mm: 420, h_mm: 600 }, mass_kg: 4, contents_kg: 8, raise_mm: 20 },
    },
    {
      id: 'bay-cooler',
      module: { id: 'cooler', name: 'Compressor cooler', kind: 'appliance', bearing: 'base', size: { w_mm: 460, d_mm: 400, h_mm: 440 }, mass_kg: 14, contents_kg: 18 },
    },
    {
      id: 'bay-tank',
      module: { id: 'tank', name: 'Fresh water tank 30 L', kind: 'tank', bearing: 'base', size: { w_mm: 260, d_mm: 400, h_mm: 330 }, mass_kg: 3, litres: 30 },
    },
    {
      id: 'bay-cooktop',
      clearance_mm: SLIDE_CLEARANCE_MM,
      module: { id: 'cooktop', name: 'Cooktop drawer', kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: 360, d_mm: 420, h_mm: 150 }, mass_kg: 9, contents_kg: 3, raise_mm: 470 },
    },
  ],
};

/** The demo frame document, fresh each call (the seed and the editor may change it). */
export function demoFrameDocument(): FrameDocument {
  return buildCabinetRun(DEMO_FRAME_SPEC);
}
