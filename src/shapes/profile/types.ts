/**
 * The parametric profile records (rectangle, I, channel, angle, tee, rectangular and round tube,
 * bent plate). Each is defined in a local frame (dimensions as read off a drawing), then placed:
 * mirrored about the local y axis when `mirror` is true, rotated by `rotation` degrees CCW about
 * the local origin, and moved so the local origin sits at `at`.
 */
import type { Point, ShapeBase } from '../base';

export interface ProfileBase extends ShapeBase {
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

export type ProfileType = ProfileShape['type'];
export type ProfileOf<T extends ProfileType> = Extract<ProfileShape, { type: T }>;
type NonDimensionKey = 'id' | 'type' | 'name' | 'op' | 'material' | 'at' | 'rotation' | 'mirror';

/** The numeric dimension fields of one profile type (everything except identity and placement). */
export type ProfileDimensions<T extends ProfileType> = Omit<ProfileOf<T>, NonDimensionKey>;
export type ProfileDimensionKey<T extends ProfileType> = keyof ProfileDimensions<T> & string;
