/**
 * Carriers: the exact source edges (straight segments and circular arcs of at most 180 degrees)
 * that every boolean output edge is traced back to, with parameters, distances, exact
 * intersections and the exact point classification used to settle ties.
 */
import { arcPointAtAngle, lengthOf } from '../geometry/contour';

export const LINE = 0;
export const ARC = 1;

/** Numbers per carrier in the store, and where each one sits. */
const STRIDE = 24;

const F_AX = 0;
const F_AY = 1;
const F_BX = 2;
const F_BY = 3;
const F_CX = 4;
const F_CY = 5;
const F_R = 6;
const F_PHI = 7;
const F_T0 = 8;
const F_TM = 9;
const F_FLAT = 10;
const F_MX = 11;
const F_MY = 12;
const F_NX = 13;
const F_NY = 14;
const F_KS = 15;
const F_KC = 16;
const F_LEN = 17;
const F_N0 = 18;
const F_N1 = 19;
const F_XMIN = 20;
const F_XMAX = 21;
const F_YMIN = 22;
const F_YMAX = 23;

/**
 * The numbers of all carriers of one boolean call, in one Float64Array. A carrier object holds
 * only its id, kind and group; its numbers live here, so a 2e5-edge outline does not allocate
 * millions of boxed doubles (object fields holding non-integers are boxed in V8), which made the
 * garbage collector the largest cost of a large boolean.
 */
export class CarrierStore {
  f: Float64Array;
  constructor(capacity = 16) {
    this.f = new Float64Array(Math.max(1, capacity) * STRIDE);
  }
  /** Offset of carrier id's numbers, growing the store when needed. */
  slot(id: number): number {
    const need = (id + 1) * STRIDE;
    if (need > this.f.length) {
      const g = new Float64Array(Math.max(need, 2 * this.f.length));
      g.set(this.f);
      this.f = g;
    }
    return id * STRIDE;
  }
}

/** An exact source edge: a straight segment or a circular arc of at most 180 degrees. */
export class Carrier {
  constructor(
    private readonly s: CarrierStore,
    readonly id: number,
    readonly kind: 0 | 1,
    /** 0 = subject / outline, 1 = clip. */
    readonly group: number,
  ) {}

  /** Exact source endpoints. */
  get ax(): number {
    return this.s.f[this.id * STRIDE + F_AX];
  }
  get ay(): number {
    return this.s.f[this.id * STRIDE + F_AY];
  }
  get bx(): number {
    return this.s.f[this.id * STRIDE + F_BX];
  }
  get by(): number {
    return this.s.f[this.id * STRIDE + F_BY];
  }
  /** Arc only: centre, radius, signed sweep (at most pi in size), start and middle angles. */
  get cx(): number {
    return this.s.f[this.id * STRIDE + F_CX];
  }
  get cy(): number {
    return this.s.f[this.id * STRIDE + F_CY];
  }
  get r(): number {
    return this.s.f[this.id * STRIDE + F_R];
  }
  get phi(): number {
    return this.s.f[this.id * STRIDE + F_PHI];
  }
  get t0(): number {
    return this.s.f[this.id * STRIDE + F_T0];
  }
  get tm(): number {
    return this.s.f[this.id * STRIDE + F_TM];
  }
  /**
   * Line only: the sweep of a nearly flat source arc (radius far beyond the extent) that is handled
   * as its chord for topology; output pieces get their share of this sweep back. 0 for a true line.
   */
  get flat(): number {
    return this.s.f[this.id * STRIDE + F_FLAT];
  }
  /**
   * Implicit form, stable for any radius (also for lines and flat arcs):
   * f(P) = ks (|P - M|^2 - L^2/4) + kc (P - M).n, zero on the curve; M the chord middle, n the unit
   * normal towards the bulge, ks = sin(a)/L, kc = cos(a), a = |sweep|/2 (ks = 0 for a line).
   */
  get mx(): number {
    return this.s.f[this.id * STRIDE + F_MX];
  }
  get my(): number {
    return this.s.f[this.id * STRIDE + F_MY];
  }
  get nx(): number {
    return this.s.f[this.id * STRIDE + F_NX];
  }
  get ny(): number {
    return this.s.f[this.id * STRIDE + F_NY];
  }
  get ks(): number {
    return this.s.f[this.id * STRIDE + F_KS];
  }
  get kc(): number {
    return this.s.f[this.id * STRIDE + F_KC];
  }
  /** Length of the carrier (chord for a line, r*|phi| for an arc). */
  get len(): number {
    return this.s.f[this.id * STRIDE + F_LEN];
  }
  /** Node ids of the start and end vertices. */
  get n0(): number {
    return this.s.f[this.id * STRIDE + F_N0];
  }
  set n0(v: number) {
    this.s.f[this.id * STRIDE + F_N0] = v;
  }
  get n1(): number {
    return this.s.f[this.id * STRIDE + F_N1];
  }
  set n1(v: number) {
    this.s.f[this.id * STRIDE + F_N1] = v;
  }
  /** Box of the carrier (of its true curve, flat arcs included). */
  get xmin(): number {
    return this.s.f[this.id * STRIDE + F_XMIN];
  }
  set xmin(v: number) {
    this.s.f[this.id * STRIDE + F_XMIN] = v;
  }
  get xmax(): number {
    return this.s.f[this.id * STRIDE + F_XMAX];
  }
  set xmax(v: number) {
    this.s.f[this.id * STRIDE + F_XMAX] = v;
  }
  get ymin(): number {
    return this.s.f[this.id * STRIDE + F_YMIN];
  }
  set ymin(v: number) {
    this.s.f[this.id * STRIDE + F_YMIN] = v;
  }
  get ymax(): number {
    return this.s.f[this.id * STRIDE + F_YMAX];
  }
  set ymax(v: number) {
    this.s.f[this.id * STRIDE + F_YMAX] = v;
  }
}

const TWO_PI = 2 * Math.PI;

/** Wrap an angle difference into (-pi, pi]. */
export function wrapAngle(d: number): number {
  d = d % TWO_PI;
  if (d > Math.PI) d -= TWO_PI;
  else if (d <= -Math.PI) d += TWO_PI;
  return d;
}

/** The implicit function of c at (x, y) and its gradient. */
export function implicitAt(c: Carrier, x: number, y: number): [number, number, number] {
  const px = x - c.mx, py = y - c.my;
  const hl = lengthOf(c.bx - c.ax, c.by - c.ay) / 2;
  const f = c.ks * (px * px + py * py - hl * hl) + c.kc * (px * c.nx + py * c.ny);
  return [f, 2 * c.ks * px + c.kc * c.nx, 2 * c.ks * py + c.kc * c.ny];
}

/**
 * Newton polish of a common point of a and b (their true curves, flat arcs included), so the
 * result keeps full precision whatever the radii. Returns the input when the curves are tangent.
 */
export function polishIntersection(a: Carrier, b: Carrier, x: number, y: number): [number, number] {
  for (let it = 0; it < 4; it++) {
    const [fa, gax, gay] = implicitAt(a, x, y);
    const [fb, gbx, gby] = implicitAt(b, x, y);
    const det = gax * gby - gay * gbx;
    if (!(Math.abs(det) > 1e-8 * lengthOf(gax, gay) * lengthOf(gbx, gby))) break;
    const dx = (-fa * gby + fb * gay) / det, dy = (-gax * fb + gbx * fa) / det;
    if (!Number.isFinite(dx) || !Number.isFinite(dy)) break;
    x += dx;
    y += dy;
    if (Math.abs(dx) + Math.abs(dy) <= 1e-17 * (Math.abs(x) + Math.abs(y) + 1e-300)) break;
  }
  return [x, y];
}

/** Writes a carrier's numbers into the store and returns it. */
function makeCarrier(
  store: CarrierStore, id: number, kind: 0 | 1, group: number, ax: number, ay: number, bx: number, by: number,
  cx: number, cy: number, r: number, phi: number, flat: number, bulge: number,
): Carrier {
  const dx = bx - ax, dy = by - ay;
  const L = lengthOf(dx, dy);
  const Ls = L || 1;
  const sw = kind === ARC ? phi : flat;
  const sg = sw >= 0 ? 1 : -1;
  const half = Math.abs(sw) / 2;
  // sin and cos of the half sweep from the bulge itself (exact for a half circle, b = ±1).
  const b2 = bulge * bulge;
  const sinHalf = bulge === 0 ? Math.sin(half) : (2 * Math.abs(bulge)) / (1 + b2);
  const cosHalf = bulge === 0 ? Math.cos(half) : (1 - b2) / (1 + b2);
  const t0 = kind === ARC ? Math.atan2(ay - cy, ax - cx) : 0;
  const o = store.slot(id), f = store.f;
  f[o + F_AX] = ax;
  f[o + F_AY] = ay;
  f[o + F_BX] = bx;
  f[o + F_BY] = by;
  f[o + F_CX] = cx;
  f[o + F_CY] = cy;
  f[o + F_R] = r;
  f[o + F_PHI] = phi;
  f[o + F_T0] = t0;
  f[o + F_TM] = t0 + phi / 2;
  f[o + F_FLAT] = flat;
  f[o + F_MX] = (ax + bx) / 2;
  f[o + F_MY] = (ay + by) / 2;
  f[o + F_NX] = (sg * dy) / Ls;
  f[o + F_NY] = (-sg * dx) / Ls;
  f[o + F_KS] = half === 0 ? 0 : sinHalf / Ls;
  f[o + F_KC] = half === 0 ? 1 : cosHalf;
  f[o + F_LEN] = kind === ARC ? r * Math.abs(phi) : L;
  f[o + F_N0] = -1;
  f[o + F_N1] = -1;
  f[o + F_XMIN] = ax < bx ? ax : bx;
  f[o + F_XMAX] = ax > bx ? ax : bx;
  f[o + F_YMIN] = ay < by ? ay : by;
  f[o + F_YMAX] = ay > by ? ay : by;
  return new Carrier(store, id, kind, group);
}

/** A line; `flat` (with its source bulge) for a nearly flat arc kept as its chord. */
export function makeLine(
  store: CarrierStore, id: number, group: number, ax: number, ay: number, bx: number, by: number, flat = 0, bulge = 0,
): Carrier {
  const c = makeCarrier(store, id, LINE, group, ax, ay, bx, by, 0, 0, 0, 0, flat, flat === 0 ? 0 : bulge);
  if (flat !== 0) {
    // The box holds the flat arc's bulge too (its height above the chord is (L/2)·tan(sweep/4)).
    const h = (c.len / 2) * Math.abs(Math.tan(flat / 4));
    c.xmin -= h;
    c.xmax += h;
    c.ymin -= h;
    c.ymax += h;
  }
  return c;
}

/** An arc of sweep phi (at most π in size); `bulge` = tan(phi/4) as given, when known. */
export function makeArc(
  store: CarrierStore, id: number, group: number, ax: number, ay: number, bx: number, by: number,
  cx: number, cy: number, r: number, phi: number, bulge = 0,
): Carrier {
  const c = makeCarrier(store, id, ARC, group, ax, ay, bx, by, cx, cy, r, phi, 0, bulge);
  // Axis extremes inside the sweep.
  const half = Math.abs(phi) / 2;
  for (let k = 0; k < 4; k++) {
    const t = (k * Math.PI) / 2;
    if (Math.abs(wrapAngle(t - c.tm)) >= half) continue;
    if (k === 0) c.xmax = cx + r;
    else if (k === 1) c.ymax = cy + r;
    else if (k === 2) c.xmin = cx - r;
    else c.ymin = cy - r;
  }
  return c;
}

/** Parameter of (x, y) along c: 0 at the start, 1 at the end (not clamped). */
export function paramOf(c: Carrier, x: number, y: number): number {
  if (c.kind === LINE) {
    const dx = c.bx - c.ax, dy = c.by - c.ay;
    const L2 = dx * dx + dy * dy;
    return L2 === 0 ? 0 : ((x - c.ax) * dx + (y - c.ay) * dy) / L2;
  }
  const d = wrapAngle(Math.atan2(y - c.cy, x - c.cx) - c.tm);
  return 0.5 + d / c.phi;
}

/** Point at parameter u; the exact endpoints at 0 and 1. */
export function pointAt(c: Carrier, u: number): [number, number] {
  if (u <= 0) return [c.ax, c.ay];
  if (u >= 1) return [c.bx, c.by];
  if (c.kind === LINE) return [c.ax + u * (c.bx - c.ax), c.ay + u * (c.by - c.ay)];
  const t = c.t0 + c.phi * u;
  return [c.cx + c.r * Math.cos(t), c.cy + c.r * Math.sin(t)];
}

/**
 * Point of the true curve at parameter u: pointAt for lines and arcs; for a flat arc kept as its
 * chord, the arc's own point over the chord point at u (chord frame, no centre involved).
 */
export function curvePoint(c: Carrier, u: number): [number, number] {
  if (c.kind === ARC || c.flat === 0) return pointAt(c, u);
  const sa = Math.sin(Math.abs(c.flat) / 2);
  const th = Math.asin(Math.max(-1, Math.min(1, (2 * u - 1) * sa)));
  return arcPointAtAngle(c.ax, c.ay, c.bx, c.by, c.flat, th);
}

/** Distance from (x, y) to the carrier's full line or full circle. */
export function distToCurve(c: Carrier, x: number, y: number): number {
  if (c.kind === LINE) {
    const dx = c.bx - c.ax, dy = c.by - c.ay;
    const L = c.len;
    if (L === 0) return lengthOf(x - c.ax, y - c.ay);
    return Math.abs((x - c.ax) * dy - (y - c.ay) * dx) / L;
  }
  return Math.abs(lengthOf(x - c.cx, y - c.cy) - c.r);
}

/** Distance from (x, y) to the carrier itself (its finite range). */
export function distToCarrier(c: Carrier, x: number, y: number): number {
  const u = paramOf(c, x, y);
  if (u >= 0 && u <= 1) return distToCurve(c, x, y);
  return Math.min(lengthOf(x - c.ax, y - c.ay), lengthOf(x - c.bx, y - c.by));
}

/** True when two carriers lie on the same line or the same circle (within tol). */
export function sameCurve(a: Carrier, b: Carrier, tol: number): boolean {
  if (a.kind !== b.kind) return false;
  if (a.kind === ARC) return Math.abs(a.r - b.r) <= tol && lengthOf(a.cx - b.cx, a.cy - b.cy) <= tol;
  if (!(distToCurve(a, b.ax, b.ay) <= tol && distToCurve(a, b.bx, b.by) <= tol)) return false;
  if (a.flat === 0 && b.flat === 0) return true;
  // A flat arc is not its chord: the middle of b's true curve must lie on a's true curve too.
  const [mx, my] = curvePoint(b, 0.5);
  const [f, gx, gy] = implicitAt(a, mx, my);
  return Math.abs(f) <= tol * lengthOf(gx, gy);
}

/**
 * Intersections of the full curves of a and b (lines extended, full circles). Near-tangent
 * configurations (gap or overlap within tanTol) give the single tangent point, so the result is
 * never NaN. Parallel lines and concentric circles give no points.
 */
export function curveIntersections(a: Carrier, b: Carrier, tanTol: number): number[] {
  if (a.kind === LINE && b.kind === LINE) return lineLine(a, b);
  if (a.kind === LINE) return lineCircle(a, b.cx, b.cy, b.r, tanTol);
  if (b.kind === LINE) return lineCircle(b, a.cx, a.cy, a.r, tanTol);
  return circleCircle(a.cx, a.cy, a.r, b.cx, b.cy, b.r, tanTol);
}

function lineLine(a: Carrier, b: Carrier): number[] {
  const d1x = a.bx - a.ax, d1y = a.by - a.ay;
  const d2x = b.bx - b.ax, d2y = b.by - b.ay;
  const den = d1x * d2y - d1y * d2x;
  if (!(Math.abs(den) > 1e-14 * a.len * b.len)) return [];
  const ex = b.ax - a.ax, ey = b.ay - a.ay;
  const t = (ex * d2y - ey * d2x) / den;
  const s = (ex * d1y - ey * d1x) / den;
  // Evaluate from the nearer end of each segment and average, which halves the round-off.
  const p1x = t < 0.5 ? a.ax + t * d1x : a.bx + (t - 1) * d1x;
  const p1y = t < 0.5 ? a.ay + t * d1y : a.by + (t - 1) * d1y;
  const p2x = s < 0.5 ? b.ax + s * d2x : b.bx + (s - 1) * d2x;
  const p2y = s < 0.5 ? b.ay + s * d2y : b.by + (s - 1) * d2y;
  return [(p1x + p2x) / 2, (p1y + p2y) / 2];
}

function lineCircle(l: Carrier, cx: number, cy: number, r: number, tanTol: number): number[] {
  const dx = l.bx - l.ax, dy = l.by - l.ay;
  const L = l.len;
  if (L === 0) return [];
  const ux = dx / L, uy = dy / L;
  // Foot of the perpendicular from the centre, measured from the nearer endpoint.
  const useA = lengthOf(cx - l.ax, cy - l.ay) <= lengthOf(cx - l.bx, cy - l.by);
  const ox = useA ? l.ax : l.bx, oy = useA ? l.ay : l.by;
  const t0 = (cx - ox) * ux + (cy - oy) * uy;
  const fx = ox + t0 * ux, fy = oy + t0 * uy;
  const h = (cx - ox) * uy - (cy - oy) * ux; // signed distance centre -> line
  const ah = Math.abs(h);
  if (ah > r + tanTol) return [];
  if (ah >= r - tanTol) return [fx, fy];
  const w = Math.sqrt((r - ah) * (r + ah));
  return [fx - w * ux, fy - w * uy, fx + w * ux, fy + w * uy];
}

function circleCircle(x1: number, y1: number, r1: number, x2: number, y2: number, r2: number, tanTol: number): number[] {
  const dx = x2 - x1, dy = y2 - y1;
  const D = lengthOf(dx, dy);
  if (D <= tanTol) return [];
  if (D > r1 + r2 + tanTol) return [];
  if (D < Math.abs(r1 - r2) - tanTol) return [];
  const ex = dx / D, ey = dy / D;
  const a = (D * D + (r1 - r2) * (r1 + r2)) / (2 * D);
  // h^2 = r1^2 - a^2, clamped for near-tangent circles.
  const h2 = (r1 - a) * (r1 + a);
  const tangent = Math.abs(D - (r1 + r2)) <= tanTol || Math.abs(D - Math.abs(r1 - r2)) <= tanTol || h2 <= 0;
  const mx = x1 + a * ex, my = y1 + a * ey;
  if (tangent) return [mx, my];
  const h = Math.sqrt(h2);
  return [mx - h * ey, my + h * ex, mx + h * ey, my - h * ex];
}

/** Index (into pts, pairs) of the point nearest (x, y), or -1. */
export function nearestPoint(pts: number[], x: number, y: number): number {
  let best = -1, bd = Infinity;
  for (let k = 0; k < pts.length; k += 2) {
    const d = lengthOf(pts[k] - x, pts[k + 1] - y);
    if (d < bd) {
      bd = d;
      best = k;
    }
  }
  return best;
}

/**
 * Winding contribution of carrier c about point (x, y): the crossing rule for its chord plus the
 * circular segment between chord and arc (+1 or -1 when the point lies inside it).
 *
 * The half-open crossing rule counts an end exactly at the ray's height as below the point, as
 * if the point sat at (x + ε², y + ε). Every test here uses that same nudged point, so a point on
 * a chord's line (the diameter of a circle made of two half arcs, say) is inside exactly one of
 * the pieces the loop is split into, and the pieces still add up to the loop's winding.
 */
export function windingOf(c: Carrier, x: number, y: number): number {
  let w = 0;
  const { ax, ay, bx, by } = c;
  let side = (bx - ax) * (y - ay) - (x - ax) * (by - ay);
  if (side === 0) side = bx !== ax ? bx - ax : ay - by;
  if (ay <= y) {
    if (by > y && side > 0) w++;
  } else if (by <= y && side < 0) w--;
  if (c.kind === ARC) {
    const d = lengthOf(x - c.cx, y - c.cy);
    const inCircle = d < c.r || (d === c.r && (y < c.cy || (y === c.cy && x < c.cx)));
    // Inside the circle and on the arc's side of the chord (for phi > 0 the arc bulges to the
    // right of a->b): inside the circular segment.
    if (inCircle && ((c.phi > 0 && side < 0) || (c.phi < 0 && side > 0))) w += c.phi > 0 ? 1 : -1;
  } else if (c.flat !== 0) {
    // A flat arc kept as its chord: its thin segment is where the point lies on the bulge side
    // of the chord and inside the circle (implicit form below zero), with no centre involved.
    if (((c.flat > 0 && side < 0) || (c.flat < 0 && side > 0)) && implicitAt(c, x, y)[0] < 0) w += c.flat > 0 ? 1 : -1;
  }
  return w;
}
