/**
 * Limits on the change a cutout may make, and the within/beyond verdict.
 *
 * A limit record names one property and one or more allowed changes:
 *   { property: 'Ix', maxLossPercent: 10 }       loss of at most 10 % (also maxGainPercent)
 *   { property: 'Sx_min', maxLossPercent: 10 }   the modulus to the critical fibre
 *   { property: 'centroid', maxShift: 2 }        centroid moves at most 2 document units
 *   { property: 'theta', maxRotation: 2 }        principal axes turn at most 2°
 * Per-cent limits apply to magnitudes (area, second moments, radii, moduli, perimeter); maxShift
 * to 'centroid' (the length of the shift) and to any single coordinate ('centroid.y',
 * 'plasticAxis.y', 'bounds.ymax', ...); maxRotation to 'theta'. limit-fields.ts holds that table.
 *
 * A change exactly at the limit is within it; so is one past it by round-off only (1e-9 of a
 * percentage point, 1e-9 of the section's size, 1e-9 of a degree). The margin is allowed − actual:
 * positive within, negative beyond. A limit whose measure has no meaning for these sections (a
 * rotation of an isotropic section) is reported as not applicable and does not move the verdict.
 * The verdict is beyond when any limit is beyond, else within.
 *
 * The example limits are examples to start from, not values from a design code.
 */
import { formatNumber } from '../properties/catalog';
import type { SectionComparison } from './compare';
import { comparisonRow } from './compare';
import { CENTROID_KEY, fieldsForKind, LIMIT_FIELDS, type LimitField } from './limit-fields';

export interface Limit {
  property: string;
  maxLossPercent?: number;
  maxGainPercent?: number;
  maxShift?: number;
  maxRotation?: number;
}

export type LimitStatus = 'within' | 'beyond' | 'not-applicable';
export type Verdict = 'within' | 'beyond';

export interface LimitResult {
  property: string;
  label: string;
  field: LimitField;
  /** The allowed value: per cent, document length or degrees. */
  allowed: number;
  /** The actual loss or gain (per cent, positive when it happened), shift (length) or rotation (degrees, size). */
  actual: number | null;
  /** allowed − actual; negative when beyond. */
  margin: number | null;
  status: LimitStatus;
  message: string;
}

export const EXAMPLE_LIMITS_NOTE = 'Example limits to start from, not values from a design code: set the limits that apply to your member.';

/** The example limits (a loss of 10 % in Ix, area and Sx,min, a centroid shift of 2 mm, 2° of rotation), for documents in units of `unitInMetres`. */
export function exampleLimits(unitInMetres = 1e-3): Limit[] {
  return [
    { property: 'Ix', maxLossPercent: 10 },
    { property: 'Sx_min', maxLossPercent: 10 },
    { property: 'area', maxLossPercent: 10 },
    { property: 'centroid', maxShift: 0.002 / unitInMetres },
    { property: 'theta', maxRotation: 2 },
  ];
}

const ROUND_OFF = 1e-9;

interface Measured {
  label: string;
  actual: number | null;
  why: string | null;
  unit: string;
  tol: number;
}

function measure(c: SectionComparison, property: string, field: LimitField, units: string): Measured {
  if (property === CENTROID_KEY) {
    if (field !== 'maxShift') return { label: 'Centroid', actual: null, why: 'the centroid takes a shift limit (maxShift) only', unit: '', tol: 0 };
    return { label: 'Centroid', actual: c.centroidShift.length, why: null, unit: units, tol: ROUND_OFF * c.extent };
  }
  const row = comparisonRow(c, property);
  if (!row) return { label: property, actual: null, why: `there is no property "${property}"`, unit: '', tol: 0 };
  if (!fieldsForKind(row.kind).includes(field)) return { label: row.label, actual: null, why: `${field} does not apply to ${row.key}`, unit: '', tol: 0 };
  if (field === 'maxRotation') return { label: row.label, actual: row.change === null ? null : Math.abs(row.change), why: row.note, unit: '°', tol: ROUND_OFF };
  if (field === 'maxShift') return { label: row.label, actual: row.change === null ? null : Math.abs(row.change), why: row.note, unit: units, tol: ROUND_OFF * c.extent };
  const pct = row.changePercent;
  const actual = pct === null ? null : field === 'maxLossPercent' ? -pct : pct;
  return { label: row.label, actual, why: row.note, unit: '%', tol: ROUND_OFF };
}

const WHAT: Record<LimitField, string> = { maxLossPercent: 'loss', maxGainPercent: 'gain', maxShift: 'shift', maxRotation: 'rotation' };

function withUnit(v: number, unit: string): string {
  const t = formatNumber(v);
  return unit === '%' || unit === '°' ? `${t}${unit === '%' ? ' %' : '°'}` : unit ? `${t} ${unit}` : t;
}

/** Each limit against the comparison. `units` is the length unit text for messages. */
export function evaluateLimits(c: SectionComparison, limits: readonly Limit[], units = ''): LimitResult[] {
  const out: LimitResult[] = [];
  for (const limit of limits) {
    for (const field of LIMIT_FIELDS) {
      const allowed = limit[field];
      if (allowed === undefined) continue;
      const m = measure(c, limit.property, field, units);
      const what = WHAT[field];
      if (m.actual === null) {
        out.push({ property: limit.property, label: m.label, field, allowed, actual: null, margin: null, status: 'not-applicable', message: `${m.label}: the ${what} limit does not apply: ${m.why ?? 'no value'}` });
        continue;
      }
      const margin = allowed - m.actual;
      const status: LimitStatus = m.actual <= allowed + m.tol ? 'within' : 'beyond';
      // A loss limit met by a gain (or the reverse) says so rather than "a loss of −3 %".
      const shown = (field === 'maxLossPercent' || field === 'maxGainPercent') && m.actual < 0
        ? `a ${field === 'maxLossPercent' ? 'gain' : 'loss'} of ${withUnit(-m.actual, m.unit)}`
        : `${what} ${withUnit(m.actual, m.unit)}`;
      const message = status === 'within'
        ? `${m.label}: ${shown}, within the ${what} limit of ${withUnit(allowed, m.unit)} (margin ${withUnit(Math.max(margin, 0), m.unit)})`
        : `${m.label}: ${shown}, beyond the ${what} limit of ${withUnit(allowed, m.unit)} by ${withUnit(-margin, m.unit)}`;
      out.push({ property: limit.property, label: m.label, field, allowed, actual: m.actual, margin, status, message });
    }
  }
  return out;
}

/** Beyond when any limit is beyond, else within (also when no limit applies). */
export function overallVerdict(results: readonly LimitResult[]): Verdict {
  return results.some((r) => r.status === 'beyond') ? 'beyond' : 'within';
}
