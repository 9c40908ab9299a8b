import type { Readout } from '../display/format';
import type { OrderList as PlannerOrderList } from '../planner/order-list';

// What the shop documents are made from. These are plain data shapes the server and the client fill from the
// engine's report (shared/engine) and the stock planner's plan (shared/planner) — see from-report.ts — so every
// document and CSV below is a pure function of them and can be tested without a drawing.

/** Display units the builder chose: millimetres or inches to the nearest 1/16 or 1/32, kg or lb, the date format. */
export type ShopUnits = Readout;

/** Machining on one piece after the saw. `at_mm` is from the piece's start face. */
export type ShopOp =
  | { kind: 'end-tap'; end: 'start' | 'end'; thread: string; tapDrill_mm: number; depth_mm: number }
  | { kind: 'access-hole'; at_mm: number; face: string; diameter_mm: number };

/** One distinct part (one part mark): every piece with that mark is the same length and machining. */
export type ShopPart = {
  mark: string;
  profileId: string;
  profileName: string;
  /** What the saw cuts (finished length plus any machining allowance). */
  cutLength_mm: number;
  qty: number;
  /** ± on the finished length by the frame's tolerance class, when the class gives one. */
  tolerance_mm: number | null;
  ops: ShopOp[];
  /** Member names or roles, for the label and the drill list ("upright", "rail front top"...). */
  members: string[];
};

export type ShopHardware = {
  key: string;
  kind: string;
  /** "corner bracket for 40 mm profile", "M8 × 16 cap screw", "T-nut M8 slide-in"... */
  name: string;
  qty: number;
  /** Extra pieces for losses, included in `toBuy`. */
  spares: number;
  toBuy: number;
};

/** A slide-in T-nut that must go into a slot before that slot's ends are closed. */
export type ShopNutWarning = {
  mark: string | null;
  message: string;
  /** The member whose slot it is, the face and slot, how many nuts, and the members that close the slot's ends. */
  member?: string;
  face?: string;
  slot?: number;
  count?: number;
  closedBy?: string[];
};

export type ShopCutList = {
  kerf_mm: number;
  /** "ISO 2768-1 m (medium)" */
  toleranceClass: string;
  parts: ShopPart[];
  hardware: ShopHardware[];
  nutWarnings: ShopNutWarning[];
};

export type PlannedCut = { length_mm: number; mark: string };

export type PlannedBar = {
  stock_mm: number;
  /** An offcut taken from the workshop's shelf rather than a bought bar. */
  fromShelf: boolean;
  price: number;
  /** In saw order. */
  cuts: PlannedCut[];
  /** What is left after the last cut (and its kerf): kept as an offcut, or waste when shorter than useful. */
  leftover_mm: number;
  leftoverKept: boolean;
};

export type ProfilePlan = {
  profileId: string;
  profileName: string;
  kerf_mm: number;
  trim_mm: number;
  bars: PlannedBar[];
  cost: number;
  waste_pct: number;
  lowerBound: number | null;
  optimal: boolean;
};

export type ShopPlan = { profiles: ProfilePlan[]; currency: string };

/** What every printed document says about where it comes from. */
export type ShopMeta = {
  project: string;
  frame: string;
  revision: number;
  /** ISO date (YYYY-MM-DD) the document was made. */
  date: string;
  workshop: string;
  units: ShopUnits;
  paper: 'A4' | 'LETTER';
};

/** The order a supplier receives: per profile, the planner's grouped order list (bars to buy, offcuts taken from the
 * shelf, and the cut-to-length alternative), with totals across profiles. */
/** A bar the supplier quotes that fits the profile, and what the planner made of it. */
export type ConsideredBar = {
  length_mm: number;
  price: number;
  /** Quoted for this profile, for any profile, or the stand-in when no quoted bar is long enough. */
  source: 'profile' | 'any profile' | 'fallback';
  /** Given to the planner (false when the same length is quoted cheaper elsewhere). */
  offered: boolean;
  /** Bars of it in the plan. */
  used: number;
  note?: string;
};
export type OrderProfile = {
  profileId: string;
  profileName: string;
  order: PlannerOrderList;
  /** The bars offered to the planner and why the plan buys what it buys (absent on orders made before). */
  considered?: ConsideredBar[];
  choice?: string;
};
export type OrderList = {
  currency: string;
  profiles: OrderProfile[];
  barsToBuy: number;
  /** Bars bought (shelf offcuts cost nothing). */
  stockTotal: number;
  cutCount: number;
  cutToLengthTotal: number;
};
