/**
 * Operations on any shape record, dispatched to its kind: its raw contours, moves, rotations,
 * mirrors and unit scaling, and the one display name used everywhere. Each returns a new record
 * and never mutates its input.
 */
import { resolveOutline } from '../boolean';
import type { Contour, Region } from '../geometry/contour';
import type { Shape } from './shape';
import type { PointMap } from './base';
import type { Corner } from './corners';
import { kindOf } from './registry';

/** Raw exact contours of one shape: outer loops and, for hollow profiles, holes (reversed). */
export function shapeContours(shape: Shape): Contour[] {
  return kindOf(shape).contours(shape);
}

/** True for shapes whose outline can cross itself and so needs resolving. */
export function mayCrossItself(shape: Shape): boolean {
  return kindOf(shape).mayCrossItself;
}

/** The exact outline of one shape on its own (self-crossings resolved); throws on invalid input. */
export function shapeToRegion(shape: Shape): Region {
  const raw = shapeContours(shape);
  return mayCrossItself(shape) ? resolveOutline(raw).region : raw;
}

export function translateShape<S extends Shape>(s: S, dx: number, dy: number): S {
  if (dx === 0 && dy === 0) return s;
  return kindOf(s).mapPoints(s, (p) => [p[0] + dx, p[1] + dy]);
}

/** Rotate by `deg` degrees CCW about (px, py). Profiles keep their parametric form. */
export function rotateShape<S extends Shape>(s: S, deg: number, px: number, py: number): S {
  const t = (deg * Math.PI) / 180;
  const c = Math.cos(t), sn = Math.sin(t);
  const f: PointMap = (p) => [px + c * (p[0] - px) - sn * (p[1] - py), py + sn * (p[0] - px) + c * (p[1] - py)];
  const k = kindOf(s);
  const moved = k.mapPoints(s, f);
  return k.rotated ? k.rotated(moved, deg) : moved;
}

/** Mirror about the vertical line x = c or the horizontal line y = c. */
export function mirrorShape<S extends Shape>(s: S, axis: 'vertical' | 'horizontal', c: number): S {
  const f: PointMap = axis === 'vertical' ? (p) => [2 * c - p[0], p[1]] : (p) => [p[0], 2 * c - p[1]];
  const k = kindOf(s);
  const moved = k.mapPoints(s, f);
  return k.mirrored ? k.mirrored(moved, axis) : moved;
}

/** Every length multiplied by k (a change of units). */
export function scaleShape<S extends Shape>(s: S, k: number): S {
  return k === 1 ? s : kindOf(s).scaled(s, k);
}

/** The corners of a shape that can be rounded (none for kinds without corners). */
export function shapeCorners(s: Shape): Corner[] {
  return kindOf(s).corners?.list(s) ?? [];
}

/** The shape with one corner rounded by an exact tangent arc, or the reason it cannot be done. */
export function roundShapeCorner(s: Shape, index: number, radius: number): Shape | string {
  const c = kindOf(s).corners;
  if (!c) return `a ${kindOf(s).label.toLowerCase()} has no corners to round here; a profile sets its radii in its own fields`;
  return c.round(s, index, radius) as Shape | string;
}

/** The kind's plain name: 'Polygon', 'I-beam', ... */
export function shapeKindLabel(s: Shape): string {
  return kindOf(s).label;
}

/**
 * The one display name of a shape, used by the panel, the canvas, the report, the CLI and the
 * exports alike: its own name when it has one, else its kind and its place in the list.
 */
export function shapeDisplayName(s: Shape, index: number): string {
  return s.name?.trim() ? s.name : `${kindOf(s).label} ${index + 1}`;
}
