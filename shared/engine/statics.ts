import type { FaceName } from './faces';

/** A place a rigid body rests on, in plan (mm), with its share of the bearing (a length of contact, or 1 for a point). */
export type RestPoint = { x: number; y: number; weight: number };

export type RigidBodyResult = {
  /** Upward reaction at each point (N); a negative one would have to pull. Sums to the load. */
  reactions: number[];
  /**
   * Which way the body tips, or null when every reaction pushes: toward the side of the footprint its centre of
   * gravity lies beyond (a support would have to pull, or there is no support on that side at all).
   */
  tips: { toward: FaceName; dx: number; dy: number } | null;
  /** The points lie on one line (or at one point): nothing resists turning across it. */
  collinear: boolean;
};

/** Relative size below which a second moment of the footprint counts as none (a line of supports). */
const FLAT = 1e-9;

/** The plan side a horizontal direction points to (x left → right, y front → back), by its larger component. */
export function sideToward(dx: number, dy: number): FaceName {
  if (Math.abs(dx) >= Math.abs(dy)) return dx >= 0 ? 'right' : 'left';
  return dy >= 0 ? 'back' : 'front';
}

/**
 * Reactions of a rigid body resting on points, under a vertical load W at (X, Y): ΣF = 0 and ΣM = 0 about both
 * plan axes (any statics text, e.g. Meriam & Kraige, Engineering Mechanics: Statics). With two points this is the
 * lever rule, R₂ = W·x/s, R₁ = W − R₂. With more, the body is statically indeterminate; the reactions are those of
 * a rigid body on equally stiff supports (each point's stiffness in proportion to its weight), which vary linearly
 * across the footprint: R = w·(a + b·dx + c·dy) with dx, dy from the footprint's centroid. A negative reaction means
 * the body tips unless that support can pull.
 */
/** The linear distribution alone, pulls included (for an overturning moment the supports must resist both ways). */
export function linearReactions(points: readonly RestPoint[], W: number, at: { x: number; y: number }): RigidBodyResult {
  const n = points.length;
  if (n === 0) return { reactions: [], tips: null, collinear: true };
  let sw = 0;
  let sx = 0;
  let sy = 0;
  for (const p of points) {
    sw += p.weight;
    sx += p.weight * p.x;
    sy += p.weight * p.y;
  }
  const cx = sx / sw;
  const cy = sy / sw;
  let Sxx = 0;
  let Syy = 0;
  let Sxy = 0;
  let extent = 0;
  for (const p of points) {
    const dx = p.x - cx;
    const dy = p.y - cy;
    Sxx += p.weight * dx * dx;
    Syy += p.weight * dy * dy;
    Sxy += p.weight * dx * dy;
    extent = Math.max(extent, Math.abs(dx), Math.abs(dy));
  }
  const ex = at.x - cx;
  const ey = at.y - cy;
  // Principal directions of the footprint's second moments: a direction with none is a line of supports.
  const mean = (Sxx + Syy) / 2;
  const rad = Math.hypot((Sxx - Syy) / 2, Sxy);
  const l1 = mean + rad;
  const l2 = mean - rad;
  const theta = 0.5 * Math.atan2(2 * Sxy, Sxx - Syy);
  const u1 = { x: Math.cos(theta), y: Math.sin(theta) };
  const u2 = { x: -u1.y, y: u1.x };
  const scale = sw * Math.max(extent, 1) ** 2;
  const flat1 = !(l1 > FLAT * scale);
  const flat2 = !(l2 > FLAT * scale);
  const e1 = ex * u1.x + ey * u1.y;
  const e2 = ex * u2.x + ey * u2.y;
  const k1 = flat1 ? 0 : (W * e1) / l1;
  const k2 = flat2 ? 0 : (W * e2) / l2;
  const reactions = points.map((p) => {
    const dx = p.x - cx;
    const dy = p.y - cy;
    return p.weight * (W / sw + k1 * (dx * u1.x + dy * u1.y) + k2 * (dx * u2.x + dy * u2.y));
  });
  // Off a line of supports by more than float noise: nothing holds it across.
  const tol = 1e-6 * Math.max(extent, 1);
  const offLine = (flat1 && Math.abs(e1) > tol) || (flat2 && Math.abs(e2) > tol);
  const pulls = reactions.some((r) => r < -1e-9 * Math.abs(W));
  const tips = W > 0 && (offLine || pulls) ? { toward: sideToward(ex, ey), dx: ex, dy: ey } : null;
  return { reactions, tips, collinear: flat2 };
}

/**
 * Reactions of a rigid body resting on points that can only push. The linear distribution first; where it asks a
 * support to pull, that support lifts off and the rest carry the body (re-solved until every reaction pushes). The
 * body tips when no set of pushing supports can hold it: its centre of gravity lies outside their footprint. A body
 * that tips is reported with the reactions of the linear distribution, pull included, so the pull shows.
 */
export function rigidBodyReactions(points: readonly RestPoint[], W: number, at: { x: number; y: number }): RigidBodyResult {
  const all = linearReactions(points, W, at);
  if (!(W > 0) || points.length === 0) return all;
  if (all.tips === null) return all;
  const active = points.map(() => true);
  let current = all;
  for (let round = 0; round < points.length; round++) {
    const idx = active.flatMap((a, i) => (a ? [i] : []));
    // Lift off the support that pulls hardest; re-solve on the rest.
    let worst = -1;
    for (let k = 0; k < idx.length; k++) if (current.reactions[k] < -1e-9 * W && (worst < 0 || current.reactions[k] < current.reactions[worst])) worst = k;
    if (worst < 0) break;
    active[idx[worst]] = false;
    const rest = points.filter((_, i) => active[i]);
    if (rest.length === 0) break;
    current = linearReactions(rest, W, at);
    if (current.tips === null) {
      const reactions = points.map(() => 0);
      let k = 0;
      for (let i = 0; i < points.length; i++) if (active[i]) reactions[i] = current.reactions[k++];
      return { reactions, tips: null, collinear: all.collinear };
    }
  }
  return all;
}

/** A rest point that belongs to one support (a member the body touches along a stretch of it). */
export type SupportPoint = RestPoint & { contact: number };

export type BoundResult = {
  /** Per point: the reactions of the sub-case that loads its support most; they sum to at least the load. */
  reactions: number[];
  /** The rigid body on equally stiff supports (as rigidBodyReactions), for tipping and the record. */
  equal: RigidBodyResult;
};

/** Above this many supports, sets of three are not tried and every support is given the whole load instead. */
const MAX_SUPPORTS_FOR_TRIPLES = 10;

/**
 * A rigid body on three or more supports is statically indeterminate: how it shares depends on how stiff each
 * support is, which the drawing does not say. Every pushing share of the load is a mix of the statically
 * determinate ones (the body on one, two or three of its supports alone, by the lever rule along and across;
 * the vertices of the set of pushing reactions that satisfy ΣF = 0, ΣM = 0), so the most any one support can take
 * is the most it takes in one of those. Each support is given that, with the equal-stiffness share as a floor, and
 * its stretch carries the pressure of the sub-case that loads it most; with more supports than can be tried in
 * threes, each takes the whole load. Two supports or fewer are determinate and solved as they are.
 */
export function safeSideReactions(points: readonly SupportPoint[], W: number, at: { x: number; y: number }): BoundResult {
  const equal = rigidBodyReactions(points, W, at);
  const supports = [...new Set(points.map((p) => p.contact))];
  if (supports.length < 3 || !(W > 0) || equal.tips !== null) return { reactions: equal.reactions, equal };
  const bySupport = new Map<number, number[]>();
  points.forEach((p, i) => bySupport.set(p.contact, [...(bySupport.get(p.contact) ?? []), i]));
  const sumOf = (r: readonly number[], idx: readonly number[]) => idx.reduce((s, i) => s + r[i], 0);
  const best = new Map<number, { R: number; reactions: Map<number, number> }>();
  for (const c of supports) {
    const idx = bySupport.get(c) as number[];
    best.set(c, { R: sumOf(equal.reactions, idx), reactions: new Map(idx.map((i) => [i, equal.reactions[i]])) });
  }
  if (supports.length > MAX_SUPPORTS_FOR_TRIPLES) {
    // The whole load on each support, spread as its own stretch alone would carry it: plainly on the safe side.
    for (const c of supports) {
      const idx = bySupport.get(c) as number[];
      const total = idx.reduce((s, i) => s + points[i].weight, 0);
      best.set(c, { R: W, reactions: new Map(idx.map((i) => [i, (W * points[i].weight) / total])) });
    }
  } else {
    const tryOn = (set: readonly number[]) => {
      const idx = set.flatMap((c) => bySupport.get(c) as number[]);
      const r = rigidBodyReactions(
        idx.map((i) => points[i]),
        W,
        at,
      );
      if (r.tips !== null) return;
      for (const c of set) {
        const mine = (bySupport.get(c) as number[]).map((i) => idx.indexOf(i));
        const R = mine.reduce((s, k) => s + r.reactions[k], 0);
        const b = best.get(c) as { R: number };
        if (R > b.R + 1e-9 * W) best.set(c, { R, reactions: new Map(mine.map((k) => [idx[k], r.reactions[k]])) });
      }
    };
    const n = supports.length;
    for (let a = 0; a < n; a++) {
      tryOn([supports[a]]);
      for (let b = a + 1; b < n; b++) {
        tryOn([supports[a], supports[b]]);
        for (let c = b + 1; c < n; c++) tryOn([supports[a], supports[b], supports[c]]);
      }
    }
  }
  const reactions = points.map((p, i) => best.get(p.contact)?.reactions.get(i) ?? 0);
  return { reactions, equal };
}
