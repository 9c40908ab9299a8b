import { FASTENER_THREADS, tapDrill } from '../catalog/fasteners';
import type { Fastener } from '../catalog/profiles';
import { MM_PER_INCH } from '../geometry/units';

/**
 * What the hardware list needs to know about each fastener size. Head sizes: ISO 4762 socket head cap screws
 * (REFERENCES.md: M5 8.5/5/4, M6 10/6/5, M8 13/8/6 mm head Ø / head height / key); the inch sizes from ASME
 * B18.3 (recalled from memory, not confirmed: 1/4-20 3/8 in head, 1/4 in high, 3/16 in key; 5/16-18 15/32 in,
 * 5/16 in, 1/4 in). Bracket and plate thicknesses and how far a screw must reach into a T-nut are common
 * practice, no source: enough thread through the nut to engage it fully without bottoming in the slot.
 */
export type FastenerData = {
  head_d_mm: number;
  head_h_mm: number;
  key_mm: number;
  /** Leg thickness of an inside corner bracket made for this size (common practice). */
  bracket_mm: number;
  /** Gusset plate thickness (common practice). */
  plate_mm: number;
  /** Screw length needed beyond what it clamps, to pass fully through a T-nut (common practice). */
  engagement_mm: number;
  inch: boolean;
};

const IN = MM_PER_INCH;

export const FASTENER_DATA: Readonly<Record<Fastener, FastenerData>> = {
  M5: { head_d_mm: 8.5, head_h_mm: 5, key_mm: 4, bracket_mm: 3, plate_mm: 4, engagement_mm: 6, inch: false },
  M6: { head_d_mm: 10, head_h_mm: 6, key_mm: 5, bracket_mm: 4, plate_mm: 5, engagement_mm: 8, inch: false },
  M8: { head_d_mm: 13, head_h_mm: 8, key_mm: 6, bracket_mm: 5, plate_mm: 6, engagement_mm: 10, inch: false },
  '1/4-20': { head_d_mm: 0.375 * IN, head_h_mm: 0.25 * IN, key_mm: (3 / 16) * IN, bracket_mm: IN / 8, plate_mm: (3 / 16) * IN, engagement_mm: (3 / 8) * IN, inch: true },
  '5/16-18': { head_d_mm: (15 / 32) * IN, head_h_mm: (5 / 16) * IN, key_mm: IN / 4, bracket_mm: (3 / 16) * IN, plate_mm: IN / 4, engagement_mm: (7 / 16) * IN, inch: true },
};

/** Stocked lengths of metric cap screws, the ISO 4762 preferred series (recalled from memory, not confirmed). */
const METRIC_LENGTHS = [6, 8, 10, 12, 16, 20, 25, 30, 35, 40, 45, 50, 55, 60, 65, 70, 80, 90, 100];
/** Inch cap screws: eighths of an inch to 1 in, then quarters (common practice, no source). */
const INCH_LENGTHS = [
  ...[3, 4, 5, 6, 7, 8].map((e) => e / 8),
  ...[5, 6, 7, 8, 9, 10, 11, 12, 14, 16].map((q) => q / 4),
].map((inches) => inches * IN);

/** The shortest stocked screw at least `needed_mm` long (the longest stocked one if none is). */
export function stockScrewLength(f: Fastener, needed_mm: number): number {
  const list = FASTENER_DATA[f].inch ? INCH_LENGTHS : METRIC_LENGTHS;
  return list.find((l) => l >= needed_mm - 1e-6) ?? list[list.length - 1];
}

/** A screw through `clamp_mm` of bracket or plate into a T-nut: clamp + engagement, then the next stocked length. */
export const screwLengthFor = (f: Fastener, clamp_mm: number): number => stockScrewLength(f, clamp_mm + FASTENER_DATA[f].engagement_mm);

/** "M8 × 16" or "1/4-20 × 5/8 in". */
export function screwLabel(f: Fastener, length_mm: number): string {
  if (!FASTENER_DATA[f].inch) return `${f} × ${Math.round(length_mm * 10) / 10}`;
  const eighths = Math.round((length_mm / IN) * 8);
  const whole = Math.floor(eighths / 8);
  let num = eighths % 8;
  let den = 8;
  while (num !== 0 && num % 2 === 0) {
    num /= 2;
    den /= 2;
  }
  const frac = num === 0 ? '' : `${num}/${den}`;
  return `${f} × ${whole === 0 ? frac : frac ? `${whole} ${frac}` : whole} in`;
}

/** Steel, 7.85 g/cm³ (handbook value for carbon steel). */
const STEEL_G_PER_MM3 = 7.85e-3;
/** Aluminium alloy, 2.70 g/cm³ (REFERENCES.md). */
export const ALUMINIUM_G_PER_MM3 = 2.7e-3;
/** Moulded plastic for caps, about 1.05 g/cm³ (ABS, handbook typical). */
const PLASTIC_G_PER_MM3 = 1.05e-3;

/** Approximate mass of a cap screw: steel shank (nominal diameter) plus a cylindrical head. */
export function screwMass_g(f: Fastener, length_mm: number): number {
  const d = FASTENER_THREADS[f].major_mm;
  const h = FASTENER_DATA[f];
  return STEEL_G_PER_MM3 * (Math.PI / 4) * (d * d * length_mm + h.head_d_mm * h.head_d_mm * h.head_h_mm);
}

/** Approximate mass of a T-nut: a steel block about 2d × 1.2d × d. */
export function tNutMass_g(f: Fastener): number {
  const d = FASTENER_THREADS[f].major_mm;
  return STEEL_G_PER_MM3 * 2 * d * 1.2 * d * d;
}

/** Approximate mass of a hex nut (plain sections): width ≈ 1.6d, height ≈ 0.8d, less the hole. */
export function hexNutMass_g(f: Fastener): number {
  const d = FASTENER_THREADS[f].major_mm;
  const s = 1.6 * d;
  return STEEL_G_PER_MM3 * (((3 * Math.sqrt(3)) / 2) * (s / Math.sqrt(3)) ** 2 - (Math.PI / 4) * d * d) * 0.8 * d;
}

/** An inside corner bracket: two aluminium legs one slot module square, `bracket_mm` thick. */
export const bracketMass_g = (module_mm: number, f: Fastener): number => 2 * module_mm * module_mm * FASTENER_DATA[f].bracket_mm * ALUMINIUM_G_PER_MM3;

/** A gusset plate: about three slot modules square of aluminium plate. */
export const plateMass_g = (module_mm: number, f: Fastener): number => 3 * module_mm * module_mm * FASTENER_DATA[f].plate_mm * ALUMINIUM_G_PER_MM3;

/** An end cap: a 3 mm plastic plate the size of the section. */
export const endCapMass_g = (width_mm: number, height_mm: number): number => width_mm * height_mm * 3 * PLASTIC_G_PER_MM3;

/** An end connector: a steel screw about one module long with its anchor. */
export const connectorMass_g = (module_mm: number, f: Fastener): number => 1.5 * screwMass_g(f, module_mm);

/**
 * End tap for an end connector: tap drill from the thread (major diameter − pitch, REFERENCES.md) and a depth of
 * 2·d of full thread (engagement into aluminium, common practice, REFERENCES.md) plus 2 mm for the tap's lead.
 */
export function endTapFor(f: Fastener): { thread: Fastener; tap_drill_mm: number; depth_mm: number } {
  const d = FASTENER_THREADS[f].major_mm;
  return { thread: f, tap_drill_mm: tapDrill(f), depth_mm: Math.ceil(2 * d) + 2 };
}

/** Access hole for the key that turns an end connector's screw: key size + 2 mm (common practice, no source). */
export const accessHoleDiameter = (f: Fastener): number => Math.round((FASTENER_DATA[f].key_mm + 2) * 10) / 10;
