/**
 * The mesher's growing input: points and the boundary chords between them (a planar straight-line
 * graph), with the exact edge each chord approximates.
 *
 * Every chord remembers its exact edge and the parameter interval [t0, t1] it spans there, so a
 * split puts the new point on the exact line or arc (never on the chord), and the quadratic
 * elements can later put their mid-side nodes on the arc too.
 *
 * The first discretization walks each exact edge and halves a piece until it is no longer than
 * the wanted size at its ends and middle (local-size.ts). A point remembers its wanted size `h`
 * (Infinity for interior points, which take their size from the grading).
 */
import { edgeShape, type ExactBoundary } from './boundary-edges';
import { edgeLength, edgePoint, edgeTangentFrom, type EdgeShape } from './edge-geometry';
import { F64List, I32List } from './growable';
import { WEDGE_ANGLE, wedgeAngle, type BoundarySizer } from './local-size';

/** A piece is halved while it is longer than this multiple of the wanted size. */
const SIZE_SLACK = 1.0;
/** `onEdge` of an exact vertex. */
const VERTEX = -1;
/** `onEdge` of an interior (Steiner) point. */
export const INTERIOR = -2;

export class Pslg {
  x = new F64List(1024);
  y = new F64List(1024);
  /** Wanted element size at the point (Infinity for interior points). */
  h = new F64List(1024);
  /** Exact edge a boundary point lies inside; VERTEX for exact vertices, INTERIOR for the rest. */
  onEdge = new I32List(1024);

  readonly ca = new I32List(1024);
  readonly cb = new I32List(1024);
  readonly cEdge = new I32List(1024);
  readonly ct0 = new F64List(1024);
  readonly ct1 = new F64List(1024);

  readonly shapes: EdgeShape[];
  readonly lengths: Float64Array;
  /** For each exact vertex (by point id), true where two edges meet at an acute angle. */
  readonly apex: Uint8Array;
  /** Pairs of exact edges that meet at an acute angle ("k1,k2" with k1 < k2). */
  readonly acutePairs = new Set<string>();

  constructor(readonly boundary: ExactBoundary, readonly sizer: BoundarySizer) {
    const { xy, edges } = boundary;
    this.shapes = edges.map((e) => edgeShape(xy, e));
    this.lengths = Float64Array.from(this.shapes, edgeLength);
    const nv = xy.length >> 1;
    this.apex = new Uint8Array(nv);
    this.findAcuteVertices();
    // Exact vertices first: their ids equal the boundary's vertex ids.
    const vh = new Float64Array(nv).fill(Infinity);
    edges.forEach((e, k) => {
      vh[e.a] = Math.min(vh[e.a], sizer.at(k, 0));
      vh[e.b] = Math.min(vh[e.b], sizer.at(k, 1));
    });
    for (let v = 0; v < nv; v++) this.addPoint(xy[2 * v], xy[2 * v + 1], vh[v], VERTEX);
    edges.forEach((e, k) => this.discretizeEdge(k, e.a, e.b, vh[e.a], vh[e.b]));
  }

  get pointCount(): number {
    return this.x.length;
  }
  get chordCount(): number {
    return this.ca.length;
  }

  addPoint(x: number, y: number, h: number, edge: number): number {
    this.x.push(x);
    this.y.push(y);
    this.h.push(h);
    return this.onEdge.push(edge);
  }

  private addChord(a: number, b: number, edge: number, t0: number, t1: number): void {
    this.ca.push(a);
    this.cb.push(b);
    this.cEdge.push(edge);
    this.ct0.push(t0);
    this.ct1.push(t1);
  }

  /** Chords of exact edge k from its first to its last vertex, halved until short enough. */
  private discretizeEdge(k: number, a: number, b: number, ha: number, hb: number): void {
    const L = this.lengths[k];
    const walk = (pa: number, t0: number, h0: number, pb: number, t1: number, h1: number, depth: number) => {
      const tm = (t0 + t1) / 2;
      const hm = this.sizer.at(k, tm);
      const piece = L * (t1 - t0);
      if (depth < 40 && piece > SIZE_SLACK * Math.min(h0, h1, hm)) {
        const [mx, my] = edgePoint(this.shapes[k], tm);
        const pm = this.addPoint(mx, my, hm, k);
        walk(pa, t0, h0, pm, tm, hm, depth + 1);
        walk(pm, tm, hm, pb, t1, h1, depth + 1);
      } else this.addChord(pa, pb, k, t0, t1);
    };
    walk(a, 0, ha, b, 1, hb, 0);
  }

  /**
   * Split chord i at the exact point of parameter t (t0 < t < t1). The chord keeps its start and
   * a new chord takes the second half. Returns the new point.
   */
  splitChord(i: number, t: number): number {
    const k = this.cEdge.data[i];
    const [x, y] = edgePoint(this.shapes[k], t);
    const p = this.addPoint(x, y, this.sizer.at(k, t), k);
    const b = this.cb.data[i], t1 = this.ct1.data[i];
    this.cb.data[i] = p;
    this.ct1.data[i] = t;
    this.addChord(p, b, k, t, t1);
    return p;
  }

  /**
   * Where to split chord i: its parameter midpoint, or, when one end is the tip of an acute wedge,
   * the point at a power-of-two distance from the tip (concentric shells), so that the two sides
   * of the wedge are split at equal distances and do not keep encroaching on each other.
   */
  splitParameter(i: number, unit: number): number {
    const a = this.ca.data[i], b = this.cb.data[i];
    const t0 = this.ct0.data[i], t1 = this.ct1.data[i];
    const tm = (t0 + t1) / 2;
    const fromA = a < this.apex.length && this.apex[a] === 1;
    const fromB = b < this.apex.length && this.apex[b] === 1;
    if (fromA === fromB) return tm;
    const L = this.lengths[this.cEdge.data[i]] * (t1 - t0);
    const d = unit * Math.pow(2, Math.round(Math.log2(L / 2 / unit)));
    const f = d / L;
    if (!(f > 0.25 && f < 0.75)) return tm;
    return fromA ? t0 + f * (t1 - t0) : t1 - f * (t1 - t0);
  }

  /**
   * Drop interior points that no triangle of the section uses (they fell into a hole or outside)
   * and renumber the rest; boundary points always stay.
   */
  removeUnusedInterior(used: Uint8Array): void {
    const n = this.pointCount;
    const map = new Int32Array(n);
    const x = new F64List(n), y = new F64List(n), h = new F64List(n), on = new I32List(n);
    for (let p = 0; p < n; p++) {
      const kind = this.onEdge.data[p];
      if (kind === INTERIOR && !used[p]) {
        map[p] = -1;
        continue;
      }
      map[p] = x.push(this.x.data[p]);
      y.push(this.y.data[p]);
      h.push(this.h.data[p]);
      on.push(kind);
    }
    if (x.length === n) return;
    this.x = x;
    this.y = y;
    this.h = h;
    this.onEdge = on;
    for (let i = 0; i < this.chordCount; i++) {
      this.ca.data[i] = map[this.ca.data[i]];
      this.cb.data[i] = map[this.cb.data[i]];
    }
  }

  /** True when points p and q lie on two edges that meet at an acute angle. */
  onAcutePair(p: number, q: number): boolean {
    const e = this.onEdge.data[p], f = this.onEdge.data[q];
    if (e < 0 || f < 0 || e === f) return false;
    return this.acutePairs.has(e < f ? `${e},${f}` : `${f},${e}`);
  }

  private findAcuteVertices(): void {
    const ends = new Map<number, { k: number; end: 'a' | 'b' }[]>();
    this.boundary.edges.forEach((e, k) => {
      for (const end of ['a', 'b'] as const) {
        const list = ends.get(e[end]) ?? [];
        list.push({ k, end });
        ends.set(e[end], list);
      }
    });
    for (const [v, list] of ends)
      for (let i = 0; i < list.length; i++)
        for (let j = i + 1; j < list.length; j++) {
          const [ux, uy] = edgeTangentFrom(this.shapes[list[i].k], list[i].end);
          const [wx, wy] = edgeTangentFrom(this.shapes[list[j].k], list[j].end);
          const edges = this.boundary.edges;
          if (wedgeAngle(edges[list[i].k], edges[list[j].k], ux * wx + uy * wy) < WEDGE_ANGLE) {
            this.apex[v] = 1;
            const e = list[i].k, f = list[j].k;
            this.acutePairs.add(e < f ? `${e},${f}` : `${f},${e}`);
          }
        }
  }
}
