/** Plain names of the shape kinds, shared by the editor and the report so both say the same. */
import type { Shape, ShapeType } from './types';

export const SHAPE_KIND_LABEL: Readonly<Record<ShapeType, string>> = {
  polygon: 'Polygon',
  circle: 'Circle',
  path: 'Path',
  rectangle: 'Rectangle',
  'i-beam': 'I-beam',
  channel: 'Channel',
  angle: 'Angle',
  tee: 'Tee',
  'rect-tube': 'Rectangular tube',
  'round-tube': 'Round tube',
  'bent-plate': 'Bent plate',
};

/**
 * The one display name of a shape, used by the panel, the canvas, the report, the CLI and the
 * exports: its `name` if set, else its kind label and its 1-based place in the list ("Path 1").
 */
export function shapeDisplayName(shape: Shape, index: number): string {
  return shape.name?.trim() ? shape.name : `${SHAPE_KIND_LABEL[shape.type]} ${index + 1}`;
}
