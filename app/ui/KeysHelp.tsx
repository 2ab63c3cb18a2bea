/** Every command with its keys, read from the one registry (the same table the keyboard uses). */
import { useState } from 'react';
import { createPortal } from 'react-dom';
import { useEditor } from '../context';
import { keyHint } from '../fields/CommandButton';
import { HELP_LINES } from '../input-syntax';
import { showGuide } from './guide-state';

const GROUP_LABEL: Record<string, string> = {
  tool: 'Tools',
  edit: 'Edit',
  op: 'Operation',
  order: 'Order',
  shape: 'Shapes',
  snap: 'Snapping',
  view: 'View',
  file: 'File',
  units: 'Units',
};

export function KeysHelp() {
  const [open, setOpen] = useState(false);
  const editor = useEditor();
  const withKeys = editor.commands.all().filter((c) => c.keys?.length);
  const groups = [...new Set(withKeys.map((c) => c.group))];
  return (
    <>
      <button className="btn" data-testid="keys-help" onClick={() => setOpen(true)} title="Keyboard commands">
        Keys
      </button>
      {open &&
        createPortal(
        <div className="overlay" role="dialog" aria-label="Keyboard commands" onClick={() => setOpen(false)}>
          <div className="overlay-card keys-card" onClick={(e) => e.stopPropagation()}>
            <div className="overlay-head">
              <h2>Keyboard commands</h2>
              <div className="spacer" />
              <button
                className="btn"
                data-testid="show-guide"
                onClick={() => {
                  setOpen(false);
                  showGuide(editor.store);
                }}
              >
                First steps
              </button>
              <button className="btn" onClick={() => setOpen(false)}>
                Close
              </button>
            </div>
            <div className="keys-body">
              {groups.map((g) => (
                <section key={g}>
                  <h3>{GROUP_LABEL[g] ?? g}</h3>
                  <dl>
                    {withKeys
                      .filter((c) => c.group === g)
                      .map((c) => (
                        <div key={c.name} className="key-row">
                          <dt>{c.keys!.map((k) => keyHint([k])).join(' / ')}</dt>
                          <dd>{c.label}</dd>
                        </div>
                      ))}
                  </dl>
                </section>
              ))}
              <section>
                <h3>Typed entries</h3>
                <dl>
                  {HELP_LINES.map((l) => (
                    <div key={l.form} className="key-row">
                      <dt>
                        {l.form}
                        {l.typed && <span className="typed-alias"> or {l.typed}</span>}
                      </dt>
                      <dd>{l.meaning}</dd>
                    </div>
                  ))}
                </dl>
              </section>
              <section>
                <h3>While drawing</h3>
                <dl>
                  <div className="key-row"><dt>Enter</dt><dd>finish a polygon or path</dd></div>
                  <div className="key-row"><dt>Backspace</dt><dd>take back the last point</dd></div>
                  <div className="key-row"><dt>Escape</dt><dd>abandon the shape, then leave the tool</dd></div>
                  <div className="key-row"><dt>Shift (held)</dt><dd>orthogonal from the last point</dd></div>
                  <div className="key-row"><dt>Space + drag, middle button</dt><dd>pan; wheel zooms about the pointer</dd></div>
                </dl>
              </section>
            </div>
          </div>
        </div>,
        document.body,
      )}
    </>
  );
}
