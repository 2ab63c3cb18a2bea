/**
 * The line-moment kernel: exact moments of lines per unit thickness,
 *   ∫dL, ∫x dL, ∫y dL, ∫x² dL, ∫y² dL, ∫xy dL,
 * for straight segments and circular arcs, in closed form (no sampling).
 *
 * A straight segment a→b of length L, with p = a + s(b − a), s ∈ [0, 1], gives the usual
 *   ∫x = L(ax + bx)/2, ∫x² = L(ax² + ax·bx + bx²)/3, ∫xy = L(2ax·ay + ax·by + bx·ay + 2bx·by)/6.
 *
 * An arc is integrated in a frame at its chord midpoint M, x′ along the unit normal u towards the
 * arc's midpoint and y′ along the chord. With half chord h, half-angle α and radius r = h / sinα,
 * the arc is x′ = r(cosθ − cosα), y′ = r sinθ, θ ∈ [−α, α], dL = r dθ, so
 *   L       = 2rα
 *   ∫x′ dL  = 2r²(sinα − α cosα)
 *   ∫y′² dL = r³(α − sinα cosα)
 *   ∫x′² dL = r³(α + 2α cos²α − 3 sinα cosα)
 *   ∫y′ dL  = ∫x′y′ dL = 0 (symmetry about the x′ axis).
 * (The centroid of the arc, r sinα / α from its centre, is Hibbeler, Statics, inside back cover,
 * "circular arc segment"; the rest are the same elementary integrals.) No centre is involved, so a
 * very flat arc, whose centre is far away, stays exact. Below α = 1 the brackets cancel, and they
 * are replaced by their Taylor series divided by the leading power of α; the powers of r are
 * written as h / sinα, which keeps every factor finite for any flatness.
 *
 * Coordinates are taken relative to a reference point near the lines (the caller's choice), so
 * parts far from the origin keep their digits.
 */
import type { RawMoments } from '../moments/kernel';
import { chainSegment, segmentCount, type LineGroup } from './chain';

/** Below this half-angle the arc terms use their series. */
const SERIES_LIMIT = 1;
const TERMS = 20;

// Series in α² of the brackets divided by their leading power of α:
//   (sinα − α cosα)/α³              = Σ (−1)^m 2(m+1) α^{2m} / (2m+3)!
//   (α − sinα cosα)/α³              = Σ (−1)^m 4^{m+1} α^{2m} / (2m+3)!
//   (α + 2α cos²α − 3 sinα cosα)/α⁵ = Σ (−1)^m 4^{m+2} (2m+2) α^{2m} / (2m+5)!
const P_S: number[] = [];
const P_YY: number[] = [];
const P_XX: number[] = [];
{
  const fact = (k: number) => {
    let f = 1;
    for (let i = 2; i <= k; i++) f *= i;
    return f;
  };
  for (let m = 0; m < TERMS; m++) {
    const sg = m % 2 === 0 ? 1 : -1;
    P_S.push((sg * 2 * (m + 1)) / fact(2 * m + 3));
    P_YY.push((sg * Math.pow(4, m + 1)) / fact(2 * m + 3));
    P_XX.push((sg * Math.pow(4, m + 2) * (2 * m + 2)) / fact(2 * m + 5));
  }
}
function evenSeries(coef: readonly number[], x2: number): number {
  let sum = 0;
  for (let k = coef.length - 1; k >= 0; k--) sum = sum * x2 + coef[k];
  return sum;
}

/** Adds the moments of the straight segment a→b (coordinates relative to the reference). */
export function addStraightLine(ax: number, ay: number, bx: number, by: number, acc: Float64Array): void {
  const L = Math.hypot(bx - ax, by - ay);
  if (!(L > 0)) return;
  acc[0] += L;
  acc[1] += (L * (ax + bx)) / 2;
  acc[2] += (L * (ay + by)) / 2;
  acc[3] += (L * (ax * ax + ax * bx + bx * bx)) / 3;
  acc[4] += (L * (ay * ay + ay * by + by * by)) / 3;
  acc[5] += (L * (2 * ax * ay + ax * by + bx * ay + 2 * bx * by)) / 6;
}

/**
 * The arc's own terms in the chord-midpoint frame: length L, ∫x′ dL (S), ∫x′² dL (Ixx) and
 * ∫y′² dL (Iyy), for half chord h and half-angle alpha ∈ (0, π).
 */
export function arcLineTerms(h: number, alpha: number): { L: number; S: number; Ixx: number; Iyy: number } {
  if (alpha < SERIES_LIMIT) {
    const a2 = alpha * alpha;
    const sinc = Math.sin(alpha) / alpha;
    const s2 = sinc * sinc, s3 = s2 * sinc;
    const ha = h * alpha;
    return {
      L: (2 * h) / sinc,
      S: (2 * h * ha * evenSeries(P_S, a2)) / s2,
      Ixx: (h * ha * ha * evenSeries(P_XX, a2)) / s3,
      Iyy: (h * h * h * evenSeries(P_YY, a2)) / s3,
    };
  }
  const sa = Math.sin(alpha), ca = Math.cos(alpha);
  const r = h / sa;
  const r2 = r * r;
  return {
    L: 2 * r * alpha,
    S: 2 * r2 * (sa - alpha * ca),
    Ixx: r2 * r * (alpha + 2 * alpha * ca * ca - 3 * sa * ca),
    Iyy: r2 * r * (alpha - sa * ca),
  };
}

/** Adds the moments of the arc a→b of signed sweep phi (coordinates relative to the reference). */
export function addArcLine(ax: number, ay: number, bx: number, by: number, phi: number, acc: Float64Array): void {
  const dx = bx - ax, dy = by - ay;
  const c = Math.hypot(dx, dy);
  if (!(c > 0)) return;
  const ex = dx / c, ey = dy / c;
  const sg = phi > 0 ? 1 : -1;
  const ux = sg * ey, uy = -sg * ex; // towards the arc's midpoint (right of the chord for a CCW arc)
  const { L, S, Ixx, Iyy } = arcLineTerms(c / 2, Math.abs(phi) / 2);
  const mx = (ax + bx) / 2, my = (ay + by) / 2;
  // x = mx + x′ux + y′ex, y = my + x′uy + y′ey, with ∫y′ = ∫x′y′ = 0.
  acc[0] += L;
  acc[1] += mx * L + ux * S;
  acc[2] += my * L + uy * S;
  acc[3] += mx * mx * L + 2 * mx * ux * S + ux * ux * Ixx + ex * ex * Iyy;
  acc[4] += my * my * L + 2 * my * uy * S + uy * uy * Ixx + ey * ey * Iyy;
  acc[5] += mx * my * L + (mx * uy + my * ux) * S + ux * uy * Ixx + ex * ey * Iyy;
}

/** Line moments of a group about (ox, oy): m00 = L, m10 = ∫(x − ox) dL, ..., m11 = ∫(x − ox)(y − oy) dL. */
export function lineMomentsAbout(group: LineGroup, ox: number, oy: number): RawMoments {
  const acc = new Float64Array(6);
  for (const chain of group) {
    const m = segmentCount(chain);
    for (let i = 0; i < m; i++) {
      const s = chainSegment(chain, i);
      const ax = s.ax - ox, ay = s.ay - oy, bx = s.bx - ox, by = s.by - oy;
      if (s.sweep === 0) addStraightLine(ax, ay, bx, by, acc);
      else addArcLine(ax, ay, bx, by, s.sweep, acc);
    }
  }
  return { m00: acc[0], m10: acc[1], m01: acc[2], m20: acc[3], m02: acc[4], m11: acc[5] };
}

/** A reference point near the group: its first vertex. */
export function groupReference(group: LineGroup): [number, number] {
  for (const c of group) if (c.xy.length >= 2) return [c.xy[0], c.xy[1]];
  return [0, 0];
}
