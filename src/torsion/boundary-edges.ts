/**
 * The exact boundary of all pieces as one table of edges with the piece on each side, in a local
 * frame centred on the section (so far-from-origin parts keep their precision).
 *
 * Steps, each small:
 * 1. Read every contour segment of every piece as a directed edge a→b with its sweep; the piece
 *    lies on its left (outer loops run CCW and holes CW, so the material is always on the left).
 * 2. Merge vertices closer than a snap distance (1e-9 of the section's size), so that loops and
 *    pieces which touch share their vertices exactly.
 * 3. Split an edge where another edge's vertex lies on it (T-junctions, e.g. a plate standing on a
 *    flange, or two pieces meeting along part of an edge).
 * 4. Merge edges that coincide: an interface between two pieces is one edge with a piece on each
 *    side. Two pieces on the same side of one edge overlap, which is reported.
 */
import Flatbush from 'flatbush';
import { regionsBounds } from '../geometry/bounds';
import { regionBounds, type Region } from '../geometry/contour';
import { distanceToEdge, edgeParameter, type EdgeShape } from './edge-geometry';
import { placeText, TorsionError } from './errors';

export interface ExactEdge {
  a: number;
  b: number;
  /** Signed sweep of the edge from a to b (0: straight line). */
  sweep: number;
  /** Piece on the left of a→b, or −1. */
  left: number;
  /** Piece on the right of a→b, or −1. */
  right: number;
  /** True for a cut along a mirror axis (meshing half a symmetric section): not a real wall. */
  cut?: boolean;
}

export interface ExactBoundary {
  /** Vertex coordinates in the local frame, interleaved. */
  xy: Float64Array;
  edges: ExactEdge[];
  /** Local frame: world = local + origin. */
  originX: number;
  originY: number;
  /** Largest side of the bounding box of all pieces. */
  size: number;
  /** Distance below which two points count as one. */
  snap: number;
}

/** Snap distance relative to the section size. */
const SNAP_RATIO = 1e-9;

export interface PieceInput {
  region: Region;
}

/** A given local frame (world = local + origin) and section size, instead of the pieces' own. */
export interface Frame {
  originX: number;
  originY: number;
  size: number;
}

export function exactBoundary(pieces: readonly PieceInput[], frame?: Frame): ExactBoundary {
  pieces.forEach((p, k) => checkRegion(p.region, k));
  const box = regionsBounds(pieces.map((p) => p.region));
  if (!box || !(box.xmax > box.xmin && box.ymax > box.ymin)) throw new TorsionError('the section is empty or has no area to twist');
  const { xmin, xmax, ymin, ymax } = box;
  const originX = frame ? frame.originX : (xmin + xmax) / 2, originY = frame ? frame.originY : (ymin + ymax) / 2;
  const size = frame ? frame.size : Math.max(xmax - xmin, ymax - ymin);
  const snap = SNAP_RATIO * size;

  const verts = new VertexSnapper(snap);
  let raw: ExactEdge[] = [];
  pieces.forEach((p, k) => {
    for (const c of p.region) {
      const n = c.xy.length >> 1;
      for (let i = 0; i < n; i++) {
        const j = (i + 1) % n;
        const a = verts.add(c.xy[2 * i] - originX, c.xy[2 * i + 1] - originY);
        const b = verts.add(c.xy[2 * j] - originX, c.xy[2 * j + 1] - originY);
        if (a === b) continue; // a repeated point (an arc between equal points encloses nothing)
        const sweep = c.bulge ? 4 * Math.atan(c.bulge[i]) : 0;
        raw.push({ a, b, sweep, left: k, right: -1 });
      }
    }
  });
  const xy = verts.coordinates();
  raw = splitAtTouchingVertices(xy, raw, snap);
  const edges = mergeCoincident(xy, raw, snap, originX, originY);
  if (edges.length < 2) throw new TorsionError('the section is empty or has no area to twist');
  return { xy, edges, originX, originY, size, snap };
}

/** Refuse a region that is not a list of well-formed contours, naming the piece and contour. */
export function checkRegion(region: Region, k: number): void {
  if (!Array.isArray(region)) throw new TorsionError(`pieces[${k}].region must be a list of contours`);
  region.forEach((c, i) => {
    const where = `pieces[${k}].region[${i}]`;
    if (!c || !(c.xy instanceof Float64Array) || c.xy.length % 2 !== 0) throw new TorsionError(`${where}: xy must be a Float64Array of x, y pairs`);
    if (c.xy.length < 4) throw new TorsionError(`${where}: a contour needs at least two vertices`);
    if (c.bulge !== null && (!(c.bulge instanceof Float64Array) || c.bulge.length * 2 !== c.xy.length))
      throw new TorsionError(`${where}: bulge must be null or one value per vertex`);
    for (let j = 0; j < c.xy.length; j++) if (!Number.isFinite(c.xy[j])) throw new TorsionError(`${where}: coordinate ${j} is not a finite number`);
    if (c.bulge) for (let j = 0; j < c.bulge.length; j++) if (!Number.isFinite(c.bulge[j])) throw new TorsionError(`${where}: bulge ${j} is not a finite number`);
  });
}

/** Vertices merged on a grid of cell size `snap` (a point is looked up in its cell and the 8 around it). */
class VertexSnapper {
  private readonly cells = new Map<string, number[]>();
  private readonly xs: number[] = [];
  constructor(private readonly snap: number) {}
  add(x: number, y: number): number {
    const ix = Math.floor(x / this.snap), iy = Math.floor(y / this.snap);
    for (let dx = -1; dx <= 1; dx++)
      for (let dy = -1; dy <= 1; dy++) {
        const list = this.cells.get(`${ix + dx},${iy + dy}`);
        if (!list) continue;
        for (const v of list) if (Math.hypot(this.xs[2 * v] - x, this.xs[2 * v + 1] - y) <= this.snap) return v;
      }
    const id = this.xs.length >> 1;
    this.xs.push(x, y);
    const key = `${ix},${iy}`;
    const list = this.cells.get(key);
    if (list) list.push(id);
    else this.cells.set(key, [id]);
    return id;
  }
  coordinates(): Float64Array {
    return Float64Array.from(this.xs);
  }
}

export function edgeShape(xy: Float64Array, e: { a: number; b: number; sweep: number }): EdgeShape {
  return { ax: xy[2 * e.a], ay: xy[2 * e.a + 1], bx: xy[2 * e.b], by: xy[2 * e.b + 1], sweep: e.sweep };
}

/** Split every edge at the vertices of other edges that lie on it. */
function splitAtTouchingVertices(xy: Float64Array, edges: ExactEdge[], snap: number): ExactEdge[] {
  const nv = xy.length >> 1;
  const index = new Flatbush(edges.length);
  for (const e of edges) {
    const g = edgeShape(xy, e);
    const b = regionBounds([{ xy: Float64Array.of(g.ax, g.ay, g.bx, g.by), bulge: Float64Array.of(Math.tan(e.sweep / 4), 0) }])!;
    index.add(b.xmin - snap, b.ymin - snap, b.xmax + snap, b.ymax + snap);
  }
  index.finish();
  const cuts = new Map<number, { t: number; v: number }[]>();
  for (let v = 0; v < nv; v++) {
    const px = xy[2 * v], py = xy[2 * v + 1];
    for (const k of index.search(px, py, px, py)) {
      const e = edges[k];
      if (e.a === v || e.b === v) continue;
      const g = edgeShape(xy, e);
      if (distanceToEdge(g, px, py) > snap) continue;
      const t = edgeParameter(g, px, py);
      if (!(t > 0 && t < 1)) continue;
      const list = cuts.get(k);
      if (list) list.push({ t, v });
      else cuts.set(k, [{ t, v }]);
    }
  }
  if (cuts.size === 0) return edges;
  const out: ExactEdge[] = [];
  edges.forEach((e, k) => {
    const list = cuts.get(k);
    if (!list) {
      out.push(e);
      return;
    }
    list.sort((p, q) => p.t - q.t);
    let from = e.a, t0 = 0;
    for (const { t, v } of [...list, { t: 1, v: e.b }]) {
      if (v === from) continue;
      out.push({ a: from, b: v, sweep: e.sweep * (t - t0), left: e.left, right: e.right });
      from = v;
      t0 = t;
    }
  });
  return out;
}

/**
 * One edge per distinct curve between two vertices, with the pieces on both sides. Copies of an
 * edge count like winding numbers, piece by piece: a piece's loops running along the same curve in
 * opposite directions cancel (no boundary there, as the signed moments say), once leaves the piece
 * on one side, and twice the same way is an overlap. Two pieces on the same side overlap too.
 */
function mergeCoincident(xy: Float64Array, edges: ExactEdge[], snap: number, ox: number, oy: number): ExactEdge[] {
  interface Curve {
    edge: ExactEdge;
    /** Net count per piece: +1 for each copy a→b, −1 for each copy b→a. */
    net: Map<number, number>;
  }
  const byPair = new Map<string, Curve[]>();
  const curves: Curve[] = [];
  for (const e of edges) {
    const key = e.a < e.b ? `${e.a},${e.b}` : `${e.b},${e.a}`;
    const L = Math.hypot(xy[2 * e.b] - xy[2 * e.a], xy[2 * e.b + 1] - xy[2 * e.a + 1]);
    // Two arcs between the same points coincide when their sagittas (≈ L·sweep/8) agree to the snap distance.
    const same = (f: ExactEdge, sign: number) => Math.abs(f.sweep - sign * e.sweep) * L <= 8 * snap;
    const list = byPair.get(key) ?? [];
    let curve = list.find((c) => (c.edge.a === e.a && same(c.edge, 1)) || (c.edge.a === e.b && same(c.edge, -1)));
    if (!curve) {
      curve = { edge: { a: e.a, b: e.b, sweep: e.sweep, left: -1, right: -1 }, net: new Map() };
      list.push(curve);
      byPair.set(key, list);
      curves.push(curve);
    }
    const d = curve.edge.a === e.a ? 1 : -1;
    curve.net.set(e.left, (curve.net.get(e.left) ?? 0) + d);
  }
  const out: ExactEdge[] = [];
  for (const { edge, net } of curves) {
    const where = () => placeText((xy[2 * edge.a] + xy[2 * edge.b]) / 2 + ox, (xy[2 * edge.a + 1] + xy[2 * edge.b + 1]) / 2 + oy);
    for (const [piece, count] of net) {
      if (count === 0) continue;
      if (Math.abs(count) > 1) throw new TorsionError(`piece ${piece} has the same edge twice near ${where()}: a loop is repeated or overlaps itself`);
      const side: 'left' | 'right' = count > 0 ? 'left' : 'right';
      if (edge[side] !== -1) throw new TorsionError(`pieces ${edge[side]} and ${piece} overlap along the edge near ${where()}; pieces must not overlap`);
      edge[side] = piece;
    }
    if (edge.left !== -1 || edge.right !== -1) out.push(edge);
  }
  return out;
}
