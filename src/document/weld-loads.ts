/**
 * The document's weld loads (optional, version 2): forces on line groups for the elastic
 * weld-group method (src/lines/weld-group.ts), kept in the document so the report and the CLI
 * show the same check as the panel.
 *
 * A load names its line group (the `group` of the line elements; "Lines" for those without one),
 * the point where the force acts (document units), the force components Fx, Fy (in the document's
 * `forceUnit`, kN when absent) and an optional added moment M, counter-clockwise positive (force ×
 * `momentLength`, the document's length unit when absent), as the section loads are given.
 *
 * Validation names every problem with its path. A group no line element belongs to (in the
 * baseline or in any proposal) is a warning naming the groups the document has, not an error: the
 * file still opens when the weld lines were deleted (the load is kept and says that its group has
 * no elements), while a misspelt group in a file written by hand is reported by every reader.
 */
import { fmtValue, isObj, type Issue } from '../shapes/check';
import { DEFAULT_LINE_GROUP } from '../shapes/line';
import type { Point } from '../shapes/base';

export interface WeldLoad {
  /** The line group the load acts on. */
  group: string;
  /** Where the force acts (document units). */
  at: Point;
  /** Force components, in the document's force unit. */
  Fx: number;
  Fy: number;
  /** Added moment, counter-clockwise positive, in force × momentLength. */
  M?: number;
  /** Optional label for lists and the report. */
  name?: string;
}

const FIELDS = ['group', 'at', 'Fx', 'Fy', 'M', 'name'];

function finite(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

/** The line group a shape record belongs to, or null when it is not a line element. */
function groupOf(s: unknown): string | null {
  if (!isObj(s) || s.type !== 'line') return null;
  return typeof s.group === 'string' && s.group.trim() !== '' ? s.group.trim() : DEFAULT_LINE_GROUP;
}

/** Every line group named by a line element of the baseline or of a proposal, in document order. */
export function documentLineGroups(doc: Record<string, unknown>): string[] {
  const out: string[] = [];
  const take = (list: unknown) => {
    if (!Array.isArray(list)) return;
    for (const s of list) {
      const g = groupOf(s);
      if (g !== null && !out.includes(g)) out.push(g);
    }
  };
  take(doc.shapes);
  if (Array.isArray(doc.variants)) for (const v of doc.variants) if (isObj(v)) take(v.shapes);
  return out;
}

/**
 * `weldLoads`: a list of {group, at, Fx, Fy, M?, name?}. Errors go to `out`; a group that no line
 * element of the document belongs to goes to `warnings`.
 */
export function validateWeldLoads(doc: Record<string, unknown>, out: Issue[], warnings: Issue[] = out): void {
  const list = doc.weldLoads;
  if (list === undefined) return;
  if (!Array.isArray(list)) {
    out.push({ path: 'weldLoads', message: 'weldLoads must be a list of {group, at, Fx, Fy, M}' });
    return;
  }
  const groups = documentLineGroups(doc);
  list.forEach((w, k) => {
    const p = `weldLoads[${k}]`;
    if (!isObj(w)) return out.push({ path: p, message: 'a weld load must be an object {group, at, Fx, Fy, M}' });
    for (const key of Object.keys(w)) if (!FIELDS.includes(key)) out.push({ path: `${p}.${key}`, message: `unknown field; a weld load has ${FIELDS.join(', ')}` });
    if (typeof w.group !== 'string' || w.group.trim() === '') out.push({ path: `${p}.group`, message: 'name the line group the load acts on' });
    else if (!groups.includes(w.group.trim())) {
      warnings.push({
        path: `${p}.group`,
        message: groups.length
          ? `there is no line group "${w.group}"; the document's line groups are ${groups.map((g) => `"${g}"`).join(', ')} (the load is kept but not evaluated)`
          : `there is no line group "${w.group}": the document has no line elements (the load is kept but not evaluated)`,
      });
    }
    const at = w.at;
    if (!(Array.isArray(at) && at.length === 2 && finite(at[0]) && finite(at[1]))) out.push({ path: `${p}.at`, message: `the point where the force acts must be [x, y], two finite numbers; got ${fmtValue(at)}` });
    for (const c of ['Fx', 'Fy'] as const) if (!finite(w[c])) out.push({ path: `${p}.${c}`, message: `${c} must be a finite number (force), got ${fmtValue(w[c])}` });
    if (w.M !== undefined && !finite(w.M)) out.push({ path: `${p}.M`, message: `the moment M must be a finite number, got ${fmtValue(w.M)}` });
    if (w.name !== undefined && typeof w.name !== 'string') out.push({ path: `${p}.name`, message: 'name must be text' });
  });
}
