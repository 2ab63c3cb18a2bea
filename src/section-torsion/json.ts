/**
 * Torsion results for `props --torsion --json`: the keys the CLI promises (J, shear_center, Cw,
 * mesh, convergence) at the top level, everything else under `torsion`, at full precision.
 */
import type { SectionTorsion } from './compute';

type Ok = Extract<SectionTorsion, { ok: true }>;

export function torsionJson(t: Ok) {
  const r = t.result;
  const c = r.convergence;
  return {
    J: r.J,
    shear_center: { x: r.shearCentre.x, y: r.shearCentre.y },
    Cw: r.Cw,
    mesh: { nodes: r.mesh.nodes, elements: r.mesh.elements },
    convergence: {
      J_coarse: c.Jcoarse,
      J_fine: c.Jfine,
      relative_change: c.relativeChange,
      order: c.order,
      estimated_error: c.estimatedError,
      J_extrapolated: c.Jextrapolated,
      Cw_change: c.CwChange,
      shear_center_shift: c.shearCentreShift,
    },
    torsion: {
      density: t.settings.density,
      poisson: t.settings.poisson,
      poisson_from: t.settings.poissonFrom,
      center_of_twist: { x: r.centreOfTwist.x, y: r.centreOfTwist.y },
      coarse_mesh: { nodes: r.mesh.coarseNodes, elements: r.mesh.coarseElements },
      tau_max_per_unit_torque: r.stress.max,
      tau_max_at: { x: r.stress.at.x, y: r.stress.at.y },
      reference_material: t.basis.reference?.id ?? null,
      reference_G: t.basis.reference ? t.basis.referenceG : null,
      cautions: t.cautions,
    },
  };
}
