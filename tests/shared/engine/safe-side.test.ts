import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { linearReactions, rigidBodyReactions, safeSideReactions, type SupportPoint } from '@shared/engine/statics';

// Rigid body on supports: ΣF = 0, ΣM = 0 (any statics text, e.g. Meriam & Kraige, Engineering Mechanics: Statics).
// A rigid body on springs of stiffness kᵢ settles by a plane, so Rᵢ = kᵢ·(a + b·xᵢ + c·yᵢ): the linear distribution
// with each point weighted by its stiffness. With three or more supports the shares depend on those stiffnesses.

/** Supports as rails along x at given y, each touching the body over [x0, x1], cut into strips. */
function rails(ys: readonly number[], x0: number, x1: number, strips = 4): SupportPoint[] {
  const out: SupportPoint[] = [];
  ys.forEach((y, contact) => {
    const step = (x1 - x0) / strips;
    for (let i = 0; i < strips; i++) out.push({ x: x0 + (i + 0.5) * step, y, weight: step, contact });
  });
  return out;
}
const perSupport = (pts: readonly SupportPoint[], r: readonly number[]) => {
  const m = new Map<number, number>();
  pts.forEach((p, i) => m.set(p.contact, (m.get(p.contact) ?? 0) + r[i]));
  return m;
};

describe('a module on three or more supports: a safe-side bound', () => {
  it('three rails, load over the middle one: the middle takes the whole load (the body on it alone), the outer ones half each', () => {
    // Rails at y = 0, 200, 400, load at y = 200: on the outer two alone the lever rule gives each W/2; on the
    // middle alone it carries all of W; equally stiff, the rigid body gives each W/3.
    const pts = rails([0, 200, 400], 0, 400);
    const W = 300;
    const r = perSupport(pts, safeSideReactions(pts, W, { x: 200, y: 200 }).reactions);
    expect(r.get(1)).toBeCloseTo(W, 6);
    expect(r.get(0)).toBeCloseTo(W / 2, 6);
    expect(r.get(2)).toBeCloseTo(W / 2, 6);
    const eq = perSupport(pts, rigidBodyReactions(pts, W, { x: 200, y: 200 }).reactions);
    for (const k of [0, 1, 2]) expect(eq.get(k)).toBeCloseTo(W / 3, 6);
  });

  it('two supports are determinate: the lever rule as it is', () => {
    const pts = rails([0, 400], 0, 400);
    const r = perSupport(pts, safeSideReactions(pts, 400, { x: 200, y: 100 }).reactions);
    // R₂ = W·y/s = 400·100/400 = 100 N, R₁ = 300 N.
    expect(r.get(1)).toBeCloseTo(100, 9);
    expect(r.get(0)).toBeCloseTo(300, 9);
  });

  const layout = fc.record({
    gaps: fc.array(fc.integer({ min: 40, max: 300 }), { minLength: 2, maxLength: 5 }),
    x0: fc.integer({ min: 0, max: 200 }),
    len: fc.integer({ min: 100, max: 800 }),
    u: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
    v: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
    W: fc.double({ min: 1, max: 5000, noNaN: true }),
    k: fc.array(fc.double({ min: 0.01, max: 100, noNaN: true }), { minLength: 6, maxLength: 6 }),
  });

  it('property: the shares sum to at least the load, each is at least the equal-stiffness share, and none is below what any stiffness of the supports gives it (fast-check)', () => {
    fc.assert(
      fc.property(layout, ({ gaps, x0, len, u, v, W, k }) => {
        const ys = gaps.reduce<number[]>((acc, g) => [...acc, acc[acc.length - 1] + g], [0]);
        const pts = rails(ys, x0, x0 + len);
        const at = { x: x0 + u * len, y: v * ys[ys.length - 1] };
        const bound = safeSideReactions(pts, W, at);
        const R = perSupport(pts, bound.reactions);
        const eq = perSupport(pts, rigidBodyReactions(pts, W, at).reactions);
        const total = [...R.values()].reduce((s, x) => s + x, 0);
        expect(total).toBeGreaterThanOrEqual(W * (1 - 1e-9));
        for (const [c, r] of eq) expect(R.get(c) as number).toBeGreaterThanOrEqual(r - 1e-9 * W);
        // Springs of any stiffness per rail: the plane they settle to, wherever every support still pushes.
        const stiff = pts.map((p) => ({ ...p, weight: p.weight * k[p.contact] }));
        const springs = linearReactions(stiff, W, at);
        if (springs.tips === null) {
          for (const [c, r] of perSupport(pts, springs.reactions)) expect(r).toBeLessThanOrEqual((R.get(c) as number) + 1e-6 * W);
        }
      }),
      { numRuns: 200 },
    );
  });
});
