/** View operations: fit the section, toggle an overlay, and where a new cut line starts. */
import type { SectionProperties } from '../../src';
import type { CommandContext } from '../commands/registry';
import type { EditorState, Overlays } from '../store/store';
import { evaluationBounds, fitBounds, STRIP_PX } from '../view';
import { unionBounds } from '../../src';
import { activeSection } from '../store/section';
import { linesAndLoadsBounds } from './welds';

export function fitView(ctx: CommandContext): void {
  const s = ctx.store.getState();
  const shapes = ctx.shapesOf(s.doc);
  // Line elements and weld loads have no area: their extent is added to the outlines'.
  const b = unionBounds(evaluationBounds({ shapes }), linesAndLoadsBounds(shapes, activeSection(s.doc)));
  if (!b) return;
  // With dimensions shown, room for their lanes (about 20 mm of screen beyond the section).
  ctx.store.setState(fitBounds(b, s.width, s.height, s.overlays.dimensions ? 48 + 76 : 48, STRIP_PX));
}

/** Where a new cut line starts: through the centroid, with round-off zero shown as 0. */
export function centroidCut(p: SectionProperties, axis: 'x' | 'y'): number {
  const c = axis === 'x' ? p.centroid.x : p.centroid.y;
  const size = Math.max(p.bounds.xmax - p.bounds.xmin, p.bounds.ymax - p.bounds.ymin);
  return Math.abs(c) < 1e-12 * size ? 0 : c;
}

export function toggleOverlay(ctx: CommandContext, key: keyof Overlays): void {
  const s = ctx.store.getState();
  const overlays = { ...s.overlays, [key]: !s.overlays[key] };
  const patch: Partial<EditorState> = { overlays };
  if (key === 'cut' && overlays.cut && s.cutAt === null) {
    const ev = ctx.evaluate(s.doc);
    if (ev.props) patch.cutAt = centroidCut(ev.props, s.cutAxis);
  }
  ctx.store.setState(patch);
}
