/**
 * Section document, version 1: the JSON a user saves and other tools write.
 * Fixed fields are those of the published format; optional ones are Kern's additions.
 */
export const FORMAT = 'kern-section';
export const CURRENT_VERSION = 1;

export const UNITS = ['mm', 'cm', 'm', 'in', 'ft'] as const;
export type Units = (typeof UNITS)[number];

/** Length of one unit in metres. */
export const UNIT_IN_METRES: Record<Units, number> = { mm: 1e-3, cm: 1e-2, m: 1, in: 0.0254, ft: 0.3048 };

export { OPS, type Op, type Point } from '../shapes/base';
export type { PolygonShape } from '../shapes/polygon';
export type { CircleShape } from '../shapes/circle';
export type { PathShape, PathSegment } from '../shapes/path';
export type {
  ProfileShape,
  RectangleShape,
  IShape,
  ChannelShape,
  AngleShape,
  TeeShape,
  RectTubeShape,
  RoundTubeShape,
  BentPlateShape,
} from '../shapes/profile/types';
export type { Shape, ShapeType } from '../shapes/shape';
import type { Shape } from '../shapes/shape';

export interface TitleBlock {
  project?: string;
  section?: string;
  author?: string;
  checker?: string;
  date?: string;
  revision?: string;
}

export interface SectionDocument {
  format: typeof FORMAT;
  version: 1;
  units: Units;
  shapes: Shape[];
  /** Optional: the section's name and the report's title block. */
  name?: string;
  title?: TitleBlock;
}
