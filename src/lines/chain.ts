/**
 * Line elements: open or closed chains of straight segments and circular arcs, with no area.
 *
 * A weld run or a centreline is a chain. It uses the contour conventions of
 * src/geometry/contour.ts (interleaved vertices, bulge = tan(sweep/4) per segment, y up, CCW
 * positive), with one difference: a chain may be open. An open chain of n vertices has n − 1
 * segments; a closed chain has n (the closing vertex is not repeated, as for a contour).
 *
 * Segment k of a chain built from a path is segments[k] of that path, one to one (arcs are not
 * split here), so every message can say which segment it means. A bulge may therefore exceed 1
 * (sweep over 180°); it stays finite because an arc cannot end where it starts.
 */
import { sweepThrough, type Contour, type Vec2 } from '../geometry/contour';

export interface LineChain {
  /** Vertices, interleaved [x0, y0, x1, y1, ...]. */
  readonly xy: Float64Array;
  /** One entry per segment: tan(sweep/4), 0 for a line. Null when every segment is straight. */
  readonly bulge: Float64Array | null;
  /** True when a last segment runs from the last vertex back to the first. */
  readonly closed: boolean;
}

/** A line group: several separate chains whose line moments add. */
export type LineGroup = readonly LineChain[];

/** Where a problem lies: the chain (index in its group) and the segment (index in its chain). */
export interface LineWhere {
  chain?: number;
  segment?: number;
  /** A second segment, when two pieces of the same chain are involved. */
  other?: number;
}

/** A line group or a strip that cannot be used, with a message saying what and where. */
export class LineError extends Error {
  readonly where: LineWhere;
  constructor(message: string, where: LineWhere = {}) {
    super(message);
    this.name = 'LineError';
    this.where = where;
  }
}

/** One segment's data: from a to b, signed sweep (0 for a line). */
export interface ChainSegment {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  sweep: number;
}

export function vertexCount(c: LineChain): number {
  return c.xy.length >> 1;
}

export function segmentCount(c: LineChain): number {
  const n = c.xy.length >> 1;
  if (n < 2) return 0;
  return c.closed ? n : n - 1;
}

/** Segment i of a chain. */
export function chainSegment(c: LineChain, i: number): ChainSegment {
  const n = c.xy.length >> 1;
  const j = i + 1 === n ? 0 : i + 1;
  const b = c.bulge ? c.bulge[i] : 0;
  return { ax: c.xy[2 * i], ay: c.xy[2 * i + 1], bx: c.xy[2 * j], by: c.xy[2 * j + 1], sweep: b === 0 ? 0 : 4 * Math.atan(b) };
}

/** Build a chain from interleaved vertices and optional per-segment bulges. */
export function chainFrom(xy: ArrayLike<number>, bulge: ArrayLike<number> | null = null, closed = false): LineChain {
  const pts = Float64Array.from(xy);
  const n = pts.length >> 1;
  const segs = n < 2 ? 0 : closed ? n : n - 1;
  let b: Float64Array | null = null;
  if (bulge) {
    if (bulge.length !== segs) throw new LineError(`chainFrom: expected ${segs} bulges (one per segment), got ${bulge.length}`);
    b = Float64Array.from(bulge);
    if (b.every((v) => v === 0)) b = null;
  }
  return { xy: pts, bulge: b, closed };
}

/**
 * A chain from a start point and path segments: `{to}` is a straight line, `{to, via}` the circular
 * arc from the current point through via to to (as in the document's paths, but open).
 * Throws LineError naming segments[k] for a bad segment.
 */
export function chainFromPath(start: Vec2, segments: readonly { to: Vec2; via?: Vec2 }[]): LineChain {
  if (!isPoint(start)) throw new LineError('start: the start point must be two finite numbers');
  const xy: number[] = [start[0], start[1]];
  const bulge: number[] = [];
  let cx = start[0], cy = start[1];
  segments.forEach((g, k) => {
    if (!isPoint(g.to)) throw new LineError(`segments[${k}].to: the end point must be two finite numbers`, { segment: k });
    const [tx, ty] = g.to;
    if (g.via !== undefined) {
      if (!isPoint(g.via)) throw new LineError(`segments[${k}].via: the arc's middle point must be two finite numbers`, { segment: k });
      if (tx === cx && ty === cy) {
        throw new LineError(`segments[${k}]: an arc cannot end where it starts; draw a full circle as two arcs`, { segment: k });
      }
      const phi = sweepThrough(cx, cy, g.via[0], g.via[1], tx, ty);
      if (!Number.isFinite(phi)) throw new LineError(`segments[${k}].via: the arc's three points lie on one line`, { segment: k });
      bulge.push(Math.tan(phi / 4));
    } else bulge.push(0);
    xy.push(tx, ty);
    cx = tx;
    cy = ty;
  });
  return chainFrom(xy, bulge, false);
}

/** A closed contour (an area's boundary) read as a closed line, e.g. a weld all round. */
export function chainFromContour(c: Contour): LineChain {
  const n = c.xy.length >> 1;
  return chainFrom(c.xy, c.bulge ?? new Float64Array(n), true);
}

/** The same chain traversed the other way (line moments do not change). */
export function reverseChain(c: LineChain): LineChain {
  const n = c.xy.length >> 1;
  const m = segmentCount(c);
  const xy = new Float64Array(2 * n);
  // Open: new vertex i is old n−1−i. Closed: keep vertex 0 first, then run backwards.
  for (let i = 0; i < n; i++) {
    const o = c.closed ? (n - i) % n : n - 1 - i;
    xy[2 * i] = c.xy[2 * o];
    xy[2 * i + 1] = c.xy[2 * o + 1];
  }
  let bulge: Float64Array | null = null;
  if (c.bulge) {
    bulge = new Float64Array(m);
    // Open: new segment i is old m−1−i. Closed: new segment i runs from old vertex (n−i)%n back to
    // old vertex n−1−i, i.e. old segment n−1−i.
    for (let i = 0; i < m; i++) bulge[i] = -c.bulge[m - 1 - i];
  }
  return { xy, bulge, closed: c.closed };
}

/** Apply the affine map p -> (a*x + b*y + e, c*x + d*y + f). A reflection flips each bulge. */
export function transformChain(ch: LineChain, a: number, b: number, c: number, d: number, e: number, f: number): LineChain {
  const n = ch.xy.length >> 1;
  const xy = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    const x = ch.xy[2 * i], y = ch.xy[2 * i + 1];
    xy[2 * i] = a * x + b * y + e;
    xy[2 * i + 1] = c * x + d * y + f;
  }
  const flip = a * d - b * c < 0;
  const bulge = ch.bulge ? (flip ? ch.bulge.map((v) => -v) : Float64Array.from(ch.bulge)) : null;
  return { xy, bulge, closed: ch.closed };
}

/**
 * Refuse a group that holds unusable numbers, naming the chain and segment: a non-finite
 * coordinate or bulge, a closed chain with fewer than two vertices, an arc whose ends coincide.
 */
export function checkGroup(group: LineGroup): void {
  group.forEach((c, ci) => {
    const n = c.xy.length >> 1;
    for (let i = 0; i < n; i++) {
      if (!Number.isFinite(c.xy[2 * i]) || !Number.isFinite(c.xy[2 * i + 1])) {
        throw new LineError(`chain ${ci}: point ${i}: the coordinates must be finite numbers`, { chain: ci, segment: Math.max(0, i - 1) });
      }
    }
    const m = segmentCount(c);
    for (let i = 0; i < m; i++) {
      const s = chainSegment(c, i);
      if (!Number.isFinite(s.sweep) || Math.abs(s.sweep) >= 2 * Math.PI) {
        throw new LineError(`chain ${ci}: segments[${i}]: the arc's bulge is not a usable number`, { chain: ci, segment: i });
      }
      if (s.sweep !== 0 && s.ax === s.bx && s.ay === s.by) {
        throw new LineError(`chain ${ci}: segments[${i}]: an arc cannot end where it starts; draw a full circle as two arcs`, { chain: ci, segment: i });
      }
    }
  });
}

function isPoint(p: unknown): p is Vec2 {
  return Array.isArray(p) && p.length === 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]);
}
