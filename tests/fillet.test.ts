/**
 * Exact fillets (src/geometry/fillet.ts), checked through the exact moment kernel against
 * closed forms built by the composite-area method (Hibbeler, Statics, ch. 9 / Mechanics of
 * Materials, ch. 10: add and subtract simple parts, each moved by the parallel-axis theorem).
 *
 * Building blocks:
 * - rectangle: A = bh, centroidal I = bh³/12 (Gere & Goodno, Mechanics of Materials, App. E);
 * - quarter circle of radius r: A = πr²/4, ∫u dA = r³/3 about each straight edge, I about each
 *   straight edge πr⁴/16, product of inertia about the straight edges r⁴/8 (Gere & Goodno,
 *   App. E, quarter circle);
 * - circular sector of radius r and angle φ: A = r²φ/2 (Gere & Goodno, App. E, circular sector);
 * - the corner a fillet removes at an interior angle α: the kite of two right triangles with
 *   legs r and r·cot(α/2), less the sector of angle π − α, A = r²(cot(α/2) − (π − α)/2)
 *   (composite of a triangle and a sector, as above).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { filletCorner, filletPolygonCorner, pathEndDirection, tangentArc, type FilletPath } from '../src/geometry/fillet';
import { pathContour } from '../src';
import { regionMoments, type RawMoments } from '../src/moments/kernel';
import { validateShape } from '../src/document/validate';
import type { Point } from '../src/document/types';

const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(Math.abs(b), 1e-300);
const moments = (p: FilletPath): RawMoments => regionMoments([pathContour(p.start, p.segments)]);

function ok(r: ReturnType<typeof filletCorner>) {
  if (!r.ok) throw new Error(r.message);
  return r;
}

const Z: RawMoments = { m00: 0, m10: 0, m01: 0, m20: 0, m02: 0, m11: 0 };
function combine(...parts: [number, RawMoments][]): RawMoments {
  const out = { ...Z };
  for (const [s, m] of parts) for (const k of Object.keys(out) as (keyof RawMoments)[]) out[k] += s * m[k];
  return out;
}
/** Rectangle [x0, x1] × [y0, y1], moments about the origin (parallel-axis theorem). */
function rect(x0: number, y0: number, x1: number, y1: number): RawMoments {
  const b = x1 - x0, h = y1 - y0, A = b * h, xc = (x0 + x1) / 2, yc = (y0 + y1) / 2;
  return { m00: A, m10: A * xc, m01: A * yc, m20: (b ** 3 * h) / 12 + A * xc * xc, m02: (b * h ** 3) / 12 + A * yc * yc, m11: A * xc * yc };
}
/** Quarter disc of radius r centred at (cx, cy), lying in the quadrant (sx·u ≥ 0, sy·v ≥ 0). */
function quarterDisc(cx: number, cy: number, r: number, sx: 1 | -1, sy: 1 | -1): RawMoments {
  const A = (Math.PI * r * r) / 4, Q = (r ** 3) / 3, I = (Math.PI * r ** 4) / 16, P = (r ** 4) / 8;
  return {
    m00: A,
    m10: cx * A + sx * Q,
    m01: cy * A + sy * Q,
    m20: cx * cx * A + 2 * cx * sx * Q + I,
    m02: cy * cy * A + 2 * cy * sy * Q + I,
    m11: cx * cy * A + cx * sy * Q + cy * sx * Q + sx * sy * P,
  };
}
function worst(got: RawMoments, want: RawMoments): number {
  const scale = (k: keyof RawMoments) => Math.max(Math.abs(want[k]), k === 'm11' ? Math.abs(want.m20) : 0);
  return Math.max(...(Object.keys(want) as (keyof RawMoments)[]).map((k) => Math.abs(got[k] - want[k]) / scale(k)));
}

describe('fillet of a line–line corner', () => {
  const a = 100;
  const square: Point[] = [[0, 0], [a, 0], [a, a], [0, a]];

  it('a square with one corner rounded: area a² − (1 − π/4)r², centroid and second moments by composite areas', () => {
    for (const r of [1, 20, 37.5, 99.9]) {
      const res = ok(filletPolygonCorner(square, 2, r));
      expect(validateShape({ id: 's', ...res.path }, 'shape')).toEqual([]);
      // Tangent points a distance r from the corner along each side (tan 45° = 1), centre (a − r, a − r).
      expect(res.tangentIn).toEqual([a, a - r]);
      expect(res.tangentOut).toEqual([a - r, a]);
      expect(res.centre).toEqual([a - r, a - r]);
      expect(res.sweep).toBeCloseTo(Math.PI / 2, 15);
      const m = moments(res.path);
      // Gere & Goodno, App. E, quarter-circular spandrel: A = (1 − π/4)r².
      expect(rel(m.m00, a * a - (1 - Math.PI / 4) * r * r)).toBeLessThan(1e-13);
      // Spandrel centroid (10 − 3π)r / (3(4 − π)) from its corner (Gere & Goodno, App. E), so by
      // composite areas (Hibbeler): x̄ = ȳ = (a²·a/2 − As(a − e)) / (a² − As).
      const As = (1 - Math.PI / 4) * r * r, e = ((10 - 3 * Math.PI) * r) / (3 * (4 - Math.PI));
      const xbar = (a * a * (a / 2) - As * (a - e)) / (a * a - As);
      expect(rel(m.m10 / m.m00, xbar)).toBeLessThan(1e-13);
      expect(rel(m.m01 / m.m00, xbar)).toBeLessThan(1e-13);
      // Every moment: square − (corner square r×r − quarter disc about the fillet centre).
      const want = combine([1, rect(0, 0, a, a)], [-1, rect(a - r, a - r, a, a)], [1, quarterDisc(a - r, a - r, r, 1, 1)]);
      expect(worst(m, want)).toBeLessThan(1e-13);
    }
  });

  it('rounds the start vertex too, and a radius that uses up a whole side drops it', () => {
    const res = ok(filletPolygonCorner(square, 0, 10));
    expect(res.path.start).toEqual([10, 0]);
    expect(res.path.segments[res.path.segments.length - 1].to).toEqual([10, 0]);
    expect(rel(moments(res.path).m00, a * a - (1 - Math.PI / 4) * 100)).toBeLessThan(1e-13);
    // r = a: the fillet runs from corner to corner, the two sides at the corner vanish.
    const full = ok(filletPolygonCorner(square, 2, a));
    expect(full.path.segments.length).toBe(3); // two sides + the quarter arc
    expect(rel(moments(full.path).m00, (Math.PI * a * a) / 4)).toBeLessThan(1e-13); // a quarter disc
  });

  it('any corner of a triangle: tangent length r·cot(α/2), area less r²(cot(α/2) − (π − α)/2)', () => {
    // A 3-4-5 triangle: interior angles known by their tangents (right angle at the origin).
    const tri: Point[] = [[0, 0], [40, 0], [0, 30]];
    const area = 600;
    const alpha = [Math.PI / 2, Math.atan2(30, 40), Math.atan2(40, 30)];
    for (let k = 0; k < 3; k++) {
      const r = 5;
      const res = ok(filletPolygonCorner(tri, k, r));
      const cot = 1 / Math.tan(alpha[k] / 2);
      const V = tri[k];
      expect(Math.abs(Math.hypot(res.tangentIn[0] - V[0], res.tangentIn[1] - V[1]) / (r * cot) - 1)).toBeLessThan(1e-14);
      expect(Math.abs(Math.hypot(res.tangentOut[0] - V[0], res.tangentOut[1] - V[1]) / (r * cot) - 1)).toBeLessThan(1e-14);
      expect(Math.abs(Math.abs(res.sweep) - (Math.PI - alpha[k]))).toBeLessThan(1e-14);
      const removed = r * r * (cot - (Math.PI - alpha[k]) / 2);
      expect(rel(moments(res.path).m00, area - removed)).toBeLessThan(1e-13);
    }
  });

  it('a concave corner gets the arc on the other side and adds area', () => {
    // L shape; the re-entrant corner at (10, 10) turns right (CCW outline).
    const L: Point[] = [[0, 0], [50, 0], [50, 10], [10, 10], [10, 50], [0, 50]];
    const r = 6;
    const res = ok(filletPolygonCorner(L, 3, r));
    expect(res.sweep).toBeCloseTo(-Math.PI / 2, 15);
    expect(res.centre).toEqual([10 + r, 10 + r]);
    // Gere & Goodno, App. E: the root fillet adds one spandrel (1 − π/4)r².
    const A = 50 * 10 + 10 * 40;
    expect(rel(moments(res.path).m00, A + (1 - Math.PI / 4) * r * r)).toBeLessThan(1e-13);
  });

  it('random convex polygons: the removed area matches the closed form at every corner (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 3, max: 9 }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        fc.integer({ min: 0, max: 8 }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        (n, phase, R, kk, frac) => {
          // A regular n-gon of circumradius R: interior angle α = π − 2π/n, sides 2R sin(π/n).
          const pts: Point[] = Array.from({ length: n }, (_, i) => [R * Math.cos(phase + (2 * Math.PI * i) / n) + 3 * R, R * Math.sin(phase + (2 * Math.PI * i) / n) - R]);
          const k = kk % n;
          const alpha = Math.PI - (2 * Math.PI) / n;
          const side = 2 * R * Math.sin(Math.PI / n);
          const r = (frac * side) / (1 / Math.tan(alpha / 2)); // the tangent length is frac × side
          const res = ok(filletPolygonCorner(pts, k, r));
          const area = (n / 2) * R * R * Math.sin((2 * Math.PI) / n);
          const removed = r * r * (1 / Math.tan(alpha / 2) - (Math.PI - alpha) / 2);
          expect(rel(moments(res.path).m00, area - removed)).toBeLessThan(1e-11);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('fillet where a line meets an arc', () => {
  const R = 50;
  // Half disc: the diameter from (−R, 0) to (R, 0), then the arc back over the top (CCW).
  const half = { start: [-R, 0] as Point, segments: [{ to: [R, 0] as Point }, { to: [-R, 0] as Point, via: [0, R] as Point }] };

  it('inside a half disc: tangent points, centre and area from the sector construction', () => {
    for (const r of [2, 10, 20]) {
      for (const corner of [0, 1]) {
        const res = ok(filletCorner(half, corner, r));
        // Centre r above the diameter and R − r from the disc's centre (internal tangency).
        const Fx = Math.sqrt((R - r) ** 2 - r * r);
        const sx = corner === 1 ? 1 : -1;
        expect(Math.abs(res.centre[0] - sx * Fx)).toBeLessThan(1e-13 * R);
        expect(Math.abs(res.centre[1] - r)).toBeLessThan(1e-13 * R);
        // Tangent point on the arc: on the ray from the disc's centre through the fillet centre.
        const onArc = corner === 1 ? res.tangentOut : res.tangentIn;
        expect(Math.abs(Math.hypot(onArc[0], onArc[1]) - R)).toBeLessThan(1e-13 * R);
        expect(Math.abs(onArc[0] * r - onArc[1] * sx * Fx)).toBeLessThan(1e-12 * R * R);
        // Removed corner = disc sector (angle β) − triangle (O, T, F) − fillet sector (π/2 + β):
        // composite of a triangle and two sectors (Gere & Goodno, App. E, circular sector).
        const beta = Math.atan2(r, Fx);
        const removed = 0.5 * R * R * beta - 0.5 * Fx * r - 0.5 * r * r * (Math.PI / 2 + beta);
        expect(rel(moments(res.path).m00, (Math.PI * R * R) / 2 - removed)).toBeLessThan(1e-12);
        expect(validateShape({ id: 'h', ...res.path }, 'shape')).toEqual([]);
      }
    }
  });

  it('against a concave arc (a notch): external tangency, area by a triangle and two sectors', () => {
    const a = 100, rho = 30, r = 8;
    // Square with a quarter-circle notch about its corner (a, a); the notch arc runs CW.
    const c = a - rho / Math.SQRT2;
    const notched = {
      start: [0, 0] as Point,
      segments: [{ to: [a, 0] as Point }, { to: [a, a - rho] as Point }, { to: [a - rho, a] as Point, via: [c, c] as Point }, { to: [0, a] as Point }, { to: [0, 0] as Point }],
    };
    const res = ok(filletCorner(notched, 2, r));
    // Centre r left of the side x = a and ρ + r from the notch centre (external tangency).
    const Fy = a - Math.sqrt((rho + r) ** 2 - r * r);
    expect(Math.abs(res.centre[0] - (a - r))).toBeLessThan(1e-13 * a);
    expect(Math.abs(res.centre[1] - Fy)).toBeLessThan(1e-13 * a);
    // Triangle (C, T1, F) = removed piece + notch sector (γ) + fillet sector (δ), γ + δ = π/2.
    const delta = Math.atan2(a - Fy, r), gamma = Math.PI / 2 - delta;
    const removed = 0.5 * r * (a - Fy) - 0.5 * rho * rho * gamma - 0.5 * r * r * delta;
    const before = a * a - (Math.PI * rho * rho) / 4;
    expect(rel(moments({ type: 'path', ...notched } as FilletPath).m00, before)).toBeLessThan(1e-13);
    expect(rel(moments(res.path).m00, before - removed)).toBeLessThan(1e-12);
  });

  it('between two arcs: both tangencies hold and the path stays valid', () => {
    // A lens: two arcs of radius 50 meeting at sharp corners (±30, 0).
    const lens = { start: [-30, 0] as Point, segments: [{ to: [30, 0] as Point, via: [0, -10] as Point }, { to: [-30, 0] as Point, via: [0, 10] as Point }] };
    const res = ok(filletCorner(lens, 1, 3));
    const Cs = [[0, 40], [0, -40]]; // circle centres: radius 50 through (±30, 0) and (0, ∓10)
    for (const [cx, cy] of Cs) expect(Math.abs(Math.hypot(res.centre[0] - cx, res.centre[1] - cy) - 47)).toBeLessThan(1e-12 * 50);
    expect(Math.abs(Math.hypot(res.tangentIn[0] - res.centre[0], res.tangentIn[1] - res.centre[1]) - 3)).toBeLessThan(1e-12);
    expect(moments(res.path).m00).toBeLessThan(moments({ type: 'path', ...lens } as FilletPath).m00);
    expect(validateShape({ id: 'l', ...res.path }, 'shape')).toEqual([]);
  });
});

describe('fillet refusals', () => {
  const square: Point[] = [[0, 0], [10, 0], [10, 10], [0, 10]];
  const msg = (r: ReturnType<typeof filletCorner>) => (r.ok ? '' : r.message);
  it('says when the radius does not fit and which radius would', () => {
    expect(msg(filletPolygonCorner([[0, 0], [10, 0], [10, 4], [0, 4]], 1, 5))).toMatch(/does not fit at corner 1.*shorter side is 4 long \(largest radius: 4\)/);
    expect(msg(filletCorner({ start: [-5, 0], segments: [{ to: [5, 0] }, { to: [-5, 0], via: [0, 5] }] }, 1, 5))).toMatch(/does not fit inside the neighbouring arc of radius 5/);
  });
  it('refuses straight corners, bad radii, missing corners and the ends of an open line', () => {
    expect(msg(filletPolygonCorner([[0, 0], [5, 0], [10, 0], [10, 10]], 1, 1))).toMatch(/straight/);
    for (const r of [0, -1, NaN, Infinity]) expect(msg(filletPolygonCorner(square, 1, r))).toMatch(/greater than 0/);
    expect(msg(filletPolygonCorner(square, 4, 1))).toMatch(/no corner 4/);
    expect(msg(filletCorner({ start: [0, 0], segments: [{ to: [10, 0] }, { to: [10, 10] }] }, 0, 1))).toMatch(/end of an open line/);
    // An open line's inner corner is fine.
    expect(filletCorner({ start: [0, 0], segments: [{ to: [10, 0] }, { to: [10, 10] }] }, 1, 2).ok).toBe(true);
  });
});

describe('fillet on arbitrary input', () => {
  it('refuses a corner that nearly turns straight back instead of placing the arc beyond it (regression: 1 + cos θ cancelled to a negative tangent length)', () => {
    // Two lines meeting at 180° − 2.6e-8 rad: the tangent length r·tan(θ/2) is about 7.7e11 × r,
    // far longer than either side, so no radius of 1e4 fits.
    const r = filletCorner({ start: [0, -2], segments: [{ to: [2.5951456941567153e-8, 0] }, { to: [0, -3] }, { to: [0, -2] }] }, 1, 1e4);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/does not fit/);
  });

  it('stays exact next to a nearly flat arc (regression: intersecting the offset circles cancelled)', () => {
    // An arc of radius about 1e8 (three nearly collinear points) meets an arc of radius 2 at
    // (2.8e-8, 1); a fillet of 4.4e-8 there must be tangent to both: its tangent points lie at
    // the fillet radius from its centre, to round-off of the section's size.
    const path = { start: [0, -2] as Point, segments: [{ to: [2.806561810161594e-8, 1] as Point, via: [0, -1] as Point }, { to: [-1, -3] as Point, via: [1, -1] as Point }, { to: [0, -2] as Point }] };
    const r = 4.39835116050165e-8;
    const res = filletCorner(path, 1, r);
    if (!res.ok) throw new Error(res.message);
    for (const t of [res.tangentIn, res.tangentOut]) expect(Math.abs(Math.hypot(t[0] - res.centre[0], t[1] - res.centre[1]) - r)).toBeLessThan(1e-9 * 5);
  });

  it('never throws or yields a non-finite point: a valid path or a message (fuzz)', () => {
    const coord = fc.oneof(fc.integer({ min: -5, max: 5 }), fc.double({ min: -1e6, max: 1e6, noNaN: true }));
    const seg = fc.record({ to: fc.tuple(coord, coord), arc: fc.boolean(), via: fc.tuple(coord, coord) });
    fc.assert(
      fc.property(fc.tuple(coord, coord), fc.array(seg, { minLength: 1, maxLength: 6 }), fc.integer({ min: -1, max: 7 }), fc.double({ min: -1, max: 1e4, noNaN: true }), fc.boolean(), (start, raw, corner, r, close) => {
        const segments = raw.map((g) => (g.arc ? { to: g.to as Point, via: g.via as Point } : { to: g.to as Point }));
        if (close) segments.push({ to: start as Point });
        const res = filletCorner({ start: start as Point, segments }, corner, r);
        if (!res.ok) {
          expect(res.message.length).toBeGreaterThan(10);
          return;
        }
        const all = [res.path.start, ...res.path.segments.flatMap((g) => (g.via ? [g.to, g.via] : [g.to]))];
        for (const q of all) expect(Number.isFinite(q[0]) && Number.isFinite(q[1])).toBe(true);
        expect(Number.isFinite(res.sweep)).toBe(true);
        // The fillet's tangent points lie at the radius from its centre, to round-off of the size of
        // the two segments that meet at the corner (an arc of radius 1e6 meeting a fillet of 1e-4
        // fixes its tangent point only to about 1e6 × 1e-16 / sin(the angle it is cut at)).
        // An arc's centre sits at its radius from its points, so a nearly straight arc (radius 1e9
        // through points a unit apart) carries its radius into the round-off as well.
        const pts = [start as Point, ...segments.flatMap((g) => (g.via ? [g.to, g.via] : [g.to]))];
        let from = start as Point;
        const radii = segments.map((g) => {
          const rr = g.via ? circumradius(from, g.via, g.to) : 0;
          from = g.to;
          return Number.isFinite(rr) ? Math.min(rr, 1e12) : 0;
        });
        const size = Math.max(1, r, Math.hypot(...res.centre), ...pts.map((q) => Math.hypot(q[0], q[1])), ...radii);
        for (const t of [res.tangentIn, res.tangentOut]) expect(Math.abs(Math.hypot(t[0] - res.centre[0], t[1] - res.centre[1]) - r)).toBeLessThan(1e-9 * size);
      }),
      { numRuns: 2000 },
    );
  });
});

/** Radius of the circle through three points (Infinity when they are collinear). */
function circumradius(a: Point, b: Point, c: Point): number {
  const ab = Math.hypot(b[0] - a[0], b[1] - a[1]);
  const bc = Math.hypot(c[0] - b[0], c[1] - b[1]);
  const ca = Math.hypot(a[0] - c[0], a[1] - c[1]);
  const cross = Math.abs((b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]));
  return cross === 0 ? Infinity : (ab * bc * ca) / (2 * cross);
}

describe('tangent arcs for typed path entry', () => {
  it('leaves the point along the given direction and turns by the signed sweep', () => {
    // A quarter turn to the left of radius 10 from the origin heading +x ends at (10, 10).
    const g = tangentArc([0, 0], [1, 0], 10, Math.PI / 2);
    expect(g.to[0]).toBeCloseTo(10, 13);
    expect(g.to[1]).toBeCloseTo(10, 13);
    expect(g.via![0]).toBeCloseTo(10 * Math.SQRT1_2, 13);
    expect(g.via![1]).toBeCloseTo(10 - 10 * Math.SQRT1_2, 13);
    // Turning right instead ends at (10, −10).
    const h = tangentArc([0, 0], [1, 0], 10, -Math.PI / 2);
    expect(h.to[1]).toBeCloseTo(-10, 13);
  });
  it('reads the direction at the end of a line or an arc', () => {
    expect(pathEndDirection({ start: [0, 0], segments: [{ to: [3, 4] }] })).toEqual([0.6, 0.8]);
    const d = pathEndDirection({ start: [0, 0], segments: [{ to: [10, 10], via: [10 * Math.SQRT1_2, 10 - 10 * Math.SQRT1_2] }] })!;
    expect(d[0]).toBeCloseTo(0, 13);
    expect(d[1]).toBeCloseTo(1, 13);
    expect(pathEndDirection({ start: [0, 0], segments: [] })).toBeNull();
  });
});
