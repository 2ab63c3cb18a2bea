/**
 * The shear stress under a unit torque, for drawing: |τ| at every node of the quadratic mesh,
 * with the mesh split into straight triangles over all six nodes of each element.
 *
 * With T = 1 the twist rate is θ = 1/(G_ref J), so τ = (G/G_ref)(∂ω/∂x − y, ∂ω/∂y + x)/J
 * (warping.ts). The gradient is taken in each element at its own nodes and averaged over the
 * elements that share a node (a smoothed field, good for shading). The maximum reported is that
 * of the drawn field, so the colour scale and the number agree. At a sharp re-entrant corner the
 * exact stress is unbounded and the peak then depends on the mesh; the caller says so.
 */
import { NDETA, NDXI, shapeGradients } from './p2-element';
import { elementCount, type QuadMesh } from './quad-mesh';

export interface StressField {
  /** |τ| per node under a unit torque (units: 1/length³ of the section's unit). */
  magnitude: Float64Array;
  /** Straight triangles for drawing, four per quadratic element, as node ids. */
  triangles: Uint32Array;
  /** Largest |τ| and the node where it occurs. */
  max: number;
  maxNode: number;
}

/** The four straight triangles of a 6-node element, counter-clockwise. */
const SUB: readonly number[] = [0, 3, 5, 3, 1, 4, 5, 4, 2, 3, 4, 5];

export function unitTorqueStress(m: QuadMesh, g: Float64Array, omega: Float64Array, J: number, cx: number, cy: number): StressField {
  const n = m.x.length;
  const ne = elementCount(m);
  const sum = new Float64Array(n), count = new Float64Array(n);
  const ex = new Float64Array(6), ey = new Float64Array(6), gx = new Float64Array(6), gy = new Float64Array(6);
  for (let e = 0; e < ne; e++) {
    for (let a = 0; a < 6; a++) {
      const v = m.elem[6 * e + a];
      ex[a] = m.x[v] - cx;
      ey[a] = m.y[v] - cy;
    }
    const scale = g[m.piece[e]] / J;
    for (let k = 0; k < 6; k++) {
      shapeGradients(ex, ey, NDXI, NDETA, 6 * k, gx, gy);
      let wx = 0, wy = 0;
      for (let a = 0; a < 6; a++) {
        const w = omega[m.elem[6 * e + a]];
        wx += gx[a] * w;
        wy += gy[a] * w;
      }
      const v = m.elem[6 * e + k];
      sum[v] += scale * Math.sqrt((wx - ey[k]) ** 2 + (wy + ex[k]) ** 2);
      count[v] += 1;
    }
  }
  const magnitude = new Float64Array(n);
  let max = 0, maxNode = 0;
  for (let i = 0; i < n; i++) {
    magnitude[i] = count[i] > 0 ? sum[i] / count[i] : 0;
    if (magnitude[i] > max) {
      max = magnitude[i];
      maxNode = i;
    }
  }
  const triangles = new Uint32Array(12 * ne);
  for (let e = 0; e < ne; e++) for (let k = 0; k < 12; k++) triangles[12 * e + k] = m.elem[6 * e + SUB[k]];
  return { magnitude, triangles, max, maxNode };
}
