/**
 * The canvas's dimension layout for the current section, zoom and overlays; null when the toggle
 * is off, when there is no section, and while a gesture moves shapes (the layout takes a few to a
 * few tens of milliseconds, so it is redone when the shapes come to rest, not on every frame).
 */
import type { DimensionLayout } from '../../src/report/dimensions';
import { useEditorShallow, useResults } from '../context';
import { canvasDimensions } from './dimension-layout';

export function useDimensions(): DimensionLayout | null {
  const s = useEditorShallow((s) => ({ on: s.overlays.dimensions, scale: s.scale, principal: s.overlays.principal, centroid: s.overlays.centroid, moving: s.gestureBase !== null }));
  const ev = useResults((r) => r.evaluation);
  const section = useResults((r) => r.doc);
  if (!s.on || !ev.props || s.moving) return null;
  return canvasDimensions({ region: ev.region, shapes: ev.shapes, records: section.shapes, props: ev.props, scale: s.scale, principal: s.principal, centroid: s.centroid });
}
