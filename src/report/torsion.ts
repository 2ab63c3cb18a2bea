/**
 * The report's torsion block: J, the shear centre and Cw by finite elements, with the mesh, the
 * convergence estimate, the settings the run used and its cautions. The run is made when the
 * report is made (the caller passes its result); the figure marks the shear centre S.
 */
import type { Units } from '../document/types';
import { formatNumber, formatQuantity, unitText } from '../properties/catalog';
import { percentText, poissonText, torsionRows, TORSION_METHOD, type SectionTorsion } from '../section-torsion';
import { escapeHtml } from './escape';

const e = escapeHtml;

/** The sharpest corner angle the extrapolation order implies, for the sentence that explains it. */
function orderText(order: number): string {
  if (order >= 4 - 1e-9) return 'order 4 (smooth outline, or corners of at most 90°)';
  // order = 2π/φ for a corner angle φ above 90° (src/torsion/convergence.ts).
  const corner = (360 / order).toFixed(0);
  return `order ${formatNumber(order, 3)} (sharpest corner ${corner}°)`;
}

export function renderTorsionSection(t: SectionTorsion, units: Units, size: number, centroid: { x: number; y: number }): string {
  const head = `<h2>Torsion, shear centre and warping constant</h2>`;
  if (!t.ok) {
    return `<section class="block torsion" data-torsion="failed">${head}<p class="qb-caution">Torsion could not be computed (${e(t.settings.density)} mesh density): ${e(t.message)}</p></section>`;
  }
  const r = t.result;
  const c = r.convergence;
  const rows: string[] = [];
  let group = '';
  for (const row of torsionRows(r, units, size, centroid)) {
    if (row.group !== group) {
      group = row.group;
      rows.push(`<tr class="group"><th colspan="4">${e(group)}</th></tr>`);
    }
    rows.push(`<tr data-prop="${e(row.key)}"><td>${e(row.label)}</td><td>${e(row.symbol)}</td><td class="num" data-value="${e(row.text)}">${e(row.text)}</td><td>${e(row.unit)}</td></tr>`);
  }
  // Two columns, like the property tables: J and the shear centre left, the rest right.
  const split = rows.findIndex((x, k) => k > 0 && x.startsWith('<tr class="group"><th colspan="4">Warping'));
  const table = (part: string[]) => `<table class="props"><thead><tr><th>Property</th><th>Symbol</th><th>Value</th><th>Unit</th></tr></thead><tbody>${part.join('')}</tbody></table>`;
  const J = (v: number) => formatQuantity(v, 4, size);
  const settings =
    `Computed when this report was made: ${t.settings.density} mesh density, ${r.mesh.nodes} nodes and ${r.mesh.elements} quadratic elements on the finer mesh ` +
    `(${r.mesh.coarseNodes} nodes, ${r.mesh.coarseElements} elements on the coarser); ${poissonText(t.settings)} for the shear centre` +
    (t.basis.reference ? `; J and Cw are expressed in the reference material ${t.basis.reference.name} (G = ${formatNumber(t.basis.referenceG)})` : '') +
    '.';
  const convergence =
    `Convergence: J = ${J(c.Jcoarse)} ${unitText(units, 4)} on the coarser mesh and ${J(c.Jfine)} ${unitText(units, 4)} on the finer, a change of ${percentText(100 * c.relativeChange)} %. ` +
    `Extrapolated at ${orderText(c.order)}, the error left in J is about ${percentText(100 * c.estimatedError)} % (J → ${J(c.Jextrapolated)} ${unitText(units, 4)}). ` +
    `Between the meshes the shear centre moved ${percentText(100 * c.shearCentreShift)} % of the section size and Cw changed ${percentText(100 * c.CwChange)} %.`;
  const stress = `Peak shear stress under a torque T: τmax = ${formatNumber(r.stress.max)} × T ${e(units)}⁻³, at (${formatQuantity(r.stress.at.x, 1, size)}, ${formatQuantity(r.stress.at.y, 1, size)}).`;
  return (
    `<section class="block torsion" data-torsion="ok" data-density="${e(t.settings.density)}">${head}` +
    `<p class="small" data-note="torsion-settings">${e(settings)}</p>` +
    `<div class="cols">${table(rows.slice(0, split))}${table(rows.slice(split))}</div>` +
    `<p class="small" data-note="torsion-convergence">${e(convergence)}</p>` +
    `<p class="small">${e(stress)}</p>` +
    `<ul class="small torsion-cautions">${t.cautions.map((x) => `<li>${e(x)}</li>`).join('')}</ul>` +
    `<p class="small">${e(TORSION_METHOD)}</p>` +
    `</section>`
  );
}
