/** Every kind of shape record, as one union: what a document's `shapes` list holds. */
import type { CircleShape } from './circle';
import type { LineShape } from './line';
import type { PathShape } from './path';
import type { PolygonShape } from './polygon';
import type { ProfileShape } from './profile/types';
import type { StripShape } from './strip';

export type Shape = PolygonShape | CircleShape | PathShape | ProfileShape | StripShape | LineShape;
export type ShapeType = Shape['type'];
