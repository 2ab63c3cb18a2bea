/**
 * Steps 1 and 2: exact carriers from the source contours, then every contact between carriers
 * (crossings, touches, overlaps) computed once and shared as an exact node by both sides.
 */
import { arcFromBulge, lengthOf, pushArc } from '../geometry/contour';
import {
  ARC, curveIntersections, distToCarrier, distToCurve, implicitAt, makeArc, makeLine, paramOf, polishIntersection,
  sameCurve, wrapAngle, type Carrier,
} from './carriers';
import { type Ctx, type SourceGroup, find, union, newNode, nodeCarriers, SAG_MAX, SAG_FLOOR, FLAT_RADIUS } from './context';
import { NODE_UNITS } from './grid';
import { forEachNearPair } from './spatial';

/** Step 1: carriers and vertex nodes from the source contours. */
/** Every vertex finite and every bulge finite and within [−1, 1]. */
function plainContour(xy: Float64Array, bulge: Float64Array | null): boolean {
  for (let i = 0; i < xy.length; i++) if (!Number.isFinite(xy[i])) return false;
  if (bulge) for (let i = 0; i < bulge.length; i++) if (!(Math.abs(bulge[i]) <= 1)) return false;
  return true;
}

let scratch = new Float64Array(3 * 64);

export function buildCarriers(ctx: Ctx, groups: readonly SourceGroup[]): void {
  const eps = ctx.eps;
  for (const g of groups) {
    for (const c of g.contours) {
      const n = c.xy.length >> 1;
      if (n < 2) continue;
      // Expand arcs over 180 degrees, then drop repeated vertices (zero-length edges). A contour
      // with finite vertices and no such arc (the usual case) is read as it is.
      let xy: ArrayLike<number> = c.xy, bl: ArrayLike<number> | null = c.bulge;
      if (!plainContour(c.xy, c.bulge)) {
        const exy: number[] = [], ebl: number[] = [];
        for (let i = 0; i < n; i++) {
          const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
          const j = (i + 1) % n;
          const bx = c.xy[2 * j], by = c.xy[2 * j + 1];
          const b = c.bulge ? c.bulge[i] : 0;
          if (!Number.isFinite(ax) || !Number.isFinite(ay)) continue;
          exy.push(ax, ay);
          if (Number.isFinite(b) && b !== 0 && Math.abs(b) > 1) pushArc(exy, ebl, ax, ay, bx, by, 4 * Math.atan(b));
          else ebl.push(Number.isFinite(b) ? b : 0);
        }
        xy = exy;
        bl = ebl;
      }
      const m0 = xy.length >> 1;
      // The kept vertices go to buffers shared by all calls (read only below, within this loop):
      // three small arrays per loop were a large share of the allocation for thousands of holes.
      if (scratch.length < 3 * m0) scratch = new Float64Array(Math.max(3 * m0, 2 * scratch.length));
      const v = scratch, VY = m0, VB = 2 * m0; // x at v[i], y at v[VY + i], bulge at v[VB + i]
      let m = 0;
      for (let i = 0; i < m0; i++) {
        const x = xy[2 * i], y = xy[2 * i + 1];
        const bi = bl ? bl[i] : 0;
        if (m > 0 && lengthOf(x - v[m - 1], y - v[VY + m - 1]) <= eps) {
          v[VB + m - 1] = bi; // the zero-length edge goes; the next edge starts at the kept vertex
          continue;
        }
        v[m] = x;
        v[VY + m] = y;
        v[VB + m] = bi;
        m++;
      }
      // Closing duplicates; the surviving last vertex keeps its own outgoing bulge only if distinct.
      while (m > 1 && lengthOf(v[m - 1] - v[0], v[VY + m - 1] - v[VY + 0]) <= eps) m--;
      if (m < 2) continue;
      // Node i joins carriers i − 1 and i (ids are consecutive from the first).
      const first = ctx.carriers.length, node0 = ctx.nx.length;
      // Vertex i starts carrier first + i; with node and carrier numbers in step (as they are
      // while only carriers make nodes) its carrier list is left to nodeCarriers.
      const lazy = node0 === first;
      for (let i = 0; i < m; i++) newNode(ctx, v[i], v[VY + i], lazy ? null : [first + ((i + m - 1) % m), first + i]);
      const ids: number[] = new Array(m);
      for (let i = 0; i < m; i++) {
        const j = i + 1 === m ? 0 : i + 1;
        const ax = v[i], ay = v[VY + i], bx = v[j], by = v[VY + j];
        const b = v[VB + i];
        const id = first + i;
        let car: Carrier;
        // A nearly flat arc (radius far beyond the extent, where centre-based formulas lose
        // their digits) is traced as its chord and gets its sweep back on output. One that rises
        // less than 1e-20 of the extent above its chord is a straight edge here (a bulge of 4e-323
        // is a subnormal number with a digit or two, and its square is zero): the area between
        // them is far below round-off.
        const flatOut = b !== 0 && Math.abs(b) * lengthOf(bx - ax, by - ay) < 2e-20 * ctx.ext;
        const phi = b !== 0 && !flatOut ? 4 * Math.atan(b) : 0;
        const rr = phi !== 0 ? lengthOf(bx - ax, by - ay) / (2 * Math.sin(Math.abs(phi) / 2)) : Infinity;
        if (phi !== 0 && rr <= FLAT_RADIUS * ctx.ext) {
          const { cx, cy, r } = arcFromBulge(ax, ay, bx, by, b);
          car = makeArc(ctx.store, id, g.group, ax, ay, bx, by, cx, cy, r, phi, b);
        } else car = makeLine(ctx.store, id, g.group, ax, ay, bx, by, phi, phi === 0 ? 0 : b);
        car.n0 = node0 + i;
        car.n1 = node0 + j;
        ctx.carriers.push(car);
        ctx.splits.push(null);
        ctx.near.push(null);
        ctx.chordSag.push(0);
        ids[i] = id;
      }
      for (let k = 0; k < ids.length; k++) ctx.loopOf.push(ctx.loops.length);
      ctx.loops.push({ group: g.group, ids });
      ctx.touched.push(0);
      for (let k = 0; k < ids.length; k++) {
        ctx.loopLo.push(ids[0]);
        ctx.loopHi.push(ids[ids.length - 1]);
      }
    }
  }
}

function endpointNode(ctx: Ctx, c: Carrier, x: number, y: number): number {
  const d0 = lengthOf(x - c.ax, y - c.ay), d1 = lengthOf(x - c.bx, y - c.by);
  if (d0 <= ctx.eps && d0 <= d1) return c.n0;
  if (d1 <= ctx.eps) return c.n1;
  return -1;
}

function addSplit(ctx: Ctx, c: Carrier, node: number): void {
  (ctx.splits[c.id] ??= []).push(node);
  nodeCarriers(ctx, node).push(c.id);
}

/** Carriers a and b meet away from a vertex they share: their loops interact. */
function touch(ctx: Ctx, a: Carrier, b: Carrier): void {
  ctx.contact = true;
  ctx.touched[ctx.loopOf[a.id]] = 1;
  ctx.touched[ctx.loopOf[b.id]] = 1;
}

/** A common point p of carriers a and b: share it as one exact node. */
function sharePoint(ctx: Ctx, a: Carrier, b: Carrier, x: number, y: number): void {
  const ea = endpointNode(ctx, a, x, y), eb = endpointNode(ctx, b, x, y);
  if (ea >= 0 && eb >= 0) {
    if (find(ctx, ea) !== find(ctx, eb)) {
      union(ctx, ea, eb);
      touch(ctx, a, b);
    }
    return;
  }
  touch(ctx, a, b);
  if (ea >= 0) addSplit(ctx, b, ea);
  else if (eb >= 0) addSplit(ctx, a, eb);
  else {
    const n = newNode(ctx, x, y);
    addSplit(ctx, a, n);
    addSplit(ctx, b, n);
  }
}

function intersectPair(ctx: Ctx, a: Carrier, b: Carrier): void {
  const eps = ctx.eps;
  if (sameCurve(a, b, eps)) {
    // Overlapping collinear lines or co-circular arcs: each one's ends split the other.
    if (distToCarrier(a, b.ax, b.ay) <= eps) sharePoint(ctx, a, b, b.ax, b.ay);
    if (distToCarrier(a, b.bx, b.by) <= eps) sharePoint(ctx, a, b, b.bx, b.by);
    if (distToCarrier(b, a.ax, a.ay) <= eps) sharePoint(ctx, a, b, a.ax, a.ay);
    if (distToCarrier(b, a.bx, a.by) <= eps) sharePoint(ctx, a, b, a.bx, a.by);
    return;
  }
  const pts = curveIntersections(a, b, eps);
  for (let k = 0; k < pts.length; k += 2) {
    let x = pts[k], y = pts[k + 1];
    let ea = endpointNode(ctx, a, x, y), eb = endpointNode(ctx, b, x, y);
    // Neighbours meeting at their shared vertex: nothing to do.
    if (ea >= 0 && eb >= 0 && find(ctx, ea) === find(ctx, eb)) continue;
    [x, y] = polishIntersection(a, b, x, y);
    // Prefer an exact source vertex that lies on the other carrier (touching vertex).
    ea = endpointNode(ctx, a, x, y);
    eb = endpointNode(ctx, b, x, y);
    if (ea >= 0) {
      x = ctx.nx[ea];
      y = ctx.ny[ea];
    } else if (eb >= 0) {
      x = ctx.nx[eb];
      y = ctx.ny[eb];
    }
    if (distExact(a, x, y) <= eps && distExact(b, x, y) <= eps) sharePoint(ctx, a, b, x, y);
  }
}

/** Ends of b that lie on a (and ends of a on b), away from their shared vertex. */
function touchEnds(ctx: Ctx, a: Carrier, b: Carrier): void {
  touchEnd(ctx, a, b, b.ax, b.ay);
  touchEnd(ctx, a, b, b.bx, b.by);
  touchEnd(ctx, b, a, a.ax, a.ay);
  touchEnd(ctx, b, a, a.bx, a.by);
}

/** The end (x, y) of carrier `of`, when it lies on carrier `on` away from their shared vertex. */
function touchEnd(ctx: Ctx, on: Carrier, of: Carrier, x: number, y: number): void {
  // Within eps of the carrier means within its box widened by eps (boxes hold the whole curve):
  // most far ends of a neighbour are ruled out by four comparisons.
  const w = 2 * ctx.eps;
  if (x < on.xmin - w || x > on.xmax + w || y < on.ymin - w || y > on.ymax + w) return;
  if (endpointNode(ctx, on, x, y) >= 0) return; // the shared vertex (or a merged one)
  if (distExact(on, x, y) <= ctx.eps) sharePoint(ctx, on, of, x, y);
}

/** Distance to the carrier's true curve within its range (a flat arc is not its chord here). */
function distExact(c: Carrier, x: number, y: number): number {
  if (c.kind === ARC || c.flat === 0) return distToCarrier(c, x, y);
  const u = paramOf(c, x, y);
  if (u < 0 || u > 1) return Math.min(lengthOf(x - c.ax, y - c.ay), lengthOf(x - c.bx, y - c.by));
  const [f, gx, gy] = implicitAt(c, x, y);
  return Math.abs(f) / lengthOf(gx, gy);
}

/**
 * Which side an arc's chords must keep to. Inscribed chords cut inside the circle by up to the
 * sagitta, circumscribed ones (tangent segments) stay outside it. Whatever comes closer to an
 * arc than that demands a side of the pieces near it: what lies just inside wants them
 * circumscribed, what lies just outside wants them inscribed, each with its distance from the
 * arc (its gap). A piece with both demands keeps to the side whose gap is the larger, with chords
 * fine enough to stay within that gap (chords.ts).
 *
 * A nested circle is near all round; a vertex, a straight edge that runs just outside, or a
 * circle alongside is near some pieces; a nearly equal circle that crosses the arc is inside it
 * along one lune and outside along the other, so each piece takes the side of its own lune.
 */
export const INSCRIBE = 1;
export const CIRCUMSCRIBE = 2;

/** The sagitta allowed for chords that must pass between an arc and a feature `gap` away. */
export function sagFor(c: Carrier, gap: number): number {
  return Math.max(gap / 2.5, SAG_FLOOR * c.r);
}

/** Numbers per record of ctx.near, and the two kinds of record. */
export const NEAR_SIZE = 6;
/**
 * [NEAR_ZONE, angle, half, side, gap, 0]: something `gap` from the arc within `half` radians of
 * the direction `angle` from its centre; it demands `side` of every piece that reaches into
 * that zone.
 */
export const NEAR_ZONE = 0;
/**
 * [NEAR_CIRCLE, cx, cy, r, tIn, tOut]: a nearly equal circle that crosses the arc's circle. A
 * piece inside it borders the lune of thickness tIn (the other circle is just outside the arc
 * there: inscribe), a piece outside it the lune of thickness tOut (circumscribe).
 */
export const NEAR_CIRCLE = 1;
/**
 * How near (times the radius) something must come to an arc to demand a side: beyond the
 * chords' reach, SAG_MAX r inside and up to 2.3 SAG_MAX r outside, with a margin.
 */
export const LUNE_MAX = 4 * SAG_MAX;

function nearDemand(ctx: Ctx, c: Carrier, kind: number, a: number, b: number, d: number, e: number, f: number): void {
  const list = (ctx.near[c.id] ??= []);
  list.push(kind, a, b, d, e, f);
}

/** Nested, nearly tangent circles (the inner within a sagitta of the outer), centres D apart: a's side all round. */
function refineNested(ctx: Ctx, a: Carrier, b: Carrier, D: number): void {
  const gap = Math.abs(a.r - b.r) - D;
  if (!(gap > 0) || gap >= 2 * SAG_MAX * Math.max(a.r, b.r)) return;
  nearDemand(ctx, a, NEAR_ZONE, 0, Math.PI, a.r >= b.r ? CIRCUMSCRIBE : INSCRIBE, gap, 0);
  noteNear(ctx, gap);
}

/**
 * Circles that cross, or pass each other, closer than the chords' reach.
 *
 * Nearly equal circles with nearly the same centre: the two lunes between them (each bounded by
 * one piece of either arc between the crossings) are thin. Along each lune the outer piece must
 * be circumscribed and the inner one inscribed.
 *
 * Circles side by side that nearly touch, or overlap in a thin lens: each arc keeps inside its
 * own circle near the other one (inscribed chords on both never meet, the lens's common chord
 * lies between them).
 */
function refineCrossing(ctx: Ctx, a: Carrier, b: Carrier, D: number): void {
  if (!(D > Math.abs(a.r - b.r))) return; // nested: refineNested
  if (D < a.r + b.r) {
    // Along the side of a facing b's centre, b reaches D + rb - ra beyond a; on the far side,
    // a reaches D + ra - rb beyond b.
    const tIn = D + b.r - a.r, tOut = D + a.r - b.r;
    if (Math.min(tIn, tOut) < LUNE_MAX * Math.max(a.r, b.r)) {
      if (!hasCircle(ctx, a, b)) nearDemand(ctx, a, NEAR_CIRCLE, b.cx, b.cy, b.r, tIn, tOut);
      return;
    }
  }
  const lim = LUNE_MAX * a.r, gap = Math.abs(D - a.r - b.r);
  if (!(gap < lim)) return;
  if (D > a.r + b.r) noteNear(ctx, gap);
  // The zone of a within lim of b's circle: the angle θ from the centre line where
  // ra^2 + D^2 - 2 ra D cos θ = (rb + lim)^2.
  const cosA = (a.r * a.r + D * D - (b.r + lim) * (b.r + lim)) / (2 * a.r * D);
  const half = Math.acos(Math.max(-1, Math.min(1, cosA)));
  nearDemand(ctx, a, NEAR_ZONE, Math.atan2(b.cy - a.cy, b.cx - a.cx), half, INSCRIBE, gap, 0);
}

/** True when arc c already has a demand from o's circle (another arc of it, a half circle's other half). */
function hasCircle(ctx: Ctx, c: Carrier, o: Carrier): boolean {
  const list = ctx.near[c.id];
  if (!list) return false;
  for (let k = 0; k < list.length; k += NEAR_SIZE) {
    if (list[k] === NEAR_CIRCLE && list[k + 1] === o.cx && list[k + 2] === o.cy && list[k + 3] === o.r) return true;
  }
  return false;
}

/** Vertices of b within a sagitta of arc a, inside or outside. */
function refineNearVertex(ctx: Ctx, a: Carrier, b: Carrier): void {
  for (let k = 0; k < 2; k++) {
    const x = k === 0 ? b.ax : b.bx, y = k === 0 ? b.ay : b.by;
    const d = lengthOf(x - a.cx, y - a.cy);
    const gap = Math.abs(a.r - d);
    if (!(gap > ctx.eps) || gap >= 1.5 * SAG_MAX * a.r || !(d > 0)) continue;
    const u = paramOf(a, x, y);
    if (u <= 0 || u >= 1) continue;
    // The piece under the vertex, and a piece that starts within two gaps of it along the arc.
    const half = (2 * gap + 3 * ctx.unit) / a.r;
    nearDemand(ctx, a, NEAR_ZONE, Math.atan2(y - a.cy, x - a.cx), half, d < a.r ? CIRCUMSCRIBE : INSCRIBE, gap, 0);
  }
}

/**
 * A straight edge b that passes just outside arc a (or crosses its circle at a shallow angle):
 * where b runs outside the circle within the chords' reach, a's chords must keep inside it.
 * (Inside the circle b's ends are nearest to the arc: refineNearVertex.)
 */
function refineNearLine(ctx: Ctx, a: Carrier, b: Carrier): void {
  const L = b.len;
  if (!(L > 0)) return;
  const ux = (b.bx - b.ax) / L, uy = (b.by - b.ay) / L;
  const s0 = -((a.cx - b.ax) * ux + (a.cy - b.ay) * uy); // b's start, measured from the foot
  const h = Math.abs((a.cx - b.ax) * uy - (a.cy - b.ay) * ux);
  const lim = LUNE_MAX * a.r;
  if (!(h < a.r + lim)) return;
  const fx = b.ax - s0 * ux, fy = b.ay - s0 * uy; // foot of the perpendicular from the centre
  const far = Math.sqrt((a.r + lim - h) * (a.r + lim + h));
  const near = h < a.r ? Math.sqrt((a.r - h) * (a.r + h)) : 0; // inside the circle for |s| < near
  // Outside: b's distance from the arc. Crossing at angle θ (sin θ = near / r): b's distance from
  // the circle a fifth of the radius along from the crossing; closer to it, chords that cross b
  // on clipper's side still hand over at that crossing (trace.ts, placeVertex).
  const gap = h >= a.r ? h - a.r : 0.2 * near;
  // Passing outside: its closest approach, where the foot lies on both.
  if (h >= a.r && s0 <= 0 && s0 + L >= 0) {
    const u = paramOf(a, fx, fy);
    if (u >= 0 && u <= 1) noteNear(ctx, gap);
  }
  for (const sg of [-1, 1]) {
    // The part of b with near <= sg·s <= far.
    const lo = Math.max(near, sg > 0 ? s0 : -(s0 + L)), hi = Math.min(far, sg > 0 ? s0 + L : -s0);
    if (!(hi >= lo)) continue;
    const t1 = Math.atan2(fy + sg * lo * uy - a.cy, fx + sg * lo * ux - a.cx);
    const t2 = Math.atan2(fy + sg * hi * uy - a.cy, fx + sg * hi * ux - a.cx);
    const d = wrapAngle(t2 - t1);
    nearDemand(ctx, a, NEAR_ZONE, t1 + d / 2, Math.abs(d) / 2, INSCRIBE, gap, 0);
  }
}

/**
 * What comes near, for carriers a and b that are not neighbours on a loop (their boxes, widened
 * by nearReach, meet; their contacts are found apart from this):
 * - the sides each arc's chords must keep to (see INSCRIBE above), from every carrier within the
 *   chords' reach of it;
 * - ctx.nearGap, the smallest distance from a vertex to a carrier it does not touch where the
 *   two run nearly parallel, or between two curves that pass each other (an edge outside a
 *   circle, two circles), which asks grid.ts for a finer grid when it is below a few grid units:
 *   two edges that cross at an angle of 1e-8 part by less than a unit over most of their length,
 *   and a circle that passes 4e-8 inside an edge leaves a neck that thin, and only a finer grid
 *   shows them to clipper.
 */
function nearPair(ctx: Ctx, a: Carrier, b: Carrier, g: number): void {
  noteGap(ctx, a, b, b.ax, b.ay, g);
  noteGap(ctx, a, b, b.bx, b.by, g);
  noteGap(ctx, b, a, a.ax, a.ay, g);
  noteGap(ctx, b, a, a.bx, a.by, g);
  if ((a.kind !== ARC && b.kind !== ARC) || sameCurve(a, b, ctx.eps)) return;
  if (a.kind === ARC) demandsOf(ctx, a, b);
  if (b.kind === ARC) demandsOf(ctx, b, a);
}

/** Two curves that pass within `gap` of each other without meeting: ctx.nearGap. */
function noteNear(ctx: Ctx, gap: number): void {
  if (gap > ctx.eps && gap < ctx.nearGap) ctx.nearGap = gap;
}

/** How far beyond its box something can come near carrier c (nearPair): the chords' reach of an arc, a few grid units. */
function nearReach(ctx: Ctx, c: Carrier): number {
  const g = NODE_UNITS * ctx.unit;
  return c.kind === ARC ? Math.max(g, 2 * LUNE_MAX * c.r) : g;
}

/**
 * The end (x, y) of carrier `of`, within g of carrier c but not on it, where the two run nearly
 * parallel (at under 1/8 rad): ctx.nearGap. Where they cross at a larger angle they part within
 * a few grid units, and clipper's crossing of them is as good as the exact one.
 */
function noteGap(ctx: Ctx, c: Carrier, of: Carrier, x: number, y: number, g: number): void {
  if (x < c.xmin - g || x > c.xmax + g || y < c.ymin - g || y > c.ymax + g) return;
  // The whole line or circle first (no angle to compute): the piece is no nearer than that.
  if (c.flat === 0 && distToCurve(c, x, y) > g) return;
  const d = distExact(c, x, y);
  if (!(d > ctx.eps && d < ctx.nearGap)) return;
  const [ux, uy] = directionAt(c, x, y), [vx, vy] = directionAt(of, x, y);
  if (Math.abs(ux * vy - uy * vx) < 0.125) ctx.nearGap = d;
}

/** Unit direction of carrier c at (or beside) the point (x, y): the chord's, or the tangent's of an arc. */
function directionAt(c: Carrier, x: number, y: number): [number, number] {
  if (c.kind === ARC) {
    const dx = x - c.cx, dy = y - c.cy, L = lengthOf(dx, dy) || 1;
    return [-dy / L, dx / L];
  }
  const L = c.len || 1;
  return [(c.bx - c.ax) / L, (c.by - c.ay) / L];
}

/** The demands that carrier b makes of arc a. */
function demandsOf(ctx: Ctx, a: Carrier, b: Carrier): void {
  if (b.kind === ARC) {
    const D = lengthOf(a.cx - b.cx, a.cy - b.cy); // the centres' distance
    refineNested(ctx, a, b, D);
    refineCrossing(ctx, a, b, D);
  } else refineNearLine(ctx, a, b);
  refineNearVertex(ctx, a, b);
}

/**
 * Step 2: all pairwise contacts, and what comes near without touching (nearPair); the broad
 * phase is spatial.ts forEachNearPair, with boxes widened by what comes near.
 */
export function buildArrangement(ctx: Ctx): void {
  const cs = ctx.carriers, eps = ctx.eps, g = NODE_UNITS * ctx.unit;
  ctx.crowded = new Uint8Array(cs.length);
  const grow = new Float64Array(cs.length);
  for (let i = 0; i < cs.length; i++) grow[i] = nearReach(ctx, cs[i]);
  forEachNearPair(ctx, (a, b) => {
    if (ctx.loopLo[a.id] === ctx.loopLo[b.id]) {
      const d = Math.abs(a.id - b.id);
      // Neighbours on a loop meet at their shared vertex. On a well-formed loop (and for two
      // straight edges on any loop, which cannot meet twice unless they overlap) only a far end
      // lying on the other one (a pinched loop, a spike) is left to find.
      const lines = a.kind !== ARC && b.kind !== ARC && a.flat === 0 && b.flat === 0;
      if (d === 1 || d === ctx.loopHi[a.id] - ctx.loopLo[a.id]) {
        if (ctx.trustLoops || lines) {
          touchEnds(ctx, a, b);
          return;
        }
        intersectPair(ctx, a, b);
        return;
      }
    }
    if (!(a.xmin > b.xmax + eps || b.xmin > a.xmax + eps || a.ymin > b.ymax + eps || b.ymin > a.ymax + eps)) {
      ctx.crowded[a.id] = 1;
      ctx.crowded[b.id] = 1;
      intersectPair(ctx, a, b);
    }
    nearPair(ctx, a, b, g);
  }, grow);
  // Merged nodes: the representative carries every member's carriers.
  const nn = ctx.nx.length;
  for (let i = 0; i < nn; i++) {
    const r = find(ctx, i);
    if (r !== i) {
      const into = nodeCarriers(ctx, r);
      for (const c of nodeCarriers(ctx, i)) if (!into.includes(c)) into.push(c);
      ctx.ncar[i] = [];
    }
  }
}
