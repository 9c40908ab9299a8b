import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { principalAxes } from '@shared/geometry/polygon';
import { parseForce, parseLength } from '@shared/geometry/units';
import { bucklingClassOf, checkColumn, COLUMN_SOURCE } from '@shared/engine/column';
import { readFlags } from './flags';

export type ColumnOutput = {
  profile: string;
  length_mm: number;
  K: number;
  slenderness: number;
  euler_N: number;
  capacity_N: number;
  utilisation: number;
  source: string;
};

const USAGE = [
  'usage: calc column --profile P --length LEN --load FORCE [--k K]',
  '  --length   the column\'s length ("2 m", "78 in"; a bare number is mm)',
  '  --load     the axial load ("429 N", "96 lbf"; a mass such as "25 kg" counts as its weight)',
  '  --k        effective length factor: 1 both ends held, 2 free to sway (default, the safe side), 0.7 or 2.1 etc.',
].join('\n');

/** `calc column`: an upright as a column, Euler load about its weak axis and the EN 1999-1-1 buckling resistance. */
export async function run(args: string[]): Promise<ColumnOutput> {
  const { values: v, need } = readFlags(args, ['profile', 'length', 'load', 'k'], USAGE);
  const profile = resolveProfile(need('profile'));
  const length = parseLength(need('length'), '--length');
  if (!(length > 0 && length <= 100_000)) throw new Error(`--length: must be more than zero and at most 100 m (got "${v.length}")`);
  const load = parseForce(need('load'), '--load');
  if (!(load >= 0 && load <= 1e7)) throw new Error(`--load: must be a compressive load from 0 to 10 MN (got "${v.load}")`);
  const K = v.k === undefined ? 2 : Number(v.k);
  if (!(Number.isFinite(K) && K >= 0.5 && K <= 5)) throw new Error(`--k: must be a number from 0.5 to 5 (got "${v.k}")`);
  const s = sectionOf(profile);
  const I = principalAxes(s.Ix_mm4, s.Iy_mm4, s.Ixy_mm4).I2;
  const r = checkColumn({ length_mm: length, K, E_MPa: s.E_MPa, I_mm4: I, area_mm2: s.area_mm2, fo_MPa: s.yield_MPa, bucklingClass: bucklingClassOf(s.alloy), load_N: load });
  return {
    profile: profile.id,
    length_mm: length,
    K,
    slenderness: r.slenderness,
    euler_N: r.euler_N,
    capacity_N: r.capacity_N,
    utilisation: r.utilisation,
    source: `${COLUMN_SOURCE} Buckling class ${bucklingClassOf(s.alloy)} for ${s.alloy}; f_o ${s.yield_MPa} MPa; weak-axis I ${Math.round(I)} mm⁴.`,
  };
}
