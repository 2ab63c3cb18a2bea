/** The corner picked for rounding: a ring around its vertex, while its shape is the one selected. */
import { useEditorState, useTransient } from '../../context';
import { INK } from '../../paint/ink';
import { shapeCorners } from '../../../src';
import { activeShapes } from '../../store/section';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

export function CornerNode({ v }: { v: ViewTransform }) {
  const corner = useTransient((t) => t.corner);
  const shape = useEditorState((s) => (corner && s.selected.length === 1 && s.selected[0] === corner.id ? activeShapes(s.doc).find((x) => x.id === corner.id) : undefined));
  const c = shape && corner ? shapeCorners(shape).find((k) => k.index === corner.index) : undefined;
  if (!c) return null;
  return (
    <Paint
      paint={(ctx) => {
        const [x, y] = toScreen(v, c.p[0], c.p[1]);
        ctx.strokeStyle = INK.selection;
        ctx.lineWidth = 2;
        ctx.setLineDash([3, 2]);
        ctx.beginPath();
        ctx.arc(x, y, 10, 0, 2 * Math.PI);
        ctx.stroke();
      }}
    />
  );
}
