/**
 * Topology check of a strip's outline: does any piece cross or touch a piece it should keep
 * clear of? The pieces are the exact lines and arcs of the outline, tagged with the centreline
 * segment they come from, so the message can say where the centreline doubles back or comes
 * closer to itself than the wall thickness.
 *
 * Neighbouring pieces (consecutive in a loop, or either side of a round corner) are skipped: the
 * joint construction in strip-outline.ts has already checked how they meet. Every other pair is
 * tested with exact line–line, line–circle and circle–circle intersections within a tolerance,
 * behind a bounding-box test. Written by hand because the boolean module reports that an outline
 * touches itself but not which pieces do; the check is quadratic in the number of pieces, which is
 * small for a drawn centreline.
 */
import { arcFromChord } from '../geometry/contour';

export interface OutlinePiece {
  sx: number;
  sy: number;
  ex: number;
  ey: number;
  /** Signed sweep; 0 for a line. */
  sweep: number;
  kind: 'face' | 'corner' | 'end';
  /** The centreline segment the piece belongs to (for a corner, the segment after the joint). */
  segment: number;
}

type Geo =
  | { line: true; ax: number; ay: number; bx: number; by: number; box: Box }
  | { line: false; cx: number; cy: number; r: number; a0: number; sweep: number; box: Box };
interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

/** The first pair of pieces that cross or touch, or null when the outline is clean. */
export function findContact(loops: readonly (readonly OutlinePiece[])[], tol: number): [OutlinePiece, OutlinePiece] | null {
  const all: { p: OutlinePiece; g: Geo; loop: number; at: number }[] = [];
  loops.forEach((loop, li) => loop.forEach((p, k) => all.push({ p, g: geometry(p, tol), loop: li, at: k })));
  for (let i = 0; i < all.length; i++) {
    for (let j = i + 1; j < all.length; j++) {
      const a = all[i], b = all[j];
      if (a.loop === b.loop && neighbours(loops[a.loop], a.at, b.at)) continue;
      if (!boxesMeet(a.g.box, b.g.box, tol)) continue;
      if (meet(a.g, b.g, tol)) return [a.p, b.p];
    }
  }
  return null;
}

/** Consecutive in the loop, or separated only by a corner piece. */
function neighbours(loop: readonly OutlinePiece[], i: number, j: number): boolean {
  const n = loop.length;
  const d = (j - i + n) % n;
  if (d === 1 || d === n - 1) return true;
  if (d === 2) return loop[(i + 1) % n].kind === 'corner';
  if (d === n - 2) return loop[(j + 1) % n].kind === 'corner';
  return false;
}

function geometry(p: OutlinePiece, tol: number): Geo {
  const c = Math.hypot(p.ex - p.sx, p.ey - p.sy);
  const sag = (c / 2) * Math.abs(Math.tan(p.sweep / 4));
  if (p.sweep === 0 || (Math.abs(p.sweep) <= Math.PI && sag <= tol)) {
    const box = { x0: Math.min(p.sx, p.ex), y0: Math.min(p.sy, p.ey), x1: Math.max(p.sx, p.ex), y1: Math.max(p.sy, p.ey) };
    return { line: true, ax: p.sx, ay: p.sy, bx: p.ex, by: p.ey, box };
  }
  const { cx, cy, r } = arcFromChord(p.sx, p.sy, p.ex, p.ey, p.sweep);
  // Within the chord's box widened by the sagitta (up to 180°), else within the circle's box.
  const box =
    Math.abs(p.sweep) <= Math.PI
      ? { x0: Math.min(p.sx, p.ex) - sag, y0: Math.min(p.sy, p.ey) - sag, x1: Math.max(p.sx, p.ex) + sag, y1: Math.max(p.sy, p.ey) + sag }
      : { x0: cx - r, y0: cy - r, x1: cx + r, y1: cy + r };
  return { line: false, cx, cy, r, a0: Math.atan2(p.sy - cy, p.sx - cx), sweep: p.sweep, box };
}

function boxesMeet(a: Box, b: Box, tol: number): boolean {
  return !(b.x0 > a.x1 + tol || b.x1 < a.x0 - tol || b.y0 > a.y1 + tol || b.y1 < a.y0 - tol);
}

function meet(a: Geo, b: Geo, tol: number): boolean {
  if (a.line && b.line) return linesMeet(a, b, tol);
  if (a.line && !b.line) return lineMeetsArc(a, b, tol);
  if (!a.line && b.line) return lineMeetsArc(b, a, tol);
  if (!a.line && !b.line) return arcsMeet(a, b, tol);
  return false;
}

type LineGeo = Extract<Geo, { line: true }>;
type ArcGeo = Extract<Geo, { line: false }>;

function linesMeet(p: LineGeo, q: LineGeo, tol: number): boolean {
  const d1x = p.bx - p.ax, d1y = p.by - p.ay, d2x = q.bx - q.ax, d2y = q.by - q.ay;
  const l1 = Math.hypot(d1x, d1y), l2 = Math.hypot(d2x, d2y);
  if (!(l1 > 0) || !(l2 > 0)) return false;
  const wx = q.ax - p.ax, wy = q.ay - p.ay;
  const den = d1x * d2y - d1y * d2x;
  if (Math.abs(den) <= 1e-12 * l1 * l2) {
    // Parallel: they meet only when on one line with overlapping (or touching) spans.
    if (Math.abs(d1x * wy - d1y * wx) / l1 > tol) return false;
    const s0 = (wx * d1x + wy * d1y) / l1;
    const s1 = ((q.bx - p.ax) * d1x + (q.by - p.ay) * d1y) / l1;
    return Math.min(l1, Math.max(s0, s1)) - Math.max(0, Math.min(s0, s1)) >= -tol;
  }
  const s = (wx * d2y - wy * d2x) / den, u = (wx * d1y - wy * d1x) / den;
  return s >= -tol / l1 && s <= 1 + tol / l1 && u >= -tol / l2 && u <= 1 + tol / l2;
}

function onArc(a: ArcGeo, x: number, y: number, tol: number): boolean {
  const TWO_PI = 2 * Math.PI;
  const ang = Math.atan2(y - a.cy, x - a.cx);
  let d = a.sweep >= 0 ? ang - a.a0 : a.a0 - ang;
  d = ((d % TWO_PI) + TWO_PI) % TWO_PI;
  const ta = Math.max(tol / a.r, 1e-12);
  return d <= Math.abs(a.sweep) + ta || d >= TWO_PI - ta;
}

function lineMeetsArc(p: LineGeo, a: ArcGeo, tol: number): boolean {
  const dx = p.bx - p.ax, dy = p.by - p.ay;
  const l = Math.hypot(dx, dy);
  if (!(l > 0)) return false;
  const ux = dx / l, uy = dy / l;
  const t0 = (a.cx - p.ax) * ux + (a.cy - p.ay) * uy;
  const fx = p.ax + t0 * ux, fy = p.ay + t0 * uy;
  const h = Math.hypot(a.cx - fx, a.cy - fy);
  if (h > a.r + tol) return false;
  const half = Math.sqrt(Math.max(0, a.r * a.r - h * h));
  for (const s of [t0 - half, t0 + half]) {
    if (s < -tol || s > l + tol) continue;
    if (onArc(a, p.ax + s * ux, p.ay + s * uy, tol)) return true;
  }
  return false;
}

function arcsMeet(a: ArcGeo, b: ArcGeo, tol: number): boolean {
  const dx = b.cx - a.cx, dy = b.cy - a.cy;
  const D = Math.hypot(dx, dy);
  if (D <= tol && Math.abs(a.r - b.r) <= tol) {
    // One circle: the arcs meet when either holds an end of the other.
    const ends = (g: ArcGeo): [number, number][] => [
      [g.cx + g.r * Math.cos(g.a0), g.cy + g.r * Math.sin(g.a0)],
      [g.cx + g.r * Math.cos(g.a0 + g.sweep), g.cy + g.r * Math.sin(g.a0 + g.sweep)],
    ];
    return ends(b).some(([x, y]) => onArc(a, x, y, tol)) || ends(a).some(([x, y]) => onArc(b, x, y, tol));
  }
  if (D > a.r + b.r + tol || D < Math.abs(a.r - b.r) - tol || !(D > 0)) return false;
  const m = (D * D + a.r * a.r - b.r * b.r) / (2 * D);
  const hh = Math.sqrt(Math.max(0, a.r * a.r - m * m));
  const ux = dx / D, uy = dy / D;
  const px = a.cx + m * ux, py = a.cy + m * uy;
  for (const s of [-hh, hh]) {
    const x = px - s * uy, y = py + s * ux;
    if (onArc(a, x, y, tol) && onArc(b, x, y, tol)) return true;
  }
  return false;
}
