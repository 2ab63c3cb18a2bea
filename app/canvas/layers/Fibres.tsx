/**
 * The extreme fibres: dashed lines at the bounds, with their distances from the centroid through
 * the one formatter. A label that would run off the canvas moves to the other side, or is held
 * inside the canvas's edge.
 */
import { formatQuantity, sectionSize, type SectionProperties, type Units } from '../../../src';
import { INK, label } from '../../paint/ink';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

export function FibreNode({ p, v, units, width }: { p: SectionProperties; v: ViewTransform; units: Units; width: number }) {
  return (
    <Paint
      paint={(ctx) => {
        const b = p.bounds;
        const X = (x: number) => screenX(v, x), Y = (y: number) => screenY(v, y);
        ctx.strokeStyle = INK.fibre;
        ctx.fillStyle = INK.fibre;
        ctx.lineWidth = 1;
        ctx.setLineDash([4, 3]);
        const pad = 24;
        ctx.beginPath();
        for (const y of [b.ymax, b.ymin]) {
          ctx.moveTo(X(b.xmin) - pad, Y(y));
          ctx.lineTo(X(b.xmax) + pad, Y(y));
        }
        for (const x of [b.xmin, b.xmax]) {
          ctx.moveTo(X(x), Y(b.ymax) - pad);
          ctx.lineTo(X(x), Y(b.ymin) + pad);
        }
        ctx.stroke();
        ctx.setLineDash([]);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        const size = sectionSize(b);
        const f = (n: number) => `${formatQuantity(n, 1, size)} ${units}`;
        const w = (t: string) => ctx.measureText(t).width;
        const inside = (x: number, t: string) => Math.max(4, Math.min(x, width - w(t) - 4));
        // Right of the section when it fits, else left of it.
        const beside = (t: string) => {
          const right = X(b.xmax) + pad + 4;
          return right + w(t) + 4 <= width ? right : inside(X(b.xmin) - pad - 4 - w(t), t);
        };
        const top = `c top ${f(p.fibres.top)}`, bottom = `c bottom ${f(p.fibres.bottom)}`;
        label(ctx, top, beside(top), Y(b.ymax) + 4, INK.fibre);
        label(ctx, bottom, beside(bottom), Y(b.ymin) + 4, INK.fibre);
        const left = `c left ${f(p.fibres.left)}`, right = `c right ${f(p.fibres.right)}`;
        label(ctx, left, inside(X(b.xmin) - w(left) - 6, left), Y(b.ymax) - pad - 4, INK.fibre);
        label(ctx, right, inside(X(b.xmax) + 6, right), Y(b.ymax) - pad - 4, INK.fibre);
      }}
    />
  );
}
