/** Dragging a selection box on empty canvas: selects the shapes lying wholly inside it. */
import { regionBounds, type Point } from '../../src';
import type { PointerInfo, ToolEnv } from '../tools/types';
import { DRAG_PX, IDLE, type Next, type SelectState } from './state';

export class BoxSelecting implements SelectState {
  readonly name = 'boxSelecting';
  constructor(
    private readonly start: Point,
    private readonly additive: boolean,
  ) {}
  move(env: ToolEnv, e: PointerInfo): Next {
    env.transient.setState({ draft: { box: [this.start, e.raw] } });
    return this;
  }
  up(env: ToolEnv, e: PointerInfo): Next {
    env.transient.setState({ draft: null });
    const s = env.store.getState();
    const x0 = Math.min(this.start[0], e.raw[0]), x1 = Math.max(this.start[0], e.raw[0]);
    const y0 = Math.min(this.start[1], e.raw[1]), y1 = Math.max(this.start[1], e.raw[1]);
    if ((x1 - x0) * s.scale < DRAG_PX && (y1 - y0) * s.scale < DRAG_PX) return IDLE;
    const inside = env.results
      .shapesOf(s.doc)
      .filter((r) => {
        const b = regionBounds(r.region);
        return b && b.xmin >= x0 && b.xmax <= x1 && b.ymin >= y0 && b.ymax <= y1;
      })
      .map((r) => r.id);
    env.store.setState({ selected: this.additive ? [...new Set([...s.selected, ...inside])] : inside });
    return IDLE;
  }
  cancel(env: ToolEnv): void {
    env.transient.setState({ draft: null });
  }
}
