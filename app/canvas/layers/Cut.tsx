/**
 * The cut line: the part beyond it (above a horizontal cut, right of a vertical one) is shaded,
 * with a grip at the line's start and the readout beside it (app/ops/cut-readout.ts): the cut's
 * position, Q, Q/b and the area beyond on one line, the width on the next; where the width jumps
 * at the cut, both one-sided widths and the side Q/b uses.
 */
import type { Evaluation, SectionProperties, Units } from '../../../src';
import { cutReadout, type CutReadout } from '../../ops/cut-readout';
import { INK, label } from '../../paint/ink';
import { traceRegion } from '../../paint/trace';
import { screenX, screenY, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

/** The readout's two lines of text. */
export function cutLabelLines(r: CutReadout, axis: 'x' | 'y', units: Units): [string, string] {
  const first = `cut ${axis} = ${r.text.at}   Q = ${r.text.Q} ${units}³   Q/b = ${r.text.qOverB}${r.text.qOverB === '—' ? '' : ` ${units}²`}   A ${r.words.beyond} = ${r.text.area} ${units}²`;
  const second = r.jump
    ? `b ${r.words.side.plus} = ${r.text.widthAbove} ${units} · ${r.words.side.minus} = ${r.text.widthBelow} ${units}; Q/b uses the width ${r.qbSide} the cut`
    : `b = ${r.text.widthForQb} ${units}`;
  return [first, second];
}

export function CutNode({ ev, p, axis, at, v, units, width, height }: { ev: Evaluation; p: SectionProperties; axis: 'x' | 'y'; at: number; v: ViewTransform; units: Units; width: number; height: number }) {
  const readout = cutReadout(ev.region, p, axis, at);
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
        if (readout) {
          const [first, second] = cutLabelLines(readout, axis, units);
          if (vertical) {
            label(ctx, first, s + 8, 30, INK.cut);
            label(ctx, second, s + 8, 46, INK.cut);
          } else {
            // Above the line when there is room, else below it.
            const up = s > 40;
            label(ctx, first, 24, up ? s - 23 : s + 17, INK.cut);
            label(ctx, second, 24, up ? s - 7 : s + 33, INK.cut);
          }
        }
      }}
    />
  );
}
