/**
 * The grid on its own layer: it repaints only when the view changes. Minor and major lines,
 * the axes through the origin with their names, and major tick labels in document units.
 */
import { memo } from 'react';
import { Layer } from 'react-konva';
import { formatNumber, type Units } from '../../../src';
import { useEditorShallow, useEditorState } from '../../context';
import { INK } from '../../paint/ink';
import { gridStep, screenX, screenY, toWorld, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

const GridNode = memo(function GridNode({ v, width, height, units }: { v: ViewTransform; width: number; height: number; units: Units }) {
  return (
    <Paint
      paint={(ctx) => {
        ctx.fillStyle = INK.paper;
        ctx.fillRect(0, 0, width, height);
        const { minor, major } = gridStep(v.scale);
        const [x0, y1] = toWorld(v, 0, 0);
        const [x1, y0] = toWorld(v, width, height);
        const lines = (step: number, style: string) => {
          ctx.beginPath();
          for (let x = Math.ceil(x0 / step) * step; x <= x1; x += step) {
            const sx = Math.round(screenX(v, x)) + 0.5;
            ctx.moveTo(sx, 0);
            ctx.lineTo(sx, height);
          }
          for (let y = Math.ceil(y0 / step) * step; y <= y1; y += step) {
            const sy = Math.round(screenY(v, y)) + 0.5;
            ctx.moveTo(0, sy);
            ctx.lineTo(width, sy);
          }
          ctx.strokeStyle = style;
          ctx.lineWidth = 1;
          ctx.stroke();
        };
        if ((x1 - x0) / minor < 400) lines(minor, INK.gridMinor);
        lines(major, INK.gridMajor);
        // Axes through the origin, with arrows and names.
        ctx.strokeStyle = INK.axis;
        ctx.lineWidth = 1.25;
        ctx.beginPath();
        const ax = Math.round(screenX(v, 0)) + 0.5, ay = Math.round(screenY(v, 0)) + 0.5;
        ctx.moveTo(0, ay);
        ctx.lineTo(width, ay);
        ctx.moveTo(ax, 0);
        ctx.lineTo(ax, height);
        ctx.stroke();
        ctx.fillStyle = INK.axisText;
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        // Major tick labels along the edges (values in document units).
        const labelY = Math.min(Math.max(ay + 13, 14), height - 4);
        const labelX = Math.min(Math.max(ax + 4, 4), width - 40);
        ctx.textBaseline = 'alphabetic';
        for (let x = Math.ceil(x0 / major) * major; x <= x1; x += major) {
          if (Math.abs(x) < major / 2) continue;
          ctx.fillText(formatNumber(x, 6), screenX(v, x) + 3, labelY);
        }
        for (let y = Math.ceil(y0 / major) * major; y <= y1; y += major) {
          if (Math.abs(y) < major / 2) continue;
          ctx.fillText(formatNumber(y, 6), labelX, screenY(v, y) - 3);
        }
        ctx.font = 'italic 12px ui-serif, Georgia, serif';
        ctx.fillText('x', width - 14, ay - 5);
        ctx.fillText('y', ax + 5, 13);
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        ctx.fillText(`grid ${formatNumber(minor, 3)} ${units}`, 8, height - 8);
      }}
    />
  );
});

export function GridLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const units = useEditorState((s) => s.doc.units);
  return (
    <Layer listening={false}>
      <GridNode v={v} width={width} height={height} units={units} />
    </Layer>
  );
}
