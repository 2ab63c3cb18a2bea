/**
 * The torsion result on the section: the shaded map of |τ| under a unit torque (when the stress
 * map is switched on) with the place of its peak, and the shear centre S: an open diamond with a
 * dot (the centroid is a quartered circle). A result for an earlier section is drawn faded, so it
 * never passes for the current one.
 */
import Konva from 'konva';
import { useMemo } from 'react';
import type { TorsionResult } from '../../../src';
import { useEditorShallow, useEditorState, useResults, useTorsion } from '../../context';
import { INK } from '../../paint/ink';
import { renderStressImage } from '../../paint/stress-map';
import { traceRegion } from '../../paint/trace';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

/** The shear centre's colour (its own, apart from the centroid's slate and the axes' purple). */
export const SHEAR_CENTRE_INK = '#8a1c6e';
/** Opacity of a result that belongs to an earlier section. */
const STALE_ALPHA = 0.35;

function StressMapNode({ result, v, width, height, stale }: { result: TorsionResult; v: ViewTransform; width: number; height: number; stale: boolean }) {
  const region = useResults((r) => r.evaluation.region);
  // Drawn once per result and view; a drag frame only copies it.
  const image = useMemo(() => renderStressImage(result.stress, v, width, height, Konva.pixelRatio || 1), [result, v, width, height]);
  return (
    <Paint
      paint={(ctx) => {
        if (!image) return;
        ctx.globalAlpha = stale ? STALE_ALPHA : 1;
        ctx.drawImage(image.canvas, 0, 0, image.width, image.height);
        ctx.globalAlpha = 1;
        // The current outline over the map, so the edges read.
        ctx.beginPath();
        traceRegion(ctx, region, v);
        ctx.strokeStyle = INK.resultLine;
        ctx.lineWidth = 1.2;
        ctx.stroke();
        if (stale) return;
        // The peak: a ring with its label.
        const [x, y] = toScreen(v, result.stress.at.x, result.stress.at.y);
        ctx.strokeStyle = '#111';
        ctx.lineWidth = 1.5;
        ctx.beginPath();
        ctx.arc(x, y, 7, 0, 2 * Math.PI);
        ctx.stroke();
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        ctx.fillStyle = '#111';
        ctx.fillText('τmax', x + 9, y + 14);
      }}
    />
  );
}

function ShearCentreNode({ at, v, stale }: { at: { x: number; y: number }; v: ViewTransform; stale: boolean }) {
  return (
    <Paint
      paint={(ctx) => {
        const [x, y] = toScreen(v, at.x, at.y);
        const r = 7;
        ctx.globalAlpha = stale ? STALE_ALPHA : 1;
        ctx.strokeStyle = SHEAR_CENTRE_INK;
        ctx.fillStyle = 'rgba(255, 255, 255, 0.85)';
        ctx.lineWidth = 1.4;
        ctx.beginPath();
        ctx.moveTo(x - r, y);
        ctx.lineTo(x, y - r);
        ctx.lineTo(x + r, y);
        ctx.lineTo(x, y + r);
        ctx.closePath();
        ctx.fill();
        ctx.stroke();
        ctx.fillStyle = SHEAR_CENTRE_INK;
        ctx.beginPath();
        ctx.arc(x, y, 1.8, 0, 2 * Math.PI);
        ctx.fill();
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        // Below right: the centroid's C sits above right, and S is often on or near C.
        ctx.fillText(stale ? 'S (earlier section)' : 'S', x + 9, y + 15);
        ctx.globalAlpha = 1;
      }}
    />
  );
}

export function TorsionLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const mapOn = useEditorState((s) => s.overlays.stressMap);
  const shown = useTorsion((t) => t.shown);
  const stale = useTorsion((t) => t.stale);
  const result = shown?.torsion.ok ? shown.torsion.result : null;
  if (!result) return null;
  return (
    <>
      {mapOn && <StressMapNode result={result} v={v} width={width} height={height} stale={stale} />}
      <ShearCentreNode at={result.shearCentre} v={v} stale={stale} />
    </>
  );
}
