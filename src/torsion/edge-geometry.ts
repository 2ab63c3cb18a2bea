/**
 * Points, tangents and distances on one exact boundary edge: a straight line or a circular arc,
 * given by its end points a, b and its signed sweep (0 for a line), as in geometry/contour.ts.
 *
 * An arc is parametrised by the angle θ ∈ [−α, α] seen from its centre and measured from the
 * arc's midpoint (α = |sweep|/2), through arcPointAtAngle, which needs no centre and so stays exact
 * for arcs of any flatness. The edge parameter t ∈ [0, 1] maps to θ = α(2t − 1), which is uniform
 * in arc length; on a line t is the plain fraction of the way from a to b.
 */
import { arcPointAtAngle } from '../geometry/contour';

/** Below this half-angle an arc is treated as its chord for distances (its sagitta is < 1e-6·L). */
const FLAT_HALF_ANGLE = 1e-6;

export interface EdgeShape {
  ax: number;
  ay: number;
  bx: number;
  by: number;
  sweep: number;
}

/** The point at parameter t ∈ [0, 1]. */
export function edgePoint(g: EdgeShape, t: number): [number, number] {
  if (g.sweep === 0) return [g.ax + (g.bx - g.ax) * t, g.ay + (g.by - g.ay) * t];
  const alpha = Math.abs(g.sweep) / 2;
  return arcPointAtAngle(g.ax, g.ay, g.bx, g.by, g.sweep, alpha * (2 * t - 1));
}

/** Length of the edge (arc length for an arc). */
export function edgeLength(g: EdgeShape): number {
  const L = Math.sqrt((g.bx - g.ax) ** 2 + (g.by - g.ay) ** 2);
  const alpha = Math.abs(g.sweep) / 2;
  return alpha < 1e-6 ? L * (1 + (alpha * alpha) / 6) : (L * alpha) / Math.sin(alpha);
}

/** Radius of an arc edge (Infinity for a line or a flat arc). */
export function edgeRadius(g: EdgeShape): number {
  const alpha = Math.abs(g.sweep) / 2;
  if (alpha < FLAT_HALF_ANGLE) return Infinity;
  return Math.sqrt((g.bx - g.ax) ** 2 + (g.by - g.ay) ** 2) / (2 * Math.sin(alpha));
}

/** Chord frame: unit chord direction e, unit normal u towards the bulge, half chord h. */
function chordFrame(g: EdgeShape) {
  const L = Math.sqrt((g.bx - g.ax) ** 2 + (g.by - g.ay) ** 2);
  const ex = (g.bx - g.ax) / L, ey = (g.by - g.ay) / L;
  const s = g.sweep > 0 ? 1 : -1;
  return { ex, ey, ux: s * ey, uy: -s * ex, h: L / 2 };
}

/**
 * Unit tangent at an end, pointing away from that end into the edge: at a it points along the
 * direction of travel, at b against it. (Used to measure the angle two edges make at a vertex.)
 */
export function edgeTangentFrom(g: EdgeShape, atEnd: 'a' | 'b'): [number, number] {
  if (g.sweep === 0) {
    const L = Math.sqrt((g.bx - g.ax) ** 2 + (g.by - g.ay) ** 2);
    const dx = (g.bx - g.ax) / L, dy = (g.by - g.ay) / L;
    return atEnd === 'a' ? [dx, dy] : [-dx, -dy];
  }
  const { ex, ey, ux, uy } = chordFrame(g);
  const alpha = Math.abs(g.sweep) / 2;
  const s = Math.sin(alpha), c = Math.cos(alpha);
  // dP/dθ ∝ −u sinθ + e cosθ, at θ = −α (end a) and θ = +α (end b, then reversed).
  return atEnd === 'a' ? [ux * s + ex * c, uy * s + ey * c] : [ux * s - ex * c, uy * s - ey * c];
}

/** Distance from p to the edge. */
export function distanceToEdge(g: EdgeShape, px: number, py: number): number {
  const alpha = Math.abs(g.sweep) / 2;
  if (alpha < FLAT_HALF_ANGLE) return distanceToSegment(g.ax, g.ay, g.bx, g.by, px, py);
  const { ex, ey, ux, uy, h } = chordFrame(g);
  const r = h / Math.sin(alpha);
  const d = r * Math.cos(alpha);
  const cx = (g.ax + g.bx) / 2 - ux * d, cy = (g.ay + g.by) / 2 - uy * d;
  const qx = px - cx, qy = py - cy;
  const theta = Math.atan2(qx * ex + qy * ey, qx * ux + qy * uy);
  if (Math.abs(theta) <= alpha) return Math.abs(Math.sqrt(qx * qx + qy * qy) - r);
  return Math.min(Math.sqrt((px - g.ax) ** 2 + (py - g.ay) ** 2), Math.sqrt((px - g.bx) ** 2 + (py - g.by) ** 2));
}

/** Parameter t of the point of the edge nearest to p (p is expected to lie on or near the edge). */
export function edgeParameter(g: EdgeShape, px: number, py: number): number {
  const alpha = Math.abs(g.sweep) / 2;
  if (alpha < FLAT_HALF_ANGLE) {
    const dx = g.bx - g.ax, dy = g.by - g.ay;
    return ((px - g.ax) * dx + (py - g.ay) * dy) / (dx * dx + dy * dy);
  }
  const { ex, ey, ux, uy, h } = chordFrame(g);
  const r = h / Math.sin(alpha);
  const d = r * Math.cos(alpha);
  const qx = px - ((g.ax + g.bx) / 2 - ux * d), qy = py - ((g.ay + g.by) / 2 - uy * d);
  const theta = Math.atan2(qx * ex + qy * ey, qx * ux + qy * uy);
  return (theta / alpha + 1) / 2;
}

function distanceToSegment(ax: number, ay: number, bx: number, by: number, px: number, py: number): number {
  const dx = bx - ax, dy = by - ay;
  const L2 = dx * dx + dy * dy;
  let t = L2 > 0 ? ((px - ax) * dx + (py - ay) * dy) / L2 : 0;
  t = t < 0 ? 0 : t > 1 ? 1 : t;
  return Math.sqrt((ax + dx * t - px) ** 2 + (ay + dy * t - py) ** 2);
}
