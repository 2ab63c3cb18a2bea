/**
 * The weld-point tool: one click (snapped like any drawing point) or one typed point (x, y) sets
 * where the force of a weld load acts, as one undoable step; then the select tool returns. The
 * load it places is the store's `weldTarget` (set by the weld panel's "Pick on canvas").
 */
import type { Point } from '../../src';
import { HINT } from '../input-syntax';
import { setWeldLoad } from '../ops/welds';
import { DrawingTool } from './base';
import type { ToolEnv } from './types';

export class WeldPointTool extends DrawingTool {
  readonly id = 'weldPoint';
  prompt(env: ToolEnv) {
    const s = env.store.getState();
    const load = s.weldTarget === null ? undefined : s.doc.weldLoads?.[s.weldTarget];
    if (!load) return 'Weld load: add a load in the results panel first, then pick its point';
    return `Weld load on "${load.group}": click the point where the force acts, or type it (${HINT.firstPoint}); Esc leaves it where it is`;
  }
  last() {
    return null;
  }
  busy() {
    return false;
  }
  reset(env: ToolEnv) {
    this.draft(env, null);
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    const s = env.store.getState();
    if (s.weldTarget === null || !s.doc.weldLoads?.[s.weldTarget]) return 'There is no weld load to place: add one in the results panel.';
    const err = setWeldLoad(env.store, s.weldTarget, { at: p });
    if (err) return err;
    env.store.setState({ tool: 'select' });
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    this.draft(env, { markers: [p] });
  }
}
