/**
 * Every reported property: its key (as in the CLI's --json and the panel's data-prop), a label,
 * its length dimension (area is length², Ix is length⁴, θ has none), and one formatting function
 * that the panel, the CLI table and the report all use, so their digits always agree.
 */
import type { Units } from '../units';
import type { SectionProperties } from './section';

export interface PropertyInfo {
  key: string;
  label: string;
  symbol: string;
  /** Power of length: 1 = length, 2 = area, 3 = modulus, 4 = inertia; 0 with `unit` for angles. */
  power: number;
  unit?: string;
  group: 'Area and centroid' | 'Second moments' | 'Principal axes' | 'Radii of gyration' | 'Section moduli' | 'Extent';
  get(p: SectionProperties): number;
}

export const PROPERTY_CATALOG: readonly PropertyInfo[] = [
  { key: 'area', label: 'Area', symbol: 'A', power: 2, group: 'Area and centroid', get: (p) => p.area },
  { key: 'centroid.x', label: 'Centroid x', symbol: 'x̄', power: 1, group: 'Area and centroid', get: (p) => p.centroid.x },
  { key: 'centroid.y', label: 'Centroid y', symbol: 'ȳ', power: 1, group: 'Area and centroid', get: (p) => p.centroid.y },
  { key: 'Qx', label: 'First moment about x axis', symbol: 'Qx', power: 3, group: 'Area and centroid', get: (p) => p.Qx },
  { key: 'Qy', label: 'First moment about y axis', symbol: 'Qy', power: 3, group: 'Area and centroid', get: (p) => p.Qy },
  { key: 'Ix', label: 'Moment of inertia, centroidal x', symbol: 'Ix', power: 4, group: 'Second moments', get: (p) => p.Ix },
  { key: 'Iy', label: 'Moment of inertia, centroidal y', symbol: 'Iy', power: 4, group: 'Second moments', get: (p) => p.Iy },
  { key: 'Ixy', label: 'Product of inertia', symbol: 'Ixy', power: 4, group: 'Second moments', get: (p) => p.Ixy },
  { key: 'J0', label: 'Polar moment, centroidal', symbol: 'J0', power: 4, group: 'Second moments', get: (p) => p.J0 },
  { key: 'I1', label: 'Major principal moment', symbol: 'I1', power: 4, group: 'Principal axes', get: (p) => p.I1 },
  { key: 'I2', label: 'Minor principal moment', symbol: 'I2', power: 4, group: 'Principal axes', get: (p) => p.I2 },
  { key: 'theta', label: 'Angle of I1 axis from x', symbol: 'θ', power: 0, unit: '°', group: 'Principal axes', get: (p) => p.theta },
  { key: 'rx', label: 'Radius of gyration x', symbol: 'rx', power: 1, group: 'Radii of gyration', get: (p) => p.rx },
  { key: 'ry', label: 'Radius of gyration y', symbol: 'ry', power: 1, group: 'Radii of gyration', get: (p) => p.ry },
  { key: 'r1', label: 'Radius of gyration, major', symbol: 'r1', power: 1, group: 'Radii of gyration', get: (p) => p.r1 },
  { key: 'r2', label: 'Radius of gyration, minor', symbol: 'r2', power: 1, group: 'Radii of gyration', get: (p) => p.r2 },
  { key: 'Sx_top', label: 'Elastic modulus x, top fibre', symbol: 'Sx,top', power: 3, group: 'Section moduli', get: (p) => p.Sx_top },
  { key: 'Sx_bottom', label: 'Elastic modulus x, bottom fibre', symbol: 'Sx,bot', power: 3, group: 'Section moduli', get: (p) => p.Sx_bottom },
  { key: 'Sy_left', label: 'Elastic modulus y, left fibre', symbol: 'Sy,left', power: 3, group: 'Section moduli', get: (p) => p.Sy_left },
  { key: 'Sy_right', label: 'Elastic modulus y, right fibre', symbol: 'Sy,right', power: 3, group: 'Section moduli', get: (p) => p.Sy_right },
  { key: 'Zx', label: 'Plastic modulus x', symbol: 'Zx', power: 3, group: 'Section moduli', get: (p) => p.Zx },
  { key: 'Zy', label: 'Plastic modulus y', symbol: 'Zy', power: 3, group: 'Section moduli', get: (p) => p.Zy },
  { key: 'plasticAxis.y', label: 'Plastic neutral axis, y', symbol: 'yp', power: 1, group: 'Section moduli', get: (p) => p.plasticAxis.y },
  { key: 'plasticAxis.x', label: 'Plastic neutral axis, x', symbol: 'xp', power: 1, group: 'Section moduli', get: (p) => p.plasticAxis.x },
  { key: 'bounds.xmin', label: 'Extent x min', symbol: 'xmin', power: 1, group: 'Extent', get: (p) => p.bounds.xmin },
  { key: 'bounds.xmax', label: 'Extent x max', symbol: 'xmax', power: 1, group: 'Extent', get: (p) => p.bounds.xmax },
  { key: 'bounds.ymin', label: 'Extent y min', symbol: 'ymin', power: 1, group: 'Extent', get: (p) => p.bounds.ymin },
  { key: 'bounds.ymax', label: 'Extent y max', symbol: 'ymax', power: 1, group: 'Extent', get: (p) => p.bounds.ymax },
  { key: 'perimeter', label: 'Perimeter', symbol: 'P', power: 1, group: 'Extent', get: (p) => p.perimeter },
];

const SUPERSCRIPT: Record<number, string> = { 1: '', 2: '²', 3: '³', 4: '⁴', 5: '⁵', 6: '⁶' };

/** Unit text for a length power: unitText('mm', 4) = 'mm⁴'. */
export function unitText(units: Units, power: number, unit?: string): string {
  if (power === 0) return unit ?? '';
  return units + (SUPERSCRIPT[power] ?? `^${power}`);
}

/** Significant figures shown everywhere (panel, CLI table, report). */
export const DISPLAY_SIGFIGS = 6;

/**
 * The one number formatter: `sig` significant figures, plain notation between 1e-4 and 1e9,
 * scientific outside; values that are zero to round-off relative to `scale` print as 0.
 */
export function formatNumber(v: number, sig = DISPLAY_SIGFIGS, scale = 0): string {
  if (!Number.isFinite(v)) return '—';
  if (v === 0 || (scale > 0 && Math.abs(v) < scale * 1e-12)) return '0';
  const a = Math.abs(v);
  if (a >= 1e-4 && a < 1e9) {
    const digits = Math.max(0, sig - 1 - Math.floor(Math.log10(a)));
    let s = v.toFixed(Math.min(digits, 20));
    if (s.includes('.')) s = s.replace(/0+$/, '').replace(/\.$/, '');
    return s === '-0' ? '0' : s;
  }
  const [m, e] = v.toExponential(sig - 1).split('e');
  const mant = m.includes('.') ? m.replace(/0+$/, '').replace(/\.$/, '') : m;
  return `${mant}e${e.replace('+', '')}`;
}

/**
 * Format one property for display: text and unit. `scale` lets values that are zero up to
 * round-off (a product of inertia of a symmetric section) print as 0: it is the size of the
 * property's natural magnitude (e.g. J0 for inertias).
 */
export function formatProperty(info: PropertyInfo, p: SectionProperties, units: Units): { text: string; unit: string; value: number } {
  const value = info.get(p);
  const L = Math.max(p.bounds.xmax - p.bounds.xmin, p.bounds.ymax - p.bounds.ymin);
  const scale = info.power === 0 ? 90 : Math.pow(L, info.power);
  return { text: formatNumber(value, DISPLAY_SIGFIGS, scale), unit: unitText(units, info.power, info.unit), value };
}

/** A property's value by its key ('centroid.x', 'Ix', ...), or undefined. */
export function propertyByKey(p: SectionProperties, key: string): number | undefined {
  const info = PROPERTY_CATALOG.find((i) => i.key === key);
  return info ? info.get(p) : undefined;
}
