/**
 * A region's boundary as separate exact segments (straight lines and circular arcs), and their
 * crossing points. The editor uses these for snap points and the intersections it offers; the
 * arcs stay arcs (centre, radius, start angle and signed sweep), nothing is sampled.
 *
 * Intersections treat near-tangency with a tolerance relative to the segments' size: a line that
 * grazes a circle, or two circles that touch, give their one tangent point instead of two
 * points a rounding error apart (or none).
 */
import { angleInSweep, arcFromChord, type Region } from './contour';

export type Segment =
  | { kind: 'line'; ax: number; ay: number; bx: number; by: number }
  | { kind: 'arc'; ax: number; ay: number; bx: number; by: number; cx: number; cy: number; r: number; t0: number; sweep: number };

/** Every segment of every contour of the region, in order. */
export function regionSegments(region: Region): Segment[] {
  const out: Segment[] = [];
  for (const c of region) {
    const n = c.xy.length >> 1;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
      const b = c.bulge ? c.bulge[i] : 0;
      if (b === 0) out.push({ kind: 'line', ax, ay, bx, by });
      else {
        const sweep = 4 * Math.atan(b);
        const { cx, cy, r } = arcFromChord(ax, ay, bx, by, sweep);
        out.push({ kind: 'arc', ax, ay, bx, by, cx, cy, r, t0: Math.atan2(ay - cy, ax - cx), sweep });
      }
    }
  }
  return out;
}

/** The point halfway along a segment (the arc's midpoint for an arc). */
export function segmentMidpoint(s: Segment): [number, number] {
  if (s.kind === 'line') return [(s.ax + s.bx) / 2, (s.ay + s.by) / 2];
  const t = s.t0 + s.sweep / 2;
  return [s.cx + s.r * Math.cos(t), s.cy + s.r * Math.sin(t)];
}

/** Box [xmin, ymin, xmax, ymax] that holds the segment (an arc's whole circle, cheaply). */
export function segmentBox(s: Segment): [number, number, number, number] {
  if (s.kind === 'line') return [Math.min(s.ax, s.bx), Math.min(s.ay, s.by), Math.max(s.ax, s.bx), Math.max(s.ay, s.by)];
  return [s.cx - s.r, s.cy - s.r, s.cx + s.r, s.cy + s.r];
}

function size(s: Segment): number {
  return s.kind === 'line' ? Math.hypot(s.bx - s.ax, s.by - s.ay) : s.r;
}

/** Relative tolerance for tangency: touching within this fraction of the size is one point. */
const TANGENT_REL = 1e-9;

function onArc(s: Extract<Segment, { kind: 'arc' }>, x: number, y: number): boolean {
  return angleInSweep(Math.atan2(y - s.cy, x - s.cx), s.t0, s.sweep);
}

/** Parameter of (x, y) along the line a→b: 0 at a, 1 at b. */
function lineParam(s: Extract<Segment, { kind: 'line' }>, x: number, y: number): number {
  const dx = s.bx - s.ax, dy = s.by - s.ay;
  return ((x - s.ax) * dx + (y - s.ay) * dy) / (dx * dx + dy * dy);
}

function lineLine(p: Extract<Segment, { kind: 'line' }>, q: Extract<Segment, { kind: 'line' }>): [number, number][] {
  const rx = p.bx - p.ax, ry = p.by - p.ay, sx = q.bx - q.ax, sy = q.by - q.ay;
  const d = rx * sy - ry * sx;
  if (!(Math.abs(d) > 1e-14 * Math.hypot(rx, ry) * Math.hypot(sx, sy))) return [];
  const t = ((q.ax - p.ax) * sy - (q.ay - p.ay) * sx) / d;
  const u = ((q.ax - p.ax) * ry - (q.ay - p.ay) * rx) / d;
  if (t <= 0 || t >= 1 || u <= 0 || u >= 1) return [];
  // From the nearer end of each segment, averaged: halves the round-off.
  const x1 = t < 0.5 ? p.ax + t * rx : p.bx + (t - 1) * rx, y1 = t < 0.5 ? p.ay + t * ry : p.by + (t - 1) * ry;
  const x2 = u < 0.5 ? q.ax + u * sx : q.bx + (u - 1) * sx, y2 = u < 0.5 ? q.ay + u * sy : q.by + (u - 1) * sy;
  return [[(x1 + x2) / 2, (y1 + y2) / 2]];
}

function lineArc(p: Extract<Segment, { kind: 'line' }>, q: Extract<Segment, { kind: 'arc' }>): [number, number][] {
  const L = Math.hypot(p.bx - p.ax, p.by - p.ay);
  if (!(L > 0)) return [];
  const ux = (p.bx - p.ax) / L, uy = (p.by - p.ay) / L;
  // Foot of the perpendicular from the centre, measured from the nearer end of the line.
  const useA = Math.hypot(q.cx - p.ax, q.cy - p.ay) <= Math.hypot(q.cx - p.bx, q.cy - p.by);
  const ox = useA ? p.ax : p.bx, oy = useA ? p.ay : p.by;
  const t0 = (q.cx - ox) * ux + (q.cy - oy) * uy;
  const fx = ox + t0 * ux, fy = oy + t0 * uy;
  const h = Math.abs((q.cx - ox) * uy - (q.cy - oy) * ux);
  const tol = TANGENT_REL * Math.max(q.r, L);
  if (h > q.r + tol) return [];
  const w = h >= q.r - tol ? 0 : Math.sqrt((q.r - h) * (q.r + h));
  const pts: [number, number][] = w === 0 ? [[fx, fy]] : [[fx - w * ux, fy - w * uy], [fx + w * ux, fy + w * uy]];
  return pts.filter(([x, y]) => {
    const t = lineParam(p, x, y);
    return t > 0 && t < 1 && onArc(q, x, y);
  });
}

function arcArc(p: Extract<Segment, { kind: 'arc' }>, q: Extract<Segment, { kind: 'arc' }>): [number, number][] {
  const dx = q.cx - p.cx, dy = q.cy - p.cy;
  const D = Math.hypot(dx, dy);
  const tol = TANGENT_REL * Math.max(p.r, q.r);
  if (D <= tol || D > p.r + q.r + tol || D < Math.abs(p.r - q.r) - tol) return [];
  const ex = dx / D, ey = dy / D;
  const a = (D * D + (p.r - q.r) * (p.r + q.r)) / (2 * D);
  const h2 = (p.r - a) * (p.r + a);
  const tangent = Math.abs(D - (p.r + q.r)) <= tol || Math.abs(D - Math.abs(p.r - q.r)) <= tol || h2 <= 0;
  const mx = p.cx + a * ex, my = p.cy + a * ey;
  const h = tangent ? 0 : Math.sqrt(h2);
  const pts: [number, number][] = h === 0 ? [[mx, my]] : [[mx - h * ey, my + h * ex], [mx + h * ey, my - h * ex]];
  return pts.filter(([x, y]) => onArc(p, x, y) && onArc(q, x, y));
}

/** Exact crossing points of two segments, not counting shared end points. */
export function segmentIntersections(p: Segment, q: Segment): [number, number][] {
  if (!(size(p) > 0) || !(size(q) > 0)) return [];
  if (p.kind === 'line' && q.kind === 'line') return lineLine(p, q);
  if (p.kind === 'line' && q.kind === 'arc') return lineArc(p, q);
  if (p.kind === 'arc' && q.kind === 'line') return lineArc(q, p);
  if (p.kind === 'arc' && q.kind === 'arc') return arcArc(p, q);
  return [];
}
