/**
 * The exact convex hull of a region bounded by lines and circular arcs: straight bridges and convex
 * arc pieces, returned as one CCW contour (so the moment kernel and the drawing code take it as is).
 *
 * Only two kinds of boundary pieces can lie on the hull: vertices, and arcs that turn
 * counter-clockwise (sweep > 0: the material lies on the centre's side, as the region's sign
 * convention puts material on the left). Inside a clockwise arc the material lies beyond the arc,
 * so none of its interior points is extreme. Vertices inside the polygon hull of all vertices
 * (Andrew's monotone chain) are dropped first.
 *
 * The hull is then walked by its outward normal angle θ, from θ = 0 once round (gift wrapping in
 * the angle of the support line): at a point, the next piece is the bridge, or the tangent onto an
 * arc, that the support line meets first as it turns; on an arc, the walk follows the arc until a
 * tangent leaves it for a point or another arc, or the arc ends. The tangent angles are closed
 * forms: from a point at distance ρ from a circle's centre, atan2(w) ± acos(r/ρ); between two
 * circles, atan2(w) − acos((r1 − r2)/ρ). Cost: O(h · (p + a)) for h hull pieces, p hull vertices
 * and a convex arcs.
 *
 * Written by hand: no allowed library computes hulls of curved boundaries. Arcs flatter than a
 * radius of 3e7 section sizes are taken as their chords (their bulge is below 5e-9 of the size,
 * about the round-off of a centre that far away).
 */
import { arcPointAtAngle, regionBounds, type Contour, type Region } from '../geometry/contour';
import { SectionError } from '../properties/section';

const TWO_PI = 2 * Math.PI;
/** Angles closer than this count as equal. */
const ANG_EPS = 1e-12;

interface Arc {
  cx: number;
  cy: number;
  r: number;
  /** Radial angle at the start, and the (positive) sweep. */
  t0: number;
  sweep: number;
  ax: number;
  ay: number;
  bx: number;
  by: number;
  /** Distance within which a point counts as on the circle: the tolerance plus the round-off of a centre r away. */
  eps: number;
}

type State = { kind: 'point'; x: number; y: number } | { kind: 'arc'; k: number; theta: number };

/** Angle advance from `from` to `to`, in [0, 2π); advances within ANG_EPS of 2π count as 0. */
function advance(to: number, from: number): number {
  let d = (to - from) % TWO_PI;
  if (d < 0) d += TWO_PI;
  return d > TWO_PI - ANG_EPS ? 0 : d;
}

/** Whether the radial angle t lies on the arc (ends included, within ANG_EPS). */
function onArc(a: Arc, t: number): boolean {
  const d = advance(t, a.t0);
  return d <= a.sweep + ANG_EPS;
}

/** The sweep left from radial angle t (on the arc) to the arc's end; 0 at or just past the end. */
function arcLeft(a: Arc, t: number): number {
  const d = advance(a.t0 + a.sweep, t);
  return d > a.sweep + ANG_EPS ? 0 : d;
}

/** The point of arc a at radial angle t, computed in the chord frame (exact for flat arcs). */
function arcPoint(a: Arc, t: number): [number, number] {
  const mid = a.t0 + a.sweep / 2;
  let rel = (t - mid) % TWO_PI;
  if (rel > Math.PI) rel -= TWO_PI;
  if (rel < -Math.PI) rel += TWO_PI;
  return arcPointAtAngle(a.ax, a.ay, a.bx, a.by, a.sweep, rel);
}

/** Convex vertices of the polygon hull of points (Andrew's monotone chain), CCW, collinear points dropped. */
function polygonHull(pts: [number, number][]): [number, number][] {
  const p = [...pts].sort((u, v) => u[0] - v[0] || u[1] - v[1]);
  if (p.length < 3) return p;
  const cross = (o: [number, number], a: [number, number], b: [number, number]) => (a[0] - o[0]) * (b[1] - o[1]) - (a[1] - o[1]) * (b[0] - o[0]);
  const lower: [number, number][] = [], upper: [number, number][] = [];
  for (const q of p) {
    while (lower.length >= 2 && cross(lower[lower.length - 2], lower[lower.length - 1], q) <= 0) lower.pop();
    lower.push(q);
  }
  for (let i = p.length - 1; i >= 0; i--) {
    const q = p[i];
    while (upper.length >= 2 && cross(upper[upper.length - 2], upper[upper.length - 1], q) <= 0) upper.pop();
    upper.push(q);
  }
  lower.pop();
  upper.pop();
  return lower.concat(upper);
}

/** Vertices and convex arcs of the region. */
function collect(region: Region, size: number, tol: number): { pts: [number, number][]; arcs: Arc[] } {
  const pts: [number, number][] = [];
  const arcs: Arc[] = [];
  for (const c of region) {
    const n = c.xy.length >> 1;
    for (let i = 0; i < n; i++) {
      const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
      pts.push([ax, ay]);
      const b = c.bulge ? c.bulge[i] : 0;
      if (!(b > 0)) continue;
      const j = i + 1 === n ? 0 : i + 1;
      const bx = c.xy[2 * j], by = c.xy[2 * j + 1];
      const L = Math.hypot(bx - ax, by - ay);
      const phi = 4 * Math.atan(b);
      const r = L / (2 * Math.sin(phi / 2));
      if (!(L > 0) || !(r < 3e7 * size)) continue;
      // Centre: from the chord midpoint, against u = (ey, −ex), the normal towards the bulge.
      const ex = (bx - ax) / L, ey = (by - ay) / L;
      const d = r * Math.cos(phi / 2);
      const cx = (ax + bx) / 2 - ey * d, cy = (ay + by) / 2 + ex * d;
      arcs.push({ cx, cy, r, t0: Math.atan2(ay - cy, ax - cx), sweep: phi, ax, ay, bx, by, eps: tol + 1e-14 * r });
    }
  }
  return { pts, arcs };
}

interface Event {
  advance: number;
  /** Distance travelled to the target, for ties (farther wins along one line). */
  reach: number;
  to: State;
  /** Where the walk arrives (the target point, or the tangent point on the arc). */
  x: number;
  y: number;
}

/** The exact convex hull of a region (or of several, passed as one list of contours). */
export function convexHull(region: Region): Contour {
  const bounds = regionBounds(region);
  if (!bounds) throw new SectionError('The section is empty: it has no convex hull.');
  const size = Math.max(bounds.xmax - bounds.xmin, bounds.ymax - bounds.ymin);
  if (!(size > 0) || !Number.isFinite(size)) throw new SectionError('The section has no extent: it has no convex hull.');
  const tol = 1e-12 * Math.max(size, Math.abs(bounds.xmin), Math.abs(bounds.xmax), Math.abs(bounds.ymin), Math.abs(bounds.ymax));
  const { pts: raw, arcs } = collect(region, size, tol);
  const pts = polygonHull(raw);

  const pointEvents = (x: number, y: number, theta: number, out: Event[]) => {
    for (const [qx, qy] of pts) {
      const dx = qx - x, dy = qy - y;
      const reach = Math.hypot(dx, dy);
      if (reach <= tol) continue;
      out.push({ advance: advance(Math.atan2(-dx, dy), theta), reach, to: { kind: 'point', x: qx, y: qy }, x: qx, y: qy });
    }
  };

  // From a point: bridges to points, and tangents onto arcs (or onto an arc through the point).
  const fromPoint = (x: number, y: number, theta: number): Event[] => {
    const out: Event[] = [];
    pointEvents(x, y, theta, out);
    arcs.forEach((a, k) => {
      const wx = x - a.cx, wy = y - a.cy;
      const rho = Math.hypot(wx, wy);
      const phi = Math.atan2(wy, wx);
      if (Math.abs(rho - a.r) <= a.eps) {
        // The point lies on the arc's circle: the walk may continue along the arc from here.
        if (onArc(a, phi) && arcLeft(a, phi) > ANG_EPS) out.push({ advance: advance(phi, theta), reach: 0, to: { kind: 'arc', k, theta: phi }, x, y });
        return;
      }
      if (rho < a.r) return;
      const t = phi + Math.acos(a.r / rho);
      if (!onArc(a, t)) return;
      const [tx, ty] = arcPoint(a, t);
      out.push({ advance: advance(t, theta), reach: Math.hypot(tx - x, ty - y), to: { kind: 'arc', k, theta: t }, x: tx, y: ty });
    });
    return out;
  };

  // From arc k at radial angle theta: tangents leaving for points or other arcs before the arc ends.
  const fromArc = (k: number, theta: number): Event[] => {
    const a = arcs[k];
    const out: Event[] = [];
    for (const [qx, qy] of pts) {
      const wx = qx - a.cx, wy = qy - a.cy;
      const rho = Math.hypot(wx, wy);
      if (rho <= a.r + a.eps) continue; // on or inside the circle: never overtakes the arc
      const t = Math.atan2(wy, wx) - Math.acos(a.r / rho);
      if (!onArc(a, t)) continue;
      const [sx, sy] = arcPoint(a, t);
      out.push({ advance: advance(t, theta), reach: Math.hypot(qx - sx, qy - sy), to: { kind: 'point', x: qx, y: qy }, x: qx, y: qy });
    }
    arcs.forEach((b, j) => {
      if (j === k) return;
      const wx = b.cx - a.cx, wy = b.cy - a.cy;
      const rho = Math.hypot(wx, wy);
      const dr = a.r - b.r;
      const eps = a.eps + b.eps;
      if (rho <= eps && Math.abs(dr) <= eps) return; // the same circle: joined through the end points
      // One circle inside the other (or touching it from inside): the smaller never overtakes.
      if (!(rho - Math.abs(dr) > eps)) return;
      const t = Math.atan2(wy, wx) - Math.acos(dr / rho);
      if (!onArc(a, t) || !onArc(b, t)) return;
      const [tx, ty] = arcPoint(b, t);
      out.push({ advance: advance(t, theta), reach: rho, to: { kind: 'arc', k: j, theta: t }, x: tx, y: ty });
    });
    return out;
  };

  // Start where the support line with outward normal +x touches: the rightmost point (lowest of
  // equals), or an arc whose radial angle 0 lies inside it and reaches farther.
  let start: State | null = null;
  let sx = -Infinity, sy = Infinity;
  for (const [x, y] of pts) {
    if (x > sx + tol || (Math.abs(x - sx) <= tol && y < sy)) {
      sx = x;
      sy = y;
      start = { kind: 'point', x, y };
    }
  }
  arcs.forEach((a, k) => {
    if (!onArc(a, 0)) return;
    const [x, y] = arcPoint(a, 0);
    if (x > sx + tol) {
      sx = x;
      sy = y;
      start = { kind: 'arc', k, theta: 0 };
    }
  });
  if (!start) throw new SectionError('The section has no vertices: it has no convex hull.');

  const xy: number[] = [sx, sy];
  const bulge: number[] = [];
  let cx = sx, cy = sy;
  const lineTo = (x: number, y: number) => {
    if (Math.hypot(x - cx, y - cy) <= tol) return;
    bulge.push(0);
    xy.push(x, y);
    cx = x;
    cy = y;
  };
  const arcTo = (a: Arc, t1: number, sweep: number) => {
    if (!(sweep > ANG_EPS)) return;
    const pieces = Math.ceil(sweep / Math.PI - 1e-12);
    // Ending on the arc's end: take its exact vertex (an angle about a far centre carries r·ε).
    const atEnd = arcLeft(a, t1 + sweep) <= ANG_EPS;
    for (let p = 1; p <= pieces; p++) {
      const [x, y] = p === pieces && atEnd ? [a.bx, a.by] : arcPoint(a, t1 + (sweep * p) / pieces);
      bulge.push(Math.tan(sweep / pieces / 4));
      xy.push(x, y);
      cx = x;
      cy = y;
    }
  };

  let state: State = start as State;
  let theta = 0; // current outward normal angle, cumulative from 0
  const cap = 4 * (pts.length + arcs.length) + 16;
  let closed = false;
  for (let step = 0; step < cap; step++) {
    const left = TWO_PI - theta;
    if (state.kind === 'point') {
      const events = fromPoint(state.x, state.y, theta);
      const best = pick(events);
      if (!best || best.advance >= left - ANG_EPS) {
        closed = true;
        break;
      }
      theta += best.advance;
      lineTo(best.x, best.y);
      state = best.to;
    } else {
      const a: Arc = arcs[state.k];
      const remaining = arcLeft(a, state.theta);
      const best = pick(fromArc(state.k, state.theta).filter((e) => e.advance < remaining - ANG_EPS));
      const move = best ? best.advance : remaining;
      if (move >= left - ANG_EPS) {
        // The walk comes round to the start on this arc.
        arcTo(a, state.theta, left);
        closed = true;
        break;
      }
      arcTo(a, state.theta, move);
      theta += move;
      if (best) {
        lineTo(best.x, best.y);
        state = best.to;
      } else state = { kind: 'point', x: a.bx, y: a.by };
    }
  }
  if (!closed) throw new SectionError('The convex hull could not be traced: the boundary is too irregular at this size.');
  // Close: the last vertex should be the start again; drop it (or keep the closing line).
  const m = xy.length >> 1;
  if (m > 1 && Math.hypot(xy[2 * m - 2] - sx, xy[2 * m - 1] - sy) <= tol * 1e3) {
    xy.length -= 2;
  } else bulge.push(0);
  if (bulge.length !== xy.length >> 1) throw new SectionError('The convex hull could not be closed.');
  if ((xy.length >> 1) < 2 || ((xy.length >> 1) === 2 && bulge.every((b) => b === 0))) throw new SectionError('The section has no area: its convex hull is a line.');
  return { xy: Float64Array.from(xy), bulge: bulge.some((b) => b !== 0) ? Float64Array.from(bulge) : null };
}

/** The event met first; among ties, the one that reaches farthest (collinear points). */
function pick(events: Event[]): Event | null {
  let best: Event | null = null;
  for (const e of events) {
    if (!best || e.advance < best.advance - ANG_EPS || (Math.abs(e.advance - best.advance) <= ANG_EPS && e.reach > best.reach)) best = e;
  }
  return best;
}
