/**
 * Step 3: integer chord paths for clipper. Each carrier is cut at its nodes, arc pieces become
 * short chords, and every point is tagged (Z = record index + 1) with its vertex record.
 */
import type { IntPoint } from 'clipper-lib';
import { lengthOf } from '../geometry/contour';
import { ARC, curvePoint, paramOf, pointAt, wrapAngle, type Carrier } from './carriers';
import { CIRCUMSCRIBE, INSCRIBE, LUNE_MAX, NEAR_SIZE, NEAR_ZONE, sagFor } from './arrangement';
import { type Ctx, find, FREE_STEP, MAX_STEP, nodeCarriers } from './context';
import { NODE_UNITS } from './grid';

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

/** Largest height (integer units) of a flat arc's piece above the chord clipper is given for it. */
const FLAT_UNITS = 0.5;

/**
 * What ctx.near demands of one piece (set by pieceDemands): the sides (INSCRIBE | CIRCUMSCRIBE),
 * the smallest gap to something inside the arc (which circumscribed chords never reach, and
 * inscribed ones must not) and to something outside (the other way round), and whether the
 * piece runs between two crossings with a circle within a few grid units of it.
 */
let pieceSide = 0;
let pieceGapIn = Infinity;
let pieceGapOut = Infinity;
let pieceHug = false;

/**
 * The demands of ctx.near that apply to the piece [ua, ub] of arc c: a zone's when the piece
 * reaches into it, a crossing circle's by which side of that circle the piece lies on (its
 * middle, and its ends where they are clear of the circle: a piece that passes from one side
 * to the other, where the circles cross outside the other arc's range, takes both).
 */
function pieceDemands(ctx: Ctx, c: Carrier, near: readonly number[], ua: number, ub: number): void {
  pieceSide = 0;
  pieceGapIn = Infinity;
  pieceGapOut = Infinity;
  pieceHug = false;
  for (let k = 0; k < near.length; k += NEAR_SIZE) {
    if (near[k] === NEAR_ZONE) {
      // The piece's angular range (from the centre) meets the zone's.
      const mid = c.t0 + c.phi * ((ua + ub) / 2), half = (Math.abs(c.phi) * (ub - ua)) / 2;
      if (!(Math.abs(wrapAngle(mid - near[k + 1])) <= near[k + 2] + half)) continue;
      demandOfPiece(near[k + 3], near[k + 4]);
      continue;
    }
    const ox = near[k + 1], oy = near[k + 2], or = near[k + 3], lim = LUNE_MAX * Math.max(c.r, or);
    let on = 0;
    for (let s = 0; s < 3; s++) {
      const u = s === 0 ? (ua + ub) / 2 : s === 1 ? ua : ub;
      const t = c.t0 + c.phi * u;
      const d = lengthOf(c.cx + c.r * Math.cos(t) - ox, c.cy + c.r * Math.sin(t) - oy) - or;
      if (!(Math.abs(d) > 3 * ctx.unit)) {
        on++; // on the other circle as far as the grid can tell (at a crossing, or a lune below the grid)
        continue;
      }
      const gap = d < 0 ? near[k + 4] : near[k + 5];
      if (gap < lim) demandOfPiece(d < 0 ? INSCRIBE : CIRCUMSCRIBE, gap);
    }
    if (on === 3) pieceHug = true;
  }
}

function demandOfPiece(side: number, gap: number): void {
  pieceSide |= side;
  if (side === INSCRIBE) pieceGapOut = Math.min(pieceGapOut, gap);
  else pieceGapIn = Math.min(pieceGapIn, gap);
}

/** Forgets the records and pieces of a first build of the paths (before a finer grid). */
export function resetPaths(ctx: Ctx): void {
  for (const a of [ctx.rx, ctx.ry, ctx.rX, ctx.rY, ctx.rExact, ctx.rCar, ctx.rAll, ctx.rAlt, ctx.chordPieces]) a.length = 0;
  ctx.chordSag.fill(0);
  ctx.maxTol = -1;
}

/** Step 3: integer chord paths, one per source contour of the given loops. */
export function buildPaths(ctx: Ctx, loops: readonly number[]): { subj: IntPoint[][]; clip: IntPoint[][]; closest: number } {
  const subj: IntPoint[][] = [], clip: IntPoint[][] = [];
  const cs = ctx.carriers;
  for (const l of loops) {
    const loop = ctx.loops[l];
    const path: IntPoint[] = [];
    for (const id of loop.ids) {
      const c = cs[id];
      const r0 = find(ctx, c.n0), r1 = find(ctx, c.n1);
      if (r0 === r1) continue; // collapsed by merging
      // A flat arc (kept as its chord, carriers.ts) whose height above the chord clipper would
      // see: its pieces get chords of their own, so no feature within that height is misplaced.
      const flatUnits = c.flat === 0 ? 0 : (c.len / 2) * Math.abs(Math.tan(c.flat / 4)) * ctx.scale;
      if (c.kind !== ARC && !ctx.splits[id] && flatUnits <= FLAT_UNITS) {
        // A straight edge with no node inside: its start vertex is all clipper needs.
        pushVertex(ctx, path, ctx.nx[r0], ctx.ny[r0], true, nodeCarriers(ctx, r0));
        ctx.chordPieces.push(id, r0, r1);
        continue;
      }
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
        pushVertex(ctx, path, ctx.nx[nd], ctx.ny[nd], true, nodeCarriers(ctx, nd));
        if (c.kind !== ARC) {
          const ua = seq[k].u, ub = seq[k + 1].u;
          // Height of the piece above its own chord: the arc's height times the square of its share.
          const cnt = flatUnits === 0 ? 1 : Math.ceil(Math.sqrt((flatUnits * (ub - ua) * (ub - ua)) / FLAT_UNITS));
          if (cnt <= 1) ctx.chordPieces.push(id, nd, seq[k + 1].n);
          for (let j = 1; j < cnt; j++) {
            const [x, y] = curvePoint(c, ua + ((ub - ua) * j) / cnt);
            pushVertex(ctx, path, x, y, false, own);
          }
          continue;
        }
        const ua = seq[k].u, ub = seq[k + 1].u;
        const dphi = Math.abs(c.phi) * (ub - ua);
        const near = ctx.near[id];
        let side = 0, hug = false, circ = false, sr = Infinity;
        if (near) {
          pieceDemands(ctx, c, near, ua, ub);
          side = pieceSide;
          hug = pieceHug && dphi <= MAX_STEP;
          circ = side === CIRCUMSCRIBE;
          if (side === (INSCRIBE | CIRCUMSCRIBE)) {
            // Both: the side with the larger gap, with chords that stay within it.
            circ = pieceGapOut > pieceGapIn;
            sr = sagFor(c, circ ? pieceGapOut : pieceGapIn) / c.r;
          }
        }
        // Inscribed chords never reach what lies outside the circle, however long they are.
        // Circumscribed ones reach out 1.5 r (1 / cos(half step) - 1), the end corners 1.5 times that.
        let step = MAX_STEP;
        if (!ctx.crowded[id] && (side & CIRCUMSCRIBE) === 0) step = FREE_STEP;
        else if (sr < 1) step = Math.min(MAX_STEP, circ ? 2 * Math.acos(1 / (1 + sr / 2.25)) : 2 * Math.acos(1 - sr));
        let cnt = Math.ceil(dphi / step);
        // At least two chords while the piece is visibly curved at the integer scale; one when
        // it hugs another circle closer than the grid shows, so that the two pieces form a
        // digon that the exact geometry settles (digons.ts).
        if (hug) cnt = 1;
        else if (cnt < 2 && c.r * (1 - Math.cos(dphi / 2)) * ctx.scale > 0.5) cnt = 2;
        if (cnt <= 1) ctx.chordPieces.push(id, nd, seq[k + 1].n);
        const half = dphi / Math.max(cnt, 1) / 2;
        const dev = circ ? 1.5 * c.r * (1 / Math.cos(half) - 1) : c.r * (1 - Math.cos(half));
        if (dev > ctx.chordSag[id]) ctx.chordSag[id] = dev;
        if (circ && cnt >= 1) {
          // Tangent segments: corners at the middle angles, pushed out to r / cos(half step).
          // The first and last corners go out a little further, so the end segments leave the
          // end tangents (a tangent neighbour line would make the node collinear for clipper).
          const sec = 1 / Math.cos(half), secEnd = 1 + 1.5 * (sec - 1);
          for (let j = 0; j < cnt; j++) {
            const t = c.t0 + c.phi * (ua + ((ub - ua) * (j + 0.5)) / cnt);
            const rr = c.r * (j === 0 || j === cnt - 1 ? secEnd : sec);
            pushVertex(ctx, path, c.cx + rr * Math.cos(t), c.cy + rr * Math.sin(t), false, own);
          }
          continue;
        }
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
  const closest = groupRecords(ctx);
  return { subj, clip, closest };
}

/** Records kept per hash cell for comparison (a crowded cell is below the grid anyway). */
const CROWD = 16;

/**
 * Records of different loops at one integer point stay apart (each keeps its own exact point and
 * carriers); every one of them learns the others, because clipper keeps one tag there. The same
 * pass finds the smallest distance between two distinct exact points within NODE_UNITS grid
 * units of each other (Infinity if none), which tells grid.ts whether the grid is too coarse.
 * Records are hashed into cells of NODE_UNITS units (open addressing on typed arrays) and each
 * is compared with those of its 3 × 3 cells: linear in the record count.
 */
function groupRecords(ctx: Ctx): number {
  const nr = ctx.rX.length;
  for (let r = 0; r < nr; r++) {
    ctx.rAll.push(ctx.rCar[r]);
    ctx.rAlt.push(null);
  }
  let size = 1;
  while (size < 2 * nr) size <<= 1;
  const mask = size - 1;
  const ci = new Float64Array(size), cj = new Float64Array(size), head = new Int32Array(size).fill(-1), count = new Int32Array(size);
  const next = new Int32Array(nr).fill(-1);
  const same = new Int32Array(nr).fill(-1); // a record at the same integer point seen before
  const rX = ctx.rX, rY = ctx.rY, rx = ctx.rx, ry = ctx.ry, ex = ctx.rExact;
  let best = Infinity;
  const near = NODE_UNITS * ctx.unit;
  for (let r = 0; r < nr; r++) {
    const X = rX[r], Y = rY[r];
    const i = Math.floor(X / NODE_UNITS), j = Math.floor(Y / NODE_UNITS);
    let home = -1;
    for (let di = -1; di <= 1; di++) {
      for (let dj = -1; dj <= 1; dj++) {
        const a = i + di, b = j + dj;
        let h = (Math.imul(a | 0, 0x27d4eb2d) ^ Math.imul(b | 0, 0x165667b1)) & mask;
        while (head[h] >= 0 && !(ci[h] === a && cj[h] === b)) h = (h + 1) & mask;
        if (di === 0 && dj === 0) home = h;
        for (let q = head[h]; q >= 0; q = next[q]) {
          if (rX[q] === X && rY[q] === Y && same[r] < 0) same[r] = q;
          if (!ex[q] || !ex[r]) continue;
          const d = Math.sqrt((rx[q] - rx[r]) ** 2 + (ry[q] - ry[r]) ** 2);
          if (d > 0 && d < best && d < near) best = d;
        }
      }
    }
    if (head[home] < 0) {
      ci[home] = i;
      cj[home] = j;
    } else if (count[home] >= CROWD) continue;
    next[r] = head[home];
    head[home] = r;
    count[home]++;
  }
  // Groups of records at one integer point: each record links to an earlier one there.
  const groups = new Map<number, number[]>();
  for (let r = 0; r < nr; r++) {
    if (same[r] < 0) continue;
    let root = same[r];
    while (same[root] >= 0) root = same[root];
    const list = groups.get(root);
    if (list) list.push(r);
    else groups.set(root, [root, r]);
  }
  for (const list of groups.values()) {
    const all: number[] = [];
    for (const r of list) for (const c of ctx.rCar[r]) if (!all.includes(c)) all.push(c);
    for (const r of list) {
      ctx.rAll[r] = all;
      ctx.rAlt[r] = list;
    }
  }
  return best;
}
