/**
 * Multigrid preconditioner for the conjugate-gradient solve: one symmetric V-cycle per
 * application.
 *
 * Levels: the quadratic-element system; then the linear-element system on the vertices (the
 * Galerkin product Pᵀ A P with P the exact embedding of linear into quadratic elements: a vertex
 * keeps its value, a mid-side node takes the mean of its side's ends); then coarser levels by
 * smoothed aggregation (Vaněk, Mandel & Brezina, Computing 56, 1996): nodes are grouped with
 * their strongly coupled neighbours, the piecewise-constant prolongator of the groups is smoothed
 * by one damped Jacobi step, and the coarse matrix is again Pᵀ A P. The coarsest level (a hundred
 * or so unknowns) is solved exactly by an envelope Cholesky factor in reverse Cuthill–McKee order
 * (George & Liu, ch. 4).
 *
 * Smoothing is Gauss–Seidel, forward before the coarse correction and backward after it, which
 * keeps the V-cycle symmetric and positive definite, as conjugate gradients require. Local
 * smoothers alone (Jacobi, incomplete Cholesky) need thousands of iterations on long thin-walled
 * sections; the coarse levels carry the smooth, long-range part of the solution. Written here
 * because no allowed library does sparse linear algebra.
 */
import { reverseCuthillMcKee } from './ordering';
import type { CsrMatrix } from './sparse';
import { galerkin, transpose, type Csr } from './sparse-ops';

/** Strength of coupling: |a_ij| ≥ θ √(a_ii a_jj). */
const STRENGTH = 0.08;
/** Solve directly once a level has at most this many unknowns. */
const COARSEST = 150;
/** Largest level the direct solve accepts if coarsening stalls; beyond, smoothing only. */
const COARSEST_LIMIT = 4000;
const MAX_LEVELS = 20;

interface Level {
  A: Csr;
  /** 1/a_ii. */
  inv: Float64Array;
  /** Slot of the diagonal in each row (columns are sorted: left of it is the lower triangle). */
  diagAt: Int32Array;
  /** Prolongation to this level from the next coarser one (null on the coarsest). */
  P: Csr | null;
  R: Csr | null;
  x: Float64Array;
  b: Float64Array;
  r: Float64Array;
}

export class Multigrid {
  private readonly levels: Level[] = [];
  private readonly coarse: EnvelopeCholesky | null;
  /** Unknowns per level, finest first. */
  readonly sizes: number[];

  /**
   * @param A the system matrix
   * @param first optional first coarse level: its prolongation P to A's level (e.g. linear →
   *   quadratic elements) and its matrix (Pᵀ A P, which the caller may have assembled element by
   *   element); later levels come from aggregation.
   */
  constructor(A: CsrMatrix, first: { P: Csr; coarse: CsrMatrix } | null) {
    let current: Csr = { ...A, cols: A.n };
    if (first && current.n > COARSEST) {
      this.levels.push(level(current, first.P));
      current = { ...first.coarse, cols: first.coarse.n };
    }
    for (let l = this.levels.length; l < MAX_LEVELS; l++) {
      if (current.n <= COARSEST) break;
      const P = smoothedAggregation(current);
      if (!P || P.cols >= 0.85 * current.n) break;
      this.levels.push(level(current, P));
      current = galerkin(current, P);
    }
    this.levels.push(level(current, null));
    this.coarse = current.n <= COARSEST_LIMIT ? new EnvelopeCholesky(current) : null;
    this.sizes = this.levels.map((l) => l.A.n);
  }

  /** z = M⁻¹ r, one V-cycle from a zero start. */
  apply(r: Float64Array, z: Float64Array): void {
    const top = this.levels[0];
    top.b.set(r);
    this.cycle(0);
    z.set(top.x);
  }

  private cycle(k: number): void {
    const L = this.levels[k];
    L.x.fill(0);
    if (k === this.levels.length - 1) {
      if (this.coarse) this.coarse.solve(L.b, L.x);
      else for (let s = 0; s < 8; s++) gaussSeidel(L, s % 2 === 0);
      return;
    }
    forwardFromZeroWithResidual(L);
    const C = this.levels[k + 1];
    multiplyInto(L.R!, L.r, C.b);
    this.cycle(k + 1);
    addProduct(L.P!, C.x, L.x);
    gaussSeidel(L, false);
  }
}

function level(A: Csr, P: Csr | null): Level {
  const n = A.n;
  // 1/a_ii per row (0 where the row has no positive diagonal: Gauss–Seidel leaves it alone).
  const inv = new Float64Array(n);
  const diagAt = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    diagAt[i] = A.rowPtr[i];
    for (let k = A.rowPtr[i]; k < A.rowPtr[i + 1]; k++)
      if (A.col[k] === i) {
        diagAt[i] = k;
        if (A.val[k] > 0) inv[i] = 1 / A.val[k];
      }
  }
  return { A, inv, diagAt, P, R: P ? transpose(P) : null, x: new Float64Array(n), b: new Float64Array(n), r: new Float64Array(n) };
}

/**
 * One Gauss–Seidel sweep on L.A x = L.b, forward or backward, written as the correction
 * x_i += (b_i − Σ_k a_ik x_k)/a_ii so that the row loop needs no test for the diagonal.
 */
function gaussSeidel(L: Level, forward: boolean): void {
  const { rowPtr, col, val } = L.A;
  const { x, b, inv } = L;
  const n = L.A.n;
  if (forward)
    for (let i = 0; i < n; i++) {
      let s = b[i];
      for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) s -= val[k] * x[col[k]];
      x[i] += s * inv[i];
    }
  else
    for (let i = n - 1; i >= 0; i--) {
      let s = b[i];
      for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) s -= val[k] * x[col[k]];
      x[i] += s * inv[i];
    }
}

/**
 * A forward Gauss–Seidel sweep from x = 0, and the residual it leaves, in one pass over the
 * matrix: while row i is updated every x_j with j > i is still 0, so the sweep needs only the
 * lower triangle, and afterwards rows' equations hold up to the terms of later columns:
 * r_i = b_i − Σ_j a_ij x_j = −Σ_{j>i} a_ij x_j, the upper triangle.
 */
function forwardFromZeroWithResidual(L: Level): void {
  const { rowPtr, col, val } = L.A;
  const { x, b, r, inv, diagAt } = L;
  const n = L.A.n;
  for (let i = 0; i < n; i++) {
    let s = b[i];
    const d = diagAt[i];
    for (let k = rowPtr[i]; k < d; k++) s -= val[k] * x[col[k]];
    x[i] = s * inv[i];
    r[i] = inv[i] === 0 ? s : 0; // (a row without a positive diagonal is left unsolved)
  }
  for (let i = 0; i < n; i++) {
    let s = r[i];
    for (let k = diagAt[i] + 1; k < rowPtr[i + 1]; k++) s -= val[k] * x[col[k]];
    r[i] = s;
  }
}

function multiplyInto(M: Csr, x: Float64Array, y: Float64Array): void {
  for (let i = 0; i < M.n; i++) {
    let s = 0;
    for (let k = M.rowPtr[i]; k < M.rowPtr[i + 1]; k++) s += M.val[k] * x[M.col[k]];
    y[i] = s;
  }
}

function addProduct(M: Csr, x: Float64Array, y: Float64Array): void {
  for (let i = 0; i < M.n; i++) {
    let s = 0;
    for (let k = M.rowPtr[i]; k < M.rowPtr[i + 1]; k++) s += M.val[k] * x[M.col[k]];
    y[i] += s;
  }
}

/**
 * The smoothed-aggregation prolongator of A: aggregates in three passes (a node whose strong
 * neighbours are all free starts an aggregate with them; leftover nodes join the aggregate of
 * their strongest aggregated neighbour; what remains forms aggregates of its own), then
 * P = (I − ω D⁻¹A) T with T the aggregates' indicator and ω = (4/3)/ρ(D⁻¹A).
 */
function smoothedAggregation(A: Csr): Csr | null {
  const { n, rowPtr, col, val } = A;
  const d = new Float64Array(n);
  for (let i = 0; i < n; i++) for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) if (col[k] === i) d[i] = val[k];
  const strong = new Uint8Array(col.length);
  for (let i = 0; i < n; i++)
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) {
      const j = col[k];
      if (j !== i && Math.abs(val[k]) >= STRENGTH * Math.sqrt(Math.abs(d[i] * d[j]))) strong[k] = 1;
    }
  const agg = new Int32Array(n).fill(-1);
  let na = 0;
  // Pass 1: a free node with free strong neighbours starts an aggregate.
  for (let i = 0; i < n; i++) {
    if (agg[i] >= 0) continue;
    let free = true, any = false;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++)
      if (strong[k]) {
        any = true;
        if (agg[col[k]] >= 0) {
          free = false;
          break;
        }
      }
    if (!free || !any) continue;
    agg[i] = na;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) if (strong[k]) agg[col[k]] = na;
    na++;
  }
  // Pass 2: join the aggregate of the strongest aggregated neighbour.
  const pass1 = agg.slice();
  for (let i = 0; i < n; i++) {
    if (agg[i] >= 0) continue;
    let best = -1, bestV = 0;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++)
      if (strong[k] && pass1[col[k]] >= 0 && Math.abs(val[k]) > bestV) {
        bestV = Math.abs(val[k]);
        best = pass1[col[k]];
      }
    if (best >= 0) agg[i] = best;
  }
  // Pass 3: the rest (and isolated nodes) form their own aggregates.
  for (let i = 0; i < n; i++) {
    if (agg[i] >= 0) continue;
    agg[i] = na;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) if (strong[k] && agg[col[k]] < 0) agg[col[k]] = na;
    na++;
  }
  if (na >= n) return null;
  const omega = 4 / 3 / spectralRadius(A, d);
  // P row i: δ(agg(i), c) − ω/d_i · Σ_{j in row i, agg(j) = c} a_ij.
  const mark = new Int32Array(na).fill(-1);
  const ptr = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    let len = 0;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) {
      const c = agg[col[k]];
      if (mark[c] !== i) {
        mark[c] = i;
        len++;
      }
    }
    ptr[i + 1] = ptr[i] + len;
  }
  const pc = new Int32Array(ptr[n]), pv = new Float64Array(ptr[n]);
  const acc = new Float64Array(na);
  mark.fill(-1);
  for (let i = 0; i < n; i++) {
    let p = ptr[i];
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) {
      const c = agg[col[k]];
      if (mark[c] !== i) {
        mark[c] = i;
        acc[c] = 0;
        pc[p++] = c;
      }
      acc[c] -= (omega / d[i]) * val[k];
    }
    acc[agg[i]] += 1;
    const row = pc.subarray(ptr[i], ptr[i + 1]);
    row.sort();
    for (let k = ptr[i]; k < ptr[i + 1]; k++) pv[k] = acc[pc[k]];
  }
  return { n, cols: na, rowPtr: ptr, col: pc, val: pv };
}

/** Largest eigenvalue of D⁻¹A by a few power iterations (a little over, to be safe). */
function spectralRadius(A: Csr, d: Float64Array): number {
  const n = A.n;
  let v = new Float64Array(n), w = new Float64Array(n);
  for (let i = 0; i < n; i++) v[i] = 1 + ((i * 7919) % 17) / 17;
  let rho = 1;
  for (let it = 0; it < 12; it++) {
    let norm = 0;
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let k = A.rowPtr[i]; k < A.rowPtr[i + 1]; k++) s += A.val[k] * v[A.col[k]];
      w[i] = s / d[i];
      norm += w[i] * w[i];
    }
    norm = Math.sqrt(norm);
    let vn = 0;
    for (let i = 0; i < n; i++) vn += v[i] * v[i];
    rho = norm / Math.sqrt(vn);
    for (let i = 0; i < n; i++) w[i] /= norm;
    [v, w] = [w, v];
  }
  return 1.05 * rho;
}

/**
 * Exact solve of a small symmetric positive definite system by a Cholesky factor stored by rows
 * within the envelope (from each row's first non-zero to the diagonal), after reverse
 * Cuthill–McKee ordering keeps that envelope narrow.
 */
class EnvelopeCholesky {
  private readonly order: Int32Array;
  private readonly first: Int32Array;
  private readonly start: Int32Array;
  private readonly L: Float64Array;
  private readonly y: Float64Array;

  constructor(A: Csr) {
    const n = A.n;
    const { order } = reverseCuthillMcKee(A);
    const pos = new Int32Array(n);
    for (let k = 0; k < n; k++) pos[order[k]] = k;
    const first = new Int32Array(n);
    for (let k = 0; k < n; k++) first[k] = k;
    for (let i = 0; i < n; i++)
      for (let q = A.rowPtr[i]; q < A.rowPtr[i + 1]; q++) {
        const a = pos[i], b = pos[A.col[q]];
        if (b < a && b < first[a]) first[a] = b;
      }
    const start = new Int32Array(n + 1);
    for (let k = 0; k < n; k++) start[k + 1] = start[k] + (k - first[k] + 1);
    const L = new Float64Array(start[n]);
    for (let i = 0; i < n; i++)
      for (let q = A.rowPtr[i]; q < A.rowPtr[i + 1]; q++) {
        const a = pos[i], b = pos[A.col[q]];
        if (b <= a) L[start[a] + (b - first[a])] += A.val[q];
      }
    // Row-oriented factor within the envelope; entry (i, j) sits at start[i] + j − first[i].
    for (let i = 0; i < n; i++) {
      for (let j = first[i]; j <= i; j++) {
        let s = L[start[i] + j - first[i]];
        const k0 = Math.max(first[i], first[j]);
        for (let k = k0; k < j; k++) s -= L[start[i] + k - first[i]] * L[start[j] + k - first[j]];
        if (j < i) L[start[i] + j - first[i]] = s / L[start[j] + j - first[j]];
        else L[start[i] + i - first[i]] = Math.sqrt(s > 1e-300 ? s : 1e-300);
      }
    }
    this.order = order;
    this.first = first;
    this.start = start;
    this.L = L;
    this.y = new Float64Array(n);
  }

  solve(b: Float64Array, x: Float64Array): void {
    const { order, first, start, L, y } = this;
    const n = order.length;
    for (let i = 0; i < n; i++) {
      let s = b[order[i]];
      for (let k = first[i]; k < i; k++) s -= L[start[i] + k - first[i]] * y[k];
      y[i] = s / L[start[i] + i - first[i]];
    }
    for (let i = n - 1; i >= 0; i--) {
      const yi = y[i] / L[start[i] + i - first[i]];
      y[i] = yi;
      for (let k = first[i]; k < i; k++) y[k] -= L[start[i] + k - first[i]] * yi;
    }
    for (let i = 0; i < n; i++) x[order[i]] = y[i];
  }
}
