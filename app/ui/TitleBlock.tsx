/**
 * The title block kept in the document (doc.name and doc.title): edited here, printed in the
 * report. Each field is committed as one undoable step when it is left or Enter is pressed.
 */
import { useEffect, useState } from 'react';
import { TITLE_FIELDS, titleValue, type TitleField } from '../ops/title';
import { useExchange } from '../exchange/hooks';
import { exchangeStore } from '../exchange/state';
import { useEditor, useEditorState } from '../context';
import { CommandButton } from '../fields/CommandButton';
import '../exchange/exchange.css';
import { Dialog } from './Dialog';

const LABEL: Record<TitleField, string> = {
  name: 'Name',
  project: 'Project',
  section: 'Section',
  author: 'Author',
  checker: 'Checker',
  date: 'Date',
  revision: 'Revision',
};

const HINT: Partial<Record<TitleField, string>> = {
  name: 'Heading of the report and file name',
  section: 'Section mark in the title block (the name when empty)',
  date: 'e.g. 2026-12-02',
};

function TitleInput({ field }: { field: TitleField }) {
  const editor = useEditor();
  const stored = useEditorState((s) => titleValue(s.doc, field));
  const [draft, setDraft] = useState(stored);
  // Undo, redo or a loaded file change the stored value: show it.
  useEffect(() => setDraft(stored), [stored]);
  const save = () => {
    if (draft !== stored) editor.run('doc.setTitle', { field, value: draft });
  };
  return (
    <>
      <label htmlFor={`title-${field}`}>{LABEL[field]}</label>
      <input
        id={`title-${field}`}
        data-title-field={field}
        value={draft}
        placeholder={HINT[field] ?? ''}
        maxLength={200}
        spellCheck={false}
        onChange={(e) => setDraft(e.target.value)}
        onBlur={save}
        onKeyDown={(e) => {
          e.stopPropagation();
          if (e.key === 'Enter') save();
          if (e.key === 'Escape') setDraft(stored);
        }}
      />
    </>
  );
}

export function TitleBlockDialog() {
  const editor = useEditor();
  const open = useExchange((s) => s.titleOpen);
  const units = useEditorState((s) => s.doc.units);
  if (!open) return null;
  return (
    <Dialog title="Title block" testId="title-dialog" closeTestId="title-close" cardClass="xc-card" focusInput onClose={() => exchangeStore(editor.store).setState({ titleOpen: false })}>
      <div className="xc-body">
        <div className="xc-title-grid">
          {TITLE_FIELDS.map((f) => (
            <TitleInput key={f} field={f} />
          ))}
          <span>Units</span>
          <span className="xc-muted">{units} (change them in the results panel)</span>
        </div>
        <p className="xc-muted">Kept in the section document and printed in the report. Each change is one step of undo.</p>
        <div>
          <CommandButton name="doc.checker">Revision history, notes and check…</CommandButton>
        </div>
      </div>
    </Dialog>
  );
}
