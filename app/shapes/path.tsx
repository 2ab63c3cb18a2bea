/**
 * Path editing: the chain tool, closed (lines and three-point arcs back to the start), handles on
 * every point and arc middle, and the point list in the panel with insert, delete and line/arc
 * switches.
 */
import { pathDeletePoint, pathMakeArc, pathMakeLine, pathSplitSegment, type PathSegment, type PathShape, type Point } from '../../src';
import { PointFields, ToolButton } from '../fields/PointFields';
import { movedChainHandle } from '../fields/ChainFields';
import { useShapeEdit } from '../fields/shape-edit';
import { ARC_MODE_COMMAND, ChainTool } from '../tools/chain';
import type { NewShape, ToolEnv } from '../tools/types';
import type { Handle, ShapeEditor } from './kind';

class PathTool extends ChainTool {
  readonly id = 'path';
  protected readonly noun = 'Path';
  protected readonly closed = true;
  protected build(_env: ToolEnv, start: Point, segments: PathSegment[]): NewShape {
    return { type: 'path', start, segments };
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
  moveHandle: (s, ref, p) => movedChainHandle(s, ref, p, true),
  Fields: PathFields,
  tools: [{ id: 'path', label: 'Path', key: 'l', inDrawGroup: true, subCommands: [ARC_MODE_COMMAND.name], create: () => new PathTool() }],
  commands: [ARC_MODE_COMMAND],
};
