/**
 * Tangent arcs on a path: the exact fillet of one corner, and the arc that continues a path by
 * radius and sweep.
 *
 * A fillet replaces the corner where two segments meet by the circular arc of the given radius
 * that is tangent to both. The algorithm:
 * 1. Read the two segments that meet at the corner (each a line or a circular arc) and their
 *    directions of travel at the corner. A straight corner or one that doubles back is refused.
 * 2. The path turns left or right there; the fillet's centre lies on that side of both
 *    segments, at distance r from each. So it lies on the offset of each segment by r towards
 *    that side: a parallel line for a line, a concentric circle (radius R ∓ r) for an arc.
 * 3. Intersect the two offsets in closed form (line–line, line–circle, circle–circle). Each
 *    candidate centre has one tangent point on each segment (the foot of the perpendicular, or
 *    the point of the arc on the ray from its centre). Keep the candidates whose tangent points
 *    lie on their segments and take the one nearest the corner. None left: the radius does not
 *    fit between the neighbouring segments (between two lines the message gives the largest
 *    radius that fits).
 * 4. Trim the two segments to the tangent points (a segment used up entirely is dropped) and put
 *    the fillet arc between them, with its `via` point at the arc's midpoint.
 *
 * Line–line corners use the closed form of the tangent length, t = r·tan(θ/2) with θ the turn
 * angle, measured from the corner itself, so an axis-aligned corner gives exact tangent points.
 *
 * Plain data in and out: `{ start, segments: [{to} | {to, via}] }` paths as in the section
 * document (a path is closed when its last segment ends on its start), angles in radians.
 * Written by hand: no geometry library in the allowed set builds tangent arcs exactly.
 */
import { arcFromChord, sweepThrough, type Vec2 } from './contour';
import { facesMeet, type JointSide } from './offset-faces';

export type FilletPoint = [number, number];

/** `{to}` is a line; `{to, via}` is the circular arc from the current point through via to to. */
export interface FilletSegment {
  to: FilletPoint;
  via?: FilletPoint;
}

export interface PathLike {
  start: Vec2;
  segments: readonly { to: Vec2; via?: Vec2 }[];
}

/** A path record as the section document writes it (the caller adds id, name and op). */
export interface FilletPath {
  type: 'path';
  start: FilletPoint;
  segments: FilletSegment[];
}

export type FilletResult =
  | {
      ok: true;
      path: FilletPath;
      /** Centre of the fillet arc. */
      centre: FilletPoint;
      /** Tangent points on the incoming and on the outgoing segment. */
      tangentIn: FilletPoint;
      tangentOut: FilletPoint;
      /** Signed sweep of the fillet arc in radians (positive CCW, i.e. a left turn). */
      sweep: number;
    }
  | { ok: false; message: string };

/** One segment as geometry: a line a→b, or an arc a→b about (cx, cy) with signed sweep. */
type Piece =
  | { kind: 'line'; a: Vec2; b: Vec2; length: number; u: Vec2 }
  | { kind: 'arc'; a: Vec2; b: Vec2; cx: number; cy: number; r: number; sweep: number; t0: number };

const TWO_PI = 2 * Math.PI;

function fmt(v: number): string {
  return String(Number(v.toPrecision(6)));
}

function unit(x: number, y: number): [number, number] {
  const L = Math.hypot(x, y);
  return [x / L, y / L];
}

/** Below this fraction of the outline's size a length cannot be told from round-off. */
const MIN_RATIO = 1e-12;

function pieceOf(a: Vec2, seg: { to: Vec2; via?: Vec2 }, index: number, size: number): Piece | string {
  const b = seg.to;
  const chord = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (!(chord > MIN_RATIO * size)) return `segment ${index + 1} is too short (${fmt(chord)}) to round against`;
  if (!seg.via) return { kind: 'line', a, b, length: chord, u: unit(b[0] - a[0], b[1] - a[1]) };
  const v = seg.via;
  const sweep = sweepThrough(a[0], a[1], v[0], v[1], b[0], b[1]);
  if (!Number.isFinite(sweep)) return `segment ${index + 1} is an arc whose three points lie on one line`;
  const { cx, cy, r } = arcFromChord(a[0], a[1], b[0], b[1], sweep);
  return { kind: 'arc', a, b, cx, cy, r, sweep, t0: Math.atan2(a[1] - cy, a[0] - cx) };
}

/** Unit direction of travel of a piece at its start (end = false) or at its end (end = true). */
function direction(p: Piece, end: boolean): [number, number] {
  if (p.kind === 'line') return [p.u[0], p.u[1]];
  const q = end ? p.b : p.a;
  const s = p.sweep > 0 ? 1 : -1;
  const [ex, ey] = unit(q[0] - p.cx, q[1] - p.cy);
  return [-s * ey, s * ex];
}

/** Point of an arc piece at angle t about its centre. */
function arcPoint(p: Extract<Piece, { kind: 'arc' }>, t: number): FilletPoint {
  return [p.cx + p.r * Math.cos(t), p.cy + p.r * Math.sin(t)];
}

/**
 * Where the tangent point q of a candidate centre lies along a piece, as a fraction of the piece
 * from its start (0) to its end (1); NaN when q is not on the piece.
 */
function fractionAlong(p: Piece, q: Vec2, tol: number): number {
  if (p.kind === 'line') {
    const s = ((q[0] - p.a[0]) * p.u[0] + (q[1] - p.a[1]) * p.u[1]) / p.length;
    return s >= -tol && s <= 1 + tol ? Math.min(1, Math.max(0, s)) : NaN;
  }
  const t = Math.atan2(q[1] - p.cy, q[0] - p.cx);
  let d = p.sweep >= 0 ? t - p.t0 : p.t0 - t;
  d = ((d % TWO_PI) + TWO_PI) % TWO_PI;
  const f = d / Math.abs(p.sweep);
  if (f <= 1 + tol) return f;
  if (f >= TWO_PI / Math.abs(p.sweep) - tol) return 0; // just before the start, by round-off
  return NaN;
}

/** The offset of a piece by r to one side (+1 left of the direction of travel, −1 right). */
type Offset = { kind: 'line'; p: Vec2; u: Vec2 } | { kind: 'circle'; c: Vec2; rho: number };

function offsetOf(p: Piece, side: 1 | -1, r: number, through: Vec2): Offset | string {
  if (p.kind === 'line') {
    // Through the corner's own offset point, so the intersections are measured from the corner.
    return { kind: 'line', p: [through[0] - side * r * p.u[1], through[1] + side * r * p.u[0]], u: p.u };
  }
  // The left of travel on a CCW arc is towards its centre.
  const towardsCentre = side * (p.sweep > 0 ? 1 : -1) > 0;
  const rho = towardsCentre ? p.r - r : p.r + r;
  if (!(rho > 1e-12 * p.r)) return `a radius of ${fmt(r)} does not fit inside the neighbouring arc of radius ${fmt(p.r)}`;
  return { kind: 'circle', c: [p.cx, p.cy], rho };
}

function lineCircle(l: Extract<Offset, { kind: 'line' }>, c: Extract<Offset, { kind: 'circle' }>): Vec2[] {
  // |p + s u − c|² = ρ²: s² + 2bs + k = 0 with b = w·u, k = |w|² − ρ² (w = p − c).
  const wx = l.p[0] - c.c[0], wy = l.p[1] - c.c[1];
  const b = wx * l.u[0] + wy * l.u[1];
  const w = Math.hypot(wx, wy);
  const k = (w - c.rho) * (w + c.rho);
  let disc = b * b - k;
  const scale = Math.max(b * b, Math.abs(k), c.rho * c.rho);
  if (disc < 0 && disc > -1e-12 * scale) disc = 0;
  if (disc < 0) return [];
  const root = Math.sqrt(disc);
  const q = -(b + (b >= 0 ? root : -root));
  const ss = q === 0 ? [0] : [q, k / q];
  return ss.map((s) => [l.p[0] + s * l.u[0], l.p[1] + s * l.u[1]] as Vec2);
}

function circleCircle(a: Extract<Offset, { kind: 'circle' }>, b: Extract<Offset, { kind: 'circle' }>): Vec2[] {
  const dx = b.c[0] - a.c[0], dy = b.c[1] - a.c[1];
  const d = Math.hypot(dx, dy);
  if (!(d > 0)) return [];
  const m = (a.rho * a.rho - b.rho * b.rho + d * d) / (2 * d);
  let h2 = (a.rho - m) * (a.rho + m);
  if (h2 < 0 && h2 > -1e-12 * a.rho * a.rho) h2 = 0;
  if (h2 < 0) return [];
  const h = Math.sqrt(h2);
  const ex = dx / d, ey = dy / d;
  const mx = a.c[0] + m * ex, my = a.c[1] + m * ey;
  return h === 0 ? [[mx, my]] : [[mx - h * ey, my + h * ex], [mx + h * ey, my - h * ex]];
}

function intersect(a: Offset, b: Offset): Vec2[] {
  if (a.kind === 'line' && b.kind === 'line') {
    const den = a.u[0] * b.u[1] - a.u[1] * b.u[0];
    if (den === 0) return [];
    const s = ((b.p[0] - a.p[0]) * b.u[1] - (b.p[1] - a.p[1]) * b.u[0]) / den;
    return [[a.p[0] + s * a.u[0], a.p[1] + s * a.u[1]]];
  }
  if (a.kind === 'line' && b.kind === 'circle') return lineCircle(a, b);
  if (a.kind === 'circle' && b.kind === 'line') return lineCircle(b, a);
  return circleCircle(a as Extract<Offset, { kind: 'circle' }>, b as Extract<Offset, { kind: 'circle' }>);
}

/** The tangent point of a circle about f on a piece (its offset contains f). */
function tangentPoint(p: Piece, f: Vec2): FilletPoint {
  if (p.kind === 'line') {
    const s = (f[0] - p.a[0]) * p.u[0] + (f[1] - p.a[1]) * p.u[1];
    return [p.a[0] + s * p.u[0], p.a[1] + s * p.u[1]];
  }
  const [ex, ey] = unit(f[0] - p.cx, f[1] - p.cy);
  return [p.cx + p.r * ex, p.cy + p.r * ey];
}

/** The part of a piece from fraction f0 to f1 as a path segment ending at `to`. */
function trimmed(p: Piece, f0: number, f1: number, to: FilletPoint): FilletSegment {
  if (p.kind === 'line') return { to };
  return { to, via: arcPoint(p, p.t0 + p.sweep * ((f0 + f1) / 2)) };
}

interface Candidate {
  /** Fillet centre. */
  f: Vec2;
  /** Tangent points on the incoming and the outgoing piece. */
  tin: FilletPoint;
  tout: FilletPoint;
  /** Where they lie along their pieces (0 at the piece's start, 1 at its end). */
  fin: number;
  fout: number;
}

/** The corner as the fillet sees it: the two pieces, the vertex, and the turn there. */
interface Corner {
  pin: Piece;
  pout: Piece;
  V: Vec2;
  /** Unit directions of travel arriving at and leaving the corner. */
  d1: [number, number];
  d2: [number, number];
  cross: number;
  dot: number;
  /** +1 when the path turns left at the corner, −1 when it turns right. */
  side: 1 | -1;
}

/** The fillet centre and tangent points for a corner between two lines, in closed form. */
function fitLines(c: Corner & { pin: { kind: 'line' }; pout: { kind: 'line' } }, r: number, label: number): Candidate | string {
  const { pin, pout, V, d1, d2, cross, side } = c;
  // Tangent length r·tan(θ/2) = r·|sinθ|/(1 + cosθ), measured back and on from the corner. For a
  // corner that nearly turns straight back 1 + cosθ cancels; |d1 + d2|²/2 is the same value
  // without the cancellation (and never negative), so t grows large and is refused below.
  const t = (r * Math.abs(cross)) / (0.5 * ((d1[0] + d2[0]) ** 2 + (d1[1] + d2[1]) ** 2));
  if (t > pin.length * (1 + 1e-12) || t > pout.length * (1 + 1e-12)) {
    const room = Math.min(pin.length, pout.length);
    const rMax = (room * 0.5 * ((d1[0] + d2[0]) ** 2 + (d1[1] + d2[1]) ** 2)) / Math.abs(cross);
    return `A radius of ${fmt(r)} does not fit at corner ${label}: it needs ${fmt(t)} along each side, but the shorter side is ${fmt(room)} long (largest radius: ${fmt(rMax)}).`;
  }
  const tin: FilletPoint = [V[0] - d1[0] * t, V[1] - d1[1] * t];
  const tout: FilletPoint = [V[0] + d2[0] * t, V[1] + d2[1] * t];
  const f: Vec2 = [tin[0] - side * r * d1[1], tin[1] + side * r * d1[0]];
  return { f, tin, tout, fin: 1 - t / pin.length, fout: t / pout.length };
}

/** A piece at the corner as the offset equation takes it: direction of travel, left normal, signed curvature. */
function jointSide(p: Piece, atEnd: boolean): JointSide {
  const [tx, ty] = direction(p, atEnd);
  return { tx, ty, nx: -ty, ny: tx, k: p.kind === 'line' ? 0 : (p.sweep > 0 ? 1 : -1) / p.r };
}

/** The fillet centre and tangent points when an arc takes part: offsets intersected. */
function fitCurves(c: Corner, r: number, label: number): Candidate | string {
  const { pin, pout, V, side } = c;
  const oin = offsetOf(pin, side, r, V), oout = offsetOf(pout, side, r, V);
  if (typeof oin === 'string') return `Cannot round corner ${label}: ${oin}.`;
  if (typeof oout === 'string') return `Cannot round corner ${label}: ${oout}.`;
  // The centre nearest the corner, from the offsets' equation about the corner itself: it
  // stays exact when an arc is nearly flat (its centre far away), where intersecting the
  // offset circles would cancel (src/geometry/offset-faces.ts). The full intersection is the
  // fallback when that root does not fit.
  const w = facesMeet(jointSide(pin, true), jointSide(pout, false), side * r);
  const near: Vec2[] = w ? [[V[0] + w[0], V[1] + w[1]]] : [];
  let best: Candidate | null = null, bestCost = Infinity;
  for (const f of [...near, ...intersect(oin, oout)]) {
    const tin = tangentPoint(pin, f), tout = tangentPoint(pout, f);
    const fin = fractionAlong(pin, tin, 1e-9);
    const fout = fractionAlong(pout, tout, 1e-9);
    if (Number.isNaN(fin) || Number.isNaN(fout)) continue;
    // The nearest fit to the corner: the least of both pieces used up.
    const cost = 1 - fin + fout;
    if (cost < bestCost) [best, bestCost] = [{ f, tin, tout, fin, fout }, cost];
  }
  return best ?? `A radius of ${fmt(r)} does not fit at corner ${label}: the rounding would run past the end of a neighbouring segment. Try a smaller radius.`;
}

/**
 * Round corner `corner` of a path (vertex 0 is `start`, vertex k the end of segment k − 1) with
 * a tangent arc of radius `radius`. A closed path (last segment ending exactly on the start) has
 * corners 0 … n − 1; an open one has corners 1 … n − 1 (its ends are not corners).
 */
export function filletCorner(path: PathLike, corner: number, radius: number): FilletResult {
  const segs = path.segments;
  const n = segs.length;
  const fail = (message: string): FilletResult => ({ ok: false, message });
  if (!(typeof radius === 'number' && Number.isFinite(radius) && radius > 0)) return fail(`The fillet radius must be a number greater than 0 (got ${String(radius)}).`);
  const pts: Vec2[] = [path.start, ...segs.map((s) => s.to)];
  for (const [k, q] of [...pts, ...segs.flatMap((s) => (s.via ? [s.via] : []))].entries())
    if (!Number.isFinite(q[0]) || !Number.isFinite(q[1])) return fail(`Point ${k + 1} of the path is not a pair of finite numbers.`);
  const closed = n >= 2 && pts[n][0] === pts[0][0] && pts[n][1] === pts[0][1];
  const last = closed ? n - 1 : n;
  if (!Number.isInteger(corner) || corner < 0 || corner > last) return fail(`There is no corner ${corner} on this outline (its corners are numbered 0 to ${last}).`);
  if (!closed && (corner === 0 || corner === n)) return fail('An end of an open line is not a corner: pick a point where two segments meet.');
  const k = corner;
  const iIn = (k - 1 + n) % n, iOut = k;
  if (iIn === iOut) return fail('This outline has only one segment: there is no corner to round.');
  // The outline's size: the largest coordinate magnitude and extent.
  let size = 0;
  for (const q of pts) size = Math.max(size, Math.abs(q[0]), Math.abs(q[1]), Math.hypot(q[0] - pts[0][0], q[1] - pts[0][1]));
  if (radius < MIN_RATIO * size) return fail(`A radius of ${fmt(radius)} is too small to tell from round-off on an outline of this size (${fmt(size)}).`);
  const pin = pieceOf(pts[iIn], segs[iIn], iIn, size);
  const pout = pieceOf(pts[iOut], segs[iOut], iOut, size);
  if (typeof pin === 'string') return fail(`Cannot round corner ${corner}: ${pin}.`);
  if (typeof pout === 'string') return fail(`Cannot round corner ${corner}: ${pout}.`);

  const d1 = direction(pin, true), d2 = direction(pout, false);
  const cross = d1[0] * d2[1] - d1[1] * d2[0];
  const dot = d1[0] * d2[0] + d1[1] * d2[1];
  if (Math.abs(cross) <= 1e-12) {
    if (dot > 0) return fail(`Corner ${corner} is straight: the two segments meet in line, so there is nothing to round.`);
    return fail(`The outline doubles back at corner ${corner}: there is no corner to round there.`);
  }
  const c: Corner = { pin, pout, V: pts[k], d1, d2, cross, dot, side: cross > 0 ? 1 : -1 };
  const lines = pin.kind === 'line' && pout.kind === 'line';
  const best = lines ? fitLines(c as Parameters<typeof fitLines>[0], radius, corner) : fitCurves(c, radius, corner);
  if (typeof best === 'string') return fail(best);

  // A piece used up to its far end is dropped, and its exact end vertex is kept.
  const eps = 1e-12;
  const useInStart = best.fin <= eps;
  const useOutEnd = best.fout >= 1 - eps;
  const f = best.f, r = radius;
  const tIn: FilletPoint = useInStart ? [pin.a[0], pin.a[1]] : best.tin;
  const tOut: FilletPoint = useOutEnd ? [pout.b[0], pout.b[1]] : best.tout;

  // The fillet arc turns the same way as the corner, from tIn to tOut about f; between two
  // lines its sweep is the turn angle itself.
  const a0 = Math.atan2(tIn[1] - f[1], tIn[0] - f[0]);
  let sweep: number;
  if (lines) sweep = c.side * Math.atan2(Math.abs(cross), dot);
  else {
    const a1 = Math.atan2(tOut[1] - f[1], tOut[0] - f[0]);
    sweep = c.side > 0 ? a1 - a0 : a0 - a1;
    sweep = ((sweep % TWO_PI) + TWO_PI) % TWO_PI;
    if (!(sweep > 1e-12) || sweep > TWO_PI - 1e-9) return fail(`Corner ${corner} is too shallow to round with a radius of ${fmt(r)}.`);
    sweep *= c.side;
  }
  const am = a0 + sweep / 2;
  const arc: FilletSegment = { to: tOut, via: [f[0] + r * Math.cos(am), f[1] + r * Math.sin(am)] };

  // Rebuild the segment list: the incoming piece up to tIn, the fillet, the outgoing piece from tOut.
  const copy = (s: { to: Vec2; via?: Vec2 }): FilletSegment => (s.via ? { to: [s.to[0], s.to[1]], via: [s.via[0], s.via[1]] } : { to: [s.to[0], s.to[1]] });
  const before: FilletSegment[] = useInStart ? [] : [trimmed(pin, 0, best.fin, tIn)];
  const after: FilletSegment[] = useOutEnd ? [] : [trimmed(pout, best.fout, 1, [pout.b[0], pout.b[1]])];
  let start: FilletPoint = [path.start[0], path.start[1]];
  let out: FilletSegment[];
  if (closed && k === 0) {
    // The start vertex itself is rounded: the path now starts where the fillet ends.
    start = [tOut[0], tOut[1]];
    out = [...after, ...segs.slice(1, n - 1).map(copy), ...before, arc];
  } else {
    out = [...segs.slice(0, iIn).map(copy), ...before, arc, ...after, ...segs.slice(iOut + 1).map(copy)];
  }
  if (closed) out[out.length - 1].to = start;
  if (out.length < 2) return fail(`Rounding corner ${corner} with a radius of ${fmt(r)} would leave no outline.`);
  return { ok: true, path: { type: 'path', start, segments: out }, centre: [f[0], f[1]], tangentIn: tIn, tangentOut: tOut, sweep };
}

/** Round corner `corner` (index into `points`) of a closed polygon; the result is a path. */
export function filletPolygonCorner(points: readonly Vec2[], corner: number, radius: number): FilletResult {
  if (points.length < 3) return { ok: false, message: 'A polygon needs at least three corners.' };
  const segments = [...points.slice(1), points[0]].map((q) => ({ to: q }));
  return filletCorner({ start: points[0], segments }, corner, radius);
}

/** Unit direction of travel at the end of a path's last segment; null for a path with no segments. */
export function pathEndDirection(path: PathLike): [number, number] | null {
  const n = path.segments.length;
  if (n === 0) return null;
  const from = n === 1 ? path.start : path.segments[n - 2].to;
  const p = pieceOf(from, path.segments[n - 1], n - 1, 0);
  return typeof p === 'string' ? null : direction(p, true);
}

/**
 * The arc that leaves `from` along the unit direction `dir` with radius `radius` and signed
 * sweep `sweep` (radians; positive turns left, i.e. CCW), as a path segment. |sweep| < 2π.
 */
export function tangentArc(from: Vec2, dir: Vec2, radius: number, sweep: number): FilletSegment {
  const [ux, uy] = unit(dir[0], dir[1]);
  const s = sweep > 0 ? 1 : -1;
  const cx = from[0] - s * radius * uy, cy = from[1] + s * radius * ux;
  const t0 = Math.atan2(from[1] - cy, from[0] - cx);
  const at = (t: number): FilletPoint => [cx + radius * Math.cos(t), cy + radius * Math.sin(t)];
  return { to: at(t0 + sweep), via: at(t0 + sweep / 2) };
}
