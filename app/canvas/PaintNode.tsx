/** A Konva shape that paints with a plain 2D context (no hit testing, no per-node redraw tricks). */
import type Konva from 'konva';
import { Shape as KShape } from 'react-konva';

export type SceneFn = (ctx: CanvasRenderingContext2D) => void;

export function Paint({ paint }: { paint: SceneFn }) {
  return (
    <KShape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(k: Konva.Context) => {
        const ctx = k._context;
        ctx.save();
        paint(ctx);
        ctx.restore();
      }}
    />
  );
}
