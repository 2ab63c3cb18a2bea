/**
 * The baseline behind a proposal: the material the proposal removes (baseline − proposal) shaded
 * amber and hatched, the material it adds (proposal − baseline) shaded green, and the baseline's
 * outline drawn faintly, dashed. Painted before the section, so the proposal's own outline stays
 * on top. Nothing is drawn while the baseline is shown.
 *
 * The shaded regions are the exact booleans (src/compare/material-change.ts), which wait for the
 * pointer to rest (cutout-hooks.ts). While a drag runs only the baseline is drawn (the moving
 * shape's own hatch shows the cut); the shading returns when the pointer rests.
 */
import { useRef } from 'react';
import type { Region } from '../../../src';
import { useMaterialChange } from '../../cutout-hooks';
import { useEditorShallow, useResults } from '../../context';
import { CUTOUT_INK, removedHatch } from '../../paint/cutout-ink';
import { traceRegion } from '../../paint/trace';
import type { ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

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

/**
 * The layer repaints as a whole on every pointer move of a drag, but this picture changes only
 * when the results do: it is painted once into an offscreen bitmap per change (of the regions,
 * the view or the size) and copied on every frame, so a drag pays one copy, not the fills.
 */
function useBitmap(width: number, height: number) {
  const ref = useRef<{ canvas: HTMLCanvasElement; key: unknown[] } | null>(null);
  return (key: unknown[], draw: (ctx: CanvasRenderingContext2D) => void): HTMLCanvasElement | null => {
    if (typeof document === 'undefined') return null;
    const pr = typeof window !== 'undefined' ? window.devicePixelRatio || 1 : 1;
    const full = [...key, width, height, pr];
    const hit = ref.current;
    if (hit && hit.key.length === full.length && hit.key.every((k, i) => k === full[i])) return hit.canvas;
    const canvas = hit?.canvas ?? document.createElement('canvas');
    canvas.width = Math.max(1, Math.round(width * pr));
    canvas.height = Math.max(1, Math.round(height * pr));
    const ctx = canvas.getContext('2d');
    if (!ctx) return null;
    ctx.setTransform(pr, 0, 0, pr, 0, 0);
    ctx.clearRect(0, 0, width, height);
    draw(ctx);
    ref.current = { canvas, key: full };
    return canvas;
  };
}

export function BaselineLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const base = useResults((r) => r.baseline?.evaluation.region ?? null);
  const { change, stale } = useMaterialChange();
  const bitmap = useBitmap(width, height);
  if (!base) return null;
  // While a drag runs the shading is left out (the moving shape's own hatch shows the cut), so the
  // picture does not change with each evaluation; it comes back, exact, when the pointer rests.
  const exact = change && !stale ? change : null;
  const picture = bitmap([base, exact, v.scale, v.ox, v.oy], (ctx) => {
    if (exact) {
      fillRegion(ctx, exact.removed, v, [CUTOUT_INK.removedFill, removedHatch(ctx)], CUTOUT_INK.removedLine);
      fillRegion(ctx, exact.added, v, [CUTOUT_INK.addedFill], CUTOUT_INK.addedLine);
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
  });
  return <Paint paint={(ctx) => picture && ctx.drawImage(picture, 0, 0, width, height)} />;
}
