import type { FrameSettings } from '../model/settings';

/**
 * Accelerations for load securing, in g. EN 12195-1 for road vehicles over 3.5 t; VDI 2700 Sheet 16 / ISO 27956
 * for vans (REFERENCES.md). The defaults take the largest of each, so a van of any size is covered.
 */
export const LOAD_SECURING = [
  { id: 'en-12195-1', source: 'EN 12195-1, vehicles over 3.5 t', forward_g: 0.8, rearward_g: 0.5, sideways_g: 0.5, vertical_g: 1.0 },
  { id: 'van-2-3.5t', source: 'VDI 2700 Sheet 16 / ISO 27956, vans 2.0–3.5 t', forward_g: 0.8, rearward_g: 0.5, sideways_g: 0.6, vertical_g: 1.0 },
  { id: 'van-2t', source: 'VDI 2700 Sheet 16 / ISO 27956, vans up to 2.0 t', forward_g: 0.9, rearward_g: 0.5, sideways_g: 0.7, vertical_g: 1.0 },
] as const;

export const DEFAULT_FORWARD_G = Math.max(...LOAD_SECURING.map((r) => r.forward_g));
export const DEFAULT_REARWARD_G = Math.max(...LOAD_SECURING.map((r) => r.rearward_g));
export const DEFAULT_SIDEWAYS_G = Math.max(...LOAD_SECURING.map((r) => r.sideways_g));

export type LoadCaseId = string;

/**
 * One way the vehicle moves: gravity times `vertical`, and a horizontal inertia force of (ax, ay) g on every mass,
 * along the frame's x and y (braking pushes the load toward the vehicle's front).
 */
export type LoadCase = { id: LoadCaseId; name: string; vertical: number; ax: number; ay: number; source: string };

const AXES = {
  '+x': { x: 1, y: 0, word: 'right' },
  '-x': { x: -1, y: 0, word: 'left' },
  '+y': { x: 0, y: 1, word: 'back' },
  '-y': { x: 0, y: -1, word: 'front' },
} as const;
type Dir = keyof typeof AXES;
const OPPOSITE: Record<Dir, Dir> = { '+x': '-x', '-x': '+x', '+y': '-y', '-y': '+y' };
const ACROSS: Record<Dir, [Dir, Dir]> = { '+x': ['+y', '-y'], '-x': ['+y', '-y'], '+y': ['+x', '-x'], '-y': ['+x', '-x'] };

const SHOCK_SOURCE = 'road bumps: 2–3 g vertical for fittings in a van, common practice (no published value)';
const SECURING_SOURCE = 'load securing: EN 12195-1; VDI 2700 Sheet 16 / ISO 27956 for vans (REFERENCES.md)';

/**
 * The load cases a frame is checked for: the vertical shock alone, then braking (inertia forwards), rearward and
 * cornering (sideways, both ways), each with gravity (1 g). Where the vehicle's forward direction is not set, a
 * braking case is checked toward each of the four sides, which can only over-report.
 */
export function loadCases(
  s: Pick<FrameSettings, 'shockFactor' | 'forward_g' | 'rearward_g' | 'sideways_g' | 'forward'> & { inVehicle?: boolean },
): LoadCase[] {
  const cases: LoadCase[] = [{ id: 'shock', name: `vertical shock × ${s.shockFactor}`, vertical: s.shockFactor, ax: 0, ay: 0, source: SHOCK_SOURCE }];
  if (s.inVehicle === false) {
    cases[0] = { ...cases[0], name: s.shockFactor === 1 ? 'weight alone' : cases[0].name, source: 'a frame that never moves: its weight times the shock factor set' };
    return cases;
  }
  const push = (id: string, name: string, dir: Dir, g: number) => {
    if (g > 0) cases.push({ id, name: `${name} (${g} g toward the ${AXES[dir].word})`, vertical: 1, ax: AXES[dir].x * g, ay: AXES[dir].y * g, source: SECURING_SOURCE });
  };
  if (s.forward === 'unknown') {
    const g = Math.max(s.forward_g, s.rearward_g, s.sideways_g);
    for (const d of Object.keys(AXES) as Dir[]) push(`braking${d}`, 'braking or cornering', d, g);
    return cases;
  }
  const f = s.forward as Dir;
  push('braking', 'braking', f, s.forward_g);
  push('rearward', 'accelerating', OPPOSITE[f], s.rearward_g);
  const [a, b] = ACROSS[f];
  push(`cornering${a}`, 'cornering', a, s.sideways_g);
  push(`cornering${b}`, 'cornering', b, s.sideways_g);
  return cases;
}
