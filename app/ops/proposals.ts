/**
 * Proposals in the editor: start one from the section shown, switch between the baseline and the
 * proposals, rename and delete. Each is one document change and one undo step, so undo takes a
 * switch back as it takes back an edit. The engine's variants module does the document work
 * (src/document/variants.ts); this file only checks names and records the steps.
 */
import { addVariant, findVariant, sectionOf, type SectionDocument } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { notify } from './notice';

/** What is wrong with `name` as the new name of proposal `from` (null: fine). */
export function proposalNameProblem(doc: SectionDocument, from: string | null, name: string): string | null {
  const n = name.trim();
  if (n === '') return 'A proposal needs a name.';
  if (n.length > 80) return 'Keep the name under 80 characters.';
  if (n.toLowerCase() === 'baseline') return '“Baseline” names the section itself; choose another name.';
  if (n !== from && findVariant(doc, n)) return `A proposal named “${n}” already exists.`;
  return null;
}

/**
 * A new proposal that starts as a copy of the baseline, made active (one undo step). With a
 * proposal shown, the new one copies the baseline, not that proposal: each proposal is compared
 * with the baseline.
 */
export function newProposal(ctx: CommandContext, name?: unknown): void {
  const doc = ctx.store.getState().doc;
  if (typeof name === 'string' && proposalNameProblem(doc, null, name)) return;
  commit(ctx.store, addVariant(doc, typeof name === 'string' ? name.trim() : undefined));
}

/** Show the baseline (null) or a proposal by name: a document change, so undo covers it. */
export function switchProposal(ctx: CommandContext, name: unknown): void {
  const doc = ctx.store.getState().doc;
  const target = typeof name === 'string' && name !== '' ? name : null;
  if ((doc.activeVariant ?? null) === target) return;
  if (target !== null && !findVariant(doc, target)) return;
  let next: SectionDocument;
  if (target === null) {
    next = { ...doc };
    delete next.activeVariant;
  } else {
    // A proposal that names a shape the baseline no longer has is refused with the reason.
    try {
      sectionOf(doc, target);
    } catch (e) {
      notify(ctx, 'error', `“${target}” cannot be shown.`, [e instanceof Error ? e.message : String(e)]);
      return;
    }
    next = { ...doc, activeVariant: target };
  }
  commit(ctx.store, next);
}

/** Rename a proposal ({from, to}); nothing happens when the new name is not allowed. */
export function renameProposal(ctx: CommandContext, arg: unknown): void {
  const a = arg as { from?: unknown; to?: unknown } | undefined;
  if (!a || typeof a.from !== 'string' || typeof a.to !== 'string') return;
  const doc = ctx.store.getState().doc;
  const to = a.to.trim();
  if (!findVariant(doc, a.from) || to === a.from || proposalNameProblem(doc, a.from, to)) return;
  const next: SectionDocument = { ...doc, variants: doc.variants!.map((v) => (v.name === a.from ? { ...v, name: to } : v)) };
  if (doc.activeVariant === a.from) next.activeVariant = to;
  commit(ctx.store, next);
}

/** Delete a proposal by name (the panel asks first); the baseline is shown if it was active. */
export function deleteProposal(ctx: CommandContext, name: unknown): void {
  const doc = ctx.store.getState().doc;
  if (typeof name !== 'string' || !findVariant(doc, name)) return;
  const next: SectionDocument = { ...doc, variants: doc.variants!.filter((v) => v.name !== name) };
  if (next.variants!.length === 0) delete next.variants;
  if (doc.activeVariant === name) delete next.activeVariant;
  commit(ctx.store, next, doc.activeVariant === name ? [] : undefined);
}

export const hasProposals = (c: CommandContext): boolean => !!c.store.getState().doc.variants?.length;
export const proposalActive = (c: CommandContext): boolean => !!c.store.getState().doc.activeVariant;
