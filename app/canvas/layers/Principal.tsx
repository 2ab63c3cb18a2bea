/** The principal axes 1 and 2 through the centroid, with θ. */
import { formatProperty, PROPERTY_CATALOG, type SectionProperties } from '../../../src';
import { INK } from '../../paint/ink';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

const THETA = PROPERTY_CATALOG.find((i) => i.key === 'theta')!;

export function PrincipalNode({ p, v }: { p: SectionProperties; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const b = p.bounds;
        const L = 0.6 * Math.hypot(b.xmax - b.xmin, b.ymax - b.ymin) * v.scale + 20;
        const [x, y] = toScreen(v, p.centroid.x, p.centroid.y);
        const t = (p.theta * Math.PI) / 180;
        ctx.strokeStyle = INK.principal;
        ctx.fillStyle = INK.principal;
        ctx.lineWidth = 1;
        ctx.setLineDash([10, 3, 2, 3]);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        for (const [ang, name] of [[t, '1'], [t + Math.PI / 2, '2']] as const) {
          // Screen y runs down: a world direction (cos, sin) is (cos, −sin) on screen.
          const dx = Math.cos(ang) * L, dy = -Math.sin(ang) * L;
          ctx.beginPath();
          ctx.moveTo(x - dx, y - dy);
          ctx.lineTo(x + dx, y + dy);
          ctx.stroke();
          ctx.fillText(name, x + dx + 4, y + dy - 4);
        }
        ctx.setLineDash([]);
        ctx.fillText(`θ = ${formatProperty(THETA, p, 'mm').text}°`, x + 10, y + 16);
      }}
    />
  );
}
