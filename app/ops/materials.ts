/**
 * Materials and loads in the document, each change one undoable step and checked first: a change
 * the document validator would refuse is not applied, and the refusal says what is wrong (the
 * validator's own message, with its path).
 *
 * - Materials: add (from the built-in library, converted to the document's stress unit, or typed
 *   in), edit, remove (refused while a shape or the reference still uses the material), the
 *   reference material, and the material of the selected shapes.
 * - Units: a new stress unit converts E and fy of every material; a new force unit or moment
 *   length converts the loads already entered, so every value keeps its physical size.
 * - Loads: N, Mx, My and V, one value at a time (an empty value removes it).
 */
import {
  documentLoadUnits,
  FORCE_UNIT_IN_NEWTONS,
  FORCE_UNITS,
  formatIssue,
  kindOf,
  shapeDisplayName,
  libraryMaterial,
  materialInStressUnit,
  MATERIAL_LIBRARY,
  STRESS_UNITS,
  UNIT_IN_METRES,
  UNITS,
  validateDocument,
  type ForceUnit,
  type Loads,
  type Material,
  type SectionDocument,
  type Shape,
  type StressUnit,
  type Units,
} from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { activeShapes, withActiveShapes } from '../store/section';

/** The editable fields of a material (the id is fixed when the material is added). */
export type MaterialFields = Pick<Material, 'name' | 'E' | 'density' | 'fy' | 'nu'>;

export const LOAD_KEYS = ['N', 'Mx', 'My', 'V'] as const;
export type LoadKey = (typeof LOAD_KEYS)[number];

const MATERIAL_PATHS = /^(materials|reference|loads|stressUnit|forceUnit|momentLength)\b|\.material$/;

/**
 * Record `next` as one step when the validator finds nothing wrong with its materials, units or
 * loads; else return the problems, one line each, and change nothing.
 */
function commitChecked(ctx: CommandContext, next: SectionDocument, selected?: string[]): string | null {
  const r = validateDocument(next);
  if (!r.ok) {
    const mine = r.errors.filter((e) => MATERIAL_PATHS.test(e.path));
    return (mine.length ? mine : r.errors).map(formatIssue).join('; ');
  }
  commit(ctx.store, next, selected);
  return null;
}

/** Every shape of the document (baseline and proposals) with the place it is shown at. */
function everyShape(doc: SectionDocument): { shape: Shape; where: string }[] {
  const out = doc.shapes.map((shape, k) => ({ shape, where: shapeDisplayName(shape, k) }));
  for (const v of doc.variants ?? []) {
    v.shapes.forEach((e, k) => {
      if (typeof e !== 'string') out.push({ shape: e, where: `${shapeDisplayName(e, k)} in proposal "${v.name}"` });
    });
  }
  return out;
}

/** An id made from a name, not yet used by another material: 'Softwood C24' -> 'softwood-c24'. */
export function materialIdFor(name: string, taken: ReadonlySet<string>): string {
  const base =
    name
      .trim()
      .toLowerCase()
      .normalize('NFKD')
      .replace(/[^a-z0-9.]+/g, '-')
      .replace(/^-+|-+$/g, '') || 'material';
  let id = base;
  for (let k = 2; taken.has(id); k++) id = `${base}-${k}`;
  return id;
}

/** The document with one more material; the first one becomes the reference. */
function withMaterial(doc: SectionDocument, m: Material): SectionDocument {
  const materials = [...(doc.materials ?? []), m];
  return { ...doc, materials, reference: doc.reference ?? m.id };
}

/** Add a built-in library material (E and fy in the document's stress unit). Returns the new id, or why not. */
export function addLibraryMaterial(ctx: CommandContext, libraryId: string): { id: string } | { error: string } {
  if (!MATERIAL_LIBRARY.some((m) => m.id === libraryId)) return { error: `There is no library material "${libraryId}".` };
  const doc = ctx.store.getState().doc;
  const m = libraryMaterial(libraryId, documentLoadUnits(doc).stress);
  m.id = materialIdFor(m.id, new Set((doc.materials ?? []).map((x) => x.id)));
  const error = commitChecked(ctx, withMaterial(doc, m));
  return error ? { error } : { id: m.id };
}

/** Add a material typed in by hand. Returns the new id, or why not. */
export function addMaterial(ctx: CommandContext, fields: MaterialFields): { id: string } | { error: string } {
  const doc = ctx.store.getState().doc;
  const id = materialIdFor(fields.name || 'material', new Set((doc.materials ?? []).map((x) => x.id)));
  const m: Material = { id, name: fields.name, E: fields.E, density: fields.density, fy: fields.fy, ...(fields.nu !== undefined ? { nu: fields.nu } : {}) };
  const error = commitChecked(ctx, withMaterial(doc, m));
  return error ? { error } : { id };
}

/** Change fields of one material (nu: undefined removes Poisson's ratio). */
export function updateMaterial(ctx: CommandContext, id: string, patch: Partial<MaterialFields>): string | null {
  const doc = ctx.store.getState().doc;
  const list = doc.materials ?? [];
  const k = list.findIndex((m) => m.id === id);
  if (k < 0) return `There is no material "${id}".`;
  const m: Material = { ...list[k], ...patch };
  if ('nu' in patch && patch.nu === undefined) delete m.nu;
  if (JSON.stringify(m) === JSON.stringify(list[k])) return null;
  return commitChecked(ctx, { ...doc, materials: list.map((x, j) => (j === k ? m : x)) });
}

/** Remove a material that no shape names; removing the last one leaves a section of one material. */
export function removeMaterial(ctx: CommandContext, id: string): string | null {
  const doc = ctx.store.getState().doc;
  const list = doc.materials ?? [];
  const m = list.find((x) => x.id === id);
  if (!m) return `There is no material "${id}".`;
  const users = everyShape(doc).filter((s) => s.shape.material === id);
  if (users.length) {
    const names = users.slice(0, 3).map((u) => u.where).join(', ') + (users.length > 3 ? ` and ${users.length - 3} more` : '');
    return `${m.name || id} is used by ${users.length === 1 ? '1 shape' : `${users.length} shapes`} (${names}): give ${users.length === 1 ? 'it' : 'them'} another material first.`;
  }
  const rest = list.filter((x) => x.id !== id);
  if (doc.reference === id && rest.length) return `${m.name || id} is the reference material: make another material the reference first.`;
  const next: SectionDocument = { ...doc, materials: rest };
  if (!rest.length) {
    delete next.materials;
    delete next.reference;
  }
  return commitChecked(ctx, next);
}

/** Make a material the reference (n = 1): the transformed section is expressed in it. */
export function setReference(ctx: CommandContext, id: string): string | null {
  const doc = ctx.store.getState().doc;
  if (doc.reference === id) return null;
  if (!(doc.materials ?? []).some((m) => m.id === id)) return `There is no material "${id}".`;
  return commitChecked(ctx, { ...doc, reference: id });
}

/** The material of the selected area shapes: an id, or null for "the reference" (no material named). */
export function setSelectionMaterial(ctx: CommandContext, id: string | null): string | null {
  const s = ctx.store.getState();
  const sel = new Set(s.selected);
  if (!sel.size) return 'Select the shapes to give a material first.';
  if (id !== null && !(s.doc.materials ?? []).some((m) => m.id === id)) return `There is no material "${id}": add it in Materials first.`;
  let changed = false;
  const shapes = activeShapes(s.doc).map((sh) => {
    if (!sel.has(sh.id) || kindOf(sh).line || (sh.material ?? null) === id) return sh;
    changed = true;
    const n = { ...sh } as Shape;
    if (id === null) delete n.material;
    else n.material = id;
    return n;
  });
  if (!changed) return null;
  return commitChecked(ctx, withActiveShapes(s.doc, shapes), s.selected);
}

/** A new stress unit for the document: E and fy of every material are converted to it. */
export function setStressUnit(ctx: CommandContext, unit: StressUnit): string | null {
  if (!(STRESS_UNITS as readonly string[]).includes(unit)) return `Unknown stress unit "${unit}"; use one of ${STRESS_UNITS.join(', ')}.`;
  const doc = ctx.store.getState().doc;
  const from = documentLoadUnits(doc).stress;
  if (from === unit && doc.stressUnit === unit) return null;
  const next: SectionDocument = { ...doc, stressUnit: unit };
  if (doc.materials) next.materials = doc.materials.map((m) => materialInStressUnit(m, from, unit));
  return commitChecked(ctx, next);
}

function scaledLoads(loads: Loads, f: number, m: number): Loads {
  const out: Loads = { ...loads };
  if (out.N !== undefined) out.N *= f;
  if (out.V !== undefined) out.V *= f;
  if (out.Mx !== undefined) out.Mx *= m;
  if (out.My !== undefined) out.My *= m;
  return out;
}

/** A new force unit for N, V and the moments: the loads entered are converted to it. */
export function setForceUnit(ctx: CommandContext, unit: ForceUnit): string | null {
  if (!(FORCE_UNITS as readonly string[]).includes(unit)) return `Unknown force unit "${unit}"; use one of ${FORCE_UNITS.join(', ')}.`;
  const doc = ctx.store.getState().doc;
  const from = documentLoadUnits(doc).force;
  if (from === unit && doc.forceUnit === unit) return null;
  const f = FORCE_UNIT_IN_NEWTONS[from] / FORCE_UNIT_IN_NEWTONS[unit];
  const next: SectionDocument = { ...doc, forceUnit: unit };
  if (doc.loads) next.loads = scaledLoads(doc.loads, f, f);
  return commitChecked(ctx, next);
}

/** A new length unit for the moments (kN·m on a mm drawing): Mx and My are converted to it. */
export function setMomentLength(ctx: CommandContext, unit: Units): string | null {
  if (!(UNITS as readonly string[]).includes(unit)) return `Unknown length unit "${unit}"; use one of ${UNITS.join(', ')}.`;
  const doc = ctx.store.getState().doc;
  const from = doc.momentLength ?? doc.units;
  if (from === unit && doc.momentLength === unit) return null;
  const next: SectionDocument = { ...doc, momentLength: unit };
  if (doc.loads) next.loads = scaledLoads(doc.loads, 1, UNIT_IN_METRES[from] / UNIT_IN_METRES[unit]);
  return commitChecked(ctx, next);
}

/** One load: a finite number, or null to remove it (absent loads are 0). */
export function setLoad(ctx: CommandContext, key: LoadKey, value: number | null): string | null {
  if (!(LOAD_KEYS as readonly string[]).includes(key)) return `Unknown load "${key}"; use N, Mx, My or V.`;
  if (value !== null && !Number.isFinite(value)) return `${key} must be a finite number.`;
  const doc = ctx.store.getState().doc;
  const loads: Loads = { ...(doc.loads ?? {}) };
  if ((loads[key] ?? null) === value) return null;
  if (value === null) delete loads[key];
  else loads[key] = value;
  const next: SectionDocument = { ...doc, loads };
  if (Object.keys(loads).length === 0) delete next.loads;
  return commitChecked(ctx, next);
}

/** Remove every load as one step. */
export function clearLoads(ctx: CommandContext): void {
  const doc = ctx.store.getState().doc;
  if (!doc.loads) return;
  const next = { ...doc };
  delete next.loads;
  commit(ctx.store, next);
}
