/**
 * Which closed loops lie inside which: the nesting depth of each loop decides whether it is
 * material (even depth) or a hole (odd depth), as in the even–odd fill rule of drawings.
 *
 * Containment is decided exactly on lines and arcs (no sampling of the boundary): the winding
 * number of a point is the total angle its boundary subtends. An arc seen from outside its circle
 * subtends the angle of its chord; seen from inside, the angle from its start to its end in the
 * arc's own sense of turning.
 * Each loop is tested at a dozen points on its own boundary (vertices and segment midpoints);
 * points that lie on the other loop's boundary are not counted.
 */
import type { Contour } from '../geometry/contour';
import { arcFromChord, angleInSweep, contourVertexCount, regionBounds, type Bounds } from '../geometry/contour';

/** Winding number of contour c about (px, py); the point must not lie on c. */
export function windingNumber(c: Contour, px: number, py: number): number {
  const n = contourVertexCount(c);
  const TWO_PI = 2 * Math.PI;
  let total = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const ax = c.xy[2 * i] - px, ay = c.xy[2 * i + 1] - py;
    const bx = c.xy[2 * j] - px, by = c.xy[2 * j + 1] - py;
    const b = c.bulge ? c.bulge[i] : 0;
    if (b !== 0) {
      const phi = 4 * Math.atan(b);
      const { cx, cy, r } = arcFromChord(ax, ay, bx, by, phi);
      if (Math.hypot(cx, cy) < r) {
        // Seen from a point inside the circle, the direction to a point moving along the arc
        // turns monotonically with it: the arc subtends the angle from a to b in its own sense.
        let d = Math.atan2(by, bx) - Math.atan2(ay, ax);
        d = ((d % TWO_PI) + TWO_PI) % TWO_PI;
        total += phi > 0 ? d : d - TWO_PI;
        continue;
      }
      // Outside the circle the arc subtends the same angle as its chord.
    }
    total += Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
  }
  return Math.round(total / TWO_PI);
}

/** Distance from (px, py) to the boundary of c. */
export function distanceToContour(c: Contour, px: number, py: number): number {
  const n = contourVertexCount(c);
  let best = Infinity;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
    const b = c.bulge ? c.bulge[i] : 0;
    let d: number;
    if (b === 0) {
      const dx = bx - ax, dy = by - ay;
      const L2 = dx * dx + dy * dy;
      const t = L2 > 0 ? Math.min(1, Math.max(0, ((px - ax) * dx + (py - ay) * dy) / L2)) : 0;
      d = Math.hypot(px - (ax + t * dx), py - (ay + t * dy));
    } else {
      const phi = 4 * Math.atan(b);
      const { cx, cy, r } = arcFromChord(ax, ay, bx, by, phi);
      const t = Math.atan2(py - cy, px - cx);
      const t0 = Math.atan2(ay - cy, ax - cx);
      d = angleInSweep(t, t0, phi)
        ? Math.abs(Math.hypot(px - cx, py - cy) - r)
        : Math.min(Math.hypot(px - ax, py - ay), Math.hypot(px - bx, py - by));
    }
    if (d < best) best = d;
  }
  return best;
}

/** Up to `count` points on the boundary of c: vertices and segment midpoints, evenly chosen. */
export function boundarySamples(c: Contour, count = 12): number[] {
  const n = contourVertexCount(c);
  const all: number[] = [];
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
    const b = c.bulge ? c.bulge[i] : 0;
    all.push(ax, ay);
    // Arc midpoint: the chord midpoint moved by the sagitta (bulge · chord / 2) to the right of a->b.
    all.push((ax + bx) / 2 + (b * (by - ay)) / 2, (ay + by) / 2 - (b * (bx - ax)) / 2);
  }
  const m = all.length >> 1;
  if (m <= count) return all;
  const out: number[] = [];
  for (let k = 0; k < count; k++) {
    const i = Math.floor((k * m) / count);
    out.push(all[2 * i], all[2 * i + 1]);
  }
  return out;
}

export interface Nesting {
  depth: number[];
  /** Pairs of loops whose boundaries cross (some samples inside, some outside). */
  crossing: [number, number][];
}

function boxInside(a: Bounds, b: Bounds, tol: number): boolean {
  return a.xmin >= b.xmin - tol && a.xmax <= b.xmax + tol && a.ymin >= b.ymin - tol && a.ymax <= b.ymax + tol;
}

/**
 * Depth of each loop: how many other loops contain it. `areas` are the loops' absolute areas
 * (a loop can only lie inside a larger one); `tol` is the distance under which a sample point
 * counts as lying on a boundary.
 */
export function nestLoops(loops: readonly Contour[], areas: readonly number[], tol: number): Nesting {
  const bounds = loops.map((c) => regionBounds([c])!);
  const samples = loops.map((c) => boundarySamples(c));
  const depth = loops.map(() => 0);
  const crossing: [number, number][] = [];
  for (let i = 0; i < loops.length; i++) {
    for (let j = 0; j < loops.length; j++) {
      if (i === j || !(areas[j] > areas[i]) || !boxInside(bounds[i], bounds[j], tol)) continue;
      let inside = 0, outside = 0;
      const s = samples[i];
      for (let k = 0; k < s.length; k += 2) {
        if (distanceToContour(loops[j], s[k], s[k + 1]) <= tol) continue;
        if (windingNumber(loops[j], s[k], s[k + 1]) !== 0) inside++;
        else outside++;
      }
      if (inside > 0 && outside > 0) crossing.push([i, j]);
      if (inside > outside) depth[i]++;
    }
  }
  return { depth, crossing };
}
