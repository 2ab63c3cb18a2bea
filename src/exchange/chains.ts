/**
 * Joining open pieces of outline (lines, arcs, open polylines) into closed loops.
 *
 * 1. Cluster the pieces' end points: ends closer than `tol` are one node.
 * 2. Each piece is an edge between two nodes. A connected group of pieces closes into a loop
 *    exactly when every one of its nodes joins two ends; the loop is walked piece by piece, each
 *    piece turned round when it was drawn the other way. Entity order and direction do not matter.
 * 3. Groups with a loose end (a node with one end) or a branch (three or more ends) cannot be
 *    closed and are returned, piece by piece, with the reason and the place.
 * Pieces that repeat another piece (the same line drawn twice) are set aside first.
 */

/** Where a piece came from, for messages. */
export interface PieceSource {
  type: string;
  handle: string;
  layer: string;
  line: number;
  /** Name of the block the entity belongs to, when it came in through a block reference. */
  block?: string;
}

/** A run of lines and arcs. Open: n vertices, n − 1 bulges. Closed: n vertices, n bulges. |bulge| ≤ 1. */
export interface Piece {
  xy: number[];
  bulge: number[];
  closed: boolean;
  source: PieceSource;
  /** Set for pieces that are a whole circle (a CIRCLE entity). */
  circle?: { cx: number; cy: number; r: number };
}

export interface JoinedLoop {
  xy: number[];
  bulge: number[];
  sources: PieceSource[];
  circle?: { cx: number; cy: number; r: number };
}

export interface UnjoinedPiece {
  piece: Piece;
  message: string;
}

export interface JoinResult {
  loops: JoinedLoop[];
  unjoined: UnjoinedPiece[];
}

/** Union–find over indices. */
class Sets {
  private parent: Int32Array;
  constructor(n: number) {
    this.parent = new Int32Array(n);
    for (let i = 0; i < n; i++) this.parent[i] = i;
  }
  find(i: number): number {
    let r = i;
    while (this.parent[r] !== r) r = this.parent[r];
    while (this.parent[i] !== r) {
      const next = this.parent[i];
      this.parent[i] = r;
      i = next;
    }
    return r;
  }
  union(a: number, b: number): void {
    const ra = this.find(a), rb = this.find(b);
    if (ra !== rb) this.parent[ra] = rb;
  }
}

/** Cluster points (interleaved) closer than tol; returns the cluster id of every point. */
export function clusterPoints(pts: number[], tol: number): Int32Array {
  const n = pts.length >> 1;
  const sets = new Sets(n);
  const cell = tol > 0 ? tol : Number.MIN_VALUE;
  const grid = new Map<string, number[]>();
  const key = (i: number, j: number) => `${i},${j}`;
  for (let p = 0; p < n; p++) {
    const x = pts[2 * p], y = pts[2 * p + 1];
    const ci = Math.floor(x / cell), cj = Math.floor(y / cell);
    for (let di = -1; di <= 1; di++) {
      for (let dj = -1; dj <= 1; dj++) {
        const bucket = grid.get(key(ci + di, cj + dj));
        if (!bucket) continue;
        for (const q of bucket) {
          if (Math.hypot(pts[2 * q] - x, pts[2 * q + 1] - y) <= tol) sets.union(p, q);
        }
      }
    }
    const k = key(ci, cj);
    const b = grid.get(k);
    if (b) b.push(p);
    else grid.set(k, [p]);
  }
  const id = new Int32Array(n);
  for (let p = 0; p < n; p++) id[p] = sets.find(p);
  return id;
}

function endPoints(pieces: Piece[]): number[] {
  const pts: number[] = [];
  for (const p of pieces) {
    const m = p.xy.length;
    pts.push(p.xy[0], p.xy[1], p.xy[m - 2], p.xy[m - 1]);
  }
  return pts;
}

/** The piece traversed the other way. */
export function reversePiece(p: Piece): Piece {
  const n = p.xy.length >> 1;
  const xy: number[] = [];
  for (let i = n - 1; i >= 0; i--) xy.push(p.xy[2 * i], p.xy[2 * i + 1]);
  const bulge = p.bulge.slice().reverse().map((b) => -b);
  return { ...p, xy, bulge };
}

/** True when b repeats a (same vertices within tol, same bulges), in either direction. */
function samePiece(a: Piece, b: Piece, tol: number): boolean {
  if (a.xy.length !== b.xy.length) return false;
  const same = (q: Piece) =>
    a.xy.every((v, i) => Math.abs(v - q.xy[i]) <= tol) && a.bulge.every((v, i) => Math.abs(v - q.bulge[i]) <= 1e-9);
  return same(b) || same(reversePiece(b));
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(8)));
}

export function describeSource(s: PieceSource): string {
  const handle = s.handle ? `handle ${s.handle}, ` : '';
  const block = s.block !== undefined ? `, in block ${s.block}` : '';
  return `${s.type} (${handle}layer ${s.layer}, line ${s.line}${block})`;
}

/** Join open pieces into loops; closed pieces pass straight through. */
export function joinPieces(pieces: Piece[], tol: number): JoinResult {
  const loops: JoinedLoop[] = [];
  const unjoined: UnjoinedPiece[] = [];
  let open: Piece[] = [];
  for (const p of pieces) {
    if (p.closed) loops.push({ xy: p.xy.slice(), bulge: p.bulge.slice(), sources: [p.source], circle: p.circle });
    else open.push(p);
  }
  if (open.length === 0) return { loops, unjoined };

  // Repeated pieces: group by the (unordered) pair of end clusters, then compare geometry.
  {
    const id = clusterPoints(endPoints(open), tol);
    const groups = new Map<string, number[]>();
    open.forEach((_, k) => {
      const a = id[2 * k], b = id[2 * k + 1];
      const key = a < b ? `${a}:${b}` : `${b}:${a}`;
      const g = groups.get(key);
      if (g) g.push(k);
      else groups.set(key, [k]);
    });
    const dropped = new Set<number>();
    for (const g of groups.values()) {
      for (let i = 0; i < g.length; i++) {
        if (dropped.has(g[i])) continue;
        for (let j = i + 1; j < g.length; j++) {
          if (!dropped.has(g[j]) && samePiece(open[g[i]], open[g[j]], tol)) {
            dropped.add(g[j]);
            unjoined.push({ piece: open[g[j]], message: `repeats ${describeSource(open[g[i]].source)} and was left out` });
          }
        }
      }
    }
    if (dropped.size > 0) open = open.filter((_, k) => !dropped.has(k));
  }

  const pts = endPoints(open);
  const node = clusterPoints(pts, tol);
  const members = new Map<number, number[]>(); // node -> end indices (2k start, 2k+1 end)
  node.forEach((c, e) => {
    const m = members.get(c);
    if (m) m.push(e);
    else members.set(c, [e]);
  });
  // Pieces connected through shared nodes form groups.
  const groups = new Sets(open.length);
  for (const m of members.values()) for (let i = 1; i < m.length; i++) groups.union(m[0] >> 1, m[i] >> 1);
  const byGroup = new Map<number, number[]>();
  open.forEach((_, k) => {
    const g = groups.find(k);
    const list = byGroup.get(g);
    if (list) list.push(k);
    else byGroup.set(g, [k]);
  });

  let hinted = 0;
  for (const list of byGroup.values()) {
    const bad: string[] = [];
    for (const k of list) {
      for (const e of [2 * k, 2 * k + 1]) {
        const m = members.get(node[e])!;
        const at = `(${fmt(pts[2 * e])}, ${fmt(pts[2 * e + 1])})`;
        if (m.length === 1) {
          // The gap size helps choose a tolerance; searched for the first 200 loose ends only.
          const near = hinted++ < 200 ? nearestOtherEnd(pts, e) : Infinity;
          const hint = Number.isFinite(near) ? ` (the nearest other end is ${fmt(near)} away)` : '';
          bad.push(`open end at ${at}: no other entity ends within ${fmt(tol)}${hint}`);
        }
        else if (m.length > 2) bad.push(`${m.length} ends meet at ${at}, so the outline branches and cannot be closed`);
      }
    }
    if (bad.length > 0) {
      const reason = [...new Set(bad)];
      const text = reason.length > 3 ? `${reason.slice(0, 3).join('; ')}; …` : reason.join('; ');
      for (const k of list) unjoined.push({ piece: open[k], message: `not part of a closed outline: ${text}` });
      continue;
    }
    loops.push(walk(open, list[0], pts, node, members));
  }
  return { loops, unjoined };
}

/** Distance from end e to the nearest end of any other piece (Infinity if there is none). */
function nearestOtherEnd(pts: number[], e: number): number {
  const x = pts[2 * e], y = pts[2 * e + 1];
  let best = Infinity;
  for (let q = 0; q < pts.length >> 1; q++) {
    if (q >> 1 === e >> 1) continue;
    const d = Math.hypot(pts[2 * q] - x, pts[2 * q + 1] - y);
    if (d < best) best = d;
  }
  return best;
}

/** Walk a closed group from piece `first`, joining each end to the other end at its node. */
function walk(open: Piece[], first: number, pts: number[], node: Int32Array, members: Map<number, number[]>): JoinedLoop {
  const xy: number[] = [];
  const bulge: number[] = [];
  const sources: PieceSource[] = [];
  let k = first;
  let forward = true;
  const used = new Set<number>();
  for (;;) {
    used.add(k);
    const p = forward ? open[k] : reversePiece(open[k]);
    sources.push(p.source);
    const startEnd = forward ? 2 * k : 2 * k + 1;
    const exitEnd: number = forward ? 2 * k + 1 : 2 * k;
    // The joint vertex is the mean of the two ends that meet there.
    const joint = members.get(node[startEnd])!;
    const jx = (pts[2 * joint[0]] + pts[2 * joint[1]]) / 2, jy = (pts[2 * joint[0] + 1] + pts[2 * joint[1] + 1]) / 2;
    const n = p.xy.length >> 1;
    xy.push(jx, jy);
    for (let i = 1; i < n - 1; i++) xy.push(p.xy[2 * i], p.xy[2 * i + 1]);
    bulge.push(...p.bulge);
    const m: number[] = members.get(node[exitEnd])!;
    const next: number = m[0] === exitEnd ? m[1] : m[0];
    const nk = next >> 1;
    if (used.has(nk)) break;
    k = nk;
    forward = (next & 1) === 0;
  }
  return { xy, bulge, sources };
}
