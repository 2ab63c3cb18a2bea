/**
 * The list of shape kinds. Everything that depends on a shape's kind (validation, units, labels,
 * outlines, transforms, the report) looks the kind up here; nothing else switches on `type`.
 */
import type { Shape, ShapeType } from './shape';
import { circleKind } from './circle';
import type { ShapeKind } from './kind';
import { lineKind } from './line';
import { pathKind } from './path';
import { polygonKind } from './polygon';
import { PROFILE_KINDS } from './profile';
import { stripKind } from './strip';

type KindOf<T extends ShapeType> = ShapeKind<Extract<Shape, { type: T }>>;

export const SHAPE_KINDS: { readonly [T in ShapeType]: KindOf<T> } = {
  polygon: polygonKind,
  circle: circleKind,
  path: pathKind,
  ...PROFILE_KINDS,
  strip: stripKind,
  line: lineKind,
};

export const SHAPE_TYPES = Object.keys(SHAPE_KINDS) as ShapeType[];

export function isShapeType(t: unknown): t is ShapeType {
  return typeof t === 'string' && Object.prototype.hasOwnProperty.call(SHAPE_KINDS, t);
}

/** The kind module of a shape record (its type must be known). */
export function kindOf<S extends Shape>(s: S): ShapeKind<S> {
  return SHAPE_KINDS[s.type] as unknown as ShapeKind<S>;
}
