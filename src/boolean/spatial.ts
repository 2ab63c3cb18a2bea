/**
 * The carriers' spatial index: a static packed R-tree (flatbush) over their boxes, built once per
 * boolean call. Every question "which carriers are near this point, this box, or on this ray"
 * goes through it, so no step scans all carriers per vertex or per edge.
 */
import Flatbush from 'flatbush';
import { windingOf, type Carrier } from './carriers';
import type { Ctx } from './context';

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
