// Sheet materials and what their parts weigh. Densities are typical values (REFERENCES.md "Sheet goods", recalled,
// not confirmed against a data sheet): every one is editable, and the report says they are typical.
import { z } from 'zod';

/** Lightest foam board to densest fibre board and beyond, kg/m³: outside these a typed density is a slip. */
export const DENSITY_MIN_KG_M3 = 50;
export const DENSITY_MAX_KG_M3 = 3000;

export const sheetMaterialSchema = z.object({
  id: z.string().min(1).max(60),
  name: z.string().min(1).max(120),
  /** kg/m³ */
  density_kg_m3: z.number().finite().min(DENSITY_MIN_KG_M3).max(DENSITY_MAX_KG_M3),
  thickness_mm: z.number().finite().min(1).max(60),
  /** True while the density is a typical value the builder has not replaced with their sheet's own. */
  typical: z.boolean().default(true),
});
export type SheetMaterial = z.output<typeof sheetMaterialSchema>;

export const TYPICAL_NOTE = 'typical value — weigh a sheet or check the supplier’s data sheet';

/** Typical densities [M]: birch plywood 650–700, light-faced plywood 450–550, MDF 700–800 kg/m³ (mid values). */
export const SHEET_MATERIALS: readonly SheetMaterial[] = Object.freeze([
  { id: 'birch-12', name: 'Birch plywood 12 mm', density_kg_m3: 680, thickness_mm: 12, typical: true },
  { id: 'birch-18', name: 'Birch plywood 18 mm', density_kg_m3: 680, thickness_mm: 18, typical: true },
  { id: 'birch-6', name: 'Birch plywood 6 mm', density_kg_m3: 680, thickness_mm: 6, typical: true },
  { id: 'light-12', name: 'Light-faced plywood 12 mm', density_kg_m3: 500, thickness_mm: 12, typical: true },
  { id: 'light-15', name: 'Light-faced plywood 15 mm', density_kg_m3: 500, thickness_mm: 15, typical: true },
  { id: 'light-6', name: 'Light-faced plywood 6 mm', density_kg_m3: 500, thickness_mm: 6, typical: true },
  { id: 'mdf-18', name: 'MDF 18 mm', density_kg_m3: 750, thickness_mm: 18, typical: true },
]);

/** Mass of a flat part: length × width × thickness × density (mm³ → m³ is 1e-9). */
export function partMass_kg(length_mm: number, width_mm: number, thickness_mm: number, density_kg_m3: number): number {
  return length_mm * width_mm * thickness_mm * 1e-9 * density_kg_m3;
}
