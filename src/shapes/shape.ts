/** Every kind of shape record, as one union: what a document's `shapes` list holds. */
import type { CircleShape } from './circle';
import type { PathShape } from './path';
import type { PolygonShape } from './polygon';
import type { ProfileShape } from './profile/types';

export type Shape = PolygonShape | CircleShape | PathShape | ProfileShape;
export type ShapeType = Shape['type'];
