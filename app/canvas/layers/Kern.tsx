/**
 * The kern (core) of the section: where a compressive axial force causes no tension. Computed when
 * the editor rests (app/materials/derived.ts); during a drag the last kern stays, dashed, until the
 * new one is ready.
 */
import { useEditorShallow, useEditorState } from '../../context';
import { useIdleKern } from '../../materials/derived';
import { label } from '../../paint/ink';
import { STRESS_INK } from '../../paint/materials';
import { screenX, screenY } from '../../view';
import { Paint } from '../PaintNode';

export function KernLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const on = useEditorState((s) => s.overlays.kern);
  const kern = useIdleKern(on);
  const pts = kern.value?.points;
  if (!on || !pts || pts.length < 3) return null;
  return (
    <Paint
      paint={(ctx) => {
        ctx.beginPath();
        pts.forEach(([x, y], i) => (i ? ctx.lineTo(screenX(v, x), screenY(v, y)) : ctx.moveTo(screenX(v, x), screenY(v, y))));
        ctx.closePath();
        ctx.fillStyle = 'rgba(29, 107, 82, 0.16)';
        ctx.fill();
        ctx.strokeStyle = STRESS_INK.kern;
        ctx.lineWidth = 1.6;
        ctx.setLineDash(kern.stale ? [4, 4] : []);
        ctx.stroke();
        ctx.setLineDash([]);
        // Label beside the kern's rightmost point.
        let best = pts[0];
        for (const p of pts) if (p[0] > best[0]) best = p;
        label(ctx, kern.stale ? 'kern (updating)' : 'kern', screenX(v, best[0]) + 8, screenY(v, best[1]) + 4, STRESS_INK.kern);
      }}
    />
  );
}
