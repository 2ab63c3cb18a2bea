/**
 * Corners that can be rounded: a kind that has them lists them (`ShapeKind.corners`), numbered as
 * the exact fillet numbers them (src/geometry/fillet.ts): vertex 0 is the first point (a path's
 * start), vertex k the end of segment k − 1. A closed outline has a corner at every vertex; an
 * open chain only where two segments meet. Rounding replaces the corner by the tangent arc of
 * the radius given, exactly, or says why it cannot.
 */
import { filletCorner, type FilletResult } from '../geometry/fillet';
import type { Point } from './base';

/** A segment of a chain: a line to `to`, or an arc through `via` to `to` (as a path's). */
interface Segment {
  to: Point;
  via?: Point;
}

export interface Corner {
  /** Vertex index as the fillet takes it. */
  index: number;
  /** How the side panel names the point. */
  label: string;
  p: Point;
}

/** What rounding a corner gives: the new start and segments, or the reason it cannot be done. */
export type RoundedChain = { ok: true; start: Point; segments: Segment[] } | { ok: false; message: string };

/** The corners of a chain: every vertex when it closes on its start, else where two segments meet. */
export function chainCorners(start: Point, segments: readonly Segment[], closed: boolean): Corner[] {
  const out: Corner[] = [];
  if (closed) out.push({ index: 0, label: 'Start', p: start });
  // A closed chain's last segment ends on its start, which is corner 0; an open chain's last point is an end.
  for (let k = 1; k < segments.length; k++) out.push({ index: k, label: `End of ${segments[k - 1].via ? 'arc' : 'line'} ${k}`, p: segments[k - 1].to });
  return out;
}

/** The result of the exact fillet as a chain, or its reason. */
export function roundedChain(r: FilletResult): RoundedChain {
  return r.ok ? { ok: true, start: r.path.start, segments: r.path.segments } : { ok: false, message: r.message };
}

/** Round corner k of a chain (closed: the last point is made exactly the start first). */
export function roundChainCorner(start: Point, segments: readonly Segment[], closed: boolean, k: number, radius: number): RoundedChain {
  if (!chainCorners(start, segments, closed).some((c) => c.index === k)) return { ok: false, message: `there is no corner ${k + 1} to round` };
  let segs = segments.slice();
  const last = segs[segs.length - 1];
  if (closed && last && (last.to[0] !== start[0] || last.to[1] !== start[1])) segs = [...segs.slice(0, -1), { ...last, to: [start[0], start[1]] }];
  return roundedChain(filletCorner({ start, segments: segs }, k, radius));
}

/** The corner rules of a kind drawn as a chain from `start` (a path closes on its start). */
export function chainCornerRules<S extends { start: Point; segments: readonly Segment[] }>(closed: boolean) {
  return {
    list: (s: S) => chainCorners(s.start, s.segments, closed),
    round: (s: S, index: number, radius: number): S | string => {
      const r = roundChainCorner(s.start, s.segments, closed, index, radius);
      return r.ok ? { ...s, start: r.start, segments: r.segments } : r.message;
    },
  };
}
