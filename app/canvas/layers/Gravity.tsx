/**
 * The centre of gravity G (density-weighted), beside the centroid C of the area: a ring with a
 * short plumb line, so the two marks never read as one another. Shown with the centroid overlay
 * when the document has materials.
 */
import { useEditorShallow, useEditorState } from '../../context';
import { useStressSection } from '../../materials/derived';
import { label } from '../../paint/ink';
import { STRESS_INK } from '../../paint/materials';
import { toScreen } from '../../view';
import { Paint } from '../PaintNode';

export function GravityLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const on = useEditorState((s) => s.overlays.centroid);
  const { section, oneMaterial } = useStressSection();
  const cg = section?.cg;
  if (!on || oneMaterial || !cg) return null;
  return (
    <Paint
      paint={(ctx) => {
        const [x, y] = toScreen(v, cg.x, cg.y);
        ctx.strokeStyle = STRESS_INK.gravity;
        ctx.fillStyle = STRESS_INK.gravity;
        ctx.lineWidth = 1.4;
        ctx.beginPath();
        ctx.arc(x, y, 5.5, 0, 2 * Math.PI);
        ctx.stroke();
        ctx.beginPath();
        ctx.arc(x, y, 1.8, 0, 2 * Math.PI);
        ctx.fill();
        // Plumb line with an arrowhead: weight acts through G.
        ctx.beginPath();
        ctx.moveTo(x, y + 5.5);
        ctx.lineTo(x, y + 15);
        ctx.stroke();
        ctx.beginPath();
        ctx.moveTo(x - 3, y + 12);
        ctx.lineTo(x, y + 17);
        ctx.lineTo(x + 3, y + 12);
        ctx.closePath();
        ctx.fill();
        label(ctx, 'G', x - 19, y + 4, STRESS_INK.gravity);
      }}
    />
  );
}
