/** Moving the selection: previews every pointer move, records one undo step on release. */
import type { Point, SectionDocument } from '../../../src';
import { roundTo } from '../../canvas/snap';
import { cancelGesture, endGesture, previewGesture } from '../../store/history';
import { translateShape } from '../../shapes';
import { gridStep } from '../../view';
import type { PointerInfo, ToolEnv } from '../types';
import { Idle } from './Idle';
import type { SelectState } from './state';

export class DraggingShapes implements SelectState {
  readonly name = 'draggingShapes';
  constructor(
    private readonly start: Point,
    private readonly base: SectionDocument,
    private readonly ids: ReadonlySet<string>,
  ) {}
  move(env: ToolEnv, e: PointerInfo): SelectState {
    const s = env.store.getState();
    let dx = e.raw[0] - this.start[0], dy = e.raw[1] - this.start[1];
    if (s.snap.grid) {
      // Moves go in whole grid steps, so a shape on the grid stays on it.
      const { minor } = gridStep(s.scale);
      dx = roundTo(dx, minor);
      dy = roundTo(dy, minor);
    }
    if (e.shift || s.snap.ortho) {
      if (Math.abs(dx) >= Math.abs(dy)) dy = 0;
      else dx = 0;
    }
    const shapes = this.base.shapes.map((sh) => (this.ids.has(sh.id) ? translateShape(sh, dx, dy) : sh));
    previewGesture(env.store, { ...this.base, shapes });
    return this;
  }
  up(env: ToolEnv): SelectState {
    endGesture(env.store);
    return new Idle();
  }
  cancel(env: ToolEnv): void {
    cancelGesture(env.store);
  }
}
