/** The contract between the canvas and its tools. Each tool is a small state machine. */
import type { Point, Shape } from '../../src';
import type { PointInput } from '../expr';
import type { SnapResult } from '../geometry/snap';
import type { ResultsHandle } from '../store/evaluation';
import type { EditorStore } from '../store/store';
import type { TransientStore } from '../store/transient';

/** A shape record without its id (the editor assigns one). */
export type NewShape = Shape extends infer S ? (S extends Shape ? Omit<S, 'id'> & { id?: string } : never) : never;

export interface PointerInfo {
  sx: number;
  sy: number;
  /** The pointer in world coordinates, before snapping. */
  raw: Point;
  shift: boolean;
  mod: boolean;
}

export interface ToolEnv {
  store: EditorStore;
  results: ResultsHandle;
  transient: TransientStore;
  snap(raw: Point, opts?: { from?: Point | null; exclude?: ReadonlySet<string>; extra?: readonly Point[]; shift?: boolean }): SnapResult;
  /** Commit a new shape in one undo step, select it; returns false (with a message) when invalid. */
  addShape(shape: NewShape): boolean;
  message(text: string | null): void;
}

export interface Tool {
  readonly id: string;
  prompt(env: ToolEnv): string;
  down(env: ToolEnv, e: PointerInfo): void;
  move(env: ToolEnv, e: PointerInfo): void;
  up(env: ToolEnv, e: PointerInfo): void;
  /** 'enter', 'escape', 'backspace'; true when handled. */
  key(env: ToolEnv, key: string): boolean;
  /** Typed input while drawing; returns an error text or null. */
  typed(env: ToolEnv, input: PointInput): string | null;
  reset(env: ToolEnv): void;
  /** True while the tool holds a half-finished shape. */
  busy(): boolean;
}

/** Resolve typed input to a point: absolute, relative to `last`, or polar from `last`. */
export function resolveTyped(input: PointInput, last: Point | null): { p: Point } | { error: string } {
  switch (input.kind) {
    case 'abs':
      return { p: [input.x, input.y] };
    case 'rel':
      if (!last) return { error: 'There is no previous point yet: type the first point as "x, y".' };
      return { p: [clean(last[0] + input.dx), clean(last[1] + input.dy)] };
    case 'polar': {
      if (!last) return { error: 'There is no previous point yet: type the first point as "x, y".' };
      const t = (input.angleDeg * Math.PI) / 180;
      return { p: [clean(last[0] + input.length * Math.cos(t)), clean(last[1] + input.length * Math.sin(t))] };
    }
    case 'scalar':
      return { error: 'A point needs two numbers: "x, y", "@dx, dy" or "length<angle".' };
  }
}

/** Remove binary round-off from typed arithmetic (0.1 + 0.2 -> 0.3), keep real digits (cos 30°). */
export function clean(v: number): number {
  const r = Number(v.toPrecision(10));
  return Math.abs(r - v) <= 1e-13 * Math.max(Math.abs(v), 1e-300) ? r : v;
}
