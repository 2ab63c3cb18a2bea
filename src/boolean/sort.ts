/**
 * Index sorts on typed arrays, for the broad phase and the grid: a quicksort of indices by one
 * or two numeric keys (lexicographic), with no comparator callback and no allocation per
 * element. Array.prototype.sort with a comparator costs several times as much on 2e5 items,
 * which is why these few lines are written by hand.
 */

/** Indices 0..n−1 ordered by ka, then kb (when given). */
export function sortIndex(ka: Float64Array, kb: Float64Array | null = null): Uint32Array {
  const n = ka.length;
  const idx = new Uint32Array(n);
  for (let i = 0; i < n; i++) idx[i] = i;
  // With one key, the second compares equal everywhere.
  const kb2 = kb ?? new Float64Array(n);
  const stack = new Int32Array(2 * 64);
  let top = 0;
  stack[top++] = 0;
  stack[top++] = n - 1;
  while (top > 0) {
    let hi = stack[--top];
    let lo = stack[--top];
    while (hi - lo > 16) {
      const mid = (lo + hi) >> 1;
      // Median of three as the pivot; Hoare's partition splits runs of equal keys evenly.
      if (before(ka, kb2, idx[mid], idx[lo])) swap(idx, mid, lo);
      if (before(ka, kb2, idx[hi], idx[lo])) swap(idx, hi, lo);
      if (before(ka, kb2, idx[hi], idx[mid])) swap(idx, hi, mid);
      const pa = ka[idx[mid]], pb = kb2[idx[mid]];
      let i = lo, j = hi;
      while (i <= j) {
        while (ka[idx[i]] < pa || (ka[idx[i]] === pa && kb2[idx[i]] < pb)) i++;
        while (pa < ka[idx[j]] || (pa === ka[idx[j]] && pb < kb2[idx[j]])) j--;
        if (i <= j) swap(idx, i++, j--);
      }
      // [lo, j] and [i, hi] remain: the larger is pushed (the stack stays under 2·log2 n), the
      // smaller continues.
      if (j - lo < hi - i) {
        stack[top++] = i;
        stack[top++] = hi;
        hi = j;
      } else {
        stack[top++] = lo;
        stack[top++] = j;
        lo = i;
      }
    }
    // Insertion sort for the short range.
    for (let i = lo + 1; i <= hi; i++) {
      const v = idx[i], va = ka[v], vb = kb2[v];
      let j = i - 1;
      while (j >= lo && (va < ka[idx[j]] || (va === ka[idx[j]] && vb < kb2[idx[j]]))) {
        idx[j + 1] = idx[j];
        j--;
      }
      idx[j + 1] = v;
    }
  }
  return idx;
}

function before(ka: Float64Array, kb: Float64Array, i: number, j: number): boolean {
  return ka[i] < ka[j] || (ka[i] === ka[j] && kb[i] < kb[j]);
}

function swap(a: Uint32Array, i: number, j: number): void {
  const t = a[i];
  a[i] = a[j];
  a[j] = t;
}
