/**
 * Saint-Venant torsion by finite elements: J, the shear centre, the centre of twist, Cw, a
 * convergence estimate and the stress map under a unit torque. See torsion.ts for the steps.
 *
 * Use:
 * - `computeRegionTorsion(region)` for one material; `computeTorsion([{ region, G }, …])` for
 *   several (G may be given as E / (2(1 + ν)) per material; J and Cw come out relative to
 *   `referenceG`, the first piece's G unless set).
 * - In a Web Worker, `computeTorsionAsync(pieces, { onProgress, shouldCancel })` hands the event
 *   loop a turn every ~30 ms, so a 'cancel' message can set the flag `shouldCancel` reads; the
 *   promise then rejects with TorsionCancelled (test with isTorsionCancelled, which also works on
 *   an error that crossed the worker boundary as a plain object). Terminating the worker is the
 *   other way to cancel the synchronous `computeTorsion`.
 * - Bad input throws TorsionError with the problem and its place; the result's typed arrays
 *   (stress map) can be transferred from a worker without copying.
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
export type { Convergence as TorsionConvergence } from './convergence';
export { TorsionError, TorsionCancelled, isTorsionCancelled } from './errors';
