/**
 * Validation of the optional document fields of version 2 other than proposals: materials and
 * the reference material, units of stress and force, loads, limits, hole rules, and the
 * checker's fields. Every problem comes with its path; nothing is guessed.
 */
import { fmtValue, isObj, type Issue } from '../shapes/check';
import { validateLimits as validateLimitRecords } from '../compare/validate-limits';
import { FORCE_UNITS, STRESS_UNITS, UNITS } from './types';

function finite(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

function text(v: unknown, path: string, out: Issue[], what = 'must be text'): void {
  if (v !== undefined && typeof v !== 'string') out.push({ path, message: what });
}

/** `materials`, `reference` and every shape's `material` (shapes given with their paths). */
export function validateMaterials(doc: Record<string, unknown>, shapes: readonly { path: string; shape: unknown }[], out: Issue[]): void {
  const ids = new Set<string>();
  const ms = doc.materials;
  if (ms !== undefined) {
    if (!Array.isArray(ms)) out.push({ path: 'materials', message: 'materials must be a list of {id, name, E, density, fy}' });
    else
      ms.forEach((m, k) => {
        const p = `materials[${k}]`;
        if (!isObj(m)) return out.push({ path: p, message: 'a material must be an object {id, name, E, density, fy}' });
        if (typeof m.id !== 'string' || m.id.trim() === '') out.push({ path: `${p}.id`, message: 'every material needs a non-empty id' });
        else if (ids.has(m.id)) out.push({ path: `${p}.id`, message: `the material id "${m.id}" is used twice` });
        else ids.add(m.id);
        if (typeof m.name !== 'string') out.push({ path: `${p}.name`, message: 'name must be text' });
        if (!finite(m.E) || !(m.E > 0)) out.push({ path: `${p}.E`, message: `the elastic modulus E must be a number greater than 0, got ${fmtValue(m.E)}` });
        if (!finite(m.density) || !(m.density >= 0)) out.push({ path: `${p}.density`, message: `density (kg/m³) must be a number of 0 or more, got ${fmtValue(m.density)}` });
        if (!finite(m.fy) || !(m.fy > 0)) out.push({ path: `${p}.fy`, message: `the yield strength fy must be a number greater than 0, got ${fmtValue(m.fy)}` });
        if (m.nu !== undefined && (!finite(m.nu) || !(m.nu >= 0 && m.nu < 0.5))) out.push({ path: `${p}.nu`, message: `Poisson's ratio must be at least 0 and below 0.5, got ${fmtValue(m.nu)}` });
      });
  }
  const ref = doc.reference;
  if (ref !== undefined && !(typeof ref === 'string' && ids.has(ref))) {
    out.push({ path: 'reference', message: ids.size ? `the reference material ${fmtValue(ref)} is not one of the materials (${[...ids].join(', ')})` : 'a reference material needs a list of materials' });
  }
  if (ids.size > 0 && ref === undefined) out.push({ path: 'reference', message: `name the reference material (one of ${[...ids].join(', ')}): the transformed section is expressed in it` });
  for (const { path, shape } of shapes) {
    if (!isObj(shape) || typeof shape.material !== 'string') continue;
    if (!ids.has(shape.material)) out.push({ path: `${path}.material`, message: `unknown material "${shape.material}"${ids.size ? `; the document has ${[...ids].join(', ')}` : '; the document has no materials'}` });
  }
  if (doc.stressUnit !== undefined && !(STRESS_UNITS as readonly unknown[]).includes(doc.stressUnit)) out.push({ path: 'stressUnit', message: `unknown stress unit ${fmtValue(doc.stressUnit)}; use one of ${STRESS_UNITS.join(', ')}` });
  if (doc.forceUnit !== undefined && !(FORCE_UNITS as readonly unknown[]).includes(doc.forceUnit)) out.push({ path: 'forceUnit', message: `unknown force unit ${fmtValue(doc.forceUnit)}; use one of ${FORCE_UNITS.join(', ')}` });
  if (doc.momentLength !== undefined && !(UNITS as readonly unknown[]).includes(doc.momentLength)) out.push({ path: 'momentLength', message: `unknown length unit ${fmtValue(doc.momentLength)} for moments; use one of ${UNITS.join(', ')}` });
  const loads = doc.loads;
  if (loads !== undefined) {
    if (!isObj(loads)) out.push({ path: 'loads', message: 'loads must be an object {N, Mx, My, V}' });
    else
      for (const [k, v] of Object.entries(loads)) {
        if (!['N', 'Mx', 'My', 'V'].includes(k)) out.push({ path: `loads.${k}`, message: 'unknown load; use N, Mx, My or V' });
        else if (!finite(v)) out.push({ path: `loads.${k}`, message: `must be a finite number, got ${fmtValue(v)}` });
      }
  }
}

/** `limits` (the comparison's own validation) and `holeRules`. */
export function validateLimits(doc: Record<string, unknown>, out: Issue[]): void {
  if (doc.limits !== undefined) out.push(...validateLimitRecords(doc.limits, 'limits'));
  if (doc.holeRules !== undefined && doc.holeRules !== 'en1993' && doc.holeRules !== 'aisc360') out.push({ path: 'holeRules', message: `unknown hole rules ${fmtValue(doc.holeRules)}; use en1993 or aisc360` });
}

/** `revisions`, `notes` and `checked`. */
export function validateCheckerFields(doc: Record<string, unknown>, out: Issue[]): void {
  const rs = doc.revisions;
  if (rs !== undefined) {
    if (!Array.isArray(rs)) out.push({ path: 'revisions', message: 'revisions must be a list of {revision, date, description, by}' });
    else
      rs.forEach((r, k) => {
        if (!isObj(r)) return out.push({ path: `revisions[${k}]`, message: 'a revision must be an object {revision, date, description, by}' });
        for (const f of ['revision', 'date', 'description', 'by']) {
          if (typeof r[f] !== 'string') out.push({ path: `revisions[${k}].${f}`, message: 'must be text (empty text if unknown)' });
        }
      });
  }
  text(doc.notes, 'notes', out, 'notes must be text');
  if (doc.checked !== undefined) {
    if (!isObj(doc.checked)) out.push({ path: 'checked', message: 'checked must be an object {by, date}' });
    else for (const f of ['by', 'date']) if (typeof doc.checked[f] !== 'string') out.push({ path: `checked.${f}`, message: 'must be text (empty text if unknown)' });
  }
}
