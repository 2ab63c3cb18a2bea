/**
 * Shear centre, centre of twist and warping constant from the warping function.
 *
 * Centre of twist and Cw. Warping about a pole P = (a, b) differs from warping about the centroid
 * by a rigid rotation of the section plane: ω_P = ω + a·y − b·x + c (the stresses do not change).
 * The pole and constant that make ω_P orthogonal to 1, x and y, i.e. ∫gω_P = ∫gω_P·x = ∫gω_P·y = 0,
 * also minimise ∫ g ω_P² dA; that minimum is the warping constant Cw and the pole is the centre
 * of twist (Trefftz's definition of the shear centre; Vlasov's principal sectorial pole in
 * thin-walled theory). For a section of several separate parts, each part keeps its own constant
 * and the minimum is taken over the pole and all the constants together.
 *
 * Shear centre (elastic, with Poisson's ratio ν). Derived from Saint-Venant flexure
 * (Timoshenko & Goodier, Theory of Elasticity, ch. 12, the bending of a cantilever), in
 * centroidal axes, for a shear force that leaves the section's mean rotation unchanged:
 * take σz = E(z − l)(αx + βy), σx = σy = τxy = 0. Integrating the strains gives the displacements
 *   u = −ν(z − l)(α(x² − y²)/2 + βxy) − θzy + …,  v = −ν(z − l)(αxy + β(y² − x²)/2) + θzx + …,
 *   w = (z²/2 − lz)(αx + βy) + χ(x, y),
 * so τ = G(∇χ − ν d − θ(y, −x)) with d = α dα + β dβ, dα = ((x² − y²)/2, xy),
 * dβ = (xy, (y² − x²)/2). The local rotation of the section is θz − ν(z − l)(αy − βx), whose mean
 * over the section is θz: no twist means θ = 0. Equilibrium with free faces, in weak form:
 *   ∫ G∇χ·∇v dA = ν ∫ G d·∇v dA + ∫ E (αx + βy) v dA.
 * With v = x and v = y the shear forces are Vx = α EIyy + β EIxy, Vy = α EIxy + β EIxx, and the
 * moment of the shear stresses about the centroid is T = ∫(x τyz − y τxz) dA. The shear centre
 * is where the resultant acts: T = xs·Vy − ys·Vx. χ = αΨα + βΨβ needs no separate solve: using
 * the torsion problem's weak form with v = Ψ and the flexure weak form with v = ω (Betti's
 * reciprocity, exact also between the discrete solutions, which share one matrix),
 *   Tα = −ν ∫G dα·∇ω − ∫E xω − (ν/2) ∫G y(x² + y²),
 *   Tβ = −ν ∫G dβ·∇ω − ∫E yω + (ν/2) ∫G x(x² + y²).
 * With ν = 0 this gives exactly the centre of twist above, as it should. E = 2(1 + ν)G for every
 * piece, so all weights are g = G/G_ref. (What counts as "no twist" differs between authors when
 * ν ≠ 0; here it is the mean rotation of the section, which in this solution is also the rotation
 * at the centroid. The ν term is small: 0.4 % of the offset for a solid semicircle at ν = 0.3.)
 *
 * The separate-parts case has no unique answer in Saint-Venant theory (each part bends about its
 * own axes); the results then treat the parts as held together in the plane and warping freely,
 * and the caller reports a caution.
 */
import { ElementGeometry, NQ, QN } from './p2-element';
import { elementCount, type QuadMesh } from './quad-mesh';
import type { WarpingSolution } from './warping';

export interface CentreResults {
  /** Elastic shear centre (mesh frame). */
  shearX: number;
  shearY: number;
  /** Centre of twist (mesh frame). */
  twistX: number;
  twistY: number;
  /** Warping constant about the centre of twist, relative to G_ref (E_ref). */
  Cw: number;
  /** ω about the centre of twist, orthogonal to 1 (per part), x and y. */
  omegaTwist: Float64Array;
}

export function centres(m: QuadMesh, g: Float64Array, part: Int32Array, parts: number, sol: WarpingSolution, nu: number): CentreResults {
  const s = sol.section;
  // Least squares for (a, b, c_1..c_P): minimise ∫g(ω + a y − b x + c_k)².
  // Unknowns u = (a, −b, c_1, …): basis functions y, x, 1_k.
  const P = parts;
  const N = 2 + P;
  const A = new Float64Array(N * N), r = new Float64Array(N);
  A[0] = s.Ixx;
  A[1] = A[N] = s.Ixy;
  A[N + 1] = s.Iyy;
  for (let k = 0; k < P; k++) {
    A[2 + k] = A[(2 + k) * N] = s.partY[k];
    A[N + 2 + k] = A[(2 + k) * N + 1] = s.partX[k];
    A[(2 + k) * N + 2 + k] = s.partArea[k];
    r[2 + k] = -sol.partOmega[k];
  }
  r[0] = -sol.Yw;
  r[1] = -sol.Xw;
  const u = solveSmall(A, r, N);
  const a = u[0], b = -u[1];
  const c = u.subarray(2);

  // ω about the centroid with the optimal constant per part (constants drop out for one part).
  let Xw = sol.Xw, Yw = sol.Yw;
  for (let k = 0; k < P; k++) {
    Xw += c[k] * s.partX[k];
    Yw += c[k] * s.partY[k];
  }
  const e = 2 * (1 + nu);
  const Ta = -nu * sol.Da - e * Xw - (nu / 2) * s.Y3;
  const Tb = -nu * sol.Db - e * Yw + (nu / 2) * s.X3;
  const D = e * e * (s.Ixx * s.Iyy - s.Ixy * s.Ixy);
  // Vx = 1, Vy = 0: (α, β) = M⁻¹(1, 0) with M = E[[Iyy, Ixy], [Ixy, Ixx]]; T = −ys.
  const ys = -((e * s.Ixx * Ta - e * s.Ixy * Tb) / D);
  // Vx = 0, Vy = 1: (α, β) = M⁻¹(0, 1); T = xs.
  const xs = (-e * s.Ixy * Ta + e * s.Iyy * Tb) / D;

  const omegaTwist = new Float64Array(sol.omega.length);
  for (let i = 0; i < omegaTwist.length; i++) omegaTwist[i] = sol.omega[i] + a * (m.y[i] - s.cy) - b * (m.x[i] - s.cx) + c[part[i]];
  const Cw = weightedSquare(m, g, omegaTwist);
  return { shearX: s.cx + xs, shearY: s.cy + ys, twistX: s.cx + a, twistY: s.cy + b, Cw, omegaTwist };
}

/** ∫ g φ² dA for a nodal field φ. */
function weightedSquare(m: QuadMesh, g: Float64Array, phi: Float64Array): number {
  const G = new ElementGeometry();
  let sum = 0;
  const ne = elementCount(m);
  for (let e = 0; e < ne; e++) {
    G.load(m.x, m.y, m.elem, e, 0, 0);
    const ge = g[m.piece[e]];
    for (let q = 0; q < NQ; q++) {
      let v = 0;
      for (let a = 0; a < 6; a++) v += QN[6 * q + a] * phi[m.elem[6 * e + a]];
      sum += ge * G.w[q] * v * v;
    }
  }
  return sum;
}

/**
 * Solve the small symmetric system of the centre-of-twist least squares (2 + number of parts
 * unknowns) by Gaussian elimination with partial pivoting. This is the only dense matrix in the
 * analysis and it is tiny; the finite-element system itself is sparse (pcg.ts).
 */
function solveSmall(A: Float64Array, r: Float64Array, n: number): Float64Array {
  const M = Float64Array.from(A), x = Float64Array.from(r);
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(M[i * n + k]) > Math.abs(M[p * n + k])) p = i;
    if (p !== k) {
      for (let j = 0; j < n; j++) [M[k * n + j], M[p * n + j]] = [M[p * n + j], M[k * n + j]];
      [x[k], x[p]] = [x[p], x[k]];
    }
    const piv = M[k * n + k];
    for (let i = k + 1; i < n; i++) {
      const f = M[i * n + k] / piv;
      if (f === 0) continue;
      for (let j = k; j < n; j++) M[i * n + j] -= f * M[k * n + j];
      x[i] -= f * x[k];
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let s = x[k];
    for (let j = k + 1; j < n; j++) s -= M[k * n + j] * x[j];
    x[k] = s / M[k * n + k];
  }
  return x;
}
