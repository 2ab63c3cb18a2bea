/** The cautions printed with results (panel, CLI, report): one wording each, shared. */
import { DISPLAY_SIGFIGS, formatNumber } from '../properties/catalog';

export const CAUTION_TEXT = 'Geometric properties only. The design must be checked against the applicable code by a qualified engineer.';

/** The principal axes count as turned from x and y beyond this angle (degrees; common practice, no source)... */
export const PRINCIPAL_TURN_DEG = 1;
/** ... and when the product of inertia is at least this fraction of √(Ix·Iy) (common practice, no source). */
export const PRODUCT_RATIO = 0.01;

/**
 * The caution for Q/b and τ = VQ/(Ib) on a section whose principal axes are turned from x and y
 * (an angle, a Z, an unsymmetric built-up section), or null when it does not apply. The shear
 * formula assumes bending about a principal axis (Gere & Goodno, Mechanics of Materials: shear
 * formula and unsymmetric bending); with Ixy ≠ 0 a load along y bends the section about an
 * inclined neutral axis. Shown when the smaller angle from the principal axes to x and y exceeds
 * PRINCIPAL_TURN_DEG and |Ixy| exceeds PRODUCT_RATIO × √(Ix·Iy), so that a nearly isotropic
 * section, whose θ is ill defined, does not raise it.
 */
export function shearFormulaCaution(p: { theta: number; Ix: number; Iy: number; Ixy: number }): string | null {
  const turn = Math.min(Math.abs(p.theta), Math.abs(90 - Math.abs(p.theta)));
  const coupling = Math.abs(p.Ixy) / Math.sqrt(Math.max(p.Ix * p.Iy, 0));
  if (!(turn > PRINCIPAL_TURN_DEG) || !(coupling > PRODUCT_RATIO)) return null;
  return (
    `Caution: the principal axes are turned ${formatNumber(turn, DISPLAY_SIGFIGS, 90)}° from x and y (θ = ${formatNumber(p.theta, DISPLAY_SIGFIGS, 90)}°). ` +
    'Q/b and τ = VQ/(Ib) assume bending about a principal axis; for a shear force along x or y on this section they do not give the shear stress. ' +
    'Use the unsymmetric-bending form or resolve the load onto the principal axes. ' +
    `(Shown when the principal axes are turned more than ${PRINCIPAL_TURN_DEG}° from x and y and |Ixy| exceeds ${PRODUCT_RATIO * 100} % of √(Ix·Iy).)`
  );
}
