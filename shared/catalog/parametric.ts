import { InputError } from '../errors';
import type { AlloyId } from './alloys';
import { angleOutline, rectOutline, tubeOutline } from './outlines';
import type { Profile } from './profile-types';

/** Plain stock is commonly 6063-T6 or 6061-T6; we assume the weaker until the user says otherwise. */
const PLAIN_ALLOY: AlloyId = '6063-T6';
const MAX_SIZE_MM = 1000;
const PATTERN = /^(rect|tube|angle):(\d+(?:\.\d+)?)[x×](\d+(?:\.\d+)?)(?:[x×](\d+(?:\.\d+)?))?$/i;

const fmt = (v: number): string => String(v);

/**
 * Plain sections named by their dimensions in millimetres: `rect:WxH` (solid bar), `tube:WxHxT` (rectangular
 * tube, wall T, square corners), `angle:AxBxT` (leg A along x, leg B along y, thickness T, no root radius).
 * Returns null when `id` does not start with one of those kinds; throws InputError for a malformed one.
 */
export function parseParametric(id: string): Profile | null {
  const kind = /^(rect|tube|angle):/i.exec(id.trim())?.[1]?.toLowerCase();
  if (!kind) return null;
  const m = PATTERN.exec(id.trim().replace(/\s+/g, ''));
  const usage = { rect: 'rect:WxH', tube: 'tube:WxHxT', angle: 'angle:AxBxT' }[kind as 'rect' | 'tube' | 'angle'];
  const bad = (why: string) => new InputError('profile', `profile: "${id}" ${why}; write ${usage} in millimetres, e.g. ${example[kind as 'rect']}`);
  if (!m) throw bad('is not in the expected form');
  const [a, b] = [Number(m[2]), Number(m[3])];
  const t = m[4] === undefined ? undefined : Number(m[4]);
  if (kind === 'rect' && t !== undefined) throw bad('has a third dimension');
  if (kind !== 'rect' && t === undefined) throw bad('needs a thickness');
  for (const v of [a, b, t]) {
    if (v !== undefined && !(v > 0)) throw bad('has a dimension of zero');
    if (v !== undefined && v > MAX_SIZE_MM) throw bad(`has a dimension over ${MAX_SIZE_MM} mm`);
  }
  const base = { series: 'metric' as const, width_mm: a, height_mm: b, slot_mm: null, fastener: null, bore_mm: null, alloy: PLAIN_ALLOY };
  if (kind === 'rect') {
    return { ...base, id: `rect:${fmt(a)}x${fmt(b)}`, name: `bar ${fmt(a)}×${fmt(b)}`, kind: 'rect', outline: rectOutline(a, b) };
  }
  const wall = t as number;
  if (kind === 'tube') {
    if (!(2 * wall < Math.min(a, b))) throw bad('has a wall too thick for its size');
    return {
      ...base,
      id: `tube:${fmt(a)}x${fmt(b)}x${fmt(wall)}`,
      name: `tube ${fmt(a)}×${fmt(b)}×${fmt(wall)}`,
      kind: 'tube',
      outline: tubeOutline(a, b, wall),
    };
  }
  if (!(wall < Math.min(a, b))) throw bad('has a thickness as large as a leg');
  return {
    ...base,
    id: `angle:${fmt(a)}x${fmt(b)}x${fmt(wall)}`,
    name: `angle ${fmt(a)}×${fmt(b)}×${fmt(wall)}`,
    kind: 'angle',
    outline: angleOutline(a, b, wall),
  };
}

const example = { rect: 'rect:40x10', tube: 'tube:40x20x2', angle: 'angle:40x40x4' };
