/**
 * The torsion settings a run uses, resolved from the document (src/document/torsion-settings.ts)
 * and any override (the CLI's --density and --poisson), with where Poisson's ratio came from so
 * the panel and the report can say it.
 */
import type { SectionDocument } from '../document/types';
import type { TorsionDensity } from '../torsion';

export interface ResolvedTorsionSettings {
  density: TorsionDensity;
  /** Poisson's ratio for the elastic shear centre. */
  poisson: number;
  poissonFrom: 'setting' | 'reference material' | 'default';
}

/** Poisson's ratio of a material when it gives none (steel and aluminium are near it; common practice, no source). */
export const DEFAULT_POISSON = 0.3;

export function resolveTorsionSettings(doc: Pick<SectionDocument, 'torsion' | 'materials' | 'reference'>, override: { density?: TorsionDensity; poisson?: number } = {}): ResolvedTorsionSettings {
  const density = override.density ?? doc.torsion?.density ?? 'normal';
  const set = override.poisson ?? doc.torsion?.poisson;
  if (set !== undefined) return { density, poisson: set, poissonFrom: 'setting' };
  const ref = doc.materials?.find((m) => m.id === doc.reference);
  if (ref?.nu !== undefined) return { density, poisson: ref.nu, poissonFrom: 'reference material' };
  return { density, poisson: DEFAULT_POISSON, poissonFrom: 'default' };
}

/** "ν = 0.3 (default)" and the like, for the panel and the report. */
export function poissonText(s: ResolvedTorsionSettings): string {
  const from = s.poissonFrom === 'setting' ? 'set for this section' : s.poissonFrom === 'reference material' ? "the reference material's" : 'default';
  return `ν = ${s.poisson} (${from})`;
}
