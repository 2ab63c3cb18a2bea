/**
 * What the torsion results hold for, shown with them in the panel, the CLI and the report: the
 * scope of Saint-Venant torsion, the method, and the deferral to the code and a licensed engineer
 * (one wording each, shared).
 */
import { CODE_DEFERRAL } from '../materials/cautions';

export const TORSION_SCOPE =
  'J, the shear centre and Cw are those of uniform (Saint-Venant) torsion of a long straight member, found by finite elements. ' +
  'Restrained warping at supports and connections, distortion and local buckling of thin walls, and the stress concentration at the real corner radii are not included.';

export const TORSION_MIXED =
  'With several materials, J and Cw are weighted by the shear modulus G = E / (2(1 + ν)) of each material and expressed in the reference material; the materials are assumed bonded so that they cannot slip.';

export const TORSION_METHOD =
  'Torsion: the Saint-Venant warping function is solved on a quality triangle mesh of the exact outline (arcs become chords or curved element sides within a tolerance tied to the element size) ' +
  'with quadratic (6-node) triangles and a preconditioned conjugate-gradient solver. The section is solved on two meshes, the second with half the element size; ' +
  'the results are those of the finer mesh, and the change between the two, extrapolated at the order expected for the elements and the sharpest corner, estimates the error left in J. ' +
  'The shear centre is the elastic one (it depends on Poisson’s ratio); Cw is taken about the centre of twist (the shear centre for ν = 0).';

/** The engine's cautions for this geometry, then the general ones and the deferral. */
export function torsionCautions(engine: readonly string[], opts: { mixed: boolean; note: string | null }): string[] {
  const out = [...engine];
  if (opts.note) out.push(opts.note);
  if (opts.mixed) out.push(TORSION_MIXED);
  out.push(TORSION_SCOPE, CODE_DEFERRAL);
  return out;
}
