/**
 * Vertex and segment editing of polygons and of chains (paths, line elements and strips): pure
 * functions from a record to a new record or a refusal. Nothing here touches the store; the
 * panel commits the result as one step.
 *
 * Every result is checked before it is returned: `validateShape`, then an area shape's exact
 * outline (`shapeToRegion`) must exist and enclose some area, and a line element's chain must
 * have some length. A refusal says what is wrong and where, and the input record is never changed.
 *
 * Chain points are numbered 0 = `start`, k = `segments[k − 1].to`. A path is closed: its n
 * segments run from point i to point (i + 1) mod n, and the last segment's `to` equals `start`.
 * A line element and a strip's centreline are open: n segments join the n + 1 points 0 … n.
 */
import type { Shape } from './shape';
import { validateShape } from './validate';
import type { Point } from './base';
import { formatIssue } from './check';
import { shapeToRegion } from './ops';
import { filletCorner } from '../geometry/fillet';
import { LineError } from '../lines/chain';
import { lineProperties } from '../lines/line-properties';
import type { LineShape } from './line';
import type { PathSegment, PathShape } from './path';
import type { StripShape } from './strip';
import { kindOf } from './registry';
import type { PolygonShape } from './polygon';

export type PointEdit<S extends Shape> = { ok: true; shape: S } | { ok: false; message: string };

const refuse = (message: string): { ok: false; message: string } => ({ ok: false, message });

const mid = (a: Point, b: Point): Point => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2];

/** The candidate if it is a valid shape with an outline that encloses area (a line: with length), else the reason. */
function checked<S extends Shape>(cand: S, at: string): PointEdit<S> {
  const issues = validateShape(cand, at);
  if (issues.length) return refuse(issues.map(formatIssue).join('; '));
  const line = kindOf(cand).line;
  if (line) {
    try {
      lineProperties(line.chains(cand));
    } catch (e) {
      if (!(e instanceof LineError)) throw e;
      return refuse(`${at}: this change leaves no usable line: ${e.message}`);
    }
    return { ok: true, shape: cand };
  }
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
// Chains: paths (closed), line elements and strips (open)

/** A record drawn as a chain of lines and three-point arcs from a start point. */
export type ChainShape = PathShape | LineShape | StripShape;

/** True for a chain whose last segment ends on its start (a path). */
function isClosed(s: ChainShape): boolean {
  return s.type === 'path';
}

/** The chain's noun in messages. */
function noun(s: ChainShape): string {
  return s.type === 'path' ? 'path' : s.type === 'line' ? 'line' : 'centreline';
}

/** Point k of a chain (0 = start). */
export function chainPoint(s: ChainShape, k: number): Point {
  return k === 0 ? s.start : s.segments[k - 1].to;
}

/** Point k of a path (0 = start). */
export const pathPoint: (s: PathShape, k: number) => Point = chainPoint;

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
export function chainSplitSegment<S extends ChainShape>(s: S, i: number, at = 'shape'): PointEdit<S> {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the ${noun(s)} has ${n})`);
  const a = chainPoint(s, i);
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
 * Delete point k (0 = start): the two segments meeting there become one line. On a closed path,
 * deleting the start moves the start to the next point, and fewer than 2 segments may not remain.
 * On an open chain, deleting an end drops the end segment, and at least one segment must remain.
 */
export function chainDeletePoint<S extends ChainShape>(s: S, k: number, at = 'shape'): PointEdit<S> {
  const n = s.segments.length;
  const closed = isClosed(s);
  const points = closed ? n : n + 1;
  if (!inRange(k, points)) return refuse(`${at}: there is no point ${k + 1} (the ${noun(s)} has ${points})`);
  const where = k === 0 ? `${at}.start` : `${at}.segments[${k - 1}].to`;
  if (closed) {
    if (n <= 2) return refuse(`${where}: this point cannot be deleted: a closed path needs at least 2 segments and this one has ${n}`);
    if (k === 0) {
      const next = s.segments[0].to;
      // Segments 1 … n−2 keep their ends; the closing pair (n−1 and 0) becomes one line to the new start.
      const segments: PathSegment[] = [...s.segments.slice(1, n - 1), { to: next }];
      return checked({ ...s, start: next, segments }, at);
    }
  } else {
    if (n <= 1) return refuse(`${where}: this point cannot be deleted: a ${noun(s)} needs at least one segment and this one has ${n}`);
    if (k === 0) return checked({ ...s, start: s.segments[0].to, segments: s.segments.slice(1) }, at);
    if (k === n) return checked({ ...s, segments: s.segments.slice(0, n - 1) }, at);
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
export function chainMakeArc<S extends ChainShape>(s: S, i: number, at = 'shape'): PointEdit<S> {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the ${noun(s)} has ${n})`);
  const g = s.segments[i];
  if (g.via) return refuse(`${at}.segments[${i}]: segment ${i + 1} is already an arc`);
  const a = chainPoint(s, i), b = g.to;
  if (a[0] === b[0] && a[1] === b[1]) return refuse(`${at}.segments[${i}]: segment ${i + 1} has zero length, so it cannot become an arc`);
  const m = mid(a, b);
  // Left normal of (dx, dy) is (−dy, dx); its length is the chord, so ¼ of it is the sagitta.
  const via: Point = [m[0] - (b[1] - a[1]) / 4, m[1] + (b[0] - a[0]) / 4];
  return checked({ ...s, segments: s.segments.map((o, k) => (k === i ? { to: o.to, via } : o)) }, at);
}

/** Turn arc i into a straight line (its via point is dropped). */
export function chainMakeLine<S extends ChainShape>(s: S, i: number, at = 'shape'): PointEdit<S> {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the ${noun(s)} has ${n})`);
  if (!s.segments[i].via) return refuse(`${at}.segments[${i}]: segment ${i + 1} is already a line`);
  return checked({ ...s, segments: s.segments.map((o, k) => (k === i ? { to: o.to } : o)) }, at);
}

/**
 * The same open chain drawn from its other end (a line element or a strip): the points in
 * reverse order, each arc keeping its through-point. Nothing it computes changes; it sets where
 * the chain tool continues and how the points are listed.
 */
export function chainReverse<S extends LineShape | StripShape>(s: S, at = 'shape'): PointEdit<S> {
  const pts = [s.start, ...s.segments.map((g) => g.to)];
  const n = s.segments.length;
  const segments: PathSegment[] = [];
  for (let i = n - 1; i >= 0; i--) {
    const g = s.segments[i];
    segments.push(g.via ? { to: pts[i], via: g.via } : { to: pts[i] });
  }
  return checked({ ...s, start: pts[n], segments }, at);
}

/**
 * Round the corner at point k with a tangent arc of the given radius (src/geometry/fillet.ts,
 * exact): for a strip drawn with sharp corners, a bend of centreline radius `radius` (the inside
 * bend radius plus half the thickness). The ends of an open chain are not corners.
 */
export function chainRoundCorner<S extends ChainShape>(s: S, k: number, radius: number, at = 'shape'): PointEdit<S> {
  const where = k === 0 ? `${at}.start` : `${at}.segments[${k - 1}].to`;
  const r = filletCorner(s, k, radius);
  if (!r.ok) return refuse(`${where}: ${r.message}`);
  return checked({ ...s, start: r.path.start, segments: r.path.segments }, at);
}

/**
 * Remove segment i of an open chain (a line element or a strip). An end segment is dropped; an
 * inner one splits the chain in two, returned in order (the second keeps the first's id: the
 * caller gives it a new one); a chain that ends on its start (a weld all round) is opened there
 * and runs from the removed segment's end round to its start.
 */
export function chainRemoveSegment<S extends LineShape | StripShape>(s: S, i: number, at = 'shape'): { ok: true; shapes: S[] } | { ok: false; message: string } {
  const n = s.segments.length;
  if (!inRange(i, n)) return refuse(`${at}: there is no segment ${i + 1} (the ${noun(s)} has ${n})`);
  if (n === 1) return refuse(`${at}.segments[0]: the only segment cannot be removed: delete the ${noun(s)} instead`);
  const end = s.segments[n - 1].to;
  let parts: S[];
  if (end[0] === s.start[0] && end[1] === s.start[1]) parts = [{ ...s, start: s.segments[i].to, segments: [...s.segments.slice(i + 1), ...s.segments.slice(0, i)] }];
  else if (i === 0) parts = [{ ...s, start: s.segments[0].to, segments: s.segments.slice(1) }];
  else if (i === n - 1) parts = [{ ...s, segments: s.segments.slice(0, n - 1) }];
  else parts = [{ ...s, segments: s.segments.slice(0, i) }, { ...s, start: s.segments[i].to, segments: s.segments.slice(i + 1) }];
  const out: S[] = [];
  for (const p of parts) {
    const r = checked(p, at);
    if (!r.ok) return r;
    out.push(r.shape);
  }
  return { ok: true, shapes: out };
}

// The path names, kept for the path editor and its tests.
export const pathSplitSegment: (s: PathShape, i: number, at?: string) => PointEdit<PathShape> = chainSplitSegment;
export const pathDeletePoint: (s: PathShape, k: number, at?: string) => PointEdit<PathShape> = chainDeletePoint;
export const pathMakeArc: (s: PathShape, i: number, at?: string) => PointEdit<PathShape> = chainMakeArc;
export const pathMakeLine: (s: PathShape, i: number, at?: string) => PointEdit<PathShape> = chainMakeLine;
