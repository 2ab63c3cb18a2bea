/**
 * Where a point lies relative to a region bounded by lines and arcs: the crossings of a horizontal
 * line with the boundary (for inside tests and row sampling), and the distance to the boundary
 * (so that a point typed on an edge or a corner counts as on the section).
 *
 * Arcs are split at their highest and lowest points into pieces along which y is monotone; each
 * piece meets a horizontal line at most once, found by the Illinois variant of regula falsi on the
 * exact arc (arcPointAtAngle, in the chord frame, so flat arcs stay exact). Crossings use the
 * half-open rule min(y0, y1) ≤ y < max(y0, y1), so a line through a vertex counts once.
 */
import { arcPointAtAngle, type Contour, type Region } from '../geometry/contour';

interface ArcFrame {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  phi: number;
  alpha: number;
  /** Unit normal towards the bulge (centre → arc midpoint) and unit chord direction. */
  ux: number;
  uy: number;
  ex: number;
  ey: number;
}

function arcFrame(c: Contour, i: number): ArcFrame | null {
  const b = c.bulge ? c.bulge[i] : 0;
  if (b === 0) return null;
  const n = c.xy.length >> 1;
  const j = i + 1 === n ? 0 : i + 1;
  const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
  const L = Math.hypot(bx - ax, by - ay);
  if (!(L > 0)) return null;
  const phi = 4 * Math.atan(b);
  const ex = (bx - ax) / L, ey = (by - ay) / L;
  const sg = phi > 0 ? 1 : -1;
  return { ax, ay, bx, by, phi, alpha: Math.abs(phi) / 2, ux: sg * ey, uy: -sg * ex, ex, ey };
}

/** Angles θ ∈ (−α, α) (from the arc midpoint) where the radial direction is ±y: the arc's y extremes. */
function yTurns(f: ArcFrame): number[] {
  const out: number[] = [];
  for (const dy of [1, -1]) {
    const th = Math.atan2(dy * f.ey, dy * f.uy);
    if (Math.abs(th) < f.alpha) out.push(th);
  }
  return out.sort((p, q) => p - q);
}

/** Angle θ where the piece [t0, t1] of the arc (y monotone on it) has height y (Illinois method). */
function solveY(f: ArcFrame, t0: number, t1: number, y: number): number {
  const g = (t: number) => arcPointAtAngle(f.ax, f.ay, f.bx, f.by, f.phi, t)[1] - y;
  let a = t0, b = t1, ga = g(a), gb = g(b);
  let side = 0;
  for (let k = 0; k < 100; k++) {
    if (ga === gb) break;
    const c = (a * gb - b * ga) / (gb - ga);
    if (!(c > Math.min(a, b) && c < Math.max(a, b))) break;
    const gc = g(c);
    if (gc === 0) return c;
    if ((gc > 0) === (gb > 0)) {
      b = c;
      gb = gc;
      if (side === -1) ga /= 2;
      side = -1;
    } else {
      a = c;
      ga = gc;
      if (side === 1) gb /= 2;
      side = 1;
    }
    if (Math.abs(b - a) <= 4 * Number.EPSILON * Math.max(1, Math.abs(a))) break;
  }
  return Math.abs(ga) < Math.abs(gb) ? a : b;
}

/** Crossings of y = const with contour c, as x values (unsorted), with the half-open rule. */
function contourCrossings(c: Contour, y: number, out: number[]): void {
  const n = c.xy.length >> 1;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const x0 = c.xy[2 * i], y0 = c.xy[2 * i + 1], x1 = c.xy[2 * j], y1 = c.xy[2 * j + 1];
    const f = arcFrame(c, i);
    if (!f) {
      if ((y0 <= y && y < y1) || (y1 <= y && y < y0)) out.push(x0 + ((y - y0) / (y1 - y0)) * (x1 - x0));
      continue;
    }
    // Quick reject: an arc of at most 180° lies within its chord's box widened by its height.
    if (f.alpha <= Math.PI / 2) {
      const h = (Math.hypot(x1 - x0, y1 - y0) / 2) * Math.tan(f.alpha / 2) * 1.0000001;
      if (y < Math.min(y0, y1) - h || y > Math.max(y0, y1) + h) continue;
    }
    // θ runs from −α at the start a to +α at the end b (arcPointAtAngle), whatever the sense.
    const cuts = [-f.alpha, ...yTurns(f), f.alpha];
    let pa: [number, number] = [x0, y0];
    for (let k = 0; k + 1 < cuts.length; k++) {
      const last = k + 2 === cuts.length;
      const pb: [number, number] = last ? [x1, y1] : arcPointAtAngle(f.ax, f.ay, f.bx, f.by, f.phi, cuts[k + 1]);
      if ((pa[1] <= y && y < pb[1]) || (pb[1] <= y && y < pa[1])) {
        const t = solveY(f, cuts[k], cuts[k + 1], y);
        out.push(arcPointAtAngle(f.ax, f.ay, f.bx, f.by, f.phi, t)[0]);
      }
      pa = pb;
    }
  }
}

/** Sorted x values where the line y = const crosses the region's boundary. */
export function rowCrossings(region: Region, y: number): number[] {
  const out: number[] = [];
  for (const c of region) contourCrossings(c, y, out);
  return out.sort((p, q) => p - q);
}

/**
 * True when (x, y) lies inside the region by the crossing rule (points exactly on the boundary may
 * go either way; combine with boundaryDistance for a closed test). Parity of the crossings to the
 * left: for a region of loops that do not overlap (outer boundaries and their holes) it equals the
 * winding rule, with no pairing of loops needed.
 */
export function regionContainsPoint(region: Region, x: number, y: number): boolean {
  const xs = rowCrossings(region, y);
  let k = 0;
  while (k < xs.length && xs[k] < x) k++;
  return k % 2 === 1;
}

function segmentDistanceAsLine(ax: number, ay: number, bx: number, by: number, px: number, py: number, toEnds: number): number {
  const dx = bx - ax, dy = by - ay, L2 = dx * dx + dy * dy;
  if (!(L2 > 0)) return toEnds;
  const t = ((px - ax) * dx + (py - ay) * dy) / L2;
  if (t <= 0 || t >= 1) return toEnds;
  return Math.abs((px - ax) * dy - (py - ay) * dx) / Math.sqrt(L2);
}

/** Distance from (px, py) to segment i of contour c (exact for lines and arcs). */
function segmentDistance(c: Contour, i: number, px: number, py: number): number {
  const n = c.xy.length >> 1;
  const j = i + 1 === n ? 0 : i + 1;
  const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
  const f = arcFrame(c, i);
  const toEnds = Math.min(Math.hypot(px - ax, py - ay), Math.hypot(px - bx, py - by));
  if (!f) return segmentDistanceAsLine(ax, ay, bx, by, px, py, toEnds);
  // The nearest point of the full circle lies along the radial direction through p; in the chord
  // frame that direction is at θ = atan2((p − C)·e, (p − C)·u), with C = M − u r cosα.
  const L = Math.hypot(bx - ax, by - ay);
  const r = L / (2 * Math.sin(f.alpha));
  if (!(r < Infinity)) return segmentDistanceAsLine(ax, ay, bx, by, px, py, toEnds);
  const mx = (ax + bx) / 2, my = (ay + by) / 2;
  const qu = (px - mx) * f.ux + (py - my) * f.uy + r * Math.cos(f.alpha);
  const qe = (px - mx) * f.ex + (py - my) * f.ey;
  const th = Math.atan2(qe, qu);
  if (Math.abs(th) >= f.alpha) return toEnds;
  const [qx, qy] = arcPointAtAngle(ax, ay, bx, by, f.phi, th);
  return Math.min(toEnds, Math.hypot(px - qx, py - qy));
}

/** Distance from (x, y) to the nearest boundary point of the region. */
export function boundaryDistance(region: Region, x: number, y: number): number {
  let d = Infinity;
  for (const c of region) {
    const n = c.xy.length >> 1;
    for (let i = 0; i < n; i++) d = Math.min(d, segmentDistance(c, i, x, y));
  }
  return d;
}
