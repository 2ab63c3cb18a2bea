/**
 * The section: the combined result's fill, every shape's own outline (drawn from the current
 * document, so a dragged shape follows the pointer at once), then the result's outline. One
 * Konva node for all of it: the layer repaints as a whole anyway, and one node keeps the
 * reconciler's work per pointer move constant.
 */
import type { LineChain, Op, Region } from '../../../src';
import { useEditor, useEditorShallow, useEditorState, useResults } from '../../context';
import { hatch, INK, opStyle } from '../../paint/ink';
import { traceChains, traceRegion } from '../../paint/trace';
import type { ViewTransform } from '../../view';
import { Paint } from '../PaintNode';
import { activeSection } from '../../store/section';

/** Paint one shape's own outline, hatched by its operation. */
function paintShape(ctx: CanvasRenderingContext2D, region: Region, op: Op, v: ViewTransform, error: boolean) {
  const st = opStyle(op);
  ctx.beginPath();
  traceRegion(ctx, region, v);
  if (st.fill !== 'none') {
    ctx.fillStyle = hatch(ctx, st.fill);
    ctx.fill('evenodd');
  }
  ctx.setLineDash(st.dash);
  ctx.strokeStyle = error ? INK.error : st.line;
  ctx.lineWidth = 1;
  ctx.stroke();
  ctx.setLineDash([]);
}

/** Paint a line element: its stroke, with a dot at each end so an open chain reads as one. */
function paintLine(ctx: CanvasRenderingContext2D, chains: readonly LineChain[], v: ViewTransform, error: boolean) {
  ctx.beginPath();
  traceChains(ctx, chains, v);
  ctx.strokeStyle = error ? INK.error : INK.lineElement;
  ctx.lineWidth = 2.5;
  ctx.lineCap = 'round';
  ctx.lineJoin = 'round';
  ctx.stroke();
  ctx.lineCap = 'butt';
}

export function ShapesLayer() {
  const editor = useEditor();
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  // The combined section may trail a drag by an evaluation; each shape's own outline does not.
  const region = useResults((r) => r.evaluation.region);
  const section = useEditorState((s) => activeSection(s.doc));
  const shapes = editor.results.shapesOf(section);
  return (
    <Paint
      paint={(ctx) => {
        ctx.beginPath();
        traceRegion(ctx, region, v);
        ctx.fillStyle = INK.resultFill;
        ctx.fill('nonzero');
        shapes.forEach((s, i) => !s.chains && paintShape(ctx, s.region, section.shapes[i]?.op ?? 'add', v, !!s.error));
        ctx.beginPath();
        traceRegion(ctx, region, v);
        ctx.strokeStyle = INK.resultLine;
        ctx.lineWidth = 1.6;
        ctx.lineJoin = 'round';
        ctx.stroke();
        // Line elements last: a weld along an edge of the section stays visible on that edge.
        shapes.forEach((s) => s.chains && paintLine(ctx, s.chains, v, !!s.error));
      }}
    />
  );
}
