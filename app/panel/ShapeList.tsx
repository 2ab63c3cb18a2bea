/** The shapes in the order they combine: click selects (Shift adds), the mark shows the operation. */
import { useEditor, useEditorState, useResults } from '../store/hooks';
import { shapeLabel } from '../shapes';

const MARK = { add: '+', subtract: '−', intersect: '∩' } as const;

export function ShapeList() {
  const editor = useEditor();
  const shapes = useEditorState((s) => s.doc.shapes);
  const selected = useEditorState((s) => s.selected);
  const ev = useResults((r) => r.evaluation);
  const errors = new Map(ev.shapes.filter((s) => s.error).map((s) => [s.id, s.error!]));
  return (
    <section className="panel-section shapes" data-testid="shape-list">
      <h2>Shapes <span className="kind">in order of combination</span></h2>
      {shapes.length === 0 && <p className="hint">No shapes yet.</p>}
      <ol>
        {shapes.map((s, i) => {
          const op = s.op ?? 'add';
          const on = selected.includes(s.id);
          return (
            <li key={s.id}>
              <button
                className={`shape-item${on ? ' on' : ''}`}
                data-shape={s.id}
                title={errors.get(s.id) ?? `${op}: ${shapeLabel(s, i)}`}
                onClick={(e) => {
                  const sel = editor.store.getState().selected;
                  editor.store.setState({
                    selected: e.shiftKey ? (sel.includes(s.id) ? sel.filter((x) => x !== s.id) : [...sel, s.id]) : [s.id],
                  });
                }}
              >
                <span className={`op-mark op-${op}`}>{MARK[op]}</span>
                <span className="shape-name">{shapeLabel(s, i)}</span>
                {errors.has(s.id) && <span className="shape-error">!</span>}
              </button>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
