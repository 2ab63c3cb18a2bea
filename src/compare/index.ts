/** Comparison of a baseline and a proposal, with limits and the within/beyond verdict. */
export { compareSections, comparisonRow, type SectionComparison } from './compare';
export { propertyChange, changeKind, MAGNITUDE_ZERO, PRODUCT_ZERO, type PropertyChange, type ChangeKind } from './property-change';
export { centroidShift, principalAxesRotation, anisotropy, wrapAxisAngle, ISOTROPIC_TOL, WEAK_AXES, type CentroidShift, type AxesRotation } from './axes-change';
export { CRITICAL_FIBRE_PROPERTIES, comparisonCatalog } from './critical-fibre';
export { evaluateLimits, overallVerdict, exampleLimits, EXAMPLE_LIMITS_NOTE, type Limit, type LimitResult, type LimitStatus, type Verdict } from './limits';
export { fieldsFor, fieldsForKind, LIMIT_FIELDS, CENTROID_KEY, type LimitField } from './limit-fields';
export { validateLimits } from './validate-limits';
export { materialChange, type MaterialChange } from './material-change';
