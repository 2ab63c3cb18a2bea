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
  group: TorsionGroup;
  label: string;
  symbol: string;
  /** Power of length (J 4, Cw 6, a position 1); 'count' for mesh sizes, 'percent' for the estimate. */
  power: number | 'count' | 'percent' | 'per-torque';
  get(r: TorsionResult, centroid: { x: number; y: number }): number;
}

export type TorsionGroup = 'Torsion' | 'Shear centre' | 'Warping, about the centre of twist' | 'Shear stress' | 'Mesh and convergence';

export const TORSION_CATALOG: readonly TorsionRowInfo[] = [
  { key: 'torsion.J', group: 'Torsion', label: 'Torsion constant', symbol: 'J', power: 4, get: (r) => r.J },
  { key: 'torsion.shearCentre.x', group: 'Shear centre', label: 'Shear centre x', symbol: 'xs', power: 1, get: (r) => r.shearCentre.x },
  { key: 'torsion.shearCentre.y', group: 'Shear centre', label: 'Shear centre y', symbol: 'ys', power: 1, get: (r) => r.shearCentre.y },
  { key: 'torsion.shearCentre.dx', group: 'Shear centre', label: 'Offset from the centroid, x', symbol: 'x0', power: 1, get: (r, c) => r.shearCentre.x - c.x },
  { key: 'torsion.shearCentre.dy', group: 'Shear centre', label: 'Offset from the centroid, y', symbol: 'y0', power: 1, get: (r, c) => r.shearCentre.y - c.y },
  { key: 'torsion.Cw', group: 'Warping, about the centre of twist', label: 'Warping constant', symbol: 'Cw', power: 6, get: (r) => r.Cw },
  { key: 'torsion.centreOfTwist.x', group: 'Warping, about the centre of twist', label: 'Centre of twist x', symbol: 'xt', power: 1, get: (r) => r.centreOfTwist.x },
  { key: 'torsion.centreOfTwist.y', group: 'Warping, about the centre of twist', label: 'Centre of twist y', symbol: 'yt', power: 1, get: (r) => r.centreOfTwist.y },
  { key: 'torsion.tauMax', group: 'Shear stress', label: 'Peak |τ| per unit torque', symbol: 'τmax/T', power: 'per-torque', get: (r) => r.stress.max },
  { key: 'torsion.mesh.nodes', group: 'Mesh and convergence', label: 'Nodes, finer mesh', symbol: 'nodes', power: 'count', get: (r) => r.mesh.nodes },
  { key: 'torsion.mesh.elements', group: 'Mesh and convergence', label: '6-node elements, finer mesh', symbol: 'elem.', power: 'count', get: (r) => r.mesh.elements },
  { key: 'torsion.convergence.change', group: 'Mesh and convergence', label: 'Change of J, coarse to finer', symbol: 'ΔJ', power: 'percent', get: (r) => 100 * r.convergence.relativeChange },
  { key: 'torsion.convergence.error', group: 'Mesh and convergence', label: 'Estimated error of J', symbol: 'εJ', power: 'percent', get: (r) => 100 * r.convergence.estimatedError },
];

/** A small percentage as people read it: 2 significant figures, and "< 0.001" below that (no powers of ten). */
export function percentText(v: number): string {
  return Number.isFinite(v) && Math.abs(v) < 0.001 ? (v === 0 ? '0' : '< 0.001') : formatNumber(v, 2);
}

export interface TorsionRow {
  key: string;
  group: TorsionGroup;
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
      text = percentText(value);
      unit = '%';
    } else if (info.power === 'per-torque') {
      text = formatNumber(value);
      unit = `${units}⁻³`;
    } else {
      text = formatQuantity(value, info.power, size);
      unit = unitText(units, info.power);
    }
    return { key: info.key, group: info.group, label: info.label, symbol: info.symbol, text, unit, value };
  });
}
