/**
 * How far the centroid moves and how far the principal axes turn between two sections.
 *
 * The centroid shift is the vector from the baseline's centroid to the proposal's, and its length.
 *
 * The principal axes are lines, not arrows, so the I1 axis at θ and at θ + 180° is the same axis:
 * the rotation is θ_proposal − θ_baseline wrapped into (−90°, 90°]. Beyond ±45° the proposal's I1
 * axis lies nearer the baseline's I2 axis: the axes have exchanged roles, which is said.
 * For an isotropic section (I1 = I2: a circle, a square, any section with equal moments about
 * every axis) every centroidal axis is principal and θ = 0 is a convention, so a rotation has no
 * meaning and none is given. When I1 and I2 differ by less than 1 %, the axes are weakly defined:
 * the rotation is given with that remark.
 */
import type { SectionProperties } from '../properties/section';

export interface CentroidShift {
  dx: number;
  dy: number;
  length: number;
}

export interface AxesRotation {
  /** Rotation of the I1 axis in degrees, CCW positive, in (−90, 90]; null when it has no meaning. */
  degrees: number | null;
  /** Why there is no rotation, or a remark about it; null when there is nothing to say. */
  note: string | null;
  /** True when the proposal's I1 axis lies nearer the baseline's I2 axis (|rotation| > 45°). */
  exchanged: boolean;
}

/** Relative difference (I1 − I2)/(I1 + I2) under which a section counts as isotropic. */
export const ISOTROPIC_TOL = 1e-9;
/** Relative difference under which the principal axes are weakly defined (1 %). */
export const WEAK_AXES = 0.01;

export function centroidShift(base: SectionProperties, proposal: SectionProperties): CentroidShift {
  const dx = proposal.centroid.x - base.centroid.x, dy = proposal.centroid.y - base.centroid.y;
  return { dx, dy, length: Math.hypot(dx, dy) };
}

/** (I1 − I2)/(I1 + I2): 0 for an isotropic section. */
export function anisotropy(p: SectionProperties): number {
  const s = p.I1 + p.I2;
  return s > 0 ? (p.I1 - p.I2) / s : 0;
}

/** Wrap an angle in degrees into (−90, 90]: the same line. */
export function wrapAxisAngle(deg: number): number {
  let d = deg % 180;
  if (d > 90) d -= 180;
  else if (d <= -90) d += 180;
  return d;
}

export function principalAxesRotation(base: SectionProperties, proposal: SectionProperties): AxesRotation {
  const which = [anisotropy(base) <= ISOTROPIC_TOL ? 'baseline' : null, anisotropy(proposal) <= ISOTROPIC_TOL ? 'proposal' : null].filter(Boolean);
  if (which.length) {
    return {
      degrees: null,
      note: `The ${which.join(' and the ')} ${which.length > 1 ? 'are' : 'is'} isotropic (I1 = I2): every centroidal axis is principal, so a rotation of the principal axes has no meaning.`,
      exchanged: false,
    };
  }
  const degrees = wrapAxisAngle(proposal.theta - base.theta);
  const exchanged = Math.abs(degrees) > 45;
  const notes: string[] = [];
  if (exchanged) notes.push("The axes have exchanged roles: the proposal's major axis lies nearer the baseline's minor axis.");
  const weak = Math.min(anisotropy(base), anisotropy(proposal));
  if (weak < WEAK_AXES) notes.push(`I1 and I2 differ by only ${+(100 * weak).toPrecision(2)} % of their sum, so the principal axes are weakly defined and turn far for small changes.`);
  return { degrees, note: notes.length ? notes.join(' ') : null, exchanged };
}
