/** The shapes in the order they combine: click selects (Shift adds), the mark shows the operation. */
import { memo } from 'react';
import { shapeDisplayName, type Shape } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { activeShapes } from '../store/section';

const MARK = { add: '+', subtract: '−', intersect: '∩' } as const;

const ShapeRow = memo(function ShapeRow({ s, i, on, error }: { s: Shape; i: number; on: boolean; error: string | undefined }) {
  const editor = useEditor();
  const op = s.op ?? 'add';
  return (
    <li>
      <button
        className={`shape-item${on ? ' on' : ''}`}
        data-shape={s.id}
        title={error ?? `${op}: ${shapeDisplayName(s, i)}`}
        onClick={(e) => {
          const sel = editor.store.getState().selected;
          editor.store.setState({
            selected: e.shiftKey ? (sel.includes(s.id) ? sel.filter((x) => x !== s.id) : [...sel, s.id]) : [s.id],
          });
        }}
      >
        <span className={`op-mark op-${op}`}>{MARK[op]}</span>
        <span className="shape-name">{shapeDisplayName(s, i)}</span>
        {error && <span className="shape-error">!</span>}
      </button>
    </li>
  );
});

export function ShapeList() {
  const shapes = useEditorState((s) => activeShapes(s.doc));
  const selected = useEditorState((s) => s.selected);
  // A string key: the list re-renders only when the set of failing shapes changes.
  const errorKey = useResults((r) => JSON.stringify(r.evaluation.shapes.filter((s) => s.error).map((s) => [s.id, s.error])));
  const errors = new Map<string, string>(JSON.parse(errorKey));
  return (
    <section className="panel-section shapes" data-testid="shape-list">
      <h2>
        Shapes <span className="kind">in order of combination</span>
      </h2>
      {shapes.length === 0 && <p className="hint">No shapes yet.</p>}
      <ol>
        {shapes.map((s, i) => (
          <ShapeRow key={s.id} s={s} i={i} on={selected.includes(s.id)} error={errors.get(s.id)} />
        ))}
      </ol>
    </section>
  );
}
