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
import { arcFromChord, type Contour, type Region } from '../geometry/contour';

interface Seg {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  /** Signed sweep (0 for a line), and for an arc its circle. */
  phi: number;
  cx: number;
  cy: number;
  r: number;
}

/** The segments of a region and a box around each ([xmin, ymin, xmax, ymax]; an arc's whole circle). */
export class RegionSegments {
  readonly segs: Seg[] = [];
  readonly boxes: Float64Array;
  /**
   * True when an arc is very flat (radius over 1e4 × its chord): its circle's box is far too big
   * to tell anything, and its centre too far away to count windings with. Callers then take the
   * general path.
   */
  readonly hasFlatArc: boolean;
  private index: Flatbush | null = null;
  private maxX = -Infinity;

  constructor(region: Region) {
    for (const c of region) addContour(this.segs, c);
    this.hasFlatArc = this.segs.some((g) => g.phi !== 0 && !(g.r <= 1e4 * Math.hypot(g.bx - g.ax, g.by - g.ay)));
    this.boxes = new Float64Array(4 * this.segs.length);
    this.segs.forEach((s, k) => {
      const b = this.boxes;
      if (s.phi === 0) {
        b[4 * k] = Math.min(s.ax, s.bx);
        b[4 * k + 1] = Math.min(s.ay, s.by);
        b[4 * k + 2] = Math.max(s.ax, s.bx);
        b[4 * k + 3] = Math.max(s.ay, s.by);
      } else {
        b[4 * k] = s.cx - s.r;
        b[4 * k + 1] = s.cy - s.r;
        b[4 * k + 2] = s.cx + s.r;
        b[4 * k + 3] = s.cy + s.r;
      }
      if (b[4 * k + 2] > this.maxX) this.maxX = b[4 * k + 2];
    });
  }

  get length(): number {
    return this.segs.length;
  }

  private near(x0: number, y0: number, x1: number, y1: number): Iterable<number> {
    const n = this.segs.length;
    if (n <= 32) {
      const out: number[] = [];
      const b = this.boxes;
      for (let k = 0; k < n; k++) if (!(b[4 * k] > x1 || b[4 * k + 2] < x0 || b[4 * k + 1] > y1 || b[4 * k + 3] < y0)) out.push(k);
      return out;
    }
    if (!this.index) {
      const idx = new Flatbush(n);
      const b = this.boxes;
      for (let k = 0; k < n; k++) idx.add(b[4 * k], b[4 * k + 1], b[4 * k + 2], b[4 * k + 3]);
      idx.finish();
      this.index = idx;
    }
    return this.index.search(x0, y0, x1, y1);
  }

  /** True when some segment's box meets the box (x0, y0)–(x1, y1). */
  meets(x0: number, y0: number, x1: number, y1: number): boolean {
    for (const _ of this.near(x0, y0, x1, y1)) return true;
    return false;
  }

  /**
   * The winding number at (x, y), a point outside every segment's box (see above): only
   * segments whose box reaches the ray to +x can count.
   */
  windingAt(x: number, y: number): number {
    let w = 0;
    for (const k of this.near(x, y, Math.max(x, this.maxX), y)) w += segmentWinding(this.segs[k], x, y);
    return w;
  }
}

function addContour(out: Seg[], c: Contour): void {
  const xy = c.xy, n = xy.length >> 1;
  if (n < 2) return;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const ax = xy[2 * i], ay = xy[2 * i + 1], bx = xy[2 * j], by = xy[2 * j + 1];
    const b = c.bulge ? c.bulge[i] : 0;
    if (b === 0) out.push({ ax, ay, bx, by, phi: 0, cx: 0, cy: 0, r: 0 });
    else {
      const phi = 4 * Math.atan(b);
      const { cx, cy, r } = arcFromChord(ax, ay, bx, by, phi);
      out.push({ ax, ay, bx, by, phi, cx, cy, r });
    }
  }
}

/** One chord's share of the winding number at (x, y): the crossing rule of carriers.ts, windingOf. */
function segmentWinding(s: Seg, x: number, y: number): number {
  const { ax, ay, bx, by } = s;
  let side = (bx - ax) * (y - ay) - (x - ax) * (by - ay);
  if (side === 0) side = bx !== ax ? bx - ax : ay - by;
  if (ay <= y) return by > y && side > 0 ? 1 : 0;
  return by <= y && side < 0 ? -1 : 0;
}
