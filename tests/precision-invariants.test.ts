/**
 * Translation invariance far from the origin (exact identity, no source needed): moving a
 * section by up to 1e8 leaves its centroidal moments, its plastic moduli and the Q of a cut
 * through its centroid unchanged, to 1e-9 relative.
 *
 * The sections are valid (simple) star-shaped loops with optional arcs and an optional hole, on
 * a dyadic grid, and the moves are whole numbers: every moved coordinate is then an exact double, so the check
 * measures the engine rather than the rounding of the input.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { circleContour, contourFrom, reverseContour, translateRegion, type Region } from '../src/geometry/contour';
import { cutSection, sectionProperties } from '../src/properties/section';

const TOL = 1e-9;

/**
 * A valid section: a loop star-shaped about the origin (vertices at increasing angles), scaled
 * by 2^k on a 2^k/1024 grid, whose edges may be arcs that stay inside their own wedge from the
 * origin (so the loop never crosses itself), and optionally a circular hole about the origin
 * clear of every edge.
 */
const section = fc
  .record({
    k: fc.integer({ min: -2, max: 10 }),
    n: fc.integer({ min: 4, max: 12 }), // gaps between vertex angles stay under π: the origin is inside
    radii: fc.array(fc.integer({ min: 300, max: 1024 }), { minLength: 12, maxLength: 12 }),
    jitter: fc.array(fc.double({ min: 0.1, max: 0.9, noNaN: true }), { minLength: 12, maxLength: 12 }),
    bends: fc.array(fc.oneof(fc.constant(0), fc.double({ min: -1, max: 1, noNaN: true })), { minLength: 12, maxLength: 12 }),
    hole: fc.boolean(),
  })
  .map(({ k, n, radii, jitter, bends, hole }): Region => {
    const size = 2 ** k, grid = size / 1024;
    const xy: number[] = [];
    for (let i = 0; i < n; i++) {
      const t = (2 * Math.PI * (i + jitter[i])) / n;
      const r = (radii[i] / 1024) * size;
      xy.push(Math.round((r * Math.cos(t)) / grid) * grid, Math.round((r * Math.sin(t)) / grid) * grid);
    }
    const bulge: number[] = [];
    let clear = Infinity; // distance from the origin to the nearest edge
    for (let i = 0; i < n; i++) {
      const ax = xy[2 * i], ay = xy[2 * i + 1], bx = xy[(2 * i + 2) % (2 * n)], by = xy[(2 * i + 3) % (2 * n)];
      const L = Math.hypot(bx - ax, by - ay);
      // Angles of the triangle (origin, a, b) at a and at b.
      const angA = Math.acos(Math.max(-1, Math.min(1, (-ax * (bx - ax) - ay * (by - ay)) / (Math.hypot(ax, ay) * L))));
      const angB = Math.acos(Math.max(-1, Math.min(1, (-bx * (ax - bx) - by * (ay - by)) / (Math.hypot(bx, by) * L))));
      // An arc leaves its chord at half its sweep: inwards it must stay under both angles,
      // outwards under their supplements, to stay in its wedge (with a margin of 0.9).
      const limit = 0.9 * (bends[i] < 0 ? Math.min(angA, angB) : Math.min(Math.PI - angA, Math.PI - angB, Math.PI / 2));
      const phi = 2 * limit * bends[i]; // positive: outwards for this CCW loop
      bulge.push(Math.tan(phi / 4));
      const chordDist = Math.abs(ax * by - ay * bx) / L;
      clear = Math.min(clear, chordDist - (phi < 0 ? (L / 2) * Math.tan(-phi / 4) : 0));
    }
    const outer = contourFrom(xy, bulge);
    const rh = Math.floor((0.5 * clear) / grid) * grid;
    if (!hole || !(rh > 0)) return [outer];
    return [outer, reverseContour(circleContour(0, 0, rh))];
  });

const move = fc.tuple(fc.integer({ min: -1e8, max: 1e8 }), fc.integer({ min: -1e8, max: 1e8 }));

describe('translation far from the origin', () => {
  it('leaves centroidal moments, plastic moduli and the centroidal Q unchanged (1e-9 relative)', () => {
    fc.assert(
      fc.property(section, move, (region, [dx, dy]) => {
        const p0 = sectionProperties(region);
        const moved = translateRegion(region, dx, dy);
        const p1 = sectionProperties(moved);
        const J = p0.Ix + p0.Iy;
        const rel = (a: number, b: number, s = Math.abs(b)) => Math.abs(a - b) / s;
        expect(rel(p1.area, p0.area)).toBeLessThan(TOL);
        expect(rel(p1.Ix, p0.Ix)).toBeLessThan(TOL);
        expect(rel(p1.Iy, p0.Iy)).toBeLessThan(TOL);
        expect(rel(p1.Ixy, p0.Ixy, J)).toBeLessThan(TOL);
        expect(rel(p1.Zx, p0.Zx)).toBeLessThan(TOL);
        expect(rel(p1.Zy, p0.Zy)).toBeLessThan(TOL);
        // The centroid moves by exactly (dx, dy), up to its own last digits far out.
        const ulp = (v: number) => Math.abs(v) * Number.EPSILON;
        expect(Math.abs(p1.centroid.x - dx - p0.centroid.x)).toBeLessThanOrEqual(Math.max(TOL * Math.sqrt(J / p0.area), 2 * ulp(p1.centroid.x)));
        expect(Math.abs(p1.centroid.y - dy - p0.centroid.y)).toBeLessThanOrEqual(Math.max(TOL * Math.sqrt(J / p0.area), 2 * ulp(p1.centroid.y)));
        // A cut through a vertex (exact at either place): b and Q agree.
        const at = region[0].xy[1];
        const c0 = cutSection(region, 'y', at, p0), c1 = cutSection(moved, 'y', at + dy, p1);
        const qScale = p0.area * Math.sqrt(J / p0.area);
        expect(rel(c1.width, c0.width, Math.max(c0.width, Math.sqrt(J / p0.area)))).toBeLessThan(TOL);
        expect(rel(c1.Q, c0.Q, qScale)).toBeLessThan(TOL);
      }),
      { numRuns: 300 },
    );
  });
});
