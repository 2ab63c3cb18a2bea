/**
 * The boolean pipeline. Clipper decides topology only; exact geometry gives the numbers.
 *
 *   1. Carriers: every source segment becomes an exact line or arc (arcs over 180 degrees are split).
 *   2. Arrangement: exact intersections, touches and overlaps between carriers are computed once and
 *      shared as nodes, so both operands pass through the same exact point.
 *   3. Chording: each carrier is cut at its nodes; arc pieces become short chords; all points are
 *      scaled to integers around the inputs' centre and tagged (Z) with their vertex record.
 *   4. Clipper runs; new crossings get Z through ZFillFunction (side table of crossing edges).
 *   5. Tracing: each output edge is traced to its carrier; runs on one carrier become one exact
 *      segment; run ends are placed on exact nodes or exact carrier intersections.
 */
import ClipperLib from 'clipper-lib';
import type { IntPoint } from 'clipper-lib';
import { arcFromChord, pushArc, type Contour, type Region } from '../geometry/contour';
import { regionMomentsAbout } from '../moments/kernel';
import {
  ARC, LINE, curveIntersections, distToCarrier, distToCurve, makeArc, makeLine, nearestPoint,
  implicitAt, paramOf, pointAt, polishIntersection, sameCurve, windingOf, wrapAngle, type Carrier,
} from './carriers';

ClipperLib.use_xyz = true;

export type Mode = 'union' | 'difference' | 'intersection' | 'evenodd';

/** Largest integer coordinate used (clipper JS leaves its fast path above 47453132). */
const INT_RANGE = 4e7;
/** Largest angle (radians) spanned by one chord: sagitta <= (1 - cos(0.1)) r ~ 5e-3 r. */
const MAX_STEP = 0.2;
const SAG_MAX = 1 - Math.cos(MAX_STEP / 2);
/** Smallest relative sagitta used when refining near-tangent arcs (caps the chord count). */
const SAG_FLOOR = 1e-6;
/** Arcs with a radius above this multiple of the extent are traced as their chords. */
const FLAT_RADIUS = 1e5;
/** Exact-geometry tolerance relative to the extent: points closer than this are one point. */
const REL_EPS = 1e-10;

export interface SourceGroup {
  contours: readonly Contour[];
  group: number;
}

interface Ctx {
  mode: Mode;
  ext: number;
  eps: number;
  unit: number;
  ox: number;
  oy: number;
  scale: number;
  carriers: Carrier[];
  /** Per contour: the carrier ids in order. */
  loops: { group: number; ids: number[] }[];
  /** Per carrier: first and last carrier id of its loop (ids of one loop are consecutive). */
  loopLo: number[];
  loopHi: number[];
  /** Inputs are well-formed loops: neighbours on a loop meet only at their shared vertex. */
  trustLoops: boolean;
  nx: number[];
  ny: number[];
  ncar: number[][];
  parent: number[];
  splits: (number[] | null)[];
  /** Per carrier: largest chord sagitta allowed (absolute). */
  sag: number[];
  contact: boolean;
  // Vertex records (one per clipper input point); Z = index + 1.
  rx: number[];
  ry: number[];
  rX: number[];
  rY: number[];
  rExact: boolean[];
  rCar: number[][];
  // ZFill records: four vertex Zs per crossing.
  zf: number[];
}

function find(ctx: Ctx, n: number): number {
  const p = ctx.parent;
  while (p[n] !== n) {
    p[n] = p[p[n]];
    n = p[n];
  }
  return n;
}

function union(ctx: Ctx, a: number, b: number): void {
  a = find(ctx, a);
  b = find(ctx, b);
  if (a === b) return;
  if (a < b) ctx.parent[b] = a;
  else ctx.parent[a] = b;
}

function newNode(ctx: Ctx, x: number, y: number): number {
  const id = ctx.nx.length;
  ctx.nx.push(x);
  ctx.ny.push(y);
  ctx.ncar.push([]);
  ctx.parent.push(id);
  return id;
}

/** Step 1: carriers and vertex nodes from the source contours. */
function buildCarriers(ctx: Ctx, groups: readonly SourceGroup[]): void {
  const eps = ctx.eps;
  for (const g of groups) {
    for (const c of g.contours) {
      const n = c.xy.length >> 1;
      if (n < 2) continue;
      // Expand arcs over 180 degrees, then drop repeated vertices (zero-length edges).
      const xy: number[] = [], bl: number[] = [];
      for (let i = 0; i < n; i++) {
        const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
        const j = (i + 1) % n;
        const bx = c.xy[2 * j], by = c.xy[2 * j + 1];
        const b = c.bulge ? c.bulge[i] : 0;
        if (!Number.isFinite(ax) || !Number.isFinite(ay)) continue;
        xy.push(ax, ay);
        if (Number.isFinite(b) && b !== 0 && Math.abs(b) > 1) pushArc(xy, bl, ax, ay, bx, by, 4 * Math.atan(b));
        else bl.push(Number.isFinite(b) ? b : 0);
      }
      const vx: number[] = [], vy: number[] = [], vb: number[] = [];
      const m0 = xy.length >> 1;
      for (let i = 0; i < m0; i++) {
        const x = xy[2 * i], y = xy[2 * i + 1];
        const k = vx.length;
        if (k > 0 && Math.hypot(x - vx[k - 1], y - vy[k - 1]) <= eps) {
          vb[k - 1] = bl[i]; // the zero-length edge goes; the next edge starts at the kept vertex
          continue;
        }
        vx.push(x);
        vy.push(y);
        vb.push(bl[i]);
      }
      // Closing duplicates; the surviving last vertex keeps its own outgoing bulge only if distinct.
      while (vx.length > 1 && Math.hypot(vx[vx.length - 1] - vx[0], vy[vy.length - 1] - vy[0]) <= eps) {
        vx.pop();
        vy.pop();
        vb.pop();
      }
      const m = vx.length;
      if (m < 2) continue;
      const nodes: number[] = [];
      for (let i = 0; i < m; i++) nodes.push(newNode(ctx, vx[i], vy[i]));
      const ids: number[] = [];
      for (let i = 0; i < m; i++) {
        const j = (i + 1) % m;
        const ax = vx[i], ay = vy[i], bx = vx[j], by = vy[j];
        const L = Math.hypot(bx - ax, by - ay);
        const b = vb[i];
        const id = ctx.carriers.length;
        let car: Carrier;
        // A nearly flat arc (radius far beyond the extent, where centre-based formulas lose
        // their digits) is traced as its chord and gets its sweep back on output.
        const phi = b !== 0 ? 4 * Math.atan(b) : 0;
        const rr = phi !== 0 ? L / (2 * Math.sin(Math.abs(phi) / 2)) : Infinity;
        if (phi !== 0 && rr <= FLAT_RADIUS * ctx.ext) {
          const { cx, cy, r } = arcFromChord(ax, ay, bx, by, phi);
          car = makeArc(id, g.group, ax, ay, bx, by, cx, cy, r, phi);
        } else car = makeLine(id, g.group, ax, ay, bx, by, phi);
        car.n0 = nodes[i];
        car.n1 = nodes[j];
        ctx.carriers.push(car);
        ctx.splits.push(null);
        ctx.sag.push(car.kind === ARC ? SAG_MAX * car.r : 0);
        ctx.ncar[nodes[i]].push(id);
        ctx.ncar[nodes[j]].push(id);
        ids.push(id);
      }
      ctx.loops.push({ group: g.group, ids });
      for (let k = 0; k < ids.length; k++) {
        ctx.loopLo.push(ids[0]);
        ctx.loopHi.push(ids[ids.length - 1]);
      }
    }
  }
}

function endpointNode(ctx: Ctx, c: Carrier, x: number, y: number): number {
  const d0 = Math.hypot(x - c.ax, y - c.ay), d1 = Math.hypot(x - c.bx, y - c.by);
  if (d0 <= ctx.eps && d0 <= d1) return c.n0;
  if (d1 <= ctx.eps) return c.n1;
  return -1;
}

function addSplit(ctx: Ctx, c: Carrier, node: number): void {
  (ctx.splits[c.id] ??= []).push(node);
  ctx.ncar[node].push(c.id);
}

/** A common point p of carriers a and b: share it as one exact node. */
function sharePoint(ctx: Ctx, a: Carrier, b: Carrier, x: number, y: number): void {
  const ea = endpointNode(ctx, a, x, y), eb = endpointNode(ctx, b, x, y);
  if (ea >= 0 && eb >= 0) {
    if (find(ctx, ea) !== find(ctx, eb)) {
      union(ctx, ea, eb);
      ctx.contact = true;
    }
    return;
  }
  ctx.contact = true;
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

/** Distance to the carrier's true curve within its range (a flat arc is not its chord here). */
function distExact(c: Carrier, x: number, y: number): number {
  if (c.kind === ARC || c.flat === 0) return distToCarrier(c, x, y);
  const u = paramOf(c, x, y);
  if (u < 0 || u > 1) return Math.min(Math.hypot(x - c.ax, y - c.ay), Math.hypot(x - c.bx, y - c.by));
  const [f, gx, gy] = implicitAt(c, x, y);
  return Math.abs(f) / Math.hypot(gx, gy);
}

/**
 * Nested, nearly tangent circles: the outer arc's chords cut inwards by up to the sagitta and
 * would cross the inner arc where the exact arcs do not meet. Refine the outer arc's chords so
 * that their sagitta stays below the gap (down to a floor; below it, tracing snaps the crossings).
 */
function refineNested(ctx: Ctx, a: Carrier, b: Carrier): void {
  const D = Math.hypot(a.cx - b.cx, a.cy - b.cy);
  const gap = Math.abs(a.r - b.r) - D;
  const outer = a.r >= b.r ? a : b;
  if (!(gap > 0) || gap >= 2 * SAG_MAX * outer.r) return;
  const want = Math.max(gap / 2.5, SAG_FLOOR * outer.r);
  if (want < ctx.sag[outer.id]) ctx.sag[outer.id] = want;
}

/**
 * A vertex of b just inside arc a (closer than a's chord sagitta) would poke out of a's chords.
 * Refine a so that its chords pass inside the vertex.
 */
function refineNearVertex(ctx: Ctx, a: Carrier, b: Carrier): void {
  for (let k = 0; k < 2; k++) {
    const x = k === 0 ? b.ax : b.bx, y = k === 0 ? b.ay : b.by;
    const gap = a.r - Math.hypot(x - a.cx, y - a.cy);
    if (!(gap > ctx.eps) || gap >= 1.5 * ctx.sag[a.id]) continue;
    const u = paramOf(a, x, y);
    if (u < 0 || u > 1) continue;
    const want = Math.max(gap / 2.5, SAG_FLOOR * a.r);
    if (want < ctx.sag[a.id]) ctx.sag[a.id] = want;
  }
}

/** Step 2: all pairwise contacts, with a sweep over x as the broad phase. */
function buildArrangement(ctx: Ctx): void {
  const cs = ctx.carriers;
  const order = cs.map((_, i) => i).sort((i, j) => cs[i].xmin - cs[j].xmin);
  const eps = ctx.eps;
  for (let p = 0; p < order.length; p++) {
    const a = cs[order[p]];
    for (let q = p + 1; q < order.length; q++) {
      const b = cs[order[q]];
      if (b.xmin > a.xmax + eps) break;
      if (b.ymin > a.ymax + eps || b.ymax < a.ymin - eps) continue;
      if (ctx.trustLoops && ctx.loopLo[a.id] === ctx.loopLo[b.id]) {
        const d = Math.abs(a.id - b.id);
        if (d === 1 || d === ctx.loopHi[a.id] - ctx.loopLo[a.id]) continue;
      }
      intersectPair(ctx, a, b);
    }
  }
  // Merged nodes: the representative carries every member's carriers.
  const nn = ctx.nx.length;
  for (let i = 0; i < nn; i++) {
    const r = find(ctx, i);
    if (r !== i) {
      for (const c of ctx.ncar[i]) if (!ctx.ncar[r].includes(c)) ctx.ncar[r].push(c);
      ctx.ncar[i] = [];
    }
  }
}

function pushVertex(ctx: Ctx, path: IntPoint[], x: number, y: number, exact: boolean, car: number[]): void {
  const X = Math.round((x - ctx.ox) * ctx.scale), Y = Math.round((y - ctx.oy) * ctx.scale);
  const last = path.length ? path[path.length - 1] : null;
  if (last && last.X === X && last.Y === Y) {
    mergeRecord(ctx, (last.Z as number) - 1, x, y, exact, car);
    return;
  }
  const id = ctx.rx.length;
  ctx.rx.push(x);
  ctx.ry.push(y);
  ctx.rX.push(X);
  ctx.rY.push(Y);
  ctx.rExact.push(exact);
  ctx.rCar.push(car);
  path.push({ X, Y, Z: id + 1 });
}

function mergeRecord(ctx: Ctx, id: number, x: number, y: number, exact: boolean, car: number[]): void {
  if (exact && !ctx.rExact[id]) {
    ctx.rx[id] = x;
    ctx.ry[id] = y;
    ctx.rExact[id] = true;
  }
  const merged = ctx.rCar[id].slice();
  for (const c of car) if (!merged.includes(c)) merged.push(c);
  ctx.rCar[id] = merged;
}

/** Step 3: integer chord paths, one per source contour. */
function buildPaths(ctx: Ctx): { subj: IntPoint[][]; clip: IntPoint[][] } {
  const subj: IntPoint[][] = [], clip: IntPoint[][] = [];
  const cs = ctx.carriers;
  for (const loop of ctx.loops) {
    const path: IntPoint[] = [];
    for (const id of loop.ids) {
      const c = cs[id];
      const r0 = find(ctx, c.n0), r1 = find(ctx, c.n1);
      if (r0 === r1) continue; // collapsed by merging
      const own = [id];
      const inner: { u: number; n: number }[] = [];
      for (const s of ctx.splits[id] ?? []) {
        const rs = find(ctx, s);
        if (rs === r0 || rs === r1) continue;
        const u = paramOf(c, ctx.nx[rs], ctx.ny[rs]);
        inner.push({ u: Math.min(1, Math.max(0, u)), n: rs });
      }
      inner.sort((p, q) => p.u - q.u);
      const seq: { u: number; n: number }[] = [{ u: 0, n: r0 }];
      for (const s of inner) if (s.n !== seq[seq.length - 1].n) seq.push(s);
      seq.push({ u: 1, n: r1 });
      for (let k = 0; k + 1 < seq.length; k++) {
        const nd = seq[k].n;
        pushVertex(ctx, path, ctx.nx[nd], ctx.ny[nd], true, ctx.ncar[nd]);
        if (c.kind !== ARC) continue;
        const ua = seq[k].u, ub = seq[k + 1].u;
        const dphi = Math.abs(c.phi) * (ub - ua);
        const sr = ctx.sag[id] / c.r;
        const step = sr >= SAG_MAX ? MAX_STEP : 2 * Math.acos(1 - sr);
        let cnt = Math.ceil(dphi / step);
        // At least two chords while the piece is visibly curved at the integer scale.
        if (cnt < 2 && c.r * (1 - Math.cos(dphi / 2)) * ctx.scale > 0.5) cnt = 2;
        for (let j = 1; j < cnt; j++) {
          const [x, y] = pointAt(c, ua + ((ub - ua) * j) / cnt);
          pushVertex(ctx, path, x, y, false, own);
        }
      }
    }
    // Close: a last vertex equal to the first merges into it.
    while (path.length > 1) {
      const a = path[path.length - 1], b = path[0];
      if (a.X !== b.X || a.Y !== b.Y) break;
      const ra = (a.Z as number) - 1;
      mergeRecord(ctx, (b.Z as number) - 1, ctx.rx[ra], ctx.ry[ra], ctx.rExact[ra], ctx.rCar[ra]);
      path.pop();
    }
    if (path.length < 3) continue;
    (loop.group === 0 ? subj : clip).push(path);
  }
  return { subj, clip };
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
  if (!z || z <= 0 || z > ctx.rCar.length) return [];
  return ctx.rCar[z - 1];
}

function edgeCarriers(ctx: Ctx, zb: number | undefined, zt: number | undefined): number[] {
  const a = recCarriers(ctx, zb), b = recCarriers(ctx, zt);
  const common = intersectLists(a, b);
  return common.length ? common : unionLists(a, b);
}

/** Exact classification of a point against the operation's result. */
function classify(ctx: Ctx, x: number, y: number): boolean {
  let w0 = 0, w1 = 0;
  for (const c of ctx.carriers) {
    if (c.group === 0) w0 += windingOf(c, x, y);
    else w1 += windingOf(c, x, y);
  }
  switch (ctx.mode) {
    case 'union': return w0 !== 0 || w1 !== 0;
    case 'difference': return w0 !== 0 && w1 === 0;
    case 'intersection': return w0 !== 0 && w1 !== 0;
    default: return (w0 & 1) === 1;
  }
}

/** Midpoint of carrier c between the points p and q that lie on it. */
function pieceMid(c: Carrier, px: number, py: number, qx: number, qy: number): [number, number] {
  if (c.kind === LINE) return [(px + qx) / 2, (py + qy) / 2];
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
  const L = Math.hypot(qx - px, qy - py);
  if (!(L > 0)) return cands[0];
  const nx = -(qy - py) / L, ny = (qx - px) / L; // left normal; the tangent at a piece middle is parallel to q - p
  const mids = cands.map((c) => pieceMid(cs[c], px, py, qx, qy));
  let fallback = -1;
  for (let k = 0; k < cands.length; k++) {
    const [mx, my] = mids[k];
    let delta = 0.25 * L;
    for (let o = 0; o < cands.length; o++) {
      if (o === k) continue;
      const d = Math.hypot(mids[o][0] - mx, mids[o][1] - my);
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
  const sag = c.kind === ARC ? SAG_MAX * c.r * 1.5 : (Math.abs(c.flat) * c.len) / 6;
  return 3 * ctx.unit + sag + ctx.eps;
}

function assignEdge(ctx: Ctx, si: number[], sj: number[], px: number, py: number, qx: number, qy: number): number {
  const cs = ctx.carriers;
  // The clipper edge is one chord: its ends and its middle lie on the carrier to chord accuracy
  // (this tells an arc from a line that joins the same two points).
  const mx = (px + qx) / 2, my = (py + qy) / 2;
  const fits = (c: number): boolean => {
    const t = carrierTol(ctx, cs[c]);
    return distToCarrier(cs[c], mx, my) <= t && distToCarrier(cs[c], px, py) <= t && distToCarrier(cs[c], qx, qy) <= t;
  };
  // Fast path: both ends are plain chord points (or nodes) of one and the same carrier.
  if (si.length === 1 && sj.length === 1 && si[0] === sj[0]) return si[0];
  let common = intersectLists(si, sj);
  if (common.length === 1 && fits(common[0])) return common[0];
  common = common.filter(fits);
  // Collinear vertices dropped by clipper: the edge may span several carriers of one line.
  const pool = common.length ? common : unionLists(si, sj);
  const fit = common.length ? common : pool.filter(fits);
  if (fit.length === 1) return fit[0];
  if (fit.length > 1) return resolveTie(ctx, fit, px, py, qx, qy);
  // Nothing fits within tolerance: the carrier nearest to both ends (all carriers if no tags).
  const search = pool.length ? pool : cs.map((c) => c.id);
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

/** Exact position of the vertex where carrier a hands over to carrier b. */
function placeVertex(ctx: Ctx, a: number, b: number, px: number, py: number, exact: boolean, car: number[]): [number, number] {
  if (exact && car.includes(a) && car.includes(b)) return [px, py];
  const ca = ctx.carriers[a], cb = ctx.carriers[b];
  // Carriers that share a source vertex (or a merged node) meet there exactly.
  for (const na of [ca.n0, ca.n1]) {
    const ra = find(ctx, na);
    if (ra !== find(ctx, cb.n0) && ra !== find(ctx, cb.n1)) continue;
    const x = ctx.nx[ra], y = ctx.ny[ra];
    if (Math.hypot(x - px, y - py) <= 8 * ctx.unit) return [x, y];
  }
  if (!sameCurve(ca, cb, ctx.eps)) {
    const pts = curveIntersections(ca, cb, 1e3 * ctx.eps);
    const k = nearestPoint(pts, px, py);
    if (k >= 0) {
      const [x, y] = polishIntersection(ca, cb, pts[k], pts[k + 1]);
      let lim = 8 * ctx.unit;
      if (ca.kind === ARC) lim += 0.2 * ca.r;
      if (cb.kind === ARC) lim += 0.2 * cb.r;
      if (Math.hypot(x - px, y - py) <= lim) return [x, y];
    }
    // Near-tangent circles with no common point: the point of closest approach.
    if (ca.kind === ARC && cb.kind === ARC) {
      const d = Math.hypot(cb.cx - ca.cx, cb.cy - ca.cy);
      if (d > 0) {
        // Apart: towards the other centre. Nested: the small circle's far side, the big one's near side.
        const nested = d < Math.abs(ca.r - cb.r) + ctx.eps;
        const sgn = !nested || ca.r >= cb.r ? 1 : -1;
        const ux = (cb.cx - ca.cx) / d, uy = (cb.cy - ca.cy) / d;
        const x = ca.cx + sgn * ca.r * ux, y = ca.cy + sgn * ca.r * uy;
        if (Math.hypot(x - px, y - py) <= 0.2 * Math.min(ca.r, cb.r) + 8 * ctx.unit) return [x, y];
      }
    }
  }
  if (exact) return [px, py];
  return projectOnto(ca, px, py);
}

function projectOnto(c: Carrier, x: number, y: number): [number, number] {
  if (c.kind === LINE) {
    const u = paramOf(c, x, y);
    return [c.ax + u * (c.bx - c.ax), c.ay + u * (c.by - c.ay)];
  }
  const d = Math.hypot(x - c.cx, y - c.cy);
  if (d === 0) return [c.ax, c.ay];
  return [c.cx + ((x - c.cx) * c.r) / d, c.cy + ((y - c.cy) * c.r) / d];
}

/** Carriers passing through (x, y) within tolerance: the fallback for a missing or wrong tag. */
function carriersNear(ctx: Ctx, x: number, y: number): number[] {
  const out: number[] = [];
  for (const c of ctx.carriers) {
    const t = carrierTol(ctx, c);
    if (x < c.xmin - t || x > c.xmax + t || y < c.ymin - t || y > c.ymax + t) continue;
    if (distToCarrier(c, x, y) <= t) out.push(c.id);
  }
  return out;
}

/** Step 5: one clipper output path back to an exact contour (or null when degenerate). */
function tracePath(ctx: Ctx, path: IntPoint[]): Contour | null {
  const m = path.length;
  if (m < 3) return null;
  const px = new Float64Array(m), py = new Float64Array(m);
  const ex: boolean[] = new Array(m);
  const sets: number[][] = new Array(m);
  for (let i = 0; i < m; i++) {
    const p = path[i];
    const z = p.Z ?? 0;
    px[i] = p.X / ctx.scale + ctx.ox;
    py[i] = p.Y / ctx.scale + ctx.oy;
    ex[i] = false;
    if (z > 0 && z <= ctx.rx.length) {
      const r = z - 1;
      // A tag is trusted only when it belongs to this very point.
      if (ctx.rX[r] === p.X && ctx.rY[r] === p.Y) {
        px[i] = ctx.rx[r];
        py[i] = ctx.ry[r];
        ex[i] = ctx.rExact[r];
        sets[i] = ctx.rCar[r];
      } else sets[i] = [];
    } else if (z < 0 && -z * 4 <= ctx.zf.length) {
      const k = (-z - 1) * 4;
      sets[i] = unionLists(edgeCarriers(ctx, ctx.zf[k], ctx.zf[k + 1]), edgeCarriers(ctx, ctx.zf[k + 2], ctx.zf[k + 3]));
    } else sets[i] = [];
    if (sets[i].length === 0) sets[i] = carriersNear(ctx, px[i], py[i]);
  }
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
  const R = runV.length;
  const vx: number[] = [], vy: number[] = [];
  for (let k = 0; k < R; k++) {
    const i = runV[k];
    const prev = runC[(k + R - 1) % R];
    const [x, y] = placeVertex(ctx, prev, runC[k], px[i], py[i], ex[i], sets[i]);
    vx.push(x);
    vy.push(y);
  }
  // Segments; zero-length ones are dropped.
  const oxy: number[] = [], ob: number[] = [];
  for (let k = 0; k < R; k++) {
    const k2 = (k + 1) % R;
    const ax = vx[k], ay = vy[k], bx = vx[k2], by = vy[k2];
    if (Math.hypot(bx - ax, by - ay) <= ctx.eps) continue;
    const c = ctx.carriers[runC[k]];
    oxy.push(ax, ay);
    if (c.kind === LINE) {
      if (c.flat === 0) ob.push(0);
      else ob.push(Math.tan((c.flat * (paramOf(c, bx, by) - paramOf(c, ax, ay))) / 4));
      continue;
    }
    const u0 = paramOf(c, ax, ay), u1 = paramOf(c, bx, by);
    let d = wrapAngle(Math.atan2(by - c.cy, bx - c.cx) - Math.atan2(ay - c.cy, ax - c.cx));
    const want = Math.sign(c.phi) * Math.sign(u1 - u0);
    if (want > 0 && d < 0) d += 2 * Math.PI;
    else if (want < 0 && d > 0) d -= 2 * Math.PI;
    if (Math.abs(d) > Math.PI * (1 + 1e-12)) pushArc(oxy, ob, ax, ay, bx, by, d);
    else ob.push(Math.max(-1, Math.min(1, Math.tan(d / 4)))); // a half circle may round past 1
  }
  const n = ob.length;
  if (n < 2) return null;
  let anyArc = false;
  for (const b of ob) if (b !== 0 && Number.isFinite(b)) anyArc = true;
  if (n === 2 && !anyArc) return null;
  const ct: Contour = { xy: Float64Array.from(oxy), bulge: anyArc ? Float64Array.from(ob) : null };
  for (const v of ct.xy) if (!Number.isFinite(v)) return null;
  if (ct.bulge) for (const v of ct.bulge) if (!Number.isFinite(v)) return null;
  const A = regionMomentsAbout([ct], ct.xy[0], ct.xy[1]).m00;
  if (!(Math.abs(A) > 4 * ctx.unit * ctx.unit)) return null; // zero-area sliver
  return ct;
}

/** Run the pipeline on source groups (group 0 = subject, group 1 = clips). */
export function runBoolean(groups: readonly SourceGroup[], mode: Mode): { region: Region; contact: boolean } {
  // Extent: vertex bounds widened by each arc's bulge height (a cheap upper bound of the exact
  // bounds; only the integer scale depends on it).
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  for (const g of groups) {
    for (const c of g.contours) {
      const xy = c.xy, n = xy.length >> 1;
      for (let i = 0; i < n; i++) {
        const x = xy[2 * i], y = xy[2 * i + 1];
        if (!Number.isFinite(x) || !Number.isFinite(y)) continue;
        let h = 0;
        const b = c.bulge ? c.bulge[i] : 0;
        if (b !== 0 && Number.isFinite(b)) {
          const j = i + 1 === n ? 0 : i + 1;
          const L = Math.hypot(xy[2 * j] - x, xy[2 * j + 1] - y);
          // Height of the arc above its chord, or its whole diameter for a sweep over 180 deg.
          h = Math.abs(b) <= 1 ? (Math.abs(b) * L) / 2 : (L / 2) * (Math.abs(b) + 1 / Math.abs(b));
          if (!Number.isFinite(h)) h = 0;
        }
        if (x - h < xmin) xmin = x - h;
        if (x + h > xmax) xmax = x + h;
        if (y - h < ymin) ymin = y - h;
        if (y + h > ymax) ymax = y + h;
      }
    }
  }
  const ext = Math.max(xmax - xmin, ymax - ymin) / 2;
  if (!(ext > 0) || !Number.isFinite(ext)) return { region: [], contact: false };
  const scale = INT_RANGE / ext;
  const ctx: Ctx = {
    mode, ext, eps: REL_EPS * ext, unit: 1 / scale, ox: (xmin + xmax) / 2, oy: (ymin + ymax) / 2, scale,
    carriers: [], loops: [], nx: [], ny: [], ncar: [], parent: [], splits: [], sag: [], contact: false, loopLo: [], loopHi: [], trustLoops: mode !== 'evenodd',
    rx: [], ry: [], rX: [], rY: [], rExact: [], rCar: [], zf: [],
  };
  buildCarriers(ctx, groups);
  buildArrangement(ctx);
  const { subj, clip } = buildPaths(ctx);
  ClipperLib.use_xyz = true; // module-wide flag: set again in case another user turned it off
  const cpr = new ClipperLib.Clipper();
  cpr.ZFillFunction = (b1, t1, b2, t2, pt) => {
    ctx.zf.push(b1.Z ?? 0, t1.Z ?? 0, b2.Z ?? 0, t2.Z ?? 0);
    pt.Z = -(ctx.zf.length / 4);
  };
  const PT = ClipperLib.PolyType, PF = ClipperLib.PolyFillType, CT = ClipperLib.ClipType;
  if (subj.length) cpr.AddPaths(subj, PT.ptSubject, true);
  if (clip.length) cpr.AddPaths(clip, PT.ptClip, true);
  const sol: IntPoint[][] = [];
  const ct = mode === 'union' || mode === 'evenodd' ? CT.ctUnion : mode === 'difference' ? CT.ctDifference : CT.ctIntersection;
  const fill = mode === 'evenodd' ? PF.pftEvenOdd : PF.pftNonZero;
  cpr.Execute(ct, sol, fill, fill);
  const region: Contour[] = [];
  for (const p of sol) {
    const c = tracePath(ctx, p);
    if (c) region.push(c);
  }
  return { region, contact: ctx.contact };
}
