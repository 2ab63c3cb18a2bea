/**
 * Quadratic (6-node) triangle meshes: built from the refined straight-sided mesh, and split
 * uniformly into a mesh of half the element size for the convergence estimate.
 *
 * A mid-side node goes to the middle of its side, except on a boundary chord of an arc, where it
 * goes to the arc's point of mid parameter, so the element follows the arc (isoparametric). Each
 * element side remembers which exact edge it follows and over which parameter interval, so the
 * split mesh puts its new boundary nodes on the exact arc as well. A curved side that would turn
 * its element inside out (det J ≤ 0 at a quadrature point) is left straight instead, and counted.
 *
 * The uniform split cuts every element into four through its mid-side nodes, so the fine mesh
 * has exactly half the element size, which is what the convergence estimate needs. It also
 * records where each fine node sits in its coarse element, so the coarse solution can be carried
 * over as the starting guess of the fine solve.
 */
import { edgePoint, type EdgeShape } from './edge-geometry';
import { NODE_L, NQ, QDETA, QDXI, shapeGradients, shapeValues } from './p2-element';
import type { LinearMesh } from './refine';
import type { Csr } from './sparse-ops';

export interface QuadMesh {
  x: Float64Array;
  y: Float64Array;
  /** Six node ids per element: vertices 1–3 (counter-clockwise), then mid-sides 1–2, 2–3, 3–1. */
  elem: Uint32Array;
  piece: Int32Array;
  /** For each element side (3 per element, side s from vertex s to vertex s+1): exact edge followed, or −1. */
  sideEdge: Int32Array;
  /** Parameter interval of that exact edge, oriented along the side. */
  sideT0: Float64Array;
  sideT1: Float64Array;
  shapes: readonly EdgeShape[];
  /** Curved sides left straight because curving them would invert an element. */
  straightened: number;
}

export function elementCount(m: QuadMesh): number {
  return m.elem.length / 6;
}

/** The quadratic mesh on the refined straight-sided mesh. */
export function quadraticMesh(lin: LinearMesh): QuadMesh {
  const nv = lin.x.length;
  const nt = lin.tri.length / 3;
  const chordOf = new Map<number, number>();
  for (let i = 0; i < lin.chordA.length; i++) {
    const a = lin.chordA[i], b = lin.chordB[i];
    if (a >= 0 && b >= 0) chordOf.set(a < b ? a * nv + b : b * nv + a, i);
  }
  const sideEdge = new Int32Array(3 * nt).fill(-1);
  const sideT0 = new Float64Array(3 * nt), sideT1 = new Float64Array(3 * nt);
  for (let t = 0; t < nt; t++)
    for (let s = 0; s < 3; s++) {
      const p = lin.tri[3 * t + s], q = lin.tri[3 * t + ((s + 1) % 3)];
      const c = chordOf.get(p < q ? p * nv + q : q * nv + p);
      if (c === undefined) continue;
      sideEdge[3 * t + s] = lin.chordEdge[c];
      const forward = lin.chordA[c] === p;
      sideT0[3 * t + s] = forward ? lin.chordT0[c] : lin.chordT1[c];
      sideT1[3 * t + s] = forward ? lin.chordT1[c] : lin.chordT0[c];
    }
  return withMidNodes(lin.x, lin.y, lin.tri, lin.piece, sideEdge, sideT0, sideT1, lin.shapes);
}

/**
 * Add the mid-side nodes to a straight-sided triangulation whose sides know their exact edges.
 * Vertices keep their ids; mid-side nodes follow.
 */
function withMidNodes(
  vx: Float64Array,
  vy: Float64Array,
  tri: Uint32Array,
  piece: Int32Array,
  sideEdge: Int32Array,
  sideT0: Float64Array,
  sideT1: Float64Array,
  shapes: readonly EdgeShape[],
): QuadMesh {
  const nv = vx.length;
  const nt = tri.length / 3;
  const mids = new Map<number, number>();
  const elem = new Uint32Array(6 * nt);
  const mx: number[] = [], my: number[] = [];
  for (let t = 0; t < nt; t++) {
    for (let s = 0; s < 3; s++) {
      const p = tri[3 * t + s], q = tri[3 * t + ((s + 1) % 3)];
      elem[6 * t + s] = p;
      const key = p < q ? p * nv + q : q * nv + p;
      let m = mids.get(key);
      if (m === undefined) {
        m = nv + mx.length;
        mids.set(key, m);
        const k = sideEdge[3 * t + s];
        if (k >= 0 && shapes[k].sweep !== 0) {
          const [px, py] = edgePoint(shapes[k], (sideT0[3 * t + s] + sideT1[3 * t + s]) / 2);
          mx.push(px);
          my.push(py);
        } else {
          mx.push((vx[p] + vx[q]) / 2);
          my.push((vy[p] + vy[q]) / 2);
        }
      }
      elem[6 * t + 3 + s] = m;
    }
  }
  const n = nv + mx.length;
  const x = new Float64Array(n), y = new Float64Array(n);
  x.set(vx);
  y.set(vy);
  x.set(mx, nv);
  y.set(my, nv);
  const mesh: QuadMesh = { x, y, elem, piece, sideEdge, sideT0, sideT1, shapes, straightened: 0 };
  mesh.straightened = straightenInverted(mesh);
  return mesh;
}

/** Put back on the chord any curved mid-side node that inverts an element; returns how many. */
function straightenInverted(m: QuadMesh): number {
  const ex = new Float64Array(6), ey = new Float64Array(6), gx = new Float64Array(6), gy = new Float64Array(6);
  let count = 0;
  const nt = m.elem.length / 6;
  for (let t = 0; t < nt; t++) {
    let curved = false;
    for (let s = 0; s < 3; s++) {
      const k = m.sideEdge[3 * t + s];
      if (k >= 0 && m.shapes[k].sweep !== 0) curved = true;
    }
    if (!curved) continue;
    for (let a = 0; a < 6; a++) {
      ex[a] = m.x[m.elem[6 * t + a]];
      ey[a] = m.y[m.elem[6 * t + a]];
    }
    let ok = true;
    for (let q = 0; q < NQ && ok; q++) ok = shapeGradients(ex, ey, QDXI, QDETA, 6 * q, gx, gy) > 0;
    if (ok) continue;
    for (let s = 0; s < 3; s++) {
      const p = m.elem[6 * t + s], q = m.elem[6 * t + ((s + 1) % 3)], mid = m.elem[6 * t + 3 + s];
      m.x[mid] = (m.x[p] + m.x[q]) / 2;
      m.y[mid] = (m.y[p] + m.y[q]) / 2;
      m.sideEdge[3 * t + s] = -1;
    }
    count++;
  }
  return count;
}

/** Where each fine node lies in the coarse mesh: its coarse element and area coordinates. */
export interface Prolongation {
  /** Coarse element of each fine node (−1: the fine node is coarse node `same[i]`). */
  parent: Int32Array;
  same: Int32Array;
  /** Area coordinates (L1, L2, L3) in the parent element. */
  L: Float64Array;
}

// Each fine element of a split, as indices into the parent's six nodes, and for each of its
// sides: the parent side it halves (0–2, first or second half) or −1 for an inner side.
const CHILDREN: readonly (readonly [number, number, number])[] = [
  [0, 3, 5],
  [3, 1, 4],
  [5, 4, 2],
  [3, 4, 5],
];
const CHILD_SIDES: readonly (readonly (readonly [number, 0 | 1] | null)[])[] = [
  [[0, 0], null, [2, 1]],
  [[0, 1], [1, 0], null],
  [null, [1, 1], [2, 0]],
  [null, null, null],
];

/** Split every element into four: the mesh of half the element size, and where its nodes lie. */
export function splitUniformly(c: QuadMesh): { mesh: QuadMesh; prolongation: Prolongation } {
  const nc = c.elem.length / 6;
  const tri = new Uint32Array(12 * nc);
  const piece = new Int32Array(4 * nc);
  const sideEdge = new Int32Array(12 * nc).fill(-1);
  const sideT0 = new Float64Array(12 * nc), sideT1 = new Float64Array(12 * nc);
  for (let e = 0; e < nc; e++)
    for (let k = 0; k < 4; k++) {
      const f = 4 * e + k;
      piece[f] = c.piece[e];
      for (let s = 0; s < 3; s++) {
        tri[3 * f + s] = c.elem[6 * e + CHILDREN[k][s]];
        const half = CHILD_SIDES[k][s];
        if (!half) continue;
        const ps = 3 * e + half[0];
        if (c.sideEdge[ps] < 0) continue;
        const t0 = c.sideT0[ps], t1 = c.sideT1[ps], tm = (t0 + t1) / 2;
        sideEdge[3 * f + s] = c.sideEdge[ps];
        sideT0[3 * f + s] = half[1] === 0 ? t0 : tm;
        sideT1[3 * f + s] = half[1] === 0 ? tm : t1;
      }
    }
  const mesh = withMidNodes(c.x, c.y, tri, piece, sideEdge, sideT0, sideT1, c.shapes);
  // Coarse nodes keep their ids as fine vertices; each fine mid-side node lies halfway between
  // two of its parent's nodes, in area coordinates.
  const n = mesh.x.length;
  const parent = new Int32Array(n).fill(-1);
  const same = new Int32Array(n).fill(-1);
  const L = new Float64Array(3 * n);
  for (let i = 0; i < c.x.length; i++) same[i] = i;
  for (let e = 0; e < nc; e++)
    for (let k = 0; k < 4; k++) {
      const f = 4 * e + k;
      for (let s = 0; s < 3; s++) {
        const mid = mesh.elem[6 * f + 3 + s];
        if (parent[mid] >= 0) continue;
        const p = NODE_L[CHILDREN[k][s]], q = NODE_L[CHILDREN[k][(s + 1) % 3]];
        parent[mid] = e;
        L[3 * mid] = (p[0] + q[0]) / 2;
        L[3 * mid + 1] = (p[1] + q[1]) / 2;
        L[3 * mid + 2] = (p[2] + q[2]) / 2;
      }
    }
  return { mesh, prolongation: { parent, same, L } };
}

/** The coarse solution u carried to the fine nodes (exact: the coarse field is quadratic per element). */
export function prolong(p: Prolongation, coarse: QuadMesh, u: Float64Array): Float64Array {
  const n = p.parent.length;
  const out = new Float64Array(n);
  const N = new Float64Array(6);
  for (let i = 0; i < n; i++) {
    if (p.same[i] >= 0) {
      out[i] = u[p.same[i]];
      continue;
    }
    const e = p.parent[i];
    shapeValues(p.L[3 * i], p.L[3 * i + 1], p.L[3 * i + 2], N);
    let v = 0;
    for (let a = 0; a < 6; a++) v += N[a] * u[coarse.elem[6 * e + a]];
    out[i] = v;
  }
  return out;
}

/** The mesh with its nodes renumbered: node `order[k]` becomes node k. */
export function renumberNodes(m: QuadMesh, order: Int32Array): { mesh: QuadMesh; newId: Int32Array } {
  const n = order.length;
  const newId = new Int32Array(n);
  for (let k = 0; k < n; k++) newId[order[k]] = k;
  const x = new Float64Array(n), y = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    x[k] = m.x[order[k]];
    y[k] = m.y[order[k]];
  }
  const elem = Uint32Array.from(m.elem, (v) => newId[v]);
  return { mesh: { ...m, x, y, elem }, newId };
}

/** A prolongation re-indexed after the fine mesh was renumbered (`fineOrder[k]` = old id of new node k). */
export function renumberProlongation(p: Prolongation, fineOrder: Int32Array): Prolongation {
  const n = fineOrder.length;
  const parent = new Int32Array(n), same = new Int32Array(n), L = new Float64Array(3 * n);
  for (let k = 0; k < n; k++) {
    const i = fineOrder[k];
    parent[k] = p.parent[i];
    same[k] = p.same[i];
    L[3 * k] = p.L[3 * i];
    L[3 * k + 1] = p.L[3 * i + 1];
    L[3 * k + 2] = p.L[3 * i + 2];
  }
  return { parent, same, L };
}

/**
 * The embedding of linear elements (on the vertices) into the quadratic mesh, as a prolongation
 * matrix (nodes × vertices): a vertex keeps its value, a mid-side node takes the mean of the two
 * ends of its side. Also returns each node's vertex number (−1 for a mid-side node).
 */
export function linearEmbedding(m: QuadMesh): { P: Csr; vertexId: Int32Array; vertexCount: number } {
  const n = m.x.length;
  const ne = m.elem.length / 6;
  const vid = new Int32Array(n).fill(-1);
  let nv = 0;
  for (let e = 0; e < ne; e++)
    for (let a = 0; a < 3; a++) {
      const v = m.elem[6 * e + a];
      if (vid[v] < 0) vid[v] = nv++;
    }
  const endA = new Int32Array(n).fill(-1), endB = new Int32Array(n).fill(-1);
  for (let e = 0; e < ne; e++)
    for (let s = 0; s < 3; s++) {
      const mid = m.elem[6 * e + 3 + s];
      endA[mid] = vid[m.elem[6 * e + s]];
      endB[mid] = vid[m.elem[6 * e + ((s + 1) % 3)]];
    }
  const rowPtr = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) rowPtr[i + 1] = rowPtr[i] + (vid[i] >= 0 ? 1 : 2);
  const col = new Int32Array(rowPtr[n]), val = new Float64Array(rowPtr[n]);
  for (let i = 0; i < n; i++) {
    const p = rowPtr[i];
    if (vid[i] >= 0) {
      col[p] = vid[i];
      val[p] = 1;
    } else {
      col[p] = Math.min(endA[i], endB[i]);
      col[p + 1] = Math.max(endA[i], endB[i]);
      val[p] = val[p + 1] = 0.5;
    }
  }
  return { P: { n, cols: nv, rowPtr, col, val }, vertexId: vid, vertexCount: nv };
}
