/**
 * Keep what was just placed in sight: when a shape lands partly or wholly outside the canvas (a
 * profile placed near the edge, a typed placement far from the view, a catalogue size larger than
 * the view), the view pans to centre it, and zooms out only when it does not fit. The first shape
 * of an empty section that would show as a speck is fitted to the view.
 */
import { regionsBounds, type Bounds } from '../src';
import type { CommandContext } from './commands/registry';
import { activeSection } from './store/section';
import { fitBounds, STRIP_PX, toScreen } from './view';

/** Pixels of clear canvas kept around a revealed shape. */
const MARGIN_PX = 24;

export function boundsOfShapes(ctx: Pick<CommandContext, 'store' | 'shapesOf'>, ids: readonly string[]): Bounds | null {
  const want = new Set(ids);
  const rs = ctx.shapesOf(activeSection(ctx.store.getState().doc)).filter((r) => want.has(r.id));
  return regionsBounds(rs.map((r) => r.region));
}

/** True when the bounds lie inside the canvas with the margin. */
export function inView(ctx: Pick<CommandContext, 'store'>, b: Bounds): boolean {
  const s = ctx.store.getState();
  const [x0, y0] = toScreen(s, b.xmin, b.ymax);
  const [x1, y1] = toScreen(s, b.xmax, b.ymin);
  return x0 >= MARGIN_PX && y0 >= MARGIN_PX && x1 <= s.width - MARGIN_PX && y1 <= s.height - MARGIN_PX;
}

export function revealShapes(ctx: Pick<CommandContext, 'store' | 'shapesOf'>, ids: readonly string[]): void {
  const b = boundsOfShapes(ctx, ids);
  if (!b) return;
  const s = ctx.store.getState();
  const w = (b.xmax - b.xmin) * s.scale, h = (b.ymax - b.ymin) * s.scale;
  // The first shape of an empty section, shown as a speck (a beam in inches on a view left at a
  // millimetre zoom): fit the view to it.
  const alone = activeSection(s.doc).shapes.every((x) => ids.includes(x.id));
  if (alone && Math.max(w, h) < Math.min(s.width, s.height) / 6) {
    ctx.store.setState(fitBounds(b, s.width, s.height, 48, STRIP_PX));
    return;
  }
  if (inView(ctx, b)) return;
  if (w <= s.width - 2 * MARGIN_PX && h <= s.height - 2 * MARGIN_PX) {
    const cx = (b.xmin + b.xmax) / 2, cy = (b.ymin + b.ymax) / 2;
    ctx.store.setState({ ox: s.width / 2 - cx * s.scale, oy: s.height / 2 + cy * s.scale });
  } else ctx.store.setState(fitBounds(b, s.width, s.height, 48, STRIP_PX));
}
