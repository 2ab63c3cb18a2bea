/**
 * Line groups and weld loads on the canvas: each line group's centroid (a ring with a cross,
 * labelled G, shown with the centroid overlay), each weld load's point with its force arrow (and a
 * turning arrow for an added moment), and the most stressed points of each loaded group, ringed
 * and labelled with the force per unit length.
 */
import { formatNumber, type LineGroupResult, type WeldResult } from '../../../src';
import { useEditorShallow, useEditorState, useResults } from '../../context';
import { crosshair, label } from '../../paint/ink';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

const WELD_INK = { centroid: '#7a4e12', load: '#1f5f8b', critical: '#b3261e' } as const;
const ARROW_PX = 56;

function arrow(ctx: CanvasRenderingContext2D, x0: number, y0: number, x1: number, y1: number) {
  const a = Math.atan2(y1 - y0, x1 - x0);
  ctx.beginPath();
  ctx.moveTo(x0, y0);
  ctx.lineTo(x1, y1);
  ctx.stroke();
  ctx.beginPath();
  ctx.moveTo(x1, y1);
  ctx.lineTo(x1 - 9 * Math.cos(a - 0.35), y1 - 9 * Math.sin(a - 0.35));
  ctx.lineTo(x1 - 9 * Math.cos(a + 0.35), y1 - 9 * Math.sin(a + 0.35));
  ctx.closePath();
  ctx.fill();
}

function paintCentroid(ctx: CanvasRenderingContext2D, g: LineGroupResult, v: ViewTransform) {
  if (!g.props) return;
  const [x, y] = toScreen(v, g.props.centroid.x, g.props.centroid.y);
  ctx.strokeStyle = WELD_INK.centroid;
  ctx.lineWidth = 1.2;
  crosshair(ctx, x, y, 5, 8);
  label(ctx, 'G', x + 8, y + 14, WELD_INK.centroid);
}

function paintLoad(ctx: CanvasRenderingContext2D, w: WeldResult, v: ViewTransform) {
  const [x, y] = toScreen(v, w.load.at[0], w.load.at[1]);
  ctx.strokeStyle = WELD_INK.load;
  ctx.fillStyle = WELD_INK.load;
  ctx.lineWidth = 2;
  const F = Math.hypot(w.load.Fx, w.load.Fy);
  // The force arrow ends at the point where it acts (screen y runs down).
  if (F > 0) arrow(ctx, x - (ARROW_PX * w.load.Fx) / F, y + (ARROW_PX * w.load.Fy) / F, x, y);
  if (w.load.M) {
    // Three quarters of a turn round the point, counter-clockwise on the page for a positive moment
    // (canvas angles run clockwise on screen), with the head at its end.
    const ccw = w.load.M > 0, R = 18, a0 = Math.PI / 4;
    const a1 = ccw ? a0 - 1.5 * Math.PI : a0 + 1.5 * Math.PI;
    ctx.beginPath();
    ctx.arc(x, y, R, a0, a1, ccw);
    ctx.stroke();
    const ex = x + R * Math.cos(a1), ey = y + R * Math.sin(a1);
    const tx = ccw ? Math.sin(a1) : -Math.sin(a1), ty = ccw ? -Math.cos(a1) : Math.cos(a1);
    arrow(ctx, ex - tx, ey - ty, ex + tx, ey + ty);
  }
  ctx.beginPath();
  ctx.arc(x, y, 3.5, 0, 2 * Math.PI);
  ctx.fill();
  const name = w.load.name ? ` ${w.load.name}` : '';
  const text = `F${w.index + 1}${name}`;
  // Right of the point, or left of it when the canvas ends first (its width in CSS pixels).
  ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
  const tw = ctx.measureText(text).width;
  const right = ctx.canvas.width / (ctx.getTransform().a || 1);
  label(ctx, text, x + 8 + tw + 6 > right ? x - 8 - tw : x + 8, y - 8, WELD_INK.load);
}

function paintCritical(ctx: CanvasRenderingContext2D, w: WeldResult, v: ViewTransform) {
  const r = w.result;
  if (!r || !(r.critical.f > 0)) return;
  const text = `${formatNumber(r.critical.f)} ${w.units.perLength}`;
  for (const p of [r.critical, ...r.alsoCritical]) {
    const [x, y] = toScreen(v, p.x, p.y);
    ctx.strokeStyle = WELD_INK.critical;
    ctx.lineWidth = 2;
    ctx.beginPath();
    ctx.arc(x, y, 8, 0, 2 * Math.PI);
    ctx.stroke();
    // The resultant force per length at the point, drawn from it.
    ctx.fillStyle = WELD_INK.critical;
    ctx.lineWidth = 1.5;
    const ux = p.fx / p.f, uy = -p.fy / p.f;
    arrow(ctx, x, y, x + 34 * ux, y + 34 * uy);
    // The label on the side away from the arrow.
    ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
    const tw = ctx.measureText(`f max ${text}`).width;
    const lx = ux > 0.3 ? x - 12 - tw : ux < -0.3 ? x + 12 : x - tw / 2;
    const ly = uy > 0.3 ? y - 14 : uy < -0.3 ? y + 22 : y + 22;
    label(ctx, `f max ${text}`, lx, ly, WELD_INK.critical);
  }
}

export function WeldLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const showCentroid = useEditorState((s) => s.overlays.centroid);
  const lines = useResults((r) => r.evaluation.lines);
  const welds = useResults((r) => r.evaluation.welds);
  if (lines.length === 0 && welds.length === 0) return null;
  return (
    <Paint
      paint={(ctx) => {
        ctx.lineCap = 'round';
        if (showCentroid) for (const g of lines) paintCentroid(ctx, g, v);
        for (const w of welds) paintCritical(ctx, w, v);
        for (const w of welds) paintLoad(ctx, w, v);
      }}
    />
  );
}
