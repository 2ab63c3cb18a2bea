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

export const OPS = ['add', 'subtract', 'intersect'] as const;
export type Op = (typeof OPS)[number];

export type Point = [number, number];

interface ShapeBase {
  id: string;
  /** Optional human label shown in lists and the report. */
  name?: string;
  /** How the shape combines with the region built so far; default add. */
  op?: Op;
}

export interface PolygonShape extends ShapeBase {
  type: 'polygon';
  points: Point[];
}

export interface CircleShape extends ShapeBase {
  type: 'circle';
  center: Point;
  radius: number;
}

/** `{to}` is a straight line; `{to, via}` is the circular arc from the current point through via to to. */
export interface PathSegment {
  to: Point;
  via?: Point;
}

export interface PathShape extends ShapeBase {
  type: 'path';
  start: Point;
  segments: PathSegment[];
}

/**
 * Parametric profiles. Each is defined in a local frame (dimensions as read off a drawing),
 * then placed: mirrored about the local y axis when `mirror` is true, rotated by `rotation`
 * degrees CCW about the local origin, and moved so the local origin sits at `at`.
 * Every profile becomes a PathShape through one function in profiles.ts.
 */
interface ProfileBase extends ShapeBase {
  at: Point;
  rotation?: number;
  mirror?: boolean;
}

/** Local origin at the bottom-left corner. Optional corner radius on all four corners. */
export interface RectangleShape extends ProfileBase {
  type: 'rectangle';
  width: number;
  height: number;
  cornerRadius?: number;
}

/** Doubly symmetric I: local origin at the bottom-left of the bounding box. */
export interface IShape extends ProfileBase {
  type: 'i-beam';
  depth: number;
  flangeWidth: number;
  flangeThickness: number;
  webThickness: number;
  rootRadius: number;
}

/** Channel, web on the left, flanges to the right: local origin bottom-left. */
export interface ChannelShape extends ProfileBase {
  type: 'channel';
  depth: number;
  flangeWidth: number;
  flangeThickness: number;
  webThickness: number;
  rootRadius: number;
}

/** Angle, vertical leg on the left, horizontal leg at the bottom: local origin at the heel. */
export interface AngleShape extends ProfileBase {
  type: 'angle';
  legVertical: number;
  legHorizontal: number;
  thickness: number;
  rootRadius: number;
}

/** Tee, flange on top, stem down: local origin bottom-left of the bounding box. */
export interface TeeShape extends ProfileBase {
  type: 'tee';
  depth: number;
  flangeWidth: number;
  flangeThickness: number;
  stemThickness: number;
  rootRadius: number;
}

/** Rectangular hollow section: local origin bottom-left; outside corner radius, inside = max(ro − t, 0). */
export interface RectTubeShape extends ProfileBase {
  type: 'rect-tube';
  width: number;
  height: number;
  wall: number;
  outerRadius: number;
}

/** Circular hollow section: local origin at the centre. */
export interface RoundTubeShape extends ProfileBase {
  type: 'round-tube';
  outerDiameter: number;
  wall: number;
}

/**
 * Plate bent through 90 degrees: horizontal leg along the bottom, vertical leg on the left,
 * legs measured to the outside faces, with an inside bend radius. Local origin at the
 * intersection of the outside faces.
 */
export interface BentPlateShape extends ProfileBase {
  type: 'bent-plate';
  legHorizontal: number;
  legVertical: number;
  thickness: number;
  insideRadius: number;
}

export type ProfileShape =
  | RectangleShape
  | IShape
  | ChannelShape
  | AngleShape
  | TeeShape
  | RectTubeShape
  | RoundTubeShape
  | BentPlateShape;

export type Shape = PolygonShape | CircleShape | PathShape | ProfileShape;
export type ShapeType = Shape['type'];

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
