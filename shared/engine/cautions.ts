import { PROFILE_DISCLAIMER } from '../catalog/profiles';

/** Shown with every report, wherever a load result appears. */
export const CAUTIONS: readonly string[] = [
  'Screening calculation only, not an engineering approval. Deflections and stresses come from standard beam formulas on generic section properties and simplified load paths.',
  'In a moving vehicle, braking, cornering and crash loads act in every direction and crash loads are far higher than the shock factor used here: they are governed by vehicle regulations. Have the design and its fixings assessed by a qualified person.',
  'Joints, brackets and fixings are often weaker than the members they join and are not checked here.',
  "Fix the frame to the vehicle's structure only at points the vehicle maker allows, and latch drawers and doors so they stay shut on the road.",
  'Gas, electrical and water work follow their own codes and need licensed trades where the law requires them.',
  PROFILE_DISCLAIMER,
  'Hardware masses are approximate, worked from rough shapes and material densities.',
];

export const SHOCK_FACTOR_NOTE =
  'Loads are multiplied by the shock factor for road bumps: 2–3 g vertical is common practice for fittings in a van (no published value). Use 1 for a frame that never moves.';

export const SAFETY_FACTOR_NOTE =
  "Bending stress is held to the alloy's design-minimum yield divided by this safety factor (default 1.65, the Aluminum Design Manual's factor for yielding, recalled from memory).";

export const DEFLECTION_NOTE =
  'Deflection under the shock-factored load is held to span / N (default 240: IBC Table 1604.3, total load on floors); cantilevers use twice their length.';

export const FIXINGS_CAUTION =
  "Fixing-point reactions are what the frame passes to the vehicle under each load case, at the feet of its uprights on the floor and at the ends you marked as bolted to the wall. How and where the frame may be fixed to a vehicle, and the crash loads the fixings must take, are for the vehicle maker's rules and a qualified person, not this screening; bolts, inserts and the vehicle's panels are not checked.";

/** Where the load model simplifies; each one errs toward reporting more load, never less. */
export const LOAD_MODEL_NOTES: readonly string[] = [
  'A module is a rigid body on its supports (lever rule along and across them). On three or more supports the share each takes depends on how stiff they are, which the drawing does not say: each is given the most it would take with the module on any one, two or three of them alone, which covers any stiffness and a support that sags or is missing; the shares then add up to more than the weight, and uprights under them may be shown with up to about twice their share.',
  'A pulled support is given no load (its uplift is not relied on) and strips of contact carry the higher edge of their pressure: member loads may add up to a little more than the weight.',
  'Every member carries its own weight; uprights carry their whole weight at the foot.',
  'Uprights are checked as columns over their full length about their weakest axis; intermediate rails are not counted as bracing.',
  "Braking and cornering move each module's weight toward the side it is pushed and push the members sideways: each member a module bears on takes the module's whole inertia force across it (as if the others held nothing), with its own, and is checked bending about its other axis, combined with its vertical bending by adding the stress ratios and the deflections as vectors. Forces along a member, and bending of uprights, are not checked.",
  'Racking of the frame (leaning over like a parallelogram under braking and cornering) is not checked: braces must carry it, and a frame without them is warned about.',
  'Fixings share the load in a way that depends on how stiff each one and the vehicle are, so each is given at least what it would take if the others were weaker: every fixing the whole horizontal force; the feet the weight and the overturning moment between them; each wall fixing the whole weight and the whole overturning moment as a pull at its height. They add up to more than the loads.',
  'Angles and other unsymmetric sections bend about their principal axes with nothing holding them sideways; a member screwed along a panel is stiffer than shown.',
];
