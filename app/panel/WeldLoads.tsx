/**
 * The weld-group helper under a line group: its weld loads (force Fx, Fy and an optional moment
 * at a point typed here or picked on the canvas), kept in the document so the report and the CLI
 * show the same check, and for each the largest force per unit length by the elastic method, where
 * it acts (marked on the canvas), and the method's caution. Every value shown carries
 * data-weld="<index>.<key>" and data-value (full precision).
 */
import { formatNumber, WELD_GROUP_CAUTION, weldUnits, type LineGroupResult, type WeldLoadCase, type WeldResult } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { CommandButton } from '../fields/CommandButton';
import { NumberField } from '../fields/NumberField';
import { addWeldLoad, removeWeldLoad, setWeldLoad } from '../ops/welds';

function Value({ k, v, unit, label }: { k: string; v: number; unit: string; label: string }) {
  return (
    <div className="prop-row" title={label}>
      <span className="prop-label weld-label">{label}</span>
      <span className="prop-value" data-weld={k} data-value={String(v)}>
        {formatNumber(v)}
      </span>
      <span className="prop-unit">{unit}</span>
    </div>
  );
}

function At({ k, p, units, label }: { k: string; p: { x: number; y: number }; units: string; label: string }) {
  return (
    <div className="prop-row weld-at" title={label}>
      <span className="prop-label weld-label">{label}</span>
      <span className="prop-value" data-weld={k} data-x={String(p.x)} data-y={String(p.y)}>
        ({formatNumber(p.x, 6)}, {formatNumber(p.y, 6)})
      </span>
      <span className="prop-unit">{units}</span>
    </div>
  );
}

function Result({ w, units }: { w: WeldResult | undefined; units: string }) {
  if (!w) return null;
  if (!w.result) return <p className="result-message">{w.message}</p>;
  const r = w.result;
  const i = w.index;
  if (r.critical.f === 0) return <p className="hint">No force yet: give Fx, Fy or M.</p>;
  return (
    <div className="weld-result" data-weld-result={i}>
      <Value k={`${i}.f`} v={r.critical.f} unit={w.units.perLength} label="Largest force per length" />
      <At k={`${i}.at`} p={r.critical} units={units} label="at" />
      {r.alsoCritical.map((p, k) => (
        <At key={k} k={`${i}.also.${k}`} p={p} units={units} label="and the same at" />
      ))}
      <Value k={`${i}.fx`} v={r.critical.fx} unit={w.units.perLength} label="fx at that point" />
      <Value k={`${i}.fy`} v={r.critical.fy} unit={w.units.perLength} label="fy at that point" />
      <Value k={`${i}.M`} v={w.moment!} unit={w.units.moment} label="Moment about the centroid (+ CCW)" />
      <Value k={`${i}.direct`} v={Math.hypot(r.direct.fx, r.direct.fy)} unit={w.units.perLength} label="Direct part F/L" />
      {r.uniform && <p className="hint">The force passes through the centroid: every point carries F/L.</p>}
    </div>
  );
}

function LoadForm({ load, index, w }: { load: WeldLoadCase; index: number; w: WeldResult | undefined }) {
  const editor = useEditor();
  const doc = useEditorState((s) => s.doc);
  const u = weldUnits(doc);
  const set = (patch: Partial<WeldLoadCase>) => setWeldLoad(editor.store, index, patch);
  const f = (key: string) => `weld.${index}.${key}`;
  return (
    <div className="weld-load" data-weld-load={index}>
      <div className="point-head">
        <span className="point-label">Weld load {index + 1}{load.name ? ` · ${load.name}` : ''}</span>
        <span className="point-tools">
          <CommandButton name="tool.weldPoint" arg={index} className="small">
            Pick point
          </CommandButton>
          <button type="button" className="btn small point-tool" data-testid={`weld-remove-${index}`} title="Remove this weld load" onClick={() => removeWeldLoad(editor.store, index)}>
            ×
          </button>
        </span>
      </div>
      <div className="weld-fields">
        <NumberField label="Fx" value={load.Fx} field={f('Fx')} suffix={u.force} onCommit={(v) => set({ Fx: v })} />
        <NumberField label="Fy" value={load.Fy} field={f('Fy')} suffix={u.force} onCommit={(v) => set({ Fy: v })} />
        <NumberField label="at x" value={load.at[0]} field={f('at.x')} suffix={doc.units} onCommit={(v) => set({ at: [v, load.at[1]] })} />
        <NumberField label="at y" value={load.at[1]} field={f('at.y')} suffix={doc.units} onCommit={(v) => set({ at: [load.at[0], v] })} />
        <NumberField label="M" value={load.M ?? 0} field={f('M')} suffix={u.moment} onCommit={(v) => set({ M: v === 0 ? undefined : v })} />
      </div>
      <Result w={w} units={doc.units} />
    </div>
  );
}

export function WeldLoads({ group }: { group: LineGroupResult }) {
  const editor = useEditor();
  const loads = useEditorState((s) => s.doc.weldLoads);
  const welds = useResults((r) => r.evaluation.welds);
  const mine = (loads ?? []).map((load, index) => ({ load, index })).filter((x) => x.load.group.trim() === group.group);
  const add = () => {
    const c = group.props?.centroid;
    const index = addWeldLoad(editor.store, group.group, c ? [c.x, c.y] : [0, 0]);
    editor.run('tool.weldPoint', index);
  };
  return (
    <div className="weld-loads" data-weld-group={group.group}>
      <h3>Weld check (elastic method)</h3>
      {mine.map(({ load, index }) => (
        <LoadForm key={index} load={load} index={index} w={welds.find((w) => w.index === index)} />
      ))}
      <button type="button" className="btn small" data-testid={`weld-add-${group.group}`} disabled={!group.props} onClick={add}>
        {mine.length ? 'Add another load' : 'Add a load'}
      </button>
      {mine.length > 0 && (
        <p className="caution weld-caution" role="note" data-testid="weld-caution">
          {WELD_GROUP_CAUTION}
        </p>
      )}
    </div>
  );
}
