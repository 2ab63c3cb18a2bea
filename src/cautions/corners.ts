/**
 * Inside corners of a section's boundary, exactly: sharp re-entrant vertices and radiused inside
 * corners (concave arcs) with their radii.
 *
 * Material lies to the left of every loop (outer loops CCW, holes CW), so the boundary turns
 * right at an inside corner: the turn from the incoming tangent to the outgoing one is negative
 * and the material angle there is 180° − turn > 180°. Tangents come from the exact segments (an
 * arc's end tangent is its chord turned by half its sweep), so a fillet that meets its lines
 * tangentially gives no corner at all. A concave arc (negative sweep) that is not a whole round
 * hole and that meets a neighbour tangentially is a radiused inside corner, reported with its
 * radius; consecutive arcs of one circle count as one corner.
 *
 * Turns smaller than `minTurnDeg` (default 10°) are not corners: a polygon that stands in for a
 * curve turns a few degrees at each vertex (a screening threshold, common practice, no source).
 */
import type { Carrier } from '../boolean/carriers';
import type { BoundaryLoop, Boundary } from '../netsection/boundary';

export interface SharpCorner {
  x: number;
  y: number;
  /** Turn of the boundary at the vertex, degrees (negative: an inside corner). */
  turn: number;
  /** Angle of material at the vertex, degrees (over 180 for an inside corner). */
  materialAngle: number;
  loop: number;
  index: number;
}

export interface RadiusedCorner {
  /** Middle of the arc, for the marker. */
  x: number;
  y: number;
  radius: number;
  centre: { x: number; y: number };
  /** Sweep of the arc, degrees (positive). */
  sweep: number;
  loop: number;
}

export const DEFAULT_MIN_CORNER_TURN = 10;

/** Unit tangent at the start (end = false) or end of a piece. */
function tangent(c: Carrier, end: boolean): [number, number] {
  const dx = c.bx - c.ax, dy = c.by - c.ay;
  const L = Math.hypot(dx, dy);
  const ux = dx / L, uy = dy / L;
  if (c.kind === 0) return [ux, uy];
  const a = end ? c.phi / 2 : -c.phi / 2;
  const cs = Math.cos(a), sn = Math.sin(a);
  return [ux * cs - uy * sn, ux * sn + uy * cs];
}

/** Turn in degrees from direction u to direction v (CCW positive, in (−180, 180]). */
function turnBetween(u: [number, number], v: [number, number]): number {
  return (Math.atan2(u[0] * v[1] - u[1] * v[0], u[0] * v[0] + u[1] * v[1]) * 180) / Math.PI;
}

/** Sharp inside corners of one loop. */
function loopSharpCorners(loop: BoundaryLoop, minTurn: number): SharpCorner[] {
  const segs = loop.segments;
  const out: SharpCorner[] = [];
  for (let k = 0; k < segs.length; k++) {
    const prev = segs[(k + segs.length - 1) % segs.length].carrier, next = segs[k].carrier;
    const turn = turnBetween(tangent(prev, true), tangent(next, false));
    if (turn <= -minTurn) out.push({ x: next.ax, y: next.ay, turn, materialAngle: 180 - turn, loop: loop.index, index: segs[k].index });
  }
  return out;
}

/**
 * Radiused inside corners of one loop: concave arcs (consecutive arcs of one circle merged) that
 * join at least one neighbour tangentially, so that they round off a corner. A concave arc with a
 * corner at both ends (where a round opening cuts through a web) rounds nothing off and is left out.
 */
function loopRadiusedCorners(loop: BoundaryLoop, tol: number, minTurn: number): RadiusedCorner[] {
  if (loop.circle) return [];
  const segs = loop.segments;
  const n = segs.length;
  const car = (k: number) => segs[((k % n) + n) % n].carrier;
  const concave = (k: number) => car(k).kind === 1 && car(k).phi < 0;
  const sameCircle = (a: Carrier, b: Carrier) => Math.abs(a.r - b.r) <= tol && Math.hypot(a.cx - b.cx, a.cy - b.cy) <= tol;
  const continues = (k: number) => concave(k) && concave(k - 1) && sameCircle(car(k), car(k - 1));
  // Start at a piece that does not continue the circle of the one before it.
  let start = 0;
  while (start < n && continues(start)) start++;
  if (start === n) return [];
  const out: RadiusedCorner[] = [];
  for (let m = 0; m < n; m++) {
    const first = start + m;
    if (!concave(first)) continue;
    while (m + 1 < n && continues(start + m + 1)) m++;
    const last = start + m;
    const smoothIn = Math.abs(turnBetween(tangent(car(first - 1), true), tangent(car(first), false))) < minTurn;
    const smoothOut = Math.abs(turnBetween(tangent(car(last), true), tangent(car(last + 1), false))) < minTurn;
    if (!smoothIn && !smoothOut) continue;
    const c = car(first);
    let sweep = 0;
    for (let k = first; k <= last; k++) sweep += car(k).phi;
    const tm = c.t0 + sweep / 2;
    out.push({ x: c.cx + c.r * Math.cos(tm), y: c.cy + c.r * Math.sin(tm), radius: c.r, centre: { x: c.cx, y: c.cy }, sweep: (Math.abs(sweep) * 180) / Math.PI, loop: loop.index });
  }
  return out;
}

/** Every sharp inside corner and every radiused inside corner of a section. */
export function insideCorners(boundary: Boundary, minTurnDeg = DEFAULT_MIN_CORNER_TURN): { sharp: SharpCorner[]; radiused: RadiusedCorner[] } {
  const sharp: SharpCorner[] = [];
  const radiused: RadiusedCorner[] = [];
  for (const loop of boundary.loops) {
    sharp.push(...loopSharpCorners(loop, minTurnDeg));
    radiused.push(...loopRadiusedCorners(loop, boundary.tol, minTurnDeg));
  }
  return { sharp, radiused };
}

/** Corners of `now` that `before` does not have (same vertex, or same circle and radius). */
export function newCorners(
  now: { sharp: SharpCorner[]; radiused: RadiusedCorner[] }, before: { sharp: SharpCorner[]; radiused: RadiusedCorner[] }, tol: number,
): { sharp: SharpCorner[]; radiused: RadiusedCorner[] } {
  return {
    sharp: now.sharp.filter((c) => !before.sharp.some((b) => Math.hypot(b.x - c.x, b.y - c.y) <= tol)),
    radiused: now.radiused.filter(
      (c) => !before.radiused.some((b) => Math.abs(b.radius - c.radius) <= tol && Math.hypot(b.centre.x - c.centre.x, b.centre.y - c.centre.y) <= tol),
    ),
  };
}
