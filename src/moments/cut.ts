/**
 * Moments of the part of a region on one side of a horizontal line y = c, exactly.
 *
 * Each boundary segment is split where it crosses the line and only the pieces above it are
 * integrated. The region above is closed by pieces of the cut line itself. With Green's theorem in
 * the dx-only form (∫f dA = −∮ G dx with ∂G/∂y = f) and coordinates taken relative to the cut
 * line, every G (y, xy, y²/2, x²y, y³/3, xy²/2) vanishes on y = 0, so the closing pieces add
 * nothing and their pairing never matters: holes, several loops and tangencies need no special
 * case. The cut width is the summed length of the closing pieces, Σ x_entry − Σ x_exit.
 */
import type { Contour, Region } from '../geometry/contour';
import { arcFromChord, lengthOf, quarterTurnRegion } from '../geometry/contour';
import { addCircularSegment, contourSummary, regionReference, shiftMoments, type RawMoments } from './kernel';

export interface HalfPlaneMoments extends RawMoments {
  /** Total length of the cut line inside the region (the width b at the cut). */
  width: number;
}

/**
 * The pieces of one split segment, six numbers each (above: 1 or 0, x0, y0, x1, y1, sweep), in
 * one reused array: a segment splits into at most three pieces, and a plastic axis takes a few
 * dozen cuts through every arc of the outline, where an object per piece was a good share of
 * the garbage collector's work.
 */
const PIECES = new Float64Array(18);
function putPiece(k: number, above: boolean, x0: number, y0: number, x1: number, y1: number, sweep: number): number {
  const o = 6 * k;
  PIECES[o] = above ? 1 : 0;
  PIECES[o + 1] = x0;
  PIECES[o + 2] = y0;
  PIECES[o + 3] = x1;
  PIECES[o + 4] = y1;
  PIECES[o + 5] = sweep;
  return k + 1;
}

/**
 * Split the arc a->b of sweep phi (coordinates relative to the cut line, which is y = 0) where it
 * crosses the line, into PIECES; returns the piece count. Straight segments are split inline by
 * crossedLoop.
 */
function splitArc(ax: number, ay: number, bx: number, by: number, phi: number): number {
  const yc = 0;
  if (Math.abs(phi) < 0.02) return splitFlatArc(ax, ay, bx, by, phi, yc);
  const { cx, cy, r } = arcFromChord(ax, ay, bx, by, phi);
  const t0 = Math.atan2(ay - cy, ax - cx);
  // Parameters (fractions of the sweep) where the arc meets y = yc, in increasing order.
  let f1 = 2, f2 = 2;
  const sy = (yc - cy) / r;
  if (Math.abs(sy) < 1) {
    const base = Math.asin(sy);
    for (let m = 0; m < 2; m++) {
      const ang = m === 0 ? base : Math.PI - base;
      let d = phi > 0 ? ang - t0 : t0 - ang;
      d = ((d % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
      const f = d / Math.abs(phi);
      if (!(f > 1e-12 && f < 1 - 1e-12)) continue;
      if (f < f1) {
        f2 = f1;
        f1 = f;
      } else if (f < f2) f2 = f;
    }
  }
  let px = ax, py = ay, pf = 0, count = 0;
  for (let m = 0; m < 3; m++) {
    const f = m === 0 ? f1 : m === 1 ? f2 : 1;
    if (f > 1) continue;
    let qx: number, qy: number;
    if (f === 1) {
      qx = bx;
      qy = by;
    } else {
      const t = t0 + phi * f;
      qx = cx + r * Math.cos(t);
      qy = yc;
    }
    const mid = t0 + phi * ((pf + f) / 2);
    count = putPiece(count, cy + r * Math.sin(mid) > yc, px, py, qx, qy, phi * (f - pf));
    px = qx;
    py = qy;
    pf = f;
  }
  return count;
}

/**
 * Splitting a flat arc (|phi| < 0.02), whose centre is too far away to use: parametrise it by the
 * chord. With half-chord h, half-angle α, chord direction e and unit normal u towards the bulge,
 * the arc is P(t) = M + e h t + u w(t), t in [−1, 1], where (w + d)² + h² t² = r² (d = r cosα),
 * i.e. w² + 2dw + h²(t² − 1) = 0, and w(t) = h sinα (1 − t²) / (√(1 − t² sin²α) + cosα) without
 * cancellation. Meeting y = yc is a line in (t, w); substituting gives a quadratic whose root
 * near the chord is taken in the stable form C / q.
 */
function splitFlatArc(ax: number, ay: number, bx: number, by: number, phi: number, yc: number): number {
  const L = lengthOf(bx - ax, by - ay);
  const h = L / 2, alpha = Math.abs(phi) / 2;
  const sa = Math.sin(alpha), ca = Math.cos(alpha);
  const sg = phi > 0 ? 1 : -1;
  const ex = (bx - ax) / L, ey = (by - ay) / L;
  const ux = sg * ey, uy = -sg * ex;
  const mx = (ax + bx) / 2, my = (ay + by) / 2;
  // Every coefficient is divided by d = r cosα = h cosα / sinα, which is huge for flat arcs.
  const invD = sa / (h * ca);
  const k = yc - my; // ey h t + uy w = k
  const wOf = (t: number) => (h * sa * (1 - t * t)) / (Math.sqrt(1 - t * t * sa * sa) + ca);
  const ts: number[] = [];
  const smallRoot = (A: number, B: number, C: number): number[] => {
    const disc = B * B - 4 * A * C;
    if (disc < 0) return [];
    const q = -(B + (B >= 0 ? 1 : -1) * Math.sqrt(disc)) / 2;
    return q === 0 ? [] : A === 0 ? [C / q] : [C / q, q / A];
  };
  if (Math.abs(ey) > Math.abs(uy)) {
    // t = (k − uy w)/(ey h): (1 + uy²/ey²) w² + (2d − 2k uy/ey²) w + (k²/ey² − h²) = 0.
    for (const w of smallRoot((1 + (uy * uy) / (ey * ey)) * invD, 2 - (2 * k * uy * invD) / (ey * ey), ((k * k) / (ey * ey) - h * h) * invD)) {
      if (w >= -1e-12 * h && w <= h) ts.push((k - uy * w) / (ey * h));
    }
  } else {
    // w = (k − ey h t)/uy: (ey²h²/uy² + h²) t² + (−2k ey h/uy² − 2d ey h/uy) t + (k²/uy² + 2dk/uy − h²) = 0.
    const A = ((ey * ey * h * h) / (uy * uy) + h * h) * invD;
    const B = ((-2 * k * ey * h) / (uy * uy)) * invD - (2 * ey * h) / uy;
    const C = ((k * k) / (uy * uy) - h * h) * invD + (2 * k) / uy;
    for (const t of smallRoot(A, B, C)) ts.push(t);
  }
  const cuts = ts.filter((t) => t > -1 + 1e-12 && t < 1 - 1e-12).sort((p, q) => p - q);
  const theta = (t: number) => Math.asin(Math.max(-1, Math.min(1, t * sa)));
  let px = ax, py = ay, pt = -1, count = 0;
  for (const t of [...cuts, 1]) {
    let qx: number, qy: number;
    if (t === 1) {
      qx = bx;
      qy = by;
    } else {
      const w = wOf(t);
      qx = mx + ex * h * t + ux * w;
      qy = yc;
    }
    const tm = (pt + t) / 2;
    const above = my + ey * h * tm + uy * wOf(tm) > yc;
    count = putPiece(count, above, px, py, qx, qy, sg * (theta(t) - theta(pt)));
    px = qx;
    py = qy;
    pt = t;
  }
  return count;
}

/**
 * A region prepared for many cuts: each loop's y-range and its whole moments (about its first
 * vertex). A loop wholly above a cut adds its whole moments, a loop wholly below adds nothing,
 * and only the loops the line crosses are split, so a cut through a plate with thousands of holes
 * costs about the holes on that line.
 */
export interface CutPlan {
  /** The loops (for a turned plan, built on first use: the cuts themselves ask only for crossed loops). */
  readonly contours: readonly Contour[];
  /** Loop k, alone (a turned plan turns only the loops a cut crosses). */
  loop(k: number): Contour;
  readonly xmin: Float64Array;
  readonly xmax: Float64Array;
  readonly ymin: Float64Array;
  readonly ymax: Float64Array;
  /** Per loop k, in slots 6k to 6k + 5: A, ∫x, ∫y, ∫x², ∫y², ∫xy about its first vertex. */
  readonly whole: Float64Array;
  /** Per loop: its first vertex. */
  readonly firstX: Float64Array;
  readonly firstY: Float64Array;
}

export function planCuts(region: Region): CutPlan {
  const contours: Contour[] = [];
  for (const c of region) if (c.xy.length >= 4) contours.push(c);
  const n = contours.length;
  const xmin = new Float64Array(n), xmax = new Float64Array(n), ymin = new Float64Array(n), ymax = new Float64Array(n);
  const whole = new Float64Array(6 * n), firstX = new Float64Array(n), firstY = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const c = contours[k];
    const sm = contourSummary(c);
    xmin[k] = sm.xmin;
    xmax[k] = sm.xmax;
    ymin[k] = sm.ymin;
    ymax[k] = sm.ymax;
    const v = sm.v;
    for (let i = 0; i < 6; i++) whole[6 * k + i] = v[i];
    firstX[k] = c.xy[0];
    firstY[k] = c.xy[1];
  }
  return { contours, loop: (k) => contours[k], xmin, xmax, ymin, ymax, whole, firstX, firstY };
}

/**
 * The plan of the region turned by a quarter turn (quarterTurnRegion's sense), from this plan's
 * boxes and moments, exactly (swapped and negated), without integrating anything again. Loops
 * are turned when first asked for: the plastic axis about y crosses only a few of a perforated
 * plate's thousands of holes, and turning every one cost more than the cuts.
 */
export function turnPlan(plan: CutPlan, sense: 1 | -1): CutPlan {
  const n = plan.xmin.length;
  const w = plan.whole;
  const whole = new Float64Array(6 * n);
  for (let k = 0; k < 6 * n; k += 6) {
    // (x, y) -> (−y, x) for sense +1, (x, y) -> (y, −x) for sense −1.
    whole[k] = w[k];
    whole[k + 1] = sense > 0 ? -w[k + 2] : w[k + 2];
    whole[k + 2] = sense > 0 ? w[k + 1] : -w[k + 1];
    whole[k + 3] = w[k + 4];
    whole[k + 4] = w[k + 3];
    whole[k + 5] = -w[k + 5];
  }
  const neg = (a: Float64Array) => a.map((v) => -v);
  const turned: (Contour | undefined)[] = new Array(n);
  const loop = (k: number): Contour => (turned[k] ??= quarterTurnRegion([plan.loop(k)], sense)[0]);
  let all: Contour[] | null = null;
  const frame = {
    loop,
    whole,
    get contours(): readonly Contour[] {
      if (!all) {
        all = [];
        for (let k = 0; k < n; k++) all.push(loop(k));
      }
      return all;
    },
  };
  return sense > 0
    ? Object.assign(frame, { xmin: neg(plan.ymax), xmax: neg(plan.ymin), ymin: plan.xmin, ymax: plan.xmax, firstX: neg(plan.firstY), firstY: plan.firstX })
    : Object.assign(frame, { xmin: plan.ymin, xmax: plan.ymax, ymin: neg(plan.xmax), ymax: neg(plan.xmin), firstX: plan.firstY, firstY: neg(plan.firstX) });
}

/**
 * Moments of the part of the region where y > yc, about the point (ox, yc) on the cut line, and
 * the cut width b. Nothing is moved to the origin, so the result keeps its digits however far
 * the part lies from it: ∫(y − yc) dA is the first moment about the cut line itself.
 */
export function momentsAboveAbout(plan: CutPlan, yc: number, ox: number): HalfPlaneMoments {
  const acc = new Float64Array(6);
  let width = 0;
  const { ymin, ymax, whole, firstX, firstY } = plan;
  const n = ymin.length;
  for (let k = 0; k < n; k++) {
    if (ymax[k] <= yc) continue; // wholly below (or touching from below): nothing above the line
    if (ymin[k] > yc) {
      // Wholly above: the loop's own moments, carried from its first vertex to (ox, yc).
      const o = 6 * k;
      const dx = firstX[k] - ox, dy = firstY[k] - yc;
      acc[0] += whole[o];
      acc[1] += whole[o + 1] + dx * whole[o];
      acc[2] += whole[o + 2] + dy * whole[o];
      acc[3] += whole[o + 3] + 2 * dx * whole[o + 1] + dx * dx * whole[o];
      acc[4] += whole[o + 4] + 2 * dy * whole[o + 2] + dy * dy * whole[o];
      acc[5] += whole[o + 5] + dx * whole[o + 2] + dy * whole[o + 1] + dx * dy * whole[o];
      continue;
    }
    width += crossedLoop(plan.loop(k), ox, yc, acc);
  }
  return { m00: acc[0], m10: acc[1], m01: acc[2], m20: acc[3], m02: acc[4], m11: acc[5], width };
}

/**
 * One loop that the line crosses: its pieces above the line integrated into acc, and its share
 * of the cut width returned. Each segment is split into PIECES (a straight one inline, an arc
 * through splitArc) and its pieces taken in order. Where the boundary enters the upper side
 * a closing piece of the cut line ends; where it leaves, one starts. All six G carry a factor y,
 * so closing pieces on y = 0 add no moment, only width. The walk's state stays in locals and
 * the pieces are read by offset: this runs for every segment of every crossed loop of every
 * cut, where numbers passed to a call or kept in an object cost the garbage collector.
 */
function crossedLoop(c: Contour, ox: number, yc: number, acc: Float64Array): number {
  const xy = c.xy, bulge = c.bulge;
  const n = xy.length >> 1;
  let width = 0, started = false, firstAbove = false, firstX = 0, prevAbove = false;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const ax = xy[2 * i] - ox, ay = xy[2 * i + 1] - yc, bx = xy[2 * j] - ox, by = xy[2 * j + 1] - yc;
    let count: number;
    if (bulge && bulge[i] !== 0) {
      // An arc of at most a half turn stays within its height (L/2)·|bulge| of its chord: one
      // wholly clear of the line is one piece, with no split to compute.
      const h = (lengthOf(bx - ax, by - ay) / 2) * Math.abs(bulge[i]) * (1 + 1e-12);
      if (Math.abs(bulge[i]) <= 1 && Math.min(ay, by) - h > 0) count = putPiece(0, true, ax, ay, bx, by, 4 * Math.atan(bulge[i]));
      else if (Math.abs(bulge[i]) <= 1 && Math.max(ay, by) + h < 0) count = putPiece(0, false, ax, ay, bx, by, 4 * Math.atan(bulge[i]));
      else count = splitArc(ax, ay, bx, by, 4 * Math.atan(bulge[i]));
    } else if (ay * by < 0) {
      const xm = ax + (-ay / (by - ay)) * (bx - ax);
      putPiece(0, ay > 0, ax, ay, xm, 0, 0);
      count = putPiece(1, by > 0, xm, 0, bx, by, 0);
    } else count = putPiece(0, ay + by > 0, ax, ay, bx, by, 0);
    for (let o = 0; o < 6 * count; o += 6) {
      const above = PIECES[o] === 1, x0 = PIECES[o + 1];
      if (!started) {
        started = true;
        firstAbove = above;
        firstX = x0;
      } else if (above && !prevAbove) width += x0;
      else if (!above && prevAbove) width -= x0;
      prevAbove = above;
      if (!above) continue;
      lineDx(o, acc);
      // An arc adds the exact area moments of its segment loop (arc a->b, then chord b->a).
      if (PIECES[o + 5] !== 0) addCircularSegment(x0, PIECES[o + 2], PIECES[o + 3], PIECES[o + 4], PIECES[o + 5], acc);
    }
  }
  // The first piece's own transition, against the last piece.
  if (started) {
    if (firstAbove && !prevAbove) width += firstX;
    else if (!firstAbove && prevAbove) width -= firstX;
  }
  return width;
}

/**
 * Moments (about the origin) of the part of the region where y > yc, and the cut width b.
 * Far from the origin these origin moments are huge: quantities measured from the cut line or
 * the centroid come from momentsAboveAbout instead.
 */
export function momentsAbove(region: Region, yc: number): HalfPlaneMoments {
  const [ox] = regionReference(region);
  const h = momentsAboveAbout(planCuts(region), yc, ox);
  return { ...shiftMoments(h, ox, yc), width: h.width };
}

/** −∫ G dx along the straight piece at PIECES[o], for each of the six G. Exact (Gauss–Legendre, 3 nodes, degree ≤ 5). */
function lineDx(o: number, acc: Float64Array): void {
  const x0 = PIECES[o + 1], y0 = PIECES[o + 2];
  const dx = PIECES[o + 3] - x0;
  if (dx === 0) return;
  const dy = PIECES[o + 4] - y0;
  // G is a polynomial of degree ≤ 3 along the line: 3-point Gauss–Legendre is exact to degree 5.
  for (let q = 0; q < 3; q++) {
    const t = GL_T[q], w = GL_W[q] * dx;
    const x = x0 + t * dx, y = y0 + t * dy;
    acc[0] -= w * y;
    acc[1] -= w * x * y;
    acc[2] -= (w * y * y) / 2;
    acc[3] -= w * x * x * y;
    acc[4] -= (w * y * y * y) / 3;
    acc[5] -= (w * x * y * y) / 2;
  }
}
const GL_T = [0.5 - Math.sqrt(15) / 10, 0.5, 0.5 + Math.sqrt(15) / 10];
const GL_W = [5 / 18, 8 / 18, 5 / 18];
