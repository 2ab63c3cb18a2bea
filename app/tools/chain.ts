/**
 * The chain tool: points joined by lines and three-point arcs (A switches the next segment to an
 * arc: a point it passes through, then its end; an arc may also be typed by radius and sweep).
 * A closed chain (a path) ends on its start point or with Enter; an open one (a line element, a
 * strip's centreline) ends with Enter. Each shape kind that is drawn this way says what record
 * the finished chain becomes.
 */
import type { PathSegment, Point, Shape } from '../../src';
import type { PointInput } from '../expr';
import { HINT } from '../input-syntax';
import type { Command } from '../commands/registry';
import { DrawingTool, samePoint } from './base';
import { resolveArc, type NewShape, type ToolEnv } from './types';

/** A (A key): the next segment of the chain being drawn is a three-point arc, or a line again. */
export const ARC_MODE_COMMAND: Command = {
  name: 'path.arcMode',
  label: 'Arc segment',
  group: 'tool',
  keys: ['a'],
  hint: 'Path, line and strip tools: the next segment is a three-point arc',
  active: (c) => c.store.getState().pathArc,
  perform: (c) => c.store.setState({ pathArc: !c.store.getState().pathArc }),
};

export abstract class ChainTool extends DrawingTool {
  abstract override readonly id: string;
  /** Name in prompts ('Path', 'Line', 'Strip centreline'). */
  protected abstract readonly noun: string;
  /** True for an outline that closes on its start; false for an open chain that Enter finishes. */
  protected abstract readonly closed: boolean;
  /** The record for the finished chain (its last segment ends on the start when closed). */
  protected abstract build(env: ToolEnv, start: Point, segments: PathSegment[]): NewShape;
  private start: Point | null = null;
  private segments: PathSegment[] = [];
  private via: Point | null = null;
  private hover: Point | null = null;
  private arcMode(env: ToolEnv) {
    return env.store.getState().pathArc;
  }
  prompt(env: ToolEnv) {
    if (!this.start) return `${this.noun}: start point (${HINT.firstPoint})`;
    if (this.via) return `${this.noun}, arc segment: end point`;
    const finish = this.closed ? 'Enter or the start point closes' : 'Enter finishes';
    return this.arcMode(env)
      ? `${this.noun}, arc segment: a point the arc passes through (A switches to lines)`
      : `${this.noun}, line segment: next point (${HINT.nextPoint}; an arc by ${HINT.arc}); A switches to arcs; ${finish}`;
  }
  last() {
    if (this.via) return this.via;
    return this.end();
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
    if (this.closed) {
      if (!samePoint(this.end()!, this.start)) segs.push({ to: this.start });
      if (segs.length < 2 || (segs.length === 2 && !segs.some((g) => g.via))) return 'A closed path needs at least three corners, or an arc.';
    } else if (segs.length === 0) return `A ${this.noun.toLowerCase()} needs at least one segment: pick a second point.`;
    if (env.addShape(this.build(env, this.start, segs))) this.reset(env);
    return null;
  }
  private draftShape(env: ToolEnv, extraTo: Point | null): Shape | undefined {
    if (!this.start) return undefined;
    const segs = this.segments.slice();
    if (this.via && extraTo) segs.push({ to: extraTo, via: this.via });
    else if (extraTo) segs.push({ to: extraTo });
    const end = segs.length ? segs[segs.length - 1].to : this.start;
    if (this.closed && !samePoint(end, this.start)) segs.push({ to: this.start });
    if (segs.length < (this.closed ? 2 : 1)) return undefined;
    return { id: '~draft', ...this.build(env, this.start, segs) } as Shape;
  }
  private show(env: ToolEnv) {
    const chain: Point[] = this.start ? [this.start, ...this.segments.map((g) => g.to)] : [];
    const markers: Point[] = this.start ? [this.start] : [];
    if (this.via) markers.push(this.via);
    this.draft(env, { shape: this.draftShape(env, this.hover), chain: this.hover ? [...chain, this.hover] : chain, markers });
  }
  protected accept(env: ToolEnv, p: Point, how: 'click' | 'typed'): string | null {
    if (!this.start) {
      this.start = p;
      this.show(env);
      return null;
    }
    // A click near the start closes the outline even when point snapping is off.
    if (this.closed && how === 'click' && this.segments.length >= 1 && !samePoint(p, this.start) && !(this.arcMode(env) && !this.via) && this.pressedNear(env, this.start)) p = this.start;
    if (this.arcMode(env) && !this.via) {
      if (samePoint(p, this.last()!)) return 'The arc’s middle point must differ from its start.';
      this.via = p;
      this.show(env);
      return null;
    }
    const from = this.end()!;
    if (samePoint(p, from)) return 'That point repeats the previous one.';
    if (this.via) {
      const v = this.via;
      const cross = (v[0] - from[0]) * (p[1] - from[1]) - (v[1] - from[1]) * (p[0] - from[0]);
      if (cross === 0) return 'The three arc points lie on one line: pick an end point off that line.';
      this.segments.push({ to: p, via: v });
      this.via = null;
    } else this.segments.push({ to: p });
    if (this.closed && samePoint(p, this.start)) return this.finish(env);
    this.show(env);
    return null;
  }
  protected preview(env: ToolEnv, p: Point) {
    this.hover = p;
    if (this.start) this.show(env);
  }
  /** An arc typed by radius and sweep continues the last segment (R ⌒ φ, R arc φ). */
  override typed(env: ToolEnv, input: PointInput): string | null {
    if (input.kind !== 'arc') return super.typed(env, input);
    if (!this.start || this.via) return this.start ? 'Finish the three-point arc first: type or click its end point.' : `Type the start point first (${HINT.firstPoint}).`;
    const r = resolveArc(input, { start: this.start, segments: this.segments });
    if ('error' in r) return r.error;
    this.segments.push(r.segment);
    if (this.closed && samePoint(r.segment.to, this.start)) return this.finish(env);
    this.show(env);
    return null;
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
