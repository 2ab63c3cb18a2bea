/**
 * Material records and their checks.
 *
 * A material is plain data: `{ id, name, E, density, fy, nu? }`. E and fy share one stress unit
 * (the document's stress unit, see units.ts); only their ratios and the stresses shown in that unit
 * matter. Density is always kg/m³, whatever the document's length unit, because mass per length
 * is reported in kg/m. fy is the strength used for the plastic moment (the yield stress of a metal,
 * the characteristic bending strength of timber and glass, the compressive strength of concrete).
 *
 * Every check returns all problems with their paths (`materials[1].E: ...`), like the document
 * validator, so the lead can merge them into the document's issue list unchanged.
 */

export interface Material {
  /** Unique key that shapes name in `material` and the document names in `reference`. */
  id: string;
  /** Human label shown in the panel and the report. */
  name: string;
  /** Modulus of elasticity, in the document's stress unit. Must be > 0. */
  E: number;
  /** Mass density in kg/m³. Must be ≥ 0 (0 leaves the part out of the centre of gravity). */
  density: number;
  /** Strength for the plastic moment, in the document's stress unit. Must be > 0. */
  fy: number;
  /** Poisson's ratio, for information (no result here uses it). */
  nu?: number;
}

/** The same shape as the document validator's Issue: a path and a message. */
export interface MaterialIssue {
  path: string;
  message: string;
}

/** Thrown by the engine when a material cannot be used (bad number, unknown id). */
export class MaterialError extends Error {}

function show(v: unknown): string {
  return typeof v === 'number' ? String(v) : (JSON.stringify(v) ?? String(v));
}

function isObj(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

/** Problems of one material record (any value), each with its path under `path`. */
export function materialIssues(value: unknown, path: string): MaterialIssue[] {
  const out: MaterialIssue[] = [];
  if (!isObj(value)) return [{ path, message: `expected a material {id, name, E, density, fy}, got ${show(value)}` }];
  if (typeof value.id !== 'string' || value.id.trim() === '') out.push({ path: `${path}.id`, message: `must be a non-empty string, got ${show(value.id)}` });
  if (typeof value.name !== 'string') out.push({ path: `${path}.name`, message: `must be a string, got ${show(value.name)}` });
  const positive = (key: 'E' | 'fy', what: string) => {
    const v = value[key];
    if (typeof v !== 'number' || !Number.isFinite(v) || !(v > 0)) out.push({ path: `${path}.${key}`, message: `${what} must be a finite number greater than 0, got ${show(v)}` });
  };
  positive('E', 'the modulus of elasticity');
  positive('fy', 'the strength');
  const d = value.density;
  if (typeof d !== 'number' || !Number.isFinite(d) || d < 0) out.push({ path: `${path}.density`, message: `the density (kg/m³) must be a finite number of at least 0, got ${show(d)}` });
  if (value.nu !== undefined) {
    const nu = value.nu;
    // An isotropic material has −1 < ν ≤ 0.5 (Gere & Goodno, Sec. 1.6 and 7.5).
    if (typeof nu !== 'number' || !Number.isFinite(nu) || !(nu > -1 && nu <= 0.5)) out.push({ path: `${path}.nu`, message: `Poisson's ratio must lie in (−1, 0.5], got ${show(nu)}` });
  }
  return out;
}

/** Problems of a material list: each record, and ids used twice. */
export function materialListIssues(value: unknown, path = 'materials'): MaterialIssue[] {
  if (!Array.isArray(value)) return [{ path, message: `expected a list of materials, got ${show(value)}` }];
  const out: MaterialIssue[] = [];
  const seen = new Map<string, number>();
  value.forEach((m, k) => {
    out.push(...materialIssues(m, `${path}[${k}]`));
    if (isObj(m) && typeof m.id === 'string') {
      const first = seen.get(m.id);
      if (first !== undefined) out.push({ path: `${path}[${k}].id`, message: `the id "${m.id}" is already used by ${path}[${first}]` });
      else seen.set(m.id, k);
    }
  });
  return out;
}

/**
 * Problems of the references to materials: the document's `reference` and each shape's
 * `material` must name a material of the list. `shapeMaterials[i]` is shape i's material id
 * (undefined when the shape names none and so uses the reference).
 */
export function materialReferenceIssues(materials: readonly Material[], reference: string | undefined, shapeMaterials: readonly (string | undefined)[]): MaterialIssue[] {
  const out: MaterialIssue[] = [];
  const ids = new Set(materials.map((m) => m.id));
  const known = materials.length ? `known materials: ${materials.map((m) => `"${m.id}"`).join(', ')}` : 'the document has no materials';
  const usesAny = shapeMaterials.some((s) => s !== undefined);
  if (reference === undefined) {
    if (materials.length > 0 || usesAny) out.push({ path: 'reference', message: `missing: name the reference material (the one with n = 1); ${known}` });
  } else if (!ids.has(reference)) out.push({ path: 'reference', message: `unknown material "${reference}"; ${known}` });
  shapeMaterials.forEach((id, i) => {
    if (id !== undefined && !ids.has(id)) out.push({ path: `shapes[${i}].material`, message: `unknown material "${id}"; ${known}` });
  });
  return out;
}

/** Throws MaterialError when a record cannot be used by the engine (the first problem, with its path). */
export function assertMaterial(m: Material, path = `material "${m?.id}"`): void {
  const issues = materialIssues(m, path);
  if (issues.length) throw new MaterialError(`${issues[0].path}: ${issues[0].message}`);
}

/** The material with this id, or a MaterialError naming the id and the known ones. */
export function findMaterial(materials: readonly Material[], id: string): Material {
  const m = materials.find((x) => x.id === id);
  if (!m) throw new MaterialError(`unknown material "${id}"; known materials: ${materials.map((x) => `"${x.id}"`).join(', ') || 'none'}`);
  return m;
}
