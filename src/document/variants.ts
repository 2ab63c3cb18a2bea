/**
 * Proposals: named variants of the section, each a list that names baseline shapes by id (kept
 * as they are) or holds its own shapes (new ones, or edited copies of baseline shapes with the
 * same id). These functions resolve a variant to a plain section, write an edited section back
 * (keeping references for the baseline shapes it did not change), and start a new proposal.
 */
import type { Shape } from '../shapes/shape';
import { isObj, type Issue } from '../shapes/check';
import { validateShape } from '../shapes/validate';
import type { SectionDocument, Variant } from './types';

export class VariantError extends Error {}

export function variantNames(doc: SectionDocument): string[] {
  return (doc.variants ?? []).map((v) => v.name);
}

export function findVariant(doc: SectionDocument, name: string): Variant | undefined {
  return doc.variants?.find((v) => v.name === name);
}

/** The shapes of a variant in order, baseline shapes resolved (the same objects as the baseline's). */
export function variantShapes(doc: SectionDocument, v: Variant): Shape[] {
  const base = new Map(doc.shapes.map((s) => [s.id, s]));
  return v.shapes.map((e) => {
    if (typeof e !== 'string') return e;
    const s = base.get(e);
    if (!s) throw new VariantError(`proposal "${v.name}" refers to the shape "${e}", which the baseline does not have`);
    return s;
  });
}

/**
 * The section of one variant (null: the baseline) as a plain document: the same fields, with
 * `shapes` the variant's resolved list and no proposals of its own. Throws VariantError for an
 * unknown name.
 */
export function sectionOf(doc: SectionDocument, name: string | null | undefined): SectionDocument {
  if (!name) return doc;
  const v = findVariant(doc, name);
  if (!v) throw new VariantError(`there is no proposal named "${name}"; the document has ${variantNames(doc).map((n) => `"${n}"`).join(', ') || 'none'}`);
  const { variants: _v, activeVariant: _a, ...rest } = doc;
  void _v;
  void _a;
  return { ...rest, shapes: variantShapes(doc, v) };
}

/** The document with the shapes of one variant (null: the baseline) replaced by `shapes`. */
export function withSectionShapes(doc: SectionDocument, name: string | null | undefined, shapes: Shape[]): SectionDocument {
  if (!name) {
    if (!doc.variants?.length) return { ...doc, shapes };
    // A proposal follows the baseline: a baseline shape that is gone leaves its proposals too.
    const ids = new Set(shapes.map((s) => s.id));
    const variants = doc.variants.map((v) => {
      const kept = v.shapes.filter((e) => typeof e !== 'string' || ids.has(e));
      return kept.length === v.shapes.length ? v : { ...v, shapes: kept };
    });
    return { ...doc, shapes, variants };
  }
  const base = new Map(doc.shapes.map((s) => [s.id, s]));
  const entries = shapes.map((s) => (base.get(s.id) === s ? s.id : s));
  return { ...doc, variants: (doc.variants ?? []).map((v) => (v.name === name ? { ...v, shapes: entries } : v)) };
}

/** Every id used in the document, baseline and proposals. */
export function allShapeIds(doc: SectionDocument): Set<string> {
  const ids = new Set(doc.shapes.map((s) => s.id));
  for (const v of doc.variants ?? []) for (const e of v.shapes) ids.add(typeof e === 'string' ? e : e.id);
  return ids;
}

/** A name for a new proposal that the document does not use yet: 'Proposal 1', 'Proposal 2', ... */
export function newVariantName(doc: SectionDocument): string {
  const used = new Set(variantNames(doc));
  for (let k = 1; ; k++) if (!used.has(`Proposal ${k}`)) return `Proposal ${k}`;
}

/** A new proposal that starts as a copy of the baseline (every shape by reference), made active. */
export function addVariant(doc: SectionDocument, name: string = newVariantName(doc)): SectionDocument {
  if (findVariant(doc, name)) throw new VariantError(`a proposal named "${name}" already exists`);
  const v: Variant = { name, shapes: doc.shapes.map((s) => s.id) };
  return { ...doc, variants: [...(doc.variants ?? []), v], activeVariant: name };
}

/** Validate `variants` and `activeVariant` of a document whose baseline ids are `baseIds`. */
export function validateVariants(doc: Record<string, unknown>, baseIds: ReadonlySet<string>, out: Issue[]): void {
  const vs = doc.variants;
  if (vs !== undefined) {
    if (!Array.isArray(vs)) out.push({ path: 'variants', message: 'variants must be a list of proposals {name, shapes}' });
    else {
      const names = new Map<string, number>();
      vs.forEach((v, k) => {
        const p = `variants[${k}]`;
        if (!isObj(v)) return out.push({ path: p, message: 'a proposal must be an object {name, shapes}' });
        if (typeof v.name !== 'string' || v.name.trim() === '') out.push({ path: `${p}.name`, message: 'every proposal needs a name' });
        else if (names.has(v.name)) out.push({ path: `${p}.name`, message: `the name "${v.name}" is already used by variants[${names.get(v.name)}]` });
        else names.set(v.name, k);
        if (v.note !== undefined && typeof v.note !== 'string') out.push({ path: `${p}.note`, message: 'note must be text' });
        if (!Array.isArray(v.shapes)) return out.push({ path: `${p}.shapes`, message: 'a proposal needs a list of shapes: baseline ids (text) or shapes' });
        const seen = new Map<string, number>();
        v.shapes.forEach((e: unknown, j: number) => {
          const ep = `${p}.shapes[${j}]`;
          let id: unknown;
          if (typeof e === 'string') {
            id = e;
            if (!baseIds.has(e)) out.push({ path: ep, message: `no baseline shape has the id "${e}"; name a shape of the baseline, or give the new shape in full` });
          } else {
            out.push(...validateShape(e, ep));
            id = isObj(e) ? e.id : undefined;
          }
          if (typeof id === 'string') {
            if (seen.has(id)) out.push({ path: ep, message: `the shape "${id}" appears twice in this proposal (also at shapes[${seen.get(id)}])` });
            else seen.set(id, j);
          }
        });
      });
    }
  }
  const active = doc.activeVariant;
  if (active !== undefined) {
    const known = Array.isArray(vs) ? vs.some((v) => isObj(v) && v.name === active) : false;
    if (typeof active !== 'string' || !known) out.push({ path: 'activeVariant', message: `there is no proposal named ${JSON.stringify(active)} to show` });
  }
}
