/**
 * Exact extreme points of a line group: the vertices plus, on each arc, the points where its
 * normal is axis-aligned (the arc's top, bottom, left and right when they lie inside its sweep).
 * Coordinates are taken relative to a point the caller gives (the centroid), so the distances to
 * the extreme fibres keep their digits far from the origin. Same construction as regionBounds in
 * src/geometry/contour.ts, for open chains.
 */
import { arcPointAtAngle, type Bounds } from '../geometry/contour';
import { chainSegment, segmentCount, type LineGroup } from './chain';

const AXES: readonly (readonly [number, number])[] = [[1, 0], [0, 1], [-1, 0], [0, -1]];

/** Bounds of the group relative to (ox, oy); null for a group without segments. */
export function groupBoundsAbout(group: LineGroup, ox: number, oy: number): Bounds | null {
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  const take = (x: number, y: number) => {
    if (x < xmin) xmin = x;
    if (x > xmax) xmax = x;
    if (y < ymin) ymin = y;
    if (y > ymax) ymax = y;
  };
  for (const chain of group) {
    const m = segmentCount(chain);
    for (let i = 0; i < m; i++) {
      const s = chainSegment(chain, i);
      const ax = s.ax - ox, ay = s.ay - oy, bx = s.bx - ox, by = s.by - oy;
      take(ax, ay);
      take(bx, by);
      if (s.sweep === 0) continue;
      const L = Math.hypot(bx - ax, by - ay);
      if (!(L > 0)) continue;
      const alpha = Math.abs(s.sweep) / 2;
      const ex = (bx - ax) / L, ey = (by - ay) / L;
      const sg = s.sweep > 0 ? 1 : -1;
      const ux = sg * ey, uy = -sg * ex;
      // The outward normal at θ is u cosθ + e sinθ; it points along the axis d at
      // θ = atan2(d·e, d·u), an extreme point of the arc when |θ| < α.
      for (const [dx, dy] of AXES) {
        const th = Math.atan2(dx * ex + dy * ey, dx * ux + dy * uy);
        if (Math.abs(th) < alpha) {
          const [px, py] = arcPointAtAngle(ax, ay, bx, by, s.sweep, th);
          take(px, py);
        }
      }
    }
  }
  if (xmin > xmax) return null;
  return { xmin, xmax, ymin, ymax };
}
