/**
 * The material of the selected area shapes, in the selection panel: one of the document's
 * materials, or none (the shape takes the reference material). One undo step per change; without
 * materials the row offers to add some.
 */
import { kindOf, type Shape } from '../../src';
import { useEditor, useEditorState } from '../context';
import { materialColours } from '../paint/materials';

const MIXED = '\u0000mixed';
const REFERENCE = '';

export function MaterialSelect({ shapes }: { shapes: Shape[] }) {
  const editor = useEditor();
  const materials = useEditorState((s) => s.doc.materials);
  const reference = useEditorState((s) => s.doc.reference);
  const area = shapes.filter((s) => !kindOf(s).line);
  if (!area.length) return null;
  if (!materials?.length) {
    return (
      <div className="material-row">
        <span className="field-label">Material</span>
        <span className="hint">one material (none set)</span>
        <button className="btn small" data-command="materials.open" onClick={() => editor.run('materials.open')}>
          Materials…
        </button>
      </div>
    );
  }
  const ids = new Set(area.map((s) => s.material ?? REFERENCE));
  const value = ids.size === 1 ? [...ids][0] : MIXED;
  const refName = materials.find((m) => m.id === reference)?.name || reference;
  const colours = materialColours(materials);
  const shown = value === REFERENCE ? reference : value;
  return (
    <div className="material-row">
      <label className="field-label" htmlFor="shape-material">
        Material
      </label>
      <span className="material-swatch" style={{ background: shown && shown !== MIXED ? colours.get(shown) : 'transparent' }} aria-hidden />
      <select
        id="shape-material"
        data-field="material"
        value={value}
        onChange={(e) => {
          if (e.target.value !== MIXED) editor.run('material.assign', e.target.value === REFERENCE ? null : e.target.value);
        }}
      >
        {value === MIXED && <option value={MIXED}>(several)</option>}
        <option value={REFERENCE}>Reference: {refName}</option>
        {materials.map((m) => (
          <option key={m.id} value={m.id}>
            {m.name || m.id}
          </option>
        ))}
      </select>
      <button className="btn small" data-command="materials.open" title="Add or edit materials" onClick={() => editor.run('materials.open')}>
        Edit…
      </button>
    </div>
  );
}
