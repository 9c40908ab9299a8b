import type { DateFormat } from '../model/settings';
import type { Axis, Vec3 } from '../model/axis';
import type { Bearing, ModuleKind } from '../model/module';
import type { MemberRole } from '../model/member';
import type { ToleranceClass } from '../model/settings';
import type { FaceName } from './faces';
import type { HardwareLine } from './hardware';
import type { EndName, EndRole, JointKind } from './joints';
import type { LateralCheck } from './loads';
import type { MachiningOp } from './machining';
import type { SpanCheck } from './member-checks';
import type { ReportWarning } from './warnings';

/**
 * The whole report on a frame, as `calc report` prints it and the editor draws it. Field names are snake_case
 * with units in the name; this shape is a public interface: add fields, don't rename or remove them.
 */
export type FrameReport = {
  report_version: 1;
  name: string;
  units: { display: 'mm' | 'in'; frac: 16 | 32; mass: 'kg' | 'lb'; date: DateFormat; decimal_comma: boolean };
  settings: ReportSettings;
  datums: { id: string; axis: Axis; value_mm: number }[];
  bays: ReportBay[];
  members: ReportMember[];
  joints: ReportJoint[];
  cut_list: CutListLine[];
  hardware: ReportHardware;
  modules: ReportModule[];
  loads: ReportLoads;
  mass: ReportMass;
  warnings: ReportWarning[];
  cautions: string[];
};

export type ReportSettings = {
  kerf_mm: number;
  /** Squaring cut at the start of each bar, and the shortest leftover kept as an offcut. */
  trim_mm: number;
  min_offcut_mm: number;
  machining_allowance_mm: number;
  tolerance_class: ToleranceClass;
  tolerance_standard: string;
  shock_factor: number;
  deflection_limit_n: number;
  safety_factor: number;
  /** False for a frame that never moves: only its weight (times the shock factor) is checked. */
  in_vehicle: boolean;
  forward_g: number;
  rearward_g: number;
  sideways_g: number;
  /** The vehicle's forward direction on the frame's axes, or `unknown` (braking checked toward every side). */
  forward: 'unknown' | '+x' | '-x' | '+y' | '-y';
  /** The upright effective length factor the user set, or null (chosen from the frame). */
  column_k: number | null;
  spares_pct: number;
  t_nut: 'slide-in' | 'drop-in';
};

export type ReportBay = {
  id: string;
  run_id: string;
  /** Position in the run, from its start. */
  index: number;
  module_id: string | null;
  /** Modules stacked above `module_id`, bottom to top. */
  stack_ids: string[];
  start_mm: number;
  end_mm: number;
  width_mm: number;
};

export type ReportEnd = {
  role: EndRole;
  joint_id: string | null;
  /** The member this end meets, if any. */
  meets: string | null;
  /** The join method where the end butts; the end treatment (end cap…) where it is open. */
  method: string;
};

export type ReportMember = {
  id: string;
  name: string | null;
  role: MemberRole;
  profile: string;
  profile_name: string;
  axis: Axis;
  rotation_deg: 0 | 90 | 180 | 270;
  /** The member's box after joints (butting ends cut back to faces). */
  min_mm: Vec3;
  max_mm: Vec3;
  /** Centres of its start and end faces. */
  start_mm: Vec3;
  end_mm: Vec3;
  length_mm: number;
  cut_length_mm: number;
  allowance_start_mm: number;
  allowance_end_mm: number;
  tolerance_mm: number | null;
  /** Cut length in the display unit, e.g. "760 mm" or `29 15/16"`. */
  cut_length_text: string;
  mark: string;
  /** How messages and listings name the member: its kind, part mark and the name given, e.g. "rail C (top rail)". */
  title: string;
  /** The end (or both) the builder marked as bolted to the vehicle's wall, or null. */
  wall_fixing: 'start' | 'end' | 'both' | null;
  ends: { start: ReportEnd; end: ReportEnd };
  ops: MachiningOp[];
  mass_kg: number;
};

export type ReportJoint = {
  /** The two member ids, sorted, joined by "|": stable as long as the two members exist. */
  id: string;
  kind: JointKind;
  butting: { member_id: string; end: EndName };
  other: { member_id: string; end: EndName | null };
  runs_through: string | null;
  method: string;
  method_name: string;
  at_mm: Vec3;
};

export type CutListLine = {
  mark: string;
  profile: string;
  profile_name: string;
  length_mm: number;
  cut_length_mm: number;
  cut_length_text: string;
  tolerance_mm: number | null;
  qty: number;
  member_ids: string[];
  ops: MachiningOp[];
};

export type ReportHardwareLine = HardwareLine;

export type TNutOrder = {
  member_id: string;
  mark: string;
  face: FaceName;
  slot: number;
  count: number;
  closed_by: [string, string];
  for: string[];
  message: string;
};

export type ReportHardware = {
  lines: ReportHardwareLine[];
  spares_pct: number;
  mass_kg: number;
  mass_approximate: true;
  t_nut_order: TNutOrder[];
};

export type ReportModule = {
  id: string;
  name: string | null;
  kind: ModuleKind;
  bay_id: string | null;
  mass_kg: number;
  min_mm: Vec3;
  max_mm: Vec3;
  bearing: Bearing;
  bears_on: { member_id: string; face: FaceName; from_mm: number; to_mm: number }[];
};

export type ReportSpan = SpanCheck;

export type ReportMemberCheck = {
  member_id: string;
  mark: string;
  load_N: number;
  bending_axis: 'x' | 'y';
  I_mm4: number;
  W_mm3: number;
  E_MPa: number;
  spans: ReportSpan[];
  utilisation: number | null;
  governing: 'deflection' | 'stress' | null;
  /** The load case that governs this member (its largest utilisation): an id from `loads.cases`. */
  governing_case: string;
  /** The member's own weight (unfactored), included in its loads as a distributed load. */
  self_weight_N: number;
  /** An unsymmetric section (an angle) bending about its principal axes, free to deflect sideways. */
  unsymmetric: { deflection_factor: number; stress_factor: number } | null;
  /**
   * In the governing case, when it pushes sideways (braking, cornering): the member bent about its other axis by
   * the inertia across it, and that combined with its vertical bending (`utilisation` already includes it).
   */
  lateral: LateralCheck | null;
};

export type ReportLoadCase = { id: string; name: string; vertical_factor: number; ax_g: number; ay_g: number; source: string };

/** One module in one load case: its load, the plan point it acts through, and the reaction on each member. */
export type ReportModuleStatics = {
  module_id: string;
  case: string;
  load_N: number;
  at_mm: { x: number; y: number };
  reactions: { member_id: string; R_N: number; x_mm: number }[];
  /** Null when every support pushes; otherwise the side it tips off to. */
  tips_toward: FaceName | null;
};

export type ReportColumn = {
  member_id: string;
  mark: string;
  axial_N: number;
  governing_case: string;
  length_mm: number;
  K: number;
  K_reason: string;
  I_mm4: number;
  area_mm2: number;
  fo_MPa: number;
  buckling_class: 'A' | 'B';
  slenderness: number;
  relative_slenderness: number;
  euler_N: number;
  chi: number;
  capacity_N: number;
  utilisation: number;
  source: string;
};

export type ReportFixings = {
  case: string;
  horizontal_N: number;
  vertical_N: number;
  /** Feet on the floor and ends bolted to the wall; each given at least what it takes if the others were weaker. */
  points: { member_id: string; mark: string; title: string; kind: 'floor' | 'wall'; at_mm: Vec3; vertical_N: number; horizontal_N: number }[];
};

export type ReportLoads = {
  g_m_s2: number;
  shock_factor: number;
  shock_factor_note: string;
  deflection_limit_n: number;
  deflection_note: string;
  safety_factor: number;
  safety_factor_note: string;
  modules: { module_id: string; weight_N: number; factored_N: number; members: number }[];
  members: ReportMemberCheck[];
  uprights: { member_id: string; axial_N: number }[];
  max_utilisation: number | null;
  governing_member_id: string | null;
  /** Whether the worst utilisation is a beam check or an upright as a column. */
  governing_check: 'beam' | 'column' | null;
  cases: ReportLoadCase[];
  statics: ReportModuleStatics[];
  columns: ReportColumn[];
  column_K: { value: number; reason: string };
  fixings: ReportFixings[];
  fixings_caution: string;
  /** Where the load model simplifies, and which way that errs. */
  model_notes: string[];
};

export type ReportMass = {
  frame_kg: number;
  hardware_kg: number;
  hardware_approximate: true;
  modules_kg: number;
  total_kg: number;
  cog_mm: Vec3 | null;
  frame_cog_mm: Vec3 | null;
  by_profile: { profile: string; length_mm: number; mass_kg: number }[];
};
