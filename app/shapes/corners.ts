/**
 * The corners of the shapes that can be rounded (polygon, path, and the open chains of line
 * elements and strips), numbered as the engine's fillet numbers them: vertex 0 is the first point
 * (a path's start), vertex k the end of segment k − 1. A closed outline has a corner at every
 * vertex; an open chain only where two segments meet. Labels follow the side panel's point list.
 */
import type { Point, Shape } from '../../src';
import type { HandleRef } from './kind';

export interface Corner {
  /** Vertex index as the engine's fillet takes it. */
  index: number;
  label: string;
  p: Point;
}

const CHAIN_TYPES = new Set(['path', 'line', 'strip']);

/** True for the kinds whose corners can be rounded. */
export function hasCorners(s: Shape): boolean {
  return s.type === 'polygon' || CHAIN_TYPES.has(s.type);
}

/** Whether a chain's last point is its start (a closed outline). */
export function isClosedShape(s: Shape): boolean {
  return s.type === 'polygon' || s.type === 'path';
}

/** Every corner of the shape that the fillet can round, in order. */
export function shapeCorners(s: Shape): Corner[] {
  if (s.type === 'polygon') return s.points.map((p, index) => ({ index, label: `Vertex ${index + 1}`, p }));
  if (s.type !== 'path' && s.type !== 'line' && s.type !== 'strip') return [];
  const segs = s.segments;
  const out: Corner[] = [];
  const closed = s.type === 'path';
  if (closed) out.push({ index: 0, label: 'Start', p: s.start });
  // A path's last segment ends on its start, which is corner 0; an open chain's last point is an end.
  for (let k = 1; k < segs.length; k++) out.push({ index: k, label: `End of ${segs[k - 1].via ? 'arc' : 'line'} ${k}`, p: segs[k - 1].to });
  return out;
}

/** The corner a vertex handle stands on, or null (arc middles, centres, placements). */
export function cornerOfHandle(s: Shape, ref: HandleRef): number | null {
  let index: number | null = null;
  if (ref.kind === 'vertex') index = ref.index;
  else if (ref.kind === 'start') index = 0;
  else if (ref.kind === 'to') index = ref.index + 1;
  if (index === null) return null;
  return shapeCorners(s).some((c) => c.index === index) ? index : null;
}
