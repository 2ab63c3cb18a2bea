/** Plain names of the shape kinds, shared by the editor and the report so both say the same. */
import { SHAPE_KINDS } from '../shapes/registry';
import type { ShapeType } from './types';

export const SHAPE_KIND_LABEL: Readonly<Record<ShapeType, string>> = Object.fromEntries(
  Object.entries(SHAPE_KINDS).map(([type, kind]) => [type, kind.label]),
) as Record<ShapeType, string>;

export { shapeDisplayName } from '../shapes/ops';
