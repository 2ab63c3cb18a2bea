/**
 * The materials of the section: the list with each material's name, E, fy, density and ν (each
 * edit one undo step, checked by the document validator), the reference material (n = 1), the
 * stress unit of E and fy, and two ways to add one: from the built-in library (values converted to
 * the document's stress unit, with their sources) or typed in.
 */
import { useState } from 'react';
import { CODE_DEFERRAL, formatNumber, MATERIAL_LIBRARY, PLASTIC_CAUTION, STRESS_UNITS, TRANSFORMED_CAUTION, type Material, type StressUnit } from '../../src';
import { useEditor, useEditorState } from '../context';
import { CommitInput } from '../fields/CommitInput';
import { useMaterialsUi } from '../materials/hooks';
import { materialsUi } from '../materials/state';
import { addLibraryMaterial, addMaterial, removeMaterial, setReference, setStressUnit, updateMaterial, type MaterialFields } from '../ops/materials';
import { materialColours } from '../paint/materials';
import '../materials/materials.css';
import { Dialog } from './Dialog';

function MaterialRow({ m, colour, isReference, unit }: { m: Material; colour: string; isReference: boolean; unit: string }) {
  const editor = useEditor();
  const [problem, setProblem] = useState<string | null>(null);
  const set = (patch: Partial<MaterialFields>) => updateMaterial(editor.ctx, m.id, patch);
  return (
    <>
      <tr data-material={m.id}>
        <td>
          <input type="radio" name="reference" aria-label={`Reference material: ${m.name || m.id}`} data-reference={m.id} checked={isReference} onChange={() => setProblem(setReference(editor.ctx, m.id))} />
        </td>
        <td>
          <span className="material-swatch" style={{ background: colour }} aria-hidden />
        </td>
        <td className="wide">
          <CommitInput kind="text" field={`${m.id}.name`} label="Name" value={m.name} onCommit={(v) => set({ name: v })} />
          <span className="material-id">{m.id}</span>
        </td>
        <td>
          <CommitInput kind="number" field={`${m.id}.E`} label={`E in ${unit}`} value={m.E} onCommit={(v) => set({ E: v ?? NaN })} />
        </td>
        <td>
          <CommitInput kind="number" field={`${m.id}.fy`} label={`fy in ${unit}`} value={m.fy} onCommit={(v) => set({ fy: v ?? NaN })} />
        </td>
        <td>
          <CommitInput kind="number" field={`${m.id}.density`} label="Density in kg/m³" value={m.density} onCommit={(v) => set({ density: v ?? NaN })} />
        </td>
        <td>
          <CommitInput kind="number" optional field={`${m.id}.nu`} label="Poisson's ratio" value={m.nu ?? null} placeholder="—" onCommit={(v) => set({ nu: v ?? undefined })} />
        </td>
        <td>
          <button className="btn small" data-remove={m.id} title={`Remove ${m.name || m.id}`} onClick={() => setProblem(removeMaterial(editor.ctx, m.id))}>
            Remove
          </button>
        </td>
      </tr>
      {problem && (
        <tr>
          <td colSpan={8} className="field-error" role="alert">
            {problem}
          </td>
        </tr>
      )}
    </>
  );
}

function LibraryAdd({ unit }: { unit: StressUnit }) {
  const editor = useEditor();
  const [pick, setPick] = useState(MATERIAL_LIBRARY[0].id);
  const [problem, setProblem] = useState<string | null>(null);
  const entry = MATERIAL_LIBRARY.find((m) => m.id === pick)!;
  return (
    <div className="mat-add">
      <h3>From the library</h3>
      <div className="mat-add-row">
        <select data-testid="library-select" value={pick} onChange={(e) => setPick(e.target.value)}>
          {MATERIAL_LIBRARY.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name}
            </option>
          ))}
        </select>
        <button
          className="btn primary"
          data-testid="library-add"
          onClick={() => {
            const r = addLibraryMaterial(editor.ctx, pick);
            setProblem('error' in r ? r.error : null);
          }}
        >
          Add
        </button>
      </div>
      <p className="xc-muted" data-testid="library-values">
        E = {formatNumber(entry.E)} MPa, fy = {formatNumber(entry.fy)} MPa, density {formatNumber(entry.density)} kg/m³{entry.nu !== undefined ? `, ν = ${entry.nu}` : ''}
        {unit !== 'MPa' ? ` (added in ${unit})` : ''}. Source: {entry.source}.
      </p>
      {problem && <p className="field-error" role="alert">{problem}</p>}
    </div>
  );
}

function HandAdd({ unit }: { unit: string }) {
  const editor = useEditor();
  const [name, setName] = useState('');
  const [nums, setNums] = useState<{ E: number | null; fy: number | null; density: number | null; nu: number | null }>({ E: null, fy: null, density: null, nu: null });
  const [problem, setProblem] = useState<string | null>(null);
  const num = (k: keyof typeof nums, label: string) => (
    <label className="mat-hand-field">
      <span>{label}</span>
      <CommitInput kind="number" optional={k === 'nu'} field={`new.${k}`} label={label} value={nums[k]} onCommit={(v) => (setNums({ ...nums, [k]: v }), null)} />
    </label>
  );
  return (
    <div className="mat-add">
      <h3>By hand</h3>
      <div className="mat-hand">
        <label className="mat-hand-field">
          <span>Name</span>
          <CommitInput kind="text" field="new.name" label="Name" value={name} placeholder="e.g. Glulam GL28h" onCommit={(v) => (setName(v), null)} />
        </label>
        {num('E', `E (${unit})`)}
        {num('fy', `fy (${unit})`)}
        {num('density', 'Density (kg/m³)')}
        {num('nu', 'ν (optional)')}
        <button
          className="btn primary"
          data-testid="hand-add"
          onClick={() => {
            // Leave the field being typed in first, so its value counts.
            (document.activeElement as HTMLElement | null)?.blur?.();
            const missing = (['E', 'fy', 'density'] as const).filter((k) => nums[k] === null);
            if (!name.trim()) return setProblem('Give the material a name.');
            if (missing.length) return setProblem(`Enter ${missing.join(', ')}.`);
            const r = addMaterial(editor.ctx, { name: name.trim(), E: nums.E!, fy: nums.fy!, density: nums.density!, ...(nums.nu !== null ? { nu: nums.nu } : {}) });
            if ('error' in r) return setProblem(r.error);
            setProblem(null);
            setName('');
            setNums({ E: null, fy: null, density: null, nu: null });
          }}
        >
          Add
        </button>
      </div>
      {problem && <p className="field-error" role="alert">{problem}</p>}
    </div>
  );
}

export function MaterialsDialog() {
  const editor = useEditor();
  const open = useMaterialsUi((s) => s.dialogOpen);
  const materials = useEditorState((s) => s.doc.materials);
  const reference = useEditorState((s) => s.doc.reference);
  const unit = useEditorState((s) => s.doc.stressUnit ?? 'MPa');
  const [unitProblem, setUnitProblem] = useState<string | null>(null);
  if (!open) return null;
  const colours = materialColours(materials);
  return (
    <Dialog title="Materials" testId="materials-dialog" closeTestId="materials-close" cardClass="xc-card mat-card" overlayClass="xc-side" onClose={() => materialsUi(editor.store).setState({ dialogOpen: false })}>
      <div className="xc-body">
        <div className="mat-units">
          <label>
            E and fy in{' '}
            <select data-testid="stress-unit" value={unit} onChange={(e) => setUnitProblem(setStressUnit(editor.ctx, e.target.value as StressUnit))}>
              {STRESS_UNITS.map((u) => (
                <option key={u} value={u}>
                  {u}
                </option>
              ))}
            </select>
          </label>
          <span className="xc-muted">density in kg/m³. Changing the unit converts E and fy; stresses are shown in it too.</span>
        </div>
        {unitProblem && <p className="field-error">{unitProblem}</p>}
        {materials?.length ? (
          <table className="mat-table" data-testid="materials-table">
            <thead>
              <tr>
                <th title="Reference material: n = E / E_ref = 1; the transformed section is expressed in it">Ref.</th>
                <th />
                <th>Name</th>
                <th>E ({unit})</th>
                <th>fy ({unit})</th>
                <th>Density (kg/m³)</th>
                <th>ν</th>
                <th />
              </tr>
            </thead>
            <tbody>
              {materials.map((m) => (
                <MaterialRow key={m.id} m={m} colour={colours.get(m.id)!} isReference={m.id === reference} unit={unit} />
              ))}
            </tbody>
          </table>
        ) : (
          <p className="hint">No materials: the section is one material and has geometric properties only. Add materials to get the centre of gravity, the mass per length and the transformed section. The first one added becomes the reference; shapes with no material of their own take the reference.</p>
        )}
        <p className="xc-muted">
          fy is the strength the plastic moment uses (the yield or proof stress of a metal, the bending strength of timber and glass, the compressive strength of concrete). Give each shape its material in the
          selection panel; where shapes overlap, the later one's material counts.
        </p>
        <LibraryAdd unit={unit} />
        <HandAdd unit={unit} />
        <p className="mat-caution">
          {TRANSFORMED_CAUTION} {PLASTIC_CAUTION} Library values are starting points for a sketch, not design values. {CODE_DEFERRAL}
        </p>
      </div>
    </Dialog>
  );
}
