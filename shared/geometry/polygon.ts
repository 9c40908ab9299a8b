import { cross, sub, type Pt } from './vec';

/** Area properties of a plane section, about its own centroid (x along the width, y along the height). */
export type PolygonSection = {
  area: number;
  cx: number;
  cy: number;
  /** ∫(y − cy)² dA: second moment about the horizontal centroidal axis. */
  Ix: number;
  /** ∫(x − cx)² dA: second moment about the vertical centroidal axis. */
  Iy: number;
  /** ∫(x − cx)(y − cy) dA: product of inertia. */
  Ixy: number;
};

/** Signed area: positive for a counter-clockwise ring. */
export function signedArea(ring: readonly Pt[]): number {
  let s = 0;
  for (let i = 0, n = ring.length; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    s += a.x * b.y - b.x * a.y;
  }
  return s / 2;
}

/** Raw moments of one ring about `o`, wound so its area has the given sign (Steger, TR FGBV-96-05, 1996). */
function ringMoments(ring: readonly Pt[], o: Pt, sign: 1 | -1) {
  const r = sign * signedArea(ring) >= 0 ? ring : [...ring].reverse();
  let a = 0;
  let sx = 0;
  let sy = 0;
  let ixx = 0;
  let iyy = 0;
  let ixy = 0;
  for (let i = 0, n = r.length; i < n; i++) {
    const x0 = r[i].x - o.x;
    const y0 = r[i].y - o.y;
    const x1 = r[(i + 1) % n].x - o.x;
    const y1 = r[(i + 1) % n].y - o.y;
    const c = x0 * y1 - x1 * y0;
    a += c;
    sx += (x0 + x1) * c;
    sy += (y0 + y1) * c;
    ixx += (y0 * y0 + y0 * y1 + y1 * y1) * c;
    iyy += (x0 * x0 + x0 * x1 + x1 * x1) * c;
    ixy += (x0 * y1 + 2 * x0 * y0 + 2 * x1 * y1 + x1 * y0) * c;
  }
  return { a: a / 2, sx: sx / 6, sy: sy / 6, ixx: ixx / 12, iyy: iyy / 12, ixy: ixy / 24 };
}

/**
 * Area, centroid and centroidal second moments of a polygon with holes. The outer ring counts positive and each
 * hole negative whatever their winding; holes must lie inside the outer ring and not overlap one another.
 */
export function polygonSection(outer: readonly Pt[], holes: readonly (readonly Pt[])[] = []): PolygonSection {
  if (outer.length < 3) throw new Error('polygonSection: the outer ring needs at least 3 points');
  // Moments about a point on the section keep the sums small, which keeps the centroidal shift accurate.
  const o = outer[0];
  const parts = [ringMoments(outer, o, 1), ...holes.filter((h) => h.length >= 3).map((h) => ringMoments(h, o, -1))];
  const t = parts.reduce(
    (s, p) => ({ a: s.a + p.a, sx: s.sx + p.sx, sy: s.sy + p.sy, ixx: s.ixx + p.ixx, iyy: s.iyy + p.iyy, ixy: s.ixy + p.ixy }),
    { a: 0, sx: 0, sy: 0, ixx: 0, iyy: 0, ixy: 0 },
  );
  if (!(t.a > 0)) throw new Error('polygonSection: the section has no area');
  const cxl = t.sx / t.a;
  const cyl = t.sy / t.a;
  return {
    area: t.a,
    cx: cxl + o.x,
    cy: cyl + o.y,
    Ix: t.ixx - t.a * cyl * cyl,
    Iy: t.iyy - t.a * cxl * cxl,
    Ixy: t.ixy - t.a * cxl * cyl,
  };
}

/** Ring with counter-clockwise winding (a copy). */
export function ccw(ring: readonly Pt[]): Pt[] {
  return signedArea(ring) >= 0 ? [...ring] : [...ring].reverse();
}

export type Bounds = { minX: number; minY: number; maxX: number; maxY: number };

export function bounds(pts: readonly Pt[]): Bounds {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of pts) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

/** Do closed segments ab and cd touch or cross (collinear overlap included)? */
export function segmentsIntersect(a: Pt, b: Pt, c: Pt, d: Pt, eps = 1e-9): boolean {
  const d1 = cross(sub(b, a), sub(c, a));
  const d2 = cross(sub(b, a), sub(d, a));
  const d3 = cross(sub(d, c), sub(a, c));
  const d4 = cross(sub(d, c), sub(b, c));
  if (((d1 > eps && d2 < -eps) || (d1 < -eps && d2 > eps)) && ((d3 > eps && d4 < -eps) || (d3 < -eps && d4 > eps))) {
    return true;
  }
  const onSeg = (p: Pt, q: Pt, r: Pt, dd: number) =>
    Math.abs(dd) <= eps &&
    Math.min(p.x, q.x) - eps <= r.x &&
    r.x <= Math.max(p.x, q.x) + eps &&
    Math.min(p.y, q.y) - eps <= r.y &&
    r.y <= Math.max(p.y, q.y) + eps;
  return onSeg(a, b, c, d1) || onSeg(a, b, d, d2) || onSeg(c, d, a, d3) || onSeg(c, d, b, d4);
}

/** A ring is simple when no two non-adjacent edges touch and no edge has zero length. */
export function isSimpleRing(ring: readonly Pt[]): boolean {
  const n = ring.length;
  if (n < 3) return false;
  for (let i = 0; i < n; i++) {
    const a = ring[i];
    const b = ring[(i + 1) % n];
    if (a.x === b.x && a.y === b.y) return false;
    for (let j = i + 1; j < n; j++) {
      if (j === i || (j + 1) % n === i || j === (i + 1) % n) continue;
      if (segmentsIntersect(a, b, ring[j], ring[(j + 1) % n])) return false;
    }
  }
  return Math.abs(signedArea(ring)) > 0;
}

/** Even-odd point-in-ring test (points on the boundary may go either way). */
export function pointInRing(p: Pt, ring: readonly Pt[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i];
    const b = ring[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

function ringsTouch(r: readonly Pt[], s: readonly Pt[]): boolean {
  for (let i = 0; i < r.length; i++) {
    for (let j = 0; j < s.length; j++) {
      if (segmentsIntersect(r[i], r[(i + 1) % r.length], s[j], s[(j + 1) % s.length])) return true;
    }
  }
  return false;
}

/**
 * Why a polygon with holes is not a valid section, or null when it is: every ring simple, every hole strictly
 * inside the outer ring, no two rings touching, no hole inside another.
 */
export function sectionProblem(outer: readonly Pt[], holes: readonly (readonly Pt[])[] = []): string | null {
  if (!isSimpleRing(outer)) return 'outer ring is not simple';
  for (let h = 0; h < holes.length; h++) {
    const hole = holes[h];
    if (!isSimpleRing(hole)) return `hole ${h} is not simple`;
    if (ringsTouch(outer, hole)) return `hole ${h} touches the outer ring`;
    if (!pointInRing(hole[0], outer)) return `hole ${h} lies outside the outer ring`;
    for (let k = 0; k < h; k++) {
      if (ringsTouch(holes[k], hole)) return `holes ${k} and ${h} touch`;
      if (pointInRing(hole[0], holes[k]) || pointInRing(holes[k][0], hole)) return `holes ${k} and ${h} are nested`;
    }
  }
  return null;
}

/** Regular polygon approximating a circle, counter-clockwise, starting on the +x axis. */
export function circleRing(cx: number, cy: number, r: number, segments = 32): Pt[] {
  const out: Pt[] = [];
  for (let i = 0; i < segments; i++) {
    const t = (2 * Math.PI * i) / segments;
    out.push({ x: cx + r * Math.cos(t), y: cy + r * Math.sin(t) });
  }
  return out;
}

/** Axis-aligned rectangle, counter-clockwise from its lower-left corner. */
export function rectRing(x0: number, y0: number, w: number, h: number): Pt[] {
  return [
    { x: x0, y: y0 },
    { x: x0 + w, y: y0 },
    { x: x0 + w, y: y0 + h },
    { x: x0, y: y0 + h },
  ];
}

export type PrincipalAxes = {
  /** Major and minor principal second moments, I1 ≥ I2. */
  I1: number;
  I2: number;
  /** Angle from the x axis to the major principal axis, radians, in (−π/2, π/2]. */
  theta: number;
};

/**
 * Principal second moments and axes from Ix, Iy and the product Ixy = ∫xy dA (Mohr's circle; Roark, Table A.1):
 * I1,2 = (Ix + Iy)/2 ± √(((Ix − Iy)/2)² + Ixy²), the major axis at θ with tan 2θ = −2Ixy / (Ix − Iy).
 */
export function principalAxes(Ix: number, Iy: number, Ixy: number): PrincipalAxes {
  const mean = (Ix + Iy) / 2;
  const rad = Math.hypot((Ix - Iy) / 2, Ixy);
  return { I1: mean + rad, I2: mean - rad, theta: 0.5 * Math.atan2(-2 * Ixy, Ix - Iy) + 0 };
}
