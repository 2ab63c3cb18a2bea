/**
 * The 6-node (quadratic) triangle: shape functions, their derivatives and the quadrature rule,
 * tabulated once on the reference triangle.
 *
 * Node order: vertices 1, 2, 3 (counter-clockwise), then the mid-side nodes 4 (edge 1–2),
 * 5 (edge 2–3) and 6 (edge 3–1). With area coordinates L1 = 1 − ξ − η, L2 = ξ, L3 = η:
 *   N1 = L1(2L1 − 1), N2 = L2(2L2 − 1), N3 = L3(2L3 − 1), N4 = 4L1L2, N5 = 4L2L3, N6 = 4L3L1
 * (Zienkiewicz & Taylor, The Finite Element Method, vol. 1, the quadratic triangle). Elements are
 * isoparametric: a mid-side node placed on an arc curves that side.
 *
 * Quadrature: the symmetric 6-point rule of degree 4 (Strang & Fix; Dunavant 1985), exact for
 * every integral the torsion analysis takes over a straight-sided element (the highest is ω²,
 * of degree 4). Weights sum to 1; multiply by the Jacobian determinant / 2.
 */

const A1 = 0.445948490915965, W1 = 0.223381589678011;
const A2 = 0.091576213509771, W2 = 0.109951743655322;

/** Quadrature points as (L1, L2, L3) and weights. */
export const QUAD_L: readonly (readonly [number, number, number])[] = [
  [1 - 2 * A1, A1, A1],
  [A1, 1 - 2 * A1, A1],
  [A1, A1, 1 - 2 * A1],
  [1 - 2 * A2, A2, A2],
  [A2, 1 - 2 * A2, A2],
  [A2, A2, 1 - 2 * A2],
];
export const QUAD_W: readonly number[] = [W1, W1, W1, W2, W2, W2];
export const NQ = 6;

/** The six node positions as area coordinates (L1, L2, L3). */
export const NODE_L: readonly (readonly [number, number, number])[] = [
  [1, 0, 0],
  [0, 1, 0],
  [0, 0, 1],
  [0.5, 0.5, 0],
  [0, 0.5, 0.5],
  [0.5, 0, 0.5],
];

/** Shape function values at area coordinates, into out[0..5]. */
export function shapeValues(L1: number, L2: number, L3: number, out: Float64Array, offset = 0): void {
  out[offset] = L1 * (2 * L1 - 1);
  out[offset + 1] = L2 * (2 * L2 - 1);
  out[offset + 2] = L3 * (2 * L3 - 1);
  out[offset + 3] = 4 * L1 * L2;
  out[offset + 4] = 4 * L2 * L3;
  out[offset + 5] = 4 * L3 * L1;
}

/** Derivatives with respect to ξ (= L2) and η (= L3), into dxi[0..5] and deta[0..5]. */
function shapeDerivatives(L1: number, L2: number, L3: number, dxi: Float64Array, deta: Float64Array, offset = 0): void {
  dxi[offset] = -(4 * L1 - 1);
  deta[offset] = -(4 * L1 - 1);
  dxi[offset + 1] = 4 * L2 - 1;
  deta[offset + 1] = 0;
  dxi[offset + 2] = 0;
  deta[offset + 2] = 4 * L3 - 1;
  dxi[offset + 3] = 4 * (L1 - L2);
  deta[offset + 3] = -4 * L2;
  dxi[offset + 4] = 4 * L3;
  deta[offset + 4] = 4 * L2;
  dxi[offset + 5] = -4 * L3;
  deta[offset + 5] = 4 * (L1 - L3);
}

/** Tabulated values at the quadrature points (6 per point) and at the nodes. */
export const QN = new Float64Array(6 * NQ);
export const QDXI = new Float64Array(6 * NQ);
export const QDETA = new Float64Array(6 * NQ);
export const NDXI = new Float64Array(36);
export const NDETA = new Float64Array(36);
QUAD_L.forEach(([l1, l2, l3], q) => {
  shapeValues(l1, l2, l3, QN, 6 * q);
  shapeDerivatives(l1, l2, l3, QDXI, QDETA, 6 * q);
});
NODE_L.forEach(([l1, l2, l3], k) => shapeDerivatives(l1, l2, l3, NDXI, NDETA, 6 * k));

/**
 * Gradients of the six shape functions at one tabulated point, for the element with node
 * coordinates x[0..5], y[0..5]: writes dNdx, dNdy and returns det J (≤ 0 for an inverted element).
 */
export function shapeGradients(
  x: Float64Array,
  y: Float64Array,
  dxi: Float64Array,
  deta: Float64Array,
  at: number,
  dNdx: Float64Array,
  dNdy: Float64Array,
): number {
  let j11 = 0, j12 = 0, j21 = 0, j22 = 0;
  for (let a = 0; a < 6; a++) {
    const u = dxi[at + a], v = deta[at + a];
    j11 += u * x[a];
    j12 += u * y[a];
    j21 += v * x[a];
    j22 += v * y[a];
  }
  const det = j11 * j22 - j12 * j21;
  const inv = 1 / det;
  for (let a = 0; a < 6; a++) {
    const u = dxi[at + a], v = deta[at + a];
    dNdx[a] = (j22 * u - j12 * v) * inv;
    dNdy[a] = (-j21 * u + j11 * v) * inv;
  }
  return det;
}

/**
 * One element's geometry at the quadrature points: point coordinates, integration weights
 * (quadrature weight × det J / 2) and shape-function gradients. A straight-sided element (every
 * mid-side node exactly at the middle of its side) has a constant Jacobian, taken once from its
 * vertices; a curved one is evaluated point by point.
 */
export class ElementGeometry {
  readonly x = new Float64Array(6);
  readonly y = new Float64Array(6);
  /** Weight of each quadrature point. */
  readonly w = new Float64Array(NQ);
  readonly px = new Float64Array(NQ);
  readonly py = new Float64Array(NQ);
  /** Gradients: gx[6q + a] = ∂N_a/∂x at point q. */
  readonly gx = new Float64Array(6 * NQ);
  readonly gy = new Float64Array(6 * NQ);
  /** True when the element is straight-sided (constant Jacobian). */
  straight = true;
  /** Constant-Jacobian entries of a straight element (valid when `straight`). */
  j11 = 0;
  j12 = 0;
  j21 = 0;
  j22 = 0;
  det = 0;
  private readonly tx = new Float64Array(6);
  private readonly ty = new Float64Array(6);

  /** Load element e of a mesh, with coordinates taken relative to (ox, oy). */
  load(mx: Float64Array, my: Float64Array, elem: Uint32Array, e: number, ox: number, oy: number): void {
    const { x, y } = this;
    for (let a = 0; a < 6; a++) {
      const v = elem[6 * e + a];
      x[a] = mx[v] - ox;
      y[a] = my[v] - oy;
    }
    this.straight =
      x[3] === (x[0] + x[1]) / 2 && y[3] === (y[0] + y[1]) / 2 && x[4] === (x[1] + x[2]) / 2 && y[4] === (y[1] + y[2]) / 2 && x[5] === (x[2] + x[0]) / 2 && y[5] === (y[2] + y[0]) / 2;
    if (this.straight) this.loadStraight();
    else this.loadCurved();
  }

  private loadStraight(): void {
    const { x, y, w, px, py, gx, gy } = this;
    const j11 = x[1] - x[0], j12 = y[1] - y[0], j21 = x[2] - x[0], j22 = y[2] - y[0];
    const det = j11 * j22 - j12 * j21;
    this.j11 = j11;
    this.j12 = j12;
    this.j21 = j21;
    this.j22 = j22;
    this.det = det;
    const inv = 1 / det;
    for (let q = 0; q < NQ; q++) {
      const [l1, l2, l3] = QUAD_L[q];
      w[q] = (QUAD_W[q] * det) / 2;
      px[q] = l1 * x[0] + l2 * x[1] + l3 * x[2];
      py[q] = l1 * y[0] + l2 * y[1] + l3 * y[2];
      for (let a = 0; a < 6; a++) {
        const u = QDXI[6 * q + a], v = QDETA[6 * q + a];
        gx[6 * q + a] = (j22 * u - j12 * v) * inv;
        gy[6 * q + a] = (-j21 * u + j11 * v) * inv;
      }
    }
  }

  private loadCurved(): void {
    const { x, y, w, px, py, gx, gy, tx, ty } = this;
    for (let q = 0; q < NQ; q++) {
      const det = shapeGradients(x, y, QDXI, QDETA, 6 * q, tx, ty);
      w[q] = (QUAD_W[q] * det) / 2;
      let sx = 0, sy = 0;
      for (let a = 0; a < 6; a++) {
        sx += QN[6 * q + a] * x[a];
        sy += QN[6 * q + a] * y[a];
        gx[6 * q + a] = tx[a];
        gy[6 * q + a] = ty[a];
      }
      px[q] = sx;
      py[q] = sy;
    }
  }
}

/**
 * Reference stiffness parts of the quadratic triangle: for a straight element with Jacobian J,
 * ∫ ∇N_a·∇N_b dA = det J · (Q11·Suu + Q12·Suv + Q22·Svv), with Q = J⁻ᵀJ⁻¹ and
 * Suu = ∫ ∂ξN_a ∂ξN_b, Suv = ∫ (∂ξN_a ∂ηN_b + ∂ηN_a ∂ξN_b), Svv = ∫ ∂ηN_a ∂ηN_b over the
 * reference triangle (integrands of degree 2: exact with the quadrature rule).
 */
export const SUU = new Float64Array(36);
export const SUV = new Float64Array(36);
export const SVV = new Float64Array(36);
for (let q = 0; q < NQ; q++)
  for (let a = 0; a < 6; a++)
    for (let b = 0; b < 6; b++) {
      const wq = QUAD_W[q] / 2;
      const ua = QDXI[6 * q + a], va = QDETA[6 * q + a], ub = QDXI[6 * q + b], vb = QDETA[6 * q + b];
      SUU[6 * a + b] += wq * ua * ub;
      SUV[6 * a + b] += wq * (ua * vb + va * ub);
      SVV[6 * a + b] += wq * va * vb;
    }
