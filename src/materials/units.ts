/**
 * The unit model for materials and loads, converted only at the edges.
 *
 * - Lengths: the document's unit (mm, cm, m, in, ft); geometry never changes unit here.
 * - E and fy: one stress unit for the whole document (`stressUnit`, default MPa).
 * - Density: kg/m³ always; mass per length comes out in kg/m whatever the length unit.
 * - Loads: N and V in one force unit (`forceUnit`, default kN); Mx and My in force × length,
 *   where the length of a moment is the document's unit unless `momentLength` says otherwise
 *   (so a mm drawing can take moments in kN·m).
 *
 * Inside the engine a load case is first brought to force F and force × document length F·L, and
 * stresses come out in F/L²; `stressFactor` turns F/L² into the stress unit. For example with
 * mm, kN and MPa: 1 kN/mm² = 1000 MPa, so the factor is 1000.
 *
 * Conversion constants: the inch is 0.0254 m exactly and the pound-force is 0.45359237 kg ×
 * 9.80665 m/s² = 4.4482216152605 N exactly (NIST SP 811, App. B); hence 1 psi = 6894.757293168361 Pa.
 */
import { UNIT_IN_METRES, type Units } from '../units';

export const STRESS_UNITS = ['MPa', 'kPa', 'Pa', 'GPa', 'psi', 'ksi'] as const;
export type StressUnit = (typeof STRESS_UNITS)[number];

export const FORCE_UNITS = ['N', 'kN', 'MN', 'lbf', 'kip'] as const;
export type ForceUnit = (typeof FORCE_UNITS)[number];

const LBF = 0.45359237 * 9.80665; // N, exact by definition (NIST SP 811, App. B)
const INCH = 0.0254; // m, exact

/** One stress unit in pascals. */
export const STRESS_UNIT_IN_PASCALS: Record<StressUnit, number> = {
  Pa: 1,
  kPa: 1e3,
  MPa: 1e6,
  GPa: 1e9,
  psi: LBF / (INCH * INCH),
  ksi: (1000 * LBF) / (INCH * INCH),
};

/** One force unit in newtons. */
export const FORCE_UNIT_IN_NEWTONS: Record<ForceUnit, number> = { N: 1, kN: 1e3, MN: 1e6, lbf: LBF, kip: 1000 * LBF };

export const DEFAULT_STRESS_UNIT: StressUnit = 'MPa';
export const DEFAULT_FORCE_UNIT: ForceUnit = 'kN';

/** The units in which a load case is given and its stresses are shown. */
export interface LoadUnits {
  /** The document's length unit (coordinates). */
  length: Units;
  /** Unit of N and V. */
  force: ForceUnit;
  /** Unit of E, fy and every stress shown. */
  stress: StressUnit;
  /** Length unit of Mx and My (force × this); default: the document's length unit. */
  momentLength?: Units;
}

/** The value, in `u.stress`, of a stress of one force unit per square document length unit. */
export function stressFactor(u: LoadUnits): number {
  const L = UNIT_IN_METRES[u.length];
  return FORCE_UNIT_IN_NEWTONS[u.force] / (L * L) / STRESS_UNIT_IN_PASCALS[u.stress];
}

/** The factor that turns a moment in force × momentLength into force × document length. */
export function momentFactor(u: LoadUnits): number {
  const m = u.momentLength ?? u.length;
  return m === u.length ? 1 : UNIT_IN_METRES[m] / UNIT_IN_METRES[u.length];
}

/**
 * The factor that turns a moment in stress unit × length³ (for example fy × Z) into force ×
 * momentLength, the unit in which loads are entered.
 */
export function resistanceMomentFactor(u: LoadUnits): number {
  return 1 / (stressFactor(u) * momentFactor(u));
}

/** Converts a stress value from one stress unit to another. */
export function convertStress(value: number, from: StressUnit, to: StressUnit): number {
  return from === to ? value : (value * STRESS_UNIT_IN_PASCALS[from]) / STRESS_UNIT_IN_PASCALS[to];
}

/** Mass per length in kg/m of an area (in the document's unit²) of a given density (kg/m³). */
export function massPerLength(area: number, density: number, length: Units): number {
  const L = UNIT_IN_METRES[length];
  return area * L * L * density;
}

/** Text for a moment unit, e.g. 'kN·m'. */
export function momentUnitText(u: LoadUnits): string {
  return `${u.force}·${u.momentLength ?? u.length}`;
}
