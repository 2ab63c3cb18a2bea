/** Structural cautions for cutouts, from the geometry itself. */
export { analyseCutouts, sectionCautions, DEFAULT_LIGAMENT_RATIO, type CutoutFindings, type LigamentFinding } from './analyse';
export type { Caution, CautionKind, CautionSeverity, CautionInput, CautionOptions, InputShape, ShapeRef } from './types';
export { insideCorners, newCorners, DEFAULT_MIN_CORNER_TURN, type SharpCorner, type RadiusedCorner } from './corners';
export { sectionParts, partGaps, type SectionPart, type PartGap } from './parts';
export { holeChecks, roundHoles, type HoleCheck, type HoleEdgeCheck, type HoleSpacingCheck } from './hole-checks';
export { HOLE_RULE_SETS, EN1993_RULES, AISC360_RULES, type HoleRuleSet, type HoleRuleSetId, type RuleValue } from './hole-rules';
export { ligaments, narrowestWidth, cutRuns, type Ligament, type CutRun } from './ligaments';
export { closestCandidates, closestPair, nearestOnCarrier, type PointPair } from './closest';
export { REENTRANT_SOURCE } from './messages';
export { CUTOUT_CAUTION_TEXT, HOLE_CHECK_NOTE, SECTION_CAUTION_TEXT } from './wording';
export { cautionsInOrder } from './order';
export { namedInputShapes } from './input-shapes';
