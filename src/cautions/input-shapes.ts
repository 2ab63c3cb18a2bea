/**
 * The input shapes of an evaluated section as the cautions take them (each with its own exact
 * region and operation), named as the shape list and the report name them ("Rectangle 4" when
 * the shape has no name of its own), so a caution reads the same in the panel and the report.
 */
import type { Region } from '../geometry/contour';
import type { Shape } from '../shapes/shape';
import { shapeDisplayName } from '../shapes/ops';
import type { InputShape } from './types';

export function namedInputShapes(shapes: readonly Shape[], regions: readonly ({ region: Region } | undefined)[]): InputShape[] {
  return shapes.map((s, k) => ({ id: s.id, name: shapeDisplayName(s, k), op: s.op ?? 'add', region: regions[k]?.region ?? [] }));
}
