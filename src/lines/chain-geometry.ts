/**
 * A chain's segments as the editor uses them: exact line and arc segments (for snap points and
 * crossings), and points along it for drawing and hit-testing only (never for the numbers).
 */
import { arcFromChord, arcPointAtAngle } from '../geometry/contour';
import type { Segment } from '../geometry/segments';
import { chainSegment, segmentCount, type LineChain } from './chain';

/** The chain's segments, in order, arcs with centre, radius, start angle and signed sweep. */
export function chainSegments(c: LineChain): Segment[] {
  const out: Segment[] = [];
  for (let i = 0; i < segmentCount(c); i++) {
    const { ax, ay, bx, by, sweep } = chainSegment(c, i);
    if (sweep === 0) out.push({ kind: 'line', ax, ay, bx, by });
    else {
      const { cx, cy, r } = arcFromChord(ax, ay, bx, by, sweep);
      out.push({ kind: 'arc', ax, ay, bx, by, cx, cy, r, t0: Math.atan2(ay - cy, ax - cx), sweep });
    }
  }
  return out;
}

/** Points along the chain (open: from its first vertex to its last), arcs within `tol` of the arc. */
export function chainPolyline(c: LineChain, tol: number): number[] {
  const out: number[] = [];
  const n = segmentCount(c);
  for (let i = 0; i < n; i++) {
    const { ax, ay, bx, by, sweep } = chainSegment(c, i);
    out.push(ax, ay);
    if (sweep !== 0) {
      const alpha = Math.abs(sweep) / 2;
      const r = Math.hypot(bx - ax, by - ay) / (2 * Math.sin(alpha));
      const maxStep = tol >= r ? Math.PI / 2 : 2 * Math.acos(1 - tol / r);
      const k = Math.min(4096, Math.max(1, Math.ceil(Math.abs(sweep) / Math.max(maxStep, 1e-3))));
      for (let s = 1; s < k; s++) out.push(...arcPointAtAngle(ax, ay, bx, by, sweep, -alpha + (2 * alpha * s) / k));
    }
    if (i === n - 1) out.push(bx, by);
  }
  return out;
}
