/**
 * Derived section properties from the exact moments of a region.
 * Conventions: document units; angles in degrees only in the returned record (θ from +x to the
 * I1 axis, CCW, in (−90°, 90°]); product of inertia Ixy = ∫(x−x̄)(y−ȳ) dA.
 *
 * Exact at any position: centroidal moments come from the kernel's centralMoments (no transfer
 * from the origin), and every quantity measured from a line (a cut's Q, the plastic modulus) is
 * summed about that line and carried to the centroid through the centroid's offset from a point
 * of the region, never through world coordinates that have lost their low digits.
 */
import type { Region } from '../geometry/contour';
import { contourLength, type Bounds } from '../geometry/contour';
import { centralMoments, contourSummary, type CentralMoments, type RawMoments } from '../moments/kernel';
import { momentsAboveAbout, planCuts, turnPlan, type CutPlan } from '../moments/cut';
import { plasticAxes } from './plastic-axis';

export interface SectionProperties {
  area: number;
  centroid: { x: number; y: number };
  Qx: number;
  Qy: number;
  Ix: number;
  Iy: number;
  Ixy: number;
  J0: number;
  I1: number;
  I2: number;
  theta: number;
  rx: number;
  ry: number;
  r1: number;
  r2: number;
  Sx_top: number;
  Sx_bottom: number;
  Sy_left: number;
  Sy_right: number;
  Zx: number;
  Zy: number;
  /** Equal-area axis positions: y of the horizontal plastic neutral axis, x of the vertical one. */
  plasticAxis: { y: number; x: number };
  bounds: Bounds;
  perimeter: number;
  /** Distances from the centroid to the extreme fibres. */
  fibres: { top: number; bottom: number; left: number; right: number };
}

export class SectionError extends Error {}

/** Relative tolerance under which a section counts as having no area. */
const EMPTY_TOL = 1e-14;

/**
 * Centroidal moments from raw moments about the origin. This cancels as A·ȳ² grows against the
 * centroidal moment (a part far from the origin): sectionProperties uses centralMoments instead.
 */
export function centroidalFromRaw(m: RawMoments) {
  const A = m.m00;
  const xc = m.m10 / A, yc = m.m01 / A;
  return { A, xc, yc, Ix: m.m02 - A * yc * yc, Iy: m.m20 - A * xc * xc, Ixy: m.m11 - A * xc * yc };
}

/** Principal moments and the angle (radians, (−π/2, π/2]) of the I1 axis. */
export function principal(Ix: number, Iy: number, Ixy: number) {
  const avg = (Ix + Iy) / 2;
  const half = (Ix - Iy) / 2;
  const R = Math.hypot(half, Ixy);
  let theta = 0;
  // Isotropic sections (circle, square, ...) have every axis principal: report θ = 0. A product
  // of inertia that is zero up to round-off counts as zero, so a section with Iy > Ix reports
  // θ = 90° whichever sign the round-off had.
  const ixy = Math.abs(Ixy) <= 1e-14 * (Math.abs(Ix) + Math.abs(Iy)) ? 0 : Ixy;
  if (R > 1e-12 * Math.abs(avg)) theta = Math.atan2(-ixy, half) / 2;
  if (theta <= -Math.PI / 2) theta += Math.PI;
  return { I1: avg + R, I2: avg - R, theta };
}

/** Moment of inertia about an axis through (px, py) at angle `angle` (radians) from +x. */
export function inertiaAboutAxis(p: SectionProperties, px: number, py: number, angle: number): number {
  const c = Math.cos(angle), s = Math.sin(angle);
  // About the parallel centroidal axis (Mohr transformation), then transfer by the distance.
  const Ic = p.Ix * c * c + p.Iy * s * s - 2 * p.Ixy * s * c;
  const d = -(p.centroid.x - px) * s + (p.centroid.y - py) * c;
  return Ic + p.area * d * d;
}

/** The region's exact bounds, from its cut plan's per-loop boxes (null when it has no loop). */
function planBounds(plan: CutPlan): Bounds | null {
  const n = plan.xmin.length;
  if (n === 0) return null;
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  for (let k = 0; k < n; k++) {
    xmin = Math.min(xmin, plan.xmin[k]);
    xmax = Math.max(xmax, plan.xmax[k]);
    ymin = Math.min(ymin, plan.ymin[k]);
    ymax = Math.max(ymax, plan.ymax[k]);
  }
  return { xmin, xmax, ymin, ymax };
}

export function sectionProperties(region: Region): SectionProperties {
  const plan = planCuts(region);
  const bounds = planBounds(plan);
  const cm = centralMoments(region);
  if (!bounds || !(cm.A > 0)) throw new SectionError('The section is empty: it has no area.');
  const extent = Math.max(bounds.xmax - bounds.xmin, bounds.ymax - bounds.ymin);
  if (cm.A <= EMPTY_TOL * extent * extent) throw new SectionError('The section has zero area.');
  const { A, Ix, Iy, Ixy } = cm;
  const xc = cm.refX + cm.dx, yc = cm.refY + cm.dy;
  const { I1, I2, theta } = principal(Ix, Iy, Ixy);
  // Fibre distances from the centroid's offset, so they keep their digits far from the origin.
  const top = bounds.ymax - cm.refY - cm.dy, bottom = cm.dy - (bounds.ymin - cm.refY);
  const right = bounds.xmax - cm.refX - cm.dx, left = cm.dx - (bounds.xmin - cm.refX);
  const plastic = plasticAxes([{ plan, cm, w: 1 }], bounds);
  let perimeter = 0;
  for (const c of region) perimeter += c.xy.length >= 4 ? contourSummary(c).length : contourLength(c);
  const pos = (v: number) => Math.max(v, 0);
  const out: SectionProperties = {
    area: A,
    centroid: { x: xc, y: yc },
    Qx: A * yc,
    Qy: A * xc,
    Ix,
    Iy,
    Ixy,
    J0: Ix + Iy,
    I1,
    I2,
    theta: (theta * 180) / Math.PI,
    rx: Math.sqrt(pos(Ix) / A),
    ry: Math.sqrt(pos(Iy) / A),
    r1: Math.sqrt(pos(I1) / A),
    r2: Math.sqrt(pos(I2) / A),
    Sx_top: Ix / top,
    Sx_bottom: Ix / bottom,
    Sy_left: Iy / left,
    Sy_right: Iy / right,
    Zx: plastic.x.Z,
    Zy: plastic.y.Z,
    plasticAxis: { y: plastic.x.at, x: plastic.y.at },
    bounds,
    perimeter,
    fibres: { top, bottom, left, right },
  };
  // A section far smaller than its distance from the origin loses its digits in the coordinates.
  const far = Math.max(Math.abs(bounds.xmin), Math.abs(bounds.xmax), Math.abs(bounds.ymin), Math.abs(bounds.ymax));
  const tooSmall = !(extent > 1e-9 * far) || !allFinite(out);
  if (tooSmall) {
    throw new SectionError(
      `The section is too small to compute where it lies: its size (${extent.toPrecision(3)}) is lost in its coordinates. Move it nearer the origin or change the units.`,
    );
  }
  return out;
}

function allFinite(p: SectionProperties): boolean {
  const vals = [p.area, p.centroid.x, p.centroid.y, p.Ix, p.Iy, p.Ixy, p.I1, p.I2, p.theta, p.rx, p.ry, p.r1, p.r2, p.Sx_top, p.Sx_bottom, p.Sy_left, p.Sy_right, p.Zx, p.Zy, p.perimeter];
  return vals.every(Number.isFinite);
}

export interface CutResult {
  axis: 'x' | 'y';
  at: number;
  width: number;
  area: number;
  centroid: { x: number; y: number } | null;
  /** First moment of the part beyond the cut about the centroidal axis parallel to the cut. */
  Q: number;
}

/** What a cut needs of the whole region, prepared once for any number of cuts. */
interface CutFrame {
  /** The region, turned for vertical cuts so that "right of x" becomes "above y". */
  plan: CutPlan;
  cm: CentralMoments;
}

function cutFrame(region: Region, axis: 'x' | 'y'): CutFrame {
  // Right of x = at: turn by +90° exactly ((x, y) -> (−y, x)) so "right of" becomes "above".
  const plan = planCuts(region);
  if (axis === 'y') return { plan, cm: centralMoments(region) };
  const turned = turnPlan(plan, 1);
  return { plan: turned, cm: centralMoments(turned.contours) };
}

function cutWith(frame: CutFrame, axis: 'x' | 'y', at: number, whole: { centroid: { x: number; y: number } }): CutResult {
  if (!Number.isFinite(at)) throw new SectionError(`The cut position ${at} is not a finite number.`);
  const { plan, cm } = frame;
  const h = momentsAboveAbout(plan, at, cm.refX);
  const A = h.m00;
  // Q about the centroidal axis parallel to the cut: ∫(y − at) dA plus A·(at − ȳ), with at − ȳ
  // taken through the centroid's offset from a point of the region. A `whole` that is not this
  // region's own result (a centroid more than its last digits away) is used as given.
  const own = axis === 'y' ? whole.centroid.y : whole.centroid.x;
  const mine = cm.refY + cm.dy;
  const same = Math.abs(own - mine) <= 8 * Number.EPSILON * Math.abs(mine);
  const lever = same ? at - cm.refY - cm.dy : at - own;
  const Q = h.m01 + A * lever;
  let centroid: { x: number; y: number } | null = null;
  if (A > 0) {
    const u = cm.refX + h.m10 / A, v = at + h.m01 / A;
    // In the turned frame of a vertical cut, x' = −y and y' = x.
    centroid = axis === 'y' ? { x: u, y: v } : { x: v, y: -u };
  }
  return { axis, at, width: h.width, area: A, centroid, Q };
}

/**
 * The part beyond a cut: above y = at (axis 'y'), or right of x = at (axis 'x').
 * `whole` supplies the section's centroid (pass sectionProperties' result).
 */
export function cutSection(region: Region, axis: 'x' | 'y', at: number, whole: { centroid: { x: number; y: number } }): CutResult {
  if (!Number.isFinite(at)) throw new SectionError(`The cut position ${at} is not a finite number.`);
  return cutWith(cutFrame(region, axis), axis, at, whole);
}

/**
 * Width b and first moment Q of the part beyond the cut, sampled across the depth (axis 'y':
 * horizontal cuts from ymin to ymax) or the width (axis 'x'), for the Q/b diagram.
 */
export function cutDiagram(region: Region, axis: 'x' | 'y', whole: SectionProperties, samples = 101): { at: number; width: number; Q: number }[] {
  const lo = axis === 'y' ? whole.bounds.ymin : whole.bounds.xmin;
  const hi = axis === 'y' ? whole.bounds.ymax : whole.bounds.xmax;
  const n = Math.max(2, Math.floor(samples));
  const frame = cutFrame(region, axis);
  const out: { at: number; width: number; Q: number }[] = [];
  for (let k = 0; k < n; k++) {
    const at = lo + ((hi - lo) * k) / (n - 1);
    const c = cutWith(frame, axis, at, whole);
    out.push({ at, width: c.width, Q: c.Q });
  }
  return out;
}
