/**
 * Line elements: line groups (weld groups per unit throat), the elastic weld-group method, and thin
 * walls built from a centreline. Plain data in, plain data out; nothing here knows the document.
 *
 * Wiring (for the document, the app, the CLI and the report):
 * - a `line` shape: chainFromPath(shape.start, shape.segments); the shapes of one `group` form a
 *   LineGroup; lineProperties(group) gives length, centroid, Ix, Iy, Ixy, J (the CLI's `lines`
 *   object), principal values and section moduli. Dimensions: length L, Ix… L³, S L².
 * - a weld check: weldGroupForces(group, {Fx, Fy, at, M?}) → critical point, its force and parts.
 * - a `strip` shape: stripOutline(chainFromPath(start, segments), thickness, corners) is its exact
 *   Region (an area shape like any other); thinWallComparison(chain, thickness, outline) gives the
 *   thin-wall values beside the exact ones and their difference in per cent.
 * - every refusal is a LineError whose message names segments[k] and whose `where` holds k.
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
export { chainSegments, chainPolyline } from './chain-geometry';
export { thinWallComparison, type ThinWallComparison, type AreaValues } from './thin-wall';
export { WELD_GROUP_CAUTION, LINE_GROUP_CAUTION, THIN_WALL_CAUTION } from './cautions';
export { LINE_PROPERTY_CATALOG, formatLineProperty, linePropertiesJson, type LinePropertyInfo, type LineJson } from './line-catalog';
