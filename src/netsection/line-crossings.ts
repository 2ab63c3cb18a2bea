/**
 * Where a straight segment P→Q meets the boundary of a region, exactly: line–line and
 * line–circle intersections (the boolean module's `curveIntersections`, with its tangency
 * tolerance, so a grazing line gives one touching point and never NaN), kept when they lie on
 * both pieces, and the ends of boundary lines that P→Q runs along. The result is a sorted list of
 * parameters t ∈ [0, 1] along P→Q (distance = t·|PQ|), each with the loops it came from; points
 * closer than the tolerance are merged.
 *
 * The pieces between breakpoints are then classed inside or outside the material by the exact
 * winding number at their middle (`classifyPieces`), which needs no rule for tangencies,
 * vertices or overlaps: whatever happens at a breakpoint, each open piece between two of them is
 * wholly inside or wholly outside.
 */
import { CarrierStore, curveIntersections, distToCurve, makeLine, paramOf, type Carrier } from '../boolean/carriers';
import { distanceToBoundary, windingAt, type BoundarySegment } from './boundary';

export interface Breakpoint {
  t: number;
  x: number;
  y: number;
  /** Loop indices (contour indices) whose boundary passes here. */
  loops: number[];
}

export interface Piece {
  t0: number;
  t1: number;
  inside: boolean;
  /** True when the piece runs along the boundary (on an edge) rather than across material or space. */
  onEdge: boolean;
}

/** True when (x, y), known to lie on the full curve of c, lies on its finite range (within tol). */
function onPiece(c: Carrier, x: number, y: number, tol: number): boolean {
  const u = paramOf(c, x, y);
  const slack = c.len > 0 ? tol / c.len : 0;
  return u >= -slack && u <= 1 + slack;
}

/**
 * Breakpoints of P→Q against the boundary. `tol` is the length under which points merge
 * (and the tangency tolerance of the intersections).
 */
export function lineBreakpoints(segs: readonly BoundarySegment[], px: number, py: number, qx: number, qy: number, tol: number): Breakpoint[] {
  const line = makeLine(new CarrierStore(1), 0, 1, px, py, qx, qy);
  const L = line.len;
  const raw: Breakpoint[] = [];
  const slack = tol / L;
  const push = (x: number, y: number, loop: number) => {
    const t = paramOf(line, x, y);
    if (t < -slack || t > 1 + slack) return;
    const tc = Math.min(1, Math.max(0, t));
    raw.push({ t: tc, x: px + tc * (qx - px), y: py + tc * (qy - py), loops: [loop] });
  };
  for (const s of segs) {
    const c = s.carrier;
    if (c.xmax < Math.min(px, qx) - tol || c.xmin > Math.max(px, qx) + tol || c.ymax < Math.min(py, qy) - tol || c.ymin > Math.max(py, qy) + tol) continue;
    if (c.kind === 0 && distToCurve(line, c.ax, c.ay) <= tol && distToCurve(line, c.bx, c.by) <= tol) {
      // Runs along P→Q: its ends are breakpoints; the pieces between are found on the edge.
      push(c.ax, c.ay, s.loop);
      push(c.bx, c.by, s.loop);
      continue;
    }
    const pts = curveIntersections(line, c, tol);
    for (let k = 0; k < pts.length; k += 2) {
      if (onPiece(c, pts[k], pts[k + 1], tol)) push(pts[k], pts[k + 1], s.loop);
    }
  }
  raw.sort((a, b) => a.t - b.t);
  const out: Breakpoint[] = [];
  for (const b of raw) {
    const last = out[out.length - 1];
    if (last && (b.t - last.t) * L <= tol) {
      for (const l of b.loops) if (!last.loops.includes(l)) last.loops.push(l);
    } else out.push({ ...b, loops: [...b.loops] });
  }
  return out;
}

/**
 * The pieces of P→Q between consecutive breakpoints (and the ends), each inside or outside the
 * material. A piece whose middle lies on the boundary runs along an edge: it counts as material
 * when material lies on either side of it (the edge belongs to the closed section).
 */
export function classifyPieces(
  segs: readonly BoundarySegment[], breaks: readonly Breakpoint[], px: number, py: number, qx: number, qy: number, tol: number, extent: number,
): Piece[] {
  const ts = [0, ...breaks.map((b) => b.t), 1];
  const L = Math.hypot(qx - px, qy - py);
  const nx = -(qy - py) / L, ny = (qx - px) / L;
  const probe = Math.max(1e-6 * extent, 100 * tol);
  const pieces: Piece[] = [];
  for (let k = 0; k + 1 < ts.length; k++) {
    const t0 = ts[k], t1 = ts[k + 1];
    if ((t1 - t0) * L <= tol) continue;
    const tm = (t0 + t1) / 2;
    const mx = px + tm * (qx - px), my = py + tm * (qy - py);
    let inside: boolean;
    let onEdge = false;
    if (distanceToBoundary(segs, mx, my) <= tol) {
      onEdge = true;
      inside = windingAt(segs, mx + probe * nx, my + probe * ny) !== 0 || windingAt(segs, mx - probe * nx, my - probe * ny) !== 0;
    } else inside = windingAt(segs, mx, my) !== 0;
    const last = pieces[pieces.length - 1];
    // Pieces shorter than the tolerance were skipped: the neighbours close over them.
    if (last && last.inside === inside && last.onEdge === onEdge) last.t1 = t1;
    else pieces.push({ t0: last ? last.t1 : t0, t1, inside, onEdge });
  }
  return pieces;
}
