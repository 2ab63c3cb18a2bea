/** The centroid mark: a circle with two opposite quarters filled, labelled C. */
import type { SectionProperties } from '../../../src';
import { INK } from '../../paint/ink';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

export function CentroidNode({ p, v }: { p: SectionProperties; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const [x, y] = toScreen(v, p.centroid.x, p.centroid.y);
        ctx.strokeStyle = INK.centroid;
        ctx.fillStyle = INK.centroid;
        ctx.lineWidth = 1.2;
        ctx.beginPath();
        ctx.arc(x, y, 6, 0, 2 * Math.PI);
        ctx.stroke();
        // Two opposite quarters filled: reads as a centre of area at any zoom.
        ctx.beginPath();
        ctx.moveTo(x, y);
        ctx.arc(x, y, 6, -Math.PI / 2, 0);
        ctx.closePath();
        ctx.moveTo(x, y);
        ctx.arc(x, y, 6, Math.PI / 2, Math.PI);
        ctx.closePath();
        ctx.fill();
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        ctx.fillText('C', x + 8, y - 7);
      }}
    />
  );
}
