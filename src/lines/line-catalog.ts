/**
 * Every reported property of a line group (per unit thickness, per unit throat for a weld): its
 * key (the panel's `data-line="<group>.<key>"`, the CLI's JSON), label, symbol and power of
 * length, formatted by the one number formatter (src/properties/catalog.ts), so the panel, the
 * CLI table and the report show the same digits. Powers: the length and the centroid L, the
 * second moments L³ (L⁴ per unit thickness), the line section moduli L².
 */
import { DISPLAY_SIGFIGS, formatNumber, formatQuantity, sectionSize, unitText } from '../properties/catalog';
import type { Units } from '../units';
import type { LineProperties } from './line-properties';

export interface LinePropertyInfo {
  key: string;
  label: string;
  symbol: string;
  /** Power of length (0 with `unit` for the angle). */
  power: number;
  unit?: string;
  group: 'Length and centroid' | 'Second moments' | 'Principal axes' | 'Line section moduli';
  /** Null where the value does not exist (a modulus to a fibre on the axis). */
  get(p: LineProperties): number | null;
}

export const LINE_PROPERTY_CATALOG: readonly LinePropertyInfo[] = [
  { key: 'length', label: 'Length', symbol: 'L', power: 1, group: 'Length and centroid', get: (p) => p.length },
  { key: 'centroid.x', label: 'Centroid x', symbol: 'x̄', power: 1, group: 'Length and centroid', get: (p) => p.centroid.x },
  { key: 'centroid.y', label: 'Centroid y', symbol: 'ȳ', power: 1, group: 'Length and centroid', get: (p) => p.centroid.y },
  { key: 'Ix', label: 'Second moment, centroidal x', symbol: 'Ix', power: 3, group: 'Second moments', get: (p) => p.Ix },
  { key: 'Iy', label: 'Second moment, centroidal y', symbol: 'Iy', power: 3, group: 'Second moments', get: (p) => p.Iy },
  { key: 'Ixy', label: 'Product moment', symbol: 'Ixy', power: 3, group: 'Second moments', get: (p) => p.Ixy },
  { key: 'J', label: 'Polar moment, centroidal', symbol: 'J', power: 3, group: 'Second moments', get: (p) => p.J },
  { key: 'I1', label: 'Major principal moment', symbol: 'I1', power: 3, group: 'Principal axes', get: (p) => p.I1 },
  { key: 'I2', label: 'Minor principal moment', symbol: 'I2', power: 3, group: 'Principal axes', get: (p) => p.I2 },
  { key: 'theta', label: 'Angle of I1 axis from x', symbol: 'θ', power: 0, unit: '°', group: 'Principal axes', get: (p) => p.theta },
  { key: 'Sx_top', label: 'Line modulus x, top', symbol: 'Sx,top', power: 2, group: 'Line section moduli', get: (p) => p.Sx_top },
  { key: 'Sx_bottom', label: 'Line modulus x, bottom', symbol: 'Sx,bot', power: 2, group: 'Line section moduli', get: (p) => p.Sx_bottom },
  { key: 'Sy_left', label: 'Line modulus y, left', symbol: 'Sy,left', power: 2, group: 'Line section moduli', get: (p) => p.Sy_left },
  { key: 'Sy_right', label: 'Line modulus y, right', symbol: 'Sy,right', power: 2, group: 'Line section moduli', get: (p) => p.Sy_right },
];

/** One line property for display: text, unit and the full-precision value (NaN where it does not exist). */
export function formatLineProperty(info: LinePropertyInfo, p: LineProperties, units: Units): { text: string; unit: string; value: number } {
  const v = info.get(p);
  const unit = unitText(units, info.power, info.unit);
  if (v === null) return { text: '—', unit, value: NaN };
  const text = info.power === 0 ? formatNumber(v, DISPLAY_SIGFIGS, 90) : formatQuantity(v, info.power, sectionSize(p.bounds));
  return { text, unit, value: v };
}

export type LineJson = { [key: string]: number | null | LineJson };

/** A line group's properties as JSON at full precision: `centroid.x` becomes `centroid: {x}`. */
export function linePropertiesJson(p: LineProperties): LineJson {
  const out: LineJson = {};
  for (const info of LINE_PROPERTY_CATALOG) {
    const path = info.key.split('.');
    let node = out;
    for (const k of path.slice(0, -1)) node = (node[k] ??= {}) as LineJson;
    node[path[path.length - 1]] = info.get(p);
  }
  out.bounds = { ...p.bounds };
  return out;
}
