/**
 * The cut line readout: b, Q, Q/b and the area beyond a cut (app/ops/cut-readout.ts), for a
 * horizontal cut (the part above y) or a vertical one (the part right of x), and the Q/b diagram
 * across the section (QbPlot.tsx). Where an edge lies on the cut line the width jumps: b just
 * above and just below are both shown, with the one Q/b uses marked. When the principal axes are
 * turned from x and y the report's caution about the shear formula is shown. The line is dragged
 * on the canvas or its position typed here.
 */
import { useEffect, useMemo, useRef } from 'react';
import { shearFormulaCaution, type Evaluation } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { NumberField } from '../fields/NumberField';
import { cutReadout } from '../ops/cut-readout';
import { centroidCut } from '../ops/view';
import { qbData, qbLegend, QbPlot, type QbData } from './QbPlot';
import './cut.css';

type Axis = 'x' | 'y';
const diagramCache = { x: new WeakMap<Evaluation, QbData>(), y: new WeakMap<Evaluation, QbData>() };

/** The diagram for one evaluation and direction, computed once (it waits for the pointer to rest). */
function diagram(ev: Evaluation, axis: Axis): QbData | null {
  if (!ev.props) return null;
  let d = diagramCache[axis].get(ev);
  if (!d) {
    d = qbData(ev.region, axis, ev.props, NaN);
    diagramCache[axis].set(ev, d);
  }
  return d;
}

function Value({ symbol, label, k, value, text, unit, mark }: { symbol: string; label: string; k: string; value: number; text: string; unit: string; mark?: string }) {
  return (
    <div className={`prop-row${mark ? ' used' : ''}`}>
      <span className="prop-symbol">{symbol}</span>
      <span className="prop-label">
        {label}
        {mark && <span className="qb-used" data-qb-uses={k}> {mark}</span>}
      </span>
      <span className="prop-value" data-cut={k} data-value={String(value)}>
        {text}
      </span>
      <span className="prop-unit">{unit}</span>
    </div>
  );
}

export function CutPanel() {
  const editor = useEditor();
  const on = useEditorState((s) => s.overlays.cut);
  const at = useEditorState((s) => s.cutAt);
  const axis = useEditorState((s) => s.cutAxis);
  const units = useResults((r) => r.doc.units);
  const ev = useResults((r) => r.evaluation);
  // The diagram takes tens of milliseconds: while shapes are being dragged the last one stays up,
  // and the diagram is redone when they come to rest.
  const moving = useEditorState((s) => s.gestureBase !== null);
  const last = useRef<{ axis: Axis; data: QbData | null } | null>(null);
  const data = useMemo(() => {
    if (!on) return null;
    if (moving && last.current?.axis === axis) return last.current.data;
    const d = diagram(ev, axis);
    last.current = { axis, data: d };
    return d;
  }, [on, ev, axis, moving]);
  // Switched on, the readout comes into view at the foot of the results.
  const box = useRef<HTMLElement>(null);
  const shown = on && !!ev.props && at !== null;
  useEffect(() => {
    if (shown) box.current?.scrollIntoView?.({ block: 'nearest' });
  }, [shown]);
  if (!on || !ev.props || at === null) return null;
  const props = ev.props;
  const r = cutReadout(ev.region, props, axis, at);
  const setAxis = (a: Axis) => {
    if (a === axis) return;
    // A new direction starts through the centroid, where Q is largest.
    editor.store.setState({ cutAxis: a, cutAt: centroidCut(props, a) });
  };
  const caution = shearFormulaCaution(props);
  const beyond = axis === 'y' ? 'above' : 'right of';
  return (
    <section className="panel-section cut" data-testid="cut-panel" ref={box}>
      <h2>Cut line</h2>
      <div className="op-switch" role="radiogroup" aria-label="Cut direction">
        {(['y', 'x'] as const).map((a) => (
          <button key={a} role="radio" aria-checked={axis === a} className={`op${axis === a ? ' on op-add' : ''}`} data-testid={`cut-axis-${a}`} onClick={() => setAxis(a)}>
            {a === 'y' ? 'Horizontal' : 'Vertical'}
          </button>
        ))}
      </div>
      <NumberField key={axis} label={axis === 'y' ? 'Cut at y' : 'Cut at x'} value={at} field="cut-at" suffix={units} onCommit={(v) => (editor.store.setState({ cutAt: v }), null)} />
      {r && (
        <div className="cut-values">
          {r.jump ? (
            <>
              <Value symbol="b" label={`Width just ${r.words.plus} the cut`} k="width-above" value={r.cut.widthAbove} text={r.text.widthAbove} unit={units} mark={r.cut.qbSide === 'above' ? '← Q/b' : undefined} />
              <Value symbol="b" label={`Width just ${r.words.minus} the cut`} k="width-below" value={r.cut.widthBelow} text={r.text.widthBelow} unit={units} mark={r.cut.qbSide === 'below' ? '← Q/b' : undefined} />
              <p className="cut-note" data-testid="cut-jump-note">
                An edge lies on the cut line, so the width jumps here. Q is the same from either side; Q/b uses the smaller width, just {r.qbSide} the cut, where the shear stress is larger.
              </p>
            </>
          ) : (
            <Value symbol="b" label="Width at the cut" k="width" value={r.cut.widthForQb} text={r.text.widthForQb} unit={units} />
          )}
          <Value symbol="Q" label={`First moment of the part ${beyond} the cut`} k="Q" value={r.cut.Q} text={r.text.Q} unit={`${units}³`} />
          <Value symbol="Q/b" label={r.jump ? `Q over b just ${r.qbSide} the cut` : 'Q over the width'} k="qb" value={r.cut.qOverB} text={r.text.qOverB} unit={`${units}²`} />
          <Value symbol="A′" label={axis === 'y' ? 'Area above the cut' : 'Area right of the cut'} k="area" value={r.cut.area} text={r.text.area} unit={`${units}²`} />
        </div>
      )}
      {caution && (
        <p className="qb-caution" role="note" data-testid="qb-caution">
          {caution}
        </p>
      )}
      {data && <QbPlot data={data} axis={axis} at={at} here={r ? r.cut.qOverB : NaN} props={props} units={units} />}
      {data && <p className="plot-legend-row">{qbLegend(data, axis, props, units)}</p>}
    </section>
  );
}
