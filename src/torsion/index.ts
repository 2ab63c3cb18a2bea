/**
 * Saint-Venant torsion by finite elements: J, the shear centre, the centre of twist, Cw, a
 * convergence estimate and the stress map under a unit torque. See torsion.ts for the steps.
 */
export {
  computeTorsion,
  computeTorsionAsync,
  computeRegionTorsion,
  torsionSteps,
  type TorsionPiece,
  type TorsionOptions,
  type TorsionResult,
} from './torsion';
export type { TorsionDensity } from './mesh-section';
export { DENSITY_RULES } from './mesh-section';
export type { TorsionStage, Step as TorsionStep, RunHooks as TorsionHooks } from './progress';
export { runSync as runTorsionSteps, runAsync as runTorsionStepsAsync } from './progress';
export type { Convergence as TorsionConvergence } from './convergence';
export { TorsionError, TorsionCancelled, isTorsionCancelled } from './errors';
