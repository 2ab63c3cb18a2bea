/**
 * The boundary of a region as exact carriers (lines and circular arcs, from the boolean module's
 * carrier records), grouped by loop, with the facts the net section and the cautions need about
 * each loop: outer boundary or hole (by the sign of its area, since material lies to the left of
 * every loop), and whether it is a full circle (a drilled or cut round hole, with centre and
 * diameter). Plus the exact point tests built on them: winding (inside the material or not) and
 * the distance to the boundary.
 */
import { CarrierStore, makeArc, makeLine, distToCarrier, type Carrier } from '../boolean/carriers';
import { arcFromChord, regionBounds, segmentSweep, type Contour, type Region } from '../geometry/contour';
import { regionMoments } from '../moments/kernel';

export interface BoundarySegment {
  /** Index of the loop (contour) in the region, and of the segment within it. */
  loop: number;
  index: number;
  carrier: Carrier;
}

export interface CircleFit {
  cx: number;
  cy: number;
  r: number;
}

export interface BoundaryLoop {
  index: number;
  /** Material lies to the left of every loop: a positive (CCW) loop bounds a part, a negative one a hole. */
  kind: 'outer' | 'hole';
  signedArea: number;
  /** The loop's circle when every segment is an arc of one circle and the sweeps add to a full turn. */
  circle: CircleFit | null;
  segments: BoundarySegment[];
}

export interface Boundary {
  loops: BoundaryLoop[];
  segments: BoundarySegment[];
  /** Largest side of the exact bounding box (0 for an empty region). */
  extent: number;
  /** Length under which two points count as one: 1e-9 of the extent. */
  tol: number;
}

/** Relative size under which two points are one point (round-off of the exact constructions). */
export const POINT_TOL = 1e-9;

/** The carriers of one contour; zero-length segments are left out. */
function loopCarriers(store: CarrierStore, c: Contour, loop: number, idBase: number): BoundarySegment[] {
  const n = c.xy.length >> 1;
  const out: BoundarySegment[] = [];
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
    if (!(Math.hypot(bx - ax, by - ay) > 0)) continue;
    const phi = segmentSweep(c, i);
    const id = idBase + out.length;
    if (phi === 0) out.push({ loop, index: i, carrier: makeLine(store, id, 0, ax, ay, bx, by) });
    else {
      const a = arcFromChord(ax, ay, bx, by, phi);
      out.push({ loop, index: i, carrier: makeArc(store, id, 0, ax, ay, bx, by, a.cx, a.cy, a.r, phi) });
    }
  }
  return out;
}

/** The circle of a loop made only of arcs of one circle that sweep a full turn, else null. */
export function loopCircle(segs: readonly BoundarySegment[], tol: number): CircleFit | null {
  if (segs.length === 0) return null;
  const first = segs[0].carrier;
  if (first.kind !== 1) return null;
  let sweep = 0;
  for (const s of segs) {
    const c = s.carrier;
    if (c.kind !== 1) return null;
    if (Math.abs(c.r - first.r) > tol || Math.hypot(c.cx - first.cx, c.cy - first.cy) > tol) return null;
    sweep += c.phi;
  }
  if (Math.abs(Math.abs(sweep) - 2 * Math.PI) > 1e-9) return null;
  // Average the centres: every arc's centre comes from its own chord.
  let cx = 0, cy = 0, r = 0;
  for (const s of segs) {
    cx += s.carrier.cx;
    cy += s.carrier.cy;
    r += s.carrier.r;
  }
  return { cx: cx / segs.length, cy: cy / segs.length, r: r / segs.length };
}

/** The boundary of a region, loop by loop. */
export function regionBoundary(region: Region): Boundary {
  const b = regionBounds(region);
  const extent = b ? Math.max(b.xmax - b.xmin, b.ymax - b.ymin) : 0;
  const tol = POINT_TOL * extent;
  const loops: BoundaryLoop[] = [];
  const segments: BoundarySegment[] = [];
  // The carriers' numbers live in one store, indexed by their ids (src/boolean/carriers.ts).
  const store = new CarrierStore();
  region.forEach((c, k) => {
    const segs = loopCarriers(store, c, k, segments.length);
    if (segs.length === 0) return;
    const signedArea = regionMoments([c]).m00;
    loops.push({ index: k, kind: signedArea >= 0 ? 'outer' : 'hole', signedArea, circle: loopCircle(segs, tol), segments: segs });
    segments.push(...segs);
  });
  return { loops, segments, extent, tol };
}

/**
 * Winding contribution of one segment about (x, y): the half-open crossing rule for its chord,
 * plus ±1 when the point lies inside the circular segment between chord and arc. A point exactly
 * on the chord (a hole's centre on a line through two half-circles, the common case) is decided
 * as if it sat an infinitesimal step (ε, ε²) away, the same step that the crossing rule already
 * implies, so chord and segment always agree. (The boolean module's `windingOf` leaves such a
 * point out of the segment, which miscounts it; its callers never meet that case, ours do.)
 */
export function segmentWinding(c: Carrier, x: number, y: number): number {
  const { ax, ay, bx, by } = c;
  const side = (bx - ax) * (y - ay) - (by - ay) * (x - ax);
  let w = 0;
  if (ay <= y) {
    if (by > y && side > 0) w++;
  } else if (by <= y && side < 0) w--;
  if (c.kind === 1 && Math.hypot(x - c.cx, y - c.cy) < c.r) {
    const s = side !== 0 ? side : by !== ay ? ay - by : bx - ax;
    // The arc bulges to the right of a->b for a positive sweep.
    if (c.phi > 0 && s < 0) w++;
    else if (c.phi < 0 && s > 0) w--;
  }
  return w;
}

/** Winding number of the boundary about (x, y): non-zero inside the material. */
export function windingAt(segs: readonly BoundarySegment[], x: number, y: number): number {
  let w = 0;
  for (const s of segs) w += segmentWinding(s.carrier, x, y);
  return w;
}

/** Exact distance from (x, y) to the nearest boundary segment (Infinity when there is none). */
export function distanceToBoundary(segs: readonly BoundarySegment[], x: number, y: number): number {
  let d = Infinity;
  for (const s of segs) {
    const v = distToCarrier(s.carrier, x, y);
    if (v < d) d = v;
  }
  return d;
}

/** The loop of `boundary` with contour index `k`. */
export function loopByIndex(boundary: Boundary, k: number): BoundaryLoop | undefined {
  return boundary.loops.find((l) => l.index === k);
}
