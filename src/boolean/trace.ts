/**
 * Step 5: clipper output paths back to exact contours. Each output edge is traced to its carrier
 * (tags first, geometry and exact side probes when tags are missing or ambiguous), runs on one
 * carrier become one exact segment, and run ends land on exact nodes or carrier intersections.
 */
import type { IntPoint } from 'clipper-lib';
import { lengthOf, pushArc, type Contour } from '../geometry/contour';
import { contourArea } from '../moments/kernel';
import {
  ARC, LINE, curveIntersections, curvePoint, distToCurve, nearestPoint, paramOf, polishIntersection,
  sameCurve, wrapAngle, type Carrier,
} from './carriers';
import { type Ctx, find, nodeCarriers } from './context';
import { digonPick, pieceSweep } from './digons';
import { carrierIndex, carriersInBox, classify } from './spatial';

/**
 * True when the clipper edge p -> q lies along a carrier that both its ends are on (no
 * allocation). Two nodes can share an arc that the edge does not follow: where a circle crosses
 * two fillets, the edge between the crossings runs along the fillets and the straight edge
 * between them, not along the circle. Two points of one straight edge, or an end on one carrier
 * only (a chord point, which starts the edge along that carrier), need no such check.
 */
function sharedCarrierFits(ctx: Ctx, a: readonly number[], b: readonly number[], px: number, py: number, qx: number, qy: number): boolean {
  const nodes = a.length > 1 && b.length > 1;
  for (let i = 0; i < a.length; i++) {
    if (!b.includes(a[i])) continue;
    const c = ctx.carriers[a[i]];
    if (!nodes || (c.kind !== ARC && c.flat === 0) || fitsEdge(ctx, c, px, py, qx, qy)) return true;
  }
  return false;
}

/** The one element the lists share, −1 when none, −2 when several (no allocation). */
function shareOne(a: readonly number[], b: readonly number[]): number {
  let found = -1;
  for (let i = 0; i < a.length; i++) {
    if (!b.includes(a[i]) || a[i] === found) continue;
    if (found >= 0) return -2;
    found = a[i];
  }
  return found;
}

function intersectLists(a: number[], b: number[]): number[] {
  const out: number[] = [];
  for (const x of a) if (b.includes(x)) out.push(x);
  return out;
}

function unionLists(a: number[], b: number[]): number[] {
  const out = a.slice();
  for (const x of b) if (!out.includes(x)) out.push(x);
  return out;
}

function recCarriers(ctx: Ctx, z: number | undefined): number[] {
  if (!z || z <= 0 || z > ctx.rAll.length) return [];
  return ctx.rAll[z - 1];
}

function edgeCarriers(ctx: Ctx, zb: number | undefined, zt: number | undefined): number[] {
  const a = recCarriers(ctx, zb), b = recCarriers(ctx, zt);
  const common = intersectLists(a, b);
  return common.length ? common : unionLists(a, b);
}

/** Midpoint of carrier c between the points p and q that lie on it. */
function pieceMid(c: Carrier, px: number, py: number, qx: number, qy: number): [number, number] {
  if (c.kind === LINE) return c.flat === 0 ? [(px + qx) / 2, (py + qy) / 2] : curvePoint(c, (paramOf(c, px, py) + paramOf(c, qx, qy)) / 2);
  const tp = Math.atan2(py - c.cy, px - c.cx);
  const d = wrapAngle(Math.atan2(qy - c.cy, qx - c.cx) - tp);
  // The piece lies inside the carrier's sweep: choose the direction that keeps it there.
  const up = paramOf(c, px, py), uq = paramOf(c, qx, qy);
  let dd = d;
  const want = Math.sign(c.phi) * Math.sign(uq - up);
  if (want > 0 && dd < 0) dd += 2 * Math.PI;
  else if (want < 0 && dd > 0) dd -= 2 * Math.PI;
  const t = tp + dd / 2;
  return [c.cx + c.r * Math.cos(t), c.cy + c.r * Math.sin(t)];
}

/**
 * Several carriers join p and q (a sliver thinner than a chord, coincident edges, or an arc and its
 * own chord): the true boundary has the result just on its left and not on its right. Each
 * candidate is probed at the middle of its piece, closer to it than to any other candidate.
 */
function resolveTie(ctx: Ctx, all: number[], px: number, py: number, qx: number, qy: number): number {
  const cs = ctx.carriers;
  // Coincident carriers (same line or same circle) are interchangeable: keep one of each.
  const cands: number[] = [];
  for (const c of all) if (!cands.some((d) => sameCurve(cs[c], cs[d], ctx.eps))) cands.push(c);
  if (cands.length === 1) return cands[0];
  // A digon (two pieces on one chord, digons.ts) knows exactly which of its pieces bounds.
  const pick = digonPick(ctx, cands, px, py, qx, qy);
  if (pick >= 0) return pick;
  const L = lengthOf(qx - px, qy - py);
  if (!(L > 0)) return cands[0];
  const nx = -(qy - py) / L, ny = (qx - px) / L; // left normal; the tangent at a piece middle is parallel to q - p
  const mids = cands.map((c) => pieceMid(cs[c], px, py, qx, qy));
  let fallback = -1;
  for (let k = 0; k < cands.length; k++) {
    const [mx, my] = mids[k];
    let delta = 0.25 * L;
    for (let o = 0; o < cands.length; o++) {
      if (o === k) continue;
      const d = lengthOf(mids[o][0] - mx, mids[o][1] - my);
      if (d > 100 * ctx.eps) delta = Math.min(delta, 0.25 * d);
    }
    if (!(delta > 10 * ctx.eps)) continue;
    const left = classify(ctx, mx + delta * nx, my + delta * ny);
    const right = classify(ctx, mx - delta * nx, my - delta * ny);
    if (left && !right) return cands[k];
    if (fallback < 0 && left !== right) fallback = k;
  }
  return cands[fallback >= 0 ? fallback : 0];
}

function carrierTol(ctx: Ctx, c: Carrier): number {
  // Chord sagitta for an arc; for a flat arc traced as its chord, the arc's own sagitta.
  const sag = c.kind === ARC ? 1.5 * ctx.chordSag[c.id] : (Math.abs(c.flat) * c.len) / 6;
  return 3 * ctx.unit + sag + ctx.eps;
}

/**
 * Point (x, y) lies on carrier c to chord accuracy: across the curve within the chord sagitta,
 * along it within a few integer units of its ends (the sagitta does not widen the range).
 */
function onCarrier(ctx: Ctx, c: Carrier, x: number, y: number): boolean {
  const slack = (3 * ctx.unit + ctx.eps) / (c.len || 1);
  const u = paramOf(c, x, y);
  if (u < -slack || u > 1 + slack) return false;
  return distToCurve(c, x, y) <= carrierTol(ctx, c);
}

/**
 * The clipper edge p -> q is one chord of carrier c: its ends and its middle lie on c to chord
 * accuracy (this tells an arc from a line that joins the same two points).
 */
function fitsEdge(ctx: Ctx, c: Carrier, px: number, py: number, qx: number, qy: number): boolean {
  // On a straight carrier the middle's parameter and distance are the means of the ends' (both
  // are linear along the edge), so the ends decide.
  if (c.kind !== ARC && c.flat === 0) return onCarrier(ctx, c, px, py) && onCarrier(ctx, c, qx, qy);
  return onCarrier(ctx, c, (px + qx) / 2, (py + qy) / 2) && onCarrier(ctx, c, px, py) && onCarrier(ctx, c, qx, qy);
}

function assignEdge(ctx: Ctx, si: number[], sj: number[], px: number, py: number, qx: number, qy: number): number {
  const cs = ctx.carriers;
  // The clipper edge is one chord: its ends and its middle lie on the carrier to chord accuracy
  // (this tells an arc from a line that joins the same two points).
  const mx = (px + qx) / 2, my = (py + qy) / 2;
  // Fast path: both ends are plain chord points (or nodes) of one and the same carrier.
  if (si.length === 1 && sj.length === 1 && si[0] === sj[0]) return si[0];
  const one = shareOne(si, sj);
  if (one >= 0 && fitsEdge(ctx, cs[one], px, py, qx, qy)) return one;
  let common = one === -1 ? [] : intersectLists(si, sj);
  common = common.filter((c) => fitsEdge(ctx, cs[c], px, py, qx, qy));
  // Collinear vertices dropped by clipper: the edge may span several carriers of one line.
  const pool = common.length ? common : unionLists(si, sj);
  let fit = common.length ? common : pool.filter((c) => fitsEdge(ctx, cs[c], px, py, qx, qy));
  // Tags of coincident points can name other carriers: look at every carrier through the middle.
  if (fit.length === 0) fit = carriersNear(ctx, mx, my).filter((c) => fitsEdge(ctx, cs[c], px, py, qx, qy));
  if (fit.length === 1) return fit[0];
  if (fit.length > 1) return resolveTie(ctx, fit, px, py, qx, qy);
  // Nothing fits within tolerance: the carrier nearest to both ends (the carriers near the
  // edge if there are no tags, the few nearest by the index if none is near).
  let search = pool;
  if (!search.length) {
    const t = 4 * maxCarrierTol(ctx);
    search = carriersInBox(ctx, Math.min(px, qx) - t, Math.min(py, qy) - t, Math.max(px, qx) + t, Math.max(py, qy) + t);
  }
  if (!search.length) search = carrierIndex(ctx).neighbors(mx, my, 8);
  let best = search[0], bd = Infinity;
  for (const c of search) {
    const d = Math.max(distToCurve(cs[c], px, py), distToCurve(cs[c], qx, qy), distToCurve(cs[c], mx, my));
    if (d < bd) {
      bd = d;
      best = c;
    }
  }
  return best;
}

/**
 * Exact position of the vertex where carrier a hands over to carrier b. `rec` is the vertex's
 * record (−1 for none): of the records at its integer point, the one whose own exact point lies
 * on both carriers is the vertex; a record of another loop that merely rounds to the same
 * integer point is never taken for it.
 */
function placeVertex(ctx: Ctx, a: number, b: number, px: number, py: number, rec: number): [number, number] {
  const ca = ctx.carriers[a], cb = ctx.carriers[b];
  // Carriers that share a source vertex (or a merged node) meet there exactly: the nearest such.
  let best = -1, bd = 8 * ctx.unit;
  const b0 = find(ctx, cb.n0), b1 = find(ctx, cb.n1);
  for (let k = 0; k < 2; k++) {
    const ra = find(ctx, k === 0 ? ca.n0 : ca.n1);
    if (ra !== b0 && ra !== b1) continue;
    const d = lengthOf(ctx.nx[ra] - px, ctx.ny[ra] - py);
    if (d <= bd) {
      bd = d;
      best = ra;
    }
  }
  if (best >= 0) return [ctx.nx[best], ctx.ny[best]];
  const recs = rec < 0 ? [] : ctx.rAlt[rec] ?? [rec];
  for (const r of recs) {
    if (ctx.rExact[r] && ctx.rCar[r].includes(a) && ctx.rCar[r].includes(b)) return [ctx.rx[r], ctx.ry[r]];
  }
  let lim = 8 * ctx.unit;
  if (ca.kind === ARC) lim += 0.2 * ca.r;
  if (cb.kind === ARC) lim += 0.2 * cb.r;
  // A crossing clipper made of two chords near a node of both carriers (a near-tangent crossing
  // puts it units away): the arrangement's node, the nearest one if they meet twice. Computing
  // the crossing again would take a crossing within the looser tolerance below for a tangent.
  const sa = ctx.splits[a];
  if (sa) {
    best = -1;
    bd = lim;
    for (const s of sa) {
      const r = find(ctx, s);
      if (!nodeCarriers(ctx, r).includes(b)) continue;
      const d = lengthOf(ctx.nx[r] - px, ctx.ny[r] - py);
      if (d <= bd) {
        bd = d;
        best = r;
      }
    }
    if (best >= 0) return [ctx.nx[best], ctx.ny[best]];
  }
  if (!sameCurve(ca, cb, ctx.eps)) {
    const pts = curveIntersections(ca, cb, 1e3 * ctx.eps);
    const k = nearestPoint(pts, px, py);
    if (k >= 0) {
      const [x, y] = polishIntersection(ca, cb, pts[k], pts[k + 1]);
      if (lengthOf(x - px, y - py) <= lim) return [x, y];
    }
    // Near-tangent circles with no common point: the point of closest approach.
    if (ca.kind === ARC && cb.kind === ARC) {
      const d = lengthOf(cb.cx - ca.cx, cb.cy - ca.cy);
      if (d > 0) {
        // Apart: towards the other centre. Nested: the small circle's far side, the big one's near side.
        const nested = d < Math.abs(ca.r - cb.r) + ctx.eps;
        const sgn = !nested || ca.r >= cb.r ? 1 : -1;
        const ux = (cb.cx - ca.cx) / d, uy = (cb.cy - ca.cy) / d;
        const x = ca.cx + sgn * ca.r * ux, y = ca.cy + sgn * ca.r * uy;
        if (lengthOf(x - px, y - py) <= 0.2 * Math.min(ca.r, cb.r) + 8 * ctx.unit) return [x, y];
      }
    }
  }
  // An exact point of one of the two carriers, else the clipper point projected onto a.
  for (const r of recs) {
    if (ctx.rExact[r] && (ctx.rCar[r].includes(a) || ctx.rCar[r].includes(b))) return [ctx.rx[r], ctx.ry[r]];
  }
  return projectOnto(ca, px, py);
}

function projectOnto(c: Carrier, x: number, y: number): [number, number] {
  if (c.kind === LINE) {
    const u = paramOf(c, x, y);
    return [c.ax + u * (c.bx - c.ax), c.ay + u * (c.by - c.ay)];
  }
  const d = lengthOf(x - c.cx, y - c.cy);
  if (d === 0) return [c.ax, c.ay];
  return [c.cx + ((x - c.cx) * c.r) / d, c.cy + ((y - c.cy) * c.r) / d];
}

/** Carriers passing through (x, y) within tolerance: the fallback for a missing or wrong tag. */
function carriersNear(ctx: Ctx, x: number, y: number): number[] {
  const out: number[] = [];
  // Boxes are widened by the largest tolerance of any carrier (a few integer units plus the
  // largest chord sagitta), then each candidate is tested with its own tolerance.
  const t = maxCarrierTol(ctx);
  for (const id of carriersInBox(ctx, x - t, y - t, x + t, y + t)) {
    const c = ctx.carriers[id];
    const ct = carrierTol(ctx, c);
    if (x < c.xmin - ct || x > c.xmax + ct || y < c.ymin - ct || y > c.ymax + ct) continue;
    if (onCarrier(ctx, c, x, y)) out.push(c.id);
  }
  return out;
}

function maxCarrierTol(ctx: Ctx): number {
  if (ctx.maxTol >= 0) return ctx.maxTol;
  let t = 0;
  for (const c of ctx.carriers) t = Math.max(t, carrierTol(ctx, c));
  ctx.maxTol = t;
  return t;
}

/**
 * Source edges shorter than the grid collapse into one clipper vertex (one record holding all
 * their carriers). Where the output hands over from carrier a to carrier b of the same loop at
 * such a vertex, the carriers between them along the loop (either way round) are put back as
 * runs of their own, so every input vertex returns and no corner is invented.
 */
function restoreCollapsed(ctx: Ctx, runV: number[], runC: number[], rec: readonly number[]): void {
  for (let k = runV.length - 1; k >= 0; k--) {
    const r = rec[runV[k]];
    if (r < 0) continue;
    const a = runC[(k + runV.length - 1) % runV.length], b = runC[k];
    const chain = chainBetween(ctx, a, b, ctx.rCar[r]);
    if (!chain) continue;
    runV.splice(k, 0, ...chain.map(() => runV[k]));
    runC.splice(k, 0, ...chain);
  }
}

/**
 * The source nodes strictly inside the clipper edge p -> q, when the edge runs from a carrier of
 * `si` along its loop (either way round) to a carrier of `sj` over carriers that all lie on the
 * edge: the vertices clipper dropped as collinear on its grid. Empty when there is no such chain.
 */
function droppedBetween(ctx: Ctx, si: readonly number[], sj: readonly number[], px: number, py: number, qx: number, qy: number): number[] {
  const dx = qx - px, dy = qy - py;
  const L2 = dx * dx + dy * dy;
  if (!(L2 > 0)) return [];
  const L = Math.sqrt(L2);
  const tol = 3 * ctx.unit + ctx.eps;
  const cs = ctx.carriers;
  for (const a of si) {
    for (const b of sj) {
      if (a === b || ctx.loopOf[a] !== ctx.loopOf[b]) continue;
      const lo = ctx.loopLo[a], hi = ctx.loopHi[a];
      for (const step of [1, -1]) {
        const nodes: number[] = [];
        let c = a, last = 0, ok = false;
        for (let n = 0; n <= hi - lo; n++) {
          // The node where the walk leaves carrier c.
          const nd = find(ctx, step > 0 ? cs[c].n1 : cs[c].n0);
          const x = ctx.nx[nd], y = ctx.ny[nd];
          const t = ((x - px) * dx + (y - py) * dy) / L2;
          if (Math.abs((x - px) * dy - (y - py) * dx) / L > tol || t < last - tol / L || t > 1 + tol / L) break;
          const next = step > 0 ? (c === hi ? lo : c + 1) : (c === lo ? hi : c - 1);
          if (t * L > ctx.eps && (1 - t) * L > ctx.eps) {
            nodes.push(nd);
            last = t;
          }
          if (next === b) {
            ok = true;
            break;
          }
          const cn = cs[next];
          if (cn.kind === ARC && cn.r * (1 - Math.cos(cn.phi / 2)) > tol) break; // a visible arc is not on the edge
          c = next;
        }
        if (ok && nodes.length) return nodes;
      }
    }
  }
  return [];
}

/** The carriers strictly between a and b on their loop, all within `inside`, else null. */
function chainBetween(ctx: Ctx, a: number, b: number, inside: readonly number[]): number[] | null {
  if (a === b || ctx.loopOf[a] !== ctx.loopOf[b] || inside.length < 3) return null;
  const lo = ctx.loopLo[a], hi = ctx.loopHi[a];
  let best: number[] | null = null;
  for (const step of [1, -1]) {
    const chain: number[] = [];
    let c = a;
    for (let n = 0; n < inside.length; n++) {
      c = step > 0 ? (c === hi ? lo : c + 1) : (c === lo ? hi : c - 1);
      if (c === b) {
        if (chain.length && (!best || chain.length < best.length)) best = chain;
        break;
      }
      if (!inside.includes(c)) break;
      chain.push(c);
    }
  }
  return best;
}

/** Step 5: one clipper output path back to an exact contour (or null when degenerate). */
export function tracePath(ctx: Ctx, path: IntPoint[]): Contour | null {
  const m0 = path.length;
  if (m0 < 3) return null;
  const tx = new Float64Array(m0), ty = new Float64Array(m0);
  const trec = new Int32Array(m0).fill(-1);
  const tsets: number[][] = new Array(m0);
  for (let i = 0; i < m0; i++) {
    const p = path[i];
    const z = p.Z ?? 0;
    tx[i] = p.X / ctx.scale + ctx.ox;
    ty[i] = p.Y / ctx.scale + ctx.oy;
    if (z > 0 && z <= ctx.rx.length) {
      const r = z - 1;
      // A tag is trusted only when it belongs to this very point.
      if (ctx.rX[r] === p.X && ctx.rY[r] === p.Y) {
        tx[i] = ctx.rx[r];
        ty[i] = ctx.ry[r];
        trec[i] = r;
        tsets[i] = ctx.rAll[r];
      } else tsets[i] = [];
    } else if (z < 0 && -z * 4 <= ctx.zf.length) {
      const k = (-z - 1) * 4;
      tsets[i] = unionLists(edgeCarriers(ctx, ctx.zf[k], ctx.zf[k + 1]), edgeCarriers(ctx, ctx.zf[k + 2], ctx.zf[k + 3]));
    } else tsets[i] = [];
    if (tsets[i].length === 0) tsets[i] = carriersNear(ctx, tx[i], ty[i]);
  }
  // Source vertices that clipper dropped (collinear on its grid) go back between the clipper
  // vertices they came from, so no edge spans two source edges and no corner is invented.
  const px: number[] = [], py: number[] = [], rec: number[] = [], sets: number[][] = [];
  for (let i = 0; i < m0; i++) {
    px.push(tx[i]);
    py.push(ty[i]);
    rec.push(trec[i]);
    sets.push(tsets[i]);
    const j = i + 1 === m0 ? 0 : i + 1;
    if (sharedCarrierFits(ctx, tsets[i], tsets[j], tx[i], ty[i], tx[j], ty[j])) continue;
    for (const nd of droppedBetween(ctx, tsets[i], tsets[j], tx[i], ty[i], tx[j], ty[j])) {
      px.push(ctx.nx[nd]);
      py.push(ctx.ny[nd]);
      rec.push(-1);
      sets.push(nodeCarriers(ctx, nd));
    }
  }
  const m = px.length;
  const edge = new Int32Array(m);
  for (let i = 0; i < m; i++) {
    const j = i + 1 === m ? 0 : i + 1;
    edge[i] = assignEdge(ctx, sets[i], sets[j], px[i], py[i], px[j], py[j]);
  }
  let start = -1;
  for (let i = 0; i < m; i++) {
    if (edge[i] !== edge[(i + m - 1) % m]) {
      start = i;
      break;
    }
  }
  if (start < 0) return null; // one carrier cannot close a loop
  // Run starts (vertex indices) and their carriers.
  const runV: number[] = [], runC: number[] = [];
  for (let k = 0; k < m; k++) {
    const i = (start + k) % m;
    if (k === 0 || edge[i] !== edge[(i + m - 1) % m]) {
      runV.push(i);
      runC.push(edge[i]);
    }
  }
  restoreCollapsed(ctx, runV, runC, rec);
  const R = runV.length;
  const vx: number[] = [], vy: number[] = [];
  for (let k = 0; k < R; k++) {
    const i = runV[k];
    const prev = runC[(k + R - 1) % R];
    const [x, y] = placeVertex(ctx, prev, runC[k], px[i], py[i], rec[i]);
    vx.push(x);
    vy.push(y);
  }
  // Segments; zero-length ones are dropped.
  const oxy: number[] = [], ob: number[] = [];
  for (let k = 0; k < R; k++) {
    const k2 = (k + 1) % R;
    const ax = vx[k], ay = vy[k], bx = vx[k2], by = vy[k2];
    if (lengthOf(bx - ax, by - ay) <= ctx.eps) continue;
    const c = ctx.carriers[runC[k]];
    oxy.push(ax, ay);
    const d = pieceSweep(c, ax, ay, bx, by);
    if (Math.abs(d) > Math.PI * (1 + 1e-12)) pushArc(oxy, ob, ax, ay, bx, by, d);
    else ob.push(Math.max(-1, Math.min(1, Math.tan(d / 4)))); // a half circle may round past 1
  }
  const n = ob.length;
  if (n < 2) return null;
  let anyArc = false;
  for (let k = 0; k < n; k++) if (ob[k] !== 0 && Number.isFinite(ob[k])) anyArc = true;
  if (n === 2 && !anyArc) return null;
  // Indexed loops and the array constructor: for-of and from() go through an iterator, which
  // allocated on every output loop.
  for (let k = 0; k < oxy.length; k++) if (!Number.isFinite(oxy[k])) return null;
  if (anyArc) for (let k = 0; k < n; k++) if (!Number.isFinite(ob[k])) return null;
  const ct: Contour = { xy: new Float64Array(oxy), bulge: anyArc ? new Float64Array(ob) : null };
  const A = contourArea(ct);
  if (!(Math.abs(A) > 4 * ctx.unit * ctx.unit)) return null; // zero-area sliver
  return ct;
}
