/** The selected shapes' outlines, and the handles of a single selected shape (hovered one larger). */
import { useEditor, useEditorState, useTransient } from '../../context';
import { INK } from '../../paint/ink';
import { traceChains, traceRegion } from '../../paint/trace';
import { shapeHandles } from '../../shapes';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';
import { activeSection } from '../../store/section';

export function SelectionNode({ v }: { v: ViewTransform }) {
  const editor = useEditor();
  const selected = useEditorState((s) => s.selected);
  const doc = useEditorState((s) => activeSection(s.doc));
  const hover = useTransient((t) => t.hoverHandle);
  const sel = new Set(selected);
  const picked = editor.results.shapesOf(doc).filter((s) => sel.has(s.id));
  const single = selected.length === 1 ? doc.shapes.find((s) => s.id === selected[0]) : undefined;
  const handles = single ? shapeHandles(single) : [];
  return (
    <Paint
      paint={(ctx) => {
        ctx.strokeStyle = INK.selection;
        ctx.lineWidth = 2;
        for (const r of picked) {
          ctx.beginPath();
          if (r.chains) traceChains(ctx, r.chains, v);
          else traceRegion(ctx, r.region, v);
          ctx.stroke();
        }
        ctx.lineWidth = 1.25;
        handles.forEach((h, i) => {
          const [x, y] = toScreen(v, h.p[0], h.p[1]);
          const s = i === hover ? 5.5 : 4;
          ctx.fillStyle = i === hover ? INK.selection : '#ffffff';
          ctx.beginPath();
          if (h.ref.kind === 'via' || h.ref.kind === 'radius') {
            ctx.moveTo(x, y - s - 1);
            ctx.lineTo(x + s + 1, y);
            ctx.lineTo(x, y + s + 1);
            ctx.lineTo(x - s - 1, y);
            ctx.closePath();
          } else ctx.rect(x - s, y - s, 2 * s, 2 * s);
          ctx.fill();
          ctx.stroke();
        });
      }}
    />
  );
}
