/**
 * The document's net-section lines: each drawn end to end, thick where it crosses material and
 * dashed across holes and gaps, with its label and net length at the start. The lengths are the
 * exact ones the panel lists (src/netsection/).
 */
import { formatNumber, type NetLine } from '../../../src';
import { useEditorShallow, useEditorState, useResults } from '../../context';
import { netLineLabel } from '../../ops/net-lines';
import { CUTOUT_INK } from '../../paint/cutout-ink';
import { label } from '../../paint/ink';
import { netSectionOf } from '../../store/cutout';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

const EMPTY: NetLine[] = [];

function paintLine(ctx: CanvasRenderingContext2D, line: NetLine, k: number, region: Parameters<typeof netSectionOf>[0], v: ViewTransform, units: string) {
  const [x1, y1] = toScreen(v, line.from[0], line.from[1]);
  const [x2, y2] = toScreen(v, line.to[0], line.to[1]);
  const L = Math.hypot(line.to[0] - line.from[0], line.to[1] - line.from[1]);
  const at = (d: number): [number, number] => [x1 + ((x2 - x1) * d) / L, y1 + ((y2 - y1) * d) / L];
  ctx.strokeStyle = CUTOUT_INK.netLine;
  ctx.lineWidth = 1;
  ctx.setLineDash([4, 3]);
  ctx.beginPath();
  ctx.moveTo(x1, y1);
  ctx.lineTo(x2, y2);
  ctx.stroke();
  ctx.setLineDash([]);
  const r = netSectionOf(region, line);
  if (typeof r !== 'string') {
    ctx.lineWidth = 3;
    ctx.lineCap = 'butt';
    ctx.beginPath();
    for (const m of r.material) {
      const [a, b] = [at(m.from), at(m.to)];
      ctx.moveTo(a[0], a[1]);
      ctx.lineTo(b[0], b[1]);
    }
    ctx.stroke();
  }
  // End ticks.
  ctx.fillStyle = CUTOUT_INK.netLine;
  for (const [x, y] of [[x1, y1], [x2, y2]]) ctx.fillRect(x - 2.5, y - 2.5, 5, 5);
  const text = typeof r === 'string' ? netLineLabel(line, k) : `${netLineLabel(line, k)}: net ${formatNumber(r.netLength)} ${units}`;
  label(ctx, text, x1 + 6, y1 - 6, CUTOUT_INK.netLine);
}

export function NetLinesLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const lines = useEditorState((s) => s.doc.netLines ?? EMPTY);
  const region = useResults((r) => r.evaluation.region);
  const units = useResults((r) => r.doc.units);
  if (!lines.length) return null;
  return <Paint paint={(ctx) => lines.forEach((l, k) => paintLine(ctx, l, k, region, v, units))} />;
}
