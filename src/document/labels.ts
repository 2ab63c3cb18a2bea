/** Plain names of the shape kinds, shared by the editor and the report so both say the same. */
import type { ShapeType } from './types';

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
