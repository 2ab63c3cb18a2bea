/**
 * Materials, mixed sections and stresses under load: the one entry point the lead re-exports from
 * src/index.ts. Everything takes plain data (regions, numbers, small records).
 */
export { materialIssues, materialListIssues, materialReferenceIssues, assertMaterial, findMaterial, MaterialError, type Material, type MaterialIssue } from './material';
export { MATERIAL_LIBRARY, libraryMaterial, materialInStressUnit, type LibraryMaterial } from './library';
export {
  STRESS_UNITS,
  FORCE_UNITS,
  STRESS_UNIT_IN_PASCALS,
  FORCE_UNIT_IN_NEWTONS,
  DEFAULT_STRESS_UNIT,
  DEFAULT_FORCE_UNIT,
  stressFactor,
  momentFactor,
  resistanceMomentFactor,
  convertStress,
  massPerLength,
  momentUnitText,
  type StressUnit,
  type ForceUnit,
  type LoadUnits,
} from './units';
export { composeMaterials, createMaterialComposer, type MaterialLayer, type MaterialRegion, type MaterialComposer } from './compose';
export { mixedSection, partsFromRegions, type MaterialPart, type MixedSection, type PartResult, type TransformedSection, type XY } from './mixed';
export { compositePlastic, PLASTIC_CAUTION, type CompositePlastic, type PlasticAxis } from './plastic';
export { stressField, stressValue, stressAt, neutralAxis, SIGN_CONVENTION, type Loads, type StressField, type StressPart, type PointStress, type NeutralAxis } from './stress';
export { stressExtremes, type StressExtremes, type StressPoint, type MaterialExtremes } from './extremes';
export { shearAtCut, SHEAR_AVERAGE_CAUTION, SHEAR_ROTATED_CAUTION, type ShearResult } from './shear';
export { stressGradients, sampleStressGrid, type StressGradient, type StressGrid } from './stress-map';
export { rowCrossings, regionContainsPoint, boundaryDistance } from './locate';
export { TRANSFORMED_CAUTION, STRESS_CAUTION, KERN_CAUTION, CODE_DEFERRAL, ROTATED_AXES_CAUTION, sectionCautions, stressCautions } from './cautions';
export { mixedPropsJson, stressJson, type MixedPropsJson, type StressJson } from './json';
export * from '../kern';
