/**
 * Torsion settings kept in the document (format version 2, optional `torsion`): when present, the
 * section's results include the torsion constant, the shear centre and the warping constant by
 * finite elements (src/torsion/), in the panel and in the report, with these settings:
 *
 *   "torsion": { "density": "normal", "poisson": 0.3 }
 *
 * `density` is the mesh density (coarse, normal or fine; normal when absent); `poisson` is the
 * Poisson's ratio used for the elastic shear centre (when absent: the reference material's ν if
 * it has one, else 0.3). They are in the document, not in the view, because the report states
 * them and a checker must be able to repeat the run.
 */
import { fmtValue, isObj, type Issue } from '../shapes/check';

export const TORSION_DENSITIES = ['coarse', 'normal', 'fine'] as const;
export type TorsionDensitySetting = (typeof TORSION_DENSITIES)[number];

export interface TorsionSettings {
  density?: TorsionDensitySetting;
  poisson?: number;
}

/** Poisson's ratio accepted for the shear centre: 0 ≤ ν < 0.5 (as for a material's ν). */
export function poissonIssue(v: unknown): string | null {
  if (typeof v !== 'number' || !Number.isFinite(v) || !(v >= 0 && v < 0.5)) return `Poisson's ratio must be a number of at least 0 and below 0.5, got ${fmtValue(v)}`;
  return null;
}

/** Validate `torsion` of a document object, every problem with its path. */
export function validateTorsionSettings(doc: Record<string, unknown>, out: Issue[]): void {
  const t = doc.torsion;
  if (t === undefined) return;
  if (!isObj(t)) {
    out.push({ path: 'torsion', message: 'torsion must be an object like {"density": "normal", "poisson": 0.3}' });
    return;
  }
  for (const key of Object.keys(t)) if (key !== 'density' && key !== 'poisson') out.push({ path: `torsion.${key}`, message: 'unknown field; torsion has density and poisson' });
  if (t.density !== undefined && !(TORSION_DENSITIES as readonly unknown[]).includes(t.density)) out.push({ path: 'torsion.density', message: `unknown mesh density ${fmtValue(t.density)}; use ${TORSION_DENSITIES.join(', ')}` });
  if (t.poisson !== undefined) {
    const p = poissonIssue(t.poisson);
    if (p) out.push({ path: 'torsion.poisson', message: p });
  }
}
