/**
 * Round one corner of a polygon, path, line element or strip with a typed radius: the engine's
 * exact fillet (src/geometry/fillet.ts) replaces the corner by the tangent arc, as one undo step.
 * A polygon becomes a path (its outline now has an arc); the shape keeps its id, name, operation
 * and material. A radius that does not fit is refused with the engine's reason, and nothing
 * changes.
 */
import { formatIssue, roundShapeCorner, shapeCorners, validateShape, type Shape } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { activeShapes, withActiveShapes } from '../store/section';

export interface RoundCornerArg {
  /** The shape (default: the one selected shape). */
  id?: string;
  /** Vertex index as the fillet numbers it (0: the first point or a path's start). */
  corner: number;
  radius: number;
}

/** The shape with the corner rounded, or why not (the engine's kind decides). */
export function roundedShape(s: Shape, corner: number, radius: number): Shape | string {
  if (!shapeCorners(s).some((c) => c.index === corner)) return shapeCorners(s).length ? `There is no corner ${corner + 1} to round on this shape.` : roundShapeCorner(s, corner, radius);
  return roundShapeCorner(s, corner, radius);
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
