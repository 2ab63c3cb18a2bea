/**
 * The moment kernel: exact area moments of a region bounded by lines and circular arcs.
 *
 * Green's theorem turns each area integral into a boundary integral. A straight segment a->b adds
 * the moments of the signed triangle (ref, a, b); an arc adds that triangle for its chord plus the
 * signed circular segment between chord and arc, whose moments have closed forms about the arc
 * centre (Gere & Goodno, Mechanics of Materials, App. E, "circular segment"; rederived in
 * DEVELOPERS.md). Arcs are never sampled.
 *
 * Every sum is taken about a point on or inside the contour it belongs to, where it is well
 * conditioned, and carried once, at the end, to where it is wanted (the origin for raw moments,
 * the centroid for centroidal ones) by the parallel-axis theorem in the direction that adds:
 * centroidal moments are never formed as m02 − A·ȳ² of origin moments, which cancels far out.
 */
import { contourBounds, contourBoundsInto, contourLength, lengthOf, type Bounds, type Contour, type Region } from '../geometry/contour';

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

/** Vertices per block of the polygon sums (see accumulateContour). */
const BLOCK = 64;

/**
 * Moments about (ox, oy) accumulated into acc (a 6-slot array: A, ∫x, ∫y, ∫x², ∫y², ∫xy).
 * The straight part is summed in blocks of BLOCK vertices whose sums are added with a
 * Neumaier compensation term, so a dense outline (2e5 vertices) does not lose 1e-12 to the
 * running sum. The six totals and their compensations are plain locals: this runs once per
 * loop of every evaluation (thousands of holes), where two small arrays per call were a
 * measurable share of the garbage collector's work.
 */
function accumulateContour(c: Contour, ox: number, oy: number, acc: Float64Array): void {
  const xy = c.xy;
  const n = xy.length >> 1;
  if (n < 2) return;
  let t0 = 0, t1 = 0, t2 = 0, t3 = 0, t4 = 0, t5 = 0;
  let c0 = 0, c1 = 0, c2 = 0, c3 = 0, c4 = 0, c5 = 0;
  let x0 = xy[2 * n - 2] - ox, y0 = xy[2 * n - 1] - oy;
  for (let k = 0; k < 2 * n; ) {
    const end = Math.min(2 * n, k + 2 * BLOCK);
    let a = 0, sx = 0, sy = 0, sxx = 0, syy = 0, sxy = 0;
    for (; k < end; k += 2) {
      const x1 = xy[k] - ox, y1 = xy[k + 1] - oy;
      // x0·y1 − x1·y0 written with the edge (x1 − x0, y1 − y0): for a dense outline the two
      // products are R² against a result of R²·(edge/R), and this form does not cancel.
      const cr = x0 * (y1 - y0) - y0 * (x1 - x0);
      a += cr;
      sx += cr * (x0 + x1);
      sy += cr * (y0 + y1);
      sxx += cr * (x0 * x0 + x0 * x1 + x1 * x1);
      syy += cr * (y0 * y0 + y0 * y1 + y1 * y1);
      sxy += cr * (x0 * (2 * y0 + y1) + x1 * (y0 + 2 * y1));
      x0 = x1;
      y0 = y1;
    }
    // Neumaier: t += v, with the rounding error of each addition kept in c.
    let t = t0 + a;
    c0 += Math.abs(t0) >= Math.abs(a) ? t0 - t + a : a - t + t0;
    t0 = t;
    t = t1 + sx;
    c1 += Math.abs(t1) >= Math.abs(sx) ? t1 - t + sx : sx - t + t1;
    t1 = t;
    t = t2 + sy;
    c2 += Math.abs(t2) >= Math.abs(sy) ? t2 - t + sy : sy - t + t2;
    t2 = t;
    t = t3 + sxx;
    c3 += Math.abs(t3) >= Math.abs(sxx) ? t3 - t + sxx : sxx - t + t3;
    t3 = t;
    t = t4 + syy;
    c4 += Math.abs(t4) >= Math.abs(syy) ? t4 - t + syy : syy - t + t4;
    t4 = t;
    t = t5 + sxy;
    c5 += Math.abs(t5) >= Math.abs(sxy) ? t5 - t + sxy : sxy - t + t5;
    t5 = t;
  }
  acc[0] += (t0 + c0) / 2;
  acc[1] += (t1 + c1) / 6;
  acc[2] += (t2 + c2) / 6;
  acc[3] += (t3 + c3) / 12;
  acc[4] += (t4 + c4) / 12;
  acc[5] += (t5 + c5) / 24;
  const bulge = c.bulge;
  if (!bulge) return;
  for (let i = 0; i < n; i++) {
    const b = bulge[i];
    if (b === 0) continue;
    const j = i + 1 === n ? 0 : i + 1;
    addCircularSegment(xy[2 * i] - ox, xy[2 * i + 1] - oy, xy[2 * j] - ox, xy[2 * j + 1] - oy, 4 * Math.atan(b), acc);
  }
}

/**
 * Gauss–Legendre nodes and weights on [−1, 1] (Newton on the Legendre polynomial from the usual
 * cosine guesses, as in Numerical Recipes' gauleg): computed once, to round-off.
 */
function gaussLegendre(n: number): { t: Float64Array; w: Float64Array } {
  const t = new Float64Array(n), w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 1;
    for (let it = 0; it < 100; it++) {
      let p0 = 1, p1 = x;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * x * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (x * p1 - p0)) / (x * x - 1);
      const dx = p1 / dp;
      x -= dx;
      if (Math.abs(dx) <= 1e-16) break;
    }
    t[i] = x;
    w[i] = 2 / ((1 - x * x) * dp * dp);
  }
  return { t, w };
}
const GL16 = gaussLegendre(16);

/**
 * Below this half-angle the segment is integrated in the chord frame. In the centre frame the
 * segment's moments come out as differences of terms r²·A apart from a result of order
 * (r(1 − cos α))²·A, losing about 4/α⁴ in relative precision (4e8 at α = 0.01): the chord frame
 * has no such loss. 16 Gauss–Legendre nodes integrate the chord-frame integrands to round-off up
 * to α ≈ 0.4 (nearest singularity at |t| = 1/sin α); above 0.3 the centre frame loses < 5e-14.
 */
const CHORD_FRAME_BELOW = 0.3;

/**
 * Adds the moments of the signed circular segment between chord a->b and the arc of sweep phi.
 *
 * Usual arcs (half-angle α ≥ 0.3): local frame at the arc centre, x' towards the arc midpoint:
 *   A = r²(α − sinα cosα), ∫x' = (2/3) r³ sin³α, ∫y' = 0, ∫x'y' = 0,
 *   ∫x'² = r⁴(α/4 − sin4α/16), ∫y'² = r⁴(α/4 − sin2α/6 + sin4α/48).
 *
 * Flatter arcs (α < 0.3): the frame moves to the chord midpoint, where the segment is
 * 0 ≤ x' ≤ g(y'), |y'| ≤ h (half-chord h) with
 *   g(y') = (h² − y'²) sinα / (h (√(1 − (y' sinα / h)²) + cosα)),
 * an analytic function whose nearest singularity lies at |y'| = h / sinα: 16-point
 * Gauss–Legendre integrates it to round-off, with nothing that cancels or overflows however
 * flat the arc.
 */
export function addCircularSegment(ax: number, ay: number, bx: number, by: number, phi: number, acc: Float64Array): void {
  const dx = bx - ax, dy = by - ay;
  const L = lengthOf(dx, dy);
  if (!(L > 0)) return;
  const alpha = Math.abs(phi) / 2;
  const sa = Math.sin(alpha), ca = Math.cos(alpha);
  const s = phi > 0 ? 1 : -1;
  const ux = (s * dy) / L, uy = (-s * dx) / L; // frame origin -> arc midpoint
  let ox: number, oy: number, A: number, Sx: number, Ixx: number, Iyy: number;
  if (alpha < CHORD_FRAME_BELOW) {
    const h = L / 2;
    ox = (ax + bx) / 2;
    oy = (ay + by) / 2;
    A = 0;
    Sx = 0;
    Ixx = 0;
    Iyy = 0;
    const T = GL16.t, W = GL16.w;
    for (let k = 0; k < 16; k++) {
      const t = T[k], w = W[k] * h;
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
    const s2 = Math.sin(2 * alpha), s4 = Math.sin(4 * alpha);
    A = r2 * (alpha - s2 / 2);
    Sx = (2 / 3) * r2 * r * sa * sa * sa;
    Ixx = r4 * (alpha / 4 - s4 / 16);
    Iyy = r4 * (alpha / 4 - s2 / 6 + s4 / 48);
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

function asMoments(acc: ArrayLike<number>): RawMoments {
  return { m00: acc[0], m10: acc[1], m01: acc[2], m20: acc[3], m02: acc[4], m11: acc[5] };
}

/**
 * Moments of a region about (ox, oy). Each contour is summed about its own first vertex, where
 * the sums are well conditioned whatever the distance to (ox, oy), and carried over by the
 * parallel-axis theorem (terms that add, away from the contour).
 */
export function regionMomentsAbout(region: Region, ox: number, oy: number): RawMoments {
  let out: RawMoments = { ...ZERO_MOMENTS };
  for (const c of region) {
    if (c.xy.length < 4) continue;
    const x0 = c.xy[0], y0 = c.xy[1];
    // The kept summary's sums about the first vertex when there is one; else one pass (a whole
    // summary is two passes and the length, wasted on a loop asked only for its area).
    const kept = SUMMARIES.get(c);
    let first: ArrayLike<number>;
    if (kept) first = kept.v;
    else {
      const acc = new Float64Array(6);
      accumulateContour(c, x0, y0, acc);
      first = acc;
    }
    out = addMoments(out, shiftMoments(asMoments(first), x0 - ox, y0 - oy));
  }
  return out;
}

const AREA = new Float64Array(6);
/**
 * Signed area of one contour, summed about its first vertex (as regionMomentsAbout sums it), in
 * one pass with nothing allocated: what orients a new loop and drops a sliver, asked of every
 * loop a shape or a boolean makes.
 */
export function contourArea(c: Contour): number {
  if (c.xy.length < 4) return 0;
  AREA.fill(0);
  accumulateContour(c, c.xy[0], c.xy[1], AREA);
  return AREA[0];
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

/**
 * Raw moments of a region about the document origin. Far from the origin these are huge and
 * centroidal moments must not be formed from them (m02 − A·ȳ² cancels): use centralMoments.
 */
export function regionMoments(region: Region): RawMoments {
  return regionMomentsAbout(region, 0, 0);
}

/**
 * Area, centroid and centroidal second moments, exact at any position. The centroid is kept as
 * a reference point of the region plus an offset (refX + dx, refY + dy), so that quantities
 * measured from it (a cut's Q, the plastic axis) keep every digit even 1e9 units out.
 */
export interface CentralMoments {
  A: number;
  refX: number;
  refY: number;
  dx: number;
  dy: number;
  /** ∫(y − ȳ)² dA, ∫(x − x̄)² dA and ∫(x − x̄)(y − ȳ) dA. */
  Ix: number;
  Iy: number;
  Ixy: number;
}

/** Four numbers of an array read as a box: xmin, xmax, ymin, ymax from slot `at`. */
class BoxView implements Bounds {
  constructor(
    readonly v: number[],
    private readonly at: number,
  ) {}
  get xmin(): number {
    return this.v[this.at];
  }
  get xmax(): number {
    return this.v[this.at + 1];
  }
  get ymin(): number {
    return this.v[this.at + 2];
  }
  get ymax(): number {
    return this.v[this.at + 3];
  }
}

/**
 * What the properties need of one contour, computed once: its six sums about its first vertex,
 * about its own centroid (where second moments do not cancel), its exact box and its length.
 * Contours are values (nothing in the engine or the app writes into their arrays), so the
 * summary is kept by the contour's identity: in a drag frame of a plate with thousands of holes,
 * only the loops that moved are integrated again.
 */
export class ContourSummary extends BoxView {
  /**
   * All the numbers in one array (a plate with thousands of holes keeps one summary per hole):
   * 0–5 the sums A, ∫x, ∫y, ∫x², ∫y², ∫xy about the first vertex, 6–11 the same about (gx, gy)
   * (the centroid, or the first vertex), then xmin, xmax, ymin, ymax, gx, gy and the length.
   * A plain array of doubles, not a Float64Array: 19 numbers (152 bytes) are past the size V8
   * keeps a typed array's data on its own heap, and a separate buffer per loop cost the garbage
   * collector more than the sums did at thousands of holes.
   */
  constructor(v: number[]) {
    super(v, 12);
  }
  /** The loop's length (slot 18); the callers that need the sums read `v` by slot. */
  get length(): number {
    return this.v[18];
  }
}

/** Nineteen doubles, as an array V8 stores unboxed (a literal of non-integers starts as doubles). */
function summaryNumbers(): number[] {
  return [NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN, NaN];
}

/** Six sums accumulated in one reused array, then copied where they belong. */
const SCRATCH = new Float64Array(6);
function sumsInto(c: Contour, ox: number, oy: number, out: number[], at: number): void {
  SCRATCH.fill(0);
  accumulateContour(c, ox, oy, SCRATCH);
  for (let i = 0; i < 6; i++) out[at + i] = SCRATCH[i];
}

/**
 * The summaries, kept by identity. A box alone is not kept: putting a new key in a WeakMap cost
 * about 0.3 µs here, more than bounding a loop of a few arcs, and a cold evaluation meets every
 * loop once; the loops a drag frame asks about again are those of the last result, which have
 * their summaries.
 */
const SUMMARIES = new WeakMap<Contour, ContourSummary>();

/** A contour's exact box: its summary's when it has one, else computed. */
export function contourBox(c: Contour): Bounds | null {
  return SUMMARIES.get(c) ?? contourBounds(c);
}

/** A region's exact bounds from its contours' boxes (kept by identity). */
export function regionBox(region: Region): Bounds | null {
  let xmin = Infinity, xmax = -Infinity, ymin = Infinity, ymax = -Infinity;
  for (const c of region) {
    const b = contourBox(c);
    if (!b) continue;
    if (b.xmin < xmin) xmin = b.xmin;
    if (b.xmax > xmax) xmax = b.xmax;
    if (b.ymin < ymin) ymin = b.ymin;
    if (b.ymax > ymax) ymax = b.ymax;
  }
  return xmin <= xmax ? { xmin, xmax, ymin, ymax } : null;
}

export function contourSummary(c: Contour): ContourSummary {
  const hit = SUMMARIES.get(c);
  if (hit) return hit;
  const xy = c.xy, n = xy.length >> 1;
  const x0 = n ? xy[0] : 0, y0 = n ? xy[1] : 0;
  const v = summaryNumbers();
  sumsInto(c, x0, y0, v, 0);
  contourBoundsInto(c, v, 12);
  if (!(v[12] <= v[13])) {
    v[12] = v[13] = x0;
    v[14] = v[15] = y0;
  }
  let gx = x0, gy = y0;
  const a = v[0];
  if (a !== 0 && Number.isFinite(a)) {
    // The loop's centroid, unless it lies outside the loop's box widened by its size (a loop
    // whose signed area nearly cancels): then the first vertex stays the better reference.
    const cx = x0 + v[1] / a, cy = y0 + v[2] / a;
    const pad = Math.max(v[13] - v[12], v[15] - v[14]);
    if (cx >= v[12] - pad && cx <= v[13] + pad && cy >= v[14] - pad && cy <= v[15] + pad) {
      gx = cx;
      gy = cy;
    }
  }
  if (gx === x0 && gy === y0) for (let i = 0; i < 6; i++) v[6 + i] = v[i];
  else sumsInto(c, gx, gy, v, 6);
  v[16] = gx;
  v[17] = gy;
  v[18] = contourLength(c);
  const out = new ContourSummary(v);
  SUMMARIES.set(c, out);
  return out;
}

/**
 * Centroidal moments with no cancelling transfer. Each contour is summed twice: about its first
 * vertex for its area and centroid, then about that centroid for its second moments (a fan
 * from an inner point, whose terms do not cancel for a convex loop). The contours are then
 * carried to the region's centroid by the parallel-axis theorem: for one contour the carry is
 * nothing at all, and for several it adds each loop's own A·d², which is the composite itself.
 */
export function centralMoments(region: Region): CentralMoments {
  // Each loop's summary numbers: the sums about (gx, gy) in slots 6–11, gx and gy in 16 and 17.
  const parts: number[][] = [];
  let big = -1, bigA = -1;
  for (const c of region) {
    if (c.xy.length < 4) continue;
    const v = contourSummary(c).v;
    parts.push(v);
    if (Math.abs(v[6]) > bigA) {
      bigA = Math.abs(v[6]);
      big = parts.length - 1;
    }
  }
  if (big < 0) return { A: 0, refX: 0, refY: 0, dx: 0, dy: 0, Ix: 0, Iy: 0, Ixy: 0 };
  // Reference: the centroid of the largest loop (the outer boundary, as a rule).
  const refX = parts[big][16], refY = parts[big][17];
  let A = 0, sx = 0, sy = 0;
  for (const v of parts) {
    A += v[6];
    sx += v[6] * (v[16] - refX) + v[7];
    sy += v[6] * (v[17] - refY) + v[8];
  }
  const dx = sx / A, dy = sy / A;
  let Ix = 0, Iy = 0, Ixy = 0;
  for (const v of parts) {
    const ex = v[16] - refX - dx, ey = v[17] - refY - dy;
    const a = v[6], m10 = v[7], m01 = v[8], m20 = v[9], m02 = v[10], m11 = v[11];
    Iy += m20 + 2 * ex * m10 + ex * ex * a;
    Ix += m02 + 2 * ey * m01 + ey * ey * a;
    Ixy += m11 + ex * m01 + ey * m10 + ex * ey * a;
  }
  return { A, refX, refY, dx, dy, Ix, Iy, Ixy };
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
