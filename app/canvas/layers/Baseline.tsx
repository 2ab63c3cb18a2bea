/**
 * The baseline behind a proposal: the material the proposal removes (baseline − proposal) shaded
 * amber and hatched, the material it adds (proposal − baseline) shaded green, and the baseline's
 * outline drawn faintly, dashed. Painted before the section, so the proposal's own outline stays
 * on top. Nothing is drawn while the baseline is shown.
 *
 * The shaded regions are the exact booleans (src/compare/material-change.ts). Those wait for the
 * pointer to rest (cutout-hooks.ts); while a drag runs, the same two areas are painted by clipping
 * one outline with the other (the baseline's fill outside the proposal, and the reverse), which
 * shows the same pixels without computing a boolean per frame.
 */
import type { Region } from '../../../src';
import { useMaterialChange } from '../../cutout-hooks';
import { useEditorShallow, useResults } from '../../context';
import { CUTOUT_INK, removedHatch } from '../../paint/cutout-ink';
import { traceRegion } from '../../paint/trace';
import type { ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

/** Fill `region` where `outside` has no material (the even-odd rule against a frame around the view). */
function fillOutside(ctx: CanvasRenderingContext2D, region: Region, outside: Region, v: ViewTransform, w: number, h: number, fill: string | CanvasPattern) {
  ctx.save();
  ctx.beginPath();
  ctx.rect(-10, -10, w + 20, h + 20);
  traceRegion(ctx, outside, v);
  ctx.clip('evenodd');
  ctx.beginPath();
  traceRegion(ctx, region, v);
  ctx.fillStyle = fill;
  ctx.fill('nonzero');
  ctx.restore();
}

function fillRegion(ctx: CanvasRenderingContext2D, region: Region, v: ViewTransform, fills: (string | CanvasPattern)[], line: string) {
  if (!region.length) return;
  ctx.beginPath();
  traceRegion(ctx, region, v);
  for (const f of fills) {
    ctx.fillStyle = f;
    ctx.fill('nonzero');
  }
  ctx.strokeStyle = line;
  ctx.lineWidth = 0.8;
  ctx.stroke();
}

export function BaselineLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const base = useResults((r) => r.baseline?.evaluation.region ?? null);
  const proposal = useResults((r) => r.evaluation.region);
  const { change, stale } = useMaterialChange();
  if (!base) return null;
  return (
    <Paint
      paint={(ctx) => {
        if (change && !stale) {
          fillRegion(ctx, change.removed, v, [CUTOUT_INK.removedFill, removedHatch(ctx)], CUTOUT_INK.removedLine);
          fillRegion(ctx, change.added, v, [CUTOUT_INK.addedFill], CUTOUT_INK.addedLine);
        } else {
          fillOutside(ctx, base, proposal, v, width, height, CUTOUT_INK.removedFill);
          fillOutside(ctx, proposal, base, v, width, height, CUTOUT_INK.addedFill);
        }
        ctx.beginPath();
        traceRegion(ctx, base, v);
        ctx.fillStyle = CUTOUT_INK.baselineFill;
        ctx.fill('nonzero');
        ctx.setLineDash([6, 4]);
        ctx.strokeStyle = CUTOUT_INK.baselineLine;
        ctx.lineWidth = 1.2;
        ctx.stroke();
        ctx.setLineDash([]);
      }}
    />
  );
}
