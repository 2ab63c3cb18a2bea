/**
 * Validation of section documents: every problem is returned with its path in the document
 * (`shapes[2].segments[4].via: arc points are collinear`), never just the first one.
 */
import { fmtValue as fmtNum, isObj, type Issue } from '../shapes/check';
import { validateShape } from '../shapes/validate';
import { migrate, KNOWN_VERSIONS } from './migrate';
import { CURRENT_VERSION, FORMAT, UNITS, type SectionDocument } from './types';

export { formatIssue, type Issue } from '../shapes/check';
export { validateShape };

export type DocResult =
  | { ok: true; doc: SectionDocument; warnings: Issue[] }
  | { ok: false; errors: Issue[]; warnings: Issue[] };

/** Parse JSON text into a validated, migrated document. */
export function parseDocument(text: string): DocResult {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e);
    return { ok: false, errors: [{ path: '', message: `the file is not valid JSON (${msg})` }], warnings: [] };
  }
  return validateDocument(value);
}

/** Validate (and migrate) a whole document. */
export function validateDocument(value: unknown): DocResult {
  const errors: Issue[] = [];
  const warnings: Issue[] = [];
  if (!isObj(value)) return { ok: false, errors: [{ path: '', message: 'a section document must be a JSON object' }], warnings };
  if (value.format !== FORMAT) {
    errors.push({ path: 'format', message: `expected "${FORMAT}", got ${fmtNum(value.format)}` });
    return { ok: false, errors, warnings };
  }
  if (typeof value.version !== 'number' || !KNOWN_VERSIONS.includes(value.version)) {
    errors.push({
      path: 'version',
      message: `unknown version ${fmtNum(value.version)}; this Kern reads version${KNOWN_VERSIONS.length > 1 ? 's' : ''} ${KNOWN_VERSIONS.join(', ')}`,
    });
    return { ok: false, errors, warnings };
  }
  const doc = migrate(value) as Record<string, unknown>;
  if (!(UNITS as readonly unknown[]).includes(doc.units)) {
    errors.push({ path: 'units', message: `unknown units ${fmtNum(doc.units)}; use one of ${UNITS.join(', ')}` });
  }
  if (!Array.isArray(doc.shapes)) {
    errors.push({ path: 'shapes', message: 'shapes must be a list' });
  } else {
    const seen = new Map<string, number>();
    doc.shapes.forEach((s, k) => {
      errors.push(...validateShape(s, `shapes[${k}]`));
      if (isObj(s) && typeof s.id === 'string') {
        const prev = seen.get(s.id);
        if (prev !== undefined) errors.push({ path: `shapes[${k}].id`, message: `id "${s.id}" is already used by shapes[${prev}]` });
        else seen.set(s.id, k);
      }
    });
  }
  if (doc.name !== undefined && typeof doc.name !== 'string') errors.push({ path: 'name', message: 'name must be text' });
  if (doc.title !== undefined) {
    if (!isObj(doc.title)) errors.push({ path: 'title', message: 'title must be an object of text fields' });
    else for (const [k, v] of Object.entries(doc.title)) if (typeof v !== 'string') errors.push({ path: `title.${k}`, message: 'must be text' });
  }
  if (errors.length) return { ok: false, errors, warnings };
  return { ok: true, doc: doc as unknown as SectionDocument, warnings };
}

export { CURRENT_VERSION };
