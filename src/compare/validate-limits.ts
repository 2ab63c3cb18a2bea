/**
 * Validation of limit records, every problem with its path (`limits[2].maxLossPercent: ...`), in
 * the document validator's style, so the validator can call it for the document's `limits` field
 * and the CLI for a limits file.
 */
import type { Issue } from '../shapes/check';
import type { PropertyInfo } from '../properties/catalog';
import { comparisonCatalog } from './critical-fibre';
import { CENTROID_KEY, fieldsFor, LIMIT_FIELDS, type LimitField } from './limit-fields';

const UPPER: Record<LimitField, { max: number; why: string } | null> = {
  maxLossPercent: { max: 100, why: 'a loss cannot exceed 100 %' },
  maxGainPercent: null,
  maxShift: null,
  maxRotation: { max: 90, why: 'the principal axes turn at most 90°' },
};

function describe(v: unknown): string {
  return typeof v === 'number' ? String(v) : JSON.stringify(v) ?? String(v);
}

/** Validate a list of limit records found at `path`. */
export function validateLimits(value: unknown, path: string, catalog: readonly PropertyInfo[] = comparisonCatalog()): Issue[] {
  if (!Array.isArray(value)) return [{ path, message: 'limits must be a list of records like {"property": "Ix", "maxLossPercent": 10}' }];
  const out: Issue[] = [];
  const seen = new Map<string, number>();
  const known = [...catalog.map((i) => i.key), CENTROID_KEY];
  value.forEach((rec, k) => {
    const at = `${path}[${k}]`;
    if (typeof rec !== 'object' || rec === null || Array.isArray(rec)) {
      out.push({ path: at, message: 'a limit must be an object like {"property": "Ix", "maxLossPercent": 10}' });
      return;
    }
    const r = rec as Record<string, unknown>;
    for (const key of Object.keys(r)) {
      if (key !== 'property' && !(LIMIT_FIELDS as readonly string[]).includes(key)) {
        out.push({ path: `${at}.${key}`, message: `unknown field; a limit has "property" and any of ${LIMIT_FIELDS.join(', ')}` });
      }
    }
    if (typeof r.property !== 'string') {
      out.push({ path: `${at}.property`, message: `property must be the name of a property, e.g. "Ix", got ${describe(r.property)}` });
      return;
    }
    if (!known.includes(r.property)) {
      out.push({ path: `${at}.property`, message: `unknown property "${r.property}"; use one of ${known.join(', ')}` });
      return;
    }
    const allowed = fieldsFor(r.property, catalog);
    const present = LIMIT_FIELDS.filter((f) => r[f] !== undefined);
    if (present.length === 0) {
      out.push({ path: at, message: allowed.length ? `the limit on ${r.property} sets nothing; give ${allowed.join(' or ')}` : `${r.property} takes no limit (its change depends on the origin or has a sign); limit I1, I2, θ or the centroid instead` });
    }
    for (const f of present) {
      const v = r[f];
      const fp = `${at}.${f}`;
      if (!allowed.includes(f)) {
        out.push({ path: fp, message: allowed.length ? `${f} does not apply to ${r.property}; use ${allowed.join(' or ')}` : `${r.property} takes no limit (its change depends on the origin or has a sign)` });
        continue;
      }
      if (typeof v !== 'number' || !Number.isFinite(v)) {
        out.push({ path: fp, message: `${f} must be a finite number, got ${describe(v)}` });
        continue;
      }
      if (v < 0) out.push({ path: fp, message: `${f} must be 0 or more, got ${v}` });
      const up = UPPER[f];
      if (up && v > up.max) out.push({ path: fp, message: `${f} must be at most ${up.max} (${up.why}), got ${v}` });
      const id = `${r.property}/${f}`;
      const prev = seen.get(id);
      if (prev !== undefined) out.push({ path: fp, message: `${path}[${prev}] already sets ${f} for ${r.property}` });
      else seen.set(id, k);
    }
  });
  return out;
}
