/**
 * Validation of section documents: every problem is returned with its path in the document
 * (`shapes[2].segments[4].via: arc points are collinear`), never just the first one.
 */
import { fmtValue as fmtNum, isObj, type Issue } from '../shapes/check';
import { newShapeId } from '../shapes/ids';
import { validateShape } from '../shapes/validate';
import { validateCheckerFields, validateLimits, validateMaterials } from './fields';
import { validateVariants } from './variants';
import { validateWeldLoads } from './weld-loads';
import { validateNetLines } from './net-lines';
import { validateTorsionSettings } from './torsion-settings';
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
  const doc = assignMissingIds(migrate(value));
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
  const baseIds = new Set(Array.isArray(doc.shapes) ? doc.shapes.map((s) => (isObj(s) ? s.id : undefined)).filter((id): id is string => typeof id === 'string') : []);
  validateVariants(doc, baseIds, errors);
  const allShapes = [
    ...(Array.isArray(doc.shapes) ? doc.shapes.map((shape, k) => ({ path: `shapes[${k}]`, shape })) : []),
    ...(Array.isArray(doc.variants) ? doc.variants.flatMap((v, k) => (isObj(v) && Array.isArray(v.shapes) ? v.shapes.map((shape: unknown, j: number) => ({ path: `variants[${k}].shapes[${j}]`, shape })) : [])) : []),
  ];
  validateMaterials(doc, allShapes, errors);
  validateLimits(doc, errors);
  validateNetLines(doc, errors);
  validateTorsionSettings(doc, errors);
  validateCheckerFields(doc, errors);
  validateWeldLoads(doc, errors, warnings);
  if (doc.name !== undefined && typeof doc.name !== 'string') errors.push({ path: 'name', message: 'name must be text' });
  if (doc.title !== undefined) {
    if (!isObj(doc.title)) errors.push({ path: 'title', message: 'title must be an object of text fields' });
    else for (const [k, v] of Object.entries(doc.title)) if (typeof v !== 'string') errors.push({ path: `title.${k}`, message: 'must be text' });
  }
  if (errors.length) return { ok: false, errors, warnings };
  return { ok: true, doc: doc as unknown as SectionDocument, warnings };
}

/**
 * A shape written by hand may leave out its id: give it the first free `s<k>` (k from its place in
 * the list), the same every time the file is read, so the saved file keeps it. Shapes of
 * proposals get ids that no other shape of the document uses.
 */
function assignMissingIds(doc: Record<string, unknown>): Record<string, unknown> {
  const missing = (s: unknown) => isObj(s) && s.id === undefined;
  const variants = Array.isArray(doc.variants) ? doc.variants : [];
  const lists = [doc.shapes, ...variants.map((v) => (isObj(v) ? v.shapes : undefined))].filter(Array.isArray) as unknown[][];
  if (!lists.some((l) => l.some(missing))) return doc;
  const used = new Set<string>();
  for (const l of lists) for (const s of l) if (typeof s === 'string') used.add(s);
  else if (isObj(s) && typeof s.id === 'string') used.add(s.id);
  const named = (l: unknown[]) =>
    l.map((s) => {
      if (!missing(s)) return s;
      const id = newShapeId(used);
      used.add(id);
      return { id, ...(s as object) };
    });
  const out: Record<string, unknown> = { ...doc };
  if (Array.isArray(doc.shapes)) out.shapes = named(doc.shapes);
  if (Array.isArray(doc.variants)) out.variants = doc.variants.map((v) => (isObj(v) && Array.isArray(v.shapes) ? { ...v, shapes: named(v.shapes) } : v));
  return out;
}

export { CURRENT_VERSION };
