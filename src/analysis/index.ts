/**
 * A document's materials and loads worked out for the panel, the CLI and the report: the units,
 * the section stresses are computed on (one material when the document names none), one load case,
 * the kern, the plastic moments and the extra keys of `props --json`.
 */
export { documentLoadUnits, loadUnitTexts, type UnitFields } from './units';
export { stressSection, sectionContours, ONE_MATERIAL, ONE_MATERIAL_ID, type StressSection, type EvaluatedSection } from './stress-section';
export { analyseLoadCase, noNormalLoad, tensionSide, axisAngle, type LoadCase, type CutLine } from './load-case';
export { kernOfSection, type KernResult } from './kern';
export { plasticOfSection, plasticInLoadUnits, rawPlastic, type PlasticResult, type PlasticOutcome } from './plastic';
export { sectionExtrasJson, type SectionExtrasJson } from './props-json';
export { materialColour, materialColours, stressColour, withAlpha, STRESS_INK } from './palette';
