/**
 * The moment kernel: exact area moments of a region bounded by lines and circular arcs.
 *
 * Green's theorem turns each area integral into a boundary integral. A straight segment a->b adds
 * the moments of the signed triangle (ref, a, b); an arc adds that triangle for its chord plus the
 * signed circular segment between chord and arc, whose moments have closed forms about the arc
 * centre (Gere & Goodno, Mechanics of Materials, App. E, "circular segment"; rederived in
 * DEVELOPERS.md). Arcs are never sampled.
 *
 * All sums are taken about a reference point near the region (the first vertex) to avoid
 * cancellation, and moved to the origin at the end by the parallel-axis theorem.
 */
import type { Contour, Region } from '../geometry/contour';

/** Raw moments about the document origin: m00 = A, m10 = ∫x, m01 = ∫y, m20 = ∫x², m02 = ∫y², m11 = ∫xy. */
export interface RawMoments {
  m00: number;
  m10: number;
  m01: number;
  m20: number;
  m02: number;
  m11: number;
}

export const ZERO_MOMENTS: RawMoments = Object.freeze({ m00: 0, m10: 0, m01: 0, m20: 0, m02: 0, m11: 0 });

/** Moments about (ox, oy) accumulated into acc (a 6-slot array: A, ∫x, ∫y, ∫x², ∫y², ∫xy). */
function accumulateContour(c: Contour, ox: number, oy: number, acc: Float64Array): void {
  const xy = c.xy;
  const n = xy.length >> 1;
  if (n < 2) return;
  let a = 0, sx = 0, sy = 0, sxx = 0, syy = 0, sxy = 0;
  let x0 = xy[2 * n - 2] - ox, y0 = xy[2 * n - 1] - oy;
  for (let k = 0; k < 2 * n; k += 2) {
    const x1 = xy[k] - ox, y1 = xy[k + 1] - oy;
    const cr = x0 * y1 - x1 * y0;
    a += cr;
    sx += cr * (x0 + x1);
    sy += cr * (y0 + y1);
    sxx += cr * (x0 * x0 + x0 * x1 + x1 * x1);
    syy += cr * (y0 * y0 + y0 * y1 + y1 * y1);
    sxy += cr * (x0 * (2 * y0 + y1) + x1 * (y0 + 2 * y1));
    x0 = x1;
    y0 = y1;
  }
  acc[0] += a / 2;
  acc[1] += sx / 6;
  acc[2] += sy / 6;
  acc[3] += sxx / 12;
  acc[4] += syy / 12;
  acc[5] += sxy / 24;
  const bulge = c.bulge;
  if (!bulge) return;
  for (let i = 0; i < n; i++) {
    const b = bulge[i];
    if (b === 0) continue;
    const j = i + 1 === n ? 0 : i + 1;
    addCircularSegment(xy[2 * i] - ox, xy[2 * i + 1] - oy, xy[2 * j] - ox, xy[2 * j + 1] - oy, 4 * Math.atan(b), acc);
  }
}

// Series for small half-angles, where the trigonometric closed forms cancel badly.
// f_A(α) = α − sin(2α)/2, f_xx(α) = α/4 − sin(4α)/16, f_yy(α) = α/4 − sin(2α)/6 + sin(4α)/48.
const SERIES_TERMS = 14;
const SERIES_A: number[] = [];
const SERIES_XX: number[] = [];
const SERIES_YY: number[] = [];
{
  let fact = 1; // (2k+1)!
  for (let k = 0; k < SERIES_TERMS; k++) {
    if (k > 0) fact *= 2 * k * (2 * k + 1);
    const sgn = k % 2 === 0 ? 1 : -1;
    const p2 = Math.pow(2, 2 * k + 1), p4 = Math.pow(4, 2 * k + 1);
    const lin = k === 0 ? 1 : 0;
    SERIES_A.push(lin - (sgn * p2) / (2 * fact));
    SERIES_XX.push(lin / 4 - (sgn * p4) / (16 * fact));
    SERIES_YY.push(lin / 4 - (sgn * p2) / (6 * fact) + (sgn * p4) / (48 * fact));
  }
}
function oddSeries(coef: number[], x: number): number {
  const x2 = x * x;
  let sum = 0;
  for (let k = coef.length - 1; k >= 0; k--) sum = sum * x2 + coef[k];
  return sum * x;
}

// 8-point Gauss–Legendre nodes and weights on [−1, 1], for flat arcs (see below).
const GL8_T = [-0.9602898564975363, -0.7966664774136267, -0.525532409916329, -0.1834346424956498, 0.1834346424956498, 0.525532409916329, 0.7966664774136267, 0.9602898564975363];
const GL8_W = [0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.362683783378362, 0.362683783378362, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763];

/**
 * Adds the moments of the signed circular segment between chord a->b and the arc of sweep phi.
 *
 * Usual arcs (half-angle α ≥ 0.01): local frame at the arc centre, x' towards the arc midpoint:
 *   A = r²(α − sinα cosα), ∫x' = (2/3) r³ sin³α, ∫y' = 0, ∫x'y' = 0,
 *   ∫x'² = r⁴(α/4 − sin4α/16), ∫y'² = r⁴(α/4 − sin2α/6 + sin4α/48)
 * (small α by their Taylor series, which avoid cancellation).
 *
 * Flat arcs (α < 0.01): the centre is far away (r = h / sinα for half-chord h), so the frame
 * moves to the chord midpoint, where the segment is 0 ≤ x' ≤ g(y'), |y'| ≤ h with
 *   g(y') = (h² − y'²) sinα / (h (√(1 − (y' sinα / h)²) + cosα)),
 * an analytic function whose nearest singularity lies at |y'| = h / sinα: 8-point Gauss–Legendre
 * integrates it to an error of order α¹⁶, i.e. to round-off, with nothing that can overflow.
 */
export function addCircularSegment(ax: number, ay: number, bx: number, by: number, phi: number, acc: Float64Array): void {
  const dx = bx - ax, dy = by - ay;
  const L = Math.hypot(dx, dy);
  if (!(L > 0)) return;
  const alpha = Math.abs(phi) / 2;
  const sa = Math.sin(alpha), ca = Math.cos(alpha);
  const s = phi > 0 ? 1 : -1;
  const ux = (s * dy) / L, uy = (-s * dx) / L; // frame origin -> arc midpoint
  let ox: number, oy: number, A: number, Sx: number, Ixx: number, Iyy: number;
  if (alpha < 0.01) {
    const h = L / 2;
    ox = (ax + bx) / 2;
    oy = (ay + by) / 2;
    A = 0;
    Sx = 0;
    Ixx = 0;
    Iyy = 0;
    for (let k = 0; k < 8; k++) {
      const t = GL8_T[k], w = GL8_W[k] * h;
      const q = t * sa;
      const g = (h * (1 - t * t) * sa) / (Math.sqrt(1 - q * q) + ca);
      const y = h * t;
      A += w * g;
      Sx += (w * g * g) / 2;
      Ixx += (w * g * g * g) / 3;
      Iyy += w * y * y * g;
    }
  } else {
    const r = L / (2 * sa);
    const d = r * ca;
    ox = (ax + bx) / 2 - ux * d;
    oy = (ay + by) / 2 - uy * d;
    const r2 = r * r, r4 = r2 * r2;
    let fA: number, fXX: number, fYY: number;
    if (alpha < 0.25) {
      fA = oddSeries(SERIES_A, alpha);
      fXX = oddSeries(SERIES_XX, alpha);
      fYY = oddSeries(SERIES_YY, alpha);
    } else {
      const s2 = Math.sin(2 * alpha), s4 = Math.sin(4 * alpha);
      fA = alpha - s2 / 2;
      fXX = alpha / 4 - s4 / 16;
      fYY = alpha / 4 - s2 / 6 + s4 / 48;
    }
    A = r2 * fA;
    Sx = (2 / 3) * r2 * r * sa * sa * sa;
    Ixx = r4 * fXX;
    Iyy = r4 * fYY;
  }
  A *= s;
  Sx *= s;
  Ixx *= s; // ∫x'²
  Iyy *= s; // ∫y'²
  // Global x = ox + x' ux − y' uy, y = oy + x' uy + y' ux (rotation taking x' to u).
  const mx = ux * Sx, my = uy * Sx; // ∫(x − ox), ∫(y − oy)
  acc[0] += A;
  acc[1] += ox * A + mx;
  acc[2] += oy * A + my;
  acc[3] += ox * ox * A + 2 * ox * mx + ux * ux * Ixx + uy * uy * Iyy;
  acc[4] += oy * oy * A + 2 * oy * my + uy * uy * Ixx + ux * ux * Iyy;
  acc[5] += ox * oy * A + ox * my + oy * mx + ux * uy * (Ixx - Iyy);
}

/** Moments about (ox, oy) of a region, without shifting. */
export function regionMomentsAbout(region: Region, ox: number, oy: number): RawMoments {
  const acc = new Float64Array(6);
  for (const c of region) accumulateContour(c, ox, oy, acc);
  return { m00: acc[0], m10: acc[1], m01: acc[2], m20: acc[3], m02: acc[4], m11: acc[5] };
}

/** A reference point near the region: its first vertex. */
export function regionReference(region: Region): [number, number] {
  for (const c of region) if (c.xy.length >= 2) return [c.xy[0], c.xy[1]];
  return [0, 0];
}

/** Move moments taken about (ox, oy) to the origin (parallel-axis theorem). */
export function shiftMoments(m: RawMoments, ox: number, oy: number): RawMoments {
  return {
    m00: m.m00,
    m10: m.m10 + ox * m.m00,
    m01: m.m01 + oy * m.m00,
    m20: m.m20 + 2 * ox * m.m10 + ox * ox * m.m00,
    m02: m.m02 + 2 * oy * m.m01 + oy * oy * m.m00,
    m11: m.m11 + ox * m.m01 + oy * m.m10 + ox * oy * m.m00,
  };
}

export function addMoments(a: RawMoments, b: RawMoments, sign = 1): RawMoments {
  return {
    m00: a.m00 + sign * b.m00,
    m10: a.m10 + sign * b.m10,
    m01: a.m01 + sign * b.m01,
    m20: a.m20 + sign * b.m20,
    m02: a.m02 + sign * b.m02,
    m11: a.m11 + sign * b.m11,
  };
}

/** Exact raw moments of a region about the document origin. */
export function regionMoments(region: Region): RawMoments {
  const [ox, oy] = regionReference(region);
  return shiftMoments(regionMomentsAbout(region, ox, oy), ox, oy);
}

/**
 * Fast path for one straight-sided loop given as an interleaved coordinate array: the same
 * formulas with no arc handling. Used by the benchmark and by callers holding raw polygons.
 */
export function polygonMoments(xy: Float64Array): RawMoments {
  const acc = new Float64Array(6);
  const n = xy.length >> 1;
  if (n >= 3) accumulateContour({ xy, bulge: null }, xy[0], xy[1], acc);
  const m = { m00: acc[0], m10: acc[1], m01: acc[2], m20: acc[3], m02: acc[4], m11: acc[5] };
  return n >= 3 ? shiftMoments(m, xy[0], xy[1]) : { ...ZERO_MOMENTS };
}
