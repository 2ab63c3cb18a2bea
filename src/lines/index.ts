/**
 * Line elements: line groups (weld groups per unit throat), the elastic weld-group method, and thin
 * walls built from a centreline. Plain data in, plain data out; nothing here knows the document.
 */
export {
  chainFrom,
  chainFromPath,
  chainFromContour,
  chainSegment,
  segmentCount,
  vertexCount,
  reverseChain,
  transformChain,
  checkGroup,
  LineError,
  type LineChain,
  type LineGroup,
  type LineWhere,
  type ChainSegment,
} from './chain';
export { lineMomentsAbout, addStraightLine, addArcLine, arcLineTerms } from './line-kernel';
export { groupBoundsAbout } from './chain-bounds';
export { lineProperties, lineMoments, type LineProperties } from './line-properties';
export { weldGroupForces, weldForceAt, type WeldLoad, type WeldForce, type WeldPoint, type WeldGroupResult, type WeldState } from './weld-group';
export { stripOutline, type StripCorners } from './strip-outline';
export { thinWallComparison, type ThinWallComparison, type AreaValues } from './thin-wall';
export { WELD_GROUP_CAUTION, LINE_GROUP_CAUTION, THIN_WALL_CAUTION } from './cautions';
