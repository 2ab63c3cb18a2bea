/**
 * Picking: which shape is under the pointer. Hit-testing runs on the drawing polylines (arcs as
 * chords a fraction of a pixel from the arc), which is all a pointer needs; the exact geometry
 * stays in the engine.
 */
import type { ShapeResult } from '../../src';
import { chainPoints, regionPolylines } from '../paint/trace';

type Poly = Float64Array;

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

/** Smallest distance from (x, y) to open polylines. */
function distanceToOpenPolylines(polys: Poly[], x: number, y: number): number {
  let best = Infinity;
  for (const p of polys) for (let i = 0; i + 1 < p.length >> 1; i++) best = Math.min(best, segDist(x, y, p[2 * i], p[2 * i + 1], p[2 * i + 2], p[2 * i + 3]));
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
    // A line element is picked near its stroke.
    if (s.chains) {
      if (distanceToOpenPolylines(s.chains.map((c) => chainPoints(c, tol)), x, y) <= near) return s.id;
      continue;
    }
    if (!s.region.length) continue;
    const polys = regionPolylines(s.region, tol);
    if (windingNumber(polys, x, y) !== 0 || distanceToPolylines(polys, x, y) <= near) return s.id;
  }
  return null;
}
