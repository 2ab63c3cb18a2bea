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
  const less = (i: number, j: number): boolean => ka[i] < ka[j] || (kb !== null && ka[i] === ka[j] && kb[i] < kb[j]);
  // Explicit stack of ranges; the larger half is pushed, the smaller one processed first.
  const stack: number[] = [0, n - 1];
  while (stack.length) {
    let hi = stack.pop() as number;
    let lo = stack.pop() as number;
    while (hi - lo > 16) {
      const mid = (lo + hi) >> 1;
      // Median of three as the pivot; Hoare's partition splits runs of equal keys evenly.
      if (less(idx[mid], idx[lo])) swap(idx, mid, lo);
      if (less(idx[hi], idx[lo])) swap(idx, hi, lo);
      if (less(idx[hi], idx[mid])) swap(idx, hi, mid);
      const p = idx[mid];
      let i = lo, j = hi;
      while (i <= j) {
        while (less(idx[i], p)) i++;
        while (less(p, idx[j])) j--;
        if (i <= j) swap(idx, i++, j--);
      }
      // [lo, j] and [i, hi] remain: the larger is pushed, the smaller continues.
      if (j - lo < hi - i) {
        stack.push(i, hi);
        hi = j;
      } else {
        stack.push(lo, j);
        lo = i;
      }
    }
    // Insertion sort for the short range.
    for (let i = lo + 1; i <= hi; i++) {
      const v = idx[i];
      let j = i - 1;
      while (j >= lo && less(v, idx[j])) {
        idx[j + 1] = idx[j];
        j--;
      }
      idx[j + 1] = v;
    }
  }
  return idx;
}

function swap(a: Uint32Array, i: number, j: number): void {
  const t = a[i];
  a[i] = a[j];
  a[j] = t;
}
