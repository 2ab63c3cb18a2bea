/**
 * Sparse matrix products and transposes in compressed sparse rows, for building the coarse
 * levels of the multigrid preconditioner (Galerkin products Pᵀ A P).
 *
 * The product follows Gustavson's row-by-row algorithm with a dense marker of the output row
 * (Gustavson, ACM TOMS 4, 1978): each output row is the sum of the rows of B picked by the row of
 * A. Columns are left sorted.
 */
import type { CsrMatrix } from './sparse';

/** A rectangular CSR matrix (rows × cols). */
export interface Csr extends CsrMatrix {
  cols: number;
}

export function transpose(A: Csr): Csr {
  const { n, rowPtr, col, val, cols } = A;
  const ptr = new Int32Array(cols + 1);
  for (let k = 0; k < col.length; k++) ptr[col[k] + 1]++;
  for (let j = 0; j < cols; j++) ptr[j + 1] += ptr[j];
  const fill = ptr.slice(0, cols);
  const tc = new Int32Array(col.length), tv = new Float64Array(col.length);
  for (let i = 0; i < n; i++)
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) {
      const p = fill[col[k]]++;
      tc[p] = i;
      tv[p] = val[k];
    }
  return { n: cols, cols: n, rowPtr: ptr, col: tc, val: tv };
}

/** C = A B. */
export function product(A: Csr, B: Csr): Csr {
  const n = A.n, m = B.cols;
  const mark = new Int32Array(m).fill(-1);
  const acc = new Float64Array(m);
  // Pass 1: row lengths.
  const ptr = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    let len = 0;
    for (let k = A.rowPtr[i]; k < A.rowPtr[i + 1]; k++) {
      const j = A.col[k];
      for (let q = B.rowPtr[j]; q < B.rowPtr[j + 1]; q++) {
        const c = B.col[q];
        if (mark[c] !== i) {
          mark[c] = i;
          len++;
        }
      }
    }
    ptr[i + 1] = ptr[i] + len;
  }
  // Pass 2: values.
  const col = new Int32Array(ptr[n]), val = new Float64Array(ptr[n]);
  mark.fill(-1);
  for (let i = 0; i < n; i++) {
    let p = ptr[i];
    for (let k = A.rowPtr[i]; k < A.rowPtr[i + 1]; k++) {
      const j = A.col[k], a = A.val[k];
      for (let q = B.rowPtr[j]; q < B.rowPtr[j + 1]; q++) {
        const c = B.col[q];
        if (mark[c] !== i) {
          mark[c] = i;
          acc[c] = 0;
          col[p++] = c;
        }
        acc[c] += a * B.val[q];
      }
    }
    const row = col.subarray(ptr[i], ptr[i + 1]);
    row.sort();
    for (let k = ptr[i]; k < ptr[i + 1]; k++) val[k] = acc[col[k]];
  }
  return { n, cols: m, rowPtr: ptr, col, val };
}

/** Pᵀ A P for square A. */
export function galerkin(A: Csr, P: Csr): Csr {
  return product(transpose(P), product(A, P));
}
