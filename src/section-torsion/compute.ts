/**
 * Torsion of a section document, as the CLI and the report run it (synchronously): the pieces by
 * material, the settings, the engine's run, and a record that carries everything the panel, the
 * report and the JSON print. The editor runs the engine in a worker and wraps its result with
 * `sectionTorsion` the same way.
 */
import type { SectionDocument } from '../document/types';
import type { Evaluation } from '../evaluate';
import { computeTorsion, TorsionError, type TorsionDensity, type TorsionResult } from '../torsion';
import { torsionCautions } from './cautions';
import { sectionPieces, type SectionPieces } from './pieces';
import { resolveTorsionSettings, type ResolvedTorsionSettings } from './settings';

export type TorsionBasis = Omit<SectionPieces, 'pieces'>;

export type SectionTorsion =
  | {
      ok: true;
      result: TorsionResult;
      settings: ResolvedTorsionSettings;
      basis: TorsionBasis;
      /** The engine's cautions for this geometry, then the scope and the deferral. */
      cautions: string[];
      /** Milliseconds the run took, when measured. */
      ms: number | null;
    }
  | { ok: false; message: string; settings: ResolvedTorsionSettings };

export function basisOf(p: SectionPieces): TorsionBasis {
  return { referenceG: p.referenceG, materials: p.materials, reference: p.reference, note: p.note };
}

/** Wrap an engine result with what the run used. */
export function sectionTorsion(result: TorsionResult, settings: ResolvedTorsionSettings, basis: TorsionBasis, ms: number | null = null): SectionTorsion {
  const mixed = (basis.materials ?? []).some((m) => m.G !== basis.referenceG);
  return { ok: true, result, settings, basis, cautions: torsionCautions(result.cautions, { mixed, note: basis.note }), ms };
}

/** Run torsion for the document's section now; a section the engine cannot take gives ok: false with the reason. */
export function computeSectionTorsion(
  doc: Pick<SectionDocument, 'torsion' | 'materials' | 'reference'>,
  evaluation: Pick<Evaluation, 'region' | 'materials'>,
  override: { density?: TorsionDensity; poisson?: number } = {},
): SectionTorsion {
  const settings = resolveTorsionSettings(doc, override);
  try {
    const p = sectionPieces(evaluation, doc);
    const t0 = Date.now();
    const result = computeTorsion(p.pieces, { density: settings.density, poisson: settings.poisson, referenceG: p.referenceG });
    return sectionTorsion(result, settings, basisOf(p), Date.now() - t0);
  } catch (e) {
    if (!(e instanceof TorsionError)) throw e;
    return { ok: false, message: e.message, settings };
  }
}
