/**
 * The carriers' spatial index: a static packed R-tree (flatbush) over their boxes, built once per
 * boolean call. Every question "which carriers are near this point, this box, or on this ray"
 * goes through it, so no step scans all carriers per vertex or per edge.
 */
import Flatbush from 'flatbush';
import { windingOf, type Carrier } from './carriers';
import type { Ctx } from './context';
import { sortIndex } from './sort';

/** The index over ctx.carriers (item k is carrier k), built on first use. */
export function carrierIndex(ctx: Ctx): Flatbush {
  if (ctx.index) return ctx.index;
  const cs = ctx.carriers;
  const idx = new Flatbush(Math.max(1, cs.length));
  if (cs.length === 0) idx.add(0, 0, 0, 0);
  for (const c of cs) idx.add(c.xmin, c.ymin, c.xmax, c.ymax);
  idx.finish();
  ctx.index = idx;
  return idx;
}

/** Carriers whose boxes meet the box [x0, x1] × [y0, y1]. */
export function carriersInBox(ctx: Ctx, x0: number, y0: number, x1: number, y1: number): number[] {
  if (ctx.carriers.length === 0) return [];
  return carrierIndex(ctx).search(x0, y0, x1, y1);
}

/**
 * Winding numbers of the subject (w0) and the clips (w1) about (x, y), exactly: only carriers
 * whose boxes meet the ray from the point towards +x can count (windingOf counts crossings of
 * that ray, plus the circular segment of an arc, which lies inside the arc's box).
 * `skip(c)` leaves carriers out (a loop's own carriers, when it is classified from a point on it).
 */
export function windingsAt(ctx: Ctx, x: number, y: number, skip?: (c: Carrier) => boolean, scan = false): [number, number] {
  let w0 = 0, w1 = 0;
  const cs = ctx.carriers;
  if (cs.length === 0) return [0, 0];
  // A few questions are answered by one pass over the carriers' boxes (`scan`), cheaper than
  // building the index; many go through the index.
  let near: Iterable<number>;
  if (scan && !ctx.index) {
    const list: number[] = [];
    for (const c of cs) if (c.xmax >= x && c.ymin <= y && c.ymax >= y) list.push(c.id);
    near = list;
  } else {
    const idx = carrierIndex(ctx);
    near = idx.search(x, y, Math.max(x, idx.maxX), y);
  }
  for (const k of near) {
    const c = cs[k];
    if (skip && skip(c)) continue;
    const w = windingOf(c, x, y);
    if (w === 0) continue;
    if (c.group === 0) w0 += w;
    else w1 += w;
  }
  return [w0, w1];
}

/** Whether a point with windings (w0, w1) belongs to the operation's result. */
export function inResult(ctx: Ctx, w0: number, w1: number): boolean {
  switch (ctx.mode) {
    case 'union': return w0 !== 0 || w1 !== 0;
    case 'difference': return w0 !== 0 && w1 === 0;
    case 'intersection': return w0 !== 0 && w1 !== 0;
    default: return (w0 & 1) === 1;
  }
}

/** Exact classification of a point against the operation's result. */
export function classify(ctx: Ctx, x: number, y: number): boolean {
  const [w0, w1] = windingsAt(ctx, x, y);
  return inResult(ctx, w0, w1);
}

/** First index in the sorted array s with s[i] >= v (or s[i] > v when `after`). */
function bound(s: Float64Array, v: number, after: boolean): number {
  let lo = 0, hi = s.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (s[mid] < v || (after && s[mid] === v)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/**
 * Every pair of carriers whose boxes (widened by eps) meet, each pair once. A sweep along one
 * axis is the cheapest broad phase for outlines (each box meets few others along the axis),
 * but a row of holes or a comb of long edges makes it quadratic: the cost of a sweep along x
 * and along y is counted first (binary searches over the sorted box starts), and when both are
 * large the index answers one box query per carrier instead.
 *
 * `grow`, per carrier id, widens each box further (none by default).
 */
export function forEachNearPair(ctx: Ctx, visit: (a: Carrier, b: Carrier) => void, grow: Float64Array | null = null): void {
  const cs = ctx.carriers, n = cs.length, eps = ctx.eps;
  if (n < 2) return;
  const xlo = new Float64Array(n), xhi = new Float64Array(n), ylo = new Float64Array(n), yhi = new Float64Array(n);
  let gmax = 0;
  for (let i = 0; i < n; i++) {
    const c = cs[i];
    const g = grow ? grow[i] : 0;
    if (g > gmax) gmax = g;
    xlo[i] = c.xmin - g;
    xhi[i] = c.xmax + g;
    ylo[i] = c.ymin - g;
    yhi[i] = c.ymax + g;
  }
  // Cost of a sweep along an axis: for each box, the boxes that start within its extent.
  const sweep = (lo: Float64Array, hi: Float64Array): { order: Uint32Array; cost: number } => {
    const order = sortIndex(lo);
    if (n <= 256) return { order, cost: 0 }; // few boxes: any sweep is cheap
    const s = new Float64Array(n);
    for (let i = 0; i < n; i++) s[i] = lo[order[i]];
    let cost = 0;
    for (let i = 0; i < n; i++) cost += bound(s, hi[i] + eps, true) - bound(s, lo[i], false);
    return { order, cost };
  };
  // One index query costs about as much as a few hundred steps of the sweep's inner loop (a
  // comparison of numbers read in order), so the sweep is kept up to 128 box starts per box: a
  // plate's column of 40 holes (80 arcs sharing one x-range) stays a sweep, a row of thousands
  // of holes along the sweep axis does not.
  const cheap = 128 * n + 1024;
  let axis = sweep(xlo, xhi);
  let [lo, hi, olo, ohi] = [xlo, xhi, ylo, yhi];
  if (axis.cost > cheap) {
    const ay = sweep(ylo, yhi);
    if (ay.cost < axis.cost) {
      axis = ay;
      [lo, hi, olo, ohi] = [ylo, yhi, xlo, xhi];
    }
  }
  if (axis.cost <= cheap) {
    const order = axis.order;
    // The boxes in sweep order, each bound already widened by eps, so the inner loop reads
    // consecutive numbers (the same comparisons as lo[b] > hi[a] + eps and so on).
    const sLo = new Float64Array(n), sHi = new Float64Array(n), sOlo = new Float64Array(n), sOhi = new Float64Array(n);
    for (let p = 0; p < n; p++) {
      const a = order[p];
      sLo[p] = lo[a];
      sHi[p] = hi[a] + eps;
      sOlo[p] = olo[a];
      sOhi[p] = ohi[a];
    }
    for (let p = 0; p < n; p++) {
      const end = sHi[p], top = sOhi[p] + eps, bottom = sOlo[p] - eps;
      for (let q = p + 1; q < n; q++) {
        if (sLo[q] > end) break;
        if (sOlo[q] > top || sOhi[q] < bottom) continue;
        visit(cs[order[p]], cs[order[q]]);
      }
    }
    return;
  }
  // The index holds every carrier's own box: ask with this box widened by the largest growth
  // too, then keep the pairs whose widened boxes meet.
  const idx = carrierIndex(ctx);
  const w = eps + gmax;
  for (let a = 0; a < n; a++) {
    for (const b of idx.search(xlo[a] - w, ylo[a] - w, xhi[a] + w, yhi[a] + w)) {
      if (b <= a) continue;
      if (grow && (xlo[b] > xhi[a] + eps || xhi[b] < xlo[a] - eps || ylo[b] > yhi[a] + eps || yhi[b] < ylo[a] - eps)) continue;
      visit(cs[a], cs[b]);
    }
  }
}
