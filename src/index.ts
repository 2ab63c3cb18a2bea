/** Kern's engine: the one entry point the app, the CLI and the tests import. */
export * from './document/types';
export { parseDocument, validateDocument, validateShape, formatIssue, type Issue, type DocResult } from './document/validate';
export { shapeContours, pathContour } from './document/shapes';
export { convertDocumentUnits, unitFactor } from './document/units';
export { DEMO_DOCUMENT } from './document/demo';
export { SHAPE_KIND_LABEL } from './document/labels';
export { profileToPaths, validateProfile, ProfileError, PROFILE_DEFAULTS, PROFILE_FIELDS } from './document/profiles';
export type { ProfileType, ProfileField, ProfileIssue, ProfilePaths } from './document/profiles';
export { createEvaluator, evaluateDocument, type Evaluation, type Evaluator, type ShapeResult } from './evaluate';
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
export { PROPERTY_CATALOG, formatNumber, formatProperty, unitText, propertyByKey, DISPLAY_SIGFIGS, type PropertyInfo } from './properties/catalog';
export { formatQuantity, parseFormatted, sectionSize, GEOMETRY_SIGFIGS, ZERO_RELATIVE } from './properties/catalog';
export { oneSidedWidths, cutWithSides, qbWidth, type OneSidedWidths, type SidedCut, type QbSide } from './moments/width';
export { regionMoments, polygonMoments, type RawMoments } from './moments/kernel';
export { momentsAbove } from './moments/cut';
export * from './geometry/contour';

import { resolveOutline } from './boolean';
import { shapeContours } from './document/shapes';
import type { Shape } from './document/types';
import type { Region } from './geometry/contour';

/** The exact outline of one shape on its own (self-crossings resolved); throws on invalid input. */
export function shapeToRegion(shape: Shape): Region {
  const raw = shapeContours(shape);
  return shape.type === 'polygon' || shape.type === 'path' ? resolveOutline(raw).region : raw;
}
