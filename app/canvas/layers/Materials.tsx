/**
 * Each material's part of the section, filled in its colour (the composed regions of the
 * evaluation: later shapes replace earlier ones where they overlap), with a thin outline so the
 * joints between materials read. When the stress map is shown it paints the fill instead, and only
 * the outlines are drawn here.
 */
import { useEditorShallow, useEditorState, useResults } from '../../context';
import { useLoadCase } from '../../materials/derived';
import { materialColours, withAlpha } from '../../paint/materials';
import { traceRegion } from '../../paint/trace';
import { Paint } from '../PaintNode';

export function MaterialsLayer() {
  const v = useEditorShallow((s) => ({ scale: s.scale, ox: s.ox, oy: s.oy }));
  const materials = useResults((r) => r.doc.materials);
  const regions = useResults((r) => r.evaluation.materials?.regions);
  const stressOn = useEditorState((s) => s.overlays.stress);
  const lc = useLoadCase();
  if (!materials?.length || !regions?.length) return null;
  const mapShown = stressOn && !!lc && !('error' in lc) && !lc.unloaded;
  const colours = materialColours(materials);
  return (
    <Paint
      paint={(ctx) => {
        for (const r of regions) {
          const c = colours.get(r.material) ?? '#888888';
          ctx.beginPath();
          traceRegion(ctx, r.region, v);
          if (!mapShown) {
            ctx.fillStyle = withAlpha(c, 0.5);
            ctx.fill('nonzero');
          }
          ctx.strokeStyle = withAlpha(c, 0.95);
          ctx.lineWidth = 1;
          ctx.stroke();
        }
      }}
    />
  );
}
