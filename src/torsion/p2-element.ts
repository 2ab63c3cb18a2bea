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
export function shapeDerivatives(L1: number, L2: number, L3: number, dxi: Float64Array, deta: Float64Array, offset = 0): void {
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
