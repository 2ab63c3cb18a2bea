/**
 * Contours and regions: the exact boundary representation every engine module shares.
 *
 * Conventions (fixed, tested in tests/geometry.test.ts):
 * - World space is y up; counter-clockwise (CCW) is positive.
 * - A contour is a closed loop of n vertices `xy = [x0, y0, x1, y1, ...]`; segment i runs from
 *   vertex i to vertex (i + 1) % n. The closing vertex is NOT repeated.
 * - `bulge[i]` describes segment i: 0 is a straight line; otherwise the segment is the circular
 *   arc whose signed sweep is phi = 4 * atan(bulge[i]) (phi > 0 turns CCW about the arc centre).
 *   `bulge` may be null when every segment is straight. |bulge| <= 1 (sweep at most 180 deg) is
 *   kept by every constructor in this module, which keeps the radius well conditioned.
 * - A region is a list of contours whose signed moments add: an outer boundary runs CCW and a
 *   hole runs CW. Regions produced by the boolean module never overlap themselves.
 * - Contours are values: nothing writes into a contour's arrays once it is built, so contours may
 *   share them (every full circle shares one bulge array).
 */

export interface Contour {
  readonly xy: Float64Array;
  readonly bulge: Float64Array | null;
}

export type Region = readonly Contour[];

export type Vec2 = readonly [number, number];

/**
 * The length of (dx, dy). Math.hypot's value, but V8 does not inline Math.hypot: each call boxes
 * its result on the heap, and the moment, bounds and boolean paths call it for every arc of
 * every loop (a plate with thousands of holes). The square root of the sum of squares is within
 * an ulp of it; where the squares would leave the double range, Math.hypot itself is used.
 */
export function lengthOf(dx: number, dy: number): number {
  const s = dx * dx + dy * dy;
  if (s < 1e300 && s > 1e-300) return Math.sqrt(s);
  // A shared vertex is 0 from itself: no call (Math.hypot's result is a new heap number).
  return dx === 0 && dy === 0 ? 0 : Math.hypot(dx, dy);
}

/** Build a contour from interleaved vertices and optional per-segment bulges. */
export function contourFrom(xy: ArrayLike<number>, bulge?: ArrayLike<number> | null): Contour {
  // The constructor, not Float64Array.from: from() walks an array through its iterator, several
  // times slower for the short loops every shape is built from.
  const pts = new Float64Array(xy);
  let b: Float64Array | null = null;
  if (bulge) {
    b = new Float64Array(bulge);
    if (b.length * 2 !== pts.length) throw new Error('contourFrom: bulge length must equal vertex count');
    if (b.every((v) => v === 0)) b = null;
  }
  return { xy: pts, bulge: b };
}

export function contourVertexCount(c: Contour): number {
  return c.xy.length >> 1;
}

/** The sweep angle (radians, signed) of segment i; 0 for a line. */
export function segmentSweep(c: Contour, i: number): number {
  const b = c.bulge ? c.bulge[i] : 0;
  return b === 0 ? 0 : 4 * Math.atan(b);
}



/** Bulge for a signed sweep angle. */
export function bulgeFromSweep(phi: number): number {
  return Math.tan(phi / 4);
}

/** Centre and radius of arc segment i (throws for a line). */
export function segmentArc(c: Contour, i: number): { cx: number; cy: number; r: number; sweep: number } {
  const n = c.xy.length >> 1;
  const j = (i + 1) % n;
  const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
  const bx = c.xy[2 * j], by = c.xy[2 * j + 1];
  const phi = segmentSweep(c, i);
  if (phi === 0) throw new Error('segmentArc: segment is a line');
  return arcFromChord(ax, ay, bx, by, phi);
}

/** Centre and radius of the arc from a to b with signed sweep phi. */
export function arcFromChord(ax: number, ay: number, bx: number, by: number, phi: number) {
  const dx = bx - ax, dy = by - ay;
  const L = lengthOf(dx, dy);
  const alpha = Math.abs(phi) / 2;
  const r = L / (2 * Math.sin(alpha));
  // Unit vector from the centre towards the arc's midpoint: the chord's right normal for phi > 0.
  const s = phi > 0 ? 1 : -1;
  const ux = (s * dy) / L, uy = (-s * dx) / L;
  const d = r * Math.cos(alpha);
  const cx = (ax + bx) / 2 - ux * d;
  const cy = (ay + by) / 2 - uy * d;
  return { cx, cy, r, sweep: phi };
}

/**
 * Centre and radius of the arc from a to b with bulge b = tan(sweep/4), from the bulge itself:
 * with α the half sweep, cos α = (1 − b²)/(1 + b²) and sin α = 2|b|/(1 + b²), so a half circle
 * (b = ±1) has its centre exactly on the chord's middle, where going through the rounded sweep
 * 4·atan(b) leaves it 1e-16·r off (which a near-tangent intersection magnifies).
 */
export function arcFromBulge(ax: number, ay: number, bx: number, by: number, bulge: number) {
  const dx = bx - ax, dy = by - ay;
  const L = lengthOf(dx, dy);
  const ab = Math.abs(bulge), b2 = bulge * bulge;
  const r = (L * (1 + b2)) / (4 * ab);
  const d = (L * (1 - b2)) / (4 * ab); // r cos α, negative past a half circle
  const s = bulge > 0 ? 1 : -1;
  const ux = (s * dy) / L, uy = (-s * dx) / L;
  return { cx: (ax + bx) / 2 - ux * d, cy: (ay + by) / 2 - uy * d, r, sweep: 4 * Math.atan(bulge) };
}

/** Signed sweep of the arc that starts at a, passes through m and ends at b; NaN if collinear. */
export function sweepThrough(ax: number, ay: number, mx: number, my: number, bx: number, by: number): number {
  // The inscribed-angle theorem: the sweep is twice the angle between the chords at the middle
  // point, measured so that a CCW arc (m to the right of a->b) is positive.
  const cross = (mx - ax) * (by - ay) - (my - ay) * (bx - ax);
  const scale = lengthOf(mx - ax, my - ay) * lengthOf(bx - ax, by - ay);
  if (!(Math.abs(cross) > 1e-12 * scale)) return NaN;
  // Angle a-m-b at m; the arc through m subtends 2*(pi - angle) on the far side.
  const v1x = ax - mx, v1y = ay - my, v2x = bx - mx, v2y = by - my;
  const angM = Math.atan2(Math.abs(v1x * v2y - v1y * v2x), v1x * v2x + v1y * v2y);
  const sweep = 2 * (Math.PI - angM);
  return cross > 0 ? sweep : -sweep;
}

/**
 * Append an arc from the last pushed vertex (ax, ay) to b with signed sweep phi, splitting it so
 * that no piece sweeps more than 180 degrees. Pushes the interior vertices and the bulges; the end
 * vertex b itself is not pushed (the caller pushes it as the start of the next segment).
 */
export function pushArc(xy: number[], bulge: number[], ax: number, ay: number, bx: number, by: number, phi: number): void {
  const pieces = Math.max(1, Math.ceil(Math.abs(phi) / Math.PI - 1e-12));
  if (pieces === 1) {
    bulge.push(bulgeFromSweep(phi));
    return;
  }
  const { cx, cy, r } = arcFromChord(ax, ay, bx, by, phi);
  const t0 = Math.atan2(ay - cy, ax - cx);
  const step = phi / pieces;
  bulge.push(bulgeFromSweep(step));
  for (let k = 1; k < pieces; k++) {
    const t = t0 + step * k;
    xy.push(cx + r * Math.cos(t), cy + r * Math.sin(t));
    bulge.push(bulgeFromSweep(step));
  }
}

/** A full circle as two CCW half-circle arcs starting at angle 0. */
export function circleContour(cx: number, cy: number, r: number): Contour {
  return { xy: Float64Array.of(cx + r, cy, cx - r, cy), bulge: CIRCLE_CCW };
}
/**
 * The bulges of a full circle, counter-clockwise and clockwise, shared by every circle and every
 * circular hole: a typed array costs about 200 bytes however short, and a plate with thousands of
 * holes would otherwise hold thousands of copies of these two numbers.
 */
const CIRCLE_CCW = Float64Array.of(1, 1);
const CIRCLE_CW = Float64Array.of(-1, -1);

/** Polygon contour from points (no arcs). */
export function polygonContour(points: readonly Vec2[]): Contour {
  const xy = new Float64Array(points.length * 2);
  points.forEach((p, i) => {
    xy[2 * i] = p[0];
    xy[2 * i + 1] = p[1];
  });
  return { xy, bulge: null };
}

/** The same loop traversed the other way (every moment changes sign). */
export function reverseContour(c: Contour): Contour {
  const n = c.xy.length >> 1;
  const xy = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    xy[2 * i] = c.xy[2 * (n - 1 - i)];
    xy[2 * i + 1] = c.xy[2 * (n - 1 - i) + 1];
  }
  let bulge: Float64Array | null = null;
  if (c.bulge === CIRCLE_CCW || c.bulge === CIRCLE_CW) bulge = c.bulge === CIRCLE_CCW ? CIRCLE_CW : CIRCLE_CCW;
  else if (c.bulge) {
    bulge = new Float64Array(n);
    // Old segment k runs v_k -> v_{k+1}; in the reversed loop it runs from new index n-2-k.
    for (let k = 0; k < n; k++) bulge[(2 * n - 2 - k) % n] = -c.bulge[k];
  }
  return { xy, bulge };
}

/** Apply the affine map p -> (a*x + b*y + e, c*x + d*y + f). A reflection flips each bulge. */
export function transformContour(c: Contour, a: number, b: number, cc: number, d: number, e: number, f: number): Contour {
  const n = c.xy.length >> 1;
  const xy = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) {
    const x = c.xy[2 * i], y = c.xy[2 * i + 1];
    xy[2 * i] = a * x + b * y + e;
    xy[2 * i + 1] = cc * x + d * y + f;
  }
  const det = a * d - b * cc;
  const bulge = c.bulge ? (det < 0 ? c.bulge.map((v) => -v) : Float64Array.from(c.bulge)) : null;
  return { xy, bulge };
}

export function translateRegion(r: Region, dx: number, dy: number): Region {
  return r.map((c) => transformContour(c, 1, 0, 0, 1, dx, dy));
}

export function rotateRegion(r: Region, theta: number, ox = 0, oy = 0): Region {
  const cs = Math.cos(theta), sn = Math.sin(theta);
  return r.map((c) => transformContour(c, cs, -sn, sn, cs, ox - cs * ox + sn * oy, oy - sn * ox - cs * oy));
}

/**
 * The region turned by a quarter turn about the origin, exactly (coordinates are swapped and
 * negated, never multiplied by a rounded cos(π/2)): sense +1 maps (x, y) to (−y, x), −1 maps
 * (x, y) to (y, −x). A turn keeps every loop's sense, so the bulges stay as they are.
 */
export function quarterTurnRegion(r: Region, sense: 1 | -1): Region {
  return r.map((c) => {
    const n = c.xy.length >> 1;
    const xy = new Float64Array(2 * n);
    for (let i = 0; i < n; i++) {
      const x = c.xy[2 * i], y = c.xy[2 * i + 1];
      xy[2 * i] = sense > 0 ? -y : y;
      xy[2 * i + 1] = sense > 0 ? x : -x;
    }
    return { xy, bulge: c.bulge ? Float64Array.from(c.bulge) : null };
  });
}

export interface Bounds {
  xmin: number;
  xmax: number;
  ymin: number;
  ymax: number;
}

/**
 * Point of the arc a->b (signed sweep phi) at angle θ ∈ [−α, α] from its midpoint (α = |phi|/2),
 * in the chord frame: P = M + u h (cosθ − cosα)/sinα + e h sinθ/sinα, with M the chord midpoint,
 * h the half chord, e the chord direction and u the unit normal towards the bulge. No arc centre
 * is involved, so arcs of any flatness stay exact.
 */
export function arcPointAtAngle(ax: number, ay: number, bx: number, by: number, phi: number, theta: number): [number, number] {
  const L = lengthOf(bx - ax, by - ay);
  if (!(L > 0)) return [ax, ay];
  const h = L / 2, alpha = Math.abs(phi) / 2;
  const sa = Math.sin(alpha);
  const ex = (bx - ax) / L, ey = (by - ay) / L;
  const sg = phi > 0 ? 1 : -1;
  const ux = sg * ey, uy = -sg * ex;
  // cosθ − cosα = 2 sin((α + θ)/2) sin((α − θ)/2), without cancellation.
  const w = sa > 0 ? (2 * h * Math.sin((alpha + theta) / 2) * Math.sin((alpha - theta) / 2)) / sa : 0;
  const t = sa > 0 ? (h * Math.sin(theta)) / sa : 0;
  return [(ax + bx) / 2 + ux * w + ex * t, (ay + by) / 2 + uy * w + ey * t];
}

/** Exact bounds: vertices plus the points where an arc's outward normal is axis-aligned. */
export function regionBounds(r: Region): Bounds | null {
  const box = [Infinity, -Infinity, Infinity, -Infinity];
  for (const c of r) takeContour(c, box);
  if (box[0] > box[1]) return null;
  return { xmin: box[0], xmax: box[1], ymin: box[2], ymax: box[3] };
}

/**
 * Exact bounds of one contour written into out[at..at + 3] as xmin, xmax, ymin, ymax (xmin > xmax
 * when it has no vertex), for callers that keep many boxes in one array.
 */
export function contourBoundsInto(c: Contour, out: number[], at: number): void {
  out[at] = Infinity;
  out[at + 1] = -Infinity;
  out[at + 2] = Infinity;
  out[at + 3] = -Infinity;
  takeContour(c, out, at);
}

/** Exact bounds of one contour (as regionBounds of [c]), or null when it has no vertex. */
export function contourBounds(c: Contour): Bounds | null {
  const box = [Infinity, -Infinity, Infinity, -Infinity];
  takeContour(c, box);
  if (box[0] > box[1]) return null;
  return { xmin: box[0], xmax: box[1], ymin: box[2], ymax: box[3] };
}

/**
 * Widen box [xmin, xmax, ymin, ymax] (from slot `at`) by the contour's vertices and its arcs' extreme points.
 * The arc points are arcPointAtAngle's, written out with no array or closure per point: this
 * runs for every loop of every evaluation (a plate with thousands of holes).
 */
function takeContour(c: Contour, box: number[], at = 0): void {
  let xmin = box[at], xmax = box[at + 1], ymin = box[at + 2], ymax = box[at + 3];
  const xy = c.xy, bulge = c.bulge;
  const n = xy.length >> 1;
  for (let i = 0; i < n; i++) {
    const x = xy[2 * i], y = xy[2 * i + 1];
    if (x < xmin) xmin = x;
    if (x > xmax) xmax = x;
    if (y < ymin) ymin = y;
    if (y > ymax) ymax = y;
    const b = bulge ? bulge[i] : 0;
    if (b === 0) continue;
    const j = (i + 1) % n;
    const bx = xy[2 * j], by = xy[2 * j + 1];
    const L = lengthOf(bx - x, by - y);
    if (!(L > 0)) continue;
    const phi = 4 * Math.atan(b), alpha = Math.abs(phi) / 2;
    const ex = (bx - x) / L, ey = (by - y) / L;
    const sg = phi > 0 ? 1 : -1;
    const ux = sg * ey, uy = -sg * ex;
    // The outward normal at θ is u cosθ + e sinθ; it equals the axis direction d at
    // θ = atan2(d·e, d·u), an extreme of the arc when |θ| < α.
    for (let k = 0; k < 4; k++) {
      const dx = AXIS_X[k], dy = AXIS_Y[k];
      const th = Math.atan2(dx * ex + dy * ey, dx * ux + dy * uy);
      if (Math.abs(th) < alpha) {
        // arcPointAtAngle(x, y, bx, by, phi, th), the same operations in the same order.
        const h = L / 2, sa = Math.sin(alpha);
        const w = sa > 0 ? (2 * h * Math.sin((alpha + th) / 2) * Math.sin((alpha - th) / 2)) / sa : 0;
        const t = sa > 0 ? (h * Math.sin(th)) / sa : 0;
        const px = (x + bx) / 2 + ux * w + ex * t, py = (y + by) / 2 + uy * w + ey * t;
        if (px < xmin) xmin = px;
        if (px > xmax) xmax = px;
        if (py < ymin) ymin = py;
        if (py > ymax) ymax = py;
      }
    }
  }
  box[at] = xmin;
  box[at + 1] = xmax;
  box[at + 2] = ymin;
  box[at + 3] = ymax;
}
const AXIS_X = Float64Array.of(1, 0, -1, 0);
const AXIS_Y = Float64Array.of(0, 1, 0, -1);

/** True when angle t lies strictly inside the sweep that starts at t0 (either direction). */
export function angleInSweep(t: number, t0: number, sweep: number): boolean {
  const TWO_PI = 2 * Math.PI;
  let d = sweep >= 0 ? t - t0 : t0 - t;
  d = ((d % TWO_PI) + TWO_PI) % TWO_PI;
  return d > 0 && d < Math.abs(sweep);
}

/** Boundary length: chords for lines, r*|phi| for arcs. */
export function contourLength(c: Contour): number {
  const n = c.xy.length >> 1;
  let sum = 0;
  for (let i = 0; i < n; i++) {
    const j = (i + 1) % n;
    const L = lengthOf(c.xy[2 * j] - c.xy[2 * i], c.xy[2 * j + 1] - c.xy[2 * i + 1]);
    const phi = c.bulge ? 4 * Math.atan(c.bulge[i]) : 0;
    const half = Math.abs(phi) / 2;
    // Arc length = L · α / sin α; the series keeps flat arcs finite.
    sum += half < 1e-6 ? L * (1 + (half * half) / 6) : (L * half) / Math.sin(half);
  }
  return sum;
}

/**
 * Points along the boundary for drawing and hit-testing only (never for the numbers): arcs are
 * split so that no chord deviates from the arc by more than `tol`.
 */
export function contourPolyline(c: Contour, tol: number): number[] {
  const n = c.xy.length >> 1;
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const ax = c.xy[2 * i], ay = c.xy[2 * i + 1];
    out.push(ax, ay);
    const phi = c.bulge ? 4 * Math.atan(c.bulge[i]) : 0;
    if (phi === 0) continue;
    const j = (i + 1) % n;
    const bx = c.xy[2 * j], by = c.xy[2 * j + 1];
    const alpha = Math.abs(phi) / 2;
    const r = lengthOf(bx - ax, by - ay) / (2 * Math.sin(alpha));
    const maxStep = tol >= r ? Math.PI / 2 : 2 * Math.acos(1 - tol / r);
    const k = Math.min(4096, Math.max(1, Math.ceil(Math.abs(phi) / Math.max(maxStep, 1e-3))));
    for (let s = 1; s < k; s++) {
      const [px, py] = arcPointAtAngle(ax, ay, bx, by, phi, -alpha + (2 * alpha * s) / k);
      out.push(px, py);
    }
  }
  return out;
}
