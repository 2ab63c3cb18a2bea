/**
 * Compressed sparse rows for the finite-element matrix: the pattern of node pairs that share an
 * element (rows sorted, both triangles stored), and lookup of an entry's slot.
 */

export interface CsrPattern {
  n: number;
  rowPtr: Int32Array;
  col: Int32Array;
}

export interface CsrMatrix extends CsrPattern {
  val: Float64Array;
}

/** Pattern of a mesh with `per` nodes per element. */
export function elementPattern(n: number, elem: Uint32Array, per: number): CsrPattern {
  const ne = elem.length / per;
  // Elements of each node.
  const eptr = new Int32Array(n + 1);
  for (let i = 0; i < elem.length; i++) eptr[elem[i] + 1]++;
  for (let i = 0; i < n; i++) eptr[i + 1] += eptr[i];
  const eidx = new Int32Array(elem.length);
  const fill = eptr.slice(0, n);
  for (let e = 0; e < ne; e++) for (let a = 0; a < per; a++) eidx[fill[elem[per * e + a]]++] = e;
  // Row i: every node of every element of node i, once.
  const mark = new Int32Array(n).fill(-1);
  const rowPtr = new Int32Array(n + 1);
  for (let i = 0; i < n; i++) {
    let len = 0;
    for (let k = eptr[i]; k < eptr[i + 1]; k++)
      for (let a = 0; a < per; a++) {
        const j = elem[per * eidx[k] + a];
        if (mark[j] !== i) {
          mark[j] = i;
          len++;
        }
      }
    rowPtr[i + 1] = rowPtr[i] + len;
  }
  const col = new Int32Array(rowPtr[n]);
  mark.fill(-1);
  for (let i = 0; i < n; i++) {
    let p = rowPtr[i];
    for (let k = eptr[i]; k < eptr[i + 1]; k++)
      for (let a = 0; a < per; a++) {
        const j = elem[per * eidx[k] + a];
        if (mark[j] !== i) {
          mark[j] = i;
          col[p++] = j;
        }
      }
    col.subarray(rowPtr[i], rowPtr[i + 1]).sort();
  }
  return { n, rowPtr, col };
}

/** Slot of entry (i, j), which must be in the pattern. */
export function slot(p: CsrPattern, i: number, j: number): number {
  let lo = p.rowPtr[i], hi = p.rowPtr[i + 1] - 1;
  const col = p.col;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (col[mid] < j) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** y = A x. */
export function multiply(A: CsrMatrix, x: Float64Array, y: Float64Array): void {
  const { n, rowPtr, col, val } = A;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let k = rowPtr[i]; k < rowPtr[i + 1]; k++) s += val[k] * x[col[k]];
    y[i] = s;
  }
}
