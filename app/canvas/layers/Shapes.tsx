/**
 * The section: the combined result's fill, every shape's own outline (drawn from the current
 * document, so a dragged shape follows the pointer at once), then the result's outline. One
 * Konva node for all of it: the layer repaints as a whole anyway, and one node keeps the
 * reconciler's work per pointer move constant.
 */
import type { LineChain, Op, Region, SectionDocument, Shape } from '../../../src';
import { useEditor, useEditorShallow, useEditorState, useResults } from '../../context';
import { hatch, INK, opStyle } from '../../paint/ink';
import { regionPath, traceChains, traceRegion } from '../../paint/trace';
import type { ViewTransform } from '../../view';
import { Paint } from '../PaintNode';
import { activeSection } from '../../store/section';
import { paintCached } from './static-shapes';

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

/** Loops above which a moving section's outline is drawn as a hairline. */
const LIGHT_OUTLINE_LOOPS = 200;

const baseRecords = new WeakMap<SectionDocument, Set<Shape>>();

/** The shape records of the section a gesture started from (kept per gesture). */
function recordsAtStart(base: SectionDocument): Set<Shape> {
  let set = baseRecords.get(base);
  if (!set) {
    set = new Set(activeSection(base).shapes);
    baseRecords.set(base, set);
  }
  return set;
}

export function ShapesLayer() {
  const editor = useEditor();
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  // The combined section may trail a drag by an evaluation; each shape's own outline does not.
  const region = useResults((r) => r.evaluation.region);
  const section = useEditorState((s) => activeSection(s.doc));
  const gestureBase = useEditorState((s) => s.gestureBase);
  const shapes = editor.results.shapesOf(section);
  // While a gesture runs, the shapes it has not touched come from a bitmap painted once
  // (static-shapes.ts); the touched ones are painted on top, every frame.
  const before = gestureBase ? recordsAtStart(gestureBase) : null;
  const still: number[] = [], moving: number[] = [];
  shapes.forEach((s, i) => {
    if (s.chains) return;
    (before && !before.has(section.shapes[i]) ? moving : still).push(i);
  });
  const opOf = (i: number) => section.shapes[i]?.op ?? 'add';
  const stillPaint = {
    items: still.map((i) => shapes[i]),
    key: `${v.scale},${v.ox},${v.oy}|${still.map((i) => `${opOf(i)[0]}${shapes[i].error ? '!' : ''}`).join('')}`,
  };
  return (
    <Paint
      paint={(ctx) => {
        const outline = regionPath(region, v);
        ctx.fillStyle = INK.resultFill;
        ctx.fill(outline, 'nonzero');
        paintCached(ctx, stillPaint, (c) => still.forEach((i) => paintShape(c, shapes[i].region, opOf(i), v, !!shapes[i].error)));
        moving.forEach((i) => paintShape(ctx, shapes[i].region, opOf(i), v, !!shapes[i].error));
        ctx.strokeStyle = INK.resultLine;
        // While a shape moves in a large section, the outline is a hairline: without a GPU a
        // 1.6 px stroke with round joins round 4000 holes took about 70 ms a frame, a hairline
        // a few. At rest it is drawn at full weight again.
        const light = gestureBase !== null && region.length > LIGHT_OUTLINE_LOOPS;
        ctx.lineWidth = light ? 1 : 1.6;
        ctx.lineJoin = light ? 'miter' : 'round';
        ctx.stroke(outline);
        // Line elements last: a weld along an edge of the section stays visible on that edge.
        shapes.forEach((s) => s.chains && paintLine(ctx, s.chains, v, !!s.error));
      }}
    />
  );
}
