/**
 * The cut line readout: b, Q and the area beyond a cut (engine's cutSection), for a horizontal
 * cut (the part above y) or a vertical one (the part right of x), with a small plot of Q and b
 * across the section (cutDiagram). The line is dragged on the canvas or its position typed here.
 */
import { useMemo } from 'react';
import { cutDiagram, cutSection, formatNumber, type Evaluation } from '../../src';
import { useEditor, useEditorState, useResults } from '../context';
import { NumberField } from '../fields/NumberField';
import { centroidCut } from '../ops/view';

type Axis = 'x' | 'y';
const diagramCache = { x: new WeakMap<Evaluation, ReturnType<typeof cutDiagram>>(), y: new WeakMap<Evaluation, ReturnType<typeof cutDiagram>>() };

function diagram(ev: Evaluation, axis: Axis) {
  let d = diagramCache[axis].get(ev);
  if (!d && ev.props) {
    d = cutDiagram(ev.region, axis, ev.props, 81);
    diagramCache[axis].set(ev, d);
  }
  return d ?? [];
}

const WORDS = {
  y: { at: 'Cut at y', beyond: 'above', area: 'Area above the cut', runs: 'depth runs upwards', plot: 'Q and b over the depth' },
  x: { at: 'Cut at x', beyond: 'to the right', area: 'Area right of the cut', runs: 'width runs to the right', plot: 'Q and b across the width' },
} as const;

export function CutPanel() {
  const editor = useEditor();
  const on = useEditorState((s) => s.overlays.cut);
  const at = useEditorState((s) => s.cutAt);
  const axis = useEditorState((s) => s.cutAxis);
  const units = useResults((r) => r.doc.units);
  const ev = useResults((r) => r.evaluation);
  // The diagram waits for the pointer to rest: it is recomputed only when the evaluation changes.
  const pts = useMemo(() => (on ? diagram(ev, axis) : []), [on, ev, axis]);
  if (!on || !ev.props || at === null) return null;
  let cut: ReturnType<typeof cutSection> | null;
  try {
    cut = cutSection(ev.region, axis, at, ev.props);
  } catch {
    cut = null;
  }
  const words = WORDS[axis];
  const props = ev.props;
  const setAxis = (a: Axis) => {
    if (a === axis) return;
    // A new direction starts through the centroid, where Q is largest.
    editor.store.setState({ cutAxis: a, cutAt: centroidCut(props, a) });
  };
  const W = 300, H = 150, pad = 30;
  const b = props.bounds;
  const lo = axis === 'y' ? b.ymin : b.xmin, hi = axis === 'y' ? b.ymax : b.xmax;
  const qMax = Math.max(...pts.map((p) => Math.abs(p.Q)), 1e-300);
  const wMax = Math.max(...pts.map((p) => p.width), 1e-300);
  // Position along the cut's axis, and a value (Q or b) across it, mapped to the plot.
  const P = (t: number) => ((t - lo) / (hi - lo || 1)) * (axis === 'y' ? H - pad : W - 2 * pad);
  const pt = (pos: number, frac: number): [number, number] =>
    axis === 'y' ? [pad + frac * (W - 2 * pad), H - pad / 2 - P(pos)] : [pad + P(pos), H - pad / 2 - frac * (H - pad)];
  const line = (f: (p: (typeof pts)[number]) => number) =>
    pts
      .map((p, i) => {
        const [x, y] = pt(p.at, f(p));
        return `${i ? 'L' : 'M'}${x.toFixed(1)},${y.toFixed(1)}`;
      })
      .join(' ');
  const [ax0, ay0] = pt(lo, 0), [ax1, ay1] = pt(hi, 0);
  const [c0x, c0y] = pt(at, 0), [c1x, c1y] = pt(at, 1);
  return (
    <section className="panel-section cut" data-testid="cut-panel">
      <h2>Cut line</h2>
      <div className="op-switch" role="radiogroup" aria-label="Cut direction">
        {(['y', 'x'] as const).map((a) => (
          <button key={a} role="radio" aria-checked={axis === a} className={`op${axis === a ? ' on op-add' : ''}`} data-testid={`cut-axis-${a}`} onClick={() => setAxis(a)}>
            {a === 'y' ? 'Horizontal' : 'Vertical'}
          </button>
        ))}
      </div>
      <NumberField key={axis} label={words.at} value={at} field="cut-at" suffix={units} onCommit={(v) => (editor.store.setState({ cutAt: v }), null)} />
      {cut && (
        <div className="cut-values">
          <div className="prop-row"><span className="prop-symbol">b</span><span className="prop-label">Width at the cut</span><span className="prop-value" data-cut="width" data-value={String(cut.width)}>{formatNumber(cut.width)}</span><span className="prop-unit">{units}</span></div>
          <div className="prop-row"><span className="prop-symbol">Q</span><span className="prop-label">First moment of the part {words.beyond}</span><span className="prop-value" data-cut="Q" data-value={String(cut.Q)}>{formatNumber(cut.Q)}</span><span className="prop-unit">{units}³</span></div>
          <div className="prop-row"><span className="prop-symbol">A′</span><span className="prop-label">{words.area}</span><span className="prop-value" data-cut="area" data-value={String(cut.area)}>{formatNumber(cut.area)}</span><span className="prop-unit">{units}²</span></div>
        </div>
      )}
      <svg className="cut-plot" width={W} height={H} viewBox={`0 0 ${W} ${H}`} role="img" aria-label={words.plot}>
        <line x1={ax0} y1={ay0} x2={ax1} y2={ay1} className="plot-axis" />
        <path d={line((p) => p.width / wMax)} className="plot-b" />
        <path d={line((p) => Math.abs(p.Q) / qMax)} className="plot-q" />
        <line x1={c0x} x2={c1x} y1={c0y} y2={c1y} className="plot-cut" />
        {axis === 'y' ? (
          <>
            <text x={4} y={pt(hi, 0)[1] + 4} className="plot-tick">{formatNumber(hi, 4)}</text>
            <text x={4} y={pt(lo, 0)[1]} className="plot-tick">{formatNumber(lo, 4)}</text>
          </>
        ) : (
          <>
            <text x={pt(lo, 0)[0]} y={H - 2} className="plot-tick">{formatNumber(lo, 4)}</text>
            <text x={pt(hi, 0)[0] - 24} y={H - 2} className="plot-tick">{formatNumber(hi, 4)}</text>
          </>
        )}
      </svg>
      <p className="plot-legend-row">
        <span className="plot-key q">Q</span> first moment {words.beyond === 'above' ? 'above' : 'right of'} the cut, max {formatNumber(qMax, 4)} {units}³ ·{' '}
        <span className="plot-key b">b</span> width, max {formatNumber(wMax, 4)} {units}; {words.runs}
      </p>
    </section>
  );
}
