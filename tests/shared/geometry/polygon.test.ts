import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { circleRing, isSimpleRing, polygonSection, rectRing, sectionProblem, signedArea } from '@shared/geometry/polygon';
import type { Pt } from '@shared/geometry/vec';

// Polygon moments: C. Steger, "On the Calculation of Arbitrary Moments of Polygons", TR FGBV-96-05, TU München (1996).
// Closed forms for rectangles, hollow rectangles, circles and the parallel-axis theorem: REFERENCES.md [H].

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(1, Math.abs(b));

describe('polygonSection against handbook closed forms', () => {
  it('rectangle: A = bh, I = bh³/12 about the centroid, bh³/3 about the base', () => {
    const b = 40;
    const h = 80;
    const s = polygonSection(rectRing(0, 0, b, h));
    expect(s.area).toBeCloseTo(b * h, 9);
    expect(s.cx).toBeCloseTo(b / 2, 9);
    expect(s.cy).toBeCloseTo(h / 2, 9);
    expect(s.Ix).toBeCloseTo((b * h ** 3) / 12, 6); // [H] bh³/12
    expect(s.Iy).toBeCloseTo((h * b ** 3) / 12, 6);
    expect(s.Ixy).toBeCloseTo(0, 6);
    // Steger's check in REFERENCES.md: about the origin (the base) bh³/3, via the parallel-axis theorem I = Ic + A·d².
    expect(s.Ix + s.area * s.cy ** 2).toBeCloseTo((b * h ** 3) / 3, 4);
  });

  it('hollow rectangle: I = (BH³ − bh³)/12', () => {
    const [B, H, t] = [40, 20, 2];
    const s = polygonSection(rectRing(0, 0, B, H), [rectRing(t, t, B - 2 * t, H - 2 * t)]);
    const b = B - 2 * t;
    const h = H - 2 * t;
    expect(s.area).toBeCloseTo(B * H - b * h, 9);
    expect(s.Ix).toBeCloseTo((B * H ** 3 - b * h ** 3) / 12, 6); // [H] (BH³ − bh³)/12
    expect(s.Iy).toBeCloseTo((H * B ** 3 - h * b ** 3) / 12, 6);
  });

  it('unequal angle matches the composite of two rectangles with the parallel-axis theorem', () => {
    // Handbook method [H]: split the L into a horizontal leg A×T and a vertical stub T×(B−T); I = Σ(Ic + A·d²).
    const [A, B, T] = [50, 30, 5];
    const parts = [
      { a: A * T, x: A / 2, y: T / 2, ix: (A * T ** 3) / 12, iy: (T * A ** 3) / 12 },
      { a: T * (B - T), x: T / 2, y: T + (B - T) / 2, ix: (T * (B - T) ** 3) / 12, iy: ((B - T) * T ** 3) / 12 },
    ];
    const area = parts[0].a + parts[1].a;
    const cx = (parts[0].a * parts[0].x + parts[1].a * parts[1].x) / area;
    const cy = (parts[0].a * parts[0].y + parts[1].a * parts[1].y) / area;
    const Ix = parts.reduce((s, p) => s + p.ix + p.a * (p.y - cy) ** 2, 0);
    const Iy = parts.reduce((s, p) => s + p.iy + p.a * (p.x - cx) ** 2, 0);
    const Ixy = parts.reduce((s, p) => s + p.a * (p.x - cx) * (p.y - cy), 0);
    const L: Pt[] = [
      { x: 0, y: 0 },
      { x: A, y: 0 },
      { x: A, y: T },
      { x: T, y: T },
      { x: T, y: B },
      { x: 0, y: B },
    ];
    const s = polygonSection(L);
    expect(s.area).toBeCloseTo(area, 9);
    expect(s.cx).toBeCloseTo(cx, 9);
    expect(s.cy).toBeCloseTo(cy, 9);
    expect(s.Ix).toBeCloseTo(Ix, 6);
    expect(s.Iy).toBeCloseTo(Iy, 6);
    expect(s.Ixy).toBeCloseTo(Ixy, 6);
    expect(s.Ixy).toBeLessThan(0); // legs along +x and +y from the heel put most area in the −,+ and +,− quadrants
  });

  it('triangle: Ix = bh³/36 about its centroid', () => {
    // Standard handbook result (e.g. Roark, Table A.1), recalled [M].
    const [b, h] = [30, 45];
    const s = polygonSection([
      { x: 0, y: 0 },
      { x: b, y: 0 },
      { x: 10, y: h },
    ]);
    expect(s.area).toBeCloseTo((b * h) / 2, 9);
    expect(s.cy).toBeCloseTo(h / 3, 9);
    expect(s.Ix).toBeCloseTo((b * h ** 3) / 36, 6);
  });

  it('a fine regular polygon approaches the circle and tube formulas πd⁴/64, π(D⁴ − d⁴)/64', () => {
    const D = 40;
    const d = 30;
    const solid = polygonSection(circleRing(0, 0, D / 2, 720));
    expect(rel(solid.Ix, (Math.PI * D ** 4) / 64)).toBeLessThan(1e-4); // [H] πd⁴/64
    const tube = polygonSection(circleRing(5, 5, D / 2, 720), [circleRing(5, 5, d / 2, 720)]);
    expect(rel(tube.Iy, (Math.PI * (D ** 4 - d ** 4)) / 64)).toBeLessThan(1e-4); // [H] π(D⁴ − d⁴)/64
  });

  it('rejects a degenerate outer ring', () => {
    expect(() => polygonSection([{ x: 0, y: 0 }, { x: 1, y: 1 }])).toThrow();
    expect(() => polygonSection([{ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 2, y: 2 }])).toThrow();
  });
});

// ---- properties that must hold for any polygon (fast-check) --------------------------------------------------

/** A star-shaped polygon together with a point that sees every vertex (so the fan around it does not fold). */
const starWithCentre = fc
  .record({
    cx: fc.double({ min: -500, max: 500, noNaN: true }),
    cy: fc.double({ min: -500, max: 500, noNaN: true }),
    radii: fc.array(fc.double({ min: 1, max: 100, noNaN: true }), { minLength: 3, maxLength: 24 }),
  })
  .map(({ cx, cy, radii }) => ({
    centre: { x: cx, y: cy },
    poly: radii.map((r, i) => {
      const t = (2 * Math.PI * i) / radii.length;
      return { x: cx + r * Math.cos(t), y: cy + r * Math.sin(t) };
    }),
  }));

/** A star-shaped simple polygon: sorted angles, positive radii. */
const starPolygon = starWithCentre.map((s) => s.poly);

const close = (a: number, b: number, scale: number) => Math.abs(a - b) <= 1e-7 * Math.max(1, scale);

describe('polygonSection properties', () => {
  it('is invariant under translation (centroidal moments do not move with the section)', () => {
    fc.assert(
      fc.property(starPolygon, fc.double({ min: -1e3, max: 1e3, noNaN: true }), fc.double({ min: -1e3, max: 1e3, noNaN: true }), (poly, dx, dy) => {
        const a = polygonSection(poly);
        const b = polygonSection(poly.map((p) => ({ x: p.x + dx, y: p.y + dy })));
        const scale = Math.abs(a.Ix) + Math.abs(a.Iy);
        return (
          close(a.area, b.area, a.area) &&
          close(a.cx + dx, b.cx, 1e3) &&
          close(a.cy + dy, b.cy, 1e3) &&
          close(a.Ix, b.Ix, scale) &&
          close(a.Iy, b.Iy, scale) &&
          close(a.Ixy, b.Ixy, scale)
        );
      }),
    );
  });

  it('a quarter turn swaps Ix and Iy and negates Ixy', () => {
    // Rotating (x, y) → (−y, x): ∫y'² = ∫x², ∫x'y' = −∫xy. Transformation of second moments [H].
    fc.assert(
      fc.property(starPolygon, (poly) => {
        const a = polygonSection(poly);
        const b = polygonSection(poly.map((p) => ({ x: -p.y, y: p.x })));
        const scale = Math.abs(a.Ix) + Math.abs(a.Iy);
        return close(a.Ix, b.Iy, scale) && close(a.Iy, b.Ix, scale) && close(a.Ixy, -b.Ixy, scale) && close(a.area, b.area, a.area);
      }),
    );
  });

  it('a mirror image keeps Ix and Iy and flips the sign of Ixy', () => {
    fc.assert(
      fc.property(starPolygon, (poly) => {
        const a = polygonSection(poly);
        // Mirroring reverses the winding; polygonSection must cope with that itself.
        const b = polygonSection(poly.map((p) => ({ x: -p.x, y: p.y })));
        const scale = Math.abs(a.Ix) + Math.abs(a.Iy);
        return close(a.Ix, b.Ix, scale) && close(a.Iy, b.Iy, scale) && close(a.Ixy, -b.Ixy, scale) && close(-a.cx, b.cx, 1e3);
      }),
    );
  });

  it('is additive: the fan of triangles that makes up a polygon has the same area and moments', () => {
    fc.assert(
      fc.property(starWithCentre, ({ poly, centre: c }) => {
        const whole = polygonSection(poly);
        // Sum the triangles' moments about a common origin (parallel-axis theorem), then shift to the centroid.
        let A = 0;
        let Sx = 0;
        let Sy = 0;
        let Ixx = 0;
        for (let i = 0; i < poly.length; i++) {
          const tri = [c, poly[i], poly[(i + 1) % poly.length]];
          if (Math.abs(signedArea(tri)) < 1e-12) continue;
          const t = polygonSection(tri);
          A += t.area;
          Sx += t.area * t.cx;
          Sy += t.area * t.cy;
          Ixx += t.Ix + t.area * t.cy * t.cy;
        }
        const cy = Sy / A;
        const Ix = Ixx - A * cy * cy;
        return close(A, whole.area, whole.area) && close(Sx / A, whole.cx, 1e3) && close(cy, whole.cy, 1e3) && Math.abs(Ix - whole.Ix) <= 1e-6 * (whole.Ix + whole.area * cy * cy);
      }),
    );
  });

  it('subtracts a hole whatever its winding, and accepts a clockwise outer ring', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 200, noNaN: true }),
        fc.double({ min: 10, max: 200, noNaN: true }),
        fc.double({ min: 0.05, max: 0.45, noNaN: true }),
        (W, H, k) => {
          const t = k * Math.min(W, H);
          const outer = rectRing(0, 0, W, H);
          const hole = rectRing(t, t, W - 2 * t, H - 2 * t);
          const expected = (W * H ** 3 - (W - 2 * t) * (H - 2 * t) ** 3) / 12; // [H] (BH³ − bh³)/12
          const variants = [
            polygonSection(outer, [hole]),
            polygonSection(outer, [[...hole].reverse()]),
            polygonSection([...outer].reverse(), [hole]),
            polygonSection([...outer].reverse(), [[...hole].reverse()]),
          ];
          return variants.every((s) => Math.abs(s.Ix - expected) <= 1e-9 * expected && Math.abs(s.area - (W * H - (W - 2 * t) * (H - 2 * t))) < 1e-9 * W * H);
        },
      ),
    );
  });
});

describe('ring validity checks', () => {
  it('tells simple rings from self-crossing ones', () => {
    expect(isSimpleRing(rectRing(0, 0, 10, 5))).toBe(true);
    const bowtie = [
      { x: 0, y: 0 },
      { x: 10, y: 10 },
      { x: 10, y: 0 },
      { x: 0, y: 10 },
    ];
    expect(isSimpleRing(bowtie)).toBe(false);
  });

  it('finds holes that touch the outer ring, lie outside it or overlap each other', () => {
    const outer = rectRing(0, 0, 40, 40);
    expect(sectionProblem(outer, [rectRing(5, 5, 10, 10), rectRing(20, 20, 10, 10)])).toBeNull();
    expect(sectionProblem(outer, [rectRing(35, 5, 10, 10)])).toMatch(/touches/);
    expect(sectionProblem(outer, [rectRing(50, 50, 5, 5)])).toMatch(/outside/);
    expect(sectionProblem(outer, [rectRing(5, 5, 10, 10), rectRing(10, 10, 10, 10)])).toMatch(/touch/);
    expect(sectionProblem(outer, [rectRing(5, 5, 20, 20), rectRing(10, 10, 5, 5)])).toMatch(/nested/);
  });
});
