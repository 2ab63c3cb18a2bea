/**
 * One interface per shape kind for the editor: how its points move (translate, rotate, mirror),
 * which handles it offers and what a handle does. Exact outlines come from the engine
 * (shapeToRegion); nothing here samples geometry.
 */
import type { Point, Shape } from '../../src';

export type HandleRef =
  | { kind: 'vertex'; index: number }
  | { kind: 'start' }
  | { kind: 'to'; index: number }
  | { kind: 'via'; index: number }
  | { kind: 'centre' }
  | { kind: 'radius' }
  | { kind: 'at' };

export interface Handle {
  ref: HandleRef;
  p: Point;
}

export type PointMap = (p: Point) => Point;

export interface ShapeKind<S extends Shape> {
  label: string;
  /** The record with every stored point mapped (an isometry keeps lengths). */
  mapPoints(s: S, f: PointMap): S;
  /** Extra changes after a rotation by `deg` (profiles keep their angle). */
  rotated?(s: S, deg: number): S;
  /** Extra changes after a reflection (profiles flip `mirror`; polygons reverse their order). */
  mirrored?(s: S, axis: 'vertical' | 'horizontal'): S;
  handles(s: S): Handle[];
  moveHandle(s: S, ref: HandleRef, p: Point): S;
}

/** Normalise degrees to (−180, 180], with tiny round-off shown as 0. */
export function normaliseDeg(d: number): number {
  let r = d % 360;
  if (r > 180) r -= 360;
  if (r <= -180) r += 360;
  return Math.abs(r) < 1e-12 ? 0 : r;
}
