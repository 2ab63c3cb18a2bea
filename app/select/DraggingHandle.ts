/**
 * Moving one handle (a vertex, an arc's middle point, a centre, a radius): snapped, validated on
 * release. A click that does not move the handle picks its corner for rounding instead.
 */
import { formatShapeIssue, validateShape, type SectionDocument } from '../../src';
import { cancelGesture, endGesture, previewGesture } from '../store/history';
import { moveHandle, type HandleRef } from '../shapes';
import { cornerOfHandle } from '../shapes/corners';
import type { PointerInfo, ToolEnv } from '../tools/types';
import { IDLE, type Next, type SelectState } from './state';
import { activeShapes, withActiveShapes } from '../store/section';

export class DraggingHandle implements SelectState {
  readonly name = 'draggingHandle';
  private moved = false;
  constructor(
    private readonly id: string,
    private readonly ref: HandleRef,
    private readonly base: SectionDocument,
  ) {}
  move(env: ToolEnv, e: PointerInfo): Next {
    const p = env.snap(e.raw, { exclude: new Set([this.id]) }).p;
    const before = activeShapes(this.base);
    const shapes = before.map((sh) => (sh.id === this.id ? moveHandle(sh, this.ref, p) : sh));
    // A press that snaps back onto the same point is still a click (it picks the corner).
    this.moved ||= JSON.stringify(shapes.find((x) => x.id === this.id)) !== JSON.stringify(before.find((x) => x.id === this.id));
    previewGesture(env.store, withActiveShapes(this.base, shapes));
    return this;
  }
  up(env: ToolEnv): Next {
    if (!this.moved) {
      cancelGesture(env.store);
      const shape = activeShapes(this.base).find((x) => x.id === this.id);
      const index = shape ? cornerOfHandle(shape, this.ref) : null;
      env.transient.setState({ corner: index === null ? null : { id: this.id, index } });
      return IDLE;
    }
    const s = env.store.getState();
    const shapes = activeShapes(s.doc);
    const idx = shapes.findIndex((x) => x.id === this.id);
    const issues = idx >= 0 ? validateShape(shapes[idx], `shapes[${idx}]`) : [];
    if (issues.length) {
      // A point that makes the shape invalid is not applied: the shape goes back.
      cancelGesture(env.store);
      env.message(`Point not moved: ${issues.map((i) => formatShapeIssue(i, shapes)).join('; ')}`);
    } else endGesture(env.store);
    return IDLE;
  }
  cancel(env: ToolEnv): void {
    cancelGesture(env.store);
  }
}
