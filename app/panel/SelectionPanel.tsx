/**
 * The selected shape's name, operation and own fields (from its kind's editor module), and the
 * actions on the selection. Every edit is checked by the engine before it is applied; a refused
 * edit changes nothing.
 */
import { useState } from 'react';
import { isProfile, kindOf, OPS, shapeDisplayName, shapeKindLabel, type Op, type Shape } from '../../src';
import { useEditor, useEditorState } from '../context';
import { evaluateExpression } from '../expr';
import { CommandButton } from '../fields/CommandButton';
import { useApply } from '../fields/shape-edit';
import { ShapeFields } from '../shapes';
import { activeSection } from '../store/section';
import { HINT } from '../input-syntax';
import { RoundCorner } from './RoundCorner';
import { MaterialSelect } from '../fields/MaterialSelect';

const OP_LABEL: Record<Op, string> = { add: 'Add', subtract: 'Subtract', intersect: 'Intersect' };

function RotateBox() {
  const editor = useEditor();
  const [text, setText] = useState('90');
  const [err, setErr] = useState<string | null>(null);
  const go = () => {
    const r = evaluateExpression(text);
    if (!r.ok) return setErr(r.message);
    setErr(null);
    editor.run('edit.rotate', r.value);
  };
  return (
    <div className="rotate-box">
      <label className={`field inline${err ? ' invalid' : ''}`}>
        <span className="field-label">Rotate by</span>
        <input data-field="rotate-by" value={text} onChange={(e) => setText(e.target.value)} onKeyDown={(e) => { e.stopPropagation(); if (e.key === 'Enter') go(); }} />
        <span className="field-suffix">° CCW</span>
      </label>
      <button className="btn" data-command="edit.rotate" onClick={go}>Rotate</button>
      {err && <span className="field-error" role="alert">{err}</span>}
    </div>
  );
}

export function SelectionPanel() {
  const editor = useEditor();
  const selected = useEditorState((s) => s.selected);
  const doc = useEditorState((s) => activeSection(s.doc));
  const apply = useApply();
  const shapes = doc.shapes.filter((s) => selected.includes(s.id));
  if (shapes.length === 0) {
    return (
      <section className="panel-section" data-testid="selection-panel">
        <h2>Selection</h2>
        <p className="hint">Nothing selected. Click a shape, or draw one with the tools on the left. Type coordinates while drawing: {HINT.nextPoint}.</p>
      </section>
    );
  }
  const one = shapes.length === 1 ? shapes[0] : null;
  const idx = one ? doc.shapes.indexOf(one) : -1;
  const ops = new Set(shapes.map((s) => s.op ?? 'add'));
  return (
    <section className="panel-section" data-testid="selection-panel">
      <h2>
        {one ? (
          <>
            {shapeDisplayName(one, idx)} <span className="kind">{shapeKindLabel(one)}</span>
          </>
        ) : (
          `${shapes.length} shapes selected`
        )}
      </h2>
      {shapes.some((sh) => !kindOf(sh).line) && (
        <div className="op-switch" role="radiogroup" aria-label="Operation">
          {OPS.map((op) => (
            <button
              key={op}
              role="radio"
              aria-checked={ops.size === 1 && ops.has(op)}
              className={`op op-${op}${ops.size === 1 && ops.has(op) ? ' on' : ''}`}
              data-testid={`op-${op}`}
              onClick={() => editor.run(`op.${op}`)}
            >
              {OP_LABEL[op]}
            </button>
          ))}
        </div>
      )}
      <MaterialSelect shapes={shapes} />
      {one && (
        <div className="fields" key={one.id}>
          <label className="field">
            <span className="field-label">Name</span>
            <input
              key={one.name ?? ''} // remount when undo or redo changes the name
              data-field="name"
              defaultValue={one.name ?? ''}
              placeholder={shapeDisplayName(one, idx)}
              onKeyDown={(e) => { e.stopPropagation(); if (e.key === 'Enter') (e.target as HTMLInputElement).blur(); }}
              onBlur={(e) => {
                const v = e.target.value.trim();
                if (v === (one.name ?? '')) return;
                apply(one.id, (s) => {
                  const n = { ...s } as Shape;
                  if (v) n.name = v;
                  else delete n.name;
                  return n;
                });
              }}
            />
          </label>
          <ShapeFields shape={one} />
        </div>
      )}
      {one && <RoundCorner key={`round-${one.id}`} shape={one} />}
      <RotateBox />
      <div className="actions">
        {['edit.mirrorX', 'edit.mirrorY', 'edit.duplicate', 'edit.delete', 'order.backward', 'order.forward'].map((n) => (
          <CommandButton key={n} name={n} />
        ))}
        {shapes.some(isProfile) && <CommandButton name="shape.toOutline" />}
        <CommandButton name="shape.merge" />
      </div>
      {shapes.length > 1 && (
        <p className="hint">Merging replaces the selected shapes by path outlines of their combined result.</p>
      )}
    </section>
  );
}
