/**
 * Steps 1 and 2: exact carriers from the source contours, then every contact between carriers
 * (crossings, touches, overlaps) computed once and shared as an exact node by both sides.
 */
import { arcFromBulge, lengthOf, pushArc } from '../geometry/contour';
import {
  ARC, curveIntersections, distToCarrier, implicitAt, makeArc, makeLine, paramOf, polishIntersection,
  sameCurve, type Carrier,
} from './carriers';
import { type Ctx, type SourceGroup, find, union, newNode, nodeCarriers, SAG_MAX, SAG_FLOOR, FLAT_RADIUS } from './context';
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
        // their digits) is traced as its chord and gets its sweep back on output.
        const phi = b !== 0 ? 4 * Math.atan(b) : 0;
        const rr = phi !== 0 ? lengthOf(bx - ax, by - ay) / (2 * Math.sin(Math.abs(phi) / 2)) : Infinity;
        if (phi !== 0 && rr <= FLAT_RADIUS * ctx.ext) {
          const { cx, cy, r } = arcFromBulge(ax, ay, bx, by, b);
          car = makeArc(ctx.store, id, g.group, ax, ay, bx, by, cx, cy, r, phi, b);
        } else car = makeLine(ctx.store, id, g.group, ax, ay, bx, by, phi, b);
        car.n0 = node0 + i;
        car.n1 = node0 + j;
        ctx.carriers.push(car);
        ctx.splits.push(null);
        ctx.sag.push(car.kind === ARC ? SAG_MAX * car.r : 0);
        ctx.side.push(0);
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
  if (a.kind === ARC && b.kind === ARC) refineNested(ctx, a, b);
  if (a.kind === ARC) refineNearVertex(ctx, a, b);
  if (b.kind === ARC) refineNearVertex(ctx, b, a);
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
 * sagitta, circumscribed ones (tangent segments) stay outside it. Features that come closer to
 * an arc than the sagitta, without meeting it, demand a side: a nested circle just inside wants
 * the outer arc circumscribed and the inner one inscribed; a vertex just inside wants the arc
 * circumscribed, one just outside wants it inscribed. Both demands at once: finer chords.
 */
export const INSCRIBE = 1;
export const CIRCUMSCRIBE = 2;

function demand(ctx: Ctx, c: Carrier, side: number, gap: number): void {
  ctx.side[c.id] |= side;
  const want = Math.max(gap / 2.5, SAG_FLOOR * c.r);
  if (want < ctx.sag[c.id]) ctx.sag[c.id] = want;
}

/** Nested, nearly tangent circles (the inner within a sagitta of the outer). */
function refineNested(ctx: Ctx, a: Carrier, b: Carrier): void {
  const D = lengthOf(a.cx - b.cx, a.cy - b.cy);
  const gap = Math.abs(a.r - b.r) - D;
  const outer = a.r >= b.r ? a : b, inner = outer === a ? b : a;
  if (!(gap > 0) || gap >= 2 * SAG_MAX * outer.r) return;
  demand(ctx, outer, CIRCUMSCRIBE, gap);
  demand(ctx, inner, INSCRIBE, gap);
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
    demand(ctx, a, d < a.r ? CIRCUMSCRIBE : INSCRIBE, gap);
  }
}

/** Step 2: all pairwise contacts; the broad phase is spatial.ts forEachNearPair. */
export function buildArrangement(ctx: Ctx): void {
  ctx.crowded = new Uint8Array(ctx.carriers.length);
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
    ctx.crowded[a.id] = 1;
    ctx.crowded[b.id] = 1;
    intersectPair(ctx, a, b);
  });
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
