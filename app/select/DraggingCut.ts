/**
 * Dragging the cut line: a press within a few pixels of the line (when it is shown) moves it with
 * the pointer. The cut position is view state, not part of the document, so nothing is recorded.
 */
import type { EditorState } from '../store/store';
import type { PointerInfo, ToolEnv } from '../tools/types';
import { screenX, screenY } from '../view';
import { IDLE, type Next, type SelectState } from './state';

/** Pick distance of the cut line (px). */
export const CUT_PX = 5;

/** True when (sx, sy) is within CUT_PX of the cut line shown on screen. */
export function nearCutLine(s: EditorState, sx: number, sy: number): boolean {
  if (!s.overlays.cut || s.cutAt === null) return false;
  return s.cutAxis === 'x' ? Math.abs(screenX(s, s.cutAt) - sx) <= CUT_PX : Math.abs(screenY(s, s.cutAt) - sy) <= CUT_PX;
}

export class DraggingCut implements SelectState {
  readonly name = 'draggingCut';
  move(env: ToolEnv, e: PointerInfo): Next {
    env.store.setState({ cutAt: env.store.getState().cutAxis === 'x' ? e.raw[0] : e.raw[1] });
    return this;
  }
  up(): Next {
    return IDLE;
  }
}
