/**
 * Loads and stresses: N, Mx, My (and V for the cut line) with their units, kept in the document
 * (each entry one undo step); the largest tension and compression with their places, per material
 * too; the neutral axis; the stress at a point typed here or clicked with the probe; τ = VQ/(Ib)
 * at the cut line; the sign convention and the cautions. A section without materials is taken as
 * one material, so stresses work on any section.
 */
import { axisAngle, tensionSide, KERN_CAUTION, FORCE_UNITS, formatNumber, formatQuantity, SIGN_CONVENTION, STRESS_CAUTION, sectionSize, stressAt, STRESS_UNITS, UNITS, type ForceUnit, type LoadCase, type StressPoint, type StressUnit, type Units } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { CommitInput } from '../fields/CommitInput';
import { useLoadCase, useStressSection } from '../materials/derived';
import { useMaterialsUi } from '../materials/hooks';
import { materialsUi } from '../materials/state';
import { setForceUnit, setLoad, setMomentLength, setStressUnit, type LoadKey } from '../ops/materials';
import { ValueRow } from './ValueRow';
import '../materials/materials.css';

const LOAD_TEXT: Record<LoadKey, { label: string; hint: string }> = {
  N: { label: 'Axial force', hint: '+ pulls (tension), − pushes' },
  Mx: { label: 'Moment about x', hint: '+ stretches the fibres above the centroid' },
  My: { label: 'Moment about y', hint: '+ stretches the fibres left of the centroid' },
  V: { label: 'Shear force at the cut line', hint: 'along y at a horizontal cut, along x at a vertical one' },
};

function LoadInputs() {
  const editor = useEditor();
  const loads = useEditorState((s) => s.doc.loads);
  const force = useEditorState((s) => s.doc.forceUnit ?? 'kN');
  const momentLength = useEditorState((s) => s.doc.momentLength ?? s.doc.units);
  const stress = useEditorState((s) => s.doc.stressUnit ?? 'MPa');
  const cutOn = useEditorState((s) => s.overlays.cut);
  const unitOf = (k: LoadKey) => (k === 'N' || k === 'V' ? force : `${force}·${momentLength}`);
  return (
    <>
      <div className="loads-units" data-testid="load-units">
        <label>
          Forces in{' '}
          <select data-testid="force-unit" value={force} onChange={(e) => setForceUnit(editor.ctx, e.target.value as ForceUnit)}>
            {FORCE_UNITS.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </label>
        <label>
          moments in {force}·
          <select data-testid="moment-length" value={momentLength} onChange={(e) => setMomentLength(editor.ctx, e.target.value as Units)}>
            {UNITS.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </label>
        <label>
          stresses in{' '}
          <select data-testid="stress-unit-loads" value={stress} onChange={(e) => setStressUnit(editor.ctx, e.target.value as StressUnit)}>
            {STRESS_UNITS.map((u) => (
              <option key={u}>{u}</option>
            ))}
          </select>
        </label>
      </div>
      <p className="mat-note">A new unit converts the values already entered.</p>
      <div className="load-grid">
        {(['N', 'Mx', 'My', 'V'] as const).map((k) => (
          <div key={k} style={{ display: 'contents' }}>
            <span className="load-sym">{k}</span>
            <CommitInput kind="number" optional field={`load.${k}`} label={`${LOAD_TEXT[k].label} ${k} in ${unitOf(k)}`} value={loads?.[k] ?? null} placeholder="0" onCommit={(v) => setLoad(editor.ctx, k, v)} />
            <span className="load-unit">{unitOf(k)}</span>
            <span className="load-hint">
              {LOAD_TEXT[k].label}: {LOAD_TEXT[k].hint}
              {k === 'V' && !cutOn ? '; show the cut line (K) to get τ' : ''}
            </span>
          </div>
        ))}
      </div>
    </>
  );
}

function nameOf(doc: { materials?: { id: string; name: string }[] }, id: string): string {
  return doc.materials?.find((m) => m.id === id)?.name || id;
}

function Extremes({ lc, size, units }: { lc: LoadCase; size: number; units: Units }) {
  const doc = useResults((r) => r.doc);
  const many = lc.extremes.byMaterial.length > 1;
  const u = lc.units.stress;
  const place = (p: StressPoint) => `at (${formatQuantity(p.x, 1, size)}, ${formatQuantity(p.y, 1, size)}) ${units}${doc.materials?.length ? ` in ${nameOf(doc, p.material)}` : ''}`;
  const point = (p: StressPoint) => ({ 'data-x': String(p.x), 'data-y': String(p.y), 'data-material': p.material });
  const t = lc.extremes.maxTension, c = lc.extremes.maxCompression;
  return (
    <>
      {t ? <ValueRow prop="stress.max_tension" symbol="σt,max" label="Largest tension" value={t.value} text={formatNumber(t.value)} unit={u} place={place(t)} extra={point(t)} /> : <p className="mat-note" data-prop="stress.max_tension" data-value="0">No tension anywhere.</p>}
      {c ? <ValueRow prop="stress.max_compression" symbol="σc,max" label="Largest compression" value={c.value} text={formatNumber(c.value)} unit={u} place={place(c)} extra={point(c)} /> : <p className="mat-note" data-prop="stress.max_compression" data-value="0">No compression anywhere.</p>}
      {many &&
        lc.extremes.byMaterial.map((e) => (
          <div key={e.material} className="mat-part">
            <div className="mat-head">{nameOf(doc, e.material)}</div>
            <ValueRow prop={`stress.${e.material}.max`} symbol="σmax" label="Largest (most tensile)" value={e.max.value} text={formatNumber(e.max.value)} unit={u} place={place(e.max)} extra={point(e.max)} />
            <ValueRow prop={`stress.${e.material}.min`} symbol="σmin" label="Smallest (most compressive)" value={e.min.value} text={formatNumber(e.min.value)} unit={u} place={place(e.min)} extra={point(e.min)} />
          </div>
        ))}
    </>
  );
}

function NeutralAxisRow({ lc, size, units }: { lc: LoadCase; size: number; units: Units }) {
  const na = lc.axis;
  if (!na) return <p className="mat-note" data-prop="stress.neutral_axis" data-value="NaN">Neutral axis: none (no bending: the stress is the same all over each material).</p>;
  const deg = axisAngle(na.direction);
  return (
    <ValueRow
      prop="stress.neutral_axis"
      symbol="n.a."
      label="Neutral axis (σ = 0), angle from x"
      value={deg}
      text={formatNumber(deg, 4, 90)}
      unit="°"
      place={`through (${formatQuantity(na.point.x, 1, size)}, ${formatQuantity(na.point.y, 1, size)}) ${units}; tension ${tensionSide(lc)} it`}
      extra={{ 'data-x': String(na.point.x), 'data-y': String(na.point.y), 'data-dx': String(na.direction.x), 'data-dy': String(na.direction.y) }}
    />
  );
}

function Probe({ lc }: { lc: LoadCase }) {
  const editor = useEditor();
  const probe = useMaterialsUi((s) => s.probe);
  const doc = useResults((r) => r.doc);
  const set = (k: 0 | 1, v: number | null) => {
    const cur = materialsUi(editor.store).getState().probe;
    if (v === null) {
      materialsUi(editor.store).setState({ probe: null });
      return null;
    }
    const next: [number, number] = cur ? [cur[0], cur[1]] : [0, 0];
    next[k] = v;
    materialsUi(editor.store).setState({ probe: next });
    return null;
  };
  const at = probe ? stressAt(lc.field, probe[0], probe[1]) : null;
  return (
    <div className="prop-group">
      <h3>Stress at a point</h3>
      <div className="probe-row">
        <span className="load-sym">x, y</span>
        <CommitInput kind="number" optional field="probe.x" label="x of the point" value={probe?.[0] ?? null} placeholder="x" onCommit={(v) => set(0, v)} />
        <CommitInput kind="number" optional field="probe.y" label="y of the point" value={probe?.[1] ?? null} placeholder="y" onCommit={(v) => set(1, v)} />
        <button className="btn small" data-command="tool.probe" onClick={() => editor.run('tool.probe')} title="Click the section: the stress there shows here">
          Pick on canvas
        </button>
      </div>
      {at && !at.inside && (
        <p className="mat-note" data-prop="stress.at" data-value="NaN">
          ({formatNumber(at.x, 6)}, {formatNumber(at.y, 6)}) is outside the section.
        </p>
      )}
      {at?.inside &&
        at.stresses.map((s) => (
          <ValueRow key={s.material} prop={at.stresses.length > 1 ? `stress.at.${s.material}` : 'stress.at'} symbol="σ" label={`Stress at (${formatNumber(at.x, 6)}, ${formatNumber(at.y, 6)})${doc.materials?.length ? ` in ${nameOf(doc, s.material)}` : ''}`} value={s.value} text={formatNumber(s.value)} unit={lc.units.stress} />
        ))}
    </div>
  );
}

/** Put the cut line through the transformed centroid (where VQ/(Ib) of a rectangle-like section peaks), showing it if hidden. */
function CutAtCentroid({ label }: { label: string }) {
  const editor = useEditor();
  const { section } = useStressSection();
  if (!section) return null;
  return (
    <button
      className="btn small"
      data-testid="cut-at-centroid"
      onClick={() => {
        const s = editor.store.getState();
        const c = section.transformed.centroid;
        editor.store.setState({ overlays: { ...s.overlays, cut: true }, cutAt: s.cutAxis === 'y' ? c.y : c.x });
      }}
    >
      {label}
    </button>
  );
}

function Shear({ lc, units }: { lc: LoadCase; units: Units }) {
  const sh = lc.shear;
  if (!sh)
    return (
      <p className="mat-note">
        τ = VQ/(Ib) is given at the cut line: <CutAtCentroid label="Show the cut through the centroid" />
      </p>
    );
  const where = `${sh.axis} = ${formatNumber(sh.at, 6)} ${units}`;
  return (
    <div className="prop-group">
      <h3>Shear at the cut line</h3>
      {sh.tau === null ? (
        <p className="mat-note" data-prop="stress.tau" data-value="NaN">
          The cut at {where} misses the section (b = 0).
        </p>
      ) : (
        <ValueRow prop="stress.tau" symbol="τ" label="VQ/(I·b), transformed Q and I, actual b" value={sh.tau} text={formatNumber(sh.tau)} unit={lc.units.stress} place={`at ${where}: V = ${formatNumber(sh.V)} ${lc.units.force}, b = ${formatNumber(sh.width)} ${units}`} />
      )}
      {sh.tauUnsymmetric !== null && sh.tau !== null && Math.abs(sh.tauUnsymmetric - sh.tau) > 1e-9 * Math.abs(sh.tau) && (
        <ValueRow prop="stress.tau_unsymmetric" symbol="τ′" label="The same with Ixy included" value={sh.tauUnsymmetric} text={formatNumber(sh.tauUnsymmetric)} unit={lc.units.stress} />
      )}
      <p className="mat-note">
        {lc.field.parts.length > 1 || lc.field.parts[0]?.n !== 1 ? 'Q and I here are those of the transformed section; the cut panel below gives the geometric Q and b. ' : ''}
        Drag the cut line on the canvas or type its place in the cut panel. <CutAtCentroid label="Through the centroid" />
      </p>
    </div>
  );
}

/** The cautions of the load case, with the kern's before the deferral to the code when the kern is shown. */
function withKernCaution(cautions: string[], kern: boolean): string[] {
  if (!kern) return cautions;
  const out = cautions.slice();
  out.splice(Math.max(0, out.length - 1), 0, KERN_CAUTION);
  return out;
}

export function LoadsPanel() {
  const lc = useLoadCase();
  const kernShown = useEditorState((s) => s.overlays.kern);
  const { section, oneMaterial, message } = useStressSection();
  const units = useResults((r) => r.doc.units);
  const size = section ? sectionSize(section.bounds) : 0;
  return (
    <section className="panel-section loads" data-testid="loads-panel">
      <h2>Loads and stresses</h2>
      <LoadInputs />
      {oneMaterial && section && <p className="mat-note">No materials: the section is taken as one material (n = 1).</p>}
      {!section && <p className="result-message">{message}</p>}
      {lc && 'error' in lc && <p className="result-message">{lc.error}</p>}
      {lc && !('error' in lc) && (
        <>
          {lc.unloaded ? (
            <p className="mat-note">Enter N, Mx or My to see the normal stresses.</p>
          ) : (
            <div className="prop-group">
              <h3>Normal stresses</h3>
              <Extremes lc={lc} size={size} units={units} />
              <NeutralAxisRow lc={lc} size={size} units={units} />
            </div>
          )}
          <Probe lc={lc} />
          <Shear lc={lc} units={units} />
          <details className="sign-convention" data-testid="sign-convention">
            <summary>Sign convention: tension +; Mx &gt; 0 stretches the top, My &gt; 0 the left</summary>
            {SIGN_CONVENTION}
          </details>
          {(!lc.unloaded || lc.loads.V !== 0 || kernShown) && (
            <ul className="mat-cautions" data-testid="stress-cautions">
              {withKernCaution(lc.cautions, kernShown).map((c, i) => (
                <li key={i} className={c === STRESS_CAUTION || c === KERN_CAUTION || /^(The transformed|Check the design)/.test(c) ? '' : 'specific'}>
                  {c}
                </li>
              ))}
            </ul>
          )}
        </>
      )}
    </section>
  );
}
