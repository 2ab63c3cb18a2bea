/**
 * Every reported property: its key (as in the CLI's --json and the panel's data-prop), a label,
 * its length dimension (area is length², Ix is length⁴, θ has none), and the one number formatter
 * that the panel, the CLI table and the report all use, so their digits always agree. The JSON
 * output never goes through it: it keeps full precision.
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

/** Significant figures of every computed result shown (panel, CLI table, report, Q/b values). */
export const DISPLAY_SIGFIGS = 4;

/**
 * Significant figures of input geometry shown back to people (coordinates, radii, dimensions on
 * the figure, the report's geometry schedule): enough that a checker can rebuild the section and
 * match its area to the DISPLAY_SIGFIGS shown.
 */
export const GEOMETRY_SIGFIGS = 6;

/**
 * A value whose size is below ZERO_RELATIVE × its natural magnitude (Lⁿ for a value with n
 * powers of length, L the larger side of the section's bounding box) is round-off, and shows as 0.
 * The engine is exact to about 1e-13 relative to that magnitude near the origin; round-off grows
 * with the section's distance from the origin (about eps × distance/L), so 1e-10 keeps a section up
 * to ~1e5 sizes away clean while no value a drafter could mean is ever hidden.
 */
export const ZERO_RELATIVE = 1e-10;

const SUP_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const SUP_MINUS = '⁻';
/** Between the mantissa and the power of ten: "5.369 × 10⁶". */
const TIMES_TEN = ' × 10';

/** An integer in superscript digits: superscript(-10) = '⁻¹⁰'. */
export function superscript(n: number): string {
  const s = String(Math.abs(n))
    .split('')
    .map((d) => SUP_DIGITS[Number(d)])
    .join('');
  return n < 0 ? SUP_MINUS + s : s;
}

/** Decimal digits `ds` (a string) with the point after `intDigits` of them; trailing zeros after the point dropped. */
function placePoint(ds: string, intDigits: number): string {
  let s: string;
  if (intDigits <= 0) s = '0.' + '0'.repeat(-intDigits) + ds;
  else if (intDigits >= ds.length) s = ds + '0'.repeat(intDigits - ds.length);
  else s = ds.slice(0, intDigits) + '.' + ds.slice(intDigits);
  if (s.includes('.')) s = s.replace(/0+$/, '').replace(/\.$/, '');
  return s;
}

/**
 * The one number formatter. The rule, as the report's method note states it:
 * - rounded to `sig` significant figures (correctly rounded from the binary value); zeros after
 *   the decimal point that carry nothing are dropped (2.5, not 2.500);
 * - plain notation from 0.001 up to the largest value whose integer digits fit in `sig` figures
 *   (9999 at 4 figures), engineering notation outside that range: a mantissa from 1 to 999.9…
 *   times a power of ten that is a multiple of 3, written "5.369 × 10⁶", "246.1 × 10⁶",
 *   "12.5 × 10⁻⁶";
 * - 0 for a value whose size is at most `scale` × ZERO_RELATIVE (round-off; pass the value's natural
 *   magnitude as `scale`, see formatQuantity); "—" for a value that is not finite.
 * Negative values carry an ASCII minus.
 */
export function formatNumber(v: number, sig = DISPLAY_SIGFIGS, scale = 0): string {
  if (!Number.isFinite(v)) return '—';
  const figures = Math.min(17, Math.max(1, Math.round(Number.isFinite(sig) ? sig : DISPLAY_SIGFIGS)));
  if (v === 0 || (scale > 0 && Math.abs(v) <= scale * ZERO_RELATIVE)) return '0';
  // toExponential rounds correctly and carries (9.9996e3 at 4 figures is "1.000e+4").
  const [m, e] = Math.abs(v).toExponential(figures - 1).split('e');
  const exp = Number(e);
  const ds = m.replace('.', '');
  const sign = v < 0 ? '-' : '';
  if (exp >= -3 && exp < Math.max(figures, 1)) return sign + placePoint(ds, exp + 1);
  const e3 = 3 * Math.floor(exp / 3);
  return `${sign}${placePoint(ds, exp - e3 + 1)}${TIMES_TEN}${superscript(e3)}`;
}

/**
 * A value with `power` powers of length (1 length, 2 area, 3 first moment or modulus, 4 second
 * moment) in a section whose larger bounding-box side is `size`: formatNumber with the zero
 * tolerance ZERO_RELATIVE × size^power. With size ≤ 0 or power 0 no value is taken for round-off.
 */
export function formatQuantity(v: number, power: number, size: number, sig = DISPLAY_SIGFIGS): string {
  const scale = size > 0 && power > 0 ? Math.pow(size, power) : 0;
  return formatNumber(v, sig, Number.isFinite(scale) ? scale : 0);
}

/** The section's size for zero tolerances: the larger side of its bounding box (0 if none). */
export function sectionSize(b: { xmin: number; xmax: number; ymin: number; ymax: number } | null | undefined): number {
  if (!b) return 0;
  const s = Math.max(b.xmax - b.xmin, b.ymax - b.ymin);
  return Number.isFinite(s) && s > 0 ? s : 0;
}

/**
 * The number a formatted text stands for (the inverse of formatNumber up to its rounding):
 * "5.369 × 10⁶" → 5369000, "-0.25" → −0.25, "—" → NaN. For tests and for tools that read the panel
 * or the report; anything else gives NaN.
 */
export function parseFormatted(text: string): number {
  const t = text.trim().replace(/\u2212/g, '-');
  const m = /^(-?\d+(?:\.\d+)?)(?:\s*×\s*10([⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+))?$/.exec(t);
  if (!m) return NaN;
  if (m[2] === undefined) return Number(m[1]);
  const exp = Number(
    m[2]
      .split('')
      .map((ch) => (ch === SUP_MINUS ? '-' : String(SUP_DIGITS.indexOf(ch))))
      .join(''),
  );
  // Through a decimal string, so "5.369 × 10⁶" is exactly the double nearest 5.369e6.
  return Number(`${m[1]}e${exp}`);
}

/**
 * Format one property for display: text and unit. Values that are zero up to round-off (a
 * product of inertia of a symmetric section, the centroid of a section centred on the origin)
 * print as 0: the tolerance is ZERO_RELATIVE × L^power with L the section's larger side; for the
 * angle θ it is ZERO_RELATIVE × 90°.
 */
export function formatProperty(info: PropertyInfo, p: SectionProperties, units: Units): { text: string; unit: string; value: number } {
  const value = info.get(p);
  const text = info.power === 0 ? formatNumber(value, DISPLAY_SIGFIGS, 90) : formatQuantity(value, info.power, sectionSize(p.bounds));
  return { text, unit: unitText(units, info.power, info.unit), value };
}

/** A property's value by its key ('centroid.x', 'Ix', ...), or undefined. */
export function propertyByKey(p: SectionProperties, key: string): number | undefined {
  const info = PROPERTY_CATALOG.find((i) => i.key === key);
  return info ? info.get(p) : undefined;
}
