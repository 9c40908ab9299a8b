// What every sizing function in this folder hands back: flat parts to cut from sheets and hardware to buy.

/** One flat part, as a cut list and the sheet planner read it. `length_mm` runs along the grain. */
export type SheetPart = {
  name: string;
  length_mm: number;
  width_mm: number;
  thickness_mm: number;
  qty: number;
  /** Parts with a visible face keep the grain along their length; hidden box parts may turn. */
  grain: boolean;
};

/** A hardware line: what, how many, and why (so the builder can check the count). */
export type HardwareLine = { item: string; qty: number; note: string };

/** Round to 0.1 mm: the precision a track-saw rule is read to; keeps float noise out of cut lists. */
export const r01 = (v: number): number => Math.round(v * 10) / 10;
