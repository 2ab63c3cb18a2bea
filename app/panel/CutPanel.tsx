/**
 * The cut line readout: b, Q and the area beyond a horizontal cut (engine's cutSection), with
 * a small plot of Q and b over the depth (cutDiagram). The line is dragged on the canvas or its
 * height typed here.
 */
import { useMemo } from 'react';
import { cutDiagram, cutSection, formatNumber, type Evaluation } from '../../src';
import { useEditor, useEditorState, useResults } from '../store/hooks';
import { NumberField } from './NumberField';

const diagramCache = new WeakMap<Evaluation, ReturnType<typeof cutDiagram>>();

function diagram(ev: Evaluation) {
  let d = diagramCache.get(ev);
  if (!d && ev.props) {
    d = cutDiagram(ev.region, 'y', ev.props, 81);
    diagramCache.set(ev, d);
  }
  return d ?? [];
}

export function CutPanel() {
  const editor = useEditor();
  const on = useEditorState((s) => s.overlays.cut);
  const at = useEditorState((s) => s.cutAt);
  const units = useResults((r) => r.doc.units);
  const ev = useResults((r) => r.evaluation);
  // The diagram waits for the pointer to rest: it is recomputed only when the evaluation changes.
  const pts = useMemo(() => (on ? diagram(ev) : []), [on, ev]);
  if (!on || !ev.props || at === null) return null;
  let cut: ReturnType<typeof cutSection> | null;
  try {
    cut = cutSection(ev.region, 'y', at, ev.props);
  } catch {
    cut = null;
  }
  const W = 300, H = 150, pad = 30;
  const b = ev.props.bounds;
  const qMax = Math.max(...pts.map((p) => Math.abs(p.Q)), 1e-300);
  const wMax = Math.max(...pts.map((p) => p.width), 1e-300);
  const Y = (y: number) => H - pad / 2 - ((y - b.ymin) / (b.ymax - b.ymin || 1)) * (H - pad);
  const XQ = (q: number) => pad + (Math.abs(q) / qMax) * (W - 2 * pad);
  const XW = (w: number) => pad + (w / wMax) * (W - 2 * pad);
  const line = (f: (p: (typeof pts)[number]) => number) => pts.map((p, i) => `${i ? 'L' : 'M'}${f(p).toFixed(1)},${Y(p.at).toFixed(1)}`).join(' ');
  return (
    <section className="panel-section cut" data-testid="cut-panel">
      <h2>Cut line</h2>
      <NumberField label="Cut at y" value={at} field="cut-at" suffix={units} onCommit={(v) => (editor.store.setState({ cutAt: v }), null)} />
      {cut && (
        <div className="cut-values">
          <div className="prop-row"><span className="prop-symbol">b</span><span className="prop-label">Width at the cut</span><span className="prop-value" data-cut="width" data-value={String(cut.width)}>{formatNumber(cut.width)}</span><span className="prop-unit">{units}</span></div>
          <div className="prop-row"><span className="prop-symbol">Q</span><span className="prop-label">First moment of the part above</span><span className="prop-value" data-cut="Q" data-value={String(cut.Q)}>{formatNumber(cut.Q)}</span><span className="prop-unit">{units}³</span></div>
          <div className="prop-row"><span className="prop-symbol">A′</span><span className="prop-label">Area above the cut</span><span className="prop-value" data-cut="area" data-value={String(cut.area)}>{formatNumber(cut.area)}</span><span className="prop-unit">{units}²</span></div>
        </div>
      )}
      <svg className="cut-plot" width={W} height={H} viewBox={`0 0 ${W} ${H}`} role="img" aria-label="Q and b over the depth">
        <line x1={pad} y1={Y(b.ymin)} x2={pad} y2={Y(b.ymax)} className="plot-axis" />
        <path d={line((p) => XW(p.width))} className="plot-b" />
        <path d={line((p) => XQ(p.Q))} className="plot-q" />
        <line x1={pad} x2={W - pad} y1={Y(at)} y2={Y(at)} className="plot-cut" />
        <text x={4} y={Y(b.ymax) + 4} className="plot-tick">{formatNumber(b.ymax, 4)}</text>
        <text x={4} y={Y(b.ymin)} className="plot-tick">{formatNumber(b.ymin, 4)}</text>
      </svg>
      <p className="plot-legend-row">
        <span className="plot-key q">Q</span> first moment above the cut, max {formatNumber(qMax, 4)} {units}³ ·{' '}
        <span className="plot-key b">b</span> width, max {formatNumber(wMax, 4)} {units}; depth runs upwards
      </p>
    </section>
  );
}
