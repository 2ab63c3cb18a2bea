/**
 * Exact closest points between boundary pieces (lines and circular arcs), for clear distances,
 * ligament widths and the gap between separate parts. No sampling: every candidate is a
 * critical point of the distance in closed form.
 *
 * For two pieces the distance is smallest at one of:
 *   - an end of one piece and its nearest point on the other;
 *   - a line and an arc: the foot of the perpendicular from the arc's centre on the line, paired
 *     with the arc point in that direction (when both lie on their pieces);
 *   - two arcs: points on the line of centres (when they lie on their arcs);
 *   - a common point (distance 0).
 * `closestCandidates` returns all of them, so that a caller who must reject some pairs (a
 * connecting segment that leaves the material) can take the next one.
 */
import { curveIntersections, paramOf, type Carrier } from '../boolean/carriers';

export interface PointPair {
  px: number;
  py: number;
  qx: number;
  qy: number;
  d: number;
}

/** True when the direction angle t of (x, y) seen from the arc's centre lies on the arc. */
function onArc(c: Carrier, x: number, y: number): boolean {
  const u = paramOf(c, x, y);
  return u >= 0 && u <= 1;
}

/** The nearest point of carrier c to (x, y). */
export function nearestOnCarrier(c: Carrier, x: number, y: number): [number, number] {
  if (c.kind === 0) {
    const u = paramOf(c, x, y);
    if (u <= 0) return [c.ax, c.ay];
    if (u >= 1) return [c.bx, c.by];
    return [c.ax + u * (c.bx - c.ax), c.ay + u * (c.by - c.ay)];
  }
  const dx = x - c.cx, dy = y - c.cy;
  const rho = Math.hypot(dx, dy);
  if (rho > 0 && onArc(c, x, y)) return [c.cx + (c.r * dx) / rho, c.cy + (c.r * dy) / rho];
  const da = Math.hypot(x - c.ax, y - c.ay), db = Math.hypot(x - c.bx, y - c.by);
  return da <= db ? [c.ax, c.ay] : [c.bx, c.by];
}

function pair(px: number, py: number, qx: number, qy: number): PointPair {
  return { px, py, qx, qy, d: Math.hypot(qx - px, qy - py) };
}

/** Candidate closest pairs (p on a, q on b); see the header. */
export function closestCandidates(a: Carrier, b: Carrier, tol: number): PointPair[] {
  const out: PointPair[] = [];
  for (const [x, y] of [[a.ax, a.ay], [a.bx, a.by]]) {
    const [qx, qy] = nearestOnCarrier(b, x, y);
    out.push(pair(x, y, qx, qy));
  }
  for (const [x, y] of [[b.ax, b.ay], [b.bx, b.by]]) {
    const [px, py] = nearestOnCarrier(a, x, y);
    out.push(pair(px, py, x, y));
  }
  const pts = curveIntersections(a, b, tol);
  for (let k = 0; k < pts.length; k += 2) {
    const x = pts[k], y = pts[k + 1];
    const [ax, ay] = nearestOnCarrier(a, x, y), [bx, by] = nearestOnCarrier(b, x, y);
    if (Math.hypot(ax - x, ay - y) <= tol && Math.hypot(bx - x, by - y) <= tol) out.push(pair(x, y, x, y));
  }
  if (a.kind === 0 && b.kind === 1) lineArc(a, b, false, out);
  else if (a.kind === 1 && b.kind === 0) lineArc(b, a, true, out);
  else if (a.kind === 1 && b.kind === 1) arcArc(a, b, tol, out);
  else parallelLines(a, b, out);
  return out;
}

/**
 * Parallel lines keep one distance along their overlap, so the ends give only pairs at its edges
 * (where a side of the section usually runs); the middle of the overlap is a candidate too.
 */
function parallelLines(a: Carrier, b: Carrier, out: PointPair[]): void {
  const dax = a.bx - a.ax, day = a.by - a.ay, dbx = b.bx - b.ax, dby = b.by - b.ay;
  if (Math.abs(dax * dby - day * dbx) > 1e-12 * a.len * b.len) return;
  const u0 = paramOf(a, b.ax, b.ay), u1 = paramOf(a, b.bx, b.by);
  const lo = Math.max(0, Math.min(u0, u1)), hi = Math.min(1, Math.max(u0, u1));
  if (!(hi > lo)) return;
  const u = (lo + hi) / 2;
  const px = a.ax + u * dax, py = a.ay + u * day;
  const [qx, qy] = nearestOnCarrier(b, px, py);
  out.push(pair(px, py, qx, qy));
}

/** Foot of the perpendicular from the arc's centre on the line, with the arc point above it. */
function lineArc(l: Carrier, c: Carrier, swap: boolean, out: PointPair[]): void {
  const u = paramOf(l, c.cx, c.cy);
  if (u < 0 || u > 1) return;
  const fx = l.ax + u * (l.bx - l.ax), fy = l.ay + u * (l.by - l.ay);
  const dx = fx - c.cx, dy = fy - c.cy;
  const rho = Math.hypot(dx, dy);
  if (!(rho > 0)) return;
  for (const s of [1, -1]) {
    const x = c.cx + (s * c.r * dx) / rho, y = c.cy + (s * c.r * dy) / rho;
    if (!onArc(c, x, y)) continue;
    out.push(swap ? pair(x, y, fx, fy) : pair(fx, fy, x, y));
  }
}

/**
 * Points of two arcs on their line of centres. Concentric arcs keep one distance where their
 * sweeps overlap: the middle of the first arc is a candidate there (as for parallel lines).
 */
function arcArc(a: Carrier, b: Carrier, tol: number, out: PointPair[]): void {
  const dx = b.cx - a.cx, dy = b.cy - a.cy;
  const D = Math.hypot(dx, dy);
  if (!(D > tol)) {
    for (const t of [a.tm, b.tm]) {
      const px = a.cx + a.r * Math.cos(t), py = a.cy + a.r * Math.sin(t);
      const qx = b.cx + b.r * Math.cos(t), qy = b.cy + b.r * Math.sin(t);
      if (onArc(a, px, py) && onArc(b, qx, qy)) out.push(pair(px, py, qx, qy));
    }
    return;
  }
  const ex = dx / D, ey = dy / D;
  for (const sa of [1, -1]) {
    const px = a.cx + sa * a.r * ex, py = a.cy + sa * a.r * ey;
    if (!onArc(a, px, py)) continue;
    for (const sb of [1, -1]) {
      const qx = b.cx + sb * b.r * ex, qy = b.cy + sb * b.r * ey;
      if (onArc(b, qx, qy)) out.push(pair(px, py, qx, qy));
    }
  }
}

/** The closest pair of two pieces. */
export function closestPair(a: Carrier, b: Carrier, tol: number): PointPair {
  const all = closestCandidates(a, b, tol);
  let best = all[0];
  for (const c of all) if (c.d < best.d) best = c;
  return best;
}

/** Smallest distance between the boxes of two pieces (a lower bound of their distance). */
export function boxGap(a: Carrier, b: Carrier): number {
  const gx = Math.max(0, a.xmin - b.xmax, b.xmin - a.xmax);
  const gy = Math.max(0, a.ymin - b.ymax, b.ymin - a.ymax);
  return Math.hypot(gx, gy);
}
