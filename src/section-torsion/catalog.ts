/**
 * Every torsion result shown to people, as one list (like src/properties/catalog.ts for the
 * section properties): its key (the panel's data-prop), label, symbol and length power, formatted
 * by the one number formatter, so the panel, the CLI table and the report print the same digits.
 */
import type { Units } from '../document/types';
import { formatNumber, formatQuantity, unitText } from '../properties/catalog';
import type { TorsionResult } from '../torsion';

export interface TorsionRowInfo {
  key: string;
  label: string;
  symbol: string;
  /** Power of length (J 4, Cw 6, a position 1); 'count' for mesh sizes, 'percent' for the estimate. */
  power: number | 'count' | 'percent' | 'per-torque';
  get(r: TorsionResult, centroid: { x: number; y: number }): number;
}

export const TORSION_CATALOG: readonly TorsionRowInfo[] = [
  { key: 'torsion.J', label: 'Torsion constant', symbol: 'J', power: 4, get: (r) => r.J },
  { key: 'torsion.shearCentre.x', label: 'Shear centre x', symbol: 'xs', power: 1, get: (r) => r.shearCentre.x },
  { key: 'torsion.shearCentre.y', label: 'Shear centre y', symbol: 'ys', power: 1, get: (r) => r.shearCentre.y },
  { key: 'torsion.shearCentre.dx', label: 'Shear centre from the centroid, x', symbol: 'x0', power: 1, get: (r, c) => r.shearCentre.x - c.x },
  { key: 'torsion.shearCentre.dy', label: 'Shear centre from the centroid, y', symbol: 'y0', power: 1, get: (r, c) => r.shearCentre.y - c.y },
  { key: 'torsion.Cw', label: 'Warping constant, about the centre of twist', symbol: 'Cw', power: 6, get: (r) => r.Cw },
  { key: 'torsion.centreOfTwist.x', label: 'Centre of twist x', symbol: 'xt', power: 1, get: (r) => r.centreOfTwist.x },
  { key: 'torsion.centreOfTwist.y', label: 'Centre of twist y', symbol: 'yt', power: 1, get: (r) => r.centreOfTwist.y },
  { key: 'torsion.tauMax', label: 'Peak shear stress per unit torque', symbol: 'τmax/T', power: 'per-torque', get: (r) => r.stress.max },
  { key: 'torsion.mesh.nodes', label: 'Mesh nodes (finer mesh)', symbol: 'nodes', power: 'count', get: (r) => r.mesh.nodes },
  { key: 'torsion.mesh.elements', label: 'Quadratic elements (finer mesh)', symbol: 'elements', power: 'count', get: (r) => r.mesh.elements },
  { key: 'torsion.convergence.change', label: 'Change of J, coarse to finer mesh', symbol: 'ΔJ', power: 'percent', get: (r) => 100 * r.convergence.relativeChange },
  { key: 'torsion.convergence.error', label: 'Estimated error of J', symbol: 'εJ', power: 'percent', get: (r) => 100 * r.convergence.estimatedError },
];

export interface TorsionRow {
  key: string;
  label: string;
  symbol: string;
  text: string;
  unit: string;
  /** Full precision. */
  value: number;
}

/** Rows for a result: `size` is the section's larger side (round-off zero), `centroid` the section's. */
export function torsionRows(r: TorsionResult, units: Units, size: number, centroid: { x: number; y: number }): TorsionRow[] {
  return TORSION_CATALOG.map((info) => {
    const value = info.get(r, centroid);
    let text: string, unit: string;
    if (info.power === 'count') {
      text = String(value);
      unit = '';
    } else if (info.power === 'percent') {
      text = formatNumber(value, 2);
      unit = '%';
    } else if (info.power === 'per-torque') {
      text = formatNumber(value);
      unit = `${units}⁻³`;
    } else {
      text = formatQuantity(value, info.power, size);
      unit = unitText(units, info.power);
    }
    return { key: info.key, label: info.label, symbol: info.symbol, text, unit, value };
  });
}
