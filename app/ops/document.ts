/**
 * Whole-document operations: open from text (a file that fails validation changes nothing),
 * the file name and the text a save writes, a new empty section, the demo, and the units.
 */
import { convertDocumentUnits, DEMO_DOCUMENT, serialiseDocumentText, formatIssue, parseDocument, UNITS, type SectionDocument, type Units } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';
import { notify } from './notice';
import { fitView } from './view';

/** Load a document from file text: a file that fails validation changes nothing. */
export function loadDocumentText(ctx: CommandContext, name: string, text: string): boolean {
  const r = parseDocument(text);
  if (!r.ok) {
    notify(ctx, 'error', `"${name}" was not opened: it is not a valid section document.`, [...r.errors.map(formatIssue), 'Your current section is unchanged.']);
    return false;
  }
  commit(ctx.store, r.doc, []);
  fitView(ctx);
  if (r.warnings.length) notify(ctx, 'info', `"${name}" opened with warnings.`, r.warnings.map(formatIssue));
  else ctx.store.setState({ notice: null });
  return true;
}

export function documentFileName(doc: SectionDocument): string {
  const base = (doc.name ?? 'section').trim().replace(/[^A-Za-z0-9._-]+/g, '-').replace(/^-+|-+$/g, '') || 'section';
  return `${base}.json`;
}

export function saveDocument(ctx: CommandContext): void {
  const doc = ctx.store.getState().doc;
  ctx.io?.download(documentFileName(doc), serialiseDocumentText(doc));
}

export function newDocument(ctx: CommandContext): void {
  commit(ctx.store, { format: 'kern-section', version: 2, units: ctx.store.getState().doc.units, shapes: [] }, []);
}

export function loadDemo(ctx: CommandContext): void {
  commit(ctx.store, DEMO_DOCUMENT, []);
  fitView(ctx);
}

/** Convert the whole document to other units as one step (the view follows, see editor.ts). */
export function setUnits(ctx: CommandContext, u: unknown): void {
  if (!(UNITS as readonly unknown[]).includes(u)) return;
  const s = ctx.store.getState();
  if (s.doc.units === u) return;
  commit(ctx.store, convertDocumentUnits(s.doc, u as Units));
}
