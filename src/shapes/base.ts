/**
 * What every shape record has, whatever its kind: an id, an optional name, and the operation
 * that combines it with the section built so far. The kind modules beside this file add their
 * own fields; the document module (`src/document/types.ts`) collects them into `Shape`.
 */

export type Point = [number, number];

export const OPS = ['add', 'subtract', 'intersect'] as const;
export type Op = (typeof OPS)[number];

export interface ShapeBase {
  id: string;
  /** Optional human label shown in lists and the report. */
  name?: string;
  /** How the shape combines with the region built so far; default add. */
  op?: Op;
  /** The id of the shape's material (document `materials`); the reference material when absent. */
  material?: string;
}

/** A map of points (an isometry for moves, rotations and mirrors; a scaling for units). */
export type PointMap = (p: Point) => Point;
