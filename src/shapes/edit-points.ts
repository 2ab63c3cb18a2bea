/**
 * Vertex and segment editing of polygons and paths: pure functions from a record to a new
 * record or a refusal. Nothing here touches the store; the panel commits the result as one step.
 *
 * Every result is checked before it is returned: `validateShape`, then the exact outline
 * (`shapeToRegion`) must exist and enclose some area. A refusal says what is wrong and where,
 * and the input record is never changed.
 *
 * Path points are numbered 0 = `start`, k = `segments[k − 1].to` for k = 1 … n − 1; segment i
 * runs from point i to point (i + 1) mod n, and the last segment's `to` equals `start`.
 */
import type { Shape } from './shape';
import { validateShape } from './validate';
import type { Point } from './base';
import { formatIssue } from './check';
import { shapeToRegion } from './ops';
import type { PathSegment, PathShape } from './path';
import type { PolygonShape } from './polygon';

export type PointEdit<S extends Shape> = { ok: true; shape: S } | { ok: false; message: string };

const refuse = (message: string): { ok: false; message: string } => ({ ok: false, message });

const mid = (a: Point, b: Point): Point => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];

/** The candidate if it is a valid shape with an outline that encloses area, else the reason. */
function checked<S extends Shape>(cand: S, at: string): PointEdit<S> {
  const issues = validateShape(cand, at);
  if (issues.length) return refuse(issues.map(formatIssue).join('; '));
  let empty: boolean;
  try {
    empty = shapeToRegion(cand).length === 0;
  } catch (e) {
    return refuse(`${at}: this change gives no valid outline: ${(e as Error).message}`);
  }
  if (empty) return refuse(`${at}: the outline would enclose no area`);
  return { ok: true, shape: cand };
}

function inRange(i: number, n: number): boolean {
  return Number.isInteger(i) && i >= 0 && i < n;
}

// ---------------------------------------------------------------------------------------------
// Polygon

/** Insert a vertex after vertex i, at the midpoint of the edge from vertex i to the next one. */
export function polygonInsertAfter(s: PolygonShape, i: number, at = 'shape'): PointEdit<PolygonShape> {
  const n = s.points.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no vertex ${i + 1} (the polygon has ${n})`);
  const points = s.points.slice();
  points.splice(i + 1, 0, mid(s.points[i], s.points[(i + 1) % n]));
  return checked({ ...s, points }, at);
}

/** Delete vertex i; refused when fewer than 3 vertices would remain. */
export function polygonDeletePoint(s: PolygonShape, i: number, at = 'shape'): PointEdit<PolygonShape> {
  const n = s.points.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no vertex ${i + 1} (the polygon has ${n})`);
  if (n <= 3) return refuse(`${at}.points[${i}]: vertex ${i + 1} cannot be deleted: a polygon needs at least 3 vertices and this one has ${n}`);
  return checked({ ...s, points: s.points.filter((_, k) => k !== i) }, at);
}

// ---------------------------------------------------------------------------------------------
// Path

/** Point k of a path (0 = start). */
export function pathPoint(s: PathShape, k: number): Point {
  return k === 0 ? s.start : s.segments[k - 1].to;
}

/** The angle at p between the directions to a and to b, in [0, π]. */
function angleAt(p: Point, a: Point, b: Point): number {
  const ux = a[0] - p[0], uy = a[1] - p[1], vx = b[0] - p[0], vy = b[1] - p[1];
  return Math.atan2(Math.abs(ux * vy - uy * vx), ux * vx + uy * vy);
}

/**
 * The midpoint of the arc from a to b on the circle through a, b and `other`, taking the arc that
 * does not contain `other`. By the inscribed-angle theorem that arc sweeps 2·∠(a other b) and lies
 * on the far side of the chord from `other`; its midpoint sits on the chord's perpendicular
 * bisector at the sagitta h·tan(∠/2), h the half chord. No centre is computed, so flat arcs stay
 * accurate.
 */
export function arcMidpointAwayFrom(a: Point, b: Point, other: Point): Point {
  const dx = b[0] - a[0], dy = b[1] - a[1];
  const L = Math.hypot(dx, dy);
  const m = mid(a, b);
  // Left normal of a→b; flip it to point away from `other`.
  let nx = -dy / L, ny = dx / L;
  if (nx * (other[0] - m[0]) + ny * (other[1] - m[1]) > 0) {
    nx = -nx;
    ny = -ny;
  }
  const sag = (L / 2) * Math.tan(angleAt(other, a, b) / 2);
  return [m[0] + nx * sag, m[1] + ny * sag];
}

/**
 * Insert a point in segment i: a line is split at its midpoint; an arc is split at its via point,
 * each half getting a new via point on the same circle (the midpoint of that half).
 */
export function pathSplitSegment(s: PathShape, i: number, at = 'shape'): PointEdit<PathShape> {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the path has ${n})`);
  const a = pathPoint(s, i);
  const g = s.segments[i];
  const b = g.to;
  let halves: PathSegment[];
  if (g.via) {
    const v = g.via;
    halves = [
      { to: v, via: arcMidpointAwayFrom(a, v, b) },
      { to: b, via: arcMidpointAwayFrom(v, b, a) },
    ];
  } else {
    halves = [{ to: mid(a, b) }, { to: b }];
  }
  const segments = s.segments.slice();
  segments.splice(i, 1, ...halves);
  return checked({ ...s, segments }, at);
}

/**
 * Delete point k (0 = start): the two segments meeting there become one line. Deleting the start
 * moves the start to the next point. Refused when fewer than 2 segments would remain.
 */
export function pathDeletePoint(s: PathShape, k: number, at = 'shape'): PointEdit<PathShape> {
  const n = s.segments.length;
  if (!inRange(k, n)) return refuse(`${at}: there is no point ${k + 1} (the path has ${n})`);
  const where = k === 0 ? `${at}.start` : `${at}.segments[${k - 1}].to`;
  if (n <= 2) return refuse(`${where}: this point cannot be deleted: a closed path needs at least 2 segments and this one has ${n}`);
  if (k === 0) {
    const next = s.segments[0].to;
    // Segments 1 … n−2 keep their ends; the closing pair (n−1 and 0) becomes one line to the new start.
    const segments: PathSegment[] = [...s.segments.slice(1, n - 1), { to: next }];
    return checked({ ...s, start: next, segments }, at);
  }
  const segments = s.segments.slice();
  // Segment k−1 ends at point k and segment k starts there: one line to segment k's end.
  segments.splice(k - 1, 2, { to: s.segments[k].to });
  return checked({ ...s, segments }, at);
}

/**
 * Turn line i into a three-point arc: the via point sits on the chord's perpendicular bisector,
 * a quarter of the chord to the left of the direction of travel.
 */
export function pathMakeArc(s: PathShape, i: number, at = 'shape'): PointEdit<PathShape> {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the path has ${n})`);
  const g = s.segments[i];
  if (g.via) return refuse(`${at}.segments[${i}]: segment ${i + 1} is already an arc`);
  const a = pathPoint(s, i), b = g.to;
  if (a[0] === b[0] && a[1] === b[1]) return refuse(`${at}.segments[${i}]: segment ${i + 1} has zero length, so it cannot become an arc`);
  const m = mid(a, b);
  // Left normal of (dx, dy) is (−dy, dx); its length is the chord, so ¼ of it is the sagitta.
  const via: Point = [m[0] - (b[1] - a[1]) / 4, m[1] + (b[0] - a[0]) / 4];
  return checked({ ...s, segments: s.segments.map((o, k) => (k === i ? { to: o.to, via } : o)) }, at);
}

/** Turn arc i into a straight line (its via point is dropped). */
export function pathMakeLine(s: PathShape, i: number, at = 'shape'): PointEdit<PathShape> {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the path has ${n})`);
  if (!s.segments[i].via) return refuse(`${at}.segments[${i}]: segment ${i + 1} is already a line`);
  return checked({ ...s, segments: s.segments.map((o, k) => (k === i ? { to: o.to } : o)) }, at);
}
