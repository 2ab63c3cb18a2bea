/** The snap target under the pointer: a glyph for its kind and, for geometry, its name. */
import type { SnapResult } from '../../geometry/snap';
import { INK } from '../../paint/ink';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

const SNAP_LABEL: Record<SnapResult['kind'], string> = {
  vertex: 'vertex',
  midpoint: 'midpoint',
  centre: 'centre',
  intersection: 'intersection',
  grid: '',
  free: '',
};

export function SnapNode({ snap, v }: { snap: SnapResult; v: ViewTransform }) {
  return (
    <Paint
      paint={(ctx) => {
        const [x, y] = toScreen(v, snap.p[0], snap.p[1]);
        ctx.strokeStyle = INK.snap;
        ctx.fillStyle = INK.snap;
        ctx.lineWidth = 1.5;
        ctx.beginPath();
        switch (snap.kind) {
          case 'vertex':
            ctx.rect(x - 5, y - 5, 10, 10);
            break;
          case 'midpoint':
            ctx.moveTo(x, y - 6);
            ctx.lineTo(x + 6, y + 4);
            ctx.lineTo(x - 6, y + 4);
            ctx.closePath();
            break;
          case 'centre':
            ctx.arc(x, y, 5.5, 0, 2 * Math.PI);
            break;
          case 'intersection':
            ctx.moveTo(x - 5, y - 5);
            ctx.lineTo(x + 5, y + 5);
            ctx.moveTo(x + 5, y - 5);
            ctx.lineTo(x - 5, y + 5);
            break;
          default:
            ctx.moveTo(x - 4, y);
            ctx.lineTo(x + 4, y);
            ctx.moveTo(x, y - 4);
            ctx.lineTo(x, y + 4);
        }
        ctx.stroke();
        const label = SNAP_LABEL[snap.kind] + (snap.ortho ? (SNAP_LABEL[snap.kind] ? ' · ortho' : 'ortho') : '');
        if (label) {
          ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
          ctx.fillText(label, x + 9, y + 15);
        }
      }}
    />
  );
}
