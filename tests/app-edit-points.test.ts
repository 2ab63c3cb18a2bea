/**
 * Vertex and segment editing of polygons and paths (src/shapes/edit-points.ts), without a
 * browser. Areas of the edited shapes come from the engine's exact moments and are checked
 * against closed forms named beside each check; refusals must leave the input untouched.
 */
import { describe, expect, it } from 'vitest';
import { regionMoments, shapeToRegion, type PathShape, type Point, type PolygonShape, type Shape } from '../src';
import { arcMidpointAwayFrom } from '../src/shapes/edit-points';
import {
  pathDeletePoint,
  pathMakeArc,
  pathMakeLine,
  pathSplitSegment,
  polygonDeletePoint,
  polygonInsertAfter,
  type PointEdit,
} from '../src';
import { close } from './helpers';

const PI = Math.PI;
const area = (s: Shape) => regionMoments(shapeToRegion(s)).m00;
function ok<S extends Shape>(r: PointEdit<S>): S {
  if (!r.ok) throw new Error(`refused: ${r.message}`);
  return r.shape;
}
function refused<S extends Shape>(r: PointEdit<S>): string {
  if (r.ok) throw new Error('expected a refusal');
  return r.message;
}
/** Shoelace formula (Gauss's area formula; Gere & Goodno, App. E, polygon by coordinates). */
function shoelace(p: Point[]): number {
  let s = 0;
  for (let i = 0; i < p.length; i++) {
    const [x0, y0] = p[i], [x1, y1] = p[(i + 1) % p.length];
    s += x0 * y1 - x1 * y0;
  }
  return s / 2;
}

const b = 100, h = 60;
const rectPoly = (): PolygonShape => ({ id: 'p', type: 'polygon', points: [[0, 0], [b, 0], [b, h], [0, h]] });
const a = 80;
/** A square of side a as a CCW path of four lines. */
const squarePath = (): PathShape => ({ id: 'q', type: 'path', start: [0, 0], segments: [{ to: [a, 0] }, { to: [a, a] }, { to: [0, a] }, { to: [0, 0] }] });
const r = 25;
/** Semicircle of radius r on the x axis: arc from (r, 0) through (0, r) to (−r, 0), then the diameter. */
const semicircle = (): PathShape => ({ id: 's', type: 'path', start: [r, 0], segments: [{ to: [-r, 0], via: [0, r] }, { to: [r, 0] }] });

describe('polygon vertices', () => {
  it('insert after each vertex puts the new vertex at the edge midpoint and keeps the area', () => {
    for (let i = 0; i < 4; i++) {
      const s = rectPoly();
      const n = ok(polygonInsertAfter(s, i));
      expect(n.points).toHaveLength(5);
      const p = s.points[i], q = s.points[(i + 1) % 4];
      expect(n.points[i + 1]).toEqual([(p[0] + q[0]) / 2, (p[1] + q[1]) / 2]);
      close(area(n), b * h, 1e-12); // A = b·h (Gere & Goodno, App. E, rectangle): a point on an edge adds nothing
    }
  });
  it('an inserted vertex moved outward adds the triangle it spans', () => {
    const n = ok(polygonInsertAfter(rectPoly(), 0)); // (b/2, 0) between (0,0) and (b,0)
    const moved = { ...n, points: n.points.map((p, k) => (k === 1 ? ([b / 2, -20] as Point) : p)) };
    close(area(moved), shoelace(moved.points), 1e-12); // shoelace formula (Gauss's area formula)
    close(area(moved), b * h + (b * 20) / 2, 1e-12); // rectangle + triangle b·t/2 (Gere & Goodno, App. E)
  });
  it('delete a corner of a rectangle leaves the right triangle', () => {
    for (let i = 0; i < 4; i++) {
      const n = ok(polygonDeletePoint(rectPoly(), i));
      expect(n.points).toHaveLength(3);
      close(area(n), (b * h) / 2, 1e-12); // A = b·h/2 (Gere & Goodno, App. E, triangle)
      close(area(n), Math.abs(shoelace(n.points)), 1e-12); // shoelace formula
    }
  });
  it('delete is refused below 3 vertices and leaves the record as it was', () => {
    const tri: PolygonShape = { id: 't', type: 'polygon', points: [[0, 0], [4, 0], [0, 3]] };
    const before = structuredClone(tri);
    const msg = refused(polygonDeletePoint(tri, 1, 'shapes[2]'));
    expect(msg).toMatch(/shapes\[2\]\.points\[1\]/);
    expect(msg).toMatch(/at least 3 vertices/);
    expect(tri).toEqual(before);
  });
  it('delete is refused when the rest would be collinear', () => {
    const s: PolygonShape = { id: 'c', type: 'polygon', points: [[0, 0], [1, 0], [2, 0], [1, 1]] };
    expect(refused(polygonDeletePoint(s, 3))).toMatch(/enclose no area/);
  });
  it('an index out of range is refused', () => {
    expect(refused(polygonInsertAfter(rectPoly(), 4))).toMatch(/no vertex 5/);
    expect(refused(polygonDeletePoint(rectPoly(), -1))).toMatch(/no vertex/);
  });
});

describe('path points and segments', () => {
  it('splitting a line inserts its midpoint and keeps the area', () => {
    const n = ok(pathSplitSegment(squarePath(), 3)); // the closing line (0, a) → (0, 0)
    expect(n.segments.map((g) => g.to)).toEqual([[a, 0], [a, a], [0, a], [0, a / 2], [0, 0]]);
    expect(n.segments[n.segments.length - 1].to).toEqual(n.start);
    close(area(n), a * a, 1e-12); // A = a² (Gere & Goodno, App. E, square)
  });
  it('splitting the arc of a semicircle keeps both halves on the circle and the properties', () => {
    const n = ok(pathSplitSegment(semicircle(), 0));
    expect(n.segments).toHaveLength(3);
    expect(n.segments[0].to).toEqual([0, r]); // split at the old via point
    for (const g of n.segments.slice(0, 2)) {
      const v = g.via!;
      close(Math.hypot(v[0], v[1]), r, 1e-15); // on the circle of radius r about the origin
    }
    // Each quarter's midpoint is at 45° (quarter circles, Gere & Goodno, App. E).
    close(n.segments[0].via![0], r / Math.SQRT2, 1e-15);
    close(n.segments[1].via![0], -r / Math.SQRT2, 1e-15);
    const m = regionMoments(shapeToRegion(n));
    close(m.m00, (PI * r * r) / 2, 1e-12); // A = πr²/2 (Gere & Goodno, App. E, semicircle)
    close(m.m01, (2 * r ** 3) / 3, 1e-12); // ȳ·A = 4r/(3π)·πr²/2 (Gere & Goodno, App. E, semicircle)
    close(m.m02, (PI * r ** 4) / 8, 1e-12); // Ix about the diameter = πr⁴/8 (Gere & Goodno, App. E, semicircle)
  });
  it('splitting arcs of many sweeps (flat to nearly full, either direction) stays on the circle', () => {
    const cx = 3.5, cy = -7.25, R = 12;
    for (const sweepDeg of [2, 45, 179, 180, 181, 270, 350, -10, -200]) {
      const t0 = 0.3, phi = (sweepDeg * PI) / 180;
      const P = (t: number): Point => [cx + R * Math.cos(t), cy + R * Math.sin(t)];
      const A = P(t0), V = P(t0 + phi * 0.3), B = P(t0 + phi); // via off the middle on purpose
      // The arc and the chord back: a circular segment, A = R²(θ − sin θ)/2 for a sweep θ
      // (Gere & Goodno, App. E, circular segment), signed by the direction of travel.
      const s: PathShape = { id: 'g', type: 'path', start: A, segments: [{ to: B, via: V }, { to: A }] };
      const th = Math.abs(phi);
      const segArea = (R * R * (th - Math.sin(th))) / 2;
      close(Math.abs(area(s)), segArea, 1e-11);
      const n = ok(pathSplitSegment(s, 0));
      for (const g of n.segments.slice(0, 2)) close(Math.hypot(g.via![0] - cx, g.via![1] - cy), R, 1e-14);
      // The halves' midpoints are at the mid angles of each half.
      const m1 = P(t0 + phi * 0.15), m2 = P(t0 + phi * 0.65);
      close(n.segments[0].via![0], m1[0], 1e-13, R);
      close(n.segments[0].via![1], m1[1], 1e-13, R);
      close(n.segments[1].via![0], m2[0], 1e-13, R);
      close(n.segments[1].via![1], m2[1], 1e-13, R);
      close(Math.abs(area(n)), segArea, 1e-11);
    }
  });
  it('arcMidpointAwayFrom: the quarter circle between two axis points', () => {
    const p = arcMidpointAwayFrom([1, 0], [0, 1], [-1, 0]);
    close(p[0], Math.SQRT1_2, 1e-15); // cos 45° on the unit circle
    close(p[1], Math.SQRT1_2, 1e-15);
  });
  it('deleting a corner of the square merges two sides into the diagonal', () => {
    const n = ok(pathDeletePoint(squarePath(), 2)); // (a, a)
    expect(n.segments.map((g) => g.to)).toEqual([[a, 0], [0, a], [0, 0]]);
    close(area(n), (a * a) / 2, 1e-12); // A = a²/2 (Gere & Goodno, App. E, triangle)
  });
  it('deleting the start moves the start to the next point and keeps the path closed', () => {
    const n = ok(pathDeletePoint(squarePath(), 0));
    expect(n.start).toEqual([a, 0]);
    expect(n.segments.map((g) => g.to)).toEqual([[a, a], [0, a], [a, 0]]);
    close(area(n), (a * a) / 2, 1e-12); // A = a²/2 (Gere & Goodno, App. E, triangle)
  });
  it('deleting the point after an arc merges arc and line into one line', () => {
    // Square with its bottom side bulged out to a semicircle, then the corner (a, 0) deleted:
    // left is the triangle (0,0) (a,a) (0,a).
    const s: PathShape = { ...squarePath(), segments: [{ to: [a, 0], via: [a / 2, -a / 2] }, ...squarePath().segments.slice(1)] };
    close(area(s), a * a + (PI * a * a) / 8, 1e-12); // a² + π(a/2)²/2 (Gere & Goodno, App. E, semicircle)
    const n = ok(pathDeletePoint(s, 1));
    expect(n.segments[0]).toEqual({ to: [a, a] });
    close(area(n), (a * a) / 2, 1e-12); // A = a²/2 (Gere & Goodno, App. E, triangle)
  });
  it('deleting a point is refused when fewer than 2 segments would remain', () => {
    const s = semicircle();
    const before = structuredClone(s);
    for (const k of [0, 1]) expect(refused(pathDeletePoint(s, k, 'shapes[0]'))).toMatch(/at least 2 segments/);
    expect(refused(pathDeletePoint(s, 0, 'shapes[0]'))).toMatch(/^shapes\[0\]\.start/);
    expect(s).toEqual(before);
  });
  it('make arc: via on the bisector at a quarter chord to the left; the area loses the circular segment', () => {
    const n = ok(pathMakeArc(squarePath(), 0)); // (0,0) → (a,0): left of travel is +y
    expect(n.segments[0]).toEqual({ to: [a, 0], via: [a / 2, a / 4] });
    // Chord c = a, sagitta s = c/4: R = (c²/4 + s²)/(2s) = 5a/8, half angle α with sin α = 4/5.
    // Circular segment A = R²(α − sin α cos α) (Gere & Goodno, App. E, circular segment).
    const R = (5 * a) / 8, al = Math.asin(4 / 5);
    close(area(n), a * a - R * R * (al - Math.sin(al) * Math.cos(al)), 1e-12);
    // Left of travel on the closing side (0,a) → (0,0) is +x, also inside.
    const c = ok(pathMakeArc(squarePath(), 3));
    expect(c.segments[3]).toEqual({ to: [0, 0], via: [a / 4, a / 2] });
    expect(c.segments[3].to).toEqual(c.start);
  });
  it('make line drops the via point: back to the original record and area', () => {
    const n = ok(pathMakeLine(ok(pathMakeArc(squarePath(), 2)), 2));
    expect(n).toEqual(squarePath());
    close(area(n), a * a, 1e-12); // A = a² (Gere & Goodno, App. E, square)
  });
  it('make line is refused when the outline would enclose nothing; make arc/line on the wrong kind is refused', () => {
    // Two segments: a line and an arc. As two lines they would fold back onto each other.
    const s: PathShape = { id: 'd', type: 'path', start: [0, 0], segments: [{ to: [10, 0] }, { to: [0, 0], via: [5, 5] }] };
    const before = structuredClone(s);
    expect(refused(pathMakeLine(s, 1))).toMatch(/enclose no area|valid outline/);
    expect(refused(pathMakeLine(s, 0))).toMatch(/already a line/);
    expect(refused(pathMakeArc(s, 1))).toMatch(/already an arc/);
    expect(s).toEqual(before);
  });
});
