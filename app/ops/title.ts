/** The report's title block (doc.name and doc.title): one field at a time, one undo step each. */
import type { SectionDocument, TitleBlock } from '../../src';
import type { CommandContext } from '../commands/registry';
import { commit } from '../store/history';

export const TITLE_FIELDS = ['name', 'project', 'section', 'author', 'checker', 'date', 'revision'] as const;
export type TitleField = (typeof TITLE_FIELDS)[number];

export function titleValue(doc: SectionDocument, field: TitleField): string {
  return (field === 'name' ? doc.name : doc.title?.[field]) ?? '';
}

/** Set one title-block field as one undoable step (nothing recorded when unchanged). */
export function setTitleField(ctx: CommandContext, field: TitleField, value: string): void {
  if (!(TITLE_FIELDS as readonly string[]).includes(field) || typeof value !== 'string') return;
  const doc = ctx.store.getState().doc;
  const v = value.replace(/[\r\n\t]+/g, ' ');
  if (titleValue(doc, field) === v) return;
  let next: SectionDocument;
  if (field === 'name') {
    next = { ...doc };
    if (v.trim() === '') delete next.name;
    else next.name = v;
  } else {
    const title: TitleBlock = { ...(doc.title ?? {}) };
    if (v === '') delete title[field];
    else title[field] = v;
    next = { ...doc, title };
  }
  commit(ctx.store, next);
}
