/**
 * Loops that meet no other loop need no grid. The arrangement knows exactly which loops touch
 * (another loop or themselves, anywhere but at their own vertices); a loop that touches nothing
 * has every other loop's winding constant along it, so whether it bounds the result follows
 * from two exact winding numbers, one on each side of it. Such a loop comes back exactly as it
 * went in (turned round when the result lies on its right), however thin or close to another
 * loop it is: a hole 2e-8·r inside its outer circle, a disc in a ring's hole, a flat arc on its
 * own chord, a plate with thousands of separate holes, a simple polygon of any size.
 *
 * Only the loops that touch, and the untouched loops that enclose one of them (their winding
 * counts along it, so clipper must see them), go to clipper. An untouched loop either encloses a
 * touched loop or has winding zero all along it, so clipper's answer along its loops is the
 * whole answer there.
 */
import Flatbush from 'flatbush';
import type { Contour } from '../geometry/contour';
import { ARC, windingOf, type Carrier } from './carriers';
import type { Ctx } from './context';
import { inResult, windingsAt } from './spatial';

/** Loop indices: `clipped` go through clipper, `free` are settled exactly; each loop's box. */
export function partitionLoops(ctx: Ctx): { clipped: number[]; free: number[]; box: Float64Array } {
  const L = ctx.loops.length;
  const box = new Float64Array(4 * L);
  for (let l = 0; l < L; l++) {
    let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
    for (const id of ctx.loops[l].ids) {
      const c = ctx.carriers[id];
      if (c.xmin < x0) x0 = c.xmin;
      if (c.ymin < y0) y0 = c.ymin;
      if (c.xmax > x1) x1 = c.xmax;
      if (c.ymax > y1) y1 = c.ymax;
    }
    box[4 * l] = x0;
    box[4 * l + 1] = y0;
    box[4 * l + 2] = x1;
    box[4 * l + 3] = y1;
  }
  const touched: number[] = [];
  for (let l = 0; l < L; l++) if (ctx.touched[l]) touched.push(l);
  if (touched.length === 0) return { clipped: [], free: [...Array(L).keys()], box };
  // Every loop touched (a cluster of shapes that meet): nothing left to test, no index to build.
  if (touched.length === L) return { clipped: touched, free: [], box };
  // An index of the touched loops' boxes when the questions are many; else each untouched loop
  // reads every touched box (a cluster of a few dozen loops: cheaper than sorting an index).
  let idx: Flatbush | null = null;
  if (touched.length * (L - touched.length) > SCAN_PAIRS) {
    idx = new Flatbush(touched.length);
    for (const l of touched) idx.add(box[4 * l], box[4 * l + 1], box[4 * l + 2], box[4 * l + 3]);
    idx.finish();
  }
  const all = idx ? null : touched.map((_, k) => k);
  const clipped: number[] = [], free: number[] = [];
  for (let l = 0; l < L; l++) {
    if (ctx.touched[l]) {
      clipped.push(l);
      continue;
    }
    // Untouched: only a loop that encloses a touched loop changes the windings clipper must see.
    // Enclosing needs the other box inside this one; then one vertex of it tells.
    const x0 = box[4 * l], y0 = box[4 * l + 1], x1 = box[4 * l + 2], y1 = box[4 * l + 3];
    let encloses = false;
    for (const k of idx ? idx.search(x0, y0, x1, y1) : all!) {
      const t = touched[k];
      if (box[4 * t] < x0 || box[4 * t + 1] < y0 || box[4 * t + 2] > x1 || box[4 * t + 3] > y1) continue;
      const c = ctx.carriers[ctx.loops[t].ids[0]];
      let w = 0;
      for (const id of ctx.loops[l].ids) w += windingOf(ctx.carriers[id], c.ax, c.ay);
      if (w !== 0) {
        encloses = true;
        break;
      }
    }
    (encloses ? clipped : free).push(l);
  }
  return { clipped, free, box };
}

/**
 * The loop's exact contour, from its carriers (arcs over 180° already split in two), run the
 * other way round when `reversed` (every moment changes sign).
 */
export function loopContour(ctx: Ctx, l: number, reversed = false): Contour {
  const ids = ctx.loops[l].ids;
  const m = ids.length;
  const xy = new Float64Array(2 * m);
  const bulge = new Float64Array(m);
  let anyArc = false;
  for (let k = 0; k < m; k++) {
    const c: Carrier = ctx.carriers[ids[k]];
    const sweep = c.kind === ARC ? c.phi : c.flat;
    // Reversed, vertex k is carrier (m − 1 − k)'s end and its segment runs back along it.
    const o = reversed ? m - 1 - k : k;
    const cr: Carrier = reversed ? ctx.carriers[ids[o]] : c;
    xy[2 * k] = reversed ? cr.bx : c.ax;
    xy[2 * k + 1] = reversed ? cr.by : c.ay;
    const sw = reversed ? -(cr.kind === ARC ? cr.phi : cr.flat) : sweep;
    if (sw !== 0) {
      bulge[k] = Math.tan(sw / 4);
      anyArc = true;
    }
  }
  return { xy, bulge: anyArc ? bulge : null };
}

/** Signed area of the loop from its carriers: the chords' shoelace plus each arc's segment. */
function loopArea(ctx: Ctx, l: number): number {
  const ids = ctx.loops[l].ids;
  const c0 = ctx.carriers[ids[0]];
  const ox = c0.ax, oy = c0.ay;
  let a = 0;
  for (const id of ids) {
    const c = ctx.carriers[id];
    const ax = c.ax - ox, ay = c.ay - oy, bx = c.bx - ox, by = c.by - oy;
    a += (ax * (by - ay) - ay * (bx - ax)) / 2;
    const sweep = c.kind === ARC ? c.phi : c.flat;
    if (sweep !== 0) {
      // Circular segment on the chord: r²(α − sinα cosα) with r = L/(2 sin α), α = |sweep|/2.
      const al = Math.abs(sweep) / 2, L2 = (bx - ax) ** 2 + (by - ay) ** 2;
      const sa = Math.sin(al);
      const seg = al < 1e-3 ? (L2 * al) / 6 : (L2 / (4 * sa * sa)) * (al - sa * Math.cos(al));
      a += sweep > 0 ? seg : -seg;
    }
  }
  return a;
}

/** Loops with more carriers than this are not scanned whole for one point (see below). */
const SCAN_LIMIT = 256;
/**
 * Up to this many (question, box) pairs the boxes are read one by one; beyond it they go into a
 * flatbush index first. Sorting a few dozen boxes into an index cost more than reading them for
 * the few questions a cluster of shapes asks; a plate with thousands of holes still gets its index.
 */
const SCAN_PAIRS = 4096;

/**
 * The free loops that bound the result, each oriented with the result on its left. The other
 * loops' windings are taken at the loop's first vertex (no other loop passes there); the loop's
 * own winding steps by +1 from its right to its left, from 0 outside it.
 *
 * Only loops whose box holds the point can wind about it: an index of the loops' boxes finds
 * them. A small one is scanned whole (a plate's outline is four edges); the large ones are
 * answered together by one ray through the carriers' index. A plate with N holes then costs
 * about N log N, where rays over all carriers would cross every hole of a row.
 */
export function settleFreeLoops(ctx: Ctx, free: readonly number[], box: Float64Array): Contour[] {
  const out: Contour[] = [];
  if (free.length === 0) return out;
  const L = ctx.loops.length;
  let loopIdx: Flatbush | null = null;
  if (L * free.length > SCAN_PAIRS) {
    loopIdx = new Flatbush(Math.max(1, L));
    for (let l = 0; l < L; l++) loopIdx.add(box[4 * l], box[4 * l + 1], box[4 * l + 2], box[4 * l + 3]);
    if (L === 0) loopIdx.add(0, 0, 0, 0);
    loopIdx.finish();
  }
  const big = new Uint8Array(L);
  // The loops whose boxes hold (x, y) are visited inside the index search (the filter adds their
  // windings and keeps nothing), so the thousands of questions of a perforated plate build no
  // result lists.
  let l = 0, x = 0, y = 0, w0 = 0, w1 = 0;
  let anyBig: boolean;
  const visit = (o: number): boolean => {
    if (o === l) return false;
    const ids = ctx.loops[o].ids;
    if (ids.length > SCAN_LIMIT) {
      big[o] = 1;
      anyBig = true;
      return false;
    }
    let w = 0;
    for (const id of ids) w += windingOf(ctx.carriers[id], x, y);
    if (ctx.loops[o].group === 0) w0 += w;
    else w1 += w;
    return false;
  };
  for (l of free) {
    if (ctx.loops[l].ids.length < 2) continue;
    const A = loopArea(ctx, l);
    if (!(A !== 0) || !Number.isFinite(A)) continue;
    const c0 = ctx.carriers[ctx.loops[l].ids[0]];
    x = c0.ax;
    y = c0.ay;
    w0 = 0;
    w1 = 0;
    anyBig = false;
    if (loopIdx) loopIdx.search(x, y, x, y, visit);
    else for (let o = 0; o < L; o++) if (box[4 * o] <= x && box[4 * o + 2] >= x && box[4 * o + 1] <= y && box[4 * o + 3] >= y) visit(o);
    if (anyBig) {
      const [b0, b1] = windingsAt(ctx, x, y, (k) => !big[ctx.loopOf[k.id]]);
      w0 += b0;
      w1 += b1;
      big.fill(0);
    }
    // CCW (A > 0): left is inside (own winding 1), right outside (0). CW: left outside (0),
    // right inside (−1).
    const right = A > 0 ? 0 : -1, left = right + 1;
    const g = ctx.loops[l].group;
    const inLeft = inResult(ctx, g === 0 ? w0 + left : w0, g === 0 ? w1 : w1 + left);
    const inRight = inResult(ctx, g === 0 ? w0 + right : w0, g === 0 ? w1 : w1 + right);
    if (inLeft === inRight) continue;
    out.push(loopContour(ctx, l, !inLeft));
  }
  return out;
}
