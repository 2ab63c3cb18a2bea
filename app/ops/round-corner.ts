/**
 * Round one corner of a polygon, path, line element or strip with a typed radius: the engine's
 * exact fillet (src/geometry/fillet.ts) replaces the corner by the tangent arc, as one undo step.
 * A polygon becomes a path (its outline now has an arc); the shape keeps its id, name, operation
 * and material. A radius that does not fit is refused with the engine's reason, and nothing
 * changes.
 */
import { filletCorner, filletPolygonCorner, formatIssue, validateShape, type FilletResult, type PathSegment, type Point, type Shape } from '../../src';
import type { CommandContext } from '../commands/registry';
import { hasCorners, shapeCorners } from '../shapes/corners';
import { commit } from '../store/history';
import { activeShapes, withActiveShapes } from '../store/section';

export interface RoundCornerArg {
  /** The shape (default: the one selected shape). */
  id?: string;
  /** Vertex index as the fillet numbers it (0: the first point or a path's start). */
  corner: number;
  radius: number;
}

/** A closed path whose last point is within round-off of its start ends exactly on it. */
function closedExactly(start: Point, segments: readonly PathSegment[]): PathSegment[] {
  const last = segments[segments.length - 1];
  if (!last || (last.to[0] === start[0] && last.to[1] === start[1])) return segments.slice();
  return [...segments.slice(0, -1), { ...last, to: [start[0], start[1]] }];
}

function filleted(s: Shape, corner: number, radius: number): FilletResult | string {
  if (s.type === 'polygon') return filletPolygonCorner(s.points, corner, radius);
  if (s.type === 'path') return filletCorner({ start: s.start, segments: closedExactly(s.start, s.segments) }, corner, radius);
  if (s.type === 'line' || s.type === 'strip') return filletCorner({ start: s.start, segments: s.segments }, corner, radius);
  return 'Only a polygon, a path, a line element or a strip has corners to round; a profile sets its radii in its own fields.';
}

/** The shape with the corner rounded, or why not. */
export function roundedShape(s: Shape, corner: number, radius: number): Shape | string {
  if (!hasCorners(s)) return filleted(s, corner, radius) as string;
  if (!shapeCorners(s).some((c) => c.index === corner)) return `There is no corner ${corner + 1} to round on this shape.`;
  const r = filleted(s, corner, radius);
  if (typeof r === 'string') return r;
  if (!r.ok) return r.message;
  const { start, segments } = r.path;
  // Everything but the outline stays: id, name, operation, material, a line's group, a strip's thickness.
  if (s.type === 'polygon') {
    const { points: _points, ...rest } = s;
    void _points;
    return { ...rest, type: 'path', start, segments } as Shape;
  }
  return { ...s, start, segments } as Shape;
}

/** Round a corner as one undo step; returns the refusal or null. */
export function roundCorner(ctx: CommandContext, arg: unknown): string | null {
  const a = (arg ?? {}) as Partial<RoundCornerArg>;
  const st = ctx.store.getState();
  const id = a.id ?? (st.selected.length === 1 ? st.selected[0] : undefined);
  if (id === undefined) return 'Select one polygon or path, then pick the corner to round.';
  const shapes = activeShapes(st.doc);
  const k = shapes.findIndex((s) => s.id === id);
  if (k < 0) return 'The shape no longer exists.';
  if (typeof a.corner !== 'number' || typeof a.radius !== 'number') return 'Give the corner and the radius.';
  const next = roundedShape(shapes[k], a.corner, a.radius);
  if (typeof next === 'string') return next;
  const issues = validateShape(next, `shapes[${k}]`);
  if (issues.length) return `Not rounded: ${issues.map(formatIssue).join('; ')}`;
  commit(ctx.store, withActiveShapes(st.doc, shapes.map((s, i) => (i === k ? next : s))), [id]);
  return null;
}
