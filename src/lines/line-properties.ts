/**
 * Properties of a line group per unit thickness (a weld group per unit throat, or the centreline
 * of a thin wall): length, centroid, centroidal Ix, Iy, Ixy, polar moment J = Ix + Iy, principal
 * values and angle, and the line section moduli to the extreme points.
 *
 * Conventions as for areas (src/properties/section.ts): Ixy = ∫(x − x̄)(y − ȳ) dL; θ runs from +x
 * to the I1 axis, CCW, in (−90°, 90°], and isotropic groups report θ = 0. Dimensions: length L,
 * centroid L, Ix, Iy, Ixy, J, I1, I2 L³ (per unit thickness), section moduli L².
 *
 * Two passes: the centroid from moments about the group's first vertex, then the second moments
 * about the centroid itself, so nothing is lost to cancellation wherever the group lies.
 */
import type { Bounds } from '../geometry/contour';
import { shiftMoments, type RawMoments } from '../moments/kernel';
import { principal } from '../properties/section';
import { groupBoundsAbout } from './chain-bounds';
import { checkGroup, LineError, type LineGroup } from './chain';
import { groupReference, lineMomentsAbout } from './line-kernel';

export interface LineProperties {
  length: number;
  centroid: { x: number; y: number };
  Ix: number;
  Iy: number;
  Ixy: number;
  /** Polar moment about the centroid, Ix + Iy. */
  J: number;
  I1: number;
  I2: number;
  /** Degrees, from +x to the I1 axis, CCW, in (−90°, 90°]. */
  theta: number;
  /** Exact extent, arcs' extreme points included. */
  bounds: Bounds;
  /** Distances from the centroid to the extreme points. */
  fibres: { top: number; bottom: number; left: number; right: number };
  /** Line section moduli Ix / c and Iy / c; null where the extreme point lies on the axis (c = 0). */
  Sx_top: number | null;
  Sx_bottom: number | null;
  Sy_left: number | null;
  Sy_right: number | null;
  /** Raw line moments about the document origin (m00 = length). */
  raw: RawMoments;
}

/** Raw line moments of a group about the document origin. */
export function lineMoments(group: LineGroup): RawMoments {
  const [ox, oy] = groupReference(group);
  return shiftMoments(lineMomentsAbout(group, ox, oy), ox, oy);
}

/** Line properties of a group; throws LineError for unusable input or a group without length. */
export function lineProperties(group: LineGroup): LineProperties {
  checkGroup(group);
  const [ox, oy] = groupReference(group);
  const m0 = lineMomentsAbout(group, ox, oy);
  const L = m0.m00;
  const local = groupBoundsAbout(group, ox, oy);
  if (!local || !(L > 0)) throw new LineError('The line group has no length: draw at least one segment that is not a point.');
  const extent = Math.max(local.xmax - local.xmin, local.ymax - local.ymin);
  const far = Math.max(Math.abs(ox), Math.abs(oy));
  if (!(extent > 1e-12 * far) || !Number.isFinite(L)) {
    throw new LineError(`The line group is too small to compute where it lies: its size (${extent.toPrecision(3)}) is lost in its coordinates. Move it nearer the origin or change the units.`);
  }
  const gx = ox + m0.m10 / L, gy = oy + m0.m01 / L;
  // Second pass about the centroid: the first moments vanish up to round-off, and the centroidal
  // second moments come out directly.
  const m = lineMomentsAbout(group, gx, gy);
  const dx = m.m10 / L, dy = m.m01 / L;
  const Ix = m.m02 - L * dy * dy;
  const Iy = m.m20 - L * dx * dx;
  const Ixy = m.m11 - L * dx * dy;
  const cx = gx + dx, cy = gy + dy;
  const { I1, I2, theta } = principal(Ix, Iy, Ixy);
  // Extremes about the first-pass centroid (a representable point), then moved by the small
  // correction, so the fibre distances do not inherit the rounding of cx, cy far from the origin.
  const b = groupBoundsAbout(group, gx, gy) as Bounds;
  const fibres = { top: b.ymax - dy, bottom: dy - b.ymin, left: dx - b.xmin, right: b.xmax - dx };
  const tiny = 1e-12 * extent;
  const modulus = (I: number, c: number) => (c > tiny ? I / c : null);
  return {
    length: L,
    centroid: { x: cx, y: cy },
    Ix,
    Iy,
    Ixy,
    J: Ix + Iy,
    I1,
    I2,
    theta: (theta * 180) / Math.PI,
    bounds: { xmin: gx + b.xmin, xmax: gx + b.xmax, ymin: gy + b.ymin, ymax: gy + b.ymax },
    fibres,
    Sx_top: modulus(Ix, fibres.top),
    Sx_bottom: modulus(Ix, fibres.bottom),
    Sy_left: modulus(Iy, fibres.left),
    Sy_right: modulus(Iy, fibres.right),
    raw: shiftMoments(m, gx, gy),
  };
}
