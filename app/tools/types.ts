/** The contract between the canvas and its tools. Each tool is a small state machine. */
import { pathEndDirection, tangentArc, type PathSegment, type Point, type Shape } from '../../src';
import { cosSinDegrees, type EntryExpectation, type PointInput } from '../expr';
import type { SnapResult } from '../geometry/snap';
import { MESSAGE } from '../input-syntax';
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
  /** What the current step reads a typed entry as (a point unless the tool says otherwise). */
  expects?(env: ToolEnv): EntryExpectation;
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
      if (!last) return { error: MESSAGE.noPrevious };
      return { p: [clean(last[0] + input.dx), clean(last[1] + input.dy)] };
    case 'polar': {
      if (!last) return { error: MESSAGE.noPrevious };
      const [c, s] = cosSinDegrees(input.angleDeg);
      return { p: [clean(last[0] + input.length * c), clean(last[1] + input.length * s)] };
    }
    case 'scalar':
      return { error: MESSAGE.pointNeedsTwo };
    case 'diameter':
      return { error: MESSAGE.diameterNotHere };
    case 'arc':
      return { error: MESSAGE.arcNotHere };
  }
}

/**
 * A radius typed where one is asked: a number is the radius, a diameter (Ø14, dia 14) is halved.
 * Null for the other kinds, which the caller reads as a point (e.g. a point on the circle).
 */
export function resolveRadius(input: PointInput): { r: number } | { error: string } | null {
  if (input.kind === 'scalar') return input.value > 0 ? { r: clean(input.value) } : { error: MESSAGE.radiusPositive };
  if (input.kind === 'diameter') return input.value > 0 ? { r: clean(input.value / 2) } : { error: MESSAGE.diameterPositive };
  return null;
}

/** A typed move of a selection: a displacement (Δ dx, dy) or a length at an angle (L ∠ θ). */
export function resolveMove(input: PointInput): { dx: number; dy: number } | { error: string } {
  if (input.kind === 'rel') return { dx: input.dx, dy: input.dy };
  if (input.kind === 'polar') {
    const [c, s] = cosSinDegrees(input.angleDeg);
    return { dx: clean(input.length * c), dy: clean(input.length * s) };
  }
  return { error: MESSAGE.moveForm };
}

/**
 * A path arc typed by radius and sweep (R ⌒ φ): the arc that leaves the path's last point along
 * the direction of its last segment, turning left for a positive sweep. `path` is the part drawn
 * so far (its last segment sets the direction; with none there is no direction to continue).
 */
export function resolveArc(input: PointInput, path: { start: Point; segments: readonly PathSegment[] }): { segment: PathSegment } | { error: string } {
  if (input.kind !== 'arc') return { error: MESSAGE.arcNotHere };
  if (!(input.radius > 0)) return { error: MESSAGE.arcRadius };
  if (!(Math.abs(input.sweepDeg) < 360) || input.sweepDeg === 0) return { error: MESSAGE.arcSweep };
  const dir = pathEndDirection(path);
  if (!dir) return { error: MESSAGE.arcNeedsDirection };
  const from = path.segments.length ? path.segments[path.segments.length - 1].to : path.start;
  const g = tangentArc(from, dir, input.radius, (input.sweepDeg * Math.PI) / 180);
  return { segment: { to: [clean(g.to[0]), clean(g.to[1])], via: [clean(g.via![0]), clean(g.via![1])] } };
}

/** Remove binary round-off from typed arithmetic (0.1 + 0.2 -> 0.3), keep real digits (cos 30°). */
export function clean(v: number): number {
  const r = Number(v.toPrecision(10));
  return Math.abs(r - v) <= 1e-13 * Math.max(Math.abs(v), 1e-300) ? r : v;
}
