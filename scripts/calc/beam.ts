import { resolveProfile, sectionOf } from '@shared/catalog/profiles';
import { beam, beamStress, type BeamLoad, type BeamSupport } from '@shared/engine/beam';
import { parseForce, parseForcePerLength, parseLength } from '@shared/geometry/units';
import { readFlags } from './flags';

export type BeamOutput = {
  deflection_mm: number;
  max_moment_Nmm: number;
  stress_MPa: number;
  E_MPa: number;
  I_mm4: number;
  span_mm: number;
};

const USAGE = [
  'usage: calc beam --profile P --span LEN (--load FORCE [--at LEN] | --udl FORCE_PER_LEN)',
  '                 [--support simple|fixed|cantilever] [--axis x|y]',
  '  --span, --at   lengths with units ("1 m", "36 in"; a bare number is mm)',
  '  --load         a point load ("500 N", "112 lbf"; a mass such as "25 kg" counts as its weight)',
  '  --at           where the point load sits, from the left support; default mid-span (cantilever: free end)',
  '  --udl          a load spread over the whole span ("2 N/mm", "10 lbf/in")',
  '  --support      simple (default), fixed (both ends), cantilever (fixed at the start, free at the end)',
  '  --axis         x (default): bending about the profile\'s x axis, load along its height; y: load along its width',
].join('\n');

const SUPPORTS: BeamSupport[] = ['simple', 'fixed', 'cantilever'];

/** `calc beam`: deflection, moment and stress of one profile over a single span. */
export async function run(args: string[]): Promise<BeamOutput> {
  const { values: v, need } = readFlags(args, ['profile', 'span', 'load', 'at', 'udl', 'support', 'axis'], USAGE);
  const profile = resolveProfile(need('profile'));
  const span = parseLength(need('span'), '--span');
  if (!(span > 0)) throw new Error(`--span: must be longer than zero (got "${v.span}")`);

  const support = (v.support ?? 'simple') as BeamSupport;
  if (!SUPPORTS.includes(support)) throw new Error(`--support: must be simple, fixed or cantilever (got "${v.support}")`);
  const axis = v.axis ?? 'x';
  if (axis !== 'x' && axis !== 'y') throw new Error(`--axis: must be x or y (got "${v.axis}")`);

  if (v.load !== undefined && v.udl !== undefined) throw new Error(`--load, --udl: give one or the other, not both\n${USAGE}`);
  if (v.load === undefined && v.udl === undefined) throw new Error(`--load or --udl: one of them is needed\n${USAGE}`);
  if (v.at !== undefined && v.udl !== undefined) throw new Error('--at: applies to --load only; --udl covers the whole span');

  let load: BeamLoad;
  if (v.load !== undefined) {
    const P = parseForce(v.load, '--load');
    const a = v.at === undefined ? (support === 'cantilever' ? span : span / 2) : parseLength(v.at, '--at');
    if (!(a >= 0 && a <= span)) throw new Error(`--at: must lie on the span, 0 to ${span} mm (got "${v.at}")`);
    load = { kind: 'point', P_N: P, a_mm: a };
  } else {
    load = { kind: 'udl', w_N_per_mm: parseForcePerLength(v.udl as string, '--udl') };
  }

  const s = sectionOf(profile);
  const I = axis === 'x' ? s.Ix_mm4 : s.Iy_mm4;
  const W = axis === 'x' ? s.Wx_mm3 : s.Wy_mm3;
  const r = beam({ span_mm: span, E_MPa: s.E_MPa, I_mm4: I, support, loads: [load] });
  return {
    deflection_mm: r.deflection_mm,
    max_moment_Nmm: r.max_moment_Nmm,
    stress_MPa: beamStress(r.max_moment_Nmm, W),
    E_MPa: s.E_MPa,
    I_mm4: I,
    span_mm: span,
  };
}
