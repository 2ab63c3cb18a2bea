/**
 * Exchange and title-block commands, registered into the editor's one registry (so the toolbar,
 * the keyboard and the tests dispatch them the same way).
 */
import type { SectionDocument, TitleBlock } from '../../src';
import type { CommandContext, CommandRegistry } from '../commands/registry';
import { commit } from '../store/history';
import { readDxf } from './dxf';
import { canExport, exportDxfFile, exportJsonFile, exportPngFile, exportSvgFile } from './exports';
import { exchangeStore } from './state';

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

export function registerExchangeCommands(r: CommandRegistry): void {
  r.register({
    name: 'file.importDxf',
    label: 'Import DXF…',
    group: 'file',
    hint: 'Add outlines from a DXF drawing to the section',
    perform: (c, arg) => {
      const a = arg as { name?: unknown; text?: unknown; units?: unknown } | undefined;
      if (a && typeof a.text === 'string') {
        readDxf(c, typeof a.name === 'string' ? a.name : 'drawing.dxf', a.text, a.units as never);
        return;
      }
      exchangeStore(c.store).getState().pickDxf?.();
    },
  });
  r.register({ name: 'file.export', label: 'Export…', group: 'file', hint: 'SVG, DXF, PNG or the section document', perform: (c) => exchangeStore(c.store).setState({ exportOpen: true }) });
  r.register({ name: 'export.svg', label: 'SVG', group: 'file', enabled: canExport, perform: (c) => void exportSvgFile(c) });
  r.register({ name: 'export.dxf', label: 'DXF', group: 'file', enabled: canExport, perform: (c) => void exportDxfFile(c) });
  r.register({
    name: 'export.png',
    label: 'PNG',
    group: 'file',
    enabled: canExport,
    perform: async (c, arg) => {
      const err = await exportPngFile(c, Number(arg));
      if (err) c.store.setState({ notice: { kind: 'error', title: 'The PNG was not exported.', lines: [err] } });
    },
  });
  r.register({ name: 'export.json', label: 'Section document (JSON)', group: 'file', perform: exportJsonFile });
  r.register({ name: 'doc.titleBlock', label: 'Title block…', group: 'file', hint: 'Project, section, author, checker, date and revision for the report', perform: (c) => exchangeStore(c.store).setState({ titleOpen: true }) });
  r.register({
    name: 'doc.setTitle',
    label: 'Set title-block field',
    group: 'file',
    perform: (c, arg) => {
      const a = arg as { field: TitleField; value: string } | undefined;
      if (a) setTitleField(c, a.field, a.value);
    },
  });
}
