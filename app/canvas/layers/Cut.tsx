/**
 * The cut line: the part beyond it (above a horizontal cut, right of a vertical one) is shaded,
 * with a grip at the line's start and the readout beside it.
 */
import { cutSection, formatNumber, type Evaluation, type SectionProperties, type Units } from '../../../src';
import { INK, label } from '../../paint/ink';
import { traceRegion } from '../../paint/trace';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

export function CutNode({ ev, p, axis, at, v, units, width, height }: { ev: Evaluation; p: SectionProperties; axis: 'x' | 'y'; at: number; v: ViewTransform; units: Units; width: number; height: number }) {
  let cut: ReturnType<typeof cutSection> | null;
  try {
    cut = cutSection(ev.region, axis, at, p);
  } catch {
    cut = null;
  }
  const vertical = axis === 'x';
  return (
    <Paint
      paint={(ctx) => {
        const s = vertical ? screenX(v, at) : screenY(v, at);
        ctx.save();
        ctx.beginPath();
        if (vertical) ctx.rect(s, 0, Math.max(0, width - s), height);
        else ctx.rect(0, 0, width, s);
        ctx.clip();
        ctx.beginPath();
        traceRegion(ctx, ev.region, v);
        ctx.fillStyle = INK.cutFill;
        ctx.fill('nonzero');
        ctx.restore();
        ctx.strokeStyle = INK.cut;
        ctx.lineWidth = 1.5;
        ctx.beginPath();
        if (vertical) {
          ctx.moveTo(s, 0);
          ctx.lineTo(s, height);
        } else {
          ctx.moveTo(0, s);
          ctx.lineTo(width, s);
        }
        ctx.stroke();
        ctx.fillStyle = INK.cut;
        if (vertical) ctx.fillRect(s - 5, 6, 10, 10);
        else ctx.fillRect(6, s - 5, 10, 10);
        if (cut) {
          const t = `cut ${axis} = ${formatNumber(at, 5)}   b = ${formatNumber(cut.width, 5)} ${units}   Q = ${formatNumber(cut.Q, 5)} ${units}³   A ${vertical ? 'right' : 'above'} = ${formatNumber(cut.area, 5)} ${units}²`;
          if (vertical) label(ctx, t, s + 8, 30, INK.cut);
          else label(ctx, t, 24, s - 7, INK.cut);
        }
      }}
    />
  );
}
