/** What the active tool draws while it works: the shape so far, its chain of points, markers, a selection box. */
import { shapeToRegion, type Region } from '../../../src';
import { INK } from '../../paint/ink';
import { traceRegion } from '../../paint/trace';
import type { Draft } from '../../store/transient';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

export function DraftNode({ draft, v }: { draft: Draft; v: ViewTransform }) {
  let region: Region | null = null;
  if (draft.shape) {
    try {
      region = shapeToRegion(draft.shape);
    } catch {
      // a half-drawn outline that is not valid yet: show only its points
    }
  }
  return (
    <Paint
      paint={(ctx) => {
        const X = (x: number) => screenX(v, x), Y = (y: number) => screenY(v, y);
        ctx.strokeStyle = INK.draft;
        ctx.lineWidth = 1.25;
        if (region) {
          ctx.beginPath();
          traceRegion(ctx, region, v);
          ctx.fillStyle = 'rgba(44, 92, 197, 0.08)';
          ctx.fill();
          ctx.setLineDash([6, 4]);
          ctx.stroke();
          ctx.setLineDash([]);
        }
        if (draft.chain && draft.chain.length > 1) {
          ctx.beginPath();
          ctx.moveTo(X(draft.chain[0][0]), Y(draft.chain[0][1]));
          for (const q of draft.chain.slice(1)) ctx.lineTo(X(q[0]), Y(q[1]));
          ctx.stroke();
          if (draft.closing) {
            const a = draft.chain[draft.chain.length - 1], b = draft.chain[0];
            ctx.setLineDash([3, 4]);
            ctx.beginPath();
            ctx.moveTo(X(a[0]), Y(a[1]));
            ctx.lineTo(X(b[0]), Y(b[1]));
            ctx.stroke();
            ctx.setLineDash([]);
          }
        }
        for (const m of draft.markers ?? []) {
          ctx.fillStyle = '#fff';
          ctx.fillRect(X(m[0]) - 3.5, Y(m[1]) - 3.5, 7, 7);
          ctx.strokeRect(X(m[0]) - 3.5, Y(m[1]) - 3.5, 7, 7);
        }
        if (draft.box) {
          const [a, b] = draft.box;
          ctx.setLineDash([4, 3]);
          ctx.fillStyle = 'rgba(44, 92, 197, 0.06)';
          const x = Math.min(X(a[0]), X(b[0])), y = Math.min(Y(a[1]), Y(b[1]));
          const w = Math.abs(X(a[0]) - X(b[0])), h = Math.abs(Y(a[1]) - Y(b[1]));
          ctx.fillRect(x, y, w, h);
          ctx.strokeRect(x, y, w, h);
        }
      }}
    />
  );
}
