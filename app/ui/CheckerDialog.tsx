/**
 * The checker's fields, kept in the document and printed in the report: the revision history
 * (add, edit and delete lines of revision, date, description, by), the notes, and the "checked
 * by / date" block. A field is committed as one undoable step when it is left or Enter is pressed
 * (Ctrl+Enter in the notes); Escape in a field restores what is stored.
 */
import { useEffect, useState } from 'react';
import { REVISION_FIELDS, type RevisionField } from '../ops/checker';
import { useEditor, useEditorState } from '../context';
import './checker.css';
import { Dialog } from './Dialog';

const COLUMN: Record<RevisionField, { head: string; hint: string }> = {
  revision: { head: 'Revision', hint: 'A' },
  date: { head: 'Date', hint: '2026-12-02' },
  description: { head: 'Description', hint: 'What changed' },
  by: { head: 'By', hint: 'Initials' },
};

/** A text field showing the stored value, committed once on leaving it or on Enter. */
function CommittedText({ stored, save, multiline = false, attrs }: { stored: string; save: (v: string) => unknown; multiline?: boolean; attrs: Record<string, string> }) {
  const [draft, setDraft] = useState(stored);
  // Undo, redo or a loaded file change the stored value: show it.
  useEffect(() => setDraft(stored), [stored]);
  const commit = () => {
    if (draft !== stored) save(draft);
  };
  const common = {
    value: draft,
    spellCheck: false,
    onBlur: commit,
    ...attrs,
  };
  if (multiline) {
    return (
      <textarea
        {...common}
        rows={5}
        onChange={(e) => setDraft(e.target.value)}
        onKeyDown={(e) => {
          e.stopPropagation();
          if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) commit();
          if (e.key === 'Escape') setDraft(stored);
        }}
      />
    );
  }
  return (
    <input
      {...common}
      maxLength={200}
      onChange={(e) => setDraft(e.target.value)}
      onKeyDown={(e) => {
        e.stopPropagation();
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') setDraft(stored);
      }}
    />
  );
}

function RevisionTable() {
  const editor = useEditor();
  const revisions = useEditorState((s) => s.doc.revisions) ?? [];
  return (
    <table className="ck-revisions" data-testid="revision-table">
      <thead>
        <tr>
          {REVISION_FIELDS.map((f) => (
            <th key={f} className={`ck-${f}`}>
              {COLUMN[f].head}
            </th>
          ))}
          <th aria-label="Delete" />
        </tr>
      </thead>
      <tbody>
        {revisions.map((r, i) => (
          <tr key={i} data-revision-row={i}>
            {REVISION_FIELDS.map((f) => (
              <td key={f} className={`ck-${f}`}>
                <CommittedText
                  stored={r[f]}
                  save={(value) => editor.run('doc.setRevision', { index: i, field: f, value })}
                  attrs={{ placeholder: COLUMN[f].hint, 'aria-label': `${COLUMN[f].head} of line ${i + 1}`, 'data-revision-field': f }}
                />
              </td>
            ))}
            <td>
              <button className="btn small" title={`Delete line ${i + 1}`} aria-label={`Delete line ${i + 1}`} data-revision-delete={i} onClick={() => editor.run('doc.deleteRevision', i)}>
                ×
              </button>
            </td>
          </tr>
        ))}
        {revisions.length === 0 && (
          <tr>
            <td colSpan={5} className="ck-muted">
              No revisions recorded. The report prints a blank line to fill in by hand.
            </td>
          </tr>
        )}
      </tbody>
    </table>
  );
}

export function CheckerDialog() {
  const editor = useEditor();
  const open = useEditorState((s) => s.checkerOpen);
  const notes = useEditorState((s) => s.doc.notes) ?? '';
  const checked = useEditorState((s) => s.doc.checked);
  if (!open) return null;
  return (
    <Dialog title="Revisions, notes and check" testId="checker-dialog" closeTestId="checker-close" cardClass="ck-card" onClose={() => editor.store.setState({ checkerOpen: false })}>
      <div className="ck-body">
        <h3 className="ck-h">Revision history</h3>
        <RevisionTable />
        <div>
          <button className="btn" data-command="doc.addRevision" onClick={() => editor.run('doc.addRevision')}>
            Add revision
          </button>
        </div>
        <h3 className="ck-h">
          <label htmlFor="checker-notes">Notes</label>
        </h3>
        <CommittedText stored={notes} save={(v) => editor.run('doc.setNotes', v)} multiline attrs={{ id: 'checker-notes', 'data-checker-field': 'notes', placeholder: 'Assumptions, open points, references…' }} />
        <h3 className="ck-h">Check</h3>
        <div className="ck-signoff">
          <label htmlFor="checker-by">Checked by</label>
          <CommittedText stored={checked?.by ?? ''} save={(value) => editor.run('doc.setChecked', { field: 'by', value })} attrs={{ id: 'checker-by', 'data-checker-field': 'checked-by', placeholder: 'Name' }} />
          <label htmlFor="checker-date">Date</label>
          <CommittedText stored={checked?.date ?? ''} save={(value) => editor.run('doc.setChecked', { field: 'date', value })} attrs={{ id: 'checker-date', 'data-checker-field': 'checked-date', placeholder: '2026-12-02' }} />
        </div>
        <p className="ck-muted">
          Kept in the section document and printed in the report beside the figure; the latest revision and the checker also fill the title block. Each change is one step of undo. The
          signature is left for the checker's hand.
        </p>
      </div>
    </Dialog>
  );
}
