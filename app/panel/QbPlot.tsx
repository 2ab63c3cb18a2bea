/**
 * The panel's Q/b diagram: Q/b across the section for cuts in the chosen direction, the shape of
 * the shear stress τ = VQ/(Ib) (Gere & Goodno, Mechanics of Materials, shear formula). The curve
 * and its scale are the report's (src/report/qb-chart.ts: `qbCurve`, `qbScale`), so the panel and
 * the printed diagram agree:
 * - both one-sided values at a level where the width jumps (a vertical step in the curve);
 * - the curve broken where b = 0 (a gap between parts);
 * - next to a hole edge, where b → 0 while Q does not, the scale is capped at the report's rule
 *   and the values beyond it are drawn on the cap line and marked with a triangle, never a spike.
 */
import { formatQuantity, sectionSize, type Region, type SectionProperties, type Units } from '../../src';
import { CAP_FACTOR, qbCurve, qbScale, type QbPoint } from '../../src/report/qb-chart';

const W = 330, H = 200;
/** Plot frame inside the SVG (pixels): room for the position ticks left, the value ticks below, the marks right and top. */
const L = 44, R = 14, T = 10, B = 22;
/** Room beyond the largest value, so the curve never runs along the frame. */
const HEADROOM = 0.08;
const pw = W - L - R, ph = H - T - B;

export interface QbData {
  curve: QbPoint[];
  scale: { vmin: number; vmax: number; cap: number | null };
  /** The largest value beyond the cap, where it is. */
  worst: QbPoint | null;
}

/** The curve and its capped scale, with the cut's own value taken into the scale. */
export function qbData(region: Region, axis: 'x' | 'y', props: SectionProperties, here: number): QbData {
  const curve = qbCurve(region, axis, props);
  const values = curve.map((p) => p.value);
  if (Number.isFinite(here)) values.push(here);
  const scale = qbScale(values);
  let worst: QbPoint | null = null;
  if (scale.cap !== null) for (const p of curve) if (Number.isFinite(p.value) && Math.abs(p.value) > scale.cap && (!worst || Math.abs(p.value) > Math.abs(worst.value))) worst = p;
  return { curve, scale, worst };
}

export function QbPlot({ data, axis, at, here, props, units }: { data: QbData; axis: 'x' | 'y'; at: number; here: number; props: SectionProperties; units: Units }) {
  const { curve, scale } = data;
  const b = props.bounds;
  const lo = axis === 'y' ? b.ymin : b.xmin, hi = axis === 'y' ? b.ymax : b.xmax;
  const size = sectionSize(b);
  const span = (scale.vmax - scale.vmin) * (1 + HEADROOM) || 1;
  const P = (pos: number) => (pos - lo) / (hi - lo || 1);
  const V = (v: number) => (Math.min(scale.vmax, Math.max(scale.vmin, v)) - scale.vmin) / span;
  // A horizontal cut runs up the depth: position upwards, Q/b to the right; a vertical cut runs across.
  const pt = (pos: number, v: number): [number, number] => (axis === 'y' ? [L + V(v) * pw, T + (1 - P(pos)) * ph] : [L + P(pos) * pw, T + (1 - V(v)) * ph]);
  const n = (v: number) => v.toFixed(1);

  let d = '';
  let pen = false;
  for (const p of curve) {
    if (!Number.isFinite(p.value)) {
      pen = false;
      continue;
    }
    const [x, y] = pt(p.at, p.value);
    d += `${pen ? 'L' : 'M'}${n(x)},${n(y)} `;
    pen = true;
  }

  // One mark per run of values beyond the cap, at its largest value, pointing off the plot.
  const marks: QbPoint[] = [];
  if (scale.cap !== null) {
    let run: QbPoint[] = [];
    const flush = () => {
      if (run.length) marks.push(run.reduce((a, c) => (Math.abs(c.value) > Math.abs(a.value) ? c : a)));
      run = [];
    };
    for (const p of curve) {
      if (Number.isFinite(p.value) && Math.abs(p.value) > scale.cap) run.push(p);
      else flush();
    }
    flush();
  }
  const triangle = (p: QbPoint) => {
    const [x, y] = pt(p.at, p.value);
    const up = p.value > 0;
    return axis === 'y'
      ? `M${n(x + (up ? 6 : -6))},${n(y)} L${n(x)},${n(y - 3.5)} L${n(x)},${n(y + 3.5)} Z`
      : `M${n(x)},${n(y + (up ? -6 : 6))} L${n(x - 3.5)},${n(y)} L${n(x + 3.5)},${n(y)} Z`;
  };

  const [z0x, z0y] = pt(lo, 0), [z1x, z1y] = pt(hi, 0);
  const [c0x, c0y] = pt(at, scale.vmin), [c1x, c1y] = pt(at, scale.vmax);
  const dot = Number.isFinite(here) && at >= lo && at <= hi ? pt(at, here) : null;
  const capLine = scale.cap !== null ? [pt(lo, scale.vmax), pt(hi, scale.vmax)] : null;
  const len = (v: number) => formatQuantity(v, 1, size);
  const val = (v: number) => formatQuantity(v, 2, size);
  return (
    <svg className="cut-plot qb-plot" width={W} height={H} viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`Q/b ${axis === 'y' ? 'over the depth' : 'across the width'}`} data-testid="qb-plot" data-off-scale={marks.length}>
      <path d={`M${L},${T} V${T + ph} H${L + pw}`} className="plot-frame" />
      <line x1={z0x} y1={z0y} x2={z1x} y2={z1y} className="plot-axis" />
      {capLine && <line x1={capLine[0][0]} y1={capLine[0][1]} x2={capLine[1][0]} y2={capLine[1][1]} className="plot-cap" />}
      <path d={d.trim()} className="plot-qb" />
      {marks.map((m, i) => (
        <path key={i} d={triangle(m)} className="plot-off" data-off-scale-at={m.at} />
      ))}
      <line x1={c0x} x2={c1x} y1={c0y} y2={c1y} className="plot-cut" />
      {dot && <circle cx={dot[0]} cy={dot[1]} r={2.6} className="plot-dot" />}
      {axis === 'y' ? (
        <>
          <text x={L - 3} y={T + 4} textAnchor="end" className="plot-tick">{len(hi)}</text>
          <text x={L - 3} y={T + ph} textAnchor="end" className="plot-tick">{len(lo)}</text>
          <text x={L} y={H - 8} className="plot-tick">{val(scale.vmin)}</text>
          <text x={pt(lo, scale.vmax)[0]} y={H - 8} textAnchor="end" className="plot-tick">{val(scale.vmax)}</text>
          <text x={L + pw / 2} y={H - 8} textAnchor="middle" className="plot-tick">Q/b ({units}²)</text>
        </>
      ) : (
        <>
          <text x={L} y={H - 8} className="plot-tick">{len(lo)}</text>
          <text x={L + pw} y={H - 8} textAnchor="end" className="plot-tick">{len(hi)}</text>
          <text x={L - 3} y={pt(lo, scale.vmax)[1] + 4} textAnchor="end" className="plot-tick">{val(scale.vmax)}</text>
          <text x={L - 3} y={T + ph} textAnchor="end" className="plot-tick">{val(scale.vmin)}</text>
          <text x={L + pw / 2} y={H - 8} textAnchor="middle" className="plot-tick">x ({units})</text>
        </>
      )}
    </svg>
  );
}

/** The words under the plot: what is drawn, and the cap with the largest value beyond it. */
export function qbLegend(data: QbData, axis: 'x' | 'y', props: SectionProperties, units: Units): string {
  const size = sectionSize(props.bounds);
  const val = (v: number) => formatQuantity(v, 2, size);
  const runs = axis === 'y' ? 'depth runs upwards' : 'width runs to the right';
  let s = `Q/b of the part ${axis === 'y' ? 'above' : 'right of'} each cut (${runs}); a step where the width jumps, a break where b = 0.`;
  if (data.scale.cap !== null) {
    const w = data.worst;
    s +=
      ` ▶ Off scale: near a hole or notch edge b → 0 while Q does not, so the scale is capped at ${CAP_FACTOR} × the 90th percentile (${val(data.scale.cap)} ${units}²)` +
      (w ? `; the largest plotted is ${val(w.value)} ${units}² at ${axis} = ${formatQuantity(w.at, 1, size)}.` : '.');
  }
  return s;
}
