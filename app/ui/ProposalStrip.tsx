/**
 * The proposals strip across the top of the canvas: the baseline and each proposal as a tab (one
 * click shows it; undo takes the switch back), "New proposal", and, for the proposal shown,
 * rename (also by double-clicking its tab) and delete (asked first). Everything goes through the
 * command table.
 */
import { useState } from 'react';
import { useEditor, useEditorState } from '../context';
import { proposalNameProblem } from '../ops/proposals';
import './cutout.css';

const EMPTY: string[] = [];

function RenameBox({ from, done }: { from: string; done: () => void }) {
  const editor = useEditor();
  const [text, setText] = useState(from);
  const [error, setError] = useState<string | null>(null);
  const apply = () => {
    const to = text.trim();
    if (to === from) return done();
    const problem = proposalNameProblem(editor.store.getState().doc, from, to);
    if (problem) return setError(problem);
    editor.run('proposal.rename', { from, to });
    done();
  };
  return (
    <>
      <input
        className="ptab-edit"
        data-testid="proposal-name"
        aria-label="Proposal name"
        autoFocus
        value={text}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={(e) => {
          e.stopPropagation();
          if (e.key === 'Enter') apply();
          else if (e.key === 'Escape') done();
        }}
        onBlur={apply}
      />
      {error && (
        <span className="ptab-error" role="alert">
          {error}
        </span>
      )}
    </>
  );
}

export function ProposalStrip() {
  const editor = useEditor();
  const names = useEditorState((s) => (s.doc.variants?.length ? s.doc.variants.map((v) => v.name).join('\u0000') : ''));
  const active = useEditorState((s) => s.doc.activeVariant ?? null);
  const [renaming, setRenaming] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<string | null>(null);
  const list = names ? names.split('\u0000') : EMPTY;
  return (
    <div className="proposal-strip" role="tablist" aria-label="Baseline and proposals" data-testid="proposal-strip">
      <button
        role="tab"
        aria-selected={active === null}
        className={`ptab base${active === null ? ' on' : ''}`}
        data-testid="proposal-tab"
        data-name=""
        title="The section as designed"
        onClick={() => editor.run('proposal.baseline')}
      >
        <span className="ptab-mark" />
        Baseline
      </button>
      {list.map((name) =>
        renaming === name ? (
          <RenameBox key={name} from={name} done={() => setRenaming(null)} />
        ) : (
          <button
            key={name}
            role="tab"
            aria-selected={active === name}
            className={`ptab prop${active === name ? ' on' : ''}`}
            data-testid="proposal-tab"
            data-name={name}
            title={active === name ? `${name} (double-click to rename)` : `Show ${name}, compared with the baseline`}
            onClick={() => editor.run('proposal.show', name)}
            onDoubleClick={() => setRenaming(name)}
          >
            <span className="ptab-mark" />
            {name}
          </button>
        ),
      )}
      <button className="ptab-new" data-command="proposal.new" data-testid="proposal-new" title="Start a proposal as a copy of the baseline (the section as the fabricator proposes to cut it)" onClick={() => editor.run('proposal.new')}>
        + New proposal
      </button>
      {active !== null && renaming === null && (
        <div className="ptab-tools">
          {confirming === active ? (
            <span className="ptab-confirm" role="alertdialog" aria-label="Delete proposal">
              Delete “{active}” and its shapes?
              <button className="btn danger" data-testid="proposal-delete-confirm" onClick={() => (editor.run('proposal.delete', active), setConfirming(null))}>
                Delete
              </button>
              <button className="btn" data-testid="proposal-delete-cancel" autoFocus onClick={() => setConfirming(null)}>
                Keep
              </button>
            </span>
          ) : (
            <>
              <button className="btn" data-testid="proposal-rename" onClick={() => setRenaming(active)}>
                Rename
              </button>
              <button className="btn" data-testid="proposal-delete" onClick={() => setConfirming(active)}>
                Delete…
              </button>
            </>
          )}
        </div>
      )}
    </div>
  );
}
