/**
 * The checker's fields kept in the document (format version 2): the revision history
 * (`revisions`, each {revision, date, description, by}), the `notes`, and the "checked by / date"
 * block (`checked`). The report prints them (src/report/checker.ts).
 *
 * Each change is one undoable step, and nothing is recorded when nothing changes. Fields that end
 * up empty leave the document (no empty `notes`, no `checked` with both parts empty, no empty
 * `revisions` list), so a document that never had them is written as it was.
 */
import type { Revision, SectionDocument } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';

export const REVISION_FIELDS = ['revision', 'date', 'description', 'by'] as const;
export type RevisionField = (typeof REVISION_FIELDS)[number];
export const CHECKED_FIELDS = ['by', 'date'] as const;
export type CheckedField = (typeof CHECKED_FIELDS)[number];

/** One line of text: line breaks and tabs become spaces (a table cell holds one line). */
const oneLine = (v: string) => v.replace(/[\r\n\t]+/g, ' ');

export function revisionsOf(doc: SectionDocument): Revision[] {
  return doc.revisions ?? [];
}

/**
 * The mark after `prev`: the last run of digits counts up (P1 → P2, 9 → 10), else a last letter
 * moves on (A → B, Z → AA, c → d); '' for anything else. Common practice on drawings, no source.
 */
export function nextRevisionMark(prev: string): string {
  const t = prev.trim();
  const digits = /^(.*?)(\d+)$/.exec(t);
  if (digits) return digits[1] + String(Number(digits[2]) + 1).padStart(digits[2].length, '0');
  const letter = /^(.*?)([A-Za-z])$/.exec(t);
  if (!letter) return '';
  const ch = letter[2];
  if (ch === 'Z' || ch === 'z') return `${letter[1]}${ch === 'Z' ? 'AA' : 'aa'}`;
  return letter[1] + String.fromCharCode(ch.charCodeAt(0) + 1);
}

/** The document without one of its optional fields. */
function without(doc: SectionDocument, key: 'revisions' | 'notes' | 'checked'): SectionDocument {
  const next = { ...doc };
  delete next[key];
  return next;
}

function withRevisions(doc: SectionDocument, list: Revision[]): SectionDocument {
  return list.length ? { ...doc, revisions: list } : without(doc, 'revisions');
}

/**
 * Add a line to the revision history (one undo step). Unless given, its mark follows the latest
 * one (the history's, else the title block's revision), and its date is `today` (YYYY-MM-DD).
 */
export function addRevision(ctx: CommandContext, entry: Partial<Revision> = {}, today = new Date()): void {
  const doc = ctx.store.getState().doc;
  const list = revisionsOf(doc);
  const latest = list.length ? list[list.length - 1].revision : doc.title?.revision ?? '';
  const iso = `${today.getFullYear()}-${String(today.getMonth() + 1).padStart(2, '0')}-${String(today.getDate()).padStart(2, '0')}`;
  const given = (v: unknown, fallback: string) => oneLine(typeof v === 'string' ? v : fallback);
  const e = (typeof entry === 'object' && entry !== null ? entry : {}) as Partial<Record<RevisionField, unknown>>;
  const row: Revision = {
    revision: given(e.revision, nextRevisionMark(latest) || 'A'),
    date: given(e.date, iso),
    description: given(e.description, ''),
    by: given(e.by, ''),
  };
  commit(ctx.store, withRevisions(doc, [...list, row]));
}

/** Set one field of one revision line (one undo step; nothing when unchanged or out of range). */
export function setRevisionField(ctx: CommandContext, index: number, field: RevisionField, value: string): void {
  if (!(REVISION_FIELDS as readonly string[]).includes(field) || typeof value !== 'string') return;
  const doc = ctx.store.getState().doc;
  const list = revisionsOf(doc);
  if (!Number.isInteger(index) || index < 0 || index >= list.length) return;
  const v = oneLine(value);
  if (list[index][field] === v) return;
  commit(ctx.store, withRevisions(doc, list.map((r, k) => (k === index ? { ...r, [field]: v } : r))));
}

/** Remove one revision line (one undo step). */
export function deleteRevision(ctx: CommandContext, index: number): void {
  const doc = ctx.store.getState().doc;
  const list = revisionsOf(doc);
  if (!Number.isInteger(index) || index < 0 || index >= list.length) return;
  commit(ctx.store, withRevisions(doc, list.filter((_, k) => k !== index)));
}

/** Set the notes (several lines allowed; one undo step; empty notes leave the document). */
export function setNotes(ctx: CommandContext, value: string): void {
  if (typeof value !== 'string') return;
  const doc = ctx.store.getState().doc;
  const typed = value.replace(/\r\n?/g, '\n');
  const v = typed.trim() === '' ? '' : typed;
  if ((doc.notes ?? '') === v) return;
  commit(ctx.store, v === '' ? without(doc, 'notes') : { ...doc, notes: v });
}

/** Set "checked by" or its date (one undo step; the block leaves the document when both are empty). */
export function setChecked(ctx: CommandContext, field: CheckedField, value: string): void {
  if (!(CHECKED_FIELDS as readonly string[]).includes(field) || typeof value !== 'string') return;
  const doc = ctx.store.getState().doc;
  const v = oneLine(value);
  const cur = doc.checked ?? { by: '', date: '' };
  if (cur[field] === v) return;
  const checked = { ...cur, [field]: v };
  commit(ctx.store, checked.by === '' && checked.date === '' ? without(doc, 'checked') : { ...doc, checked });
}
