/**
 * The kern (core) of a section: the region of load points where a compressive axial force causes
 * no tension anywhere in the section.
 *
 * An axial force N at the eccentricity e (from the centroid) gives, by the general bending formula
 * with Mx = N e_y and My = −N e_x (stress.ts),
 *     σ(p) = N [1/A + eᵀ I⁻¹ p′],   I = [[Iy, Ixy], [Ixy, Ix]],  p′ = p − centroid,
 * so a compressive N causes no tension where 1/A + eᵀ I⁻¹ p′ ≥ 0 for every point of the section,
 * that is for every point of its convex hull. For a support line of the hull with outward unit
 * normal ν at distance h from the centroid, the load point that puts the neutral axis on that line
 * is
 *     e = −I ν / (A h)
 * (Timoshenko, Strength of Materials, Part I, core of a section; Gere & Goodno, eccentric axial
 * loads, core of the cross section; both from memory). Each straight edge of the hull gives one kern
 * vertex, each hull vertex (a pencil of support lines through one point) gives a straight kern edge,
 * and each hull arc gives a curved piece e(θ) of the kern boundary, traced here adaptively by
 * bisection in θ: an interval is split until the midpoint lies within tol = 2.4e-4 · (kern area /
 * kern perimeter) of its chord, and the midpoint is kept, so each output chord spans half a tested
 * interval and has a quarter of its sagitta. The area lost to the chords (about ⅔ · sagitta · chord
 * each) is then at most ⅔ · tol/4 · perimeter = 4e-5 of the kern's area (a circle: 512 points).
 *
 * Checks: rectangle b × h → rhombus with half-diagonals b/6 and h/6; solid circle → circle of
 * radius r/4; tube → circle of radius (R² + r²)/(4R) (tests/kern.test.ts).
 */
import { arcPointAtAngle, type Contour, type Region } from '../geometry/contour';
import { SectionError } from '../properties/section';
import { convexHull } from './hull';

/** The centroidal properties the kern needs (a SectionProperties or a TransformedSection fits). */
export interface KernSection {
  area: number;
  centroid: { x: number; y: number };
  Ix: number;
  Iy: number;
  Ixy: number;
}

export type KernPoint = [number, number];

/** Kern points e(ν, p) = G − I ν / (A ν·(p − G)) for the support line with outward normal ν through p. */
function kernPoint(s: KernSection, nx: number, ny: number, px: number, py: number): KernPoint {
  const h = nx * (px - s.centroid.x) + ny * (py - s.centroid.y);
  if (!(h > 0)) throw new SectionError('The centroid lies on the convex hull: the section has no kern.');
  const k = 1 / (s.area * h);
  return [s.centroid.x - k * (s.Iy * nx + s.Ixy * ny), s.centroid.y - k * (s.Ixy * nx + s.Ix * ny)];
}

interface HullArc {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  phi: number;
  /** Unit normal towards the bulge and chord direction: the radial direction at θ is u cosθ + e sinθ. */
  ux: number;
  uy: number;
  ex: number;
  ey: number;
}

/** Kern point for the tangent of a hull arc at angle θ ∈ [−α, α] from the arc's midpoint. */
function arcKernPoint(s: KernSection, a: HullArc, th: number): KernPoint {
  const c = Math.cos(th), sn = Math.sin(th);
  const nx = a.ux * c + a.ex * sn, ny = a.uy * c + a.ey * sn;
  const [px, py] = arcPointAtAngle(a.ax, a.ay, a.bx, a.by, a.phi, th);
  return kernPoint(s, nx, ny, px, py);
}

/** Distance of m from the line through p and q. */
function sagitta(p: KernPoint, m: KernPoint, q: KernPoint): number {
  const dx = q[0] - p[0], dy = q[1] - p[1];
  const L = Math.hypot(dx, dy);
  if (!(L > 0)) return Math.hypot(m[0] - p[0], m[1] - p[1]);
  return Math.abs((m[0] - p[0]) * dy - (m[1] - p[1]) * dx) / L;
}

/** Push the points of e(θ) on (t0, t1], refining until every chord's sagitta is within tol. */
function traceArc(s: KernSection, a: HullArc, t0: number, p0: KernPoint, t1: number, p1: KernPoint, tol: number, depth: number, out: KernPoint[]): void {
  const tm = (t0 + t1) / 2;
  const pm = arcKernPoint(s, a, tm);
  if (depth < 16 && sagitta(p0, pm, p1) > tol) {
    traceArc(s, a, t0, p0, tm, pm, tol, depth + 1, out);
    traceArc(s, a, tm, pm, t1, p1, tol, depth + 1, out);
  } else {
    out.push(pm, p1);
  }
}

function hullArcs(hull: Contour): (HullArc | null)[] {
  const n = hull.xy.length >> 1;
  const out: (HullArc | null)[] = [];
  for (let i = 0; i < n; i++) {
    const b = hull.bulge ? hull.bulge[i] : 0;
    const j = i + 1 === n ? 0 : i + 1;
    const ax = hull.xy[2 * i], ay = hull.xy[2 * i + 1], bx = hull.xy[2 * j], by = hull.xy[2 * j + 1];
    const L = Math.hypot(bx - ax, by - ay);
    if (b === 0 || !(L > 0)) {
      out.push(null);
      continue;
    }
    const phi = 4 * Math.atan(b);
    const ex = (bx - ax) / L, ey = (by - ay) / L;
    const sg = phi > 0 ? 1 : -1;
    out.push({ ax, ay, bx, by, phi, ux: sg * ey, uy: -sg * ex, ex, ey });
  }
  return out;
}

/** Kern boundary with the arcs sampled at a fixed step (for the area estimate that sets the tolerance). */
function trace(s: KernSection, hull: Contour, tol: number | null): KernPoint[] {
  const n = hull.xy.length >> 1;
  const arcs = hullArcs(hull);
  const out: KernPoint[] = [];
  // Edges shorter than this have no reliable normal; dropping one moves the kern by as little.
  let size = 0;
  for (let i = 0; i < n; i++) size = Math.max(size, Math.abs(hull.xy[2 * i] - hull.xy[0]), Math.abs(hull.xy[2 * i + 1] - hull.xy[1]));
  const shortEdge = 1e-8 * size;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const ax = hull.xy[2 * i], ay = hull.xy[2 * i + 1], bx = hull.xy[2 * j], by = hull.xy[2 * j + 1];
    const a = arcs[i];
    if (!a) {
      const L = Math.hypot(bx - ax, by - ay);
      if (!(L > shortEdge)) continue;
      out.push(kernPoint(s, (by - ay) / L, -(bx - ax) / L, ax, ay));
      continue;
    }
    const alpha = Math.abs(a.phi) / 2;
    const pieces = Math.max(2, Math.ceil(Math.abs(a.phi) / (Math.PI / 16)));
    let tPrev = -alpha;
    let pPrev = arcKernPoint(s, a, tPrev);
    out.push(pPrev);
    for (let k = 1; k <= pieces; k++) {
      const t = -alpha + (2 * alpha * k) / pieces;
      const p = arcKernPoint(s, a, t);
      if (tol === null) out.push(p);
      else traceArc(s, a, tPrev, pPrev, t, p, tol, 0, out);
      tPrev = t;
      pPrev = p;
    }
  }
  return dedupe(out);
}

/**
 * Drop consecutive points closer than 1e-9 of the kern's size: tangent joins of the hull give the
 * same kern point twice, and tiny hull pieces give points whose spacing is round-off.
 */
function dedupe(pts: KernPoint[]): KernPoint[] {
  if (pts.length === 0) return pts;
  let size = 0;
  for (const p of pts) size = Math.max(size, Math.abs(p[0] - pts[0][0]), Math.abs(p[1] - pts[0][1]));
  const tol = 1e-9 * size;
  const out: KernPoint[] = [];
  for (const p of pts) {
    const q = out[out.length - 1];
    if (!q || Math.hypot(p[0] - q[0], p[1] - q[1]) > tol) out.push(p);
  }
  while (out.length > 1 && Math.hypot(out[0][0] - out[out.length - 1][0], out[0][1] - out[out.length - 1][1]) <= tol) out.pop();
  return out;
}

/** Area and perimeter of a closed polygon (shoelace). */
export function polygonAreaPerimeter(pts: readonly KernPoint[]): { area: number; perimeter: number } {
  let a = 0, p = 0;
  for (let i = 0; i < pts.length; i++) {
    const [x0, y0] = pts[i], [x1, y1] = pts[(i + 1) % pts.length];
    a += x0 * y1 - x1 * y0;
    p += Math.hypot(x1 - x0, y1 - y0);
  }
  return { area: a / 2, perimeter: p };
}

/** Sagitta tolerance of a tested interval, relative to kern area / perimeter (see the header). */
const SAGITTA_BUDGET = 2.4e-4;

/**
 * The kern boundary, CCW, as points [x, y] (not repeating the first), from the section's convex
 * hull (see hull.ts) and its centroidal properties.
 */
export function kernFromHull(hull: Contour, s: KernSection): KernPoint[] {
  if (!(s.area > 0) || !(s.Ix > 0) || !(s.Iy > 0) || !(s.Ix * s.Iy - s.Ixy * s.Ixy > 0)) throw new SectionError('The section has no area or no bending stiffness: it has no kern.');
  const coarse = trace(s, hull, null);
  if (!hull.bulge) return coarse;
  const { area, perimeter } = polygonAreaPerimeter(coarse);
  return trace(s, hull, (SAGITTA_BUDGET * area) / perimeter);
}

/** The kern of a region (for several materials: pass all their contours as one list, and the transformed section). */
export function sectionKern(region: Region, s: KernSection): KernPoint[] {
  return kernFromHull(convexHull(region), s);
}
