/** The canvas's dimension layout for the current section, zoom and overlays (null when off or empty). */
import type { DimensionLayout } from '../../src/report/dimensions';
import { useEditorShallow, useResults } from '../context';
import { canvasDimensions } from './dimension-layout';

export function useDimensions(): DimensionLayout | null {
  const s = useEditorShallow((s) => ({ on: s.overlays.dimensions, scale: s.scale, principal: s.overlays.principal, centroid: s.overlays.centroid, cutOn: s.overlays.cut, cutAt: s.cutAt, cutAxis: s.cutAxis }));
  const ev = useResults((r) => r.evaluation);
  const section = useResults((r) => r.doc);
  if (!s.on || !ev.props) return null;
  return canvasDimensions({
    region: ev.region,
    shapes: ev.shapes,
    records: section.shapes,
    props: ev.props,
    scale: s.scale,
    principal: s.principal,
    centroid: s.centroid,
    cut: s.cutOn && s.cutAt !== null ? { axis: s.cutAxis, at: s.cutAt } : null,
  });
}
