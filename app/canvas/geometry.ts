/**
 * Drawing and picking helpers on exact regions. Arcs become points here only for drawing and
 * hit-testing; snap points (vertices, midpoints, centres, intersections) are computed exactly
 * from the lines and arcs.
 */
import { angleInSweep, arcFromChord, contourPolyline, type Region, type ShapeResult } from '../../src';

type Poly = Float64Array;

const polyCache = new WeakMap<Region, { tol: number; polys: Poly[] }>();

/** Polylines (world coordinates) of a region's contours, cached by region identity and tolerance. */
export function regionPolylines(region: Region, tol: number): Poly[] {
  const hit = polyCache.get(region);
  if (hit && hit.tol <= tol * 1.5 && hit.tol >= tol / 3) return hit.polys;
  const polys = region.map((c) => Float64Array.from(contourPolyline(c, tol)));
  polyCache.set(region, { tol, polys });
  return polys;
}

/** Winding number of the closed polylines around (x, y): non-zero means inside. */
export function windingNumber(polys: Poly[], x: number, y: number): number {
  let w = 0;
  for (const p of polys) {
    const n = p.length >> 1;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      const x0 = p[2 * i], y0 = p[2 * i + 1], x1 = p[2 * j], y1 = p[2 * j + 1];
      if (y0 <= y) {
        if (y1 > y && (x1 - x0) * (y - y0) - (x - x0) * (y1 - y0) > 0) w++;
      } else if (y1 <= y && (x1 - x0) * (y - y0) - (x - x0) * (y1 - y0) < 0) w--;
    }
  }
  return w;
}

/** Smallest distance from (x, y) to the polylines' edges. */
export function distanceToPolylines(polys: Poly[], x: number, y: number): number {
  let best = Infinity;
  for (const p of polys) {
    const n = p.length >> 1;
    for (let i = 0; i < n; i++) {
      const j = (i + 1) % n;
      best = Math.min(best, segDist(x, y, p[2 * i], p[2 * i + 1], p[2 * j], p[2 * j + 1]));
    }
  }
  return best;
}

function segDist(px: number, py: number, ax: number, ay: number, bx: number, by: number): number {
  const dx = bx - ax, dy = by - ay;
  const L2 = dx * dx + dy * dy;
  const t = L2 > 0 ? Math.max(0, Math.min(1, ((px - ax) * dx + (py - ay) * dy) / L2)) : 0;
  return Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
}

/** Topmost shape (last in order) under the point, or whose outline is within `near` of it. */
export function pickShape(shapes: readonly ShapeResult[], x: number, y: number, tol: number, near: number): string | null {
  for (let k = shapes.length - 1; k >= 0; k--) {
    const s = shapes[k];
    if (!s.region.length) continue;
    const polys = regionPolylines(s.region, tol);
    if (windingNumber(polys, x, y) !== 0 || distanceToPolylines(polys, x, y) <= near) return s.id;
  }
  return null;
}

// ---------------------------------------------------------------------------------------------
// Exact segments and snap points

export type Seg =
  | { kind: 'line'; ax: number; ay: number; bx: number; by: number }
  | { kind: 'arc'; ax: number; ay: number; bx: number; by: number; cx: number; cy: number; r: number; t0: number; sweep: number };

export function regionSegments(region: Region): Seg[] {
  const out: Seg[] = [];
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

export type SnapKind = 'vertex' | 'midpoint' | 'centre' | 'intersection';
export interface SnapPoint {
  x: number;
  y: number;
  kind: SnapKind;
  shape: string;
}

function segBox(s: Seg): [number, number, number, number] {
  if (s.kind === 'line') return [Math.min(s.ax, s.bx), Math.min(s.ay, s.by), Math.max(s.ax, s.bx), Math.max(s.ay, s.by)];
  return [s.cx - s.r, s.cy - s.r, s.cx + s.r, s.cy + s.r];
}

function onArc(s: Extract<Seg, { kind: 'arc' }>, x: number, y: number): boolean {
  const t = Math.atan2(y - s.cy, x - s.cx);
  return angleInSweep(t, s.t0, s.sweep);
}

/** Exact crossing points of two segments (lines and arcs). */
export function segmentIntersections(p: Seg, q: Seg): [number, number][] {
  if (p.kind === 'line' && q.kind === 'line') {
    const rx = p.bx - p.ax, ry = p.by - p.ay, sx = q.bx - q.ax, sy = q.by - q.ay;
    const d = rx * sy - ry * sx;
    if (d === 0) return [];
    const t = ((q.ax - p.ax) * sy - (q.ay - p.ay) * sx) / d;
    const u = ((q.ax - p.ax) * ry - (q.ay - p.ay) * rx) / d;
    if (t <= 0 || t >= 1 || u <= 0 || u >= 1) return [];
    return [[p.ax + t * rx, p.ay + t * ry]];
  }
  if (p.kind === 'arc' && q.kind === 'line') return segmentIntersections(q, p);
  if (p.kind === 'line' && q.kind === 'arc') {
    const dx = p.bx - p.ax, dy = p.by - p.ay;
    const fx = p.ax - q.cx, fy = p.ay - q.cy;
    const a = dx * dx + dy * dy, b = 2 * (fx * dx + fy * dy), c = fx * fx + fy * fy - q.r * q.r;
    const disc = b * b - 4 * a * c;
    if (disc < 0 || a === 0) return [];
    const out: [number, number][] = [];
    for (const t of [(-b - Math.sqrt(disc)) / (2 * a), (-b + Math.sqrt(disc)) / (2 * a)]) {
      if (t <= 0 || t >= 1) continue;
      const x = p.ax + t * dx, y = p.ay + t * dy;
      if (onArc(q, x, y)) out.push([x, y]);
    }
    return out;
  }
  if (p.kind === 'arc' && q.kind === 'arc') {
    const dx = q.cx - p.cx, dy = q.cy - p.cy;
    const d = Math.hypot(dx, dy);
    if (d === 0 || d > p.r + q.r || d < Math.abs(p.r - q.r)) return [];
    const a = (p.r * p.r - q.r * q.r + d * d) / (2 * d);
    const h = Math.sqrt(Math.max(0, p.r * p.r - a * a));
    const mx = p.cx + (a * dx) / d, my = p.cy + (a * dy) / d;
    const out: [number, number][] = [];
    for (const sgn of h === 0 ? [1] : [1, -1]) {
      const x = mx - (sgn * h * dy) / d, y = my + (sgn * h * dx) / d;
      if (onArc(p, x, y) && onArc(q, x, y)) out.push([x, y]);
    }
    return out;
  }
  return [];
}

const snapCache = new WeakMap<readonly ShapeResult[], { points: SnapPoint[]; withIntersections: boolean }>();

/** Every snap point of the evaluation's shapes; intersections between different shapes included. */
export function snapPoints(shapes: readonly ShapeResult[], intersections: boolean): SnapPoint[] {
  const hit = snapCache.get(shapes);
  if (hit && (hit.withIntersections || !intersections)) return hit.points;
  const points: SnapPoint[] = [];
  const segsByShape: { id: string; segs: Seg[]; boxes: [number, number, number, number][] }[] = [];
  for (const s of shapes) {
    const segs = regionSegments(s.region);
    segsByShape.push({ id: s.id, segs, boxes: segs.map(segBox) });
    for (const g of segs) {
      points.push({ x: g.ax, y: g.ay, kind: 'vertex', shape: s.id });
      if (g.kind === 'line') points.push({ x: (g.ax + g.bx) / 2, y: (g.ay + g.by) / 2, kind: 'midpoint', shape: s.id });
      else {
        const t = g.t0 + g.sweep / 2;
        points.push({ x: g.cx + g.r * Math.cos(t), y: g.cy + g.r * Math.sin(t), kind: 'midpoint', shape: s.id });
        points.push({ x: g.cx, y: g.cy, kind: 'centre', shape: s.id });
      }
    }
  }
  if (intersections) {
    for (let i = 0; i < segsByShape.length; i++) {
      for (let j = i + 1; j < segsByShape.length; j++) {
        const A = segsByShape[i], B = segsByShape[j];
        for (let a = 0; a < A.segs.length; a++) {
          const ba = A.boxes[a];
          for (let b = 0; b < B.segs.length; b++) {
            const bb = B.boxes[b];
            if (ba[0] > bb[2] || bb[0] > ba[2] || ba[1] > bb[3] || bb[1] > ba[3]) continue;
            for (const [x, y] of segmentIntersections(A.segs[a], B.segs[b])) points.push({ x, y, kind: 'intersection', shape: A.id });
          }
        }
      }
    }
  }
  snapCache.set(shapes, { points, withIntersections: intersections });
  return points;
}
