/**
 * Wrought aluminium alloys used for slotted extrusion. Stiffness and density are typical values; strengths are kept
 * twice: the typical figure (what a test bar usually shows) and a published minimum for design. Checks use the
 * design minimum (`yield_MPa`), never the typical value.
 */
export type AlloyId = '6063-T5' | '6063-T6' | '6061-T6';

export type Alloy = {
  id: AlloyId;
  name: string;
  /** Young's modulus, typical (MatWeb, Aluminum Association values). */
  E_MPa: number;
  /** Shear modulus (EN 1999-1-1 nominal value). */
  G_MPa: number;
  density_kg_m3: number;
  /** 0.2 % proof stress, design minimum: the value engine checks use. */
  yield_MPa: number;
  /** Tensile strength, design minimum. */
  ultimate_MPa: number;
  typical_yield_MPa: number;
  typical_ultimate_MPa: number;
  /** Where each figure comes from. */
  source: string;
};

const KSI_TO_MPA = 6.894757;
const ksi = (v: number): number => Math.round(v * KSI_TO_MPA);

export const ALLOYS: Readonly<Record<AlloyId, Alloy>> = {
  '6063-T5': {
    id: '6063-T5',
    name: '6063-T5',
    E_MPa: 68_900,
    G_MPa: 27_000,
    density_kg_m3: 2_700,
    yield_MPa: ksi(16),
    ultimate_MPa: ksi(22),
    typical_yield_MPa: 145,
    typical_ultimate_MPa: 186,
    source:
      'Typical E, density, yield and ultimate: MatWeb (Aluminum Association typical values). Design minimums: ' +
      'Aluminum Design Manual Table A.3.4, extrusions, Fty 16 ksi / Ftu 22 ksi. G: EN 1999-1-1.',
  },
  '6063-T6': {
    id: '6063-T6',
    name: '6063-T6',
    E_MPa: 68_900,
    G_MPa: 27_000,
    density_kg_m3: 2_700,
    yield_MPa: 170,
    ultimate_MPa: 215,
    typical_yield_MPa: 214,
    typical_ultimate_MPa: 241,
    source:
      'Typical E, density, yield and ultimate: MatWeb (Aluminum Association typical values). Design minimums: ' +
      'EN 755-2, 6063 T6 thin walls, Rp0.2 170 MPa / Rm 215 MPa (wall-thickness breakpoints vary by edition). G: EN 1999-1-1.',
  },
  '6061-T6': {
    id: '6061-T6',
    name: '6061-T6',
    E_MPa: 68_900,
    G_MPa: 27_000,
    density_kg_m3: 2_700,
    yield_MPa: ksi(35),
    ultimate_MPa: ksi(38),
    typical_yield_MPa: 276,
    typical_ultimate_MPa: 310,
    source:
      'Typical E, density, yield and ultimate: MatWeb (Aluminum Association typical values). Design minimums: ' +
      'Aluminum Design Manual Table A.3.4, Fty 35 ksi / Ftu 38 ksi. G: EN 1999-1-1.',
  },
};

export const ALLOY_IDS = Object.keys(ALLOYS) as AlloyId[];

export const isAlloyId = (s: string): s is AlloyId => Object.prototype.hasOwnProperty.call(ALLOYS, s);
