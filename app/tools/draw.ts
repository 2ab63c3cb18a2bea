/**
 * Drawing tools. Each is a small state machine: its fields hold the state, and every pointer
 * event, key or typed entry moves it on. Points come snapped from the canvas.
 */
import { PROFILE_DEFAULTS, unitFactor, type PathSegment, type Point, type ProfileShape, type Shape } from '../../src';
import type { PointInput } from '../expr';
import type { ToolId } from '../store/store';
import { clean, resolveTyped, type NewShape, type PointerInfo, type Tool, type ToolEnv } from './types';

const CLOSE_PX = 8;
const DRAG_PX = 5;

function same(a: Point, b: Point): boolean {
  return a[0] === b[0] && a[1] === b[1];
}

function rectFrom(a: Point, b: Point): NewShape {
  return { type: 'rectangle', at: [Math.min(a[0], b[0]), Math.min(a[1], b[1])], width: clean(Math.abs(b[0] - a[0])), height: clean(Math.abs(b[1] - a[1])) };
}

abstract class BaseTool implements Tool {
  abstract readonly id: ToolId;
  abstract prompt(env: ToolEnv): string;
  protected downAt: [number, number] | null = null;
  /** The point the orthogonal constraint and relative input start from. */
  abstract last(): Point | null;
  abstract busy(): boolean;
  abstract reset(env: ToolEnv): void;
  protected abstract accept(env: ToolEnv, p: Point, how: 'click' | 'typed'): string | null;
  protected abstract preview(env: ToolEnv, p: Point): void;
  protected extra(): Point[] {
    return [];
  }

  protected snapped(env: ToolEnv, e: PointerInfo): Point {
    const r = env.snap(e.raw, { from: this.last(), extra: this.extra(), shift: e.shift });
    return r.p;
  }
  down(env: ToolEnv, e: PointerInfo): void {
    this.downAt = [e.sx, e.sy];
    const err = this.accept(env, this.snapped(env, e), 'click');
    env.message(err);
  }
  move(env: ToolEnv, e: PointerInfo): void {
    this.preview(env, this.snapped(env, e));
  }
  up(_env: ToolEnv, _e: PointerInfo): void {
    this.downAt = null;
  }
  key(env: ToolEnv, key: string): boolean {
    if (key === 'escape' && this.busy()) {
      this.reset(env);
      return true;
    }
    return false;
  }
  typed(env: ToolEnv, input: PointInput): string | null {
    const r = resolveTyped(input, this.last());
    if ('error' in r) return r.error;
    return this.accept(env, r.p, 'typed');
  }
  protected draft(env: ToolEnv, d: import('./types').Draft | null) {
    env.transient.setState({ draft: d });
  }
}

export class RectangleTool extends BaseTool {
  readonly id = 'rectangle' as const;
  private corner: Point | null = null;
  prompt() {
    return this.corner ? 'Rectangle: opposite corner ("x, y", or "@width, height")' : 'Rectangle: first corner ("x, y")';
  }
  last() {
    return this.corner;
  }
  busy() {
    return this.corner !== null;
  }
  reset(env: ToolEnv) {
    this.corner = null;
    this.draft(env, null);
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    if (!this.corner) {
      this.corner = p;
      this.draft(env, { markers: [p] });
      return null;
    }
    if (p[0] === this.corner[0] || p[1] === this.corner[1]) return 'The rectangle needs a width and a height: pick a corner off the first one’s row and column.';
    const ok = env.addShape(rectFrom(this.corner, p));
    if (ok) this.reset(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    if (this.corner && !same(p, this.corner) && p[0] !== this.corner[0] && p[1] !== this.corner[1]) {
      this.draft(env, { shape: { id: '~draft', ...rectFrom(this.corner, p) } as Shape, markers: [this.corner] });
    }
  }
  override up(env: ToolEnv, e: PointerInfo) {
    // Press-drag-release also draws the rectangle.
    if (this.corner && this.downAt && Math.hypot(e.sx - this.downAt[0], e.sy - this.downAt[1]) > DRAG_PX) {
      const p = this.snapped(env, e);
      if (!same(p, this.corner)) env.message(this.accept(env, p));
    }
    this.downAt = null;
  }
}

export class CircleTool extends BaseTool {
  readonly id = 'circle' as const;
  private centre: Point | null = null;
  prompt() {
    return this.centre ? 'Circle: radius (a number) or a point on the circle' : 'Circle: centre ("x, y")';
  }
  last() {
    return this.centre;
  }
  busy() {
    return this.centre !== null;
  }
  reset(env: ToolEnv) {
    this.centre = null;
    this.draft(env, null);
  }
  private finish(env: ToolEnv, r: number): string | null {
    if (!(r > 0)) return 'The radius must be greater than 0.';
    if (env.addShape({ type: 'circle', center: this.centre!, radius: clean(r) })) this.reset(env);
    return null;
  }
  protected accept(env: ToolEnv, p: Point): string | null {
    if (!this.centre) {
      this.centre = p;
      this.draft(env, { markers: [p] });
      return null;
    }
    return this.finish(env, Math.hypot(p[0] - this.centre[0], p[1] - this.centre[1]));
  }
  protected preview(env: ToolEnv, p: Point) {
    if (!this.centre) return;
    const r = Math.hypot(p[0] - this.centre[0], p[1] - this.centre[1]);
    if (r > 0) this.draft(env, { shape: { id: '~draft', type: 'circle', center: this.centre, radius: r }, markers: [this.centre], chain: [this.centre, p] });
  }
  override typed(env: ToolEnv, input: PointInput) {
    if (input.kind === 'scalar') {
      if (!this.centre) return 'Type the centre first as "x, y".';
      return this.finish(env, input.value);
    }
    return super.typed(env, input);
  }
  override up(env: ToolEnv, e: PointerInfo) {
    if (this.centre && this.downAt && Math.hypot(e.sx - this.downAt[0], e.sy - this.downAt[1]) > DRAG_PX) {
      const p = this.snapped(env, e);
      if (!same(p, this.centre)) env.message(this.accept(env, p));
    }
    this.downAt = null;
  }
}

export class PolygonTool extends BaseTool {
  readonly id = 'polygon' as const;
  private points: Point[] = [];
  private hover: Point | null = null;
  prompt() {
    return this.points.length === 0
      ? 'Polygon: first point ("x, y")'
      : `Polygon: next point ("x, y", "@dx, dy" or "length<angle"); ${this.points.length >= 3 ? 'Enter or click the first point to close' : 'at least 3 points'}`;
  }
  last() {
    return this.points.length ? this.points[this.points.length - 1] : null;
  }
  busy() {
    return this.points.length > 0;
  }
  protected override extra() {
    return this.points.slice(0, 1);
  }
  reset(env: ToolEnv) {
    this.points = [];
    this.draft(env, null);
  }
  private close(env: ToolEnv): string | null {
    if (this.points.length < 3) return 'A polygon needs at least 3 points.';
    if (env.addShape({ type: 'polygon', points: this.points.slice() })) this.reset(env);
    return null;
  }
  private show(env: ToolEnv) {
    const chain = this.hover ? [...this.points, this.hover] : this.points.slice();
    this.draft(env, { chain, closing: this.points.length >= 2, markers: this.points.slice(0, 1) });
  }
  protected accept(env: ToolEnv, p: Point, how: 'click' | 'typed'): string | null {
    const first = this.points[0];
    if (first && same(p, first)) return this.close(env);
    if (how === 'click' && first && this.downAt && this.points.length >= 3) {
      // Closing by clicking near the first point even when snapping is off.
      const st = env.store.getState();
      const fx = st.ox + first[0] * st.scale, fy = st.oy - first[1] * st.scale;
      if (Math.hypot(fx - this.downAt[0], fy - this.downAt[1]) <= CLOSE_PX) return this.close(env);
    }
    const lastP = this.last();
    if (lastP && same(p, lastP)) return 'That point repeats the previous one.';
    this.points.push(p);
    this.show(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    this.hover = p;
    if (this.points.length) this.show(env);
  }
  override key(env: ToolEnv, key: string) {
    if (key === 'enter' && this.points.length) {
      env.message(this.close(env));
      return true;
    }
    if (key === 'backspace' && this.points.length) {
      this.points.pop();
      this.show(env);
      return true;
    }
    return super.key(env, key);
  }
}

export class PathTool extends BaseTool {
  readonly id = 'path' as const;
  private start: Point | null = null;
  private segments: PathSegment[] = [];
  private via: Point | null = null;
  private hover: Point | null = null;
  private arcMode(env: ToolEnv) {
    return env.store.getState().pathArc;
  }
  prompt(env: ToolEnv) {
    if (!this.start) return 'Path: start point ("x, y")';
    if (this.via) return 'Path arc: end point';
    return this.arcMode(env)
      ? 'Path arc: a point the arc passes through (A switches to lines)'
      : 'Path line: next point (A switches to arcs; Enter or the start point closes)';
  }
  last() {
    if (this.via) return this.via;
    if (!this.start) return null;
    return this.segments.length ? this.segments[this.segments.length - 1].to : this.start;
  }
  private end(): Point | null {
    if (!this.start) return null;
    return this.segments.length ? this.segments[this.segments.length - 1].to : this.start;
  }
  busy() {
    return this.start !== null;
  }
  protected override extra() {
    return this.start ? [this.start] : [];
  }
  reset(env: ToolEnv) {
    this.start = null;
    this.segments = [];
    this.via = null;
    this.draft(env, null);
  }
  private finish(env: ToolEnv): string | null {
    if (!this.start) return null;
    const segs = this.segments.slice();
    const end = this.end()!;
    if (!same(end, this.start)) segs.push({ to: this.start });
    if (segs.length < 2 || (segs.length === 2 && !segs.some((g) => g.via))) return 'A closed path needs at least three corners, or an arc.';
    if (env.addShape({ type: 'path', start: this.start, segments: segs })) this.reset(env);
    return null;
  }
  private draftShape(extraTo: Point | null): Shape | undefined {
    if (!this.start) return undefined;
    const segs = this.segments.slice();
    if (this.via && extraTo) segs.push({ to: extraTo, via: this.via });
    else if (extraTo) segs.push({ to: extraTo });
    const end = segs.length ? segs[segs.length - 1].to : this.start;
    if (!same(end, this.start)) segs.push({ to: this.start });
    if (segs.length < 2) return undefined;
    return { id: '~draft', type: 'path', start: this.start, segments: segs };
  }
  private show(env: ToolEnv) {
    const chain: Point[] = this.start ? [this.start, ...this.segments.map((g) => g.to)] : [];
    const markers: Point[] = this.start ? [this.start] : [];
    if (this.via) markers.push(this.via);
    this.draft(env, { shape: this.draftShape(this.hover), chain: this.hover ? [...chain, this.hover] : chain, markers });
  }
  protected accept(env: ToolEnv, p: Point, how: 'click' | 'typed'): string | null {
    if (!this.start) {
      this.start = p;
      this.show(env);
      return null;
    }
    if (how === 'click' && this.downAt && this.segments.length >= 1 && !same(p, this.start) && !(this.arcMode(env) && !this.via)) {
      // A click near the start closes the path even when point snapping is off.
      const st = env.store.getState();
      const fx = st.ox + this.start[0] * st.scale, fy = st.oy - this.start[1] * st.scale;
      if (Math.hypot(fx - this.downAt[0], fy - this.downAt[1]) <= CLOSE_PX) p = this.start;
    }
    if (this.arcMode(env) && !this.via) {
      if (same(p, this.last()!)) return 'The arc’s middle point must differ from its start.';
      this.via = p;
      this.show(env);
      return null;
    }
    const from = this.end()!;
    if (same(p, from)) return 'That point repeats the previous one.';
    if (this.via) {
      const v = this.via;
      const cross = (v[0] - from[0]) * (p[1] - from[1]) - (v[1] - from[1]) * (p[0] - from[0]);
      if (cross === 0) return 'The three arc points lie on one line: pick an end point off that line.';
      this.segments.push({ to: p, via: v });
      this.via = null;
    } else this.segments.push({ to: p });
    if (same(p, this.start)) return this.finish(env);
    this.show(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    this.hover = p;
    if (this.start) this.show(env);
  }
  override key(env: ToolEnv, key: string) {
    if (key === 'enter' && this.start) {
      env.message(this.finish(env));
      return true;
    }
    if (key === 'backspace' && this.start) {
      if (this.via) this.via = null;
      else if (this.segments.length) this.segments.pop();
      else this.start = null;
      this.show(env);
      return true;
    }
    return super.key(env, key);
  }
}

/** Profile dimensions for a new shape: the defaults (mm) converted to the document's units. */
export function defaultProfile(type: ProfileShape['type'], units: import('../../src').Units, at: Point): NewShape {
  const k = unitFactor('mm', units);
  const dims: Record<string, number> = {};
  for (const [key, v] of Object.entries(PROFILE_DEFAULTS[type])) dims[key] = clean((v as number) * k);
  return { type, at, ...dims } as unknown as NewShape;
}

export class ProfileTool extends BaseTool {
  readonly id = 'profile' as const;
  prompt(env: ToolEnv) {
    return `Profile (${env.store.getState().profileType}): click or type the placement point ("x, y")`;
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
    env.addShape(defaultProfile(s.profileType, s.doc.units, p));
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    const s = env.store.getState();
    this.draft(env, { shape: { id: '~draft', ...defaultProfile(s.profileType, s.doc.units, p) } as Shape, markers: [p] });
  }
}
