/**
 * Torsion of a section document (the engine in src/torsion/ takes plain regions): its pieces by
 * material, the settings a run uses, a synchronous run for the CLI and the report, the rows every
 * view prints, the JSON, and the cautions.
 */
export { sectionPieces, shearModulus, type SectionPieces, type PieceMaterial } from './pieces';
export { resolveTorsionSettings, poissonText, DEFAULT_POISSON, type ResolvedTorsionSettings } from './settings';
export { computeSectionTorsion, sectionTorsion, basisOf, type SectionTorsion, type TorsionBasis } from './compute';
export { TORSION_CATALOG, torsionRows, percentText, type TorsionRow, type TorsionRowInfo, type TorsionGroup } from './catalog';
export { torsionJson } from './json';
export { TORSION_SCOPE, TORSION_MIXED, TORSION_METHOD, torsionCautions } from './cautions';
