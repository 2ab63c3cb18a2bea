/** Kern's engine: the one entry point the app, the CLI and the tests import. */
export * from './document/types';
export { parseDocument, validateDocument, validateShape, formatIssue, type Issue, type DocResult } from './document/validate';
export { convertDocumentUnits, unitFactor } from './document/units';
export { serialiseDocumentText } from './document/serialise';
export { validateNetLines, scaleNetLines } from './document/net-lines';
export { sectionOf, withSectionShapes, addVariant, allShapeIds, variantNames, findVariant, variantShapes, newVariantName, VariantError } from './document/variants';
export { DEMO_DOCUMENT } from './document/demo';
export { SHAPE_KIND_LABEL } from './document/labels';
export { SHAPE_KINDS, SHAPE_TYPES, kindOf, isShapeType } from './shapes/registry';
export type { ShapeKind } from './shapes/kind';
export type { PointMap } from './shapes/base';
export { shapeCorners, roundShapeCorner } from './shapes/ops';
export type { Corner } from './shapes/corners';
export { shapeToRegion, shapeContours, mayCrossItself, translateShape, rotateShape, mirrorShape, scaleShape, shapeKindLabel, shapeDisplayName } from './shapes/ops';
export { formatShapeIssue, issueShapeName } from './document/issue-names';
export { pathContour } from './shapes/path';
export { PROFILE_TYPES, isProfile, isProfileType } from './shapes/profile';
export { STRIP_CORNERS } from './shapes/strip';
export { DEFAULT_LINE_GROUP } from './shapes/line';
export { profileToPaths, ProfileError, type ProfilePaths } from './shapes/profile/outline';
export { validateProfile, PROFILE_DEFAULTS, PROFILE_FIELDS, type ProfileField, type ProfileIssue } from './shapes/profile/fields';
export type { ProfileType, ProfileDimensions } from './shapes/profile/types';
export { createEvaluator, evaluateDocument, type Evaluation, type Evaluator, type ShapeResult, type LineGroupResult, type MaterialsResult } from './evaluate';
export { LINES_ONLY_MESSAGE } from './evaluate';
export { weldResult, weldUnits, createWeldStage, type WeldResult, type WeldUnits, type WeldGroupInput } from './weld-results';
export { validateWeldLoads, documentLineGroups } from './document/weld-loads';
export {
  sectionProperties,
  cutSection,
  cutDiagram,
  inertiaAboutAxis,
  principal,
  SectionError,
  type SectionProperties,
  type CutResult,
} from './properties/section';
export { propertiesJson, jsonValueAt, type PropertyJson } from './properties/json';
export { CAUTION_TEXT, shearFormulaCaution } from './report/caution';
export { emptySectionText } from './report/empty';
export { PROPERTY_CATALOG, formatNumber, formatProperty, unitText, propertyByKey, DISPLAY_SIGFIGS, type PropertyInfo } from './properties/catalog';
export { formatQuantity, parseFormatted, sectionSize, GEOMETRY_SIGFIGS, ZERO_RELATIVE } from './properties/catalog';
export { oneSidedWidths, qbWidth, type OneSidedWidths, type QbSide } from './moments/width';
export { cutWithSides, type SidedCut } from './properties/cut-sides';
export { regionMoments, polygonMoments, type RawMoments } from './moments/kernel';
export { momentsAbove } from './moments/cut';
export * from './geometry/contour';
export { polygonInsertAfter, polygonDeletePoint, pathSplitSegment, pathDeletePoint, pathMakeArc, pathMakeLine, type PointEdit } from './shapes/edit-points';
export { chainPoint, chainSplitSegment, chainDeletePoint, chainMakeArc, chainMakeLine, chainReverse, chainRoundCorner, chainRemoveSegment, type ChainShape } from './shapes/edit-points';
export { linesAlongOutline } from './shapes/line-from-outline';
export { contourToPath, regionToPaths, profileToOutline } from './shapes/from-region';
export { newShapeId } from './shapes/ids';
export { regionSegments, segmentIntersections, segmentMidpoint, segmentBox, type Segment } from './geometry/segments';
export { unionBounds, regionsBounds } from './geometry/bounds';
export { filletCorner, filletPolygonCorner, pathEndDirection, tangentArc, type FilletResult, type FilletPath, type FilletSegment } from './geometry/fillet';
export { catalogueSeries, catalogueSize, catalogueProfile, CatalogueError, type CatalogueSeries, type CatalogueSize, type CatalogueOptions } from './catalogue';
export { compareSections, comparisonRow, evaluateLimits, overallVerdict, exampleLimits, EXAMPLE_LIMITS_NOTE, comparisonCatalog, CRITICAL_FIBRE_PROPERTIES, validateLimits } from './compare';
export type { SectionComparison, PropertyChange, LimitResult, LimitStatus, Verdict, CentroidShift, AxesRotation } from './compare';
export { materialChange, fieldsFor, LIMIT_FIELDS, CENTROID_KEY, type MaterialChange, type LimitField } from './compare';
export { analyseCutouts, sectionCautions, CUTOUT_CAUTION_TEXT, HOLE_CHECK_NOTE, SECTION_CAUTION_TEXT, HOLE_RULE_SETS, cautionsInOrder, namedInputShapes } from './cautions';
export type { Caution, CautionKind, CautionSeverity, CutoutFindings, InputShape, HoleRuleSetId } from './cautions';
export { netSection, describeGap, NetSectionError, NET_SECTION_PURPOSE, NET_SECTION_CAUTION, type NetSection, type NetGap, type GapKind } from './netsection';
export * from './lines';
export * from './materials';
export * from './torsion';
export * from './analysis';
export * from './section-torsion';
