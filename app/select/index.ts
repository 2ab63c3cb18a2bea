/**
 * The select tool: click to select (Shift adds or removes), drag a shape to move the selection,
 * drag a handle to edit a point, drag the cut line to move it, drag on empty canvas for a
 * selection box. Moves preview live
 * and record one undo step when the pointer is released. States live one per file beside this.
 */
import { translateShape } from '../../src';
import { beginGesture, endGesture, previewGesture } from '../store/history';
import type { PointInput } from '../expr';
import { resolveMove, type PointerInfo, type Tool, type ToolEnv } from '../tools/types';
import { Idle } from './Idle';
import type { SelectState } from './state';
import { activeShapes, withActiveShapes } from '../store/section';

export { handleUnder } from './Idle';

export class SelectTool implements Tool {
  readonly id = 'select' as const;
  private state: SelectState = new Idle();

  prompt() {
    return 'Select: click a shape, drag to move it, drag on empty space to select by box; arrows move by a fixed step';
  }
  busy() {
    return this.state.name !== 'idle';
  }
  reset(env: ToolEnv) {
    this.state.cancel?.(env);
    this.state = new Idle();
    env.transient.setState({ draft: null });
  }
  down(env: ToolEnv, e: PointerInfo) {
    if (this.state.down) this.state = this.state.down(env, e) ?? new Idle();
  }
  move(env: ToolEnv, e: PointerInfo) {
    if (this.state.move) this.state = this.state.move(env, e) ?? new Idle();
  }
  up(env: ToolEnv, e: PointerInfo) {
    this.state = this.state.up?.(env, e) ?? new Idle();
  }
  key(env: ToolEnv, key: string) {
    if (key !== 'escape') return false;
    if (this.busy()) this.reset(env);
    else env.store.setState({ selected: [] });
    return true;
  }

  /** With a selection, a displacement (Δ dx, dy) or a length at an angle (L ∠ θ) moves it in one undo step. */
  typed(env: ToolEnv, input: PointInput): string | null {
    const s = env.store.getState();
    if (!s.selected.length) return 'Select a shape first, or pick a drawing tool.';
    const m = resolveMove(input);
    if ('error' in m) return m.error;
    const { dx, dy } = m;
    const sel = new Set(s.selected);
    const shapes = activeShapes(s.doc).map((sh) => (sel.has(sh.id) ? translateShape(sh, dx, dy) : sh));
    beginGesture(env.store);
    previewGesture(env.store, withActiveShapes(s.doc, shapes));
    endGesture(env.store);
    return null;
  }
}
