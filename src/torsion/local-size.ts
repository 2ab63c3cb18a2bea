/**
 * The element size wanted at a point of the boundary.
 *
 * Three limits, the smallest wins:
 * - the density's largest element size `hMax`;
 * - the local wall thickness divided by the number of elements wanted across a wall: the
 *   thickness at a boundary point is its distance to the nearest other edge, leaving out the
 *   edge itself and the edges that meet it at a vertex (those touch it, they are not across the
 *   wall), except where two edges meet at an acute angle (a sharp wedge, which is thin near its
 *   tip, though no sharper than 10° is followed). When half of a symmetric section is meshed, the
 *   cut along the mirror axis is not a wall: the wall across it is the mirror image, twice as
 *   far, so distances to or from a cut count double, and distances from one cut to another do
 *   not count;
 * - on an arc, the chord length whose sagitta is `sagittaRatio` of the chord (c ≤ 8·ratio·r), so
 *   that the chords keep within a fixed fraction of the local element size of the exact arc.
 * and never below `hMin`, which keeps a tangency or a sliver from asking for endless refinement.
 *
 * The nearest edge comes from a flatbush index of the edges' bounding boxes, then an exact
 * distance to lines and arcs.
 */
import Flatbush from 'flatbush';
import { regionBounds } from '../geometry/contour';
import { edgeShape, type ExactBoundary, type ExactEdge } from './boundary-edges';
import { distanceToEdge, edgePoint, edgeRadius, edgeTangentFrom, type EdgeShape } from './edge-geometry';

export interface SizeRules {
  hMax: number;
  hMin: number;
  /** Elements wanted across a wall. */
  across: number;
  /** Largest sagitta of a boundary chord, as a fraction of the chord. */
  sagittaRatio: number;
}

/** Two edges meeting at less than this angle form a wedge that is thin near its tip. */
export const WEDGE_ANGLE = Math.PI / 3;
/** Sharpest wedge the sizes follow (10°); see thickness(). */
const SIN_WEDGE_FLOOR = Math.sin(Math.PI / 18);

/**
 * The angle of the wedge two edges form at a shared vertex, from the cosine of the angle between
 * their tangents. Against a mirror cut the real wedge is twice as wide (the edge and its mirror
 * image); two cuts form no wedge (π).
 */
export function wedgeAngle(e: ExactEdge, f: ExactEdge, cos: number): number {
  if (e.cut && f.cut) return Math.PI;
  const angle = Math.acos(Math.max(-1, Math.min(1, cos)));
  return e.cut || f.cut ? Math.min(Math.PI, 2 * angle) : angle;
}

export class BoundarySizer {
  private readonly shapes: EdgeShape[];
  private readonly index: Flatbush;
  /** For each edge, the edges meeting it at a vertex at a wide angle (not across a wall). */
  private readonly touching: Set<number>[];
  private readonly arcLimit: Float64Array;
  private readonly reach: number;

  constructor(private readonly boundary: ExactBoundary, private readonly rules: SizeRules) {
    const { xy, edges } = boundary;
    this.shapes = edges.map((e) => edgeShape(xy, e));
    this.index = new Flatbush(edges.length);
    for (const g of this.shapes) {
      const b = regionBounds([{ xy: Float64Array.of(g.ax, g.ay, g.bx, g.by), bulge: Float64Array.of(Math.tan(g.sweep / 4), 0) }])!;
      this.index.add(b.xmin, b.ymin, b.xmax, b.ymax);
    }
    this.index.finish();
    this.reach = rules.hMax * rules.across;
    this.arcLimit = Float64Array.from(this.shapes, (g) => 8 * rules.sagittaRatio * edgeRadius(g));
    this.touching = edges.map(() => new Set<number>());
    const atVertex = new Map<number, { k: number; end: 'a' | 'b' }[]>();
    edges.forEach((e, k) => {
      for (const end of ['a', 'b'] as const) {
        const v = e[end];
        const list = atVertex.get(v);
        if (list) list.push({ k, end });
        else atVertex.set(v, [{ k, end }]);
      }
    });
    for (const list of atVertex.values())
      for (const p of list)
        for (const q of list) {
          if (p.k === q.k) continue;
          const [ux, uy] = edgeTangentFrom(this.shapes[p.k], p.end);
          const [vx, vy] = edgeTangentFrom(this.shapes[q.k], q.end);
          if (wedgeAngle(edges[p.k], edges[q.k], ux * vx + uy * vy) >= WEDGE_ANGLE) this.touching[p.k].add(q.k);
        }
  }

  /** Wanted element size at parameter t of edge k. */
  at(k: number, t: number): number {
    const [px, py] = edgePoint(this.shapes[k], t);
    const thick = this.thickness(k, px, py);
    const h = Math.min(this.rules.hMax, thick / this.rules.across, this.arcLimit[k]);
    return Math.max(h, this.rules.hMin);
  }

  /**
   * Distance from a point of edge k to the nearest edge across the wall, or Infinity when there is
   * none within `reach` (a wall thicker than hMax × across does not limit the size).
   */
  thickness(k: number, px: number, py: number): number {
    const touching = this.touching[k];
    const reach = this.reach;
    const edges = this.boundary.edges;
    const fromCut = edges[k].cut === true;
    let best = Infinity;
    const e = edges[k];
    for (const f of this.index.search(px - reach, py - reach, px + reach, py + reach)) {
      if (f === k || touching.has(f)) continue;
      const toCut = edges[f].cut === true;
      if (fromCut && toCut) continue;
      let d = distanceToEdge(this.shapes[f], px, py) * (fromCut || toCut ? 2 : 1);
      // Inside a sharp wedge (an edge meeting this one at an acute angle), take the wedge as no
      // sharper than WEDGE_FLOOR: elements may then span the thin tip of a sliver or a cusp
      // (their small angles there come from the input) instead of refining it without end.
      const g = edges[f];
      const v = g.a === e.a || g.b === e.a ? e.a : g.a === e.b || g.b === e.b ? e.b : -1;
      if (v >= 0) {
        const xy = this.boundary.xy;
        d = Math.max(d, Math.hypot(px - xy[2 * v], py - xy[2 * v + 1]) * SIN_WEDGE_FLOOR);
      }
      if (d < best) best = d;
    }
    return best;
  }
}
