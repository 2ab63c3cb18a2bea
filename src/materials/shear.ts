/**
 * Shear stress from a shear force V at a straight cut: τ = V·Q / (I·b).
 *
 * For a section of several materials Q and I are those of the transformed section and b is the
 * actual width at the cut (Gere & Goodno, composite beams, shear in the transformed section): the
 * shear flow q = V·Q/I does not depend on which material the cut runs through.
 *
 * A horizontal cut (axis 'y', at y = c) takes V along y and the part above the cut; a vertical cut
 * (axis 'x', at x = c) takes V along x and the part to the right, as cutSection does.
 *
 * VQ/(Ib) holds for bending about a principal axis. When the principal axes are rotated (Ixy ≠ 0)
 * the shear flow of a load along y is q = V (Iy·Qx − Ixy·Qy) / (Ix·Iy − Ixy²), derived here from
 * the general bending formula (stress.ts) by the equilibrium of the part beyond the cut under
 * dMx/dz = V; it is returned as `tauUnsymmetric`, and the two agree when Ixy = 0.
 */
import { rotateRegion } from '../geometry/contour';
import { momentsAbove } from '../moments/cut';
import type { MixedSection } from './mixed';
import { stressFactor, type LoadUnits } from './units';

export interface ShearResult {
  axis: 'x' | 'y';
  at: number;
  V: number;
  /** Actual width of the section along the cut. */
  width: number;
  /** Transformed first moment of the part beyond the cut about the parallel transformed centroidal axis. */
  Q: number;
  /** Transformed first moment of that part about the other centroidal axis (for the Ixy term). */
  Qother: number;
  /** Shear flow V·Q/I (force per length). */
  q: number;
  /** V·Q/(I·b) in the stress unit; null where the cut misses the section (b = 0). */
  tau: number | null;
  /** The same with Ixy included; equals tau when Ixy = 0. */
  tauUnsymmetric: number | null;
  cautions: string[];
}

export const SHEAR_AVERAGE_CAUTION =
  'τ = VQ/(Ib) is the average shear stress across the cut, taken parallel to V; in wide or thin-walled parts (flanges, thin walls) the true shear stress differs and follows the walls.';
export const SHEAR_ROTATED_CAUTION =
  'The principal axes are rotated (Ixy ≠ 0): VQ/(Ib) assumes bending about a principal axis. The value with Ixy included is also given; a load not through the shear centre also twists the section.';

/** Shear stress at a cut of the transformed section. V in force units (see units.ts). */
export function shearAtCut(section: MixedSection, axis: 'x' | 'y', at: number, V: number, units?: LoadUnits): ShearResult {
  if (!Number.isFinite(at)) throw new Error(`the cut position ${at} is not a finite number`);
  if (!Number.isFinite(V)) throw new Error(`the shear force V must be a finite number, got ${V}`);
  const t = section.transformed;
  let width = 0, Q = 0, Qo = 0;
  for (const p of section.parts) {
    if (axis === 'y') {
      const h = momentsAbove(p.region, at);
      width += h.width;
      Q += p.n * (h.m01 - t.centroid.y * h.m00);
      Qo += p.n * (h.m10 - t.centroid.x * h.m00);
    } else {
      // Right of x = at: turn by +90° ((x, y) -> (−y, x)), so y′ = x and x′ = −y, as cutSection does.
      const h = momentsAbove(rotateRegion(p.region, Math.PI / 2), at);
      width += h.width;
      Q += p.n * (h.m01 - t.centroid.x * h.m00);
      Qo += p.n * (-h.m10 - t.centroid.y * h.m00);
    }
  }
  const I = axis === 'y' ? t.Ix : t.Iy;
  const Iother = axis === 'y' ? t.Iy : t.Ix;
  const D = t.Ix * t.Iy - t.Ixy * t.Ixy;
  const sk = units ? stressFactor(units) : 1;
  const q = (V * Q) / I;
  const qu = (V * (Iother * Q - t.Ixy * Qo)) / D;
  const cautions = [SHEAR_AVERAGE_CAUTION];
  const rotated = Math.abs(t.Ixy) > 1e-9 * Math.max(t.Ix, t.Iy);
  if (rotated) cautions.push(SHEAR_ROTATED_CAUTION);
  return {
    axis,
    at,
    V,
    width,
    Q,
    Qother: Qo,
    q,
    tau: width > 0 ? (sk * q) / width : null,
    tauUnsymmetric: width > 0 ? (sk * qu) / width : null,
    cautions,
  };
}
