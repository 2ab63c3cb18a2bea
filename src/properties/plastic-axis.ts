/**
 * The plastic neutral axis and the plastic modulus about it, for one region or for several parts
 * each weighted by its strength (a section of several materials at their own fy).
 *
 * With no axial force the axis is where the weighted areas above and below balance:
 * Σ w_i A_i,above(c) = Σ w_i A_i / 2, found by safeguarded Newton on f(c) = Σ w_i A_i,above(c) −
 * W/2, whose derivative is −Σ w_i b_i(c) (minus the weighted cut width), falling back to
 * bisection when a step leaves the bracket: a handful of cuts instead of the ~60 of plain
 * bisection. The modulus is Z = Σ w_i ∫|y − yp| dA_i = Σ w_i (2·Q_i,above − S_i), with Q summed
 * about the axis itself and S_i = A_i (ȳ_i − yp) from each part's centroid offset, so nothing
 * cancels far from the origin (Gere & Goodno, plastic moment; one part with w = 1 is the
 * geometric plastic modulus).
 */
import type { Bounds } from '../geometry/contour';
import { momentsAboveAbout, turnPlan, type CutPlan } from '../moments/cut';
import type { CentralMoments } from '../moments/kernel';

/** One part: its cut plan, its centroidal moments, and its weight (fy / largest fy; 1 for one material). */
export interface PlasticPart {
  plan: CutPlan;
  cm: CentralMoments;
  w: number;
}

/** Σ w_i (area and first moment above y = c, about a point (ox, c) on the line) and Σ w_i b_i(c). */
function weightedAbove(parts: readonly PlasticPart[], c: number, ox: number) {
  let A = 0, Q = 0, width = 0;
  parts.forEach((p, k) => {
    const h = momentsAboveAbout(p.plan, c, ox);
    if (k === 0) {
      A = p.w * h.m00;
      Q = p.w * h.m01;
      width = p.w * h.width;
    } else {
      A += p.w * h.m00;
      Q += p.w * h.m01;
      width += p.w * h.width;
    }
  });
  return { A, Q, width };
}

/**
 * The y where the weighted area above equals `half`, starting from `start` (the weighted
 * centroid: the axis lies there for a section symmetric about it, and near it as a rule), and
 * the weighted first moment above it, from the last cut taken.
 */
function balancingCut(parts: readonly PlasticPart[], ox: number, lo: number, hi: number, half: number, start: number): { at: number; Q: number } {
  let a = lo, b = hi;
  let c = start > a && start < b ? start : (a + b) / 2;
  const tol = 4 * Number.EPSILON * Math.max(Math.abs(a), Math.abs(b), b - a);
  let h = weightedAbove(parts, c, ox);
  for (let k = 0; k < 200; k++) {
    const f = h.A - half;
    if (f > 0) a = c;
    else b = c;
    if (f === 0 || b - a <= tol) break;
    const step = h.width > 0 ? f / h.width : NaN;
    let next = c + step;
    if (!(next > a && next < b)) next = (a + b) / 2;
    if (Math.abs(next - c) <= tol) break;
    c = next;
    h = weightedAbove(parts, c, ox);
  }
  return { at: c, Q: h.Q };
}

/** Plastic modulus about the horizontal balancing axis y = yp, and yp. */
function aboutHorizontal(parts: readonly PlasticPart[], ymin: number, ymax: number): { Z: number; at: number } {
  const ox = parts[0].cm.refX;
  let W = 0, Wy = 0;
  parts.forEach((p, k) => {
    W = k === 0 ? p.w * p.cm.A : W + p.w * p.cm.A;
    Wy = k === 0 ? p.w * p.cm.A * (p.cm.refY + p.cm.dy) : Wy + p.w * p.cm.A * (p.cm.refY + p.cm.dy);
  });
  const { at: yp, Q: Qa } = balancingCut(parts, ox, ymin, ymax, W / 2, Wy / W);
  let S = 0;
  parts.forEach((p, k) => {
    const s = p.w * p.cm.A * (p.cm.dy - (yp - p.cm.refY));
    S = k === 0 ? s : S + s;
  });
  return { Z: 2 * Qa - S, at: yp };
}

/** The same centroidal moments for the region turned by −90° ((x, y) → (y, −x)). */
function turned(cm: CentralMoments): CentralMoments {
  return { A: cm.A, refX: cm.refY, refY: -cm.refX, dx: cm.dy, dy: -cm.dx, Ix: cm.Iy, Iy: cm.Ix, Ixy: -cm.Ixy };
}

/**
 * Plastic axes for bending about a horizontal axis (`x`: the axis is y = at) and about a vertical
 * one (`y`: x = at), with the weighted plastic moduli Z; `bounds` of all the parts together.
 */
export function plasticAxes(parts: readonly PlasticPart[], bounds: Bounds): { x: { Z: number; at: number }; y: { Z: number; at: number } } {
  const x = aboutHorizontal(parts, bounds.ymin, bounds.ymax);
  // Vertical axis: turn by −90° exactly so x becomes y ((x, y) -> (y, −x)); the regions keep their sense.
  const t = aboutHorizontal(
    parts.map((p) => ({ plan: turnPlan(p.plan, -1), cm: turned(p.cm), w: p.w })),
    -bounds.xmax,
    -bounds.xmin,
  );
  return { x, y: { Z: t.Z, at: -t.at } };
}
