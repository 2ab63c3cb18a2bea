/** Idle: hover shows the handle under the pointer; a press picks a handle, a shape or empty space. */
import { pickShape } from '../geometry/pick';
import { beginGesture } from '../store/history';
import { shapeHandles } from '../shapes';
import type { PointerInfo, ToolEnv } from '../tools/types';
import { toScreen } from '../view';
import { BoxSelecting } from './BoxSelecting';
import { DraggingHandle } from './DraggingHandle';
import { DraggingCut, nearCutLine } from './DraggingCut';
import { PressingShape } from './PressingShape';
import { HANDLE_PX, type Next, type SelectState } from './state';
import { activeShapes } from '../store/section';

/** Index of the handle of the single selected shape under (sx, sy), or -1. */
export function handleUnder(env: ToolEnv, sx: number, sy: number): number {
  const s = env.store.getState();
  if (s.selected.length !== 1) return -1;
  const shape = activeShapes(s.doc).find((x) => x.id === s.selected[0]);
  if (!shape) return -1;
  let best = -1, bd = HANDLE_PX;
  shapeHandles(shape).forEach((h, i) => {
    const [hx, hy] = toScreen(s, h.p[0], h.p[1]);
    const d = Math.hypot(hx - sx, hy - sy);
    if (d <= bd) {
      bd = d;
      best = i;
    }
  });
  return best;
}

export class Idle implements SelectState {
  readonly name = 'idle';
  down(env: ToolEnv, e: PointerInfo): Next {
    const s = env.store.getState();
    if (nearCutLine(s, e.sx, e.sy)) return new DraggingCut();
    const h = handleUnder(env, e.sx, e.sy);
    if (h >= 0) {
      const shape = activeShapes(s.doc).find((x) => x.id === s.selected[0])!;
      beginGesture(env.store);
      return new DraggingHandle(shape.id, shapeHandles(shape)[h].ref, s.doc);
    }
    const id = pickShape(env.results.shapesOf(s.doc), e.raw[0], e.raw[1], 0.5 / s.scale, 4 / s.scale);
    if (id) {
      let selected = s.selected;
      if (e.shift) selected = selected.includes(id) ? selected.filter((x) => x !== id) : [...selected, id];
      else if (!selected.includes(id)) selected = [id];
      env.store.setState({ selected });
      return selected.includes(id) ? new PressingShape([e.sx, e.sy], e.raw, s.doc) : this;
    }
    if (!e.shift) env.store.setState({ selected: [] });
    return new BoxSelecting(e.raw, e.shift);
  }
  move(env: ToolEnv, e: PointerInfo): Next {
    const h = handleUnder(env, e.sx, e.sy);
    env.transient.setState({ hoverHandle: h >= 0 ? h : null });
    return this;
  }
}
