/**
 * The change of one property between a baseline and a proposal: both values, the change
 * (proposal − baseline) and the change in per cent of the baseline, with the rule for when a
 * percentage has no meaning, said in words:
 *   - magnitudes (area, second moments, radii, moduli, perimeter): per cent of the baseline, unless
 *     the baseline is zero to round-off (below 1e-12 of the section's size to the property's power);
 *   - the product of inertia, which has a sign and is zero for a section symmetric about an axis
 *     parallel to x or y: per cent of |Ixy| of the baseline, unless |Ixy| ≤ 1e-9·√(Ix·Iy) (its
 *     largest possible size, by the Cauchy–Schwarz inequality), when it counts as zero;
 *   - coordinates (centroid, plastic axes, extent) and first moments about the document axes:
 *     they depend on where the origin is, so their change is given, never a percentage;
 *   - the angle θ: its change is the rotation of the principal axes (axes-change.ts).
 */
import type { PropertyInfo } from '../properties/catalog';
import type { SectionProperties } from '../properties/section';
import { principalAxesRotation } from './axes-change';

export type ChangeKind = 'magnitude' | 'signed' | 'position' | 'first-moment' | 'angle';

export interface PropertyChange {
  key: string;
  label: string;
  symbol: string;
  group: PropertyInfo['group'];
  power: number;
  unit?: string;
  kind: ChangeKind;
  baseline: number;
  proposal: number;
  /** proposal − baseline (for θ: the rotation of the principal axes), or null when it has no meaning. */
  change: number | null;
  /** 100 · change / |baseline|, or null with the reason in `note`. */
  changePercent: number | null;
  note: string | null;
}

/** Relative size under which a magnitude counts as zero (as the formatter prints 0). */
export const MAGNITUDE_ZERO = 1e-12;
/** |Ixy| below this fraction of √(Ix·Iy) counts as zero. */
export const PRODUCT_ZERO = 1e-9;

/** How a property changes, from its key (new catalogue rows default to a magnitude). */
export function changeKind(info: PropertyInfo): ChangeKind {
  if (info.power === 0) return 'angle';
  if (info.key === 'Ixy') return 'signed';
  if (info.key === 'Qx' || info.key === 'Qy') return 'first-moment';
  if (/^(centroid|plasticAxis|bounds)\./.test(info.key)) return 'position';
  return 'magnitude';
}

function extent(p: SectionProperties): number {
  return Math.max(p.bounds.xmax - p.bounds.xmin, p.bounds.ymax - p.bounds.ymin);
}

const NOTE = {
  position: 'A coordinate: its change is a distance, not a percentage (it depends on where the origin is).',
  firstMoment: 'A first moment about the document axes: it depends on where the origin is, so no percentage is given.',
  product: 'The baseline has no product of inertia (it is symmetric about an axis parallel to x or y), so a change in per cent has no meaning; read the change itself, or I1, I2 and θ.',
  zero: 'The baseline value is zero, so a change in per cent has no meaning; read the change itself.',
  angle: 'An angle: the change is the rotation of the principal axes, in degrees.',
};

export function propertyChange(info: PropertyInfo, base: SectionProperties, proposal: SectionProperties): PropertyChange {
  const kind = changeKind(info);
  const b = info.get(base), q = info.get(proposal);
  const row: PropertyChange = {
    key: info.key, label: info.label, symbol: info.symbol, group: info.group, power: info.power, kind,
    baseline: b, proposal: q, change: q - b, changePercent: null, note: null,
  };
  if (info.unit !== undefined) row.unit = info.unit;
  switch (kind) {
    case 'angle': {
      const r = principalAxesRotation(base, proposal);
      row.change = r.degrees;
      row.note = r.note ? `${NOTE.angle} ${r.note}` : NOTE.angle;
      break;
    }
    case 'position':
      row.note = NOTE.position;
      break;
    case 'first-moment':
      row.note = NOTE.firstMoment;
      break;
    case 'signed': {
      const bound = Math.sqrt(Math.max(base.Ix, 0) * Math.max(base.Iy, 0));
      if (Math.abs(b) <= PRODUCT_ZERO * bound) row.note = NOTE.product;
      else {
        row.changePercent = (100 * (q - b)) / Math.abs(b);
        row.note = 'Per cent of the size of the baseline value; the sign of the change shows its direction.';
      }
      break;
    }
    default:
      if (!(Math.abs(b) > MAGNITUDE_ZERO * Math.pow(extent(base), info.power))) row.note = NOTE.zero;
      else row.changePercent = (100 * (q - b)) / Math.abs(b);
  }
  if (row.change !== null && !Number.isFinite(row.change)) row.change = null;
  if (row.changePercent !== null && !Number.isFinite(row.changePercent)) row.changePercent = null;
  return row;
}
