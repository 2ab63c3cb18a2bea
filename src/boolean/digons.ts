/**
 * Sub-grid two-sided loops. Two carrier pieces that join the same two nodes and are each drawn
 * as one chord look like one edge to clipper, however far apart they bulge: the lens of two
 * circles that overlap by 1e-9 of their radius, or a flat arc on its own chord. The exact
 * geometry settles them instead: winding numbers inside the digon and just beyond each piece
 * say whether it is a loop of the result (kept whole, or a crack cut out of it), or whether one
 * of its pieces bounds the result, which the trace then takes for the shared chord.
 */
import { lengthOf, reverseContour, type Contour } from '../geometry/contour';
import { contourArea } from '../moments/kernel';
import { ARC, curvePoint, paramOf, sameCurve, wrapAngle, type Carrier } from './carriers';
import { find, type Ctx } from './context';
import { classify } from './spatial';

/**
 * Finds the digons among the single-chord pieces and settles each (before tracing). Two plain
 * line pieces on one pair of nodes are one segment, never a digon: only pairs with an arc or a
 * flat arc in them are looked for, so the many line pieces of a dense outline cost one lookup.
 */
export function findDigons(ctx: Ctx): void {
  const P = ctx.chordPieces;
  const nn = ctx.nx.length;
  const pairKey = (k: number): number => {
    const a = find(ctx, P[k + 1]), b = find(ctx, P[k + 2]);
    return a === b ? -1 : a < b ? a * nn + b : b * nn + a;
  };
  const plain = (k: number): boolean => {
    const c = ctx.carriers[P[k]];
    return c.kind !== ARC && c.flat === 0;
  };
  const byPair = new Map<number, number[]>();
  for (let k = 0; k < P.length; k += 3) {
    if (plain(k)) continue;
    const key = pairKey(k);
    if (key < 0) continue;
    const list = byPair.get(key);
    if (list) list.push(k);
    else byPair.set(key, [k]);
  }
  if (byPair.size === 0) return;
  for (let k = 0; k < P.length; k += 3) {
    if (!plain(k)) continue;
    const list = byPair.get(pairKey(k));
    if (list) list.push(k);
  }
  for (const list of byPair.values()) {
    if (list.length < 2) continue;
    for (let i = 0; i < list.length; i++) {
      for (let j = i + 1; j < list.length; j++) {
        const c1 = P[list[i]], c2 = P[list[j]];
        if (c1 === c2 || sameCurve(ctx.carriers[c1], ctx.carriers[c2], ctx.eps)) continue;
        settle(ctx, c1, c2, find(ctx, P[list[i] + 1]), find(ctx, P[list[i] + 2]));
      }
    }
  }
}

/** Middle of carrier c's piece between nodes n1 and n2, on the true curve. */
function pieceMiddle(ctx: Ctx, c: Carrier, n1: number, n2: number): [number, number] {
  const u1 = paramOf(c, ctx.nx[n1], ctx.ny[n1]), u2 = paramOf(c, ctx.nx[n2], ctx.ny[n2]);
  return curvePoint(c, (u1 + u2) / 2);
}

function settle(ctx: Ctx, c1: number, c2: number, n1: number, n2: number): void {
  const [ax, ay] = pieceMiddle(ctx, ctx.carriers[c1], n1, n2);
  const [bx, by] = pieceMiddle(ctx, ctx.carriers[c2], n1, n2);
  const dx = ax - bx, dy = ay - by;
  // Thinner than the coordinates resolve: nothing to settle.
  if (!(lengthOf(dx, dy) > 64 * Number.EPSILON * (ctx.ext + Math.abs(ctx.ox) + Math.abs(ctx.oy)))) return;
  const inside = classify(ctx, (ax + bx) / 2, (ay + by) / 2);
  const out1 = classify(ctx, ax + dx, ay + dy);
  const out2 = classify(ctx, bx - dx, by - dy);
  let pick = -1;
  if (out1 === out2) {
    if (out1 === inside) return; // all one side: no boundary here
  } else pick = out1 !== inside ? c1 : c2;
  const g = { c1, c2, n1, n2, pick, inside };
  ctx.digons.push(g);
  for (const c of [c1, c2]) {
    const list = ctx.digonsOf.get(c);
    if (list) list.push(g);
    else ctx.digonsOf.set(c, [g]);
  }
}

/** Signed sweep of carrier c from (ax, ay) to (bx, by), both on it. */
export function pieceSweep(c: Carrier, ax: number, ay: number, bx: number, by: number): number {
  if (c.kind !== ARC) return c.flat === 0 ? 0 : c.flat * (paramOf(c, bx, by) - paramOf(c, ax, ay));
  const u0 = paramOf(c, ax, ay), u1 = paramOf(c, bx, by);
  let d = wrapAngle(Math.atan2(by - c.cy, bx - c.cx) - Math.atan2(ay - c.cy, ax - c.cx));
  const want = Math.sign(c.phi) * Math.sign(u1 - u0);
  if (want > 0 && d < 0) d += 2 * Math.PI;
  else if (want < 0 && d > 0) d -= 2 * Math.PI;
  return d;
}

/** The digons that are loops of the result on their own, each with the result on its left. */
export function digonLoops(ctx: Ctx): Contour[] {
  const out: Contour[] = [];
  for (const g of ctx.digons) {
    if (g.pick >= 0) continue;
    const x1 = ctx.nx[g.n1], y1 = ctx.ny[g.n1], x2 = ctx.nx[g.n2], y2 = ctx.ny[g.n2];
    const s1 = pieceSweep(ctx.carriers[g.c1], x1, y1, x2, y2);
    const s2 = pieceSweep(ctx.carriers[g.c2], x2, y2, x1, y1);
    const c: Contour = { xy: Float64Array.of(x1, y1, x2, y2), bulge: Float64Array.of(Math.tan(s1 / 4), Math.tan(s2 / 4)) };
    const A = contourArea(c); // about its first vertex, (x1, y1)
    if (!(A !== 0) || !Number.isFinite(A)) continue;
    // Inside in the result: a loop of its own (area positive); else a crack (area negative).
    out.push(A > 0 === g.inside ? c : reverseContour(c));
  }
  return out;
}

/** The digon pick for an edge between the nodes at p and q drawn by carriers `cands`, or −1. */
export function digonPick(ctx: Ctx, cands: readonly number[], px: number, py: number, qx: number, qy: number): number {
  const tol = 8 * ctx.unit;
  for (const g of ctx.digonsOf.get(cands[0]) ?? []) {
    if (g.pick < 0 || !cands.includes(g.c1) || !cands.includes(g.c2)) continue;
    const d1 = lengthOf(ctx.nx[g.n1] - px, ctx.ny[g.n1] - py) + lengthOf(ctx.nx[g.n2] - qx, ctx.ny[g.n2] - qy);
    const d2 = lengthOf(ctx.nx[g.n2] - px, ctx.ny[g.n2] - py) + lengthOf(ctx.nx[g.n1] - qx, ctx.ny[g.n1] - qy);
    if (Math.min(d1, d2) <= 2 * tol) return g.pick;
  }
  return -1;
}
