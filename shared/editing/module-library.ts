import type { Bearing, ModuleKind } from '../model/module';

/**
 * Generic modules a builder starts from, with round-number sizes and masses typical of small-van galleys (our own
 * estimates for a first layout, not any product's figures; change them to the real unit's datasheet).
 */
export type LibraryModule = {
  key: string;
  label: string;
  kind: ModuleKind;
  bearing: Bearing;
  size: { w_mm: number; d_mm: number; h_mm: number };
  mass_kg: number;
  contents_kg: number;
  litres?: number;
};

export const MODULE_LIBRARY: readonly LibraryModule[] = [
  { key: 'cooler', label: 'Compressor cooler', kind: 'appliance', bearing: 'base', size: { w_mm: 400, d_mm: 550, h_mm: 500 }, mass_kg: 18, contents_kg: 20 },
  { key: 'fridge', label: 'Upright fridge', kind: 'appliance', bearing: 'base', size: { w_mm: 450, d_mm: 500, h_mm: 750 }, mass_kg: 25, contents_kg: 15 },
  { key: 'sink', label: 'Sink with tap', kind: 'sink', bearing: 'hung', size: { w_mm: 350, d_mm: 300, h_mm: 150 }, mass_kg: 4, contents_kg: 0 },
  { key: 'drawers', label: 'Drawer stack', kind: 'drawer-stack', bearing: 'side-rails', size: { w_mm: 400, d_mm: 500, h_mm: 450 }, mass_kg: 12, contents_kg: 15 },
  { key: 'tank', label: 'Water tank', kind: 'tank', bearing: 'base', size: { w_mm: 300, d_mm: 400, h_mm: 200 }, mass_kg: 3, contents_kg: 0, litres: 20 },
  { key: 'shelf', label: 'Shelf', kind: 'shelf', bearing: 'base', size: { w_mm: 500, d_mm: 350, h_mm: 20 }, mass_kg: 3, contents_kg: 10 },
];
