/**
 * Editor-side operations on shape records, dispatched to one module per shape kind. Each
 * returns a new record and never mutates its input.
 */
import { SHAPE_KIND_LABEL, type Point, type ProfileShape, type Shape } from '../../src';
import { circleKind } from './circle';
import type { Handle, HandleRef, PointMap, ShapeKind } from './kind';
import { pathKind } from './path';
import { polygonKind } from './polygon';
import { profileKind } from './profile';

export type { Handle, HandleRef } from './kind';
export { contourSignedArea, contourToPath, profileToOutline, regionToPaths } from './outline';

export const PROFILE_TYPE_LIST = ['rectangle', 'i-beam', 'channel', 'angle', 'tee', 'rect-tube', 'round-tube', 'bent-plate'] as const;

export { SHAPE_KIND_LABEL };

export function isProfile(s: Shape): s is ProfileShape {
  return (PROFILE_TYPE_LIST as readonly string[]).includes(s.type);
}

function kindOf(s: Shape): ShapeKind<Shape> {
  switch (s.type) {
    case 'polygon':
      return polygonKind as ShapeKind<Shape>;
    case 'circle':
      return circleKind as ShapeKind<Shape>;
    case 'path':
      return pathKind as ShapeKind<Shape>;
    default:
      return profileKind as ShapeKind<Shape>;
  }
}

export function shapeLabel(s: Shape, index: number): string {
  return s.name?.trim() ? s.name : `${SHAPE_KIND_LABEL[s.type]} ${index + 1}`;
}

export { newShapeId } from './ids';

export function translateShape(s: Shape, dx: number, dy: number): Shape {
  if (dx === 0 && dy === 0) return s;
  return kindOf(s).mapPoints(s, (p) => [p[0] + dx, p[1] + dy]);
}

/** Rotate by `deg` degrees CCW about (px, py). Profiles keep their parametric form. */
export function rotateShape(s: Shape, deg: number, px: number, py: number): Shape {
  const t = (deg * Math.PI) / 180;
  const c = Math.cos(t), sn = Math.sin(t);
  const f: PointMap = (p) => [px + c * (p[0] - px) - sn * (p[1] - py), py + sn * (p[0] - px) + c * (p[1] - py)];
  const k = kindOf(s);
  const moved = k.mapPoints(s, f);
  return k.rotated ? k.rotated(moved, deg) : moved;
}

/** Mirror about the vertical line x = c or the horizontal line y = c. */
export function mirrorShape(s: Shape, axis: 'vertical' | 'horizontal', c: number): Shape {
  const f: PointMap = axis === 'vertical' ? (p) => [2 * c - p[0], p[1]] : (p) => [p[0], 2 * c - p[1]];
  const k = kindOf(s);
  const moved = k.mapPoints(s, f);
  return k.mirrored ? k.mirrored(moved, axis) : moved;
}

export function shapeHandles(s: Shape): Handle[] {
  return kindOf(s).handles(s);
}

/** The shape with one handle moved to p. */
export function moveHandle(s: Shape, ref: HandleRef, p: Point): Shape {
  return kindOf(s).moveHandle(s, ref, p);
}
