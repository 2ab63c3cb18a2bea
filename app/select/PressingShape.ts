/** Pressed on a selected shape: a click until the pointer travels a few pixels, then a drag. */
import type { Point, SectionDocument } from '../../src';
import { beginGesture } from '../store/history';
import type { PointerInfo, ToolEnv } from '../tools/types';
import { DraggingShapes } from './DraggingShapes';
import { DRAG_PX, IDLE, type Next, type SelectState } from './state';

export class PressingShape implements SelectState {
  readonly name = 'pressingShape';
  constructor(
    private readonly at: [number, number],
    private readonly start: Point,
    private readonly base: SectionDocument,
  ) {}
  move(env: ToolEnv, e: PointerInfo): Next {
    if (Math.hypot(e.sx - this.at[0], e.sy - this.at[1]) < DRAG_PX) return this;
    beginGesture(env.store);
    return new DraggingShapes(this.start, this.base, new Set(env.store.getState().selected)).move(env, e);
  }
  up(): Next {
    return IDLE;
  }
}
