/**
 * Dimensions on the canvas (the "Dimensions" view toggle): the layout of app/canvas/
 * dimension-layout.ts painted in screen space: thin dimension and extension lines, dash-dot
 * centre marks, filled arrowheads, origin circles of the running dimensions, and the values
 * (turned with their dimension line where the layout turns them).
 */
import type { DimensionLayout } from '../../../src/report/dimensions';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

/** Dimension ink: dark blue-grey, apart from the section's outline and the overlays' colours. */
export const DIM_INK = '#2d4f6c';

export function DimensionNode({ layout, v }: { layout: DimensionLayout; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const X = (x: number) => screenX(v, x), Y = (y: number) => screenY(v, y);
        const st = layout.style;
        ctx.strokeStyle = DIM_INK;
        ctx.fillStyle = DIM_INK;
        ctx.lineWidth = 0.8;
        for (const dashed of [false, true]) {
          ctx.setLineDash(dashed ? [9, 3, 2, 3] : []);
          ctx.beginPath();
          for (const l of layout.lines) {
            if ((l.style === 'centre') !== dashed) continue;
            ctx.moveTo(X(l.x1), Y(l.y1));
            ctx.lineTo(X(l.x2), Y(l.y2));
          }
          ctx.stroke();
        }
        ctx.setLineDash([]);
        // Arrowheads: tip at the point, pointing along (dx, dy) (y flips on screen).
        const len = st.arrow * v.scale, half = (st.arrowWidth * v.scale) / 2;
        ctx.beginPath();
        for (const a of layout.arrows) {
          const n = Math.hypot(a.dx, a.dy) || 1;
          const ux = a.dx / n, uy = -a.dy / n;
          const tx = X(a.x), ty = Y(a.y);
          const bx = tx - len * ux, by = ty - len * uy;
          ctx.moveTo(tx, ty);
          ctx.lineTo(bx - half * uy, by + half * ux);
          ctx.lineTo(bx + half * uy, by - half * ux);
          ctx.closePath();
        }
        ctx.fill();
        for (const o of layout.origins) {
          ctx.beginPath();
          ctx.arc(X(o.x), Y(o.y), st.origin * v.scale, 0, 2 * Math.PI);
          ctx.fillStyle = '#ffffff';
          ctx.fill();
          ctx.stroke();
        }
        ctx.fillStyle = DIM_INK;
        ctx.font = `${Math.round(st.text * v.scale * 10) / 10}px ui-sans-serif, system-ui, sans-serif`;
        ctx.textAlign = 'center';
        ctx.textBaseline = 'middle';
        for (const t of layout.texts) {
          ctx.save();
          ctx.translate(X(t.x), Y(t.y));
          if (t.rotate) ctx.rotate(-Math.PI / 2);
          ctx.fillText(t.text, 0, 0);
          ctx.restore();
        }
        ctx.textAlign = 'start';
        ctx.textBaseline = 'alphabetic';
      }}
    />
  );
}
