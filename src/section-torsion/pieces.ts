/**
 * The section as torsion pieces: one region per material with its shear modulus
 * G = E / (2(1 + ν)) (ν of the material, 0.3 when it gives none), J and Cw then come out in the
 * reference material, like the transformed section; without materials, the one region with G = 1.
 *
 * Takes the evaluator's results (plain data), so the CLI, the report and the editor's torsion
 * worker build the same pieces.
 */
import type { Evaluation } from '../evaluate';
import type { Region } from '../geometry/contour';
import type { Material } from '../materials/material';
import { regionMoments } from '../moments/kernel';
import type { SectionDocument } from '../document/types';
import { TorsionError, type TorsionPiece } from '../torsion';
import { DEFAULT_POISSON } from './settings';

export interface PieceMaterial {
  id: string;
  name: string;
  G: number;
  nu: number;
}

export interface SectionPieces {
  pieces: TorsionPiece[];
  /** The shear modulus J and Cw are relative to (1 without materials). */
  referenceG: number;
  /** The material of each piece (null without materials). */
  materials: PieceMaterial[] | null;
  reference: PieceMaterial | null;
  /** Why the materials were not used, when the document has some but they could not be composed. */
  note: string | null;
}

export function shearModulus(m: Pick<Material, 'E' | 'nu'>): number {
  return m.E / (2 * (1 + (m.nu ?? DEFAULT_POISSON)));
}

function pieceMaterial(m: Material): PieceMaterial {
  return { id: m.id, name: m.name, G: shearModulus(m), nu: m.nu ?? DEFAULT_POISSON };
}

const hasArea = (region: Region) => region.length > 0 && regionMoments(region).m00 > 0;

export function sectionPieces(evaluation: Pick<Evaluation, 'region' | 'materials'>, doc: Pick<SectionDocument, 'materials' | 'reference'>): SectionPieces {
  if (!hasArea(evaluation.region)) throw new TorsionError('the section has no area, so it has no torsion constant');
  const mats = evaluation.materials;
  const list = doc.materials ?? [];
  const ref = list.find((m) => m.id === doc.reference);
  if (mats && mats.section && ref) {
    const used = mats.regions.filter((r) => hasArea(r.region));
    const byId = new Map(list.map((m) => [m.id, m]));
    if (used.length > 0 && used.every((r) => byId.has(r.material))) {
      const materials = used.map((r) => pieceMaterial(byId.get(r.material)!));
      const reference = pieceMaterial(ref);
      return { pieces: used.map((r, k) => ({ region: r.region, G: materials[k].G })), referenceG: reference.G, materials, reference, note: null };
    }
  }
  const note = list.length > 0 ? `The materials were not used for torsion${mats?.message ? ` (${mats.message.replace(/\.$/, '')})` : ''}: one material is assumed.` : null;
  return { pieces: [{ region: evaluation.region, G: 1 }], referenceG: 1, materials: null, reference: null, note };
}
