/**
 * The shared machinery of the drawing tools. A drawing tool is a small state machine: its fields
 * hold the points taken so far, and every click, typed entry or key moves it on. Points arrive
 * snapped; typed entries are resolved against the tool's last point. Tools that take two points
 * (a rectangle's corners, a circle's centre and rim) may also be drawn by press, drag, release.
 */
import type { Point } from '../../src';
import type { EntryExpectation, PointInput } from '../expr';
import type { Draft } from '../store/transient';
import { toScreen } from '../view';
import { resolveTyped, type PointerInfo, type Tool, type ToolEnv } from './types';

/** Pixels within which a click on the first point closes an outline. */
export const CLOSE_PX = 8;
/** Pointer travel (px) that makes a press-and-release a drag. */
export const DRAG_PX = 5;

export function samePoint(a: Point, b: Point): boolean {
  return a[0] === b[0] && a[1] === b[1];
}

export abstract class DrawingTool implements Tool {
  abstract readonly id: string;
  abstract prompt(env: ToolEnv): string;
  /** True for two-point tools: releasing after a drag takes the release point as the second one. */
  protected readonly finishOnDrag: boolean = false;
  protected downAt: [number, number] | null = null;
  /** The point the orthogonal constraint and relative input start from. */
  abstract last(): Point | null;
  abstract busy(): boolean;
  abstract reset(env: ToolEnv): void;
  protected abstract accept(env: ToolEnv, p: Point, how: 'click' | 'typed'): string | null;
  protected abstract preview(env: ToolEnv, p: Point): void;
  /** Extra snap candidates (the first point of an outline being drawn). */
  protected extra(): Point[] {
    return [];
  }

  protected snapped(env: ToolEnv, e: PointerInfo): Point {
    return env.snap(e.raw, { from: this.last(), extra: this.extra(), shift: e.shift }).p;
  }
  /** True when the press at `downAt` was within CLOSE_PX of world point p on screen. */
  protected pressedNear(env: ToolEnv, p: Point): boolean {
    if (!this.downAt) return false;
    const [sx, sy] = toScreen(env.store.getState(), p[0], p[1]);
    return Math.hypot(sx - this.downAt[0], sy - this.downAt[1]) <= CLOSE_PX;
  }
  down(env: ToolEnv, e: PointerInfo): void {
    this.downAt = [e.sx, e.sy];
    env.message(this.accept(env, this.snapped(env, e), 'click'));
  }
  move(env: ToolEnv, e: PointerInfo): void {
    this.preview(env, this.snapped(env, e));
  }
  up(env: ToolEnv, e: PointerInfo): void {
    const first = this.last();
    if (this.finishOnDrag && first && this.downAt && Math.hypot(e.sx - this.downAt[0], e.sy - this.downAt[1]) > DRAG_PX) {
      const p = this.snapped(env, e);
      if (!samePoint(p, first)) env.message(this.accept(env, p, 'click'));
    }
    this.downAt = null;
  }
  key(env: ToolEnv, key: string): boolean {
    if (key === 'escape' && this.busy()) {
      this.reset(env);
      return true;
    }
    return false;
  }
  expects(_env?: ToolEnv): EntryExpectation {
    return 'point';
  }
  typed(env: ToolEnv, input: PointInput): string | null {
    const r = resolveTyped(input, this.last());
    if ('error' in r) return r.error;
    return this.accept(env, r.p, 'typed');
  }
  protected draft(env: ToolEnv, d: Draft | null): void {
    env.transient.setState({ draft: d });
  }
}
