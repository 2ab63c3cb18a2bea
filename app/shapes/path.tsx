/**
 * Path editing: a tool that draws lines and three-point arcs (A switches the next segment to an
 * arc: a point it passes through, then its end), handles on every point and arc middle, and the
 * point list in the panel with insert, delete and line/arc switches.
 */
import { pathDeletePoint, pathMakeArc, pathMakeLine, pathSplitSegment, type PathSegment, type PathShape, type Point, type Shape } from '../../src';
import type { CommandContext } from '../commands/registry';
import { PointFields, ToolButton } from '../fields/PointFields';
import { useShapeEdit } from '../fields/shape-edit';
import { DrawingTool, samePoint } from '../tools/base';
import { resolveArc, type ToolEnv } from '../tools/types';
import type { PointInput } from '../expr';
import { HINT } from '../input-syntax';
import type { Handle, ShapeEditor } from './kind';

class PathTool extends DrawingTool {
  readonly id = 'path';
  private start: Point | null = null;
  private segments: PathSegment[] = [];
  private via: Point | null = null;
  private hover: Point | null = null;
  private arcMode(env: ToolEnv) {
    return env.store.getState().pathArc;
  }
  prompt(env: ToolEnv) {
    if (!this.start) return `Path: start point (${HINT.firstPoint})`;
    if (this.via) return 'Path arc: end point';
    return this.arcMode(env)
      ? 'Path arc: a point the arc passes through (A switches to lines)'
      : `Path line: next point (${HINT.nextPoint}; an arc by ${HINT.arc}); A switches to arcs; Enter or the start point closes`;
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
    const end = this.end()!;
    if (!samePoint(end, this.start)) segs.push({ to: this.start });
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
    if (!samePoint(end, this.start)) segs.push({ to: this.start });
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
    // A click near the start closes the path even when point snapping is off.
    if (how === 'click' && this.segments.length >= 1 && !samePoint(p, this.start) && !(this.arcMode(env) && !this.via) && this.pressedNear(env, this.start)) p = this.start;
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
    if (samePoint(p, this.start)) return this.finish(env);
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
    if (samePoint(r.segment.to, this.start)) return this.finish(env);
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

function PathFields({ shape }: { shape: PathShape }) {
  const e = useShapeEdit(shape);
  const last = shape.segments.length - 1;
  const segmentTools = (i: number, row: string) => (
    <>
      <ToolButton testid={`segment-split-${i}`} title="Insert point in segment" label="+" onClick={() => e.edit(row, (s, at) => pathSplitSegment(s, i, at))} />
      {shape.segments[i].via ? (
        <ToolButton testid={`segment-line-${i}`} title="Make line" label="Line" onClick={() => e.edit(row, (s, at) => pathMakeLine(s, i, at))} />
      ) : (
        <ToolButton testid={`segment-arc-${i}`} title="Make arc" label="Arc" onClick={() => e.edit(row, (s, at) => pathMakeArc(s, i, at))} />
      )}
    </>
  );
  const deleteTool = (k: number, row: string) => (
    <ToolButton testid={`point-delete-${k}`} title="Delete point" label="×" onClick={() => e.edit(row, (s, at) => pathDeletePoint(s, k, at))} />
  );
  const setSegment = (i: number, f: (g: PathSegment) => PathSegment) => e.set((s) => ({ ...s, segments: s.segments.map((o, k) => (k === i ? f(o) : o)) }));
  return (
    <div className="vertex-list">
      <PointFields
        label="Start"
        p={shape.start}
        field="start"
        units={e.units}
        onPoint={(q) => e.set((s) => ({ ...s, start: q, segments: s.segments.map((g, k) => (k === last ? { ...g, to: q } : g)) }))}
        error={e.errorOn('start')}
        tools={deleteTool(0, 'start')}
      />
      {shape.segments.map((g, i) => (
        <div key={i} className="segment">
          {g.via && <PointFields label={`Arc ${i + 1} through`} p={g.via} field={`segments[${i}].via`} units={e.units} onPoint={(q) => setSegment(i, (o) => ({ ...o, via: q }))} />}
          {i < last && (
            <PointFields
              label={`${g.via ? 'Arc' : 'Line'} ${i + 1} to`}
              p={g.to}
              field={`segments[${i}].to`}
              units={e.units}
              onPoint={(q) => setSegment(i, (o) => ({ ...o, to: q }))}
              error={e.errorOn(`segments[${i}].to`)}
              tools={
                <>
                  {segmentTools(i, `segments[${i}].to`)}
                  {deleteTool(i + 1, `segments[${i}].to`)}
                </>
              }
            />
          )}
          {i === last && (
            <>
              <div className="segment-note point-head">
                <span>{g.via ? `Arc ${i + 1}` : `Line ${i + 1}`} closes back to the start</span>
                <span className="point-tools">{segmentTools(i, `segments[${i}]`)}</span>
              </div>
              {e.errorOn(`segments[${i}]`) && (
                <span className="field-error" role="alert" data-error-for={`segments[${i}]`}>
                  {e.errorOn(`segments[${i}]`)}
                </span>
              )}
            </>
          )}
        </div>
      ))}
    </div>
  );
}

export const pathEditor: ShapeEditor<PathShape> = {
  types: ['path'],
  // The last segment ends on the start, so the start handle moves both.
  handles: (s) => {
    const out: Handle[] = [{ ref: { kind: 'start' }, p: s.start }];
    s.segments.forEach((g, index) => {
      if (index < s.segments.length - 1) out.push({ ref: { kind: 'to', index }, p: g.to });
      if (g.via) out.push({ ref: { kind: 'via', index }, p: g.via });
    });
    return out;
  },
  moveHandle: (s, ref, p) => {
    const last = s.segments.length - 1;
    switch (ref.kind) {
      case 'start':
        return { ...s, start: p, segments: s.segments.map((g, i) => (i === last ? { ...g, to: p } : g)) };
      case 'to':
        return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, to: p } : g)) };
      case 'via':
        return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, via: p } : g)) };
      default:
        return s;
    }
  },
  Fields: PathFields,
  tools: [{ id: 'path', label: 'Path', key: 'l', inDrawGroup: true, create: () => new PathTool() }],
  commands: [
    {
      name: 'path.arcMode',
      label: 'Arc segment',
      group: 'tool',
      keys: ['a'],
      hint: 'Path tool: next segment is a three-point arc',
      active: (c: CommandContext) => c.store.getState().pathArc,
      perform: (c: CommandContext) => c.store.setState({ pathArc: !c.store.getState().pathArc }),
    },
  ],
};
