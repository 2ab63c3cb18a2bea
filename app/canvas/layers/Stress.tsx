/**
 * Stresses under the document's loads, on the section: the colour map (each material's exact
 * linear field as one linear gradient fill, from the engine's stressGradients: nothing is sampled),
 * then on top the neutral axis, the largest tension and compression with their places (overall,
 * and per material when there are several), and the probed point with its stress.
 */
import { formatNumber, stressAt, type LoadCase, type StressPoint } from '../../../src';
import { useEditorShallow, useEditorState, useResults } from '../../context';
import { useLoadCase } from '../../materials/derived';
import { useMaterialsUi } from '../../materials/hooks';
import { crosshair, label } from '../../paint/ink';
import { STRESS_INK, stressColour } from '../../paint/materials';
import { traceRegion } from '../../paint/trace';
import { toScreen, type ViewTransform } from '../../view';
import { Paint } from '../PaintNode';

/** The load case when the stress overlay has something to show. */
function useShownCase(): LoadCase | null {
  const on = useEditorState((s) => s.overlays.stress);
  const lc = useLoadCase();
  if (!on || !lc || 'error' in lc) return null;
  return lc;
}

/** Gradient stops per eighth of the range, plus one exactly at σ = 0 when it falls inside. */
function stops(low: number, high: number): number[] {
  const ts = Array.from({ length: 9 }, (_, k) => k / 8);
  if (low < 0 && high > 0) ts.push(-low / (high - low));
  return ts.sort((a, b) => a - b);
}

function paintMap(ctx: CanvasRenderingContext2D, lc: LoadCase, v: ViewTransform) {
  const peak = lc.peak > 0 ? lc.peak : 1;
  for (const g of lc.gradients) {
    const part = lc.field.parts.find((p) => p.material.id === g.material);
    if (!part) continue;
    ctx.beginPath();
    traceRegion(ctx, part.region, v);
    if (g.uniform) ctx.fillStyle = stressColour(g.low / peak, 0.9);
    else {
      const [x0, y0] = toScreen(v, g.from.x, g.from.y), [x1, y1] = toScreen(v, g.to.x, g.to.y);
      const grad = ctx.createLinearGradient(x0, y0, x1, y1);
      for (const t of stops(g.low, g.high)) grad.addColorStop(t, stressColour((g.low + t * (g.high - g.low)) / peak, 0.9));
      ctx.fillStyle = grad;
    }
    ctx.fill('nonzero');
  }
}

export function StressMapLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const lc = useShownCase();
  if (!lc || lc.unloaded) return null;
  return <Paint paint={(ctx) => paintMap(ctx, lc, v)} />;
}

function marker(ctx: CanvasRenderingContext2D, v: ViewTransform, p: StressPoint, colour: string, up: boolean, size: number) {
  const [x, y] = toScreen(v, p.x, p.y);
  ctx.fillStyle = colour;
  ctx.strokeStyle = '#ffffff';
  ctx.lineWidth = 1.2;
  ctx.beginPath();
  // A triangle pointing away from the neutral axis side: up for tension, down for compression.
  const s = up ? -1 : 1;
  ctx.moveTo(x, y);
  ctx.lineTo(x - size * 0.7, y + s * size * 1.3);
  ctx.lineTo(x + size * 0.7, y + s * size * 1.3);
  ctx.closePath();
  ctx.fill();
  ctx.stroke();
  return [x, y] as const;
}

export function StressMarksLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const { width, height } = useEditorShallow((s) => ({ width: s.width, height: s.height }));
  const lc = useShownCase();
  const probe = useMaterialsUi((s) => s.probe);
  const unit = useResults((r) => r.doc.stressUnit ?? 'MPa');
  const names = useResults((r) => r.doc.materials);
  if (!lc) return null;
  const many = lc.extremes.byMaterial.length > 1;
  const nameOf = (id: string) => names?.find((m) => m.id === id)?.name || id;
  return (
    <Paint
      paint={(ctx) => {
        ctx.font = '11px ui-sans-serif, system-ui, sans-serif';
        // Neutral axis: across the whole view, labelled where it leaves the section's extent.
        if (lc.axis) {
          const [px, py] = toScreen(v, lc.axis.point.x, lc.axis.point.y);
          const dx = lc.axis.direction.x, dy = -lc.axis.direction.y;
          const far = 2 * (width + height);
          ctx.strokeStyle = STRESS_INK.axis;
          ctx.lineWidth = 1.4;
          ctx.setLineDash([12, 4, 2, 4]);
          ctx.beginPath();
          ctx.moveTo(px - far * dx, py - far * dy);
          ctx.lineTo(px + far * dx, py + far * dy);
          ctx.stroke();
          ctx.setLineDash([]);
          // Label towards the left end of the line (the legend sits top right), beyond the
          // section, kept inside the view.
          const text = 'neutral axis (σ = 0)';
          const w = ctx.measureText(text).width;
          const reach = (lc.field.extent / 2) * v.scale + 16 + w;
          const side = dx >= 0 ? -1 : 1;
          const lx = Math.min(Math.max(px + side * reach * dx, 8), width - w - 12);
          const ly = Math.min(Math.max(py + side * reach * dy - 6, 18), height - 8);
          label(ctx, text, lx, ly, STRESS_INK.axis);
        }
        const fmt = (p: StressPoint) => `${formatNumber(p.value)} ${unit}`;
        const shown = new Set<string>();
        const key = (p: StressPoint) => `${p.x},${p.y}`;
        const t = lc.extremes.maxTension, c = lc.extremes.maxCompression;
        if (t) {
          const [x, y] = marker(ctx, v, t, STRESS_INK.tension, true, 8);
          label(ctx, `max tension ${fmt(t)}${many ? ` (${nameOf(t.material)})` : ''}`, x + 10, y - 6, STRESS_INK.tension);
          shown.add(key(t));
        }
        if (c) {
          const [x, y] = marker(ctx, v, c, STRESS_INK.compression, false, 8);
          label(ctx, `max compression ${fmt(c)}${many ? ` (${nameOf(c.material)})` : ''}`, x + 10, y + 16, STRESS_INK.compression);
          shown.add(key(c));
        }
        if (many) {
          // Each material's worst stress, and its other extreme when the material's range is more
          // than a few per cent of the scale (else the two marks say the same and crowd).
          for (const e of lc.extremes.byMaterial) {
            const worstIsMax = Math.abs(e.max.value) >= Math.abs(e.min.value);
            const spread = e.max.value - e.min.value > 0.03 * lc.peak;
            for (const [p, up] of [[e.max, true], [e.min, false]] as const) {
              if (!spread && up !== worstIsMax) continue;
              if (shown.has(key(p)) || p.value === 0) continue;
              shown.add(key(p));
              const [x, y] = marker(ctx, v, p, p.value > 0 ? STRESS_INK.tension : STRESS_INK.compression, up, 5.5);
              label(ctx, `${nameOf(e.material)} ${fmt(p)}`, x + 8, up ? y - 4 : y + 14, p.value > 0 ? STRESS_INK.tension : STRESS_INK.compression);
            }
          }
        }
        if (probe) {
          const [x, y] = toScreen(v, probe[0], probe[1]);
          ctx.strokeStyle = STRESS_INK.probe;
          ctx.lineWidth = 1.5;
          crosshair(ctx, x, y, 5, 10);
          const at = stressAt(lc.field, probe[0], probe[1]);
          const text = at.inside ? at.stresses.map((s) => `σ = ${formatNumber(s.value)} ${unit}${many || at.stresses.length > 1 ? ` (${nameOf(s.material)})` : ''}`).join(', ') : 'outside the section';
          label(ctx, text, x + 12, y - 8, STRESS_INK.probe);
        }
      }}
    />
  );
}
