/**
 * Line element editing: the chain tool, open (Enter finishes), handles on every point, and in the
 * panel its group (the lines of one group form a weld group) and its points. A line encloses no
 * area: it is drawn as a stroke and reported in its group's line properties.
 */
import type { LineShape, PathSegment, Point } from '../../src';
import { ChainFields, chainHandles } from '../fields/ChainFields';
import { useShapeEdit } from '../fields/shape-edit';
import { ARC_MODE_COMMAND, ChainTool } from '../tools/chain';
import type { NewShape, ToolEnv } from '../tools/types';
import type { ShapeEditor } from './kind';

class LineTool extends ChainTool {
  readonly id = 'line';
  protected readonly noun = 'Line';
  protected readonly closed = false;
  protected build(env: ToolEnv, start: Point, segments: PathSegment[]): NewShape {
    // A new line joins the group of the last line drawn, so a weld group is drawn line by line.
    const last = [...env.store.getState().doc.shapes].reverse().find((s): s is LineShape => s.type === 'line');
    return last?.group ? { type: 'line', start, segments, group: last.group } : { type: 'line', start, segments };
  }
}

function LineFields({ shape }: { shape: LineShape }) {
  const e = useShapeEdit(shape);
  return (
    <>
      <label className="field">
        <span className="field-label">Group</span>
        <input
          key={shape.group ?? ''}
          data-field="group"
          defaultValue={shape.group ?? ''}
          placeholder="Lines"
          onKeyDown={(ev) => {
            ev.stopPropagation();
            if (ev.key === 'Enter') (ev.target as HTMLInputElement).blur();
          }}
          onBlur={(ev) => {
            const v = ev.target.value.trim();
            if (v === (shape.group ?? '')) return;
            e.set((s) => {
              const n = { ...s };
              if (v) n.group = v;
              else delete n.group;
              return n;
            });
          }}
        />
      </label>
      <ChainFields start={shape.start} segments={shape.segments} units={e.units} onChange={(start, segments) => e.set((s) => ({ ...s, start, segments }))} />
    </>
  );
}

export const lineEditor: ShapeEditor<LineShape> = {
  types: ['line'],
  handles: (s) => chainHandles(s.start, s.segments),
  moveHandle: (s, ref, p) => {
    if (ref.kind === 'start') return { ...s, start: p };
    if (ref.kind === 'to') return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, to: p } : g)) };
    if (ref.kind === 'via') return { ...s, segments: s.segments.map((g, i) => (i === ref.index ? { ...g, via: p } : g)) };
    return s;
  },
  Fields: LineFields,
  tools: [{ id: 'line', label: 'Line element', key: 'w', hint: 'A weld line or other line element: it encloses no area', inDrawGroup: true, subCommands: [ARC_MODE_COMMAND.name], create: () => new LineTool() }],
};
