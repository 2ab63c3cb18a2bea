/**
 * Graded element sizes at the mesh vertices: each vertex may be at most `rate` × distance larger
 * than any vertex it is joined to, starting from the wanted sizes at the boundary points and never
 * above `hMax`. A small feature (a thin wall, a small hole) thus shrinks the elements around it,
 * and the size grows back smoothly away from it.
 *
 * This is a shortest-path problem over the triangulation's edges (edge weight rate × length),
 * solved with Dijkstra's algorithm on a binary heap in typed arrays.
 */
export function gradedSizes(
  coords: Float64Array,
  tri: Uint32Array,
  inside: (t: number) => boolean,
  wanted: Float64Array,
  hMax: number,
  rate: number,
): Float64Array {
  const n = coords.length >> 1;
  const nt = tri.length / 3;
  // Vertex adjacency (both directions of every edge of a triangle in the section), as CSR.
  const deg = new Int32Array(n + 1);
  for (let t = 0; t < nt; t++) {
    if (!inside(t)) continue;
    for (let j = 0; j < 3; j++) deg[tri[3 * t + j] + 1] += 2;
  }
  for (let i = 0; i < n; i++) deg[i + 1] += deg[i];
  const adj = new Int32Array(deg[n]);
  const fill = deg.slice(0, n);
  for (let t = 0; t < nt; t++) {
    if (!inside(t)) continue;
    for (let j = 0; j < 3; j++) {
      const p = tri[3 * t + j], q = tri[3 * t + ((j + 1) % 3)];
      adj[fill[p]++] = q;
      adj[fill[q]++] = p;
    }
  }
  const h = new Float64Array(n);
  const heap = new MinHeap(n);
  for (let i = 0; i < n; i++) {
    h[i] = Math.min(wanted[i], hMax);
    heap.push(i, h[i]);
  }
  const done = new Uint8Array(n);
  while (heap.size > 0) {
    const p = heap.pop();
    if (done[p]) continue;
    done[p] = 1;
    const px = coords[2 * p], py = coords[2 * p + 1];
    for (let k = deg[p]; k < deg[p + 1]; k++) {
      const q = adj[k];
      if (done[q]) continue;
      const v = h[p] + rate * Math.sqrt(sq2(coords[2 * q] - px, coords[2 * q + 1] - py));
      if (v < h[q]) {
        h[q] = v;
        heap.push(q, v);
      }
    }
  }
  return h;
}

/** Binary min-heap of (id, key) with lazy deletion (an id may be pushed again with a smaller key). */
class MinHeap {
  private ids: Int32Array;
  private keys: Float64Array;
  size = 0;
  constructor(capacity: number) {
    this.ids = new Int32Array(Math.max(16, capacity * 2));
    this.keys = new Float64Array(this.ids.length);
  }
  push(id: number, key: number): void {
    if (this.size === this.ids.length) {
      const ids = new Int32Array(this.size * 2), keys = new Float64Array(this.size * 2);
      ids.set(this.ids);
      keys.set(this.keys);
      this.ids = ids;
      this.keys = keys;
    }
    let i = this.size++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (this.keys[parent] <= key) break;
      this.ids[i] = this.ids[parent];
      this.keys[i] = this.keys[parent];
      i = parent;
    }
    this.ids[i] = id;
    this.keys[i] = key;
  }
  pop(): number {
    const top = this.ids[0];
    const lastId = this.ids[--this.size], lastKey = this.keys[this.size];
    let i = 0;
    for (;;) {
      let c = 2 * i + 1;
      if (c >= this.size) break;
      if (c + 1 < this.size && this.keys[c + 1] < this.keys[c]) c++;
      if (this.keys[c] >= lastKey) break;
      this.ids[i] = this.ids[c];
      this.keys[i] = this.keys[c];
      i = c;
    }
    this.ids[i] = lastId;
    this.keys[i] = lastKey;
    return top;
  }
}

/** Squared length of (dx, dy) (Math.hypot is slow in hot loops). */
function sq2(dx: number, dy: number): number {
  return dx * dx + dy * dy;
}
