/**
 * The section kern against its closed forms, and the exact convex hull it is built on.
 *
 * Sources (all "from memory", editions not at hand):
 * - Timoshenko, Strength of Materials, Part I, the chapter on combined bending and axial load,
 *   "core of a section": the core of a rectangle is a rhombus with diagonals b/3 and h/3 (the
 *   middle-third rule), of a circle a circle of radius r/4, of a ring a circle of radius
 *   (R² + r²)/(4R).
 * - Gere & Goodno, Mechanics of Materials, eccentric axial loads, "core of the cross section":
 *   the rectangle's rhombus with half-diagonals b/6 and h/6.
 * - Roark's Formulas for Stress and Strain (Young & Budynas), the kern in the discussion of
 *   eccentric loading of short prisms: the same three results.
 * - The kern as the set of load points e with 1/A + eᵀI⁻¹p ≥ 0 over the hull: derived from the
 *   general bending formula (Gere & Goodno, Sec. 6.5), used for the unsymmetric cases below.
 */
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { contourFrom, contourLength, contourPolyline, pushArc, reverseContour, rotateRegion, translateRegion, type Contour, type Region } from '../src/geometry/contour';
import { booleanRegions } from '../src/boolean';
import { boundaryDistance, regionContainsPoint } from '../src/materials/locate';
import { regionMoments } from '../src/moments/kernel';
import { sectionProperties } from '../src/properties/section';
import { convexHull } from '../src/kern/hull';
import { kernFromHull, polygonAreaPerimeter, sectionKern, type KernPoint } from '../src/kern/kern';
import { circle, close, rect, sector, segment, worst } from './helpers';

const PI = Math.PI;

function kernOf(region: Region): { pts: KernPoint[]; area: number } {
  const p = sectionProperties(region);
  const pts = sectionKern(region, p);
  return { pts, area: polygonAreaPerimeter(pts).area };
}

describe('kern closed forms', () => {
  it('rectangle: rhombus with half-diagonals b/6 and h/6', () => {
    // Gere & Goodno, core of a rectangular cross section; Timoshenko, Part I, core of a section (from memory).
    const b = 120, h = 300, x0 = 15, y0 = -40;
    const { pts, area } = kernOf([rect(x0, y0, b, h)]);
    expect(pts.length).toBe(4);
    const cx = x0 + b / 2, cy = y0 + h / 2;
    const want: KernPoint[] = [
      [cx - b / 6, cy],
      [cx, cy - h / 6],
      [cx + b / 6, cy],
      [cx, cy + h / 6],
    ];
    for (const w of want) {
      const d = Math.min(...pts.map((p) => Math.hypot(p[0] - w[0], p[1] - w[1])));
      expect(d).toBeLessThan(1e-12 * h);
    }
    // Rhombus area = 2 · (b/6) · (h/6).
    close(area, (2 * b * h) / 36, 1e-12);
  });

  it('solid circle: circle of radius r/4', () => {
    // Timoshenko, Part I, core of a circular section, radius r/4; Roark, kern of a solid circle (from memory).
    const r = 37.5, cx = 210, cy = -95;
    const { pts, area } = kernOf([circle(cx, cy, r)]);
    for (const p of pts) close(Math.hypot(p[0] - cx, p[1] - cy), r / 4, 1e-12);
    const rel = Math.abs(area - PI * (r / 4) ** 2) / (PI * (r / 4) ** 2);
    expect(rel).toBeLessThan(1e-4);
    expect(rel).toBeLessThan(4e-5); // the tracing budget (src/kern/kern.ts)
  });

  it('tube: circle of radius (R² + r²)/(4R)', () => {
    // Timoshenko, Part I, core of a ring section; Roark, kern of a hollow circle (from memory).
    const R = 60, ri = 52;
    const region: Region = [circle(0, 0, R), reverseContour(circle(0, 0, ri))];
    const { pts, area } = kernOf(region);
    const k = (R * R + ri * ri) / (4 * R);
    for (const p of pts) close(Math.hypot(p[0], p[1]), k, 1e-12);
    expect(Math.abs(area - PI * k * k) / (PI * k * k)).toBeLessThan(1e-4);
  });

  it('triangle (Ixy ≠ 0): the triangle of the vertices pulled to a quarter of the way from the centroid', () => {
    // Kern of a triangle: a triangle with its vertices on the medians, at a quarter of the distance
    // from the centroid to each vertex (Timoshenko, Part I, core of a triangular section, from
    // memory). Hand check for an equilateral triangle of side a: I = √3a⁴/96, A = √3a²/4, edge
    // distance h = √3a/6, so |e| = I/(Ah) = √3a/12 = ¼ of the centroid-to-vertex distance √3a/3;
    // the construction is affine-invariant, so it holds for every triangle.
    const V: KernPoint[] = [[2, 1], [31, 6], [9, 27]];
    const region: Region = [contourFrom(V.flat())];
    const p = sectionProperties(region);
    expect(Math.abs(p.Ixy)).toBeGreaterThan(1);
    const pts = sectionKern(region, p);
    expect(pts.length).toBe(3);
    const G = p.centroid;
    for (const [vx, vy] of V) {
      const w: KernPoint = [G.x + (vx - G.x) / 4, G.y + (vy - G.y) / 4];
      expect(Math.min(...pts.map((q) => Math.hypot(q[0] - w[0], q[1] - w[1])))).toBeLessThan(1e-12 * 30);
    }
  });

  it('rotated rectangle: the rhombus turns with the section (Ixy ≠ 0 in document axes)', () => {
    // Kern vertices at ±b/6 and ±h/6 along the rectangle's own axes (Gere & Goodno, as above);
    // rotation invariance of the construction (REFERENCES.md, exact identities).
    const b = 40, h = 90, th = 0.4;
    const region = rotateRegion([rect(-b / 2, -h / 2, b, h)], th);
    const { pts } = kernOf(region);
    const c = Math.cos(th), s = Math.sin(th);
    const want: KernPoint[] = [
      [(b / 6) * c, (b / 6) * s],
      [(-b / 6) * c, (-b / 6) * s],
      [(-h / 6) * -s, (-h / 6) * c],
      [(h / 6) * -s, (h / 6) * c],
    ];
    expect(pts.length).toBe(4);
    for (const w of want) expect(Math.min(...pts.map((p) => Math.hypot(p[0] - w[0], p[1] - w[1])))).toBeLessThan(1e-12 * h);
  });

  it('no load on the kern boundary causes tension, and every kern vertex makes a hull edge the neutral axis', () => {
    // Definition of the kern (Timoshenko, Part I, core of a section, from memory): for e on the
    // kern boundary, min over the section of 1/A + eᵀ I⁻¹ p′ is zero.
    // Unequal angle 150 × 90 × 12 with a round bar welded in the heel, so the hull has arcs and edges.
    const angle = contourFrom([0, 0, 150, 0, 150, 12, 12, 12, 12, 90, 0, 90]);
    const bar = [circle(150, 30, 18)];
    const region: Region = [angle, ...bar];
    const p = sectionProperties([angle]);
    // The two pieces do not overlap (the bar's lowest point is at y = 12, on the leg's top face);
    // take the moments of both as one region.
    const m = regionMoments(region);
    const A = m.m00, xc = m.m10 / A, yc = m.m01 / A;
    const Ix = m.m02 - A * yc * yc, Iy = m.m20 - A * xc * xc, Ixy = m.m11 - A * xc * yc;
    expect(A).toBeGreaterThan(p.area);
    const s = { area: A, centroid: { x: xc, y: yc }, Ix, Iy, Ixy };
    const pts = sectionKern(region, s);
    const D = Ix * Iy - Ixy * Ixy;
    // Probe the section densely along its boundary and the bar's circle.
    const probe: KernPoint[] = [];
    for (let k = 0; k < 6; k++) probe.push([angle.xy[2 * k], angle.xy[2 * k + 1]]);
    for (let k = 0; k < 720; k++) probe.push([150 + 18 * Math.cos((2 * PI * k) / 720), 30 + 18 * Math.sin((2 * PI * k) / 720)]);
    for (const [ex0, ey0] of pts) {
      const ex = ex0 - xc, ey = ey0 - yc;
      let min = Infinity;
      for (const [px0, py0] of probe) {
        const px = px0 - xc, py = py0 - yc;
        // eᵀ I⁻¹ p′ with I⁻¹ = [[Ix, −Ixy], [−Ixy, Iy]] / D.
        const v = 1 / A + (ex * (Ix * px - Ixy * py) + ey * (-Ixy * px + Iy * py)) / D;
        min = Math.min(min, v);
      }
      // Zero up to the probe spacing on the arc (≥ 0 everywhere except round-off).
      expect(min * A).toBeGreaterThan(-1e-12);
      expect(min * A).toBeLessThan(2e-4);
    }
  });
});

/** Arc contour helper: a D shape (half disc plus rectangle) — one arc, three edges. */
function dShape(r: number, w: number): Contour {
  const xy = [0, -r, w, -r];
  const bulge = [0];
  pushArc(xy, bulge, w, -r, w, r, PI);
  xy.push(w, r);
  bulge.push(0);
  xy.push(0, r);
  bulge.push(0);
  return contourFrom(xy, bulge);
}

describe('convex hull (exact)', () => {
  it('of a convex section is the section itself (same area to round-off)', () => {
    // Convexity: the hull of a convex set is the set (exact identity).
    for (const region of [[rect(1, 2, 30, 7)], [circle(5, -3, 11)], [dShape(10, 25)]] as Region[]) {
      const hull = convexHull(region);
      close(regionMoments([hull]).m00, regionMoments(region).m00, 1e-13);
    }
  });

  it('of arcs under 180°: a circular segment and a sector are their own hulls; a concave notch is bridged', () => {
    // Convexity (exact identity) for the segment and the sector (Gere & Goodno, App. E, circular
    // segment and sector, areas r²(α − sinα cosα) and αr²); the hull of a rectangle with a concave
    // circular notch in its top edge is the rectangle.
    for (const alpha of [0.3, 1.1, 1.5]) {
      const seg = segment(3, -2, 17, alpha);
      close(regionMoments([convexHull([seg])]).m00, 17 * 17 * (alpha - Math.sin(alpha) * Math.cos(alpha)), 1e-12);
      const sec = sector(-5, 4, 9, alpha);
      close(regionMoments([convexHull([sec])]).m00, alpha * 81, 1e-12);
    }
    // Rectangle 40 × 20 with its top edge replaced by an arc dipping 5 into it (negative bulge).
    // bulge = −sagitta / half-chord (DXF bulge), so −5/20.
    const notch = contourFrom([0, 0, 40, 0, 40, 20, 0, 20], [0, 0, -0.25, 0]);
    close(regionMoments([convexHull([notch])]).m00, 800, 1e-13);
  });

  it('of an L is the triangle-cut pentagon; of a bar beside a plate, bridges tangent to the bar', () => {
    // Hull of an L (legs a × t and b × t, heel at the origin): the L's outline with the re-entrant
    // corner bridged: area = a·b − (a − t)(b − t)/2 (hand calculation: the bridged triangle).
    const a = 100, b = 60, t = 10;
    const L = contourFrom([0, 0, b, 0, b, t, t, t, t, a, 0, a]);
    const hull = convexHull([L]);
    close(regionMoments([hull]).m00, a * b - ((a - t) * (b - t)) / 2, 1e-13);
    // A disc of radius r centred at (d, 0) beside the point (0, 0)... the hull of a disc and a point
    // outside it: two tangent segments of length √(d² − r²) and the far arc of the disc.
    // Area = r²(π − β) + r √(d² − r²), with β = acos(r/d) (hand calculation: two right
    // triangles and the sector of angle 2π − 2β).
    const r = 4, d = 13;
    const tri = contourFrom([0, -1e-3, 0.001, 0, 0, 1e-3]); // a tiny triangle at the origin
    const hull2 = convexHull([circle(d, 0, r), tri]);
    const beta = Math.acos(r / d);
    const want = r * r * (PI - beta) + r * Math.sqrt(d * d - r * r);
    // The tiny triangle's size changes the area by about its size × the tangent lengths.
    expect(Math.abs(regionMoments([hull2]).m00 - want) / want).toBeLessThan(2e-4);
  });

  it('of two discs: outer common tangents', () => {
    // Hull of two discs r1 at (0,0) and r2 at (d,0): area = the two sectors beyond the tangent
    // points plus the trapezoid between them; with cos γ = (r1 − r2)/d the tangent points are at
    // angles ±γ from the line of centres (hand calculation, "belt" problem).
    const r1 = 10, r2 = 4, d = 30;
    const hull = convexHull([circle(0, 0, r1), circle(d, 0, r2)]);
    const g = Math.acos((r1 - r2) / d);
    const L = Math.sqrt(d * d - (r1 - r2) ** 2);
    const want = r1 * r1 * (PI - g) + r2 * r2 * g + (r1 + r2) * L;
    close(regionMoments([hull]).m00, want, 1e-12);
  });

  it('is invariant to translation and rotation (fast-check, exact identities)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: -1e3, max: 1e3, noNaN: true }),
        fc.double({ min: -PI, max: PI, noNaN: true }),
        fc.double({ min: 2, max: 20, noNaN: true }),
        (dx, dy, th, r) => {
          // A plate, a bar on it and a D shape apart: hull with edges, tangents and arcs.
          const base: Region = [rect(0, 0, 50, 8), circle(10, 8 + r, r), ...translateRegion([dShape(6, 12)], 60, 30)];
          const a0 = regionMoments([convexHull(base)]).m00;
          const moved = rotateRegion(translateRegion(base, dx, dy), th, dx, dy);
          const a1 = regionMoments([convexHull(moved)]).m00;
          expect(Math.abs(a1 - a0) / a0).toBeLessThan(1e-11);
        },
      ),
      { numRuns: 60 },
    );
  });
});

/** Area of the polygon hull of points (Andrew's monotone chain), written out here independently. */
function pointHullArea(pts: [number, number][]): number {
  const p = [...pts].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const cross = (o: number[], a: number[], b: number[]) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const half = (list: [number, number][]) => {
    const h: [number, number][] = [];
    for (const q of list) {
      while (h.length >= 2 && cross(h[h.length - 2], h[h.length - 1], q) <= 0) h.pop();
      h.push(q);
    }
    return h.slice(0, -1);
  };
  const hull = [...half(p), ...half([...p].reverse())];
  let a = 0;
  hull.forEach((q, i) => {
    const r = hull[(i + 1) % hull.length];
    a += q[0] * r[1] - r[0] * q[1];
  });
  return a / 2;
}

describe('convex hull against dense polygonisation (REFERENCES.md: convergence check)', () => {
  it('boolean results with tangents, notches and arcs of every size (fast-check)', () => {
    // The hull of points sampled on the boundary with chord error ≤ tol lies inside the exact hull,
    // and every point of the exact hull's boundary lies within tol of it (arcs: by the chord error;
    // bridges: by convexity between their ends), so its area falls short by at most
    // tol · (perimeter of the exact hull).
    fc.assert(
      fc.property(
        fc.array(fc.record({ x: fc.double({ min: -40, max: 40, noNaN: true }), y: fc.double({ min: -40, max: 40, noNaN: true }), r: fc.double({ min: 2, max: 25, noNaN: true }), box: fc.boolean() }), { minLength: 1, maxLength: 5 }),
        fc.record({ x: fc.double({ min: -30, max: 30, noNaN: true }), y: fc.double({ min: -30, max: 30, noNaN: true }), r: fc.double({ min: 1, max: 15, noNaN: true }) }),
        (adds, hole) => {
          const shapes: Region[] = adds.map((a) => (a.box ? [rect(a.x, a.y, a.r * 2, a.r)] : [circle(a.x, a.y, a.r)]));
          let region = shapes.length > 1 ? booleanRegions(shapes[0], shapes.slice(1), 'union') : shapes[0];
          region = booleanRegions(region, [[circle(hole.x, hole.y, hole.r)]], 'difference');
          fc.pre(region.length > 0 && regionMoments(region).m00 > 1);
          const hull = convexHull(region);
          const exact = regionMoments([hull]).m00;
          const tol = 1e-3;
          const pts: [number, number][] = [];
          for (const c of region) {
            const poly = contourPolyline(c, tol);
            for (let k = 0; k < poly.length; k += 2) pts.push([poly[k], poly[k + 1]]);
          }
          const perimeter = contourLength(hull);
          const dense = pointHullArea(pts);
          expect(exact).toBeGreaterThanOrEqual(dense - 1e-9 * exact);
          expect(exact - dense).toBeLessThanOrEqual(tol * perimeter + 1e-9 * exact);
          expect(exact).toBeGreaterThanOrEqual(regionMoments(region).m00 * (1 - 1e-12));
          // Every boundary point of the section lies in the hull (within round-off).
          for (const [x, y] of pts.filter((_, k) => k % 23 === 0)) {
            expect(regionContainsPoint([hull], x, y) || boundaryDistance([hull], x, y) < 1e-9 * 100).toBe(true);
          }
          // And the kern of the section exists, with a finite boundary.
          const p = sectionProperties(region);
          const kern = kernFromHull(hull, p);
          expect(kern.every(([x, y]) => Number.isFinite(x) && Number.isFinite(y))).toBe(true);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('kern tracing accuracy on off-centre hull arcs', () => {
  it('area within 1e-4 of a dense independent trace (the issue\'s requirement)', () => {
    // e(θ) = G − I ν(θ) / (A ν(θ)·(P(θ) − G)) sampled every 1e-4 rad on each hull arc, written out
    // here independently of src/kern/kern.ts; straight hull edges give one point each.
    const region: Region = [rect(0, 0, 50, 8), circle(10, 16, 8), ...translateRegion([dShape(6, 12)], 60, 30), circle(-20, -5, 3)];
    const m = regionMoments(region);
    const A = m.m00, G = { x: m.m10 / A, y: m.m01 / A };
    const s = { area: A, centroid: G, Ix: m.m02 - A * G.y * G.y, Iy: m.m20 - A * G.x * G.x, Ixy: m.m11 - A * G.x * G.y };
    const hull = convexHull(region);
    const dense: KernPoint[] = [];
    const n = hull.xy.length >> 1;
    const e = (nx: number, ny: number, px: number, py: number): KernPoint => {
      const h = nx * (px - G.x) + ny * (py - G.y);
      return [G.x - (s.Iy * nx + s.Ixy * ny) / (A * h), G.y - (s.Ixy * nx + s.Ix * ny) / (A * h)];
    };
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const ax = hull.xy[2 * i], ay = hull.xy[2 * i + 1], bx = hull.xy[2 * j], by = hull.xy[2 * j + 1];
      const b = hull.bulge ? hull.bulge[i] : 0;
      const L = Math.hypot(bx - ax, by - ay);
      if (b === 0) {
        dense.push(e((by - ay) / L, -(bx - ax) / L, ax, ay));
        continue;
      }
      const phi = 4 * Math.atan(b), alpha = phi / 2, r = L / (2 * Math.sin(alpha));
      const ux = (by - ay) / L, uy = -(bx - ax) / L; // towards the bulge (phi > 0 on a hull)
      const cx = (ax + bx) / 2 - ux * r * Math.cos(alpha), cy = (ay + by) / 2 - uy * r * Math.cos(alpha);
      const t0 = Math.atan2(ay - cy, ax - cx);
      const k = Math.ceil(phi / 1e-4);
      for (let q = 0; q <= k; q++) {
        const t = t0 + (phi * q) / k;
        dense.push(e(Math.cos(t), Math.sin(t), cx + r * Math.cos(t), cy + r * Math.sin(t)));
      }
    }
    const want = polygonAreaPerimeter(dense).area;
    const got = polygonAreaPerimeter(sectionKern(region, s)).area;
    expect(Math.abs(got - want) / want).toBeLessThan(1e-4);
    expect(Math.abs(got - want) / want).toBeLessThan(4e-5);
  });
});

describe('kern of arbitrary sections', () => {
  it('is convex and contains the centroid (fast-check)', () => {
    // The kern is an intersection of half-planes that all contain the centroid (definition above).
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 5, max: 10, noNaN: true }), { minLength: 5, maxLength: 10 }),
        fc.array(fc.double({ min: -0.2, max: 0.2, noNaN: true }), { minLength: 10, maxLength: 10 }),
        (radii, bulges) => {
          const n = radii.length;
          const xy: number[] = [];
          const bl: number[] = [];
          for (let i = 0; i < n; i++) {
            const t = (2 * PI * i) / n;
            xy.push(radii[i] * Math.cos(t), radii[i] * Math.sin(t));
            bl.push(bulges[i]);
          }
          const region: Region = [contourFrom(xy, bl)];
          const p = sectionProperties(region);
          const pts = kernFromHull(convexHull(region), p);
          expect(pts.length).toBeGreaterThanOrEqual(3);
          // CCW and convex: every turn is left (or straight, to round-off).
          const { area } = polygonAreaPerimeter(pts);
          expect(area).toBeGreaterThan(0);
          for (let i = 0; i < pts.length; i++) {
            const a = pts[i], b = pts[(i + 1) % pts.length], c = pts[(i + 2) % pts.length];
            const cross = (b[0] - a[0]) * (c[1] - b[1]) - (b[1] - a[1]) * (c[0] - b[0]);
            expect(cross).toBeGreaterThan(-1e-9 * area);
          }
          // Centroid inside: all cross products of edges with the centroid are positive.
          for (let i = 0; i < pts.length; i++) {
            const a = pts[i], b = pts[(i + 1) % pts.length];
            expect((b[0] - a[0]) * (p.centroid.y - a[1]) - (b[1] - a[1]) * (p.centroid.x - a[0])).toBeGreaterThan(0);
          }
        },
      ),
      { numRuns: 80 },
    );
  });
});

afterAll(() => {
  console.log(`kern: largest relative error ${worst.value.toExponential(2)}`);
});
