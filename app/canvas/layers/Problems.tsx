/**
 * DXF import marks on the canvas: the outlines waiting to be added (dashed), and the entities the
 * importer left out (red, with their layer and handle), until the user clears them.
 */
import type { Region } from '../../../src';
import type { DxfProblem } from '../../../src/exchange';
import { useEditorShallow } from '../../context';
import { useExchange } from '../../exchange/hooks';
import { INK } from '../../paint/ink';
import { traceRegion } from '../../paint/trace';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

function paintProblems(ctx: CanvasRenderingContext2D, problems: DxfProblem[], v: ViewTransform) {
  const X = (x: number) => screenX(v, x), Y = (y: number) => screenY(v, y);
  ctx.strokeStyle = INK.error;
  ctx.fillStyle = INK.error;
  ctx.lineWidth = 3;
  ctx.lineCap = 'round';
  ctx.lineJoin = 'round';
  ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
  for (const pr of problems) {
    const pts = pr.points.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y));
    if (pts.length === 0) continue;
    ctx.beginPath();
    ctx.moveTo(X(pts[0][0]), Y(pts[0][1]));
    for (const [x, y] of pts.slice(1)) ctx.lineTo(X(x), Y(y));
    ctx.stroke();
    // Open ends as rings, so a gap between two ends is visible at any zoom.
    for (const [x, y] of [pts[0], pts[pts.length - 1]]) {
      ctx.beginPath();
      ctx.arc(X(x), Y(y), 4.5, 0, 2 * Math.PI);
      ctx.lineWidth = 1.5;
      ctx.stroke();
      ctx.lineWidth = 3;
    }
    const text = `${pr.layer} · ${pr.handle}`;
    // Label at the middle of the middle segment; to the left when it would leave the canvas.
    const m = Math.max(0, Math.floor((pts.length - 2) / 2));
    const q = pts[Math.min(m + 1, pts.length - 1)];
    const sx = (X(pts[m][0]) + X(q[0])) / 2, sy = (Y(pts[m][1]) + Y(q[1])) / 2;
    const w = ctx.measureText(text).width;
    const room = ctx.canvas.width / (window.devicePixelRatio || 1);
    const lx = sx + 6 + w + 6 > room ? sx - w - 12 : sx + 6;
    ctx.fillStyle = 'rgba(255, 255, 255, 0.9)';
    ctx.fillRect(lx, sy - 16, w + 6, 15);
    ctx.fillStyle = INK.error;
    ctx.fillText(text, lx + 3, sy - 5);
  }
}

function paintPreview(ctx: CanvasRenderingContext2D, region: Region, v: ViewTransform) {
  ctx.beginPath();
  traceRegion(ctx, region, v);
  ctx.fillStyle = 'rgba(44, 92, 197, 0.10)';
  ctx.fill('nonzero');
  ctx.setLineDash([6, 4]);
  ctx.strokeStyle = INK.draft;
  ctx.lineWidth = 1.5;
  ctx.stroke();
  ctx.setLineDash([]);
}

export function ProblemLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const problems = useExchange((s) => s.problems);
  const pending = useExchange((s) => s.pending);
  const preview = pending?.stage === 'review' ? pending.region : null;
  if (problems.length === 0 && !preview) return null;
  return (
    <Paint
      paint={(ctx) => {
        if (preview) paintPreview(ctx, preview, v);
        paintProblems(ctx, problems, v);
      }}
    />
  );
}
