/**
 * The limits editor's document changes: set or clear one allowed change, add a limit on another
 * property, remove one, go back to the example limits, and choose the hole rules. Each is one
 * undo step. A document without `limits` shows the example limits (labelled as examples, not
 * values from a design code); the first edit writes the whole list into the document, so the
 * saved file holds exactly the limits the verdict used. Every new list is checked by the engine's
 * limit validation before it is applied; a refused edit changes nothing and says why.
 */
import {
  comparisonCatalog,
  exampleLimits,
  UNIT_IN_METRES,
  validateLimits,
  formatIssue,
  fieldsFor,
  LIMIT_FIELDS,
  type LimitField,
  type HoleRuleSetId,
  type Limit,
  type SectionDocument,
} from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';

const CATALOG = comparisonCatalog();

/** The limits the document sets, or the example limits for its units. */
export function editableLimits(doc: SectionDocument): Limit[] {
  return doc.limits ?? exampleLimits(UNIT_IN_METRES[doc.units]);
}

/** The limit fields that apply to a property ('Ix' → loss and gain; 'centroid' → shift; 'theta' → rotation). */
export function limitFieldsFor(property: string): LimitField[] {
  return fieldsFor(property, CATALOG);
}

/** A first value for a new limit: 10 % for a loss or gain, 2 mm for a shift, 2° for a rotation (examples only). */
export function defaultLimitValue(field: LimitField, doc: SectionDocument): number {
  if (field === 'maxShift') return 0.002 / UNIT_IN_METRES[doc.units];
  if (field === 'maxRotation') return 2;
  return 10;
}

/** A new list of limits, checked by the engine, or what is wrong with it. */
function checked(limits: Limit[]): Limit[] | string {
  const issues = validateLimits(limits, 'limits');
  return issues.length ? issues.map(formatIssue).join('; ') : limits;
}

/**
 * The limits after setting one allowed change of the limit at `index` ({index, field, value});
 * value null clears that field, and a limit left with nothing to check is removed. The list, or
 * an error text.
 */
export function limitsWithValue(doc: SectionDocument, arg: unknown): Limit[] | string {
  const a = arg as { index?: unknown; field?: unknown; value?: unknown } | undefined;
  if (!a || typeof a.index !== 'number' || typeof a.field !== 'string') return 'Nothing to set.';
  const list = editableLimits(doc);
  const old = list[a.index];
  if (!old) return `There is no limit number ${a.index + 1}.`;
  if (a.value !== null && (typeof a.value !== 'number' || !Number.isFinite(a.value))) return 'Enter a number.';
  const field = a.field as LimitField;
  const rec: Limit = { ...old };
  if (a.value === null) delete rec[field];
  else rec[field] = a.value as number;
  const empty = !LIMIT_FIELDS.some((f) => rec[f] !== undefined);
  return checked(empty ? list.filter((_, k) => k !== a.index) : list.map((l, k) => (k === a.index ? rec : l)));
}

/** The limits with one more, on `property`, its first field at the example value. */
export function limitsWithAdded(doc: SectionDocument, property: unknown): Limit[] | string {
  if (typeof property !== 'string') return 'Choose a property.';
  const list = editableLimits(doc);
  if (list.some((l) => l.property === property)) return `${property} has a limit already: change its values in the table.`;
  const fields = limitFieldsFor(property);
  if (!fields.length) return `${property} takes no limit (its change depends on the origin or has a sign).`;
  return checked([...list, { property, [fields[0]]: defaultLimitValue(fields[0], doc) }]);
}

/** The limits without the one at `index`. */
export function limitsWithout(doc: SectionDocument, index: unknown): Limit[] | string {
  const list = editableLimits(doc);
  if (typeof index !== 'number' || !list[index]) return 'There is no such limit.';
  return checked(list.filter((_, k) => k !== index));
}

/** Record a planned list of limits as one undo step; nothing is recorded when it is refused or unchanged. */
function applyPlan(ctx: CommandContext, plan: Limit[] | string): string | null {
  if (typeof plan === 'string') return plan;
  const doc = ctx.store.getState().doc;
  if (doc.limits && JSON.stringify(doc.limits) === JSON.stringify(plan)) return null;
  commit(ctx.store, { ...doc, limits: plan });
  return null;
}

export const setLimitValue = (ctx: CommandContext, arg: unknown) => applyPlan(ctx, limitsWithValue(ctx.store.getState().doc, arg));
export const addLimit = (ctx: CommandContext, arg: unknown) => applyPlan(ctx, limitsWithAdded(ctx.store.getState().doc, (arg as { property?: unknown } | undefined)?.property));
export const removeLimit = (ctx: CommandContext, index: unknown) => applyPlan(ctx, limitsWithout(ctx.store.getState().doc, index));

/** Go back to the example limits: the document's own limits are removed (one undo step). */
export function useExampleLimits(ctx: CommandContext): void {
  const doc = ctx.store.getState().doc;
  if (!doc.limits) return;
  const next = { ...doc };
  delete next.limits;
  commit(ctx.store, next);
}

/** Choose the rule set for hole edge distances and spacings (kept in the document). */
export function setHoleRules(ctx: CommandContext, rules: unknown): void {
  if (rules !== 'en1993' && rules !== 'aisc360') return;
  const doc = ctx.store.getState().doc;
  if ((doc.holeRules ?? 'en1993') === rules) return;
  commit(ctx.store, { ...doc, holeRules: rules as HoleRuleSetId });
}
