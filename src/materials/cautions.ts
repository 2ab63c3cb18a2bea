/**
 * The cautions printed with material, stress and kern results (panel, CLI, report): one wording,
 * shared, plus the specific ones the numbers call for (a stress beyond fy, rotated principal axes).
 */
import { formatNumber } from '../properties/catalog';
import type { StressExtremes } from './extremes';
import type { MixedSection } from './mixed';
import type { StressField } from './stress';

export { PLASTIC_CAUTION } from './plastic';
export { SHEAR_AVERAGE_CAUTION, SHEAR_ROTATED_CAUTION } from './shear';

export const TRANSFORMED_CAUTION =
  'The transformed section assumes full composite action (the materials are joined so that they cannot slip) and linear elastic materials.';

export const STRESS_CAUTION =
  'Stresses are elastic normal stresses from the bending formula. They ignore local buckling, shear lag, residual stresses and stress concentrations (holes, notches, re-entrant corners).';

export const KERN_CAUTION =
  'The kern holds for linear elastic behaviour of the whole section; a compressive load outside it causes tension, or opens a joint or crack that carries none.';

export const CODE_DEFERRAL = 'Check the design against the applicable code; the results must be reviewed by a licensed engineer.';

export const ROTATED_AXES_CAUTION =
  'The principal axes are rotated (Ixy ≠ 0): a moment about x also bends the section about y. The stresses use the general bending formula, which accounts for this; moduli S = I/c do not.';

/** Cautions for the properties of a section with materials. */
export function sectionCautions(section: MixedSection): string[] {
  const out: string[] = [];
  if (section.parts.length > 1) out.push(TRANSFORMED_CAUTION);
  out.push(CODE_DEFERRAL);
  return out;
}

/** Relative size under which Ixy counts as zero (as for θ in principal()). */
const ROTATED_TOL = 1e-9;

/** Cautions for a load case: the general ones, a stress beyond a material's fy, rotated axes. */
export function stressCautions(section: MixedSection, field: StressField, ext: StressExtremes): string[] {
  const out: string[] = [STRESS_CAUTION];
  if (section.parts.length > 1) out.push(TRANSFORMED_CAUTION);
  const t = section.transformed;
  if (Math.abs(t.Ixy) > ROTATED_TOL * Math.max(t.Ix, t.Iy)) out.push(ROTATED_AXES_CAUTION);
  const unit = field.units ? ` ${field.units.stress}` : '';
  for (const e of ext.byMaterial) {
    const m = field.parts.find((p) => p.material.id === e.material)?.material;
    if (!m || !field.units) continue; // fy is in the stress unit: compare only when stresses are in it too
    const worst = Math.abs(e.max.value) >= Math.abs(e.min.value) ? e.max : e.min;
    if (Math.abs(worst.value) > m.fy) {
      out.push(`In ${m.name || m.id} the stress reaches ${formatNumber(worst.value)}${unit}, beyond fy = ${formatNumber(m.fy)}${unit}: the elastic results no longer hold there.`);
    }
  }
  out.push(CODE_DEFERRAL);
  return out;
}
