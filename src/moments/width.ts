/**
 * One-sided cut widths. The width b(c) of a section along the cut line y = c jumps at a level
 * where a straight edge of the boundary lies on the line: the underside of a flange, the top or
 * bottom face of a plate, the edge of a rectangular hole. There the cut has two widths, the width
 * just above, b(c + 0), and the width just below, b(c − 0); the first moment Q of the part beyond
 * the cut is continuous, so Q/b has two values too.
 *
 * The limits are taken exactly from the boundary, not by cutting at c ± δ. A region's width at a
 * level is Σ x over the boundary crossings going up minus Σ x over those going down (outer loops
 * CCW, holes CW, so the signs hold for every loop). Each segment is split into pieces that are
 * monotone in y (lines already are; an arc is split at its highest and lowest points). A piece
 * from level lo to level hi crosses every line just above c when lo ≤ c < hi, and every line just
 * below c when lo < c ≤ hi, and as the line tends to c its crossing tends to the piece's point at
 * y = c: a vertex on the line is used as it is, other points are solved on the line or the arc.
 * An edge lying on the line crosses neither side. The jump is therefore Σ (x_end − x_start) over
 * the straight edges on the line, and with no such edge the two sides are the same number.
 *
 * Q/b uses the smaller non-zero one-sided width (see `qbWidth`): that is the governing side,
 * where the shear stress VQ/(Ib) is the larger, e.g. the web just below a flange (Gere & Goodno,
 * Mechanics of Materials, shear stresses in the webs of beams with flanges: the stress at the
 * junction is taken in the web, with b = web thickness).
 *
 * Cuts parallel to y ("right of x = at") work in the section turned +90° exactly,
 * (x, y) → (−y, x), as `cutSection` does; "above" then means "right of" and "below" "left of".
 */
import { arcPointAtAngle, lengthOf, transformContour, type Contour, type Region } from '../geometry/contour';

export interface OneSidedWidths {
  /** b(at + 0): the width just above the cut (just right of it for axis 'x'). */
  above: number;
  /** b(at − 0): the width just below the cut (just left of it for axis 'x'). */
  below: number;
  /** True when a straight edge of the boundary lies on the cut line, so the width may jump there. */
  onEdge: boolean;
}

/** The exact quarter-turn (x, y) → (−y, x): a vertical cut becomes a horizontal one, no round-off. */
function turnQuarter(region: Region): Region {
  return region.map((c) => transformContour(c, 0, -1, 1, 0, 0, 0));
}

interface Sums {
  above: number;
  below: number;
  onEdge: boolean;
}

/**
 * Adds the crossing of one y-monotone piece from (x0, y0) to (x1, y1) to the sums. `xAt` gives the
 * piece's x at y = c when c lies strictly between the ends.
 */
function addPiece(x0: number, y0: number, x1: number, y1: number, c: number, xAt: () => number, ref: number, s: Sums): void {
  if (y0 === y1) return;
  const dir = y1 > y0 ? 1 : -1;
  const lo = Math.min(y0, y1), hi = Math.max(y0, y1);
  if (c < lo || c > hi) return;
  const x = (c === y0 ? x0 : c === y1 ? x1 : xAt()) - ref;
  if (c < hi) s.above += dir * x;
  if (c > lo) s.below += dir * x;
}

/** Straight segment a → b. */
function addLine(ax: number, ay: number, bx: number, by: number, c: number, ref: number, s: Sums): void {
  if (ay === by) {
    if (ay === c && ax !== bx) s.onEdge = true;
    return;
  }
  addPiece(ax, ay, bx, by, c, () => ax + ((c - ay) * (bx - ax)) / (by - ay), ref, s);
}

/**
 * Arc a → b of signed sweep phi, in its chord frame (as `arcPointAtAngle`): the point at angle θ
 * from the arc's midpoint, θ from −α (at a) to α (at b). Split at the highest and lowest points,
 * then each monotone piece is solved for y = c: with e the chord direction and u the unit normal
 * towards the bulge, y(θ) = M_y + u_y h (cosθ − cosα)/sinα + e_y h sinθ/sinα, i.e.
 * cos(θ − ψ) = K with ψ = atan2(e_y, u_y) and K = (c − M_y) sinα/h + u_y cosα (u_y² + e_y² = 1).
 */
function addArc(ax: number, ay: number, bx: number, by: number, phi: number, c: number, ref: number, s: Sums): void {
  const L = lengthOf(bx - ax, by - ay);
  if (!(L > 0)) return;
  const h = L / 2, alpha = Math.abs(phi) / 2;
  const sa = Math.sin(alpha), ca = Math.cos(alpha);
  const ex = (bx - ax) / L, ey = (by - ay) / L;
  const sg = phi > 0 ? 1 : -1;
  const uy = -sg * ex;
  const my = (ay + by) / 2;
  // Angles of the highest (normal along +y) and lowest (−y) points, where inside the sweep.
  const cuts: number[] = [];
  for (const d of [1, -1]) {
    const th = Math.atan2(d * ey, d * uy);
    if (Math.abs(th) < alpha) cuts.push(th);
  }
  cuts.sort((p, q) => p - q);
  const ts = [-alpha, ...cuts, alpha];
  const point = (k: number): [number, number] => (k === 0 ? [ax, ay] : k === ts.length - 1 ? [bx, by] : arcPointAtAngle(ax, ay, bx, by, phi, ts[k]));
  const psi = Math.atan2(ey, uy);
  const K = Math.max(-1, Math.min(1, ((c - my) * sa) / h + uy * ca));
  const roots = [psi + Math.acos(K), psi - Math.acos(K)];
  // Extremes found by angle are a few ulps off; one within this of the line counts as on it, so a
  // tangent arc's two crossings meet at the same x and cancel exactly.
  const snap = 8 * Number.EPSILON * (Math.abs(c) + L);
  let [px, py] = point(0);
  for (let k = 1; k < ts.length; k++) {
    const [qx, q] = point(k);
    const qy = k < ts.length - 1 && Math.abs(q - c) <= snap ? c : q;
    const t0 = ts[k - 1], t1 = ts[k];
    const xAt = () => {
      // The root inside [t0, t1] (angles taken modulo 2π to the nearest representative).
      let best = (t0 + t1) / 2, gap = Infinity;
      for (const r of roots) {
        const t = r + 2 * Math.PI * Math.round(((t0 + t1) / 2 - r) / (2 * Math.PI));
        const g = Math.max(t0 - t, t - t1, 0);
        if (g < gap) {
          gap = g;
          best = Math.min(t1, Math.max(t0, t));
        }
      }
      return arcPointAtAngle(ax, ay, bx, by, phi, best)[0];
    };
    addPiece(px, py, qx, qy, c, xAt, ref, s);
    px = qx;
    py = qy;
  }
}

function contourSums(c: Contour, at: number, ref: number, s: Sums): void {
  const n = c.xy.length >> 1;
  if (n < 2) return;
  for (let i = 0; i < n; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    const ax = c.xy[2 * i], ay = c.xy[2 * i + 1], bx = c.xy[2 * j], by = c.xy[2 * j + 1];
    const b = c.bulge ? c.bulge[i] : 0;
    if (b === 0) addLine(ax, ay, bx, by, at, ref, s);
    else addArc(ax, ay, bx, by, 4 * Math.atan(b), at, ref, s);
  }
}

/**
 * The widths just above and just below the cut line y = at (axis 'y'), or just right and just
 * left of x = at (axis 'x'), exactly. Away from an edge lying on the line both are b(at).
 */
export function oneSidedWidths(region: Region, axis: 'x' | 'y', at: number): OneSidedWidths {
  const r = axis === 'y' ? region : turnQuarter(region);
  // Crossing x are taken relative to one vertex: each loop crosses up as often as down, so the
  // reference cancels, and a section far from the origin keeps its digits.
  const ref = r.length > 0 && r[0].xy.length > 0 ? r[0].xy[0] : 0;
  const s: Sums = { above: 0, below: 0, onEdge: false };
  if (Number.isFinite(at)) for (const c of r) contourSums(c, at, ref, s);
  // Without an edge on the line the two limits are the same crossings: one number, no round-off.
  const above = Math.max(0, s.above);
  return { above, below: s.onEdge ? Math.max(0, s.below) : above, onEdge: s.onEdge };
}

export type QbSide = 'above' | 'below' | 'both';

/**
 * The width Q/b uses at a cut with one-sided widths `above` and `below`: the smaller non-zero
 * one (the governing side, where VQ/(Ib) is the larger); `side` says which, 'both' when they are
 * equal. 0 when both are 0 (the line runs through a gap: Q/b is undefined there).
 */
export function qbWidth(above: number, below: number): { width: number; side: QbSide } {
  if (above === below) return { width: above, side: 'both' };
  if (above > 0 && (below === 0 || above < below)) return { width: above, side: 'above' };
  return { width: below, side: 'below' };
}
