/**
 * Node ordering by reverse Cuthill–McKee, and the connected parts of the mesh.
 *
 * RCM numbers the nodes breadth-first from a far-out node, lowest degree first, then reverses
 * the order (George & Liu, Computer Solution of Large Sparse Positive Definite Systems, ch. 4).
 * It keeps the matrix's non-zeros near the diagonal, which makes the incomplete Cholesky
 * preconditioner much stronger and the memory access local. Written here because no allowed
 * library provides it; it is a few dozen lines.
 *
 * Each breadth-first sweep covers one connected part, so the parts come out as a by-product: a
 * section made of separate parts has one free warping constant per part.
 */
import type { CsrPattern } from './sparse';

export interface Ordering {
  /** order[k] = old id of the node that becomes node k. */
  order: Int32Array;
  /** Connected part of each node, in the new numbering. */
  part: Int32Array;
  parts: number;
}

export function reverseCuthillMcKee(p: CsrPattern): Ordering {
  const { n, rowPtr, col } = p;
  const degree = (i: number) => rowPtr[i + 1] - rowPtr[i];
  const visited = new Uint8Array(n);
  const order = new Int32Array(n);
  const partOld = new Int32Array(n);
  const level = new Int32Array(n).fill(-1);
  let head = 0;
  let parts = 0;
  for (let s = 0; s < n; s++) {
    if (visited[s]) continue;
    const start = peripheral(p, s, level);
    // Breadth-first from `start`, neighbours by increasing degree.
    let tail = head;
    order[tail++] = start;
    visited[start] = 1;
    const nb: number[] = [];
    while (head < tail) {
      const v = order[head++];
      partOld[v] = parts;
      nb.length = 0;
      for (let k = rowPtr[v]; k < rowPtr[v + 1]; k++) {
        const w = col[k];
        if (!visited[w]) {
          visited[w] = 1;
          nb.push(w);
        }
      }
      nb.sort((a, b) => degree(a) - degree(b));
      for (const w of nb) order[tail++] = w;
    }
    parts++;
  }
  order.reverse();
  const part = new Int32Array(n);
  for (let k = 0; k < n; k++) part[k] = partOld[order[k]];
  return { order, part, parts };
}

/**
 * A pseudo-peripheral node of the part containing s (George & Liu's level-structure search):
 * start anywhere, move to a node of least degree in the last level while that deepens the
 * structure.
 */
function peripheral(p: CsrPattern, s: number, level: Int32Array): number {
  const { rowPtr, col } = p;
  let root = s;
  let depth = -1;
  const queue: number[] = [];
  for (let pass = 0; pass < 8; pass++) {
    queue.length = 0;
    queue.push(root);
    level[root] = 0;
    let last = 0;
    for (let h = 0; h < queue.length; h++) {
      const v = queue[h];
      last = level[v];
      for (let k = rowPtr[v]; k < rowPtr[v + 1]; k++) {
        const w = col[k];
        if (level[w] < 0) {
          level[w] = level[v] + 1;
          queue.push(w);
        }
      }
    }
    let best = root, bestDeg = Infinity;
    for (const v of queue)
      if (level[v] === last) {
        const d = rowPtr[v + 1] - rowPtr[v];
        if (d < bestDeg) {
          bestDeg = d;
          best = v;
        }
      }
    for (const v of queue) level[v] = -1;
    if (last <= depth) break;
    depth = last;
    root = best;
  }
  return root;
}

/**
 * The order of a uniformly split mesh taken from its parent's order, without a new search: the
 * parent's nodes (ids 0 … parentCount − 1, already well ordered) keep their sequence, and each new
 * mid-side node follows the lower-numbered end of its side. Neighbours stay close, as in the
 * parent, in linear time.
 */
export function splitOrdering(elem: Uint32Array, n: number, parentCount: number, parentPart: Int32Array, parts: number): Ordering {
  const ne = elem.length / 6;
  const after = new Int32Array(n).fill(-1);
  for (let e = 0; e < ne; e++)
    for (let s = 0; s < 3; s++) {
      const mid = elem[6 * e + 3 + s];
      if (after[mid] >= 0) continue;
      after[mid] = Math.min(elem[6 * e + s], elem[6 * e + ((s + 1) % 3)]);
    }
  // Bucket the mid-side nodes by the parent node they follow.
  const start = new Int32Array(parentCount + 1);
  for (let i = parentCount; i < n; i++) start[after[i] + 1]++;
  for (let c = 0; c < parentCount; c++) start[c + 1] += start[c];
  const fill = start.slice(0, parentCount);
  const bucket = new Int32Array(n - parentCount);
  for (let i = parentCount; i < n; i++) bucket[fill[after[i]]++] = i;
  const order = new Int32Array(n);
  const part = new Int32Array(n);
  let k = 0;
  for (let c = 0; c < parentCount; c++) {
    part[k] = parentPart[c];
    order[k++] = c;
    for (let j = start[c]; j < start[c + 1]; j++) {
      part[k] = parentPart[c];
      order[k++] = bucket[j];
    }
  }
  return { order, part, parts };
}
