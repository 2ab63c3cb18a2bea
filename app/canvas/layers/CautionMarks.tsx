/**
 * A marker at the point of every structural caution, numbered as in the cautions panel: a red
 * triangle for a warning, a slate circle for a note. With a proposal shown, the proposal's own
 * cautions are drawn full strength and the baseline's (already there before the cut) faintly.
 * Without one, only the warnings are marked (the notes, such as a radiused corner found, stay
 * in the panel), so a plain section is not crowded with markers.
 * The markers wait for the pointer to rest (the analysis is not redone during a drag).
 */
import type { Caution } from '../../../src';
import { numberedCautions, useCautions } from '../../cutout-hooks';
import { useEditorShallow, useEditorState } from '../../context';
import { CUTOUT_INK } from '../../paint/cutout-ink';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

/** Marker size (px). */
export const MARKER_PX = 9;

function marker(ctx: CanvasRenderingContext2D, c: Caution, n: number, v: ViewTransform, faint: boolean) {
  const [x, y] = toScreen(v, c.at.x, c.at.y);
  const r = faint ? MARKER_PX * 0.8 : MARKER_PX;
  ctx.globalAlpha = faint ? 0.45 : 1;
  ctx.beginPath();
  if (c.severity === 'warning') {
    ctx.moveTo(x, y - r * 1.05);
    ctx.lineTo(x + r, y + r * 0.75);
    ctx.lineTo(x - r, y + r * 0.75);
    ctx.closePath();
    ctx.fillStyle = CUTOUT_INK.warning;
  } else {
    ctx.arc(x, y, r * 0.8, 0, 2 * Math.PI);
    ctx.fillStyle = CUTOUT_INK.note;
  }
  ctx.fill();
  ctx.strokeStyle = '#fff';
  ctx.lineWidth = 1.2;
  ctx.stroke();
  ctx.fillStyle = CUTOUT_INK.markerText;
  ctx.font = `bold ${faint ? 8 : 9}px ui-sans-serif, system-ui, sans-serif`;
  ctx.textAlign = 'center';
  ctx.textBaseline = 'middle';
  ctx.fillText(String(n), x, y + (c.severity === 'warning' ? r * 0.2 : 0));
  ctx.globalAlpha = 1;
}

export function CautionMarksLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const proposal = useEditorState((s) => !!s.doc.activeVariant);
  const shown = useEditorState((s) => s.overlays.cautions);
  const { cautions, stale } = useCautions();
  const { all, own } = numberedCautions(cautions);
  if (!shown || stale || all.length === 0) return null;
  return (
    <Paint
      paint={(ctx) => {
        // The faint ones first, so the proposal's own sit on top where they meet.
        for (let k = all.length - 1; k >= 0; k--) if (proposal || all[k].severity === 'warning') marker(ctx, all[k], k + 1, v, k >= own);
      }}
    />
  );
}
