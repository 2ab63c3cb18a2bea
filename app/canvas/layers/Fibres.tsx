/** The extreme fibres: dashed lines at the bounds, with their distances from the centroid. */
import { formatNumber, type SectionProperties, type Units } from '../../../src';
import { INK, label } from '../../paint/ink';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

export function FibreNode({ p, v, units }: { p: SectionProperties; v: ViewTransform; units: Units }) {
  return (
    <Paint
      paint={(ctx) => {
        const b = p.bounds;
        const X = (x: number) => screenX(v, x), Y = (y: number) => screenY(v, y);
        ctx.strokeStyle = INK.fibre;
        ctx.fillStyle = INK.fibre;
        ctx.lineWidth = 1;
        ctx.setLineDash([4, 3]);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
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
        const f = (n: number) => `${formatNumber(n, 4)} ${units}`;
        label(ctx, `c top ${f(p.fibres.top)}`, X(b.xmax) + pad + 4, Y(b.ymax) + 4, INK.fibre);
        label(ctx, `c bottom ${f(p.fibres.bottom)}`, X(b.xmax) + pad + 4, Y(b.ymin) + 4, INK.fibre);
        const left = `c left ${f(p.fibres.left)}`;
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        label(ctx, left, X(b.xmin) - ctx.measureText(left).width - 6, Y(b.ymax) - pad - 4, INK.fibre);
        label(ctx, `c right ${f(p.fibres.right)}`, X(b.xmax) + 6, Y(b.ymax) - pad - 4, INK.fibre);
      }}
    />
  );
}
