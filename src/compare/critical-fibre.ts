/**
 * The elastic moduli to the critical fibre: the smaller of the two moduli about each axis,
 * Sx,min = min(Sx,top, Sx,bottom) = Ix / max(c_top, c_bottom), and Sy,min likewise, because the
 * extreme fibre farther from the neutral axis reaches the yield stress first (Gere & Goodno,
 * Mechanics of Materials, flexure formula σ = M c / I with c the larger fibre distance). A cutout
 * that shifts the centroid can lower one of the pair while raising the other, so a limit on the
 * loss of modulus is set on this one.
 *
 * They are catalogue-shaped rows (key, label, unit power, getter), so the catalogue can take them
 * over as they are; `comparisonCatalog` adds them only when the catalogue lacks them.
 */
import { PROPERTY_CATALOG, type PropertyInfo } from '../properties/catalog';

export const CRITICAL_FIBRE_PROPERTIES: readonly PropertyInfo[] = [
  { key: 'Sx_min', label: 'Elastic modulus x, critical fibre', symbol: 'Sx,min', power: 3, group: 'Section moduli', get: (p) => Math.min(p.Sx_top, p.Sx_bottom) },
  { key: 'Sy_min', label: 'Elastic modulus y, critical fibre', symbol: 'Sy,min', power: 3, group: 'Section moduli', get: (p) => Math.min(p.Sy_left, p.Sy_right) },
];

/** Every property the comparison lists: the catalogue, with the critical-fibre moduli after their pairs. */
export function comparisonCatalog(catalog: readonly PropertyInfo[] = PROPERTY_CATALOG): PropertyInfo[] {
  const out = [...catalog];
  for (const extra of CRITICAL_FIBRE_PROPERTIES) {
    if (out.some((i) => i.key === extra.key)) continue;
    const pairKey = extra.key === 'Sx_min' ? 'Sx_bottom' : 'Sy_right';
    const at = out.findIndex((i) => i.key === pairKey);
    out.splice(at >= 0 ? at + 1 : out.length, 0, extra);
  }
  return out;
}
