import { AXIS_INDEX } from '../model/axis';
import { snapToStep } from './grid';
import type { Scene } from './scene';
import type { ViewDef } from './views';

/** What a snapped position may attach to, so it follows when the frame re-lays (see model/position.ts). */
export type SnapRef = { datum: string; offset_mm: number } | { member: string; face: 'min' | 'max'; offset_mm: number };

export type SnapKind = 'grid' | 'end' | 'face' | 'module' | 'bay';

/** A line on one screen axis something can snap to. `from`/`to` bound the cue drawn along the other axis. */
export type SnapTarget = { value: number; kind: SnapKind; ref: SnapRef | null; from: number; to: number; label: string };

/** Snap targets of a view, per screen axis, sorted by value. */
export type SnapTargets = { h: SnapTarget[]; v: SnapTarget[] };

/** Kinds ordered by how much a builder means them: a member's end beats its face, beats a module, beats a bay. */
const PRIORITY: Readonly<Record<SnapKind, number>> = { end: 0, face: 1, module: 2, bay: 3, grid: 4 };

/**
 * Everything in a view one can snap to, except the excluded members (those being moved). Member faces attach to
 * the member; bay edges to the bay's datums; module edges to their bay's datums plus the clearance.
 */
export function collectTargets(scene: Scene, view: ViewDef, exclude: ReadonlySet<string> = new Set()): SnapTargets {
  const h: SnapTarget[] = [];
  const v: SnapTarget[] = [];
  const hi = AXIS_INDEX[view.h];
  const vi = AXIS_INDEX[view.v];
  for (const m of scene.members) {
    if (exclude.has(m.id)) continue;
    const b = m.drawn;
    const label = m.mark ?? m.id;
    for (const [list, k, o, axis] of [
      [h, hi, vi, view.h],
      [v, vi, hi, view.v],
    ] as const) {
      const kind: SnapKind = m.axis === axis ? 'end' : 'face';
      for (const face of ['min', 'max'] as const) {
        list.push({
          value: face === 'min' ? b.min[k] : b.max[k],
          kind,
          ref: { member: m.id, face, offset_mm: 0 },
          from: b.min[o],
          to: b.max[o],
          label: `${label} ${kind === 'end' ? (face === 'min' ? 'start' : 'end') : 'face'}`,
        });
      }
    }
  }
  for (const m of scene.modules) {
    const bay = m.bay ? scene.bays.find((x) => x.id === m.bay) : undefined;
    for (const [list, k, o, axis] of [
      [h, hi, vi, view.h],
      [v, vi, hi, view.v],
    ] as const) {
      for (const face of ['min', 'max'] as const) {
        const value = face === 'min' ? m.box.min[k] : m.box.max[k];
        const ref: SnapRef | null =
          bay && bay.axis === axis
            ? face === 'min'
              ? { datum: `${bay.id}.start`, offset_mm: value - bay.start_mm }
              : { datum: `${bay.id}.end`, offset_mm: value - bay.end_mm }
            : null;
        list.push({ value, kind: 'module', ref, from: m.box.min[o], to: m.box.max[o], label: `${m.name} edge` });
      }
    }
  }
  const span = scene.bounds;
  for (const bay of scene.bays) {
    const list = bay.axis === view.h ? h : bay.axis === view.v ? v : null;
    if (!list || !span) continue;
    const o = list === h ? vi : hi;
    list.push({ value: bay.start_mm, kind: 'bay', ref: { datum: `${bay.id}.start`, offset_mm: 0 }, from: span.min[o], to: span.max[o], label: `bay ${bay.id} start` });
    list.push({ value: bay.end_mm, kind: 'bay', ref: { datum: `${bay.id}.end`, offset_mm: 0 }, from: span.min[o], to: span.max[o], label: `bay ${bay.id} end` });
  }
  const order = (a: SnapTarget, b: SnapTarget) => a.value - b.value || PRIORITY[a.kind] - PRIORITY[b.kind];
  h.sort(order);
  v.sort(order);
  return { h, v };
}

/** First index whose value is ≥ x (binary search). */
function lowerBound(list: readonly SnapTarget[], x: number): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (list[mid].value < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * The best target within `tol` of `value`. With `at` (the point's coordinate on the other screen axis), targets
 * that reach `at` come first: a rail drawn at mid-height between two uprights attaches to the uprights, not to the
 * ends of rails that happen to line up with them at the top. Then the nearest, then by kind.
 */
export function nearestTarget(list: readonly SnapTarget[], value: number, tol: number, at?: number): SnapTarget | null {
  let best: SnapTarget | null = null;
  let bestKey: [number, number, number] = [Infinity, Infinity, Infinity];
  for (let i = lowerBound(list, value - tol); i < list.length && list[i].value <= value + tol; i++) {
    const t = list[i];
    const reaches = at === undefined || t.kind === 'grid' || (at >= Math.min(t.from, t.to) - tol && at <= Math.max(t.from, t.to) + tol) ? 0 : 1;
    const d = Math.round(Math.abs(t.value - value) * 1e6) / 1e6;
    const key: [number, number, number] = [reaches, d, PRIORITY[t.kind]];
    if (key[0] < bestKey[0] || (key[0] === bestKey[0] && (key[1] < bestKey[1] || (key[1] === bestKey[1] && key[2] < bestKey[2])))) {
      best = t;
      bestKey = key;
    }
  }
  return best;
}

export type Snapped = { value: number; target: SnapTarget | null };

/**
 * Snap one coordinate: to the best target within `tol` (see nearestTarget), else to the grid when `gridStep` is
 * given, else as it is. The grid never attaches a reference.
 */
export function snapValue(list: readonly SnapTarget[], value: number, tol: number, gridStep: number | null, at?: number): Snapped {
  const t = nearestTarget(list, value, tol, at);
  if (t) return { value: t.value, target: t };
  if (gridStep) {
    const g = snapToStep(value, gridStep);
    return { value: g, target: { value: g, kind: 'grid', ref: null, from: 0, to: 0, label: 'grid' } };
  }
  return { value, target: null };
}

/**
 * Snap a movement of something whose edges sit at `edges` (on one screen axis) by `delta`: the edge that lands
 * closest to a target decides; failing that the first edge goes to the grid. Returns the adjusted delta.
 */
export function snapMove(
  list: readonly SnapTarget[],
  edges: readonly number[],
  delta: number,
  tol: number,
  gridStep: number | null,
): { delta: number; target: SnapTarget | null } {
  let best: { delta: number; target: SnapTarget } | null = null;
  let bestD = Infinity;
  for (const e of edges) {
    const t = nearestTarget(list, e + delta, tol);
    if (!t) continue;
    const d = Math.abs(t.value - (e + delta));
    if (d < bestD) {
      bestD = d;
      best = { delta: t.value - e, target: t };
    }
  }
  if (best) return best;
  if (gridStep && edges.length > 0) {
    const g = snapToStep(edges[0] + delta, gridStep);
    return { delta: g - edges[0], target: { value: g, kind: 'grid', ref: null, from: 0, to: 0, label: 'grid' } };
  }
  return { delta, target: null };
}
