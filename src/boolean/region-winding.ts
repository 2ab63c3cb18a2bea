/**
 * The winding number of a region (signed loops of lines and arcs) at a point clear of every
 * segment's box, which is how the booleans ask. A segment's box is its chord's for a line and
 * its whole circle's for an arc, so the point lies outside every arc's circle, where an arc and
 * its chord cross a ray from the point the same number of times (the circular segment between
 * them holds no such point): the usual crossing rule on the chords gives the exact winding
 * number, with no tolerance.
 *
 * The segments are found through a flatbush index of their boxes when there are many, so asking
 * for thousands of points of a region with thousands of loops stays near-linear.
 */
import Flatbush from 'flatbush';
import { arcFromChord, lengthOf, type Region } from '../geometry/contour';

/** The segments of a region as flat arrays: each one's ends, and a box around it ([xmin, ymin, xmax, ymax]; an arc's whole circle). */
export class RegionSegments {
  /** ax, ay, bx, by of each segment. */
  private readonly ends: Float64Array;
  private readonly boxes: Float64Array;
  readonly length: number;
  /**
   * True when an arc is very flat (radius over 1e4 × its chord): its circle's box is far too big
   * to tell anything. Callers then take the general path.
   */
  readonly hasFlatArc: boolean = false;
  private index: Flatbush | null = null;
  private asked = 0;
  private maxX = -Infinity;

  constructor(region: Region) {
    let n = 0;
    for (const c of region) if (c.xy.length >= 4) n += c.xy.length >> 1;
    this.length = n;
    const ends = (this.ends = new Float64Array(4 * n));
    const boxes = (this.boxes = new Float64Array(4 * n));
    let k = 0;
    for (const c of region) {
      const xy = c.xy, m = xy.length >> 1;
      if (m < 2) continue;
      for (let i = 0; i < m; i++, k++) {
        const j = i + 1 === m ? 0 : i + 1;
        const ax = xy[2 * i], ay = xy[2 * i + 1], bx = xy[2 * j], by = xy[2 * j + 1];
        ends[4 * k] = ax;
        ends[4 * k + 1] = ay;
        ends[4 * k + 2] = bx;
        ends[4 * k + 3] = by;
        const b = c.bulge ? c.bulge[i] : 0;
        if (b === 0) {
          boxes[4 * k] = Math.min(ax, bx);
          boxes[4 * k + 1] = Math.min(ay, by);
          boxes[4 * k + 2] = Math.max(ax, bx);
          boxes[4 * k + 3] = Math.max(ay, by);
        } else {
          const { cx, cy, r } = arcFromChord(ax, ay, bx, by, 4 * Math.atan(b));
          if (!(r <= 1e4 * lengthOf(bx - ax, by - ay))) this.hasFlatArc = true;
          boxes[4 * k] = cx - r;
          boxes[4 * k + 1] = cy - r;
          boxes[4 * k + 2] = cx + r;
          boxes[4 * k + 3] = cy + r;
        }
        if (boxes[4 * k + 2] > this.maxX) this.maxX = boxes[4 * k + 2];
      }
    }
  }

  /**
   * The flatbush index of the segments' boxes once it pays: never for a few segments, and only
   * after the first 32 questions (one clip against a large outline costs no index, nor do the
   * holes of one part; sorting a few hundred boxes cost more than reading them that often).
   */
  private indexed(): Flatbush | null {
    if (!this.index && (this.length <= 32 || ++this.asked <= 32)) return null;
    if (!this.index) {
      const n = this.length, b = this.boxes;
      const idx = new Flatbush(n);
      for (let k = 0; k < n; k++) idx.add(b[4 * k], b[4 * k + 1], b[4 * k + 2], b[4 * k + 3]);
      idx.finish();
      this.index = idx;
    }
    return this.index;
  }

  /** True when some segment's box meets the box (x0, y0)–(x1, y1). */
  meets(x0: number, y0: number, x1: number, y1: number): boolean {
    const idx = this.indexed();
    if (idx) return idx.collides(x0, y0, x1, y1);
    const b = this.boxes;
    for (let k = 0; k < this.length; k++) if (!(b[4 * k] > x1 || b[4 * k + 2] < x0 || b[4 * k + 1] > y1 || b[4 * k + 3] < y0)) return true;
    return false;
  }

  /** The point a winding number is being counted at, and the count so far (see windingAt). */
  private wx = 0;
  private wy = 0;
  private w = 0;
  /** Adds segment k's crossing to the count; as a search filter it keeps nothing, so no list is built. */
  private readonly count = (k: number): boolean => {
    const e = this.ends;
    this.w += chordWinding(e[4 * k], e[4 * k + 1], e[4 * k + 2], e[4 * k + 3], this.wx, this.wy);
    return false;
  };

  /**
   * The winding number at (x, y), a point outside every segment's box (see above): only
   * segments whose box reaches the ray to +x can count.
   */
  windingAt(x: number, y: number): number {
    const x1 = Math.max(x, this.maxX);
    this.wx = x;
    this.wy = y;
    this.w = 0;
    const idx = this.indexed();
    if (idx) idx.search(x, y, x1, y, this.count);
    else {
      const b = this.boxes;
      for (let k = 0; k < this.length; k++) if (!(b[4 * k] > x1 || b[4 * k + 2] < x || b[4 * k + 1] > y || b[4 * k + 3] < y)) this.count(k);
    }
    return this.w;
  }
}

/** One chord's share of the winding number at (x, y): the crossing rule of carriers.ts, windingOf. */
function chordWinding(ax: number, ay: number, bx: number, by: number, x: number, y: number): number {
  let side = (bx - ax) * (y - ay) - (x - ax) * (by - ay);
  if (side === 0) side = bx !== ax ? bx - ax : ay - by;
  if (ay <= y) return by > y && side > 0 ? 1 : 0;
  return by <= y && side < 0 ? -1 : 0;
}
